import Link from "next/link";

export const metadata = { title: "Check your e-mail" };

export default function CheckEmailPage() {
  return (
    <main id="main" className="mx-auto w-full max-w-md px-4 py-12">
      <h1 className="font-serif text-3xl font-semibold">Check your e-mail</h1>
      <p className="mt-3">
        If that address belongs to an active Echoline account, a sign-in link is on its way. The link works once, for 24
        hours.
      </p>
      <p className="mt-3 text-ink-2">
        Running Echoline locally? An admin can read the captured mail under <em>Captured mail</em>, or open the mail
        fake&apos;s own page.
      </p>
      <p className="mt-6">
        <Link href="/sign-in" className="underline">
          Back to sign-in
        </Link>
      </p>
    </main>
  );
}
