import { route } from "@/lib/server/request";
import { HttpError, isUniqueViolation } from "@/lib/server/errors";
import { getDb } from "@/db";
import { createProcedure, listProcedures, ProcedureInput } from "@/lib/corpus/procedures-store";

export const GET = route({ permission: "practices:manage" }, async () => ({
  procedures: await listProcedures(getDb()),
}));

export const POST = route({ permission: "practices:manage", body: ProcedureInput }, async ({ actor, body }) => {
  try {
    return { id: await createProcedure(getDb(), body, actor.id) };
  } catch (err) {
    if (isUniqueViolation(err))
      throw new HttpError(409, "key_taken", "Another procedure already uses this key.", "key");
    throw err;
  }
});
