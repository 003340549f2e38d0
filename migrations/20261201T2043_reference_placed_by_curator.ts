import { sql, type Kysely } from "kysely";

// A curator's merge or split places references on a work by hand. Re-resolution (run again when a
// new article arrives that older ones may cite) re-scores references that lead to outside works, so
// it used to move a split-off reference straight back to the work it was split from. References a
// curator placed are now marked and left where the curator put them, also across re-mining.
export async function up(db: Kysely<unknown>): Promise<void> {
  await sql`alter table "references" add column work_set_by text not null default 'resolver'
    check (work_set_by in ('resolver', 'curator'))`.execute(db);
}

export async function down(db: Kysely<unknown>): Promise<void> {
  await sql`alter table "references" drop column work_set_by`.execute(db);
}
