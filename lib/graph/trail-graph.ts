import { sql } from "kysely";
import type { DB } from "@/db";
import type { PracticeStatementRef, TrailCitation, TrailGraph, TrailStart, TrailWork } from "@/lib/trails";

interface CitationRow {
  statement_id: string;
  article_id: string;
  citation_id: string | null;
  work_id: string | null;
  locator: string | null;
  secondary: boolean | null;
}

/**
 * Statements of a practice with their in-text citations and the works those resolve to. Only
 * articles that enter dashboards (done, licensed) take part, so a trail never runs through a
 * half-mined article. `articleIds` null means every article.
 */
async function practiceStatements(
  db: DB,
  practiceId: string,
  articleIds: readonly string[] | null,
  statementId?: string,
): Promise<CitationRow[]> {
  const r = await sql<CitationRow>`
    select s.id as statement_id, s.article_id, c.id as citation_id, r.work_id, c.locator, c.secondary
    from statement_practices sp
    join statements s on s.id = sp.statement_id
    join articles a on a.id = s.article_id and a.status = 'done' and a.licence is not null
    left join statement_citations sc on sc.statement_id = s.id
    left join citations c on c.id = sc.citation_id
    left join "references" r on r.id = c.reference_id
    where sp.practice_id = ${practiceId}
      ${articleIds ? sql`and s.article_id = any(${articleIds as string[]}::uuid[])` : sql``}
      ${statementId ? sql`and s.id = ${statementId}` : sql``}
    order by s.article_id, s.id, c.ordinal`.execute(db);
  return r.rows;
}

function group(rows: CitationRow[]): TrailStart[] {
  const out = new Map<string, TrailStart & { citations: TrailCitation[] }>();
  for (const row of rows) {
    let s = out.get(row.statement_id);
    if (!s) {
      s = { statementId: row.statement_id, articleId: row.article_id, citations: [] };
      out.set(row.statement_id, s);
    }
    if (row.citation_id) {
      s.citations.push({
        citationId: row.citation_id,
        workId: row.work_id,
        locator: row.locator,
        secondary: !!row.secondary,
      });
    }
  }
  return [...out.values()];
}

/** Trail starts: every statement of the practice (or one statement), with its citations. */
export async function trailStarts(db: DB, practiceId: string, statementId?: string): Promise<TrailStart[]> {
  return group(await practiceStatements(db, practiceId, null, statementId));
}

/** The TrailGraph of lib/trails over the database: one query per batch the builder asks for. */
export function dbTrailGraph(db: DB): TrailGraph {
  return {
    async getWorks(ids): Promise<TrailWork[]> {
      if (ids.length === 0) return [];
      const rows = await db
        .selectFrom("works")
        .select(["id", "work_type", "article_id", "year"])
        .where("id", "=", sql<string>`any(${ids as string[]}::uuid[])`)
        .execute();
      return rows.map((w) => ({ id: w.id, type: w.work_type, articleId: w.article_id, year: w.year }));
    },
    async statementsOfPractice(articleIds, practiceId) {
      const map = new Map<string, PracticeStatementRef[]>();
      if (articleIds.length === 0) return map;
      for (const s of group(await practiceStatements(db, practiceId, articleIds))) {
        const list = map.get(s.articleId) ?? [];
        list.push({ statementId: s.statementId, citations: s.citations });
        map.set(s.articleId, list);
      }
      return map;
    },
  };
}
