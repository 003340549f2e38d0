import { sql } from "kysely";
import type { DB } from "@/db";
import { factWhere, practiceCte, type Filters } from "./filters";
import type { Table } from "./queries";
import type { PracticeRef } from "./filters";

type DriftRow = Record<string, string | number | null>;

/** The drift list and its practice in one statement. */
export function driftSql(f: Filters) {
  return sql<{ practice: PracticeRef | null; rows: DriftRow[] }>`
    with ${practiceCte(f)},
    d as (select f.statement_id, f.article_id, a.title as article_title, f.year, s.sentence, s.value as claimed_value,
        f.work_id, w.title as work_title, sc.verdict, sc.stated_value, sc.page, sc.quote, c.locator, f.citation_id
      from dash_citation_facts f
      join source_checks sc on sc.work_id = f.work_id and sc.practice_id = f.practice_id
      join statements s on s.id = f.statement_id
      join articles a on a.id = f.article_id
      join works w on w.id = f.work_id
      join citations c on c.id = f.citation_id
      where f.practice_id = (select id from p) ${factWhere(f, "f")}
        and (sc.verdict = 'says_otherwise' or (sc.stated_value is not null and s.value is not null and abs(sc.stated_value - s.value) > 0.005 + 1e-9))
      order by f.year desc, f.statement_id, f.citation_id limit 500)
    select (select row_to_json(p) from p) as practice,
      coalesce((select json_agg(json_build_object('statement_id', statement_id, 'article_id', article_id, 'article_title', article_title, 'year', year,
          'sentence', sentence, 'claimed_value', claimed_value, 'work_id', work_id, 'work_title', work_title, 'verdict', verdict,
          'stated_value', stated_value, 'page', page, 'quote', quote, 'locator', locator) order by year desc, statement_id, citation_id) from d), '[]') as rows`;
}

/**
 * Drift: claims of the practice that cite a checked source whose stated value differs from the
 * claim's value, or whose check says the source says otherwise. Values are compared with the
 * same half-unit tolerance lib/practices uses for matching (0.005).
 */
export async function driftView(
  db: DB,
  f: Filters,
): Promise<{ practice: PracticeRef | null; tables: { drift: Table }; notes: string[] }> {
  const { practice, rows } = (await driftSql(f).execute(db)).rows[0];
  const table: Table = {
    title: "Claims whose value differs from what their checked source says",
    columns: [
      "statement_id",
      "article_id",
      "article_title",
      "year",
      "sentence",
      "claimed_value",
      "work_id",
      "work_title",
      "verdict",
      "stated_value",
      "page",
      "quote",
      "locator",
    ],
    rows: [],
  };
  if (!practice) return { practice: null, tables: { drift: table }, notes: [] };
  table.rows = rows;
  return {
    practice,
    tables: { drift: table },
    notes: [
      "A difference is a prompt to read both texts, not a finding: the source may give several values for different purposes.",
    ],
  };
}
