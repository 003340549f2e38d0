import type { DB } from "@/db";
import { createPractice as insertPractice } from "@/db/queries/practices";
import { requireTransaction } from "@/db";
import { practiceId as practiceKey, practiceLabel } from "@/lib/practices";
import { matchPractice } from "@/lib/jobs/graph";
import type { PracticeForm } from "./practice-form";

/**
 * A curator's new practice and the job that matches every statement to it, in the caller's
 * transaction: both are committed or neither is. A practice already tracked fails with 23505.
 */
export async function createPractice(trx: DB, form: PracticeForm, createdBy: string | null) {
  requireTransaction(trx, "createPractice");
  const p = {
    statistic: form.statistic,
    comparator: form.comparator,
    value: form.value,
    framing: form.framing ?? null,
  };
  const row = await insertPractice(trx, {
    key: practiceKey(p),
    label: form.label?.trim() || practiceLabel(p),
    ...p,
    createdBy,
  });
  await matchPractice.send(trx, { practiceId: row.id });
  return row;
}
