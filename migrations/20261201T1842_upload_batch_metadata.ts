import { sql, type Kysely } from "kysely";

// The metadata file uploaded with a batch, parsed: entries are matched to the batch's files by file
// name at upload and by DOI once the miner has read the DOI from the document.
export async function up(db: Kysely<unknown>): Promise<void> {
  await sql`
    alter table upload_batches
      add column metadata_filename text,
      add column metadata_entries jsonb not null default '[]';
  `.execute(db);
}

export async function down(db: Kysely<unknown>): Promise<void> {
  await sql`alter table upload_batches drop column metadata_filename, drop column metadata_entries`.execute(db);
}
