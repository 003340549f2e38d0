import { sql } from "kysely";
import type { DB } from "@/db";
import { isStatisticKey, matchPractices, type Practice, type ThresholdStatement } from "@/lib/practices";

/** Practices as lib/practices expects them; rows with a statistic outside the closed list are skipped. */
export async function loadPractices(db: DB, practiceIds?: readonly string[]): Promise<Practice[]> {
  let q = db.selectFrom("practices").select(["id", "statistic", "comparator", "value", "framing"]);
  if (practiceIds) q = q.where("id", "=", sql<string>`any(${practiceIds as string[]}::uuid[])`);
  const rows = await q.execute();
  return rows.flatMap((p) =>
    isStatisticKey(p.statistic)
      ? [{ id: p.id, statistic: p.statistic, comparator: p.comparator, value: p.value, framing: p.framing }]
      : [],
  );
}

interface StatementRow {
  id: string;
  statistic: string | null;
  comparator: ThresholdStatement["comparator"];
  value: number | null;
  framing: ThresholdStatement["framing"];
}

function pairs(statements: StatementRow[], practices: Practice[]): { statement_id: string; practice_id: string }[] {
  const out: { statement_id: string; practice_id: string }[] = [];
  for (const s of statements) {
    const stmt: ThresholdStatement = {
      statistic: isStatisticKey(s.statistic) ? s.statistic : null,
      comparator: s.comparator,
      value: s.value,
      framing: s.framing,
    };
    for (const pid of matchPractices(stmt, practices)) out.push({ statement_id: s.id, practice_id: pid });
  }
  return out;
}

async function insertPairs(db: DB, rows: { statement_id: string; practice_id: string }[]): Promise<void> {
  for (let i = 0; i < rows.length; i += 5000) {
    const chunk = rows.slice(i, i + 5000);
    await sql`insert into statement_practices (statement_id, practice_id)
      select * from unnest(${chunk.map((r) => r.statement_id)}::uuid[], ${chunk.map((r) => r.practice_id)}::uuid[])
      on conflict do nothing`.execute(db);
  }
}

/** Re-matches one article's threshold statements against every practice. Returns the practices touched. */
export async function matchArticle(db: DB, articleId: string): Promise<string[]> {
  const practices = await loadPractices(db);
  const statements = await db
    .selectFrom("statements")
    .select(["id", "statistic", "comparator", "value", "framing"])
    .where("article_id", "=", articleId)
    .where("kind", "=", "threshold")
    .execute();
  const before = await db
    .deleteFrom("statement_practices")
    .where("statement_id", "in", db.selectFrom("statements").select("id").where("article_id", "=", articleId))
    .returning("practice_id")
    .execute();
  const rows = pairs(statements, practices);
  await insertPairs(db, rows);
  return [...new Set([...before.map((r) => r.practice_id), ...rows.map((r) => r.practice_id)])];
}

/** Re-matches every threshold statement of the corpus against one practice (after it is created or edited). */
export async function matchPractice(db: DB, practiceId: string): Promise<number> {
  const practices = await loadPractices(db, [practiceId]);
  await db.deleteFrom("statement_practices").where("practice_id", "=", practiceId).execute();
  if (practices.length === 0) return 0;
  const p = practices[0];
  // Narrow in SQL by statistic, then let lib/practices decide (comparator family, tolerance, framing).
  const statements = await db
    .selectFrom("statements")
    .select(["id", "statistic", "comparator", "value", "framing"])
    .where("kind", "=", "threshold")
    .where("statistic", "=", p.statistic)
    .execute();
  const rows = pairs(statements, practices);
  await insertPairs(db, rows);
  return rows.length;
}
