import Link from "next/link";
import { getDb } from "@/db";
import { findInvitation } from "@/db/queries/accounts";
import { AcceptInvitationForm } from "@/components/auth/accept-invitation-form";

export const metadata = { title: "Accept invitation" };

export default async function InvitePage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const inv = token.length <= 200 ? await findInvitation(getDb(), token) : undefined;
  const problem = !inv
    ? "This invitation link is not valid."
    : inv.accepted_at
      ? "This invitation was already used. Sign in instead."
      : new Date(inv.expires_at) < new Date()
        ? "This invitation has expired. Ask an admin for a new one."
        : null;
  return (
    <main id="main" className="mx-auto w-full max-w-md px-4 py-12">
      <h1 className="font-serif text-3xl font-semibold">Welcome to Echoline</h1>
      {problem || !inv ? (
        <>
          <p className="mt-3">{problem}</p>
          <p className="mt-6">
            <Link className="underline" href="/sign-in">
              Go to sign-in
            </Link>
          </p>
        </>
      ) : (
        <>
          <p className="mt-3">
            You were invited as <strong>{inv.role}</strong> with {inv.email}. Choose your name and a password.
          </p>
          <AcceptInvitationForm token={token} />
        </>
      )}
    </main>
  );
}
