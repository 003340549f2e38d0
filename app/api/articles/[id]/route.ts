import { sql } from "kysely";
import { z } from "zod";
import { route } from "@/lib/server/request";
import { HttpError, notFound, isUniqueViolation } from "@/lib/server/errors";
import { getDb } from "@/db";
import { ArticleMetadataInput, getArticle } from "@/lib/corpus/articles";
import { normaliseDoi } from "@/lib/corpus/ingest";

const articleId = (p: Record<string, string>) => {
  const r = z.string().uuid().safeParse(p.id);
  if (!r.success) throw notFound("That article");
  return r.data;
};

export const GET = route({ permission: "corpus:read" }, async ({ params }) => {
  const detail = await getArticle(getDb(), articleId(params));
  if (!detail) throw notFound("That article");
  return detail;
});

// The curator's metadata correction; these values win over what the document or a metadata file said.
export const PATCH = route({ permission: "corpus:curate", body: ArticleMetadataInput }, async ({ params, body }) => {
  const id = articleId(params);
  const db = getDb();
  if (body.venueId && !(await db.selectFrom("venues").select("id").where("id", "=", body.venueId).executeTakeFirst())) {
    throw new HttpError(400, "invalid", "That venue does not exist.", "venueId");
  }
  try {
    const r = await db
      .updateTable("articles")
      .set({
        title: body.title,
        authors: JSON.stringify(body.authors),
        venue_id: body.venueId,
        year: body.year,
        doi: normaliseDoi(body.doi),
        licence: body.licence,
        updated_at: sql`now()`,
      })
      .where("id", "=", id)
      .executeTakeFirst();
    if (Number(r.numUpdatedRows) === 0) throw notFound("That article");
  } catch (err) {
    if (isUniqueViolation(err)) throw new HttpError(409, "doi_taken", "Another article already has this DOI.", "doi");
    throw err;
  }
  return { ok: true };
});
