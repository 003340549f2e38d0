import { route } from "@/lib/server/request";
import { getDb } from "@/db";
import { HttpError, isUniqueViolation } from "@/lib/server/errors";
import { STATISTIC_KEYS } from "@/lib/practices";
import { practiceFormSchema } from "@/lib/graph/practice-form";
import { listPractices } from "@/db/queries/practices";
import { createPractice } from "@/lib/graph/create-practice";

export const GET = route({ permission: "corpus:read" }, async () => ({
  practices: await listPractices(getDb()),
  statistics: STATISTIC_KEYS,
}));

export const POST = route({ permission: "practices:manage", body: practiceFormSchema }, async ({ body, actor }) => {
  try {
    return await getDb()
      .transaction()
      .execute((trx) => createPractice(trx, body, actor.id));
  } catch (err) {
    if (isUniqueViolation(err)) throw new HttpError(409, "conflict", "That practice is already tracked.", "value");
    throw err;
  }
});
