import { z } from "zod";
import { route, readLimited } from "@/lib/server/request";
import { HttpError, notFound } from "@/lib/server/errors";
import { getDb } from "@/db";
import { getStorage } from "@/lib/storage";
import { installQueues } from "@/lib/jobs/registry";
import { articleStatus, batchExists } from "@/db/queries/articles";
import { ingestFile, IngestError } from "@/lib/corpus/ingest";
import { metadataForFile } from "@/lib/corpus/batches";
import { UPLOAD_MAX_BYTES } from "@/lib/corpus/limits";

const Query = z.object({ name: z.string().trim().min(1, "The file needs a name.").max(300) });

/**
 * One file per request, as the raw request body: each file gets its own size check and its own
 * answer, and the limit is enforced while streaming (readLimited), never after buffering it all.
 */
export const POST = route(
  {
    permission: "corpus:upload",
    params: z.object({ batchId: z.uuid() }),
    notFound: "That upload batch",
    query: Query,
  },
  async ({ actor, params, query, req }) => {
    const batchId = params.batchId;
    const db = getDb();
    if (!(await batchExists(db, batchId))) throw notFound("That upload batch");
    const tooLarge = () =>
      new HttpError(
        413,
        "too_large",
        `${query.name} is larger than the ${UPLOAD_MAX_BYTES / 1048576} MB limit per file.`,
        "file",
      );
    if (Number(req.headers.get("content-length") ?? 0) > UPLOAD_MAX_BYTES) throw tooLarge();
    let data: Uint8Array;
    try {
      data = await readLimited(req, UPLOAD_MAX_BYTES);
    } catch (err) {
      if (err instanceof HttpError && err.status === 413) throw tooLarge();
      throw err;
    }
    const { metadata, matched } = await metadataForFile(db, batchId, query.name);
    await installQueues(db);
    try {
      const r = await db.transaction().execute((trx) =>
        ingestFile(trx, getStorage(), {
          data,
          filename: query.name,
          metadata,
          uploadedBy: actor.id,
          batchId,
        }),
      );
      if (r.duplicate) {
        // The existing article is shown in this batch's list too, so its status is visible here.
        const a = await articleStatus(db, r.articleId);
        if (!a) throw notFound("That article");
        return {
          articleId: r.articleId,
          duplicate: true,
          status: a.status,
          existingFilename: a.original_filename,
          metadataMatched: matched,
        };
      }
      return { articleId: r.articleId, duplicate: false, status: "queued", metadataMatched: matched };
    } catch (err) {
      if (err instanceof IngestError) {
        const status = err.code === "unsupported_type" ? 415 : err.code === "doi_taken" ? 409 : 400;
        throw new HttpError(status, err.code, err.message, "file");
      }
      throw err;
    }
  },
);
