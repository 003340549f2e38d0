import type { DB } from "@/db";
import { ingestFile, type IngestInput } from "@/lib/corpus/ingest";
import { installQueues } from "@/lib/jobs/registry";
import type { FileStorage } from "@/lib/storage";

/** What the upload handler does: one transaction per file, opened by the caller. */
export async function ingest(db: DB, storage: FileStorage, input: IngestInput) {
  await installQueues(db);
  return db.transaction().execute((trx) => ingestFile(trx, storage, input));
}
