import { sql } from "kysely";
import type { DB } from "@/db";
import type { Comparator, Framing, StatisticKey } from "@/lib/vocabulary";

// Practices as the API, the practices page and the source-check form list them.

export async function listPractices(db: DB) {
  return db
    .selectFrom("practices")
    .select(["id", "key", "label", "statistic", "comparator", "value", "framing", "is_seeded"])
    .orderBy("statistic")
    .orderBy("key")
    .execute();
}

/** Each practice with how many statements assert it (the practices page). */
export async function practicesWithCounts(db: DB) {
  return db
    .selectFrom("practices as p")
    .leftJoin("statement_practices as sp", "sp.practice_id", "p.id")
    .select(["p.id", "p.label", "p.is_seeded", sql<number>`count(sp.statement_id)::int`.as("statements")])
    .groupBy("p.id")
    .orderBy("p.label")
    .execute();
}

/** Id and label, by label: the choices of a select box. */
export async function practiceOptions(db: DB) {
  return db.selectFrom("practices").select(["id", "label"]).orderBy("label").execute();
}

/** A curator's new practice; unique on its key (23505 when it is tracked already). */
export async function createPractice(
  db: DB,
  p: {
    key: string;
    label: string;
    statistic: StatisticKey;
    comparator: Comparator;
    value: number;
    framing: Framing | null;
    createdBy: string | null;
  },
) {
  return db
    .insertInto("practices")
    .values({
      key: p.key,
      label: p.label,
      statistic: p.statistic,
      comparator: p.comparator,
      value: p.value,
      framing: p.framing,
      is_seeded: false,
      created_by: p.createdBy,
    })
    .returning(["id", "key", "label"])
    .executeTakeFirstOrThrow();
}

/** The first tracked practice a statement asserts (a trail needs one), or undefined. */
export async function firstPracticeOf(db: DB, statementId: string): Promise<string | undefined> {
  const r = await db
    .selectFrom("statement_practices")
    .select("practice_id")
    .where("statement_id", "=", statementId)
    .orderBy("practice_id")
    .executeTakeFirst();
  return r?.practice_id;
}
