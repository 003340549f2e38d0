/**
 * npm run bench:dashboards — synthetic corpus of 100,000 articles, 2,000,000 statements and
 * 3,000,000 in-text citations generated straight into PostgreSQL (generate_series, in a database of
 * its own on the private test cluster), then:
 *   - trail building for every practice of the corpus (lib/graph/trails, the code the job runs);
 *   - each dashboard as an HTTP GET on loopback (the same lib/dashboards code the route handlers call,
 *     served by node:http so sign-in is not part of the figure) vs the same chart's SQL run directly;
 *   - the live SQL over the base tables, which is what the summary views replace.
 * BENCH_SCALE=0.1 makes a tenth-size run for a quick check.
 */
import http from "node:http";
import pg from "pg";
import type { Kysely } from "kysely";
import { sql } from "kysely";
import { up, databaseUrl } from "@/db/cluster";
import { createDb, type DB } from "@/db";
import { migrateToLatest } from "@/db/migrate";
import { seedPractices } from "@/lib/graph/seed";
import { rebuildPracticeTrails } from "@/lib/graph/trails";
import { refreshSummaries } from "@/lib/graph/summaries";
import { dashboardData, filtersSchema, isDashboardName } from "@/lib/dashboards";

const SCALE = Number(process.env.BENCH_SCALE ?? 1);
const ARTICLES = Math.round(100_000 * SCALE);
const STATEMENTS_PER_ARTICLE = 20; // 2,000,000 statements
const CITATIONS_PER_ARTICLE = 30; // 3,000,000 citations
const REFS_PER_ARTICLE = 15;
const OUTSIDE_WORKS = Math.round(20_000 * SCALE);
const VENUES = 40;
const PRACTICES_USED = 10;
const REPEAT = Number(process.env.BENCH_REPEAT ?? 40);
const NAME = "echoline_bench";

const t0 = () => process.hrtime.bigint();
const ms = (since: bigint) => Number(process.hrtime.bigint() - since) / 1e6;
const log = (s: string) => console.error(`[bench] ${s}`);

async function freshDatabase(): Promise<DB> {
  up("test");
  const admin = new pg.Client({ connectionString: databaseUrl("test", "postgres") });
  await admin.connect();
  await admin.query(`drop database if exists ${NAME} with (force)`);
  await admin.query(`create database ${NAME}`);
  await admin.end();
  const db = createDb(databaseUrl("test", NAME), 8);
  await migrateToLatest(db as unknown as Kysely<unknown>);
  return db;
}

async function generate(db: DB): Promise<void> {
  const step = async (label: string, q: ReturnType<typeof sql>) => {
    const s = t0();
    await q.execute(db);
    log(`${label}: ${(ms(s) / 1000).toFixed(1)} s`);
  };
  await seedPractices(db);
  await step("venues", sql`insert into venues (name, is_methods_venue) select 'Synthetic venue ' || v, v <= 4 from generate_series(1, ${VENUES}) v`);
  await step("practices used", sql`create table bench_practices as select (row_number() over (order by key)) - 1 as idx, id, statistic, comparator, value, framing from practices where key in (select key from practices order by key limit ${PRACTICES_USED})`);
  await step("stored files", sql`insert into stored_files (sha256, size_bytes, media_type, storage_key) select md5('f'||a) || md5('g'||a), 1, 'text/plain', 'bench' from generate_series(1, ${ARTICLES}) a`);
  // Years rise with the article number, so an article cites earlier ones.
  await step("articles", sql`
    insert into articles (id, file_sha256, original_filename, source_kind, venue_id, year, title, authors, licence, status)
    select md5('a'||a)::uuid, md5('f'||a) || md5('g'||a), 'a'||a||'.txt', 'text', v.id, 1995 + (a * 30) / (${ARTICLES} + 1),
      'Synthetic study ' || a, jsonb_build_array('Author' || (a % 5000) || ', A.'), 'CC-BY-4.0', 'done'
    from generate_series(1, ${ARTICLES}) a
    join (select id, row_number() over (order by name) - 1 as k from venues) v on v.k = a % ${VENUES}`);
  await step("works (corpus + outside)", sql`
    insert into works (id, title, first_author, year, kind, work_type, type_decided_by, article_id)
    select md5('wa'||a)::uuid, 'Synthetic study ' || a, 'author' || (a % 5000), (1995 + (a * 30) / (${ARTICLES} + 1))::text, 'article',
      case when a % ${VENUES} < 4 then 'methods_source' else 'empirical' end, 'venue', md5('a'||a)::uuid
    from generate_series(1, ${ARTICLES}) a
    union all
    select md5('wo'||o)::uuid, 'Outside work ' || o, 'outside' || o, (1960 + o % 40)::text, case when o % 4 = 0 then 'book' else 'article' end,
      case when o % 4 = 0 then 'methods_source' when o % 4 = 1 then 'empirical' else 'unknown' end, 'default', null
    from generate_series(1, ${OUTSIDE_WORKS}) o`);
  // 60% of references cite an earlier corpus article, the rest an outside work.
  await step("references", sql`
    insert into "references" (id, article_id, ordinal, raw, year, title, kind, work_id)
    select md5('r'||a||'-'||r)::uuid, md5('a'||a)::uuid, r, 'ref', null, null, 'article',
      case when r < 9 and a > 1 then md5('wa'|| (1 + floor(random() * (a - 1))::int))::uuid
           else md5('wo'|| (1 + (a * 7 + r) % ${OUTSIDE_WORKS}))::uuid end
    from generate_series(1, ${ARTICLES}) a, generate_series(0, ${REFS_PER_ARTICLE - 1}) r`);
  await step("citations (3M at full size)", sql`
    insert into citations (id, article_id, ordinal, sentence, authors, year, locator, secondary, reference_id)
    select md5('c'||a||'-'||o)::uuid, md5('a'||a)::uuid, o, 's', 'Author', '2000',
      case when (a + o) % 3 = 0 then 'p. 12' end, (a + o) % 23 = 0, md5('r'||a||'-'||(o % ${REFS_PER_ARTICLE}))::uuid
    from generate_series(1, ${ARTICLES}) a, generate_series(0, ${CITATIONS_PER_ARTICLE - 1}) o`);
  // Statements 0..7 of each article are thresholds of one of the practices; the rest reported values.
  await step("statements (2M at full size)", sql`
    insert into statements (id, article_id, ordinal, section, sentence, kind, statistic, comparator, value, framing, sourcing, fingerprint)
    select md5('s'||a||'-'||i)::uuid, md5('a'||a)::uuid, i, 'methods', 'Synthetic sentence', case when i < 8 then 'threshold' else 'reported' end,
      case when i < 8 then p.statistic end, case when i < 8 then p.comparator end, case when i < 8 then p.value else 0.81 end,
      case when i < 8 then coalesce(p.framing, 'fixed') end,
      case when i >= 8 or (a + i) % 5 = 0 then 'unsourced' when (a + i) % 3 = 0 then 'cited_with_locator' when (a + i) % 23 = 0 then 'secondary_only' else 'cited_no_locator' end,
      'fp' || i
    from generate_series(1, ${ARTICLES}) a cross join generate_series(0, ${STATEMENTS_PER_ARTICLE - 1}) i
    join bench_practices p on p.idx = (a + i * 3) % ${PRACTICES_USED}`);
  await step("statement practices", sql`
    insert into statement_practices (statement_id, practice_id)
    select md5('s'||a||'-'||i)::uuid, p.id from generate_series(1, ${ARTICLES}) a cross join generate_series(0, 7) i
    join bench_practices p on p.idx = (a + i * 3) % ${PRACTICES_USED}`);
  await step("statement citations", sql`
    insert into statement_citations (statement_id, citation_id)
    select md5('s'||a||'-'||i)::uuid, md5('c'||a||'-'||i)::uuid from generate_series(1, ${ARTICLES}) a, generate_series(0, 7) i where (a + i) % 5 <> 0
    union all
    select md5('s'||a||'-'||i)::uuid, md5('c'||a||'-'||(i + 15))::uuid from generate_series(1, ${ARTICLES}) a, generate_series(0, 7) i where (a + i) % 5 <> 0 and (a + i) % 2 = 0`);
  await step("analyze", sql`analyze`);
}

function quantile(xs: number[], q: number): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.ceil(q * s.length) - 1)];
}

async function time(n: number, fn: () => Promise<unknown>): Promise<{ p50: number; p95: number }> {
  for (let i = 0; i < 3; i++) await fn(); // warm the cache and the plan
  const xs: number[] = [];
  for (let i = 0; i < n; i++) {
    const s = t0();
    await fn();
    xs.push(ms(s));
  }
  return { p50: quantile(xs, 0.5), p95: quantile(xs, 0.95) };
}

async function main() {
  const total = t0();
  const db = await freshDatabase();
  await generate(db);
  const counts = await sql<{ a: number; s: number; c: number }>`select (select count(*) from articles) a, (select count(*) from statements) s, (select count(*) from citations) c`.execute(db);
  log(`corpus: ${JSON.stringify(counts.rows[0])}`);

  const practices = await db.selectFrom("bench_practices" as never).select(["id" as never]).execute() as unknown as { id: string }[];
  let s = t0();
  let trails = 0;
  for (const p of practices) trails += await rebuildPracticeTrails(db, p.id);
  const trailSeconds = ms(s) / 1000;
  log(`trails: ${trails} built for ${practices.length} practices in ${trailSeconds.toFixed(1)} s`);
  s = t0();
  await refreshSummaries(db, { concurrently: false });
  const refreshSeconds = ms(s) / 1000;
  log(`summary refresh: ${refreshSeconds.toFixed(1)} s`);
  await sql`analyze`.execute(db);

  const practice = practices[0].id;
  const venues = await db.selectFrom("venues").select("id").orderBy("name").limit(3).execute();
  const server = http.createServer(async (req, res) => {
    const url = new URL(req.url ?? "/", "http://x");
    const name = url.pathname.split("/").pop();
    const f = filtersSchema.safeParse(Object.fromEntries(url.searchParams));
    if (!isDashboardName(name) || !f.success) {
      res.writeHead(400).end();
      return;
    }
    const body = JSON.stringify(await dashboardData(db, name, f.data));
    res.writeHead(200, { "content-type": "application/json" }).end(body);
  });
  await new Promise<void>((r) => server.listen(0, "127.0.0.1", r));
  const port = (server.address() as { port: number }).port;
  const direct = new pg.Client({ connectionString: databaseUrl("test", NAME) });
  await direct.connect();

  // The best hand-written SQL for each chart: the same aggregate over the summary views, one round trip.
  const DIRECT: Record<string, string> = {
    "practice-over-time": `select year, rank, count(*) from (select year, article_id, min(sourcing_rank) rank from dash_statement_facts where practice_id = $1 group by 1, 2) a group by 1, 2`,
    "trail-ends": `select year, end_kind, count(*) from dash_statement_facts where practice_id = $1 group by 1, 2`,
    venues: `select venue_id, count(distinct article_id) from dash_statement_facts where practice_id = $1 group by 1`,
    "trail-graph": `select work_id, count(*) from dash_citation_facts where practice_id = $1 and work_id is not null group by 1 order by 2 desc limit 15`,
    drift: `select f.statement_id from dash_citation_facts f join source_checks sc on sc.work_id = f.work_id and sc.practice_id = f.practice_id where f.practice_id = $1 limit 500`,
  };
  const LIVE: Record<string, string> = {
    "practice-over-time": `select a.year, min(case s.sourcing when 'cited_with_locator' then 1 when 'cited_no_locator' then 2 when 'secondary_only' then 3 else 4 end), count(*) from statement_practices sp join statements s on s.id = sp.statement_id join articles a on a.id = s.article_id where sp.practice_id = $1 and a.status = 'done' and a.licence is not null group by a.year, a.id`,
  };
  const rows: string[] = [];
  const cases: { name: string; query: string }[] = [
    { name: "practice-over-time", query: `practice=${practice}` },
    { name: "practice-over-time", query: `practice=${practice}&venues=${venues.map((v) => v.id).join(",")}&from=2005&to=2020&framing=fixed` },
    { name: "trail-ends", query: `practice=${practice}` },
    { name: "venues", query: `practice=${practice}` },
    { name: "trail-graph", query: `practice=${practice}` },
    { name: "drift", query: `practice=${practice}` },
  ];
  rows.push("| dashboard route | filters | route p50 ms | route p95 ms | direct SQL p50 ms | direct SQL p95 ms | p95 ratio |");
  rows.push("|---|---|---|---|---|---|---|");
  for (const c of cases) {
    const route = await time(REPEAT, async () => {
      const r = await fetch(`http://127.0.0.1:${port}/api/dashboards/${c.name}?${c.query}`);
      if (!r.ok) throw new Error(`${c.name}: HTTP ${r.status}`);
      await r.arrayBuffer();
    });
    const d = await time(REPEAT, () => direct.query(DIRECT[c.name], [practice]));
    rows.push(`| ${c.name} | ${c.query.includes("venues") ? "3 venues, 2005–2020, fixed" : "none"} | ${route.p50.toFixed(1)} | ${route.p95.toFixed(1)} | ${d.p50.toFixed(1)} | ${d.p95.toFixed(1)} | ${(route.p95 / d.p95).toFixed(2)} |`);
    log(rows[rows.length - 1]);
  }
  const live = await time(5, () => direct.query(LIVE["practice-over-time"], [practice]));
  rows.push(`\nLive join over the base tables for practice-over-time (what the summary views replace): p50 ${live.p50.toFixed(0)} ms, p95 ${live.p95.toFixed(0)} ms.`);
  rows.push(`Trail building, whole corpus (${trails} trails, ${practices.length} practices): ${trailSeconds.toFixed(1)} s. Summary refresh: ${refreshSeconds.toFixed(1)} s.`);
  rows.push(`Corpus: ${counts.rows[0].a} articles, ${counts.rows[0].s} statements, ${counts.rows[0].c} citations. Total bench time ${(ms(total) / 1000 / 60).toFixed(1)} min.`);
  console.log(rows.join("\n"));
  await direct.end();
  server.close();
  await db.destroy();
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
