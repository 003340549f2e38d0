import { idParams, route } from "@/lib/server/request";
import { HttpError, notFound, isUniqueViolation } from "@/lib/server/errors";
import { getDb } from "@/db";
import { ArticleMetadataInput, getArticle } from "@/lib/corpus/articles";
import { updateArticleMetadata } from "@/db/queries/articles";
import { venueExists } from "@/db/queries/venues";

export const GET = route(
  { permission: "corpus:read", params: idParams, notFound: "That article" },
  async ({ params }) => {
    const detail = await getArticle(getDb(), params.id);
    if (!detail) throw notFound("That article");
    return detail;
  },
);

// The curator's metadata correction; these values win over what the document or a metadata file said.
export const PATCH = route(
  { permission: "corpus:curate", params: idParams, notFound: "That article", body: ArticleMetadataInput },
  async ({ params, body }) => {
    const db = getDb();
    if (body.venueId && !(await venueExists(db, body.venueId))) {
      throw new HttpError(400, "invalid", "That venue does not exist.", "venueId");
    }
    try {
      if (!(await updateArticleMetadata(db, params.id, body))) throw notFound("That article");
    } catch (err) {
      if (isUniqueViolation(err)) throw new HttpError(409, "doi_taken", "Another article already has this DOI.", "doi");
      throw err;
    }
    return { ok: true };
  },
);
