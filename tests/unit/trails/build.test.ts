import { describe, expect, it } from "vitest";
import {
  buildAllTrails,
  buildTrail,
  type PracticeStatementRef,
  type TrailCitation,
  type TrailGraph,
  type TrailStart,
  type TrailWork,
} from "@/lib/trails";

// Invented corpus: every id, article and work here is made up for the test.
const P = "cronbach_alpha-ge-0.7-fixed";

class FakeGraph implements TrailGraph {
  calls = { getWorks: 0, statementsOfPractice: 0 };
  requested = { works: new Map<string, number>(), articles: new Map<string, number>() };
  constructor(
    readonly works: Map<string, TrailWork>,
    readonly stmts: Map<string, PracticeStatementRef[]>,
    readonly async = true,
  ) {}
  getWorks(ids: readonly string[]) {
    this.calls.getWorks++;
    for (const id of ids) this.requested.works.set(id, (this.requested.works.get(id) ?? 0) + 1);
    const out = ids.map((id) => this.works.get(id)).filter((w): w is TrailWork => !!w);
    return this.async ? Promise.resolve(out) : out;
  }
  statementsOfPractice(ids: readonly string[], practiceId: string) {
    this.calls.statementsOfPractice++;
    expect(practiceId).toBe(P);
    for (const id of ids) this.requested.articles.set(id, (this.requested.articles.get(id) ?? 0) + 1);
    const out = new Map(ids.filter((id) => this.stmts.has(id)).map((id) => [id, this.stmts.get(id)!] as const));
    return this.async ? Promise.resolve(out) : out;
  }
}

const cite = (
  citationId: string,
  workId: string | null,
  locator: string | null = null,
  secondary = false,
): TrailCitation => ({
  citationId,
  workId,
  locator,
  secondary,
});
const article = (id: string, year = 2010): TrailWork => ({ id: `w-${id}`, type: "empirical", articleId: id, year });

function graphOf(works: TrailWork[], stmts: Record<string, PracticeStatementRef[]>, async = true) {
  return new FakeGraph(new Map(works.map((w) => [w.id, w])), new Map(Object.entries(stmts)), async);
}

describe("buildTrail", () => {
  it("follows a chain of 4 articles to a methods book", async () => {
    const book: TrailWork = { id: "w-book", type: "methods_source", articleId: null, year: 1978 };
    const g = graphOf([article("A2"), article("A3"), article("A4"), book], {
      A2: [{ statementId: "s2", citations: [cite("c2", "w-A3")] }],
      A3: [{ statementId: "s3", citations: [cite("c3", "w-A4", "p. 12", true)] }],
      A4: [{ statementId: "s4", citations: [cite("c4", "w-book", "p. 245")] }],
    });
    const start: TrailStart = { statementId: "s1", articleId: "A1", citations: [cite("c1", "w-A2")] };
    const t = await buildTrail(start, g, P);
    expect(t.ends).toEqual([{ kind: "methods_source", depth: 4, workId: "w-book" }]);
    expect(t.length).toBe(4);
    expect(t.summaryEnd.kind).toBe("methods_source");
    expect(t.nodes.filter((n) => n.kind === "statement").map((n) => n.id)).toEqual([
      "statement:s1",
      "statement:s2",
      "statement:s3",
      "statement:s4",
    ]);
    const secondaryEdge = t.edges.find((e) => e.kind === "cites" && e.citationId === "c3");
    expect(secondaryEdge).toMatchObject({ locator: "p. 12", secondary: true, to: "work:w-A4" });
    // One batch per level: 4 levels of works, 3 of articles (the book is not asked about).
    expect(g.calls).toEqual({ getWorks: 4, statementsOfPractice: 3 });
  });

  it("ends a cycle (A cites B cites A) with kind cycle and terminates", async () => {
    const g = graphOf([article("A"), article("B")], {
      A: [{ statementId: "sA", citations: [cite("cAB", "w-B")] }],
      B: [{ statementId: "sB", citations: [cite("cBA", "w-A")] }],
    });
    const t = await buildTrail({ statementId: "sA", articleId: "A", citations: [cite("cAB", "w-B")] }, g, P);
    expect(t.ends).toEqual([{ kind: "cycle", depth: 2, workId: "w-A" }]);
    expect(t.edges.some((e) => e.from === "statement:sB" && e.to === "work:w-A")).toBe(true);
  });

  it("a statement with no citation ends at no_citation, at depth 0 or deeper in the chain", async () => {
    const g = graphOf([article("B")], { B: [{ statementId: "sB", citations: [] }] });
    const bare = await buildTrail({ statementId: "s", articleId: "A", citations: [] }, g, P);
    expect(bare.ends).toEqual([{ kind: "no_citation", depth: 0, statementId: "s" }]);
    expect(bare.length).toBe(0);
    const deeper = await buildTrail({ statementId: "s", articleId: "A", citations: [cite("c", "w-B")] }, g, P);
    expect(deeper.ends).toEqual([{ kind: "no_citation", depth: 1, statementId: "sB" }]);
  });

  it("an unresolved reference (no work id, or an id the graph does not know) ends at unresolved", async () => {
    const g = graphOf([], {});
    const t = await buildTrail(
      { statementId: "s", articleId: "A", citations: [cite("c1", null), cite("c2", "w-ghost")] },
      g,
      P,
    );
    expect(t.ends).toEqual([
      { kind: "unresolved", depth: 1, citationId: "c1" },
      { kind: "unresolved", depth: 1, citationId: "c2", workId: "w-ghost" },
    ]);
    expect(t.nodes.filter((n) => n.kind === "unresolved")).toHaveLength(2);
  });

  it("a branch reaching a methods source and an empirical precedent keeps both ends, summary = methods source", async () => {
    const book: TrailWork = { id: "w-book", type: "methods_source", articleId: null, year: 1990 };
    const outside: TrailWork = { id: "w-out", type: "empirical", articleId: null, year: 2001 };
    const silent = article("C"); // in the corpus, empirical, does not assert the practice
    const untyped: TrailWork = { id: "w-untyped", type: "unknown", articleId: null, year: null };
    const g = graphOf([article("B"), book, outside, silent, untyped], {
      B: [{ statementId: "sB", citations: [cite("cB1", "w-out"), cite("cB2", "w-C")] }],
    });
    const t = await buildTrail(
      {
        statementId: "s",
        articleId: "A",
        citations: [cite("c1", "w-book"), cite("c2", "w-B"), cite("c3", "w-untyped")],
      },
      g,
      P,
    );
    expect(t.ends).toEqual([
      { kind: "methods_source", depth: 1, workId: "w-book" },
      { kind: "empirical_precedent", depth: 2, workId: "w-C" },
      { kind: "empirical_precedent", depth: 2, workId: "w-out" },
      { kind: "unclassified", depth: 1, workId: "w-untyped" },
    ]);
    expect(t.summaryEnd).toEqual({ kind: "methods_source", depth: 1, workId: "w-book" });
    expect(t.length).toBe(2);
  });

  it("cuts at maxDepth with a depth_limit end", async () => {
    const works = Array.from({ length: 10 }, (_, i) => article(`A${i}`));
    const stmts = Object.fromEntries(
      Array.from({ length: 9 }, (_, i) => [
        `A${i}`,
        [{ statementId: `s${i}`, citations: [cite(`c${i}`, `w-A${i + 1}`)] }],
      ]),
    );
    const g = graphOf(works, stmts, false);
    const t = await buildTrail({ statementId: "s0", articleId: "A0", citations: [cite("c0", "w-A1")] }, g, P, {
      maxDepth: 3,
    });
    expect(t.ends).toEqual([{ kind: "depth_limit", depth: 3, workId: "w-A3" }]);
    expect(t.length).toBe(3);
    expect(Math.max(...t.nodes.map((n) => n.depth))).toBe(3);
    await expect(
      buildTrail({ statementId: "s0", articleId: "A0", citations: [] }, g, P, { maxDepth: 0 }),
    ).rejects.toThrow(/maxDepth/);
  });

  it("rejects malformed input and malformed graph answers with a clear error", async () => {
    const g = graphOf([], {});
    await expect(buildTrail({ statementId: "s" } as unknown as TrailStart, g, P)).rejects.toThrow(/citations array/);
    const bad = graphOf([{ id: "w-x", type: "book" } as unknown as TrailWork], {});
    await expect(
      buildTrail({ statementId: "s", articleId: "A", citations: [cite("c", "w-x")] }, bad, P),
    ).rejects.toThrow(/malformed work/);
  });
});

describe("buildAllTrails", () => {
  it("is linear on a 10,000-article chain: each work and article looked up once, a handful of batches", async () => {
    const n = 10_000;
    const works: TrailWork[] = Array.from({ length: n }, (_, i) => article(`A${i}`));
    works.push({ id: "w-book", type: "methods_source", articleId: null, year: 1970 });
    const stmts: Record<string, PracticeStatementRef[]> = {};
    const starts: TrailStart[] = [];
    for (let i = 0; i < n; i++) {
      const target = i + 1 < n ? `w-A${i + 1}` : "w-book";
      const s = { statementId: `s${i}`, citations: [cite(`c${i}`, target)] };
      stmts[`A${i}`] = [s];
      starts.push({ ...s, articleId: `A${i}` });
    }
    const g = graphOf(works, stmts);
    const all = await buildAllTrails(starts, g, P, { maxDepth: n + 1 });
    expect(all.size).toBe(n);
    expect(all.get("s0")!.ends).toEqual([{ kind: "methods_source", depth: n, workId: "w-book" }]);
    expect(all.get("s0")!.length).toBe(n);
    expect(all.get(`s${n - 1}`)!.length).toBe(1);
    expect(Math.max(...g.requested.works.values())).toBe(1);
    expect(Math.max(...g.requested.articles.values())).toBe(1);
    expect(g.calls.getWorks + g.calls.statementsOfPractice).toBeLessThanOrEqual(4);
  });

  it("memoises a wide DAG with 2^40 paths (each article cites both articles of the next layer)", async () => {
    const layers = 40;
    const works: TrailWork[] = [{ id: "w-book", type: "methods_source", articleId: null, year: 1960 }];
    const stmts: Record<string, PracticeStatementRef[]> = {};
    for (let l = 0; l < layers; l++) {
      for (const side of ["L", "R"]) {
        const id = `${side}${l}`;
        works.push(article(id));
        const cites =
          l + 1 < layers
            ? [cite(`${id}-a`, `w-L${l + 1}`), cite(`${id}-b`, `w-R${l + 1}`)]
            : [cite(`${id}-a`, "w-book")];
        stmts[id] = [{ statementId: `s-${id}`, citations: cites }];
      }
    }
    const g = graphOf(works, stmts);
    const starts = [{ statementId: "s-L0", articleId: "L0", citations: stmts.L0[0].citations }];
    const t = await buildTrail(starts[0], g, P);
    expect(t.ends).toEqual([{ kind: "methods_source", depth: layers, workId: "w-book" }]);
    expect(t.length).toBe(layers);
    const all = await buildAllTrails(starts, g, P);
    expect(all.get("s-L0")!.summaryEnd.kind).toBe("methods_source");
    expect(Math.max(...g.requested.works.values())).toBeLessThanOrEqual(2); // once per build
  });

  it("gives every statement of a cycle its own correct trail", async () => {
    const g = graphOf(
      [article("A"), article("B"), { id: "w-book", type: "methods_source", articleId: null, year: 1999 }],
      {
        A: [{ statementId: "sA", citations: [cite("cAB", "w-B")] }],
        B: [{ statementId: "sB", citations: [cite("cBA", "w-A"), cite("cBbook", "w-book")] }],
      },
    );
    const all = await buildAllTrails(
      [
        { statementId: "sA", articleId: "A", citations: [cite("cAB", "w-B")] },
        { statementId: "sB", articleId: "B", citations: [cite("cBA", "w-A"), cite("cBbook", "w-book")] },
      ],
      g,
      P,
    );
    expect(all.get("sA")!.ends).toEqual([
      { kind: "methods_source", depth: 2, workId: "w-book" },
      { kind: "cycle", depth: 2, workId: "w-A" },
    ]);
    expect(all.get("sB")!.ends).toEqual([
      { kind: "methods_source", depth: 1, workId: "w-book" },
      { kind: "cycle", depth: 2, workId: "w-B" },
    ]);
  });
});
