import { sql, type Kysely } from "kysely";

// Dashboards read pre-joined facts instead of joining 2M statements and 3M citations per request:
// the benchmark (tests/bench/dashboards.ts) showed the live joins far over the 150 ms target.
// The views are refreshed by the graph.refresh-summaries job after trails are rebuilt.
// Trails also get the two end kinds the trail builder reports (unclassified, depth_limit).
const ELIGIBLE = sql.raw(`a.status = 'done' and a.licence is not null and a.year is not null`);

export async function up(db: Kysely<unknown>): Promise<void> {
  await sql`
    alter table trails drop constraint trails_end_kind_check;
    alter table trails add constraint trails_end_kind_check check (end_kind in
      ('methods_source','empirical_precedent','unclassified','unresolved','no_citation','cycle','depth_limit'));
    create index works_normalised_title on works (normalised_title) where merged_into is null;
    create index references_unresolved on "references" (article_id) where work_id is null;
    create index citations_reference_article on citations (reference_id, article_id);

    create materialized view dash_article_counts as
      select a.venue_id, a.year, count(*)::int as n
      from articles a where ${ELIGIBLE}
      group by a.venue_id, a.year;
    create unique index dash_article_counts_key on dash_article_counts (venue_id, year) nulls not distinct;

    -- One row per (practice, statement): sourcing rank 1 = firmest (with locator) .. 4 = unsourced.
    create materialized view dash_statement_facts as
      select sp.practice_id, s.id as statement_id, s.article_id, a.venue_id, a.year, s.framing, s.sourcing,
        (case s.sourcing when 'cited_with_locator' then 1 when 'cited_no_locator' then 2
          when 'secondary_only' then 3 else 4 end)::smallint as sourcing_rank,
        t.end_kind, t.length as trail_length
      from statement_practices sp
      join statements s on s.id = sp.statement_id
      join articles a on a.id = s.article_id
      left join trails t on t.statement_id = sp.statement_id and t.practice_id = sp.practice_id
      where ${ELIGIBLE};
    create unique index dash_statement_facts_key on dash_statement_facts (practice_id, statement_id);
    create index dash_statement_facts_year on dash_statement_facts (practice_id, year, venue_id);

    -- One row per (practice, statement, in-text citation), with the cited work and, when that work
    -- is one of our articles, its venue (for in-venue precedent).
    create materialized view dash_citation_facts as
      select sp.practice_id, s.id as statement_id, s.article_id, a.venue_id, a.year, s.framing,
        c.id as citation_id, (c.locator is not null) as has_locator, c.secondary,
        r.work_id, ca.id as cited_article_id, ca.venue_id as cited_venue_id
      from statement_practices sp
      join statements s on s.id = sp.statement_id
      join articles a on a.id = s.article_id
      join statement_citations sc on sc.statement_id = s.id
      join citations c on c.id = sc.citation_id
      left join "references" r on r.id = c.reference_id
      left join works w on w.id = r.work_id
      left join articles ca on ca.id = w.article_id
      where ${ELIGIBLE};
    create unique index dash_citation_facts_key on dash_citation_facts (practice_id, statement_id, citation_id);
    create index dash_citation_facts_year on dash_citation_facts (practice_id, year, venue_id);
  `.execute(db);
}

export async function down(db: Kysely<unknown>): Promise<void> {
  await sql`
    drop materialized view dash_citation_facts, dash_statement_facts, dash_article_counts;
    drop index citations_reference_article, references_unresolved, works_normalised_title;
    alter table trails drop constraint trails_end_kind_check;
    alter table trails add constraint trails_end_kind_check check (end_kind in
      ('methods_source','empirical_precedent','unresolved','no_citation','cycle'));
  `.execute(db);
}
