/**
 * npm run bench:dashboards — synthetic corpus of 100,000 articles, 2,000,000 statements and
 * 3,000,000 in-text citations generated straight into PostgreSQL (generate_series, in a database of
 * its own on the private test cluster), then:
 *   - trail building for every practice of the corpus (lib/graph/trails, the code the job runs) and
 *     the refresh of every dashboard view (lib/graph/summaries, the code the refresh job runs);
 *   - each dashboard through the REAL route: the built Next app (`next start`, the env of
 *     workers/stack.ts) signed in as a reader over HTTP, vs the chart's own SQL statement (the very
 *     statement lib/dashboards sends, compiled by Kysely) run directly on a pg connection;
 *   - the same lib code behind a bare node:http server (no Next, no sign-in), to show the overhead split;
 *   - requests per second for the heaviest chart: 4 clients for 10 s on loopback;
 *   - the live SQL over the base tables, which is what the summary views replace.
 * An already generated database is reused when its row counts match; --regenerate forces a new one.
 * --skip-trails reuses the stored trails and views (quick re-runs of the timing part only).
 * Run it under `flock /tmp/echoline-bench.lock`; the Next part takes /tmp/echoline-build.lock itself
 * (it may rebuild .next and serves from it). BENCH_SCALE=0.1 makes a tenth-size run for a quick check.
 */
import http from "node:http";
import { signInOverHttp } from "../helpers/http";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { spawn, type ChildProcess } from "node:child_process";
import pg from "pg";
import type { Kysely } from "kysely";
import { sql } from "kysely";
import { up, databaseUrl, DATA_DIR } from "@/db/cluster";
import { createDb, type DB } from "@/db";
import { migrateToLatest } from "@/db/migrate";
import { seedPractices } from "@/lib/graph/seed";
import { rebuildPracticeTrails } from "@/lib/graph/trails";
import { refreshSummaries } from "@/lib/graph/summaries";
import { dashboardData, filtersSchema, isDashboardName, type DashboardName, type Filters } from "@/lib/dashboards";
import { practiceOverTimeSql, trailEndsSql, venueComparisonSql } from "@/lib/dashboards/queries";
import { practiceTrailSql } from "@/lib/dashboards/trail-view";
import { driftSql } from "@/lib/dashboards/drift";
import { hashPassword } from "@/lib/server/passwords";
import { stackEnv, ROOT, waitForHttp } from "@/workers/stack";

const SCALE = Number(process.env.BENCH_SCALE ?? 1);
const ARTICLES = Math.round(100_000 * SCALE);
const STATEMENTS_PER_ARTICLE = 20; // 2,000,000 statements
const CITATIONS_PER_ARTICLE = 30; // 3,000,000 citations
const REFS_PER_ARTICLE = 15;
const OUTSIDE_WORKS = Math.round(20_000 * SCALE);
const VENUES = 40;
const PRACTICES_USED = 10;
const REPEAT = Number(process.env.BENCH_REPEAT ?? 200);
const NAME = SCALE === 1 ? "echoline_bench" : `echoline_bench_${String(SCALE).replace(".", "_")}`;
const APP_PORT = Number(process.env.BENCH_APP_PORT ?? 3300);
const APP = `http://127.0.0.1:${APP_PORT}`;
const REGENERATE = process.argv.includes("--regenerate");
const SKIP_TRAILS = process.argv.includes("--skip-trails");
const READER = { email: "bench-reader@example.invalid", password: "bench-reader-password-1" };

const t0 = () => process.hrtime.bigint();
const ms = (since: bigint) => Number(process.hrtime.bigint() - since) / 1e6;
const log = (s: string) => console.error(`[bench] ${s}`);
const load = () =>
  os
    .loadavg()
    .map((x) => x.toFixed(2))
    .join(" ");

/** The bench database: reused when it holds the corpus this run would generate, else made anew. */
async function openDatabase(): Promise<{ db: DB; generated: boolean }> {
  up("test");
  const admin = new pg.Client({ connectionString: databaseUrl("test", "postgres") });
  await admin.connect();
  const url = databaseUrl("test", NAME);
  try {
    const exists = (await admin.query("select 1 from pg_database where datname = $1", [NAME])).rowCount === 1;
    if (exists && !REGENERATE) {
      const c = new pg.Client({ connectionString: url });
      await c.connect();
      try {
        const r = await c.query<{ a: string; s: string; c: string; p: string }>(
          `select (select count(*) from articles) a, (select count(*) from statements) s, (select count(*) from citations) c,
             (select count(*) from bench_practices) p`,
        );
        const got = r.rows[0];
        const want = {
          a: ARTICLES,
          s: ARTICLES * STATEMENTS_PER_ARTICLE,
          c: ARTICLES * CITATIONS_PER_ARTICLE,
          p: PRACTICES_USED,
        };
        if (
          Number(got.a) === want.a &&
          Number(got.s) === want.s &&
          Number(got.c) === want.c &&
          Number(got.p) === want.p
        ) {
          log(
            `reusing ${NAME} (${got.a} articles, ${got.s} statements, ${got.c} citations); --regenerate makes a new one`,
          );
          const db = createDb(url, 8);
          await migrateToLatest(db as unknown as Kysely<unknown>);
          return { db, generated: false };
        }
        log(`${NAME} holds other row counts (${JSON.stringify(got)}), regenerating`);
      } catch (e) {
        log(`${NAME} is not a complete bench database (${(e as Error).message}), regenerating`);
      } finally {
        await c.end();
      }
    }
    await admin.query(`drop database if exists ${NAME} with (force)`);
    await admin.query(`create database ${NAME}`);
  } finally {
    await admin.end();
  }
  const db = createDb(url, 8);
  await migrateToLatest(db as unknown as Kysely<unknown>);
  return { db, generated: true };
}

async function generate(db: DB): Promise<void> {
  const step = async (label: string, q: ReturnType<typeof sql>) => {
    const s = t0();
    await q.execute(db);
    log(`${label}: ${(ms(s) / 1000).toFixed(1)} s`);
  };
  await seedPractices(db);
  await step(
    "venues",
    sql`insert into venues (name, is_methods_venue) select 'Synthetic venue ' || v, v <= 4 from generate_series(1, ${VENUES}) v`,
  );
  await step(
    "practices used",
    sql`create table bench_practices as select (row_number() over (order by key)) - 1 as idx, id, statistic, comparator, value, framing from practices where key in (select key from practices order by key limit ${PRACTICES_USED})`,
  );
  await step(
    "stored files",
    sql`insert into stored_files (sha256, size_bytes, media_type, storage_key) select md5('f'||a) || md5('g'||a), 1, 'text/plain', 'bench' from generate_series(1, ${ARTICLES}) a`,
  );
  // Years rise with the article number, so an article cites earlier ones.
  await step(
    "articles",
    sql`
    insert into articles (id, file_sha256, original_filename, source_kind, venue_id, year, title, authors, licence, status)
    select md5('a'||a)::uuid, md5('f'||a) || md5('g'||a), 'a'||a||'.txt', 'text', v.id, 1995 + (a * 30) / (${ARTICLES} + 1),
      'Synthetic study ' || a, jsonb_build_array('Author' || (a % 5000) || ', A.'), 'CC-BY-4.0', 'done'
    from generate_series(1, ${ARTICLES}) a
    join (select id, row_number() over (order by name) - 1 as k from venues) v on v.k = a % ${VENUES}`,
  );
  await step(
    "works (corpus + outside)",
    sql`
    insert into works (id, title, first_author, year, kind, work_type, type_decided_by, article_id)
    select md5('wa'||a)::uuid, 'Synthetic study ' || a, 'author' || (a % 5000), (1995 + (a * 30) / (${ARTICLES} + 1))::text, 'article',
      case when a % ${VENUES} < 4 then 'methods_source' else 'empirical' end, 'venue', md5('a'||a)::uuid
    from generate_series(1, ${ARTICLES}) a
    union all
    select md5('wo'||o)::uuid, 'Outside work ' || o, 'outside' || o, (1960 + o % 40)::text, case when o % 4 = 0 then 'book' else 'article' end,
      case when o % 4 = 0 then 'methods_source' when o % 4 = 1 then 'empirical' else 'unknown' end, 'default', null
    from generate_series(1, ${OUTSIDE_WORKS}) o`,
  );
  // 60% of references cite an earlier corpus article, the rest an outside work.
  await step(
    "references",
    sql`
    insert into "references" (id, article_id, ordinal, raw, year, title, kind, work_id)
    select md5('r'||a||'-'||r)::uuid, md5('a'||a)::uuid, r, 'ref', null, null, 'article',
      case when r < 9 and a > 1 then md5('wa'|| (1 + floor(random() * (a - 1))::int))::uuid
           else md5('wo'|| (1 + (a * 7 + r) % ${OUTSIDE_WORKS}))::uuid end
    from generate_series(1, ${ARTICLES}) a, generate_series(0, ${REFS_PER_ARTICLE - 1}) r`,
  );
  await step(
    "citations (3M at full size)",
    sql`
    insert into citations (id, article_id, ordinal, sentence, authors, year, locator, secondary, reference_id)
    select md5('c'||a||'-'||o)::uuid, md5('a'||a)::uuid, o, 's', 'Author', '2000',
      case when (a + o) % 3 = 0 then 'p. 12' end, (a + o) % 23 = 0, md5('r'||a||'-'||(o % ${REFS_PER_ARTICLE}))::uuid
    from generate_series(1, ${ARTICLES}) a, generate_series(0, ${CITATIONS_PER_ARTICLE - 1}) o`,
  );
  // Statements 0..7 of each article are thresholds of one of the practices; the rest reported values.
  await step(
    "statements (2M at full size)",
    sql`
    insert into statements (id, article_id, ordinal, section, sentence, kind, statistic, comparator, value, framing, sourcing, fingerprint)
    select md5('s'||a||'-'||i)::uuid, md5('a'||a)::uuid, i, 'methods', 'Synthetic sentence', case when i < 8 then 'threshold' else 'reported' end,
      case when i < 8 then p.statistic end, case when i < 8 then p.comparator end, case when i < 8 then p.value else 0.81 end,
      case when i < 8 then coalesce(p.framing, 'fixed') end,
      case when i >= 8 or (a + i) % 5 = 0 then 'unsourced' when (a + i) % 3 = 0 then 'cited_with_locator' when (a + i) % 23 = 0 then 'secondary_only' else 'cited_no_locator' end,
      'fp' || i
    from generate_series(1, ${ARTICLES}) a cross join generate_series(0, ${STATEMENTS_PER_ARTICLE - 1}) i
    join bench_practices p on p.idx = (a + i * 3) % ${PRACTICES_USED}`,
  );
  await step(
    "statement practices",
    sql`
    insert into statement_practices (statement_id, practice_id)
    select md5('s'||a||'-'||i)::uuid, p.id from generate_series(1, ${ARTICLES}) a cross join generate_series(0, 7) i
    join bench_practices p on p.idx = (a + i * 3) % ${PRACTICES_USED}`,
  );
  await step(
    "statement citations",
    sql`
    insert into statement_citations (statement_id, citation_id)
    select md5('s'||a||'-'||i)::uuid, md5('c'||a||'-'||i)::uuid from generate_series(1, ${ARTICLES}) a, generate_series(0, 7) i where (a + i) % 5 <> 0
    union all
    select md5('s'||a||'-'||i)::uuid, md5('c'||a||'-'||(i + 15))::uuid from generate_series(1, ${ARTICLES}) a, generate_series(0, 7) i where (a + i) % 5 <> 0 and (a + i) % 2 = 0`,
  );
  await step("analyze", sql`analyze`);
}

function quantile(xs: number[], q: number): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.ceil(q * s.length) - 1)];
}

async function time(n: number, fn: () => Promise<unknown>): Promise<{ p50: number; p95: number }> {
  // Warm the cache, the plan, Next's route module and both processes' JIT: with 5 warm-up requests
  // the first case measured twice the p50 it gives once warm.
  for (let i = 0; i < 30; i++) await fn();
  const xs: number[] = [];
  for (let i = 0; i < n; i++) {
    const s = t0();
    await fn();
    xs.push(ms(s));
  }
  return { p50: quantile(xs, 0.5), p95: quantile(xs, 0.95) };
}

/**
 * One GET over a kept-alive loopback connection with node:http. The route is what is measured, not
 * the client: undici's fetch added about 0.3 ms p50 / 0.6 ms p95 per request on this machine (and asks
 * for gzip, which a SQL client does not), so every HTTP figure here uses this lean client. Responses
 * are uncompressed, as the direct SQL's are.
 */
const agent = new http.Agent({ keepAlive: true, maxSockets: 8 });
function request(url: string, headers: Record<string, string>): Promise<{ status: number; body: string }> {
  return new Promise((resolve, reject) => {
    http
      .get(url, { agent, headers }, (res) => {
        const chunks: Buffer[] = [];
        res.on("data", (c: Buffer) => chunks.push(c));
        res.on("end", () => resolve({ status: res.statusCode ?? 0, body: Buffer.concat(chunks).toString() }));
        res.on("error", reject);
      })
      .on("error", reject);
  });
}

/** Newer sources than the last build mean .next would serve old code. */
function buildIsStale(): boolean {
  const id = path.join(ROOT, ".next", "BUILD_ID");
  if (!fs.existsSync(id)) return true;
  const built = fs.statSync(id).mtimeMs;
  const dirs = ["lib/dashboards", "app/api/dashboards", "lib/server", "db", "lib/graph"];
  const newer = (p: string): boolean => {
    const st = fs.statSync(p);
    if (st.isDirectory()) return fs.readdirSync(p).some((e) => newer(path.join(p, e)));
    return st.mtimeMs > built;
  };
  return dirs.some((d) => fs.existsSync(path.join(ROOT, d)) && newer(path.join(ROOT, d)));
}

/**
 * `next start` under the shared build lock (held while it serves, so nobody rebuilds .next under
 * it), building first when the build is stale. Detached, so stopping kills the whole group.
 */
async function startNext(url: string): Promise<ChildProcess> {
  const dataDir = path.join(DATA_DIR, "bench");
  const env = stackEnv({
    appPort: APP_PORT,
    smtpPort: 2725,
    mailHttpPort: 2726,
    databaseUrl: url,
    dataDir,
    quiet: true,
  });
  const stale = buildIsStale();
  const next = path.join(ROOT, "node_modules", ".bin", "next");
  const script = `${stale ? `"${next}" build >&2 && ` : ""}exec "${next}" start -H 127.0.0.1 -p ${APP_PORT}`;
  log(
    stale
      ? "build is stale: next build, then next start (under /tmp/echoline-build.lock)"
      : "next start (under /tmp/echoline-build.lock)",
  );
  const child = spawn("flock", ["/tmp/echoline-build.lock", "sh", "-c", script], {
    cwd: ROOT,
    env,
    detached: true,
    stdio: ["ignore", "ignore", "pipe"],
  });
  let err = "";
  child.stderr?.on("data", (c: Buffer) => void (err = (err + c.toString()).slice(-4000)));
  const exited = new Promise<never>((_, reject) =>
    child.once("exit", (code) => reject(new Error(`next exited (${code}): ${err}`))),
  );
  await Promise.race([waitForHttp(`${APP}/sign-in`, 15 * 60_000), exited]);
  return child;
}

function stopNext(child: ChildProcess): Promise<void> {
  return new Promise((resolve) => {
    if (child.exitCode !== null || child.signalCode !== null || !child.pid) return resolve();
    child.once("exit", () => resolve());
    process.kill(-child.pid, "SIGTERM");
  });
}

/** A reader account in the bench database, signed in through next-auth's credentials callback. */
async function readerCookie(db: DB): Promise<string> {
  const hash = await hashPassword(READER.password);
  // E-mails are unique case-insensitively (an expression index), so replace rather than upsert.
  await db
    .deleteFrom("User")
    .where(sql`lower(email)`, "=", READER.email)
    .execute();
  await db
    .insertInto("User")
    .values({
      email: READER.email,
      name: "Bench reader",
      role: "reader",
      password_hash: hash,
      emailVerified: null,
      image: null,
      deactivated_at: null,
    })
    .execute();
  return signInOverHttp(APP, READER.email, READER.password);
}

/** The chart's own statement, exactly as lib/dashboards sends it (one statement per chart). */
const CHART_SQL: Record<
  DashboardName,
  (f: Filters) => { compile: (db: DB) => { sql: string; parameters: readonly unknown[] } }
> = {
  "practice-over-time": practiceOverTimeSql,
  "trail-ends": trailEndsSql,
  venues: venueComparisonSql,
  "trail-graph": (f) => practiceTrailSql(f),
  drift: driftSql,
};

async function main() {
  const total = t0();
  log(`load average at start: ${load()}`);
  const { db, generated } = await openDatabase();
  if (generated) await generate(db);
  const counts = await sql<{
    a: number;
    s: number;
    c: number;
  }>`select (select count(*) from articles) a, (select count(*) from statements) s, (select count(*) from citations) c`.execute(
    db,
  );
  log(`corpus: ${JSON.stringify(counts.rows[0])}`);

  const practices = (await db
    .selectFrom("bench_practices" as never)
    .select(["id" as never])
    .orderBy("idx" as never)
    .execute()) as unknown as { id: string }[];
  let trailLine = "Trail building skipped (--skip-trails): the stored trails were reused.";
  if (!SKIP_TRAILS || generated) {
    const s = t0();
    let trails = 0;
    for (const p of practices) trails += await db.transaction().execute((trx) => rebuildPracticeTrails(trx, p.id));
    const secs = ms(s) / 1000;
    trailLine = `Trail building, whole corpus (${trails} trails, ${practices.length} practices): ${secs.toFixed(1)} s (load ${load()}).`;
    log(trailLine);
  }
  // The refresh job's own path: CONCURRENTLY once the views are populated, as in production.
  let refreshLine = "Summary refresh skipped (--skip-trails): the views were reused.";
  if (!SKIP_TRAILS || generated) {
    const timings: Record<string, number> = {};
    const s = t0();
    await refreshSummaries(db, { timings });
    const refreshSeconds = ms(s) / 1000;
    refreshLine = `Summary refresh (concurrently, as the job runs it): ${refreshSeconds.toFixed(1)} s — ${Object.entries(
      timings,
    )
      .map(([v, x]) => `${v} ${x.toFixed(1)}`)
      .join(", ")} (load ${load()}).`;
    log(refreshLine);
    await sql`analyze`.execute(db);
  }

  const practice = practices[0].id;
  const venues = await db.selectFrom("venues").select("id").orderBy("name").limit(3).execute();
  const filtered = `practice=${practice}&venues=${venues.map((v) => v.id).join(",")}&from=2005&to=2020&framing=fixed`;
  const cases: { name: DashboardName; label: string; query: string }[] = [];
  for (const name of ["practice-over-time", "trail-ends", "venues", "trail-graph", "drift"] as const) {
    cases.push({ name, label: "none", query: `practice=${practice}` });
    cases.push({ name, label: "3 venues, 2005–2020, fixed", query: filtered });
  }
  // Year filter alone: the widest fallback of the top-works query (no roll-up can answer it).
  cases.push({ name: "trail-ends", label: "2000–2024 only", query: `practice=${practice}&from=2000&to=2024` });
  cases.push({ name: "trail-graph", label: "2000–2024 only", query: `practice=${practice}&from=2000&to=2024` });

  // Lib code behind a bare node:http server: the route minus Next and sign-in.
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
  const libPort = (server.address() as { port: number }).port;
  const direct = new pg.Client({ connectionString: databaseUrl("test", NAME) });
  await direct.connect();

  const next = await startNext(databaseUrl("test", NAME));
  const rows: string[] = [];
  try {
    const cookie = await readerCookie(db);
    const get = async (base: string, c: { name: string; query: string }, headers: Record<string, string> = {}) => {
      const r = await request(`${base}/api/dashboards/${c.name}?${c.query}`, headers);
      if (r.status !== 200) throw new Error(`${c.name}: HTTP ${r.status} ${r.body}`);
    };
    log(`timing ${cases.length} cases × ${REPEAT} requests, load ${load()}`);
    // The fixed cost of any signed-in route: an unknown dashboard name is refused with 404 only after
    // the session cookie is decrypted and the actor read from the database, with no chart SQL.
    const floor = await time(REPEAT, async () => {
      const r = await request(`${APP}/api/dashboards/no-such-chart`, { cookie });
      if (r.status !== 404) throw new Error(`floor request: HTTP ${r.status}, expected 404 after sign-in`);
    });
    // Next's own floor: an anonymous request is refused with 401 before any database work (no
    // session cookie to read, no actor to look up). No route handler can answer faster than this.
    const anonymous = await time(REPEAT, async () => {
      const r = await request(`${APP}/api/dashboards/no-such-chart`, {});
      if (r.status !== 401) throw new Error(`anonymous request: HTTP ${r.status}, expected 401`);
    });
    rows.push(
      "| dashboard route | filters | Next route p50 ms | Next route p95 ms | lib via node:http p95 ms | direct SQL p50 ms | direct SQL p95 ms | p95 ratio (Next / SQL) | load avg |",
    );
    rows.push("|---|---|---|---|---|---|---|---|---|");
    const heaviest = { p95: 0, c: cases[0] };
    for (const c of cases) {
      const f = filtersSchema.parse(Object.fromEntries(new URLSearchParams(c.query)));
      const q = CHART_SQL[c.name](f).compile(db);
      const viaNext = await time(REPEAT, () => get(APP, c, { cookie }));
      const viaLib = await time(REPEAT, () => get(`http://127.0.0.1:${libPort}`, c));
      const d = await time(REPEAT, () => direct.query(q.sql, q.parameters as unknown[]));
      if (viaNext.p95 > heaviest.p95) Object.assign(heaviest, { p95: viaNext.p95, c });
      rows.push(
        `| ${c.name} | ${c.label} | ${viaNext.p50.toFixed(1)} | ${viaNext.p95.toFixed(1)} | ${viaLib.p95.toFixed(1)} | ${d.p50.toFixed(1)} | ${d.p95.toFixed(1)} | ${(viaNext.p95 / d.p95).toFixed(2)} | ${load()} |`,
      );
      log(rows[rows.length - 1]);
    }
    // Throughput of the heaviest chart through Next: 4 clients back to back for 10 s, loopback only.
    const until = Date.now() + 10_000;
    let done = 0;
    await Promise.all(
      Array.from({ length: 4 }, async () => {
        while (Date.now() < until) {
          await get(APP, heaviest.c, { cookie });
          done++;
        }
      }),
    );
    rows.push(
      `\nNext's own floor (anonymous request refused with 401 before any database work): p50 ${anonymous.p50.toFixed(1)} ms, p95 ${anonymous.p95.toFixed(1)} ms.`,
    );
    rows.push(
      `Fixed cost of a signed-in Next route (unknown chart → 404 after the session and actor lookup, no chart SQL): p50 ${floor.p50.toFixed(1)} ms, p95 ${floor.p95.toFixed(1)} ms.`,
    );
    rows.push(
      `Throughput, ${heaviest.c.name} (${heaviest.c.label}) through Next, 4 clients for 10 s: ${(done / 10).toFixed(0)} requests/s (load ${load()}).`,
    );
  } finally {
    await stopNext(next);
  }
  const LIVE = `select a.year, min(case s.sourcing when 'cited_with_locator' then 1 when 'cited_no_locator' then 2 when 'secondary_only' then 3 else 4 end), count(*) from statement_practices sp join statements s on s.id = sp.statement_id join articles a on a.id = s.article_id where sp.practice_id = $1 and a.status = 'done' and a.licence is not null group by a.year, a.id`;
  const live = await time(5, () => direct.query(LIVE, [practice]));
  rows.push(
    `Live join over the base tables for practice-over-time (what the summary views replace): p50 ${live.p50.toFixed(0)} ms, p95 ${live.p95.toFixed(0)} ms.`,
  );
  rows.push(trailLine);
  rows.push(refreshLine);
  rows.push(
    `Corpus: ${counts.rows[0].a} articles, ${counts.rows[0].s} statements, ${counts.rows[0].c} citations. Total bench time ${(ms(total) / 1000 / 60).toFixed(1)} min. Load average at the end: ${load()} on ${os.cpus().length} cores.`,
  );
  console.log(rows.join("\n"));
  await direct.end();
  server.close();
  await db.destroy();
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
