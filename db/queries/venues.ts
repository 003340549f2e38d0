import type { DB } from "@/db";

/**
 * The one venue list: admin table, filters, metadata forms, an editor's own venues (`ids`).
 * Ordered by name so every select box reads the same.
 */
export async function listVenues(db: DB, opts: { ids?: readonly string[] } = {}) {
  let q = db
    .selectFrom("venues")
    .select(["id", "name", "abbreviation", "issn", "is_methods_venue", "is_demo"])
    .orderBy("name");
  if (opts.ids) {
    if (opts.ids.length === 0) return [];
    q = q.where("id", "in", [...opts.ids]);
  }
  return q.execute();
}

export async function venueExists(db: DB, id: string): Promise<boolean> {
  return !!(await db.selectFrom("venues").select("id").where("id", "=", id).executeTakeFirst());
}

export type VenueInput = { name: string; abbreviation: string | null; issn: string | null; isMethodsVenue: boolean };

/** Unique by name: a duplicate raises PostgreSQL's 23505 for the caller to turn into a 409. */
export async function createVenue(db: DB, v: VenueInput): Promise<string> {
  const row = await db
    .insertInto("venues")
    .values({ name: v.name, abbreviation: v.abbreviation, issn: v.issn, is_methods_venue: v.isMethodsVenue })
    .returning(["id"])
    .executeTakeFirstOrThrow();
  return row.id;
}

/** Changes the given fields; false when there is no such venue. */
export async function updateVenue(db: DB, id: string, patch: Partial<VenueInput>): Promise<boolean> {
  const set = {
    ...(patch.name !== undefined ? { name: patch.name } : {}),
    ...(patch.abbreviation !== undefined ? { abbreviation: patch.abbreviation } : {}),
    ...(patch.issn !== undefined ? { issn: patch.issn } : {}),
    ...(patch.isMethodsVenue !== undefined ? { is_methods_venue: patch.isMethodsVenue } : {}),
  };
  if (!Object.keys(set).length) return venueExists(db, id);
  const r = await db.updateTable("venues").set(set).where("id", "=", id).executeTakeFirst();
  return Number(r.numUpdatedRows) > 0;
}
