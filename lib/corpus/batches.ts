/** Upload batches: the files a curator sent together, and the metadata file sent with them. */
import type { Updateable } from "kysely";
import type { Database, DB } from "@/db";
import { matchEntry, type MetadataEntry } from "@/lib/metadata";
import type { IngestMetadata } from "./ingest";

export async function createBatch(
  db: DB,
  input: { createdBy: string | null; metadataFilename?: string | null; entries?: MetadataEntry[] },
): Promise<string> {
  const withEntries = input.entries?.length
    ? { metadata_filename: input.metadataFilename ?? null, metadata_entries: JSON.stringify(input.entries) }
    : {};
  const row = await db
    .insertInto("upload_batches")
    .values({ created_by: input.createdBy, ...withEntries })
    .returning("id")
    .executeTakeFirstOrThrow();
  return row.id;
}

async function entriesOf(db: DB, batchId: string): Promise<MetadataEntry[]> {
  const r = await db
    .selectFrom("upload_batches")
    .select("metadata_entries")
    .where("id", "=", batchId)
    .executeTakeFirst();
  return r?.metadata_entries ?? [];
}

export async function venueIdByName(db: DB, name: string | null): Promise<string | undefined> {
  if (!name) return undefined;
  const v = await db
    .selectFrom("venues")
    .select("id")
    .where((eb) => eb(eb.fn("lower", ["name"]), "=", name.trim().toLowerCase()))
    .executeTakeFirst();
  return v?.id;
}

async function toIngest(db: DB, e: MetadataEntry): Promise<IngestMetadata> {
  return {
    title: e.title ?? undefined,
    authors: e.authors.length ? e.authors : undefined,
    year: e.year ?? undefined,
    doi: e.doi ?? undefined,
    venueId: await venueIdByName(db, e.venue),
    licence: e.licence ?? undefined,
  };
}

/** The batch's metadata entry for a file, by file name (the DOI is not known before mining). */
export async function metadataForFile(
  db: DB,
  batchId: string,
  filename: string,
): Promise<{ metadata: IngestMetadata; matched: boolean }> {
  const e = matchEntry(await entriesOf(db, batchId), { filename });
  return e ? { metadata: await toIngest(db, e), matched: true } : { metadata: {}, matched: false };
}

/**
 * After mining: the document's DOI may match an entry of its batch's metadata file. Fills the
 * fields that are still empty, before the document's own metadata is considered.
 */
export async function applyBatchMetadataByDoi(trx: DB, articleId: string, doi: string | null): Promise<void> {
  if (!doi) return;
  const a = await trx
    .selectFrom("articles")
    .select(["upload_batch_id", "title", "authors", "year", "doi", "venue_id", "licence"])
    .where("id", "=", articleId)
    .executeTakeFirst();
  if (!a?.upload_batch_id) return;
  const e = matchEntry(await entriesOf(trx, a.upload_batch_id), { filename: "\u0000", doi });
  if (!e) return;
  const m = await toIngest(trx, e);
  const set: Updateable<Database["articles"]> = {};
  if (!a.title && m.title) set.title = m.title;
  if (a.authors.length === 0 && m.authors) set.authors = JSON.stringify(m.authors);
  if (a.year == null && m.year) set.year = m.year;
  if (!a.venue_id && m.venueId) set.venue_id = m.venueId;
  if (!a.licence && m.licence) set.licence = m.licence;
  if (Object.keys(set).length) await trx.updateTable("articles").set(set).where("id", "=", articleId).execute();
}

export type BatchFileRow = {
  id: string;
  original_filename: string;
  status: string;
  failure_code: string | null;
  failure_message: string | null;
  title: string | null;
};

export async function batchArticles(db: DB, batchId: string): Promise<BatchFileRow[]> {
  return db
    .selectFrom("articles")
    .select(["id", "original_filename", "status", "failure_code", "failure_message", "title"])
    .where("upload_batch_id", "=", batchId)
    .orderBy("created_at")
    .execute();
}
