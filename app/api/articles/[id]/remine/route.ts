import { HttpError, notFound } from "@/lib/server/errors";
import { idParams, route } from "@/lib/server/request";
import { getDb } from "@/db";
import { queueArticle } from "@/lib/corpus/ingest";
import { lockArticle } from "@/db/queries/articles";

// Re-mining replaces the article's rows atomically; reviews re-attach by fingerprint.
export const POST = route(
  { permission: "corpus:curate", params: idParams, notFound: "That article" },
  async ({ params }) => {
    const db = getDb();
    const queued = await db.transaction().execute(async (trx) => {
      const a = await lockArticle(trx, params.id);
      if (!a) throw notFound("That article");
      return queueArticle(trx, a.id, "remine");
    });
    if (!queued) throw new HttpError(409, "already_queued", "This article is already waiting to be mined.");
    return { ok: true, status: "queued" };
  },
);
