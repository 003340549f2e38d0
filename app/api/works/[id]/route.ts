import { z } from "zod";
import { route } from "@/lib/server/request";
import { getDb } from "@/db";
import { HttpError, notFound } from "@/lib/server/errors";
import { setWorkType } from "@/lib/graph/works";
import { workDetail } from "@/lib/graph/work-detail";
import { rebuildAllSoon } from "@/lib/graph/rebuild";

const id = (s: string | undefined) => {
  const r = z.uuid().safeParse(s);
  if (!r.success) throw new HttpError(400, "invalid", "That is not a work id.", "id");
  return r.data;
};

export const GET = route({ permission: "corpus:read" }, async ({ params }) => {
  const w = await workDetail(getDb(), id(params.id));
  if (!w) throw notFound("That work");
  return w;
});

export const PATCH = route(
  { permission: "corpus:curate", body: z.object({ workType: z.enum(["methods_source", "empirical", "unknown"]) }) },
  async ({ params, body }) => {
    await getDb()
      .transaction()
      .execute(async (trx) => {
        await setWorkType(trx, id(params.id), body.workType);
        await rebuildAllSoon(trx);
      });
    return { ok: true };
  },
);
