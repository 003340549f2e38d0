import { route } from "@/lib/server/request";
import { getDb } from "@/db";
import { HttpError, isUniqueViolation } from "@/lib/server/errors";
import { STATISTIC_KEYS, practiceId as practiceKey, practiceLabel } from "@/lib/practices";
import { practiceFormSchema } from "@/lib/graph/practice-form";
import { createPractice, listPractices } from "@/db/queries/practices";
import { enqueueGraph, GRAPH_QUEUES } from "@/workers/graph-jobs";

export const GET = route({ permission: "corpus:read" }, async () => ({
  practices: await listPractices(getDb()),
  statistics: STATISTIC_KEYS,
}));

export const POST = route({ permission: "practices:manage", body: practiceFormSchema }, async ({ body, actor }) => {
  const p = {
    statistic: body.statistic,
    comparator: body.comparator,
    value: body.value,
    framing: body.framing ?? null,
  };
  try {
    const row = await createPractice(getDb(), {
      key: practiceKey(p),
      label: body.label?.trim() || practiceLabel(p),
      ...p,
      createdBy: actor.id,
    });
    await enqueueGraph(GRAPH_QUEUES.matchPractice, { practiceId: row.id });
    return row;
  } catch (err) {
    if (isUniqueViolation(err)) throw new HttpError(409, "conflict", "That practice is already tracked.", "value");
    throw err;
  }
});
