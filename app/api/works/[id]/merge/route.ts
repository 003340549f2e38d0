import { z } from "zod";
import { idParams, route } from "@/lib/server/request";
import { getDb } from "@/db";
import { mergeWorks } from "@/lib/graph/works";
import { rebuildAllSoon } from "@/lib/graph/rebuild";

// Merge this work into another (the other is kept); the trails follow after a rebuild.
export const POST = route(
  {
    permission: "corpus:curate",
    params: idParams,
    notFound: "That work",
    body: z.object({ intoId: z.uuid({ message: "Choose the work to merge into." }) }),
  },
  async ({ params, body }) => {
    await getDb()
      .transaction()
      .execute(async (trx) => {
        await mergeWorks(trx, params.id, body.intoId);
        await rebuildAllSoon(trx);
      });
    return { ok: true, workId: body.intoId };
  },
);
