import { sql } from "kysely";
import type { Executor } from "@/db";
import type { SourceCheckVerdict } from "@/lib/vocabulary";

export interface SourceCheckInput {
  workId: string;
  practiceId: string;
  verdict: SourceCheckVerdict;
  page?: string | null;
  quote?: string | null;
  statedValue?: number | null;
  checkedBy: string | null;
}

/** One check per (work, practice): a new record replaces the old one. Null when work or practice is missing. */
export async function recordSourceCheck(db: Executor, c: SourceCheckInput): Promise<{ id: string } | null> {
  const [w, p] = await Promise.all([
    db.selectFrom("works").select("id").where("id", "=", c.workId).where("merged_into", "is", null).executeTakeFirst(),
    db.selectFrom("practices").select("id").where("id", "=", c.practiceId).executeTakeFirst(),
  ]);
  if (!w || !p) return null;
  const values = {
    verdict: c.verdict,
    page: c.page || null,
    quote: c.quote || null,
    stated_value: c.statedValue ?? null,
    checked_by: c.checkedBy,
  };
  return db
    .insertInto("source_checks")
    .values({ work_id: c.workId, practice_id: c.practiceId, ...values })
    .onConflict((oc) => oc.columns(["work_id", "practice_id"]).doUpdateSet({ ...values, checked_at: sql`now()` }))
    .returning("id")
    .executeTakeFirstOrThrow();
}
