import { sql } from "kysely";
import type { DB } from "@/db";
import { statementTrail } from "@/lib/graph/trails";
import { factWhere, practiceCte, type Filters, type PracticeRef } from "./filters";
import { topWorksCte } from "./queries";

/** A node of the trail graph as the page draws it: x is the year, so the chain reads in time. */
export interface GraphNode {
  id: string;
  kind: "statement" | "work" | "unresolved";
  label: string;
  year: number | null;
  /** Where a click goes: the sentence in its article, or the work's page. */
  href: string | null;
  workType?: string;
  sentence?: string;
  end?: string | null;
}
export interface GraphEdge {
  id: string;
  from: string;
  to: string;
  kind: "cites" | "asserted_in";
  locator: string | null;
  secondary: boolean;
  count: number;
}
export interface TrailGraphView {
  practice: PracticeRef | null;
  nodes: GraphNode[];
  edges: GraphEdge[];
  /** Same data as a table for screen readers and CSV. */
  columns: string[];
  rows: Record<string, string | number | boolean | null>[];
  ends?: unknown;
}

const statementHref = (articleId: string, statementId: string) => `/articles/${articleId}#statement-${statementId}`;

function short(title: string | null, fallback: string): string {
  const t = (title ?? fallback).trim();
  return t.length > 60 ? `${t.slice(0, 57)}…` : t;
}

function asTable(nodes: GraphNode[], edges: GraphEdge[]) {
  const byId = new Map(nodes.map((n) => [n.id, n]));
  return {
    columns: ["from", "from_year", "to", "to_year", "kind", "locator", "secondary", "count"],
    rows: edges.map((e) => ({
      from: byId.get(e.from)?.label ?? e.from,
      from_year: byId.get(e.from)?.year ?? null,
      to: byId.get(e.to)?.label ?? e.to,
      to_year: byId.get(e.to)?.year ?? null,
      kind: e.kind,
      locator: e.locator,
      secondary: e.secondary,
      count: e.count,
    })),
  };
}

/** One statement's trail as a graph, built live from the citation graph. */
export async function statementTrailView(
  db: DB,
  statementId: string,
  practiceId: string,
): Promise<TrailGraphView | null> {
  const trail = await statementTrail(db, statementId, practiceId);
  if (!trail) return null;
  const practice =
    (await db
      .selectFrom("practices")
      .select(["id", "key", "label", "statistic"])
      .where("id", "=", practiceId)
      .executeTakeFirst()) ?? null;
  const stmtIds = trail.nodes.flatMap((n) => (n.kind === "statement" ? [n.statementId] : []));
  const workIds = trail.nodes.flatMap((n) => (n.kind === "work" ? [n.workId] : []));
  const [stmts, works] = await Promise.all([
    stmtIds.length
      ? db
          .selectFrom("statements as s")
          .innerJoin("articles as a", "a.id", "s.article_id")
          .select(["s.id", "s.sentence", "a.id as article_id", "a.title", "a.year"])
          .where("s.id", "in", stmtIds)
          .execute()
      : [],
    workIds.length
      ? db
          .selectFrom("works")
          .select(["id", "title", "first_author", "year", "work_type"])
          .where("id", "in", workIds)
          .execute()
      : [],
  ]);
  const sMap = new Map(stmts.map((s) => [s.id, s]));
  const wMap = new Map(works.map((w) => [w.id, w]));
  const endByWork = new Map(trail.ends.filter((e) => e.workId).map((e) => [e.workId as string, e.kind]));
  const nodes: GraphNode[] = trail.nodes.map((n) => {
    if (n.kind === "statement") {
      const s = sMap.get(n.statementId);
      return {
        id: n.id,
        kind: "statement",
        label: short(s?.title ?? null, "Untitled article"),
        year: s?.year ?? null,
        href: statementHref(n.articleId, n.statementId),
        sentence: s?.sentence,
      };
    }
    if (n.kind === "work") {
      const w = wMap.get(n.workId);
      const y = Number.parseInt(w?.year ?? "", 10);
      return {
        id: n.id,
        kind: "work",
        label: short(w?.title ?? null, w?.first_author ?? "Untitled work"),
        year: Number.isFinite(y) ? y : null,
        href: `/works/${n.workId}`,
        workType: n.type,
        end: endByWork.get(n.workId) ?? null,
      };
    }
    return { id: n.id, kind: "unresolved", label: "Unresolved reference", year: null, href: null, end: "unresolved" };
  });
  const edges: GraphEdge[] = trail.edges.map((e, i) => ({
    id: `e${i}`,
    from: e.from,
    to: e.to,
    kind: e.kind,
    locator: e.kind === "cites" ? e.locator : null,
    secondary: e.kind === "cites" ? e.secondary : false,
    count: 1,
  }));
  return { practice, nodes, edges, ...asTable(nodes, edges), ends: trail.ends };
}

/**
 * A practice's trails as one graph: the most cited works of the practice and the latest statements
 * citing them (bounded, so the picture stays readable), with statements inside a cited article
 * linked to that article's work.
 */
type PracticeEdgeRow = {
  statement_id: string;
  article_id: string;
  year: number;
  work_id: string;
  cited_article_id: string | null;
  locator: string | null;
  secondary: boolean;
  sentence: string;
  title: string | null;
  w_title: string | null;
  w_author: string | null;
  w_year: string | null;
  w_type: string;
  end_kind: string | null;
};

/**
 * The practice trail graph's one statement: top works (from the roll-up when no venue or year
 * filter is set), the latest statements citing them, and those statements' citations to them.
 * A statement's year is its article's, the same on all its citation facts, so "latest" needs no
 * second fact view.
 */
export function practiceTrailSql(f: Filters, limits = { works: 15, statements: 60 }) {
  return sql<{ practice: PracticeRef | null; rows: PracticeEdgeRow[] }>`
    with ${practiceCte(f)},
    ${topWorksCte(f, limits.works)},
    latest as (
      select f.statement_id, f.year from dash_citation_facts f join top using (work_id)
      where f.practice_id = (select id from p) ${factWhere(f, "f")}
      group by f.statement_id, f.year order by f.year desc, f.statement_id limit ${limits.statements}),
    e as (
      select f.statement_id, f.article_id, f.year, f.work_id, f.cited_article_id, c.locator, c.secondary, c.ordinal,
        s.sentence, a.title, w.title as w_title, w.first_author as w_author, w.year as w_year, w.work_type as w_type, t.end_kind
      from latest l
      join dash_citation_facts f on f.practice_id = (select id from p) and f.statement_id = l.statement_id
      join top using (work_id)
      join citations c on c.id = f.citation_id
      join statements s on s.id = f.statement_id
      join articles a on a.id = f.article_id
      join works w on w.id = f.work_id
      left join trails t on t.statement_id = f.statement_id and t.practice_id = f.practice_id)
    select (select row_to_json(p) from p) as practice,
      coalesce((select json_agg(json_build_object('statement_id', statement_id, 'article_id', article_id, 'year', year, 'work_id', work_id,
          'cited_article_id', cited_article_id, 'locator', locator, 'secondary', secondary, 'sentence', sentence, 'title', title,
          'w_title', w_title, 'w_author', w_author, 'w_year', w_year, 'w_type', w_type, 'end_kind', end_kind)
        order by year desc, statement_id, ordinal, work_id) from e), '[]') as rows`;
}

/**
 * A practice's trails as one graph: the most cited works of the practice and the latest statements
 * citing them (bounded, so the picture stays readable), with statements inside a cited article
 * linked to that article's work.
 */
export async function practiceTrailView(
  db: DB,
  f: Filters,
  limits = { works: 15, statements: 60 },
): Promise<TrailGraphView> {
  const { practice, rows } = (await practiceTrailSql(f, limits).execute(db)).rows[0];
  if (!practice) return { practice: null, nodes: [], edges: [], ...asTable([], []) };
  const r = { rows };
  const nodes = new Map<string, GraphNode>();
  const edges: GraphEdge[] = [];
  const stmtsByArticle = new Map<string, string[]>();
  for (const x of r.rows) {
    const sid = `statement:${x.statement_id}`;
    if (!nodes.has(sid)) {
      nodes.set(sid, {
        id: sid,
        kind: "statement",
        label: short(x.title, "Untitled article"),
        year: x.year,
        href: statementHref(x.article_id, x.statement_id),
        sentence: x.sentence,
        end: x.end_kind,
      });
      stmtsByArticle.set(x.article_id, [...(stmtsByArticle.get(x.article_id) ?? []), sid]);
    }
    const wid = `work:${x.work_id}`;
    const y = Number.parseInt(x.w_year ?? "", 10);
    if (!nodes.has(wid))
      nodes.set(wid, {
        id: wid,
        kind: "work",
        label: short(x.w_title, x.w_author ?? "Untitled work"),
        year: Number.isFinite(y) ? y : null,
        href: `/works/${x.work_id}`,
        workType: x.w_type,
      });
    edges.push({
      id: `c${edges.length}`,
      from: sid,
      to: wid,
      kind: "cites",
      locator: x.locator,
      secondary: x.secondary,
      count: 1,
    });
  }
  const seen = new Set<string>();
  for (const x of r.rows) {
    if (!x.cited_article_id) continue;
    for (const sid of stmtsByArticle.get(x.cited_article_id) ?? []) {
      const id = `a:${x.work_id}:${sid}`;
      if (seen.has(id)) continue;
      seen.add(id);
      edges.push({
        id,
        from: `work:${x.work_id}`,
        to: sid,
        kind: "asserted_in",
        locator: null,
        secondary: false,
        count: 1,
      });
    }
  }
  const ns = [...nodes.values()];
  return { practice, nodes: ns, edges, ...asTable(ns, edges) };
}
