import { Suspense } from "react";
import { requirePage } from "@/lib/server/session";
import { getDb } from "@/db";
import { listVenues } from "@/db/queries/venues";
import { DashboardTabs } from "@/components/dashboards/dashboard-tabs";
import { FiltersBar } from "@/components/dashboards/filters-bar";
import { DashboardView } from "@/components/dashboards/dashboard-view";

export default async function PracticeTrailsPage({ searchParams }: { searchParams: Promise<Record<string, string>> }) {
  await requirePage("corpus:read");
  const search = new URLSearchParams(await searchParams).toString();
  const venues = await listVenues(getDb());
  return (
    <div className="space-y-4">
      <h1 className="font-serif text-3xl font-semibold">Trail graph of a practice</h1>
      <DashboardTabs current="trail-graph" search={search} />
      <Suspense fallback={<p role="status">Loading…</p>}>
        <FiltersBar venues={venues} />
        <DashboardView name="trail-graph" />
      </Suspense>
    </div>
  );
}
