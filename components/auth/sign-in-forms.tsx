"use client";
import { useState } from "react";
import { signIn } from "next-auth/react";
import { useRouter } from "next/navigation";
import { passwordSignInSchema, magicLinkSchema, fieldErrors } from "@/lib/forms/accounts";
import { Field, FormError } from "@/components/ui/field";
import { Button } from "@/components/ui/button";

export function SignInForms() {
  const router = useRouter();
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [linkErrors, setLinkErrors] = useState<Record<string, string>>({});
  const [busy, setBusy] = useState(false);

  async function onPassword(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    const parsed = passwordSignInSchema.safeParse({ email: form.get("email"), password: form.get("password") });
    if (!parsed.success) return setErrors(fieldErrors(parsed.error));
    setErrors({});
    setBusy(true);
    const res = await signIn("credentials", { ...parsed.data, redirect: false });
    setBusy(false);
    if (res?.error) {
      // The same words for a wrong password and an unknown e-mail.
      setErrors({
        form:
          res.code === "rate_limited"
            ? "Too many attempts. Wait 15 minutes, or sign in with an e-mail link."
            : "That e-mail and password do not match an active account.",
      });
      return;
    }
    router.push("/home");
    router.refresh();
  }

  async function onLink(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    const parsed = magicLinkSchema.safeParse({ email: form.get("email") });
    if (!parsed.success) return setLinkErrors(fieldErrors(parsed.error));
    setLinkErrors({});
    setBusy(true);
    await signIn("nodemailer", { email: parsed.data.email, redirect: false, redirectTo: "/home" });
    setBusy(false);
    router.push("/sign-in/check-email");
  }

  return (
    <div className="mt-8 grid gap-10">
      <form onSubmit={onPassword} noValidate className="grid gap-2" aria-labelledby="pw-h">
        <h2 id="pw-h" className="font-semibold">
          With your password
        </h2>
        <Field label="E-mail" name="email" type="email" autoComplete="email" error={errors.email} />
        <Field
          label="Password"
          name="password"
          type="password"
          autoComplete="current-password"
          error={errors.password}
        />
        <FormError message={errors.form} />
        <Button type="submit" disabled={busy}>
          Sign in
        </Button>
      </form>
      <form onSubmit={onLink} noValidate className="grid gap-2 border-t border-rule pt-6" aria-labelledby="link-h">
        <h2 id="link-h" className="font-semibold">
          With a link by e-mail
        </h2>
        <Field label="E-mail for the link" name="email" type="email" autoComplete="email" error={linkErrors.email} />
        <Button type="submit" variant="quiet" disabled={busy}>
          E-mail me a sign-in link
        </Button>
      </form>
    </div>
  );
}
