/**
 * Integration tests: the private test cluster (never the user's), and a migrated template database
 * from which each suite clones its own database (tests/helpers/db.ts).
 */
import type { Kysely } from "kysely";
import pg from "pg";
import { up, databaseUrl } from "@/db/cluster";
import { createDb } from "@/db";
import { migrateToLatest } from "@/db/migrate";
import { installQueues } from "@/lib/jobs/registry";

export const TEMPLATE = "echoline_template";

export async function prepareTemplate(): Promise<void> {
  up("test");
  const admin = new pg.Client({ connectionString: databaseUrl("test", "postgres") });
  await admin.connect();
  try {
    // Rebuilt on every run so a new migration is always in it.
    await admin.query(`drop database if exists ${TEMPLATE} with (force)`);
    await admin.query(`create database ${TEMPLATE}`);
  } finally {
    await admin.end();
  }
  const db = createDb(databaseUrl("test", TEMPLATE), 2);
  try {
    await migrateToLatest(db as unknown as Kysely<unknown>);
    // pg-boss's schema and the job queues, as `npm run db:migrate` installs them: every suite's
    // clone can send jobs at once.
    await installQueues(db);
  } finally {
    await db.destroy();
  }
}

export default async function setup() {
  if (process.env.ECHOLINE_TEMPLATE_READY !== "1") await prepareTemplate();
}
