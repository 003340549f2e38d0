/**
 * Demo accounts (one per role; passwords in the README, for local use only) and the seeded lists
 * other features need. Idempotent: a second run changes nothing that exists.
 */
import { sql } from "kysely";
import { createDb, type DB } from "./index";
import type { Role } from "./schema/accounts";
import { hashPassword } from "@/lib/server/passwords";
import { seedProcedures } from "@/lib/corpus/procedures-store";
import { seedPractices } from "@/lib/graph/seed";

export const DEMO_ACCOUNTS: { email: string; name: string; role: Role; password: string }[] = [
  { email: "admin@echoline.local", name: "Demo Admin", role: "admin", password: "admin-demo-pass" },
  { email: "curator@echoline.local", name: "Demo Curator", role: "curator", password: "curator-demo-pass" },
  { email: "editor@echoline.local", name: "Demo Editor", role: "editor", password: "editor-demo-pass" },
  { email: "instructor@echoline.local", name: "Demo Instructor", role: "instructor", password: "instructor-demo-pass" },
  { email: "reader@echoline.local", name: "Demo Reader", role: "reader", password: "reader-demo-pass" },
];

// Invented venues (no real journal): enough for filters and venue comparison before any upload.
export const SEED_VENUES = [
  { name: "Harrowgate Journal of Survey Practice", abbreviation: "HJSP", is_methods_venue: false },
  { name: "Lowmere Review of Organisational Studies", abbreviation: "LROS", is_methods_venue: false },
  { name: "Quillon Methods Quarterly", abbreviation: "QMQ", is_methods_venue: true },
];

export async function seedAccounts(db: DB): Promise<void> {
  for (const a of DEMO_ACCOUNTS) {
    const exists = await db.selectFrom("User").select("id").where(sql`lower(email)`, "=", a.email).executeTakeFirst();
    if (exists) continue;
    await db
      .insertInto("User")
      .values({ email: a.email, name: a.name, role: a.role, password_hash: await hashPassword(a.password), emailVerified: new Date(), image: null, deactivated_at: null, is_demo: true })
      .onConflict((oc) => oc.doNothing())
      .execute();
  }
}

export async function seedVenues(db: DB): Promise<void> {
  for (const v of SEED_VENUES) {
    await db
      .insertInto("venues")
      .values({ ...v, issn: null, is_demo: true })
      .onConflict((oc) => oc.expression(sql`lower(name)`).doNothing())
      .execute();
  }
  // The demo editor benchmarks the first venue.
  const editor = await db.selectFrom("User").select("id").where("email", "=", "editor@echoline.local").executeTakeFirst();
  const venue = await db.selectFrom("venues").select("id").where("name", "=", SEED_VENUES[0].name).executeTakeFirst();
  if (editor && venue) {
    await db.insertInto("editor_venues").values({ user_id: editor.id, venue_id: venue.id }).onConflict((oc) => oc.doNothing()).execute();
  }
}

export async function seedAll(db: DB): Promise<void> {
  await seedAccounts(db);
  await seedVenues(db);
  await seedProcedures(db);
  await seedPractices(db);
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const db = createDb();
  try {
    await seedAll(db);
    console.log("[db] seeded demo accounts, venues, procedures and practices");
  } finally {
    await db.destroy();
  }
}
