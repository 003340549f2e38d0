import { z } from "zod";
import { route } from "@/lib/server/request";
import { getDb } from "@/db";
import { HttpError, isUniqueViolation } from "@/lib/server/errors";
import { STATISTIC_KEYS, practiceId as practiceKey, practiceLabel } from "@/lib/practices";
import { practiceFormSchema } from "@/lib/graph/practice-form";
import { enqueueGraph, GRAPH_QUEUES } from "@/workers/graph-jobs";

export const GET = route({ permission: "corpus:read" }, async () => {
  const rows = await getDb()
    .selectFrom("practices")
    .select(["id", "key", "label", "statistic", "comparator", "value", "framing", "is_seeded"])
    .orderBy("statistic")
    .orderBy("key")
    .execute();
  return { practices: rows, statistics: STATISTIC_KEYS };
});

export const POST = route({ permission: "practices:manage", body: practiceFormSchema }, async ({ body, actor }) => {
  const p = {
    statistic: body.statistic,
    comparator: body.comparator,
    value: body.value,
    framing: body.framing ?? null,
  };
  try {
    const row = await getDb()
      .insertInto("practices")
      .values({
        key: practiceKey(p),
        label: body.label?.trim() || practiceLabel(p),
        ...p,
        is_seeded: false,
        created_by: actor.id,
      })
      .returning(["id", "key", "label"])
      .executeTakeFirstOrThrow();
    await enqueueGraph(GRAPH_QUEUES.matchPractice, { practiceId: row.id });
    return row;
  } catch (err) {
    if (isUniqueViolation(err)) throw new HttpError(409, "conflict", "That practice is already tracked.", "value");
    throw err;
  }
});
