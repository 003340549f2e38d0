import { sql, type Kysely } from "kysely";

// In-venue precedent is a citation to the venue's own EARLIER articles. The roll-up counted any
// other article of the same venue, so a citation to a later-published one (an online-first paper,
// a misdated reference resolved to the wrong work) inflated it. Articles carry a year only, so a
// cited article of the same year counts (issue order within a year is not known); a later one
// does not. The cited article's year comes from articles at refresh time; the fact views stay as they are.
const VIEW = (notLater: boolean) => sql`
  create materialized view dash_citation_counts as
    select f.practice_id, f.venue_id, f.year, f.framing, count(*)::int as n,
      (count(*) filter (where f.cited_venue_id = f.venue_id and f.cited_article_id <> f.article_id
        ${notLater ? sql`and ca.year <= f.year` : sql``}))::int as own
    from dash_citation_facts f
    left join articles ca on ca.id = f.cited_article_id
    group by 1, 2, 3, 4;
  create unique index dash_citation_counts_key on dash_citation_counts (practice_id, year, venue_id, framing) nulls not distinct`;

export async function up(db: Kysely<unknown>): Promise<void> {
  await sql`drop materialized view dash_citation_counts`.execute(db);
  await VIEW(true).execute(db);
}

export async function down(db: Kysely<unknown>): Promise<void> {
  await sql`drop materialized view dash_citation_counts`.execute(db);
  await VIEW(false).execute(db);
}
