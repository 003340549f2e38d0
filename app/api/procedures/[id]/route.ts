import { idParams, route } from "@/lib/server/request";
import { HttpError, isUniqueViolation, notFound } from "@/lib/server/errors";
import { getDb } from "@/db";
import { ProcedureInput, updateProcedure } from "@/lib/corpus/procedures-store";

// Edits and enabling/disabling take effect on the next article each worker mines.
export const PUT = route(
  { permission: "practices:manage", params: idParams, notFound: "That procedure", body: ProcedureInput },
  async ({ actor, params, body }) => {
    try {
      if (!(await updateProcedure(getDb(), params.id, body, actor.id))) throw notFound("That procedure");
    } catch (err) {
      if (isUniqueViolation(err))
        throw new HttpError(409, "key_taken", "Another procedure already uses this key.", "key");
      throw err;
    }
    return { ok: true };
  },
);
