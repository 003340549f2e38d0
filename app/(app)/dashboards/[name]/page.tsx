import { Suspense } from "react";
import { notFound } from "next/navigation";
import { requirePage } from "@/lib/server/session";
import { getDb } from "@/db";
import { listVenues } from "@/db/queries/venues";
import { DashboardTabs, DASHBOARD_TABS } from "@/components/dashboards/dashboard-tabs";
import { FiltersBar } from "@/components/dashboards/filters-bar";
import { DashboardView } from "@/components/dashboards/dashboard-view";

export default async function DashboardPage({
  params,
  searchParams,
}: {
  params: Promise<{ name: string }>;
  searchParams: Promise<Record<string, string>>;
}) {
  await requirePage("corpus:read");
  const { name } = await params;
  const tab = DASHBOARD_TABS.find((t) => t.name === name);
  if (!tab) notFound();
  const search = new URLSearchParams(await searchParams).toString();
  const venues = await listVenues(getDb());
  return (
    <div className="space-y-4">
      <h1 className="font-serif text-3xl font-semibold">{tab.label}</h1>
      <DashboardTabs current={tab.name} search={search} />
      <p className="text-sm text-ink-2">
        These figures report practice; they do not set standards. Flags are screening aids: read the article before
        acting on one.
      </p>
      <Suspense fallback={<p role="status">Loading filters…</p>}>
        <FiltersBar venues={venues} />
        <DashboardView name={tab.name} />
      </Suspense>
    </div>
  );
}
