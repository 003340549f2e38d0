import { z } from "zod";
import { route } from "@/lib/server/request";
import { getDb } from "@/db";
import { HttpError } from "@/lib/server/errors";
import { mergeWorks } from "@/lib/graph/works";
import { rebuildAllSoon } from "@/lib/graph/rebuild";

// Merge this work into another (the other is kept); the trails follow after a rebuild.
export const POST = route(
  { permission: "corpus:curate", body: z.object({ intoId: z.uuid({ message: "Choose the work to merge into." }) }) },
  async ({ params, body }) => {
    const from = z.uuid().safeParse(params.id);
    if (!from.success) throw new HttpError(400, "invalid", "That is not a work id.", "id");
    await getDb()
      .transaction()
      .execute(async (trx) => {
        await mergeWorks(trx, from.data, body.intoId);
        await rebuildAllSoon(trx);
      });
    return { ok: true, workId: body.intoId };
  },
);
