import { z } from "zod";
import { route } from "@/lib/server/request";
import { HttpError } from "@/lib/server/errors";
import { getDb } from "@/db";
import { createBatch } from "@/lib/corpus/batches";
import { METADATA_MAX_BYTES } from "@/lib/corpus/limits";
import { parseMetadata, MetadataError } from "@/lib/metadata";

const Body = z.object({
  metadata: z
    .object({ filename: z.string().trim().min(1).max(300), text: z.string().max(METADATA_MAX_BYTES) })
    .nullable()
    .default(null),
});

// Starts a batch; its files follow one request each (POST /api/uploads/:batchId/files).
export const POST = route(
  { permission: "corpus:upload", body: Body, maxBytes: METADATA_MAX_BYTES + 64 * 1024 },
  async ({ actor, body }) => {
    let parsed = null;
    if (body.metadata) {
      try {
        parsed = await parseMetadata(body.metadata.text);
      } catch (err) {
        if (err instanceof MetadataError) throw new HttpError(400, "invalid_metadata", err.message, "metadata");
        throw err;
      }
    }
    const batchId = await createBatch(getDb(), {
      createdBy: actor.id,
      metadataFilename: body.metadata?.filename ?? null,
      entries: parsed?.entries ?? [],
    });
    return {
      batchId,
      metadata: parsed ? { format: parsed.format, entries: parsed.entries.length, warnings: parsed.warnings } : null,
    };
  },
);
