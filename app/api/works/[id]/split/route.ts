import { z } from "zod";
import { route } from "@/lib/server/request";
import { getDb } from "@/db";
import { HttpError } from "@/lib/server/errors";
import { splitWork } from "@/lib/graph/works";
import { rebuildAllSoon } from "@/lib/graph/rebuild";

// Split wrongly matched references off this work into a new work.
export const POST = route(
  {
    permission: "corpus:curate",
    body: z.object({ referenceIds: z.array(z.uuid()).min(1, "Choose at least one reference.").max(1000) }),
  },
  async ({ params, body }) => {
    const from = z.uuid().safeParse(params.id);
    if (!from.success) throw new HttpError(400, "invalid", "That is not a work id.", "id");
    const workId = await getDb()
      .transaction()
      .execute(async (trx) => {
        const workId = await splitWork(trx, from.data, body.referenceIds);
        await rebuildAllSoon(trx);
        return workId;
      });
    return { ok: true, workId };
  },
);
