import { z } from "zod";
import { route } from "@/lib/server/request";
import { HttpError, notFound } from "@/lib/server/errors";
import { getDb } from "@/db";
import { queueArticle } from "@/lib/corpus/ingest";

// Re-mining replaces the article's rows atomically; reviews re-attach by fingerprint.
export const POST = route({ permission: "corpus:curate" }, async ({ params }) => {
  const id = z.string().uuid().safeParse(params.id);
  if (!id.success) throw notFound("That article");
  const db = getDb();
  const queued = await db.transaction().execute(async (trx) => {
    const a = await trx.selectFrom("articles").select("id").where("id", "=", id.data).forUpdate().executeTakeFirst();
    if (!a) throw notFound("That article");
    return queueArticle(trx, a.id, "remine");
  });
  if (!queued) throw new HttpError(409, "already_queued", "This article is already waiting to be mined.");
  return { ok: true, status: "queued" };
});
