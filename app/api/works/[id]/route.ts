import { z } from "zod";
import { idParams, route } from "@/lib/server/request";
import { getDb } from "@/db";
import { notFound } from "@/lib/server/errors";
import { setWorkType } from "@/lib/graph/works";
import { workDetail } from "@/lib/graph/work-detail";
import { rebuildAllSoon } from "@/lib/graph/rebuild";
import { WORK_TYPES } from "@/lib/vocabulary";

export const GET = route({ permission: "corpus:read", params: idParams, notFound: "That work" }, async ({ params }) => {
  const w = await workDetail(getDb(), params.id);
  if (!w) throw notFound("That work");
  return w;
});

export const PATCH = route(
  {
    permission: "corpus:curate",
    params: idParams,
    notFound: "That work",
    body: z.object({ workType: z.enum(WORK_TYPES) }),
  },
  async ({ params, body }) => {
    await getDb()
      .transaction()
      .execute(async (trx) => {
        await setWorkType(trx, params.id, body.workType);
        await rebuildAllSoon(trx);
      });
    return { ok: true };
  },
);
