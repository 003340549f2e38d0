import { Kysely, PostgresDialect } from "kysely";
import pg from "pg";
import type { Database } from "./schema";

export type { Database } from "./schema";
export type DB = Kysely<Database>;

// int8 (counts, sizes) comes back as a JS number: our counts stay far below 2^53.
pg.types.setTypeParser(20, (v) => Number(v));
// numeric (averages, rates from SQL) as a JS number too.
pg.types.setTypeParser(1700, (v) => Number(v));

export function defaultDatabaseUrl(): string {
  return process.env.DATABASE_URL ?? "postgres://postgres@127.0.0.1:54320/echoline";
}

export function createDb(connectionString = defaultDatabaseUrl(), max = 10): DB {
  const pool = new pg.Pool({ connectionString, max, connectionTimeoutMillis: 5_000 });
  // A dropped connection must not take the process down; the next query reconnects.
  pool.on("error", (err) => console.error("[db] idle client error:", err.message));
  return new Kysely<Database>({ dialect: new PostgresDialect({ pool }) });
}

const globalForDb = globalThis as unknown as { echolineDb?: DB };

/** The process-wide handle (Next server, worker). Query modules take a handle as an argument instead. */
export function getDb(): DB {
  globalForDb.echolineDb ??= createDb();
  return globalForDb.echolineDb;
}
