"use client";

export default function GlobalError({ reset }: { error: Error; reset: () => void }) {
  return (
    <html lang="en">
      <body style={{ fontFamily: "system-ui", maxWidth: 480, margin: "3rem auto", padding: "0 1rem" }}>
        <h1>Echoline is not available right now</h1>
        <p>The page could not be shown. If the database is down, it will be back once it restarts.</p>
        <button onClick={() => reset()}>Try again</button>
      </body>
    </html>
  );
}
