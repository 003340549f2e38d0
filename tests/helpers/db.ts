import pg from "pg";
import { randomBytes } from "node:crypto";
import { databaseUrl } from "@/db/cluster";
import { createDb, type DB } from "@/db";

const TEMPLATE = "echoline_template";

/** A fresh, migrated database of its own for one suite; `drop()` removes it. */
export async function createTestDatabase(): Promise<{ db: DB; url: string; name: string; drop: () => Promise<void> }> {
  const name = `echoline_t_${randomBytes(5).toString("hex")}`;
  const admin = new pg.Client({ connectionString: databaseUrl("test", "postgres") });
  await admin.connect();
  try {
    await admin.query(`create database ${name} template ${TEMPLATE}`);
  } finally {
    await admin.end();
  }
  const url = databaseUrl("test", name);
  const db = createDb(url, 5);
  return {
    db,
    url,
    name,
    drop: async () => {
      await db.destroy();
      const c = new pg.Client({ connectionString: databaseUrl("test", "postgres") });
      await c.connect();
      try {
        await c.query(`drop database if exists ${name} with (force)`);
      } finally {
        await c.end();
      }
    },
  };
}

/** The id of a practice by its key (e.g. "cronbach_alpha-ge-0.7-fixed"); fails when it is missing. */
export async function practiceIdByKey(db: DB, key: string): Promise<string> {
  return (await db.selectFrom("practices").select("id").where("key", "=", key).executeTakeFirstOrThrow()).id;
}
