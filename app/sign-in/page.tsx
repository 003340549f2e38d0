import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { getActor } from "@/lib/server/session";
import { SignInForms } from "@/components/auth/sign-in-forms";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage() {
  if (await getActor()) redirect("/home");
  return (
    <main id="main" className="mx-auto w-full max-w-md px-4 py-12">
      <h1 className="font-serif text-3xl font-semibold">Sign in to Echoline</h1>
      <p className="mt-2 text-ink-2">
        Echoline is for invited people. Ask an admin for an invitation if you have none.
      </p>
      <SignInForms />
    </main>
  );
}
