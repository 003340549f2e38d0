import Link from "next/link";

export const DASHBOARD_TABS = [
  { name: "practice-over-time", label: "Practice over time" },
  { name: "trail-ends", label: "Where trails end" },
  { name: "venues", label: "Venue comparison" },
  { name: "drift", label: "Drift from sources" },
] as const;

export function DashboardTabs({ current, search }: { current: string; search: string }) {
  return (
    <nav aria-label="Dashboards" className="flex flex-wrap gap-2 border-b border-rule pb-2">
      {DASHBOARD_TABS.map((t) => (
        <Link
          key={t.name}
          href={`/dashboards/${t.name}${search ? `?${search}` : ""}`}
          aria-current={t.name === current ? "page" : undefined}
          className={`rounded px-3 py-1 ${t.name === current ? "bg-ink text-paper" : "hover:bg-paper-2"}`}
        >
          {t.label}
        </Link>
      ))}
      <Link
        href={`/trails${search ? `?${search}` : ""}`}
        aria-current={current === "trail-graph" ? "page" : undefined}
        className={`rounded px-3 py-1 ${current === "trail-graph" ? "bg-ink text-paper" : "hover:bg-paper-2"}`}
      >
        Trail graph
      </Link>
    </nav>
  );
}
