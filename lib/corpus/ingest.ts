/**
 * Getting one file into the corpus: store it by SHA-256, insert its article, and enqueue mining in
 * the caller's transaction. The same bytes uploaded twice are one article (unique on the hash).
 */
import { createHash } from "node:crypto";
import { sql } from "kysely";
import { requireTransaction, type DB } from "@/db";
import type { FileStorage } from "@/lib/storage";
import { detectKind } from "./detect";
import { mineArticle } from "@/lib/jobs/mining";
import { recordEvent } from "./events";
import { normaliseDoi } from "./doi";

export { normaliseDoi } from "./doi";

export type IngestMetadata = {
  title?: string;
  authors?: string[];
  year?: number;
  doi?: string;
  venueId?: string;
  licence?: string;
};

export type IngestInput = {
  data: Uint8Array;
  filename: string;
  metadata?: IngestMetadata;
  uploadedBy: string | null;
  batchId?: string | null;
  isDemo?: boolean;
};

/** A refusal the caller can show: `unsupported_type` (HTTP 415), `empty` (400), `doi_taken` (409). */
export class IngestError extends Error {
  constructor(
    public code: "unsupported_type" | "empty" | "doi_taken",
    message: string,
  ) {
    super(message);
  }
}

export function sha256Hex(data: Uint8Array): string {
  return createHash("sha256").update(data).digest("hex");
}

/**
 * Runs inside the caller's transaction, so the article, its events and its mining job commit
 * together, with whatever else the caller writes. The queues must exist (`installQueues(db)` once
 * per handle: migrate, `npm start` and the upload route do it).
 */
export async function ingestFile(
  trx: DB,
  storage: FileStorage,
  input: IngestInput,
): Promise<{ articleId: string; duplicate: boolean }> {
  requireTransaction(trx, "ingestFile");
  if (input.data.length === 0) throw new IngestError("empty", `${input.filename} is empty (0 bytes).`);
  const detected = await detectKind(input.data);
  if (detected.kind === null)
    throw new IngestError(
      "unsupported_type",
      `${input.filename}: ${detected.reason} Upload a PDF, JATS XML or plain-text file.`,
    );
  const sha = sha256Hex(input.data);
  // The file is written before the rows: a rolled-back transaction leaves at most an unreferenced
  // file, which is harmless because storage is content-addressed and a retry reuses it.
  const key = await storage.put(sha, input.data);
  const m = input.metadata ?? {};
  try {
    await trx
      .insertInto("stored_files")
      .values({ sha256: sha, size_bytes: input.data.length, media_type: detected.mediaType, storage_key: key })
      .onConflict((oc) => oc.column("sha256").doNothing())
      .execute();
    const inserted = await trx
      .insertInto("articles")
      .values({
        file_sha256: sha,
        original_filename: input.filename.slice(0, 500),
        source_kind: detected.kind,
        title: m.title?.trim() || null,
        authors: JSON.stringify((m.authors ?? []).map((a) => a.trim()).filter(Boolean)),
        year: m.year ?? null,
        doi: normaliseDoi(m.doi),
        venue_id: m.venueId ?? null,
        licence: m.licence?.trim() || null,
        uploaded_by: input.uploadedBy,
        upload_batch_id: input.batchId ?? null,
        is_demo: input.isDemo ?? false,
      })
      .onConflict((oc) => oc.column("file_sha256").doNothing())
      .returning("id")
      .executeTakeFirst();
    if (!inserted) {
      const existing = await trx
        .selectFrom("articles")
        .select("id")
        .where("file_sha256", "=", sha)
        .executeTakeFirstOrThrow();
      return { articleId: existing.id, duplicate: true };
    }
    await recordEvent(trx, inserted.id, "uploaded", null);
    await queueArticle(trx, inserted.id, "upload");
    if (input.batchId) {
      await trx
        .updateTable("upload_batches")
        .set((eb) => ({ file_count: eb("file_count", "+", 1) }))
        .where("id", "=", input.batchId)
        .execute();
    }
    return { articleId: inserted.id, duplicate: false };
  } catch (err) {
    if (
      (err as { code?: string; constraint?: string }).code === "23505" &&
      (err as { constraint?: string }).constraint === "articles_doi_lower"
    ) {
      throw new IngestError(
        "doi_taken",
        `${input.filename}: another article of the corpus already has the DOI ${normaliseDoi(m.doi)}.`,
      );
    }
    throw err;
  }
}

/** Marks an article queued and sends its mining job, inside the caller's transaction. */
export async function queueArticle(trx: DB, articleId: string, reason: "upload" | "remine"): Promise<boolean> {
  const jobId = await mineArticle.send(trx, { articleId, reason });
  if (!jobId) return false;
  await trx
    .updateTable("articles")
    .set({ status: "queued", failure_code: null, failure_message: null, updated_at: sql`now()` })
    .where("id", "=", articleId)
    .execute();
  await recordEvent(trx, articleId, "queued", reason === "remine" ? "Queued for re-mining." : null);
  return true;
}
