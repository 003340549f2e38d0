import type { Transaction } from "kysely";
import type { Database } from "@/db";
import { practiceId as practiceKey, practiceLabel } from "@/lib/practices";
import { matchPractice } from "@/lib/jobs/graph";
import type { PracticeForm } from "./practice-form";

/**
 * A curator's new practice and the job that matches every statement to it, in the caller's
 * transaction: both are committed or neither is. A practice already tracked fails with 23505.
 */
export async function createPractice(trx: Transaction<Database>, form: PracticeForm, createdBy: string | null) {
  const p = {
    statistic: form.statistic,
    comparator: form.comparator,
    value: form.value,
    framing: form.framing ?? null,
  };
  const row = await trx
    .insertInto("practices")
    .values({
      key: practiceKey(p),
      label: form.label?.trim() || practiceLabel(p),
      ...p,
      is_seeded: false,
      created_by: createdBy,
    })
    .returning(["id", "key", "label"])
    .executeTakeFirstOrThrow();
  await matchPractice.send(trx, { practiceId: row.id });
  return row;
}
