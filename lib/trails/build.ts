import {
  END_PRIORITY,
  type PracticeStatementRef,
  type Trail,
  type TrailCitation,
  type TrailEdge,
  type TrailEnd,
  type TrailGraph,
  type TrailNode,
  type TrailOptions,
  type TrailStart,
  type TrailSummary,
  type TrailWork,
} from "./types";

export const DEFAULT_MAX_DEPTH = 100;
const WORK_TYPES = new Set(["methods_source", "empirical", "unknown"]);

function maxDepthOf(opts: TrailOptions | undefined): number {
  const d = opts?.maxDepth ?? DEFAULT_MAX_DEPTH;
  if (!Number.isInteger(d) || d < 1) throw new RangeError(`maxDepth must be a positive integer, got ${String(d)}`);
  return d;
}

/** Cached, batched lookups: each work and each article is asked for at most once per cache. */
class Lookup {
  readonly works = new Map<string, TrailWork | null>();
  readonly statements = new Map<string, readonly PracticeStatementRef[]>();
  constructor(
    private readonly graph: TrailGraph,
    readonly practiceId: string,
  ) {}

  /** Multi-source breadth-first prefetch, one batch per level, `levels` citation hops deep. */
  async prefetch(starts: readonly { citations: readonly TrailCitation[] }[], levels: number): Promise<void> {
    let citations: TrailCitation[] = starts.flatMap((s) => [...s.citations]);
    for (let level = 1; level <= levels && citations.length > 0; level++) {
      const wanted = [
        ...new Set(citations.map((c) => c.workId).filter((id): id is string => id !== null && !this.works.has(id))),
      ];
      if (wanted.length > 0) {
        for (const id of wanted) this.works.set(id, null);
        for (const w of await this.graph.getWorks(wanted)) {
          if (!w || typeof w.id !== "string" || !WORK_TYPES.has(w.type)) {
            throw new TypeError(`TrailGraph.getWorks returned a malformed work: ${JSON.stringify(w)}`);
          }
          if (this.works.has(w.id)) this.works.set(w.id, w);
        }
      }
      // Follow only works reached at this level, so each article is asked for once overall.
      const articles = [
        ...new Set(
          wanted
            .map((id) => this.works.get(id))
            .filter((w): w is TrailWork => !!w && w.type !== "methods_source" && w.articleId !== null)
            .map((w) => w.articleId as string)
            .filter((a) => !this.statements.has(a)),
        ),
      ];
      citations = [];
      if (articles.length === 0) continue;
      const found = await this.graph.statementsOfPractice(articles, this.practiceId);
      for (const a of articles) {
        const list = found.get(a) ?? [];
        this.statements.set(a, list);
        for (const s of list) citations.push(...s.citations);
      }
    }
  }

  /** The article a citation leads on to, when that article asserts the practice; else null. */
  assertingArticle(w: TrailWork): string | null {
    if (w.type === "methods_source" || w.articleId === null) return null;
    const list = this.statements.get(w.articleId);
    return list && list.length > 0 ? w.articleId : null;
  }
}

function endKey(e: TrailEnd): string {
  return `${e.kind}|${e.workId ?? ""}|${e.citationId ?? ""}|${e.statementId ?? ""}`;
}

function addEnd(ends: Map<string, TrailEnd>, e: TrailEnd): void {
  const k = endKey(e);
  const prev = ends.get(k);
  if (!prev || prev.depth > e.depth) ends.set(k, e);
}

interface Summary {
  /** Depths relative to the article (its own statements' citations are at depth 1). */
  ends: Map<string, TrailEnd>;
  length: number;
  truncated: boolean;
}

type Item = { kind: "no_citation"; statementId: string } | { kind: "cite"; citation: TrailCitation };

interface Frame {
  articleId: string | null;
  budget: number;
  items: Item[];
  i: number;
  summary: Summary;
  /** Lowest stack index of an ancestor this frame's result depends on (via a cycle end); Infinity if none. */
  taint: number;
  stackIndex: number;
}

function itemsOf(statements: readonly PracticeStatementRef[]): Item[] {
  const items: Item[] = [];
  for (const s of statements) {
    if (s.citations.length === 0) items.push({ kind: "no_citation", statementId: s.statementId });
    for (const c of s.citations) items.push({ kind: "cite", citation: c });
  }
  return items;
}

/**
 * Depth-first walk with memoised per-article summaries. It is iterative (explicit stack) so a
 * 10,000-article chain cannot overflow the call stack. A summary is memoised only when it does not
 * depend on which ancestors are on the path: one that ended in a cycle back to an ancestor is
 * recomputed when reached again, which costs extra only inside cycles (rare in citation graphs:
 * mutual in-press citations). Truncated summaries are memoised per remaining budget.
 */
class Walker {
  private readonly memo = new Map<string, { summary: Summary; budget: number }[]>();
  constructor(private readonly lookup: Lookup) {}

  private recall(articleId: string, budget: number): Summary | null {
    for (const m of this.memo.get(articleId) ?? []) {
      if (m.summary.truncated ? m.budget === budget : m.summary.length <= budget) return m.summary;
    }
    return null;
  }

  summarise(start: TrailStart, maxDepth: number): Summary {
    const root: Frame = {
      articleId: null,
      budget: maxDepth,
      items: itemsOf([start]),
      i: 0,
      summary: { ends: new Map(), length: 0, truncated: false },
      taint: Infinity,
      stackIndex: 0,
    };
    const stack: Frame[] = [root];
    // The start's own article counts as on the path: A cites B cites A is a cycle at B.
    const onStack = new Map<string, number>([[start.articleId, 0]]);

    const merge = (into: Frame, child: Summary) => {
      for (const e of child.ends.values()) addEnd(into.summary.ends, { ...e, depth: e.depth + 1 });
      into.summary.length = Math.max(into.summary.length, child.length + 1);
      into.summary.truncated ||= child.truncated;
    };
    const end = (f: Frame, e: TrailEnd) => {
      addEnd(f.summary.ends, e);
      f.summary.length = Math.max(f.summary.length, e.depth);
    };

    while (stack.length > 0) {
      const f = stack[stack.length - 1];
      if (f.i >= f.items.length) {
        stack.pop();
        if (f.articleId !== null) {
          onStack.delete(f.articleId);
          if (f.taint >= f.stackIndex) {
            const list = this.memo.get(f.articleId) ?? [];
            list.push({ summary: f.summary, budget: f.budget });
            this.memo.set(f.articleId, list);
          }
        }
        const parent = stack[stack.length - 1];
        if (parent) {
          merge(parent, f.summary);
          if (f.taint < f.stackIndex) parent.taint = Math.min(parent.taint, f.taint);
        }
        continue;
      }
      const item = f.items[f.i++];
      if (item.kind === "no_citation") {
        end(f, { kind: "no_citation", depth: 0, statementId: item.statementId });
        continue;
      }
      const c = item.citation;
      const work = c.workId === null ? null : (this.lookup.works.get(c.workId) ?? null);
      if (!work) {
        end(f, { kind: "unresolved", depth: 1, citationId: c.citationId, ...(c.workId ? { workId: c.workId } : {}) });
        continue;
      }
      if (work.type === "methods_source") {
        end(f, { kind: "methods_source", depth: 1, workId: work.id });
        continue;
      }
      const next =
        work.articleId !== null && onStack.has(work.articleId) ? work.articleId : this.lookup.assertingArticle(work);
      if (next === null) {
        end(f, { kind: work.type === "empirical" ? "empirical_precedent" : "unclassified", depth: 1, workId: work.id });
        continue;
      }
      const ancestor = onStack.get(next);
      if (ancestor !== undefined) {
        end(f, { kind: "cycle", depth: 1, workId: work.id });
        f.taint = Math.min(f.taint, ancestor);
        continue;
      }
      if (f.budget <= 1) {
        end(f, { kind: "depth_limit", depth: 1, workId: work.id });
        f.summary.truncated = true;
        continue;
      }
      const remembered = this.recall(next, f.budget - 1);
      if (remembered) {
        merge(f, remembered);
        continue;
      }
      const child: Frame = {
        articleId: next,
        budget: f.budget - 1,
        items: itemsOf(this.lookup.statements.get(next) ?? []),
        i: 0,
        summary: { ends: new Map(), length: 0, truncated: false },
        taint: Infinity,
        stackIndex: stack.length,
      };
      onStack.set(next, child.stackIndex);
      stack.push(child);
    }
    return root.summary;
  }
}

function toSummary(start: TrailStart, practiceId: string, s: Summary): TrailSummary {
  const rank = (k: TrailEnd["kind"]) => END_PRIORITY.indexOf(k);
  const ends = [...s.ends.values()].sort(
    (a, b) => rank(a.kind) - rank(b.kind) || a.depth - b.depth || endKey(a).localeCompare(endKey(b)),
  );
  return { statementId: start.statementId, practiceId, ends, length: s.length, summaryEnd: ends[0] };
}

function assertStart(start: TrailStart): void {
  if (
    !start ||
    typeof start.statementId !== "string" ||
    typeof start.articleId !== "string" ||
    !Array.isArray(start.citations)
  ) {
    throw new TypeError("a trail start needs statementId, articleId and a citations array");
  }
}

/** Steps of one trail for display: breadth-first over the cached lookups, shortest depth per node. */
function steps(start: TrailStart, lookup: Lookup, maxDepth: number): { nodes: TrailNode[]; edges: TrailEdge[] } {
  const nodes = new Map<string, TrailNode>();
  const edges: TrailEdge[] = [];
  const startId = `statement:${start.statementId}`;
  nodes.set(startId, {
    id: startId,
    kind: "statement",
    statementId: start.statementId,
    articleId: start.articleId,
    depth: 0,
  });
  let frontier: { nodeId: string; citations: readonly TrailCitation[] }[] = [
    { nodeId: startId, citations: start.citations },
  ];
  const expanded = new Set<string>([start.articleId]);
  for (let depth = 1; depth <= maxDepth && frontier.length > 0; depth++) {
    const next: typeof frontier = [];
    for (const { nodeId, citations } of frontier) {
      for (const c of citations) {
        const work = c.workId === null ? null : (lookup.works.get(c.workId) ?? null);
        const to = work ? `work:${work.id}` : `unresolved:${c.citationId}`;
        if (!nodes.has(to)) {
          nodes.set(
            to,
            work
              ? {
                  id: to,
                  kind: "work",
                  workId: work.id,
                  type: work.type,
                  articleId: work.articleId,
                  year: work.year,
                  depth,
                }
              : { id: to, kind: "unresolved", citationId: c.citationId, workId: c.workId, depth },
          );
        }
        edges.push({
          from: nodeId,
          to,
          kind: "cites",
          citationId: c.citationId,
          locator: c.locator,
          secondary: c.secondary,
        });
        const article = work ? lookup.assertingArticle(work) : null;
        if (article === null || expanded.has(article) || depth >= maxDepth) continue;
        expanded.add(article);
        for (const s of lookup.statements.get(article) ?? []) {
          const sid = `statement:${s.statementId}`;
          if (!nodes.has(sid))
            nodes.set(sid, { id: sid, kind: "statement", statementId: s.statementId, articleId: article, depth });
          edges.push({ from: to, to: sid, kind: "asserted_in" });
          next.push({ nodeId: sid, citations: s.citations });
        }
      }
    }
    frontier = next;
  }
  return { nodes: [...nodes.values()], edges };
}

/**
 * The trail behind one statement of a practice, with its steps (nodes and edges) for display.
 * Lookups go to the graph in one batch per level of the chain.
 */
export async function buildTrail(
  start: TrailStart,
  graph: TrailGraph,
  practiceId: string,
  opts?: TrailOptions,
): Promise<Trail> {
  assertStart(start);
  const maxDepth = maxDepthOf(opts);
  const lookup = new Lookup(graph, practiceId);
  await lookup.prefetch([start], maxDepth);
  const summary = toSummary(start, practiceId, new Walker(lookup).summarise(start, maxDepth));
  return { ...summary, ...steps(start, lookup, maxDepth) };
}

/**
 * Trail summaries for many statements of one practice (a whole corpus), keyed by statement id.
 * Lookups are shared and batched per level across all starts, and per-article results are
 * memoised, so the cost grows with the size of the citation graph, not with the number of paths.
 * Steps are left out here; ask buildTrail for one trail's steps.
 */
export async function buildAllTrails(
  starts: readonly TrailStart[],
  graph: TrailGraph,
  practiceId: string,
  opts?: TrailOptions,
): Promise<Map<string, TrailSummary>> {
  if (!Array.isArray(starts)) throw new TypeError("buildAllTrails needs an array of starts");
  starts.forEach(assertStart);
  const maxDepth = maxDepthOf(opts);
  const lookup = new Lookup(graph, practiceId);
  // Multi-source BFS: anything within maxDepth of some start is within maxDepth of the nearest one.
  await lookup.prefetch(starts, maxDepth);
  const walker = new Walker(lookup);
  const out = new Map<string, TrailSummary>();
  for (const s of starts) out.set(s.statementId, toSummary(s, practiceId, walker.summarise(s, maxDepth)));
  return out;
}
