import { z } from "zod";
import { route } from "@/lib/server/request";
import { notFound } from "@/lib/server/errors";
import { getDb } from "@/db";
import { batchExists, batchFiles } from "@/db/queries/articles";

const Query = z.object({
  // Duplicates belong to the batch that first brought them, so the page also asks for them by id.
  ids: z
    .string()
    .optional()
    .transform((s) => (s ? s.split(",").filter(Boolean) : []))
    .pipe(z.array(z.string().uuid()).max(1000)),
});

// The batch's files and their status; the upload page polls this while any file is unfinished.
export const GET = route(
  { permission: "corpus:upload", params: z.object({ batchId: z.uuid() }), notFound: "That upload batch", query: Query },
  async ({ params, query }) => {
    const db = getDb();
    if (!(await batchExists(db, params.batchId))) throw notFound("That upload batch");
    return { batchId: params.batchId, files: await batchFiles(db, params.batchId, query.ids) };
  },
);
