import type { DB } from "@/db";
import { seedPractices as SEEDS } from "@/lib/practices";

/** Inserts the common practices of lib/practices once (by key); curators' edits to them are kept. */
export async function seedPractices(db: DB): Promise<number> {
  const rows = SEEDS.map((p) => ({
    key: p.id,
    label: p.label,
    statistic: p.statistic,
    comparator: p.comparator,
    value: p.value,
    framing: p.framing,
    is_seeded: true,
  }));
  const r = await db
    .insertInto("practices")
    .values(rows)
    .onConflict((oc) => oc.column("key").doNothing())
    .returning("id")
    .execute();
  return r.length;
}
