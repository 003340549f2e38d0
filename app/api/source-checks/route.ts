import { route } from "@/lib/server/request";
import { getDb } from "@/db";
import { HttpError } from "@/lib/server/errors";
import { sourceCheckSchema } from "@/lib/graph/practice-form";
import { recordSourceCheck } from "@/lib/graph/source-checks";
import { buildTrails, trailsOnce } from "@/lib/jobs/graph";

// Record (or replace) what a work really says for a practice; the practice's trails pick it up.
export const POST = route({ permission: "corpus:curate", body: sourceCheckSchema }, async ({ body, actor }) => {
  const r = await getDb()
    .transaction()
    .execute(async (trx) => {
      const r = await recordSourceCheck(trx, { ...body, checkedBy: actor.id });
      if (r) await buildTrails.send(trx, { practiceId: body.practiceId }, trailsOnce(body.practiceId, 5));
      return r;
    });
  if (!r) throw new HttpError(404, "not_found", "That work or practice was not found.");
  return r;
});
