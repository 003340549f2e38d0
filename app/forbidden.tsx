import Link from "next/link";

export default function Forbidden() {
  return (
    <main id="main" className="mx-auto w-full max-w-md px-4 py-12">
      <h1 className="font-serif text-3xl font-semibold">Not for your role</h1>
      <p className="mt-3">Your role does not open this page. If you need it, ask an admin to change your role.</p>
      <p className="mt-6">
        <Link className="underline" href="/home">
          Go to your home page
        </Link>
      </p>
    </main>
  );
}
