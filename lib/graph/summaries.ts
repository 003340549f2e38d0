import { sql } from "kysely";
import type { DB } from "@/db";

// Fact views first, then the roll-ups built from them (migration 20261201T1901_dashboard_rollups):
// the order matters, a roll-up refreshed before its facts would show the previous state.
export const SUMMARY_VIEWS = [
  "dash_article_counts",
  "dash_statement_facts",
  "dash_citation_facts",
  "dash_article_rank_counts",
  "dash_statement_counts",
  "dash_citation_counts",
  "dash_work_counts",
] as const;

/**
 * Refreshes the dashboard views. CONCURRENTLY keeps dashboards readable during the refresh (it needs
 * the unique indexes the migrations made); a never-populated view cannot be refreshed concurrently.
 * `timings`, when given, receives the seconds each view took (the benchmark reports them).
 */
export async function refreshSummaries(
  db: DB,
  opts: { concurrently?: boolean; timings?: Record<string, number> } = {},
): Promise<void> {
  const c = opts.concurrently ?? true;
  const took = opts.timings ?? {};
  for (const view of SUMMARY_VIEWS) {
    const started = performance.now();
    const populated = await sql<{
      p: boolean;
    }>`select ispopulated as p from pg_matviews where matviewname = ${view}`.execute(db);
    const conc = c && populated.rows[0]?.p ? sql.raw(" concurrently") : sql.raw("");
    await sql`refresh materialized view${conc} ${sql.table(view)}`.execute(db);
    took[view] = (performance.now() - started) / 1000;
  }
  // A refreshed view has no visibility map and stale statistics until autovacuum comes round:
  // index-only scans (the covering index of the top-works fallback) and good plans need both now.
  const started = performance.now();
  await sql`vacuum (analyze) ${sql.raw(SUMMARY_VIEWS.join(", "))}`.execute(db);
  took.vacuum_analyze = (performance.now() - started) / 1000;
}
