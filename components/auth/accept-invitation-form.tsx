"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { useMutation } from "@tanstack/react-query";
import { acceptInvitationSchema, fieldErrors } from "@/lib/forms/accounts";
import { fetchJson, formErrorsOf } from "@/lib/http/fetch-json";
import { Field, FormError } from "@/components/ui/field";
import { Button } from "@/components/ui/button";

export function AcceptInvitationForm({ token }: { token: string }) {
  const router = useRouter();
  const [errors, setErrors] = useState<Record<string, string>>({});
  const accept = useMutation({
    mutationFn: (body: unknown) => fetchJson("/api/invitations/accept", { method: "POST", json: body }),
    onSuccess: () => router.push("/sign-in?welcome=1"),
    onError: (e) => setErrors(formErrorsOf(e)),
  });
  return (
    <form
      noValidate
      className="mt-6 grid gap-2"
      onSubmit={(e) => {
        e.preventDefault();
        const f = new FormData(e.currentTarget);
        const parsed = acceptInvitationSchema.safeParse({
          token,
          name: f.get("name"),
          password: f.get("password"),
          confirm: f.get("confirm"),
        });
        if (!parsed.success) return setErrors(fieldErrors(parsed.error));
        setErrors({});
        accept.mutate(parsed.data);
      }}
    >
      <Field label="Your name" name="name" autoComplete="name" error={errors.name} />
      <Field
        label="Password"
        name="password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters."
        error={errors.password}
      />
      <Field label="Password again" name="confirm" type="password" autoComplete="new-password" error={errors.confirm} />
      <FormError message={errors.form} />
      <Button type="submit" disabled={accept.isPending}>
        Set password
      </Button>
    </form>
  );
}
