import { z } from "zod";
import { idParams, route } from "@/lib/server/request";
import { getDb } from "@/db";
import { splitWork } from "@/lib/graph/works";
import { rebuildAllSoon } from "@/lib/graph/rebuild";

// Split wrongly matched references off this work into a new work.
export const POST = route(
  {
    permission: "corpus:curate",
    params: idParams,
    notFound: "That work",
    body: z.object({ referenceIds: z.array(z.uuid()).min(1, "Choose at least one reference.").max(1000) }),
  },
  async ({ params, body }) => {
    const workId = await getDb()
      .transaction()
      .execute(async (trx) => {
        const workId = await splitWork(trx, params.id, body.referenceIds);
        await rebuildAllSoon(trx);
        return workId;
      });
    return { ok: true, workId };
  },
);
