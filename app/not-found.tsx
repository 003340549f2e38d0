import Link from "next/link";

export default function NotFound() {
  return (
    <main id="main" className="mx-auto w-full max-w-md px-4 py-12">
      <h1 className="font-serif text-3xl font-semibold">Nothing here</h1>
      <p className="mt-3">This page does not exist, or it is not yours to see.</p>
      <p className="mt-6">
        <Link className="underline" href="/home">
          Go to your home page
        </Link>
      </p>
    </main>
  );
}
