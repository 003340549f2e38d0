import Link from "next/link";

/** Every empty screen says what to do next. */
export function EmptyState({
  title,
  children,
  action,
}: {
  title: string;
  children?: React.ReactNode;
  action?: { href: string; label: string };
}) {
  return (
    <div className="rounded-lg border border-dashed border-rule bg-paper-2 p-6 text-center" role="status">
      <h2 className="font-semibold text-lg">{title}</h2>
      {children && <div className="mt-1 text-ink-2">{children}</div>}
      {action && (
        <Link href={action.href} className="mt-4 inline-block rounded bg-ink px-3 py-1.5 text-paper hover:opacity-90">
          {action.label}
        </Link>
      )}
    </div>
  );
}
