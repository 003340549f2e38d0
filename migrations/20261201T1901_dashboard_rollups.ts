import { sql, type Kysely } from "kysely";

// A second level of pre-aggregation over the dashboard fact views. The bench at 100,000 articles
// (tests/bench/dashboards.ts) measured 55–150 ms per chart query when grouping a practice's 80,000
// statement facts and 96,000 citation facts per request. These roll-ups are keyed by exactly the
// dimensions the filters can cut (practice, venue, year, framing), so a chart sums a few hundred
// rows and still gives the same answer under any filter. Refreshed right after the fact views by
// lib/graph/summaries.ts.
//
// framing_key is '*' for "any framing" beside one row set per framing: an article counts once
// under its firmest sourcing, and which statement is firmest depends on the framing filter, so the
// article-level counts cannot be summed across framings.
export async function up(db: Kysely<unknown>): Promise<void> {
  await sql`
    create materialized view dash_article_rank_counts as
      select practice_id, venue_id, year, '*'::text as framing_key, rank, count(*)::int as n
      from (select practice_id, article_id, venue_id, year, min(sourcing_rank) as rank
            from dash_statement_facts group by practice_id, article_id, venue_id, year) a
      group by 1, 2, 3, 4, 5
      union all
      select practice_id, venue_id, year, framing, rank, count(*)::int
      from (select practice_id, article_id, venue_id, year, framing, min(sourcing_rank) as rank
            from dash_statement_facts where framing is not null group by practice_id, article_id, venue_id, year, framing) a
      group by 1, 2, 3, 4, 5;
    create unique index dash_article_rank_counts_key on dash_article_rank_counts (practice_id, framing_key, year, venue_id, rank) nulls not distinct;

    -- Statements by where their trail ends and its length: additive, so framing stays a plain column.
    create materialized view dash_statement_counts as
      select practice_id, venue_id, year, framing, coalesce(end_kind, 'not_built') as end_kind, trail_length, count(*)::int as n
      from dash_statement_facts group by 1, 2, 3, 4, 5, 6;
    create unique index dash_statement_counts_key on dash_statement_counts (practice_id, year, venue_id, framing, end_kind, trail_length) nulls not distinct;

    -- Citations per venue and year, and those to an earlier article of the same venue.
    create materialized view dash_citation_counts as
      select practice_id, venue_id, year, framing, count(*)::int as n,
        (count(*) filter (where cited_venue_id = venue_id and cited_article_id <> article_id))::int as own
      from dash_citation_facts group by 1, 2, 3, 4;
    create unique index dash_citation_counts_key on dash_citation_counts (practice_id, year, venue_id, framing) nulls not distinct;

    -- Citations per cited work over all venues and years (any framing, and per framing): the most
    -- cited sources without a venue or year filter become an index scan of ten rows. With a venue
    -- or year filter the dashboards fall back to dash_citation_facts, since (work × venue × year)
    -- is about as large as the facts themselves.
    create materialized view dash_work_counts as
      select practice_id, '*'::text as framing_key, work_id, count(*)::int as n, (count(*) filter (where has_locator))::int as loc
      from dash_citation_facts where work_id is not null group by 1, 3
      union all
      select practice_id, framing, work_id, count(*)::int, (count(*) filter (where has_locator))::int
      from dash_citation_facts where work_id is not null and framing is not null group by 1, 2, 3;
    create unique index dash_work_counts_key on dash_work_counts (practice_id, framing_key, work_id);
    create index dash_work_counts_top on dash_work_counts (practice_id, framing_key, n desc, work_id);

    -- The trail graph looks up the citations of a practice to its top works.
    create index dash_citation_facts_work on dash_citation_facts (practice_id, work_id);
  `.execute(db);
}

export async function down(db: Kysely<unknown>): Promise<void> {
  await sql`
    drop index dash_citation_facts_work;
    drop materialized view dash_work_counts, dash_citation_counts, dash_statement_counts, dash_article_rank_counts;
  `.execute(db);
}
