import { sql } from "kysely";
import type { DB } from "@/db";
import { factWhere, pickPractice, type Filters } from "./filters";
import type { Table } from "./queries";
import type { PracticeRef } from "./filters";

/**
 * Drift: claims of the practice that cite a checked source whose stated value differs from the
 * claim's value, or whose check says the source says otherwise. Values are compared with the
 * same half-unit tolerance lib/practices uses for matching (0.005).
 */
export async function driftView(db: DB, f: Filters): Promise<{ practice: PracticeRef | null; tables: { drift: Table }; notes: string[] }> {
  const practice = await pickPractice(db, f);
  const table: Table = {
    title: "Claims whose value differs from what their checked source says",
    columns: ["statement_id", "article_id", "article_title", "year", "sentence", "claimed_value", "work_id", "work_title", "verdict", "stated_value", "page", "quote", "locator"],
    rows: [],
  };
  if (!practice) return { practice: null, tables: { drift: table }, notes: [] };
  const r = await sql<Record<string, string | number | null>>`
    select f.statement_id, f.article_id, a.title as article_title, f.year, s.sentence, s.value as claimed_value,
      f.work_id, w.title as work_title, sc.verdict, sc.stated_value, sc.page, sc.quote, c.locator
    from dash_citation_facts f
    join source_checks sc on sc.work_id = f.work_id and sc.practice_id = f.practice_id
    join statements s on s.id = f.statement_id
    join articles a on a.id = f.article_id
    join works w on w.id = f.work_id
    join citations c on c.id = f.citation_id
    where f.practice_id = ${practice.id} ${factWhere(f, "f")}
      and (sc.verdict = 'says_otherwise' or (sc.stated_value is not null and s.value is not null and abs(sc.stated_value - s.value) > 0.005 + 1e-9))
    order by f.year desc, f.statement_id limit 500`.execute(db);
  table.rows = r.rows;
  return { practice, tables: { drift: table }, notes: ["A difference is a prompt to read both texts, not a finding: the source may give several values for different purposes."] };
}
