"use client";
import { useState } from "react";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { fetchJson, formErrorsOf } from "@/lib/http/fetch-json";
import { inviteSchema, fieldErrors } from "@/lib/forms/accounts";
import { LABELS, ROLES, type Role } from "@/lib/vocabulary";
import { Field, FormError } from "@/components/ui/field";
import { Button } from "@/components/ui/button";

type User = {
  id: string;
  email: string;
  name: string | null;
  role: Role;
  active: boolean;
  hasPassword: boolean;
  invitationPending: boolean;
  venueIds: string[];
};
type Venue = { id: string; name: string };

export function PeopleManager({ selfId }: { selfId: string }) {
  const qc = useQueryClient();
  const users = useQuery({
    queryKey: ["admin", "users"],
    queryFn: () => fetchJson<{ users: User[] }>("/api/admin/users"),
  });
  const venues = useQuery({ queryKey: ["venues"], queryFn: () => fetchJson<{ venues: Venue[] }>("/api/venues") });
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [rowError, setRowError] = useState<string>();
  const [sent, setSent] = useState<string>();

  const invite = useMutation({
    mutationFn: (body: unknown) => fetchJson("/api/admin/invitations", { method: "POST", json: body }),
    onSuccess: (_d, body) => {
      setSent((body as { email: string }).email);
      qc.invalidateQueries({ queryKey: ["admin", "users"] });
    },
    onError: (e) => setErrors(formErrorsOf(e)),
  });
  const resend = useMutation({
    mutationFn: (u: User) => fetchJson(`/api/admin/users/${u.id}/invitation`, { method: "POST" }),
    onSuccess: (_d, u) => {
      setRowError(undefined);
      setSent(u.email);
    },
    onError: (e) => setRowError(e.message),
  });
  const patch = useMutation({
    mutationFn: ({ id, body }: { id: string; body: unknown }) =>
      fetchJson(`/api/admin/users/${id}`, { method: "PATCH", json: body }),
    onSuccess: () => {
      setRowError(undefined);
      qc.invalidateQueries({ queryKey: ["admin", "users"] });
    },
    onError: (e) => setRowError(e.message),
  });

  return (
    <>
      <section aria-labelledby="invite-h" className="rounded-lg border border-rule bg-paper-2 p-4">
        <h2 id="invite-h" className="font-semibold">
          Invite a person
        </h2>
        <form
          noValidate
          className="mt-3 grid gap-3 sm:grid-cols-[2fr_1fr_auto] sm:items-start"
          onSubmit={(e) => {
            e.preventDefault();
            const f = new FormData(e.currentTarget);
            const parsed = inviteSchema.safeParse({
              email: f.get("email"),
              role: f.get("role"),
              venueIds: f.getAll("venueIds"),
            });
            if (!parsed.success) return setErrors(fieldErrors(parsed.error));
            setErrors({});
            setSent(undefined);
            invite.mutate(parsed.data);
            e.currentTarget.reset();
          }}
        >
          <Field label="E-mail" name="email" type="email" error={errors.email} />
          <div className="grid gap-1">
            <label htmlFor="invite-role" className="text-sm font-medium">
              Role
            </label>
            <select
              id="invite-role"
              name="role"
              defaultValue="reader"
              aria-describedby="invite-role-err"
              aria-invalid={errors.role ? true : undefined}
              className="rounded border border-rule bg-paper px-2 py-1.5"
            >
              {ROLES.map((r) => (
                <option key={r} value={r}>
                  {LABELS.role[r]}
                </option>
              ))}
            </select>
            <p id="invite-role-err" className="text-sm text-accent min-h-[1.25rem]" aria-live="polite">
              {errors.role ?? ""}
            </p>
          </div>
          <Button type="submit" className="sm:mt-6" disabled={invite.isPending}>
            Send invitation
          </Button>
          {venues.data && venues.data.venues.length > 0 && (
            <fieldset className="sm:col-span-3">
              <legend className="text-sm font-medium">Venues (for editors)</legend>
              <div className="mt-1 flex flex-wrap gap-3 text-sm">
                {venues.data.venues.map((v) => (
                  <label key={v.id} className="inline-flex items-center gap-1">
                    <input type="checkbox" name="venueIds" value={v.id} /> {v.name}
                  </label>
                ))}
              </div>
            </fieldset>
          )}
          <div className="sm:col-span-3">
            <FormError message={errors.form} />
          </div>
        </form>
        {sent && (
          <p role="status" className="text-sm">
            Invitation sent to {sent}.
          </p>
        )}
      </section>

      <section aria-labelledby="people-h">
        <h2 id="people-h" className="font-semibold">
          Everyone
        </h2>
        <FormError message={rowError} />
        {users.isPending ? (
          <p role="status">Loading people …</p>
        ) : users.isError ? (
          <p role="alert">Could not load people: {users.error.message}</p>
        ) : (
          <table className="mt-2 w-full text-sm">
            <thead className="text-left text-ink-2">
              <tr>
                <th className="py-1">Person</th>
                <th>Role</th>
                <th>Status</th>
                <th>
                  <span className="sr-only">Actions</span>
                </th>
              </tr>
            </thead>
            <tbody>
              {users.data.users.map((u) => (
                <tr key={u.id} className="border-t border-rule" data-testid={`person-${u.email}`}>
                  <td className="py-2">
                    {u.name ?? <em className="text-ink-2">no name yet</em>}
                    <br />
                    <span className="text-ink-2">{u.email}</span>
                  </td>
                  <td>
                    <label className="sr-only" htmlFor={`role-${u.id}`}>
                      Role of {u.email}
                    </label>
                    <select
                      id={`role-${u.id}`}
                      value={u.role}
                      disabled={u.id === selfId || patch.isPending}
                      className="rounded border border-rule bg-paper px-1 py-0.5"
                      onChange={(e) => patch.mutate({ id: u.id, body: { role: e.target.value } })}
                    >
                      {ROLES.map((r) => (
                        <option key={r} value={r}>
                          {LABELS.role[r]}
                        </option>
                      ))}
                    </select>
                  </td>
                  <td>{u.active ? (u.invitationPending ? "Invited" : "Active") : "Deactivated"}</td>
                  <td className="text-right">
                    {u.active && u.invitationPending && (
                      <Button variant="quiet" disabled={resend.isPending} onClick={() => resend.mutate(u)}>
                        Resend invitation
                      </Button>
                    )}{" "}
                    {u.id !== selfId && (
                      <Button
                        variant={u.active ? "danger" : "quiet"}
                        onClick={() => patch.mutate({ id: u.id, body: { active: !u.active } })}
                      >
                        {u.active ? "Deactivate" : "Reactivate"}
                      </Button>
                    )}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
      </section>
    </>
  );
}
