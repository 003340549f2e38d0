import { Migrator, type Kysely, type MigrationProvider } from "kysely";
import { migrations } from "../migrations";
import { createDb } from "./index";
import { installQueues } from "@/lib/jobs/registry";

const provider: MigrationProvider = { getMigrations: async () => migrations };

export async function migrateToLatest(db: Kysely<unknown>): Promise<void> {
  const migrator = new Migrator({ db, provider });
  const { error, results } = await migrator.migrateToLatest();
  for (const r of results ?? []) {
    if (r.status === "Error") console.error(`[db] migration ${r.migrationName} failed`);
    else if (r.status === "Success") console.log(`[db] migrated ${r.migrationName}`);
  }
  if (error) throw error instanceof Error ? error : new Error(String(error));
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const db = createDb();
  try {
    await migrateToLatest(db as unknown as Kysely<unknown>);
    // pg-boss's schema and every job queue (lib/jobs/registry.ts), so the app can send jobs at once.
    await installQueues(db);
  } finally {
    await db.destroy();
  }
}
