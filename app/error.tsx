"use client";

// Never shows the error's message or stack: those stay in the server log (the digest ties them).
export default function ErrorPage({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <main id="main" className="mx-auto w-full max-w-md px-4 py-12">
      <h1 className="font-serif text-3xl font-semibold">Something went wrong</h1>
      <p className="mt-3">
        Echoline could not show this page. If it keeps happening, the database may be down; try again in a minute.
      </p>
      {error.digest && <p className="mt-2 text-sm text-ink-2">Reference for the logs: {error.digest}</p>}
      <button className="mt-6 rounded border border-rule px-3 py-1.5" onClick={() => reset()}>
        Try again
      </button>
    </main>
  );
}
