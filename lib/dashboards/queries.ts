import { TRAIL_ENDS } from "@/lib/vocabulary";
import { sql } from "kysely";
import type { DB } from "@/db";
import { wilson, newcombeDifference, cochranArmitage } from "@/lib/stats";
import { countWhere, factWhere, framingKey, practiceCte, type Filters, type PracticeRef } from "./filters";
import type { Row } from "./csv";

export interface Table {
  title: string;
  columns: string[];
  rows: Row[];
}
export interface Dashboard {
  practice: PracticeRef | null;
  tables: Record<string, Table>;
  /** Sentences for the page (trend test in words and figures, cautions). */
  notes: string[];
}

const SOURCING_BY_RANK = ["cited_with_locator", "cited_no_locator", "secondary_only", "unsourced"] as const;
const r4 = (x: number) => (Number.isFinite(x) ? Math.round(x * 10000) / 10000 : null);
const empty = (practice: PracticeRef | null, tables: Record<string, Table>): Dashboard => ({
  practice,
  tables,
  notes: [],
});

/**
 * Dashboard 1. Per year, the share of eligible articles that assert the practice, split by how the
 * article sources it. An article with several statements of the practice counts once, under its
 * firmest sourcing (with locator > without locator > second-hand only > unsourced), so the split
 * adds up to the asserting share.
 */
/**
 * The chart's one statement: the practice, eligible articles per year, and asserting articles per
 * year and firmest sourcing rank (from the roll-up dash_article_rank_counts).
 */
export function practiceOverTimeSql(f: Filters) {
  return sql<{
    practice: PracticeRef | null;
    counts: { year: number; n: number }[];
    arts: { year: number; rank: number; n: number }[];
  }>`
    with ${practiceCte(f)},
    counts as (select year, sum(n)::int as n from dash_article_counts where true ${countWhere(f)} group by year),
    arts as (select year, rank, sum(n)::int as n from dash_article_rank_counts
      where practice_id = (select id from p) and framing_key = ${framingKey(f)} ${countWhere(f)} group by year, rank)
    select (select row_to_json(p) from p) as practice,
      coalesce((select json_agg(json_build_object('year', year, 'n', n) order by year) from counts), '[]') as counts,
      coalesce((select json_agg(json_build_object('year', year, 'rank', rank, 'n', n)) from arts), '[]') as arts`;
}

export async function practiceOverTime(db: DB, f: Filters): Promise<Dashboard> {
  const { practice, counts, arts } = (await practiceOverTimeSql(f).execute(db)).rows[0];
  const columns = [
    "year",
    "articles",
    "asserting",
    "share",
    "share_lower",
    "share_upper",
    ...SOURCING_BY_RANK.flatMap((s) => [s, `${s}_share`, `${s}_lower`, `${s}_upper`]),
  ];
  const table: Table = { title: "Share of articles asserting the practice, by year and sourcing", columns, rows: [] };
  if (!practice) return empty(null, { byYear: table });
  const byYear = new Map<number, number[]>();
  for (const r of arts) {
    const v = byYear.get(r.year) ?? [0, 0, 0, 0];
    v[r.rank - 1] += r.n;
    byYear.set(r.year, v);
  }
  for (const c of counts) {
    const v = byYear.get(c.year) ?? [0, 0, 0, 0];
    const asserting = v.reduce((a, b) => a + b, 0);
    const w = wilson(asserting, c.n);
    const row: Row = {
      year: c.year,
      articles: c.n,
      asserting,
      share: r4(w.p),
      share_lower: r4(w.lower),
      share_upper: r4(w.upper),
    };
    SOURCING_BY_RANK.forEach((s, i) => {
      const ws = wilson(v[i], c.n);
      row[s] = v[i];
      row[`${s}_share`] = r4(ws.p);
      row[`${s}_lower`] = r4(ws.lower);
      row[`${s}_upper`] = r4(ws.upper);
    });
    table.rows.push(row);
  }
  const notes: string[] = [];
  const groups = table.rows
    .filter((r) => Number(r.articles) > 0)
    .map((r) => ({ score: Number(r.year), cases: Number(r.asserting), total: Number(r.articles) }));
  let trend: Table | null = null;
  if (groups.length >= 2) {
    const t = cochranArmitage(groups);
    notes.push(
      `${t.describe({ over: "publication years" }).replace(/\.$/, "")}; Cochran–Armitage test for trend, year as score.`,
    );
    trend = {
      title: "Cochran–Armitage test for trend",
      columns: ["z", "chi_square", "p_value", "direction"],
      rows: [{ z: r4(t.z), chi_square: r4(t.chiSquare), p_value: r4(t.pValue), direction: t.direction }],
    };
  } else {
    notes.push("A test for trend needs articles from at least two years; widen the year filter.");
  }
  return { practice, tables: trend ? { byYear: table, trend } : { byYear: table }, notes };
}

// The trail ends of the vocabulary, plus the dashboards' own "trail not built yet".
export const END_KINDS = [...TRAIL_ENDS, "not_built"] as const;

type TopWork = {
  work_id: string;
  title: string | null;
  first_author: string | null;
  year: string | null;
  work_type: string;
  in_corpus: boolean;
  n: number;
  loc: number;
};

/**
 * A practice's most cited works (as CTE `top`: work_id, n, loc) under the filters. Without a venue
 * or year filter this reads the roll-up dash_work_counts (an index scan of `limit` rows); a venue or
 * year filter has to count the citation facts it keeps, since no smaller roll-up can answer it.
 * Ties are broken by work id in both paths, so they pick the same works.
 */
export function topWorksCte(f: Filters, limit: number) {
  if (!f.venues?.length && f.from === undefined && f.to === undefined) {
    return sql`top as (select work_id, n, loc from dash_work_counts
      where practice_id = (select id from p) and framing_key = ${framingKey(f)} order by n desc, work_id limit ${limit})`;
  }
  return sql`top as (select work_id, count(*)::int as n, (count(*) filter (where has_locator))::int as loc from dash_citation_facts
      where practice_id = (select id from p) and work_id is not null ${factWhere(f)}
      group by work_id order by n desc, work_id limit ${limit})`;
}

/** Dashboard 2 in one statement: ends per year, trail lengths, and the ten most cited sources. */
export function trailEndsSql(f: Filters) {
  return sql<{
    practice: PracticeRef | null;
    by_end: { year: number; end_kind: string; n: number }[];
    by_length: { length: number; n: number }[];
    top: TopWork[];
  }>`
    with ${practiceCte(f)},
    s as (select year, end_kind, trail_length, sum(n)::int as n from dash_statement_counts
      where practice_id = (select id from p) ${factWhere(f)} group by 1, 2, 3),
    ${topWorksCte(f, 10)}
    select (select row_to_json(p) from p) as practice,
      coalesce((select json_agg(json_build_object('year', year, 'end_kind', end_kind, 'n', n) order by year, end_kind)
        from (select year, end_kind, sum(n)::int as n from s group by 1, 2) x), '[]') as by_end,
      coalesce((select json_agg(json_build_object('length', trail_length, 'n', n) order by trail_length)
        from (select trail_length, sum(n)::int as n from s where trail_length is not null group by 1) x), '[]') as by_length,
      coalesce((select json_agg(json_build_object('work_id', t.work_id, 'title', w.title, 'first_author', w.first_author, 'year', w.year,
          'work_type', w.work_type, 'in_corpus', w.article_id is not null, 'n', t.n, 'loc', t.loc) order by t.n desc, t.work_id)
        from top t join works w on w.id = t.work_id), '[]') as top`;
}

/** Dashboard 2. Where the practice's trails end per year, trail lengths, and its most cited sources. */
export async function trailEnds(db: DB, f: Filters): Promise<Dashboard> {
  const { practice, by_end: byEnd, by_length: byLength, top } = (await trailEndsSql(f).execute(db)).rows[0];
  const endCols = ["year", "statements", ...END_KINDS.flatMap((k) => [k, `${k}_share`])];
  const ends: Table = {
    title: "Where trails end, by year (share of the practice's statements)",
    columns: endCols,
    rows: [],
  };
  const lengths: Table = { title: "Trail length (citation hops)", columns: ["length", "statements"], rows: [] };
  const sources: Table = {
    title: "Most cited sources for the practice",
    columns: [
      "work_id",
      "title",
      "first_author",
      "year",
      "work_type",
      "in_corpus",
      "citations",
      "with_locator",
      "locator_rate",
      "locator_lower",
      "locator_upper",
    ],
    rows: [],
  };
  if (!practice) return empty(null, { ends, lengths, sources });
  const years = new Map<number, Record<string, number>>();
  for (const r of byEnd) {
    const m = years.get(r.year) ?? {};
    m[r.end_kind] = (m[r.end_kind] ?? 0) + r.n;
    years.set(r.year, m);
  }
  for (const [year, m] of [...years.entries()].sort((a, b) => a[0] - b[0])) {
    const total = Object.values(m).reduce((a, b) => a + b, 0);
    const row: Row = { year, statements: total };
    for (const k of END_KINDS) {
      row[k] = m[k] ?? 0;
      row[`${k}_share`] = r4((m[k] ?? 0) / total);
    }
    ends.rows.push(row);
  }
  lengths.rows = byLength.map((r) => ({ length: r.length, statements: r.n }));
  sources.rows = top.map((r) => {
    const w = wilson(r.loc, r.n);
    return {
      work_id: r.work_id,
      title: r.title,
      first_author: r.first_author,
      year: r.year,
      work_type: r.work_type,
      in_corpus: r.in_corpus,
      citations: r.n,
      with_locator: r.loc,
      locator_rate: r4(w.p),
      locator_lower: r4(w.lower),
      locator_upper: r4(w.upper),
    };
  });
  return { practice, tables: { ends, lengths, sources }, notes: [] };
}

/**
 * Dashboard 4. Each venue's share of articles asserting the practice, and its in-venue precedent:
 * the share of its citations for the practice that go to its own earlier articles (same venue, not published
 * in a later year). Each venue is compared with the rest of the corpus (the other venues pooled) by Newcombe's hybrid interval.
 */
type VenueCounts = {
  venue_id: string;
  venue: string;
  is_methods_venue: boolean;
  articles: number;
  asserting: number;
  citations: number;
  in_venue: number;
};

/** Dashboard 4 in one statement, over the roll-ups (articles, asserting articles, citations). */
export function venueComparisonSql(f: Filters) {
  return sql<{ practice: PracticeRef | null; venues: VenueCounts[] }>`
    with ${practiceCte(f)},
    c as (select venue_id, sum(n)::int as n from dash_article_counts where venue_id is not null ${countWhere(f)} group by venue_id),
    a as (select venue_id, sum(n)::int as n from dash_article_rank_counts
      where practice_id = (select id from p) and framing_key = ${framingKey(f)} ${countWhere(f)} group by venue_id),
    pc as (select venue_id, sum(n)::int as n, sum(own)::int as own from dash_citation_counts
      where practice_id = (select id from p) ${factWhere(f)} group by venue_id)
    select (select row_to_json(p) from p) as practice,
      coalesce((select json_agg(json_build_object('venue_id', v.id, 'venue', v.name, 'is_methods_venue', v.is_methods_venue, 'articles', c.n,
          'asserting', coalesce(a.n, 0), 'citations', coalesce(pc.n, 0), 'in_venue', coalesce(pc.own, 0)) order by v.name)
        from c join venues v on v.id = c.venue_id left join a on a.venue_id = c.venue_id left join pc on pc.venue_id = c.venue_id), '[]') as venues`;
}

export async function venueComparison(db: DB, f: Filters): Promise<Dashboard> {
  const { practice, venues } = (await venueComparisonSql(f).execute(db)).rows[0];
  const table: Table = {
    title: "Venues: share of articles asserting the practice, and in-venue precedent",
    columns: [
      "venue_id",
      "venue",
      "is_methods_venue",
      "articles",
      "asserting",
      "rate",
      "rate_lower",
      "rate_upper",
      "rate_vs_rest",
      "rate_vs_rest_lower",
      "rate_vs_rest_upper",
      "citations",
      "in_venue",
      "in_venue_share",
      "in_venue_lower",
      "in_venue_upper",
      "in_venue_vs_rest",
      "in_venue_vs_rest_lower",
      "in_venue_vs_rest_upper",
    ],
    rows: [],
  };
  if (!practice) return empty(null, { venues: table });
  const r = { rows: venues };
  const tot = r.rows.reduce(
    (s, x) => ({
      articles: s.articles + x.articles,
      asserting: s.asserting + x.asserting,
      citations: s.citations + x.citations,
      in_venue: s.in_venue + x.in_venue,
    }),
    { articles: 0, asserting: 0, citations: 0, in_venue: 0 },
  );
  for (const v of r.rows) {
    const rate = wilson(v.asserting, v.articles);
    const own = wilson(v.in_venue, v.citations);
    const restN = tot.articles - v.articles;
    const restC = tot.citations - v.citations;
    const d1 =
      v.articles > 0 && restN > 0
        ? newcombeDifference(v.asserting, v.articles, tot.asserting - v.asserting, restN)
        : null;
    const d2 =
      v.citations > 0 && restC > 0
        ? newcombeDifference(v.in_venue, v.citations, tot.in_venue - v.in_venue, restC)
        : null;
    table.rows.push({
      venue_id: v.venue_id,
      venue: v.venue,
      is_methods_venue: v.is_methods_venue,
      articles: v.articles,
      asserting: v.asserting,
      rate: r4(rate.p),
      rate_lower: r4(rate.lower),
      rate_upper: r4(rate.upper),
      rate_vs_rest: d1 ? r4(d1.difference) : null,
      rate_vs_rest_lower: d1 ? r4(d1.lower) : null,
      rate_vs_rest_upper: d1 ? r4(d1.upper) : null,
      citations: v.citations,
      in_venue: v.in_venue,
      in_venue_share: r4(own.p),
      in_venue_lower: r4(own.lower),
      in_venue_upper: r4(own.upper),
      in_venue_vs_rest: d2 ? r4(d2.difference) : null,
      in_venue_vs_rest_lower: d2 ? r4(d2.lower) : null,
      in_venue_vs_rest_upper: d2 ? r4(d2.upper) : null,
    });
  }
  return {
    practice,
    tables: { venues: table },
    notes: ["Differences compare a venue with all other venues pooled (Newcombe's hybrid score interval, 95%)."],
  };
}

export const DASHBOARDS = {
  "practice-over-time": practiceOverTime,
  "trail-ends": trailEnds,
  venues: venueComparison,
} as const;
export type DashboardName = keyof typeof DASHBOARDS;
