/**
 * The curated list of known misdescribed procedures, stored in procedure_patterns so curators can
 * edit it; the worker hands the enabled ones to the miner.
 */
import type { ProcedureInput } from "./schemas";
import { sql } from "kysely";
import type { DB } from "@/db";
import { defaultProcedures, type ProcedurePattern } from "@/lib/mining/procedures";

/** Inserts the default procedures that are not there yet; never overwrites a curator's edit. */
export async function seedProcedures(db: DB): Promise<number> {
  const rows = await db
    .insertInto("procedure_patterns")
    .values(
      defaultProcedures.map((p) => ({
        key: p.key,
        label: p.label,
        description: p.description,
        all_of: JSON.stringify(p.allOf),
        any_of: JSON.stringify(p.anyOf ?? []),
        none_of: JSON.stringify(p.noneOf ?? []),
      })),
    )
    .onConflict((oc) => oc.column("key").doNothing())
    .returning("id")
    .execute();
  return rows.length;
}

export type StoredProcedure = ProcedurePattern & { id: string; enabled: boolean; updatedAt: string };

export async function listProcedures(db: DB): Promise<StoredProcedure[]> {
  const rows = await db.selectFrom("procedure_patterns").selectAll().orderBy("label").execute();
  return rows.map((r) => ({
    id: r.id,
    key: r.key,
    label: r.label,
    description: r.description,
    allOf: r.all_of,
    anyOf: r.any_of,
    noneOf: r.none_of,
    enabled: r.enabled,
    updatedAt: new Date(r.updated_at as unknown as string).toISOString(),
  }));
}

/** What the miner receives: enabled patterns only, in a stable order. */
export async function enabledProcedures(db: DB): Promise<ProcedurePattern[]> {
  return (await listProcedures(db))
    .filter((p) => p.enabled)
    .sort((a, b) => a.key.localeCompare(b.key))
    .map(({ key, label, description, allOf, anyOf, noneOf }) => ({ key, label, description, allOf, anyOf, noneOf }));
}

export { ProcedureInput } from "./schemas";

/** The stored columns of a procedure as the form gives it (lists kept as JSON). */
function procedureRow(input: ProcedureInput, by: string) {
  return {
    key: input.key,
    label: input.label,
    description: input.description,
    all_of: JSON.stringify(input.allOf),
    any_of: JSON.stringify(input.anyOf),
    none_of: JSON.stringify(input.noneOf),
    enabled: input.enabled,
    updated_by: by,
  };
}

export async function createProcedure(db: DB, input: ProcedureInput, by: string): Promise<string> {
  const row = await db
    .insertInto("procedure_patterns")
    .values(procedureRow(input, by))
    .returning("id")
    .executeTakeFirstOrThrow();
  return row.id;
}

export async function updateProcedure(db: DB, id: string, input: ProcedureInput, by: string): Promise<boolean> {
  const r = await db
    .updateTable("procedure_patterns")
    .set({ ...procedureRow(input, by), updated_at: sql`now()` })
    .where("id", "=", id)
    .executeTakeFirst();
  return Number(r.numUpdatedRows) > 0;
}
