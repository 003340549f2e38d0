import Link from "next/link";

export const metadata = { title: "Sign-in problem" };

const WORDS: Record<string, string> = {
  Verification: "This sign-in link is no longer valid: it was used already or it has expired. Ask for a new one.",
  AccessDenied: "This account cannot sign in. It may have been deactivated; ask an admin.",
  CredentialsSignin: "That e-mail and password do not match an active account.",
};

export default async function SignInProblemPage({ searchParams }: { searchParams: Promise<{ error?: string }> }) {
  const { error } = await searchParams;
  return (
    <main id="main" className="mx-auto w-full max-w-md px-4 py-12">
      <h1 className="font-serif text-3xl font-semibold">Could not sign you in</h1>
      <p className="mt-3">{WORDS[error ?? ""] ?? "Something went wrong while signing you in. Try again."}</p>
      <p className="mt-6">
        <Link href="/sign-in" className="underline">
          Back to sign-in
        </Link>
      </p>
    </main>
  );
}
