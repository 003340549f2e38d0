"use client";
import Link from "next/link";
import { useRouter, useSearchParams } from "next/navigation";
import { LABELS, formatValue, labelOf, plural, type DashboardName } from "@/lib/vocabulary";
import { DataTable } from "./data-table";
import { useDashboard, type ShownPractice } from "./use-dashboard";
import { ShareLineChart, SimpleBarChart, SourcingByYearChart, type BarSeries } from "./charts";
import type { Row } from "@/lib/dashboards/csv";
import { EmptyState } from "@/components/ui/empty-state";
import { TrailGraph, type TrailGraphData } from "@/components/trails/trail-graph";

// Where a trail ends, in the vocabulary's words. The last three are rare (a cycle, the depth limit, a
// statement whose trail is not built yet) and share one bar segment; the table keeps them apart.
const END_SERIES: BarSeries[] = [
  { key: "methods_source_share", label: LABELS.trailEnd.methods_source, color: "var(--ink)", pattern: "solid" },
  {
    key: "empirical_precedent_share",
    label: LABELS.trailEnd.empirical_precedent,
    color: "var(--accent)",
    pattern: "solid",
  },
  { key: "unclassified_share", label: LABELS.trailEnd.unclassified, color: "var(--accent)", pattern: "lines" },
  { key: "unresolved_share", label: LABELS.trailEnd.unresolved, color: "var(--ink-2)", pattern: "dots" },
  { key: "no_citation_share", label: LABELS.trailEnd.no_citation, color: "var(--rule)", pattern: "solid" },
  {
    key: "other_share",
    label: `${LABELS.trailEnd.cycle}, ${LABELS.trailEnd.depth_limit.toLowerCase()} or not built yet`,
    color: "var(--paper-2)",
    pattern: "cross",
  },
];
const withOtherEnds = (rows: Row[]) =>
  rows.map((r) => ({
    ...r,
    other_share: Number(r.cycle_share ?? 0) + Number(r.depth_limit_share ?? 0) + Number(r.not_built_share ?? 0),
  }));
const LENGTH_SERIES: BarSeries[] = [{ key: "statements", label: "statements", color: "var(--ink-2)" }];
const VENUE_SERIES: BarSeries[] = [
  { key: "rate", label: "articles asserting it", color: "var(--ink)", pattern: "solid" },
  { key: "in_venue_share", label: "in-venue precedent", color: "var(--accent)", pattern: "lines" },
];

export function DashboardView({ name }: { name: DashboardName }) {
  const sp = useSearchParams();
  const router = useRouter();
  const search = sp.toString();
  const q = useDashboard(name, search);
  if (q.isPending)
    return (
      <p role="status" className="mt-6 text-ink-2">
        Loading the dashboard…
      </p>
    );
  if (q.isError)
    return (
      <p role="alert" className="mt-6 text-accent">
        {q.error.message} Change a filter or reload the page.
      </p>
    );
  const d = q.data;
  if (!d.practice)
    return (
      <EmptyState title="No practice to show yet" action={{ href: "/practices", label: "Define a practice" }}>
        Dashboards follow a practice. Define one, or clear the statistic filter.
      </EmptyState>
    );
  const csv = (table: string) => `/api/dashboards/${name}?${search ? `${search}&` : ""}format=csv&table=${table}`;
  const openTrails = (year?: number) => {
    const next = new URLSearchParams(search);
    next.set("practice", d.practice!.id);
    if (year) {
      next.set("from", String(year));
      next.set("to", String(year));
    }
    router.push(`/trails?${next.toString()}`);
  };
  const nothing = Object.values(d.tables).every((t) => t.rows.length === 0);
  return (
    <div className="mt-4 space-y-6">
      <div>
        <h2 className="text-lg font-semibold">{d.practice.label}</h2>
        <p className="text-sm text-ink-2" data-testid="practice-shown">
          {shownBecause(d.practice, sp.get("practice") === d.practice.id, !!sp.get("statistic"))}
        </p>
      </div>
      {d.notes.map((n) => (
        <p key={n} className="text-ink-2">
          {n}
        </p>
      ))}
      {nothing && (
        <EmptyState title="Nothing matches these filters">
          Widen the years or venues, or choose another practice.
        </EmptyState>
      )}
      {name === "practice-over-time" && d.tables.byYear.rows.length > 0 && (
        <section aria-labelledby="c1">
          <h3 id="c1" className="font-medium">
            Share of articles asserting it, by sourcing (click a year to see its trails)
          </h3>
          <SourcingByYearChart rows={d.tables.byYear.rows} onYear={openTrails} />
          <ShareLineChart rows={d.tables.byYear.rows} />
          <DataTable id="table-byYear" table={d.tables.byYear} csvHref={csv("byYear")} />
          {d.tables.trend && <DataTable id="table-trend" table={d.tables.trend} csvHref={csv("trend")} />}
        </section>
      )}
      {name === "trail-ends" && (
        <>
          <section aria-labelledby="c2a">
            <h3 id="c2a" className="font-medium">
              Where trails end, by year
            </h3>
            <SimpleBarChart
              rows={withOtherEnds(d.tables.ends.rows)}
              series={END_SERIES}
              indexBy="year"
              percent
              axisLabel="share of statements"
            />
            <DataTable id="table-ends" table={d.tables.ends} csvHref={csv("ends")} />
          </section>
          <section aria-labelledby="c2b">
            <h3 id="c2b" className="font-medium">
              Trail lengths
            </h3>
            <SimpleBarChart
              rows={d.tables.lengths.rows}
              series={LENGTH_SERIES}
              indexBy="length"
              axisLabel="statements"
            />
            <DataTable id="table-lengths" table={d.tables.lengths} csvHref={csv("lengths")} />
          </section>
          <section aria-labelledby="c2c">
            <h3 id="c2c" className="font-medium">
              Most cited sources and how often a page is given
            </h3>
            <ol className="list-decimal pl-6 text-sm">
              {d.tables.sources.rows.map((r) => (
                <li key={String(r.work_id)}>
                  <Link className="underline" href={`/works/${r.work_id}`}>
                    {String(r.title ?? r.first_author ?? "Untitled work")}
                  </Link>{" "}
                  ({String(r.year ?? "n.d.")}, {labelOf("workType", String(r.work_type)).toLowerCase()}):{" "}
                  {plural(Number(r.citations), "citation")}, {Math.round(Number(r.locator_rate) * 100)}% with a page
                </li>
              ))}
            </ol>
            <DataTable id="table-sources" table={d.tables.sources} csvHref={csv("sources")} />
          </section>
          <button type="button" className="rounded bg-ink px-3 py-1.5 text-paper" onClick={() => openTrails()}>
            Open the trail graph
          </button>
        </>
      )}
      {name === "venues" && (
        <section aria-labelledby="c4">
          <h3 id="c4" className="font-medium">
            Venue rates and in-venue precedent (95% Wilson intervals in the table)
          </h3>
          <p className="text-sm text-ink-2">
            In-venue precedent: the share of a venue's citations for this practice that go to its own earlier articles
            (same venue, not published in a later year).
          </p>
          <SimpleBarChart
            rows={d.tables.venues.rows}
            series={VENUE_SERIES}
            indexBy="venue"
            percent
            mode="grouped"
            horizontal
          />
          <DataTable id="table-venues" table={d.tables.venues} csvHref={csv("venues")} />
        </section>
      )}
      {name === "drift" && (
        <section aria-labelledby="c5">
          <h3 id="c5" className="font-medium">
            Claims that differ from their checked source
          </h3>
          <ul className="space-y-3">
            {d.tables.drift.rows.map((r) => (
              <li key={`${r.statement_id}-${r.work_id}`} className="rounded border border-rule p-3">
                <p className="evidence">{String(r.sentence)}</p>
                <p className="text-sm text-ink-2">
                  Claims {num(r.claimed_value)};{" "}
                  <Link className="underline" href={`/works/${r.work_id}`}>
                    {String(r.work_title ?? "the source")}
                  </Link>{" "}
                  {r.verdict === "says_otherwise" ? LABELS.sourceCheckVerdict.says_otherwise.toLowerCase() : "states"}{" "}
                  {r.stated_value === null ? "" : num(r.stated_value)} (p. {String(r.page)}).{" "}
                  <Link className="underline" href={`/articles/${r.article_id}#statement-${r.statement_id}`}>
                    Read the sentence in its article
                  </Link>
                </p>
              </li>
            ))}
          </ul>
          <DataTable id="table-drift" table={d.tables.drift} csvHref={csv("drift")} />
        </section>
      )}
      {name === "trail-graph" && d.graph && (
        <section aria-labelledby="c3">
          <h3 id="c3" className="font-medium">
            Trails of this practice, ordered in time (left: older)
          </h3>
          <TrailGraph data={d.graph as TrailGraphData} />
          <DataTable id="table-edges" table={d.tables.edges} csvHref={csv("edges")} />
        </section>
      )}
    </div>
  );
}

const num = (v: unknown) => (v === null || v === undefined || v === "" ? "—" : formatValue(Number(v)));

/** Says which practice a dashboard shows and why, so a default is never mistaken for a choice. */
function shownBecause(p: ShownPractice, chosen: boolean, statistic: boolean): string {
  const n = p.matched === undefined ? "" : plural(p.matched, "statement");
  if (chosen) return `The practice you chose${n ? `: ${n} matched to it` : ""}.`;
  return `Shown because it is the most asserted practice${statistic ? " of this statistic" : ""}${n ? ` (${n} matched to it)` : ""}. Choose another in the filters above.`;
}
