import Link from "next/link";
import { redirect } from "next/navigation";
import { getDb } from "@/db";
import { signInLinkState } from "@/db/queries/accounts";
import { hashLinkToken } from "@/lib/server/auth";
import { appUrl } from "@/lib/env";

export const metadata = { title: "Sign-in link" };

/**
 * The e-mailed link lands here first so that an expired or already used link gets its own words;
 * a good link goes on to next-auth's callback, which consumes it.
 */
export default async function SignInLinkPage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | undefined>>;
}) {
  const sp = await searchParams;
  const token = sp.token ?? "";
  const email = sp.email ?? "";
  let state: "ok" | "expired" | "used" | "invalid" = "invalid";
  if (token && email) {
    state = await signInLinkState(getDb(), hashLinkToken(token), email);
  }
  if (state === "ok") {
    const q = new URLSearchParams({ token, email, callbackUrl: sp.callbackUrl ?? `${appUrl()}/home` });
    redirect(`/api/auth/callback/nodemailer?${q.toString()}`);
  }
  const words = {
    expired: ["This sign-in link has expired", "Links work for 24 hours. Ask for a new one."],
    used: ["This sign-in link was already used", "Each link works once. If you are not signed in, ask for a new one."],
    invalid: [
      "This sign-in link is not valid",
      "It may be incomplete: copy the whole link from the e-mail, or ask for a new one.",
    ],
  }[state];
  return (
    <main id="main" className="mx-auto w-full max-w-md px-4 py-12">
      <h1 className="font-serif text-3xl font-semibold" data-testid="link-state" data-state={state}>
        {words[0]}
      </h1>
      <p className="mt-3">{words[1]}</p>
      <p className="mt-6">
        <Link href="/sign-in" className="underline">
          Ask for a new link
        </Link>
      </p>
    </main>
  );
}
