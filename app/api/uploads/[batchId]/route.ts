import { z } from "zod";
import { route } from "@/lib/server/request";
import { notFound } from "@/lib/server/errors";
import { getDb } from "@/db";

const Query = z.object({
  // Duplicates belong to the batch that first brought them, so the page also asks for them by id.
  ids: z
    .string()
    .optional()
    .transform((s) => (s ? s.split(",").filter(Boolean) : []))
    .pipe(z.array(z.string().uuid()).max(1000)),
});

// The batch's files and their status; the upload page polls this while any file is unfinished.
export const GET = route({ permission: "corpus:upload", query: Query }, async ({ params, query }) => {
  const id = z.string().uuid().safeParse(params.batchId);
  if (!id.success) throw notFound("That upload batch");
  const db = getDb();
  const batch = await db.selectFrom("upload_batches").select(["id"]).where("id", "=", id.data).executeTakeFirst();
  if (!batch) throw notFound("That upload batch");
  const files = await db
    .selectFrom("articles")
    .select(["id", "original_filename", "status", "failure_code", "failure_message", "title", "upload_batch_id"])
    .where((eb) =>
      query.ids.length
        ? eb.or([eb("upload_batch_id", "=", batch.id), eb("id", "in", query.ids)])
        : eb("upload_batch_id", "=", batch.id),
    )
    .orderBy("created_at")
    .execute();
  return { batchId: batch.id, files };
});
