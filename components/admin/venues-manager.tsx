"use client";
import { useState } from "react";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { fetchJson, formErrorsOf } from "@/lib/http/fetch-json";
import { venueSchema, fieldErrors } from "@/lib/forms/accounts";
import { Field, FormError } from "@/components/ui/field";
import { Button } from "@/components/ui/button";
import { EmptyState } from "@/components/ui/empty-state";

type Venue = {
  id: string;
  name: string;
  abbreviation: string | null;
  issn: string | null;
  is_methods_venue: boolean;
  is_demo: boolean;
};

export function VenuesManager() {
  const qc = useQueryClient();
  const venues = useQuery({ queryKey: ["venues"], queryFn: () => fetchJson<{ venues: Venue[] }>("/api/venues") });
  const [errors, setErrors] = useState<Record<string, string>>({});
  const create = useMutation({
    mutationFn: (body: unknown) => fetchJson("/api/admin/venues", { method: "POST", json: body }),
    onSuccess: () => qc.invalidateQueries({ queryKey: ["venues"] }),
    onError: (e) => setErrors(formErrorsOf(e)),
  });
  const toggle = useMutation({
    mutationFn: (v: Venue) =>
      fetchJson(`/api/admin/venues/${v.id}`, { method: "PATCH", json: { isMethodsVenue: !v.is_methods_venue } }),
    onSuccess: () => qc.invalidateQueries({ queryKey: ["venues"] }),
  });
  return (
    <>
      <form
        noValidate
        className="grid gap-3 rounded-lg border border-rule bg-paper-2 p-4 sm:grid-cols-3"
        onSubmit={(e) => {
          e.preventDefault();
          const f = new FormData(e.currentTarget);
          const parsed = venueSchema.safeParse({
            name: f.get("name"),
            abbreviation: f.get("abbreviation"),
            issn: f.get("issn"),
            isMethodsVenue: f.get("isMethodsVenue") === "on",
          });
          if (!parsed.success) return setErrors(fieldErrors(parsed.error));
          setErrors({});
          create.mutate(parsed.data);
          e.currentTarget.reset();
        }}
      >
        <Field label="Name" name="name" error={errors.name} />
        <Field label="Abbreviation" name="abbreviation" error={errors.abbreviation} />
        <Field label="ISSN" name="issn" error={errors.issn} hint="Optional, e.g. 1234-567X" />
        <label className="inline-flex items-center gap-2 text-sm">
          <input type="checkbox" name="isMethodsVenue" /> Methods venue
        </label>
        <div className="sm:col-span-2 flex items-center gap-3">
          <Button type="submit" disabled={create.isPending}>
            Add venue
          </Button>
          <FormError message={errors.form} />
        </div>
      </form>
      {venues.isPending ? (
        <p role="status">Loading venues …</p>
      ) : venues.isError ? (
        <p role="alert">Could not load venues: {venues.error.message}</p>
      ) : venues.data.venues.length === 0 ? (
        <EmptyState title="No venues yet">
          Add the journals of your corpus above; uploads can then be assigned to them.
        </EmptyState>
      ) : (
        <table className="w-full text-sm">
          <thead className="text-left text-ink-2">
            <tr>
              <th className="py-1">Venue</th>
              <th>ISSN</th>
              <th>Methods venue</th>
            </tr>
          </thead>
          <tbody>
            {venues.data.venues.map((v) => (
              <tr key={v.id} className="border-t border-rule">
                <td className="py-2">
                  {v.name}
                  {v.abbreviation ? ` (${v.abbreviation})` : ""}
                  {v.is_demo && <span className="ml-2 text-xs text-ink-2">invented demo venue</span>}
                </td>
                <td>{v.issn ?? "—"}</td>
                <td>
                  <label className="inline-flex items-center gap-2">
                    <input type="checkbox" checked={v.is_methods_venue} onChange={() => toggle.mutate(v)} />
                    <span className="sr-only">Methods venue: {v.name}</span>
                    {v.is_methods_venue ? "yes" : "no"}
                  </label>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </>
  );
}
