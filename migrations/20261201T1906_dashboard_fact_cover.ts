import { sql, type Kysely } from "kysely";

// With a venue or year filter, the most cited works are counted from dash_citation_facts (no
// roll-up is smaller than the facts for work × venue × year). At 100,000 articles a year-only
// filter kept 100,000 facts of one practice and the heap fetches alone took ~70 ms; covering the
// filter columns plus work_id and has_locator makes it an index-only scan (measured 123 → 68 ms),
// which lib/graph/summaries.ts keeps possible by vacuuming the views after each refresh.
export async function up(db: Kysely<unknown>): Promise<void> {
  await sql`create index dash_citation_facts_year_cover on dash_citation_facts (practice_id, year, venue_id, framing) include (work_id, has_locator)`.execute(
    db,
  );
}

export async function down(db: Kysely<unknown>): Promise<void> {
  await sql`drop index dash_citation_facts_year_cover`.execute(db);
}
