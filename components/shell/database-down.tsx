export function DatabaseDown() {
  return (
    <main id="main" className="mx-auto w-full max-w-md px-4 py-12" data-testid="database-down">
      <h1 className="font-serif text-3xl font-semibold">The database is not reachable</h1>
      <p className="mt-3">
        Echoline cannot reach its PostgreSQL database right now. Nothing was lost. Start it again (
        <code>npm start</code> does) and reload this page.
      </p>
    </main>
  );
}
