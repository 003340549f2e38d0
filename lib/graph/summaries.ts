import { sql } from "kysely";
import type { DB } from "@/db";

/**
 * Refreshes the dashboard views. CONCURRENTLY keeps dashboards readable during the refresh (it needs
 * the unique indexes the migration made); a never-populated view cannot be refreshed concurrently.
 */
export async function refreshSummaries(db: DB, opts: { concurrently?: boolean } = {}): Promise<void> {
  const c = opts.concurrently ?? true;
  for (const view of ["dash_article_counts", "dash_statement_facts", "dash_citation_facts"]) {
    const populated = await sql<{ p: boolean }>`select ispopulated as p from pg_matviews where matviewname = ${view}`.execute(db);
    const conc = c && populated.rows[0]?.p ? sql.raw(" concurrently") : sql.raw("");
    await sql`refresh materialized view${conc} ${sql.table(view)}`.execute(db);
  }
}
