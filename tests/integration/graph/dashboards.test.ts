import { afterAll, beforeAll, describe, expect, it } from "vitest";
import Papa from "papaparse";
import { createTestDatabase, practiceIdByKey } from "@/tests/helpers/db";
import type { DB } from "@/db";
import { loadFixture } from "./fixture";
import { seedPractices } from "@/lib/graph/seed";
import { handleResolve, type GraphJobDeps } from "@/workers/graph-jobs";
import { resolveArticle } from "@/lib/jobs/graph";
import { rebuildAllTrails } from "@/lib/graph/trails";
import { refreshSummaries } from "@/lib/graph/summaries";
import { recordSourceCheck } from "@/lib/graph/source-checks";
import { dashboardCsv, dashboardData } from "@/lib/dashboards";
import { statementTrailView } from "@/lib/dashboards/trail-view";
import { mergeWorks, splitWork } from "@/lib/graph/works";

// Every expected number below is a hand count over the fixture in ./fixture.ts (written out in the
// comments), not a value read back from the code under test.
let t: Awaited<ReturnType<typeof createTestDatabase>>;
let db: DB;
let ids: Awaited<ReturnType<typeof loadFixture>>;
let alpha: string;
const sent: { name: string; data: object }[] = [];

beforeAll(async () => {
  t = await createTestDatabase();
  db = t.db;
  await seedPractices(db);
  ids = await loadFixture(db);
  alpha = await practiceIdByKey(db, "cronbach_alpha-ge-0.7-fixed");
  const deps: GraphJobDeps = {
    db,
    send: async (job, data) => void sent.push({ name: job.name, data: data as object }),
  };
  // Mining order M, A2, A1: A2 cites A1 before A1 is in the corpus.
  for (const k of ["M", "A2", "A1", "A3", "A4", "A5", "A6"]) await handleResolve(deps, { articleId: ids.articles[k] });
  // The re-checks the jobs asked for, as the worker would run them.
  for (const s of sent.filter((x) => x.name === resolveArticle.name))
    await handleResolve(deps, s.data as { articleId: string; recheck: boolean });
  const mWork = await db
    .selectFrom("works")
    .select("id")
    .where("article_id", "=", ids.articles.M)
    .executeTakeFirstOrThrow();
  await recordSourceCheck(db, {
    workId: mWork.id,
    practiceId: alpha,
    verdict: "says_so",
    page: "12",
    quote: "values of .80 or above",
    statedValue: 0.8,
    checkedBy: null,
  });
  await db.transaction().execute((trx) => rebuildAllTrails(trx));
  await refreshSummaries(db);
});
afterAll(async () => t?.drop());

describe("reference resolution over the fixture", () => {
  it("resolves by DOI (case-insensitive) to the corpus article M", async () => {
    const r = await db
      .selectFrom("references as r")
      .innerJoin("works as w", "w.id", "r.work_id")
      .select("w.article_id")
      .where("r.article_id", "=", ids.articles.A1)
      .executeTakeFirstOrThrow();
    expect(r.article_id).toBe(ids.articles.M);
  });
  it("makes the two citations of the same invented book one work, typed methods source by its kind", async () => {
    const books = await db.selectFrom("references").select("work_id").where("kind", "=", "book").execute();
    expect(books).toHaveLength(2);
    expect(books[0].work_id).not.toBeNull();
    expect(books[0].work_id).toBe(books[1].work_id);
    const w = await db
      .selectFrom("works")
      .select(["work_type", "type_decided_by"])
      .where("id", "=", books[0].work_id!)
      .executeTakeFirstOrThrow();
    expect(w).toEqual({ work_type: "methods_source", type_decided_by: "reference_kind" });
  });
  it("re-runs for A2 when A1 arrives, and A2's reference now leads to A1", async () => {
    expect(
      sent.some(
        (s) => s.name === resolveArticle.name && (s.data as { articleId: string }).articleId === ids.articles.A2,
      ),
    ).toBe(true);
    const r = await db
      .selectFrom("references as r")
      .innerJoin("works as w", "w.id", "r.work_id")
      .select("w.article_id")
      .where("r.article_id", "=", ids.articles.A2)
      .where("r.kind", "=", "article")
      .executeTakeFirstOrThrow();
    expect(r.article_id).toBe(ids.articles.A1);
  });
});

describe("trails", () => {
  it("ends where the hand-traced chains end", async () => {
    const rows = await db
      .selectFrom("trails")
      .select(["statement_id", "end_kind", "length", "supported"])
      .where("practice_id", "=", alpha)
      .execute();
    const by = Object.fromEntries(rows.map((r) => [r.statement_id, r]));
    // M → book (methods source); A1 → M (methods venue); A2 → A1 (asserts) → M; A3 cites nothing.
    expect(by[ids.statements["M.0"]]).toMatchObject({ end_kind: "methods_source", length: 1 });
    expect(by[ids.statements["A1.0"]]).toMatchObject({ end_kind: "methods_source", length: 1, supported: "says_so" });
    expect(by[ids.statements["A2.0"]]).toMatchObject({ end_kind: "methods_source", length: 2, supported: "says_so" });
    expect(by[ids.statements["A3.0"]]).toMatchObject({ end_kind: "no_citation", length: 0 });
  });
  it("shows one statement's trail as a graph with the locator on the edge and links to the sentence", async () => {
    const v = await statementTrailView(db, ids.statements["A2.0"], alpha);
    expect(v).not.toBeNull();
    const hrefs = v!.nodes.map((n) => n.href);
    expect(hrefs).toContain(`/articles/${ids.articles.A2}#statement-${ids.statements["A2.0"]}`);
    expect(hrefs).toContain(`/articles/${ids.articles.A1}#statement-${ids.statements["A1.0"]}`);
    expect(
      v!.edges
        .filter((e) => e.kind === "cites")
        .map((e) => e.locator)
        .sort(),
    ).toEqual([null, "p. 12"]);
  });
});

describe("dashboards equal a hand count", () => {
  it("practice over time: eligible articles per year and the asserting ones by sourcing", async () => {
    const d = await dashboardData(db, "practice-over-time", { practice: alpha });
    // 2010: M (1 article, asserts, cited no locator). 2018: A1 (A5 failed, not eligible).
    // 2019: A2, A3, A4 (A6 has no licence): A2 no locator, A3 unsourced.
    const rows = d.tables.byYear.rows.map((r) => [
      r.year,
      r.articles,
      r.asserting,
      r.cited_with_locator,
      r.cited_no_locator,
      r.secondary_only,
      r.unsourced,
    ]);
    expect(rows).toEqual([
      [2010, 1, 1, 0, 1, 0, 0],
      [2018, 1, 1, 1, 0, 0, 0],
      [2019, 3, 2, 0, 1, 0, 1],
    ]);
    expect(d.tables.byYear.rows[2].share).toBeCloseTo(2 / 3, 4);
    expect(d.notes[0]).toMatch(/Cochran–Armitage/);
  });
  it("filters by venue and years", async () => {
    const d = await dashboardData(db, "practice-over-time", {
      practice: alpha,
      venues: [ids.venues.methods],
      from: 2011,
    });
    // Methods venue from 2011 on: A4 only (2019), asserting nothing.
    expect(d.tables.byYear.rows.map((r) => [r.year, r.articles, r.asserting])).toEqual([[2019, 1, 0]]);
  });
  it("trail ends, lengths and most cited sources", async () => {
    const d = await dashboardData(db, "trail-ends", { practice: alpha });
    expect(d.tables.ends.rows.map((r) => [r.year, r.statements, r.methods_source, r.no_citation])).toEqual([
      [2010, 1, 1, 0],
      [2018, 1, 1, 0],
      [2019, 2, 1, 1],
    ]);
    // Lengths: A3 0; M 1; A1 1; A2 2.
    expect(d.tables.lengths.rows).toEqual([
      { length: 0, statements: 1 },
      { length: 1, statements: 2 },
      { length: 2, statements: 1 },
    ]);
    // Three works cited once each (book by M; M by A1 with "p. 12"; A1 by A2): locator rate 1 of 3 overall.
    expect(d.tables.sources.rows).toHaveLength(3);
    expect(d.tables.sources.rows.reduce((s, r) => s + Number(r.with_locator), 0)).toBe(1);
  });
  it("venue comparison with in-venue precedent", async () => {
    const d = await dashboardData(db, "venues", { practice: alpha });
    const by = Object.fromEntries(d.tables.venues.rows.map((r) => [r.venue_id, r]));
    // Methods venue: M, A4 eligible; M asserts; M cites an outside book. Applied: A1, A2, A3 all
    // assert; citations A1→M (other venue) and A2→A1 (same venue).
    expect(by[ids.venues.methods]).toMatchObject({ articles: 2, asserting: 1, citations: 1, in_venue: 0 });
    expect(by[ids.venues.applied]).toMatchObject({
      articles: 3,
      asserting: 3,
      citations: 2,
      in_venue: 1,
      in_venue_share: 0.5,
    });
    expect(by[ids.venues.applied].rate_vs_rest).toBeCloseTo(1 - 0.5, 4);
  });
  it("drift lists A1, whose .70 differs from the .80 its checked source states", async () => {
    const d = await dashboardData(db, "drift", { practice: alpha });
    expect(d.tables.drift.rows.map((r) => r.statement_id)).toEqual([ids.statements["A1.0"]]);
  });
  it("each CSV is exactly the JSON table", async () => {
    for (const name of ["practice-over-time", "trail-ends", "venues", "drift", "trail-graph"] as const) {
      const d = await dashboardData(db, name, { practice: alpha });
      for (const [table, t] of Object.entries(d.tables)) {
        const parsed = Papa.parse<string[]>(dashboardCsv(d, table).body.trim(), { skipEmptyLines: false });
        expect(parsed.data[0]).toEqual(t.columns);
        expect(parsed.data.slice(1)).toEqual(
          t.rows.map((r) => t.columns.map((c) => (r[c] === null || r[c] === undefined ? "" : String(r[c])))),
        );
      }
    }
  });
});

describe("dashboards read the roll-ups and still equal a hand count under every filter", () => {
  it("a framing no fixture statement has leaves the eligible articles and asserts nothing", async () => {
    // Every fixture statement is framed "fixed", so under "contextual": articles as before
    // (2010: 1, 2018: 1, 2019: 3), none asserting; no trail ends, no sources; no venue citations.
    const pot = await dashboardData(db, "practice-over-time", { practice: alpha, framing: "contextual" });
    expect(pot.tables.byYear.rows.map((r) => [r.year, r.articles, r.asserting])).toEqual([
      [2010, 1, 0],
      [2018, 1, 0],
      [2019, 3, 0],
    ]);
    const te = await dashboardData(db, "trail-ends", { practice: alpha, framing: "contextual" });
    expect(te.tables.ends.rows).toEqual([]);
    expect(te.tables.sources.rows).toEqual([]);
    const v = await dashboardData(db, "venues", { practice: alpha, framing: "contextual" });
    const by = Object.fromEntries(v.tables.venues.rows.map((r) => [r.venue_id, r]));
    expect(by[ids.venues.methods]).toMatchObject({ articles: 2, asserting: 0, citations: 0, in_venue: 0 });
    expect(by[ids.venues.applied]).toMatchObject({ articles: 3, asserting: 0, citations: 0, in_venue: 0 });
  });
  it("the framing every statement has gives the unfiltered hand counts", async () => {
    const te = await dashboardData(db, "trail-ends", { practice: alpha, framing: "fixed" });
    expect(te.tables.ends.rows.map((r) => [r.year, r.statements, r.methods_source, r.no_citation])).toEqual([
      [2010, 1, 1, 0],
      [2018, 1, 1, 0],
      [2019, 2, 1, 1],
    ]);
    expect(te.tables.sources.rows).toHaveLength(3);
    const v = await dashboardData(db, "venues", { practice: alpha, framing: "fixed" });
    const by = Object.fromEntries(v.tables.venues.rows.map((r) => [r.venue_id, r]));
    expect(by[ids.venues.applied]).toMatchObject({ articles: 3, asserting: 3, citations: 2, in_venue: 1 });
  });
  it("most cited sources: the per-work roll-up (no filter) and the fact-view count (a year filter covering all years) agree", async () => {
    // Hand count: three works cited once each, one with a locator (M by A1, "p. 12").
    const fast = await dashboardData(db, "trail-ends", { practice: alpha });
    const slow = await dashboardData(db, "trail-ends", { practice: alpha, from: 1900, to: 2100 });
    expect(slow.tables.sources.rows).toEqual(fast.tables.sources.rows);
    expect(fast.tables.sources.rows.map((r) => [r.citations, r.with_locator]).sort()).toEqual([
      [1, 0],
      [1, 0],
      [1, 1],
    ]);
    const g1 = await dashboardData(db, "trail-graph", { practice: alpha });
    const g2 = await dashboardData(db, "trail-graph", { practice: alpha, from: 1900, to: 2100 });
    expect(g2.tables.edges.rows).toEqual(g1.tables.edges.rows);
    // Cites edges: M→book, A1→M (p. 12), A2→A1; asserted_in edges link M's work to M.0 and A1's work to A1.0.
    expect(g1.tables.edges.rows.filter((r) => r.kind === "cites")).toHaveLength(3);
    expect(g1.tables.edges.rows.filter((r) => r.kind === "asserted_in")).toHaveLength(2);
  });
  it("a year window keeps only its articles (2018 only: A1, asserting with a locator)", async () => {
    const pot = await dashboardData(db, "practice-over-time", { practice: alpha, from: 2018, to: 2018 });
    expect(pot.tables.byYear.rows.map((r) => [r.year, r.articles, r.asserting, r.cited_with_locator])).toEqual([
      [2018, 1, 1, 1],
    ]);
    const te = await dashboardData(db, "trail-ends", { practice: alpha, from: 2018, to: 2018 });
    expect(te.tables.sources.rows.map((r) => [r.citations, r.with_locator])).toEqual([[1, 1]]);
  });
  it("a statistic filter that contradicts the practice asked for gives way to the statistic", async () => {
    const d = await dashboardData(db, "practice-over-time", { practice: alpha, statistic: "rmsea" });
    expect(d.practice?.statistic).toBe("rmsea");
    const same = await dashboardData(db, "practice-over-time", { practice: alpha, statistic: "cronbach_alpha" });
    expect(same.practice?.id).toBe(alpha);
  });
});

describe("in-venue precedent counts only the venue's own earlier articles", () => {
  it("a same-venue citation to an article published in a later year is not precedent", async () => {
    // A2 (applied, 2019) cites A1 (applied, 2018): precedent. Dated 2020 instead, A1 is later than
    // A2, so the same citation stays a citation of the venue but no longer counts as precedent.
    const venueRow = async () => {
      const d = await dashboardData(db, "venues", { practice: alpha });
      return d.tables.venues.rows.find((r) => r.venue_id === ids.venues.applied);
    };
    await db.updateTable("articles").set({ year: 2020 }).where("id", "=", ids.articles.A1).execute();
    try {
      await refreshSummaries(db);
      expect(await venueRow()).toMatchObject({ citations: 2, in_venue: 0 });
    } finally {
      await db.updateTable("articles").set({ year: 2018 }).where("id", "=", ids.articles.A1).execute();
      await refreshSummaries(db);
    }
    expect(await venueRow()).toMatchObject({ citations: 2, in_venue: 1 });
  });
});

describe("curator merge and split", () => {
  it("merging moves references and the graph follows; splitting undoes it", async () => {
    const a = await db
      .insertInto("works")
      .values({
        doi: null,
        title: "Invented duplicate",
        normalised_title: null,
        first_author: "x",
        year: "2001",
        article_id: null,
        merged_into: null,
      })
      .returning("id")
      .executeTakeFirstOrThrow();
    const bookRefs = await db
      .selectFrom("references")
      .select(["id", "work_id"])
      .where("kind", "=", "book")
      .orderBy("id")
      .execute();
    await db.transaction().execute((trx) => splitWork(trx, bookRefs[0].work_id!, [bookRefs[0].id]));
    const after = await db
      .selectFrom("references")
      .select("work_id")
      .where("id", "=", bookRefs[0].id)
      .executeTakeFirstOrThrow();
    expect(after.work_id).not.toBe(bookRefs[1].work_id);
    await db.transaction().execute((trx) => mergeWorks(trx, after.work_id!, bookRefs[1].work_id!));
    const back = await db.selectFrom("references").select("work_id").where("kind", "=", "book").execute();
    expect(new Set(back.map((r) => r.work_id)).size).toBe(1);
    await expect(db.transaction().execute((trx) => mergeWorks(trx, a.id, a.id))).rejects.toThrow(/different/);
    // Outside a transaction it refuses to run at all: its writes must commit together.
    await expect(mergeWorks(db, a.id, a.id)).rejects.toThrow(/inside a transaction/);
  });
  it("a reference a curator split off a corpus article stays split when resolution runs again", async () => {
    // A2's reference "Brennemann & Adeyemi (2018)" resolves to A1 (fixture). Without the curator's
    // mark, re-resolution prefers the corpus article and would move it straight back to A1.
    const a1Work = await db
      .selectFrom("works")
      .select("id")
      .where("article_id", "=", ids.articles.A1)
      .executeTakeFirstOrThrow();
    const ref = await db
      .selectFrom("references")
      .select(["id", "work_id"])
      .where("article_id", "=", ids.articles.A2)
      .where("title", "=", "Brand loyalty in invented coastal towns")
      .executeTakeFirstOrThrow();
    expect(ref.work_id).toBe(a1Work.id);
    const split = await db.transaction().execute((trx) => splitWork(trx, a1Work.id, [ref.id]));
    const deps: GraphJobDeps = { db, send: async () => {} };
    await handleResolve(deps, { articleId: ids.articles.A2, recheck: true });
    const after = await db
      .selectFrom("references")
      .select(["work_id", "work_set_by"])
      .where("id", "=", ref.id)
      .executeTakeFirstOrThrow();
    expect(after).toEqual({ work_id: split, work_set_by: "curator" });
    // The split-off work carries the reference's title, surname and year for later references.
    expect(
      await db.selectFrom("works").select(["first_author", "year"]).where("id", "=", split).executeTakeFirstOrThrow(),
    ).toEqual({ first_author: "brennemann", year: "2018" });
    // Merging it back puts the reference on A1 again, still as the curator's placement.
    await db.transaction().execute((trx) => mergeWorks(trx, split, a1Work.id));
    await handleResolve(deps, { articleId: ids.articles.A2, recheck: true });
    expect(
      await db
        .selectFrom("references")
        .select(["work_id", "work_set_by"])
        .where("id", "=", ref.id)
        .executeTakeFirstOrThrow(),
    ).toEqual({ work_id: a1Work.id, work_set_by: "curator" });
  });
});

describe("the practice a dashboard opens on", () => {
  // Oracle: the matched statements per practice counted straight from statement_practices.
  const counts = async () =>
    (
      await db
        .selectFrom("statement_practices")
        .innerJoin("practices", "practices.id", "statement_practices.practice_id")
        .select(["practice_id", "practices.statistic", (eb) => eb.fn.countAll<number>().as("n")])
        .groupBy(["practice_id", "practices.statistic"])
        .execute()
    ).map((r) => ({ ...r, n: Number(r.n) }));

  it("is the most asserted practice when none is chosen, with its count of matched statements", async () => {
    const c = await counts();
    const most = Math.max(...c.map((r) => r.n));
    expect(most).toBeGreaterThan(0);
    const d = await dashboardData(db, "practice-over-time", {});
    expect(c.find((r) => r.practice_id === d.practice?.id)?.n).toBe(most);
    expect(d.practice?.matched).toBe(most);
  });

  it("keeps a chosen practice, and under a statistic filter picks among that statistic's practices", async () => {
    const chosen = await dashboardData(db, "trail-ends", { practice: alpha });
    expect(chosen.practice?.id).toBe(alpha);
    // The fixture mines no VIF statements: the pick is still a VIF practice (ties fall to seeded, then key).
    const vif = await dashboardData(db, "practice-over-time", { statistic: "vif" });
    expect(vif.practice?.statistic).toBe("vif");
    expect(vif.practice?.matched).toBe(0);
  });
});
