import Link from "next/link";
import { LABELS, type DashboardName } from "@/lib/vocabulary";

/** The chart dashboards (the trail graph has its own page, /trails, and comes last). */
export const DASHBOARD_TABS = (["practice-over-time", "trail-ends", "venues", "drift"] as const).map((name) => ({
  name,
  label: LABELS.dashboard[name],
}));

export function DashboardTabs({ current, search }: { current: DashboardName; search: string }) {
  const tabs = [...DASHBOARD_TABS, { name: "trail-graph" as const, label: LABELS.dashboard["trail-graph"] }];
  return (
    <nav aria-label="Dashboards" className="flex flex-wrap gap-2 border-b border-rule pb-2">
      {tabs.map((t) => (
        <Link
          key={t.name}
          href={`${t.name === "trail-graph" ? "/trails" : `/dashboards/${t.name}`}${search ? `?${search}` : ""}`}
          aria-current={t.name === current ? "page" : undefined}
          className={`rounded px-3 py-1 ${t.name === current ? "bg-ink text-paper" : "hover:bg-paper-2"}`}
        >
          {t.label}
        </Link>
      ))}
    </nav>
  );
}
