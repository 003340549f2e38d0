export function Footer() {
  return (
    <footer className="border-t border-rule bg-paper-2 text-ink-2 text-sm">
      <div className="mx-auto max-w-6xl px-4 py-4 grid gap-1 md:grid-cols-2">
        <p>
          <strong className="text-ink">Flags are screening aids, not findings of misconduct.</strong> Read the article
          before acting on one.
        </p>
        <p>Load only material whose licence allows text mining. Manuscripts under review are confidential.</p>
        <p className="md:col-span-2">
          Cut-offs depend on field and purpose: Echoline reports practice, it does not set standards.
        </p>
      </div>
    </footer>
  );
}
