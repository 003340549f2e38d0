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
import { ensureDemoVenues } from "@/lib/demo/load";
import { DEMO_VENUES } from "@/lib/demo/corpus";

export const DEMO_ACCOUNTS: { email: string; name: string; role: Role; password: string }[] = [
  { email: "admin@echoline.local", name: "Demo Admin", role: "admin", password: "admin-demo-pass" },
  { email: "curator@echoline.local", name: "Demo Curator", role: "curator", password: "curator-demo-pass" },
  { email: "editor@echoline.local", name: "Demo Editor", role: "editor", password: "editor-demo-pass" },
  { email: "instructor@echoline.local", name: "Demo Instructor", role: "instructor", password: "instructor-demo-pass" },
  { email: "reader@echoline.local", name: "Demo Reader", role: "reader", password: "reader-demo-pass" },
];

export async function seedAccounts(db: DB): Promise<void> {
  for (const a of DEMO_ACCOUNTS) {
    const exists = await db
      .selectFrom("User")
      .select("id")
      .where(sql`lower(email)`, "=", a.email)
      .executeTakeFirst();
    if (exists) continue;
    await db
      .insertInto("User")
      .values({
        email: a.email,
        name: a.name,
        role: a.role,
        password_hash: await hashPassword(a.password),
        emailVerified: new Date(),
        image: null,
        deactivated_at: null,
        is_demo: true,
      })
      .onConflict((oc) => oc.doNothing())
      .execute();
  }
}

/** The invented demo venues (the same ones the demo corpus uses), and the demo editor's link to one. */
export async function seedVenues(db: DB): Promise<void> {
  const ids = await ensureDemoVenues(db, DEMO_VENUES);
  const first = DEMO_VENUES.find((v) => !v.isMethodsVenue);
  const editor = await db
    .selectFrom("User")
    .select("id")
    .where("email", "=", "editor@echoline.local")
    .executeTakeFirst();
  const venueId = first && ids.get(first.key);
  if (editor && venueId) {
    await db
      .insertInto("editor_venues")
      .values({ user_id: editor.id, venue_id: venueId })
      .onConflict((oc) => oc.doNothing())
      .execute();
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
