import { Kysely, PostgresDialect } from "kysely";
import pg from "pg";
import type { Database } from "./schema";

export type { Database } from "./schema";
/**
 * The one name for a database handle: the pool (`getDb()`) or a transaction (Kysely's Transaction
 * is a Kysely), so every query module runs inside a caller's transaction too.
 */
export type DB = Kysely<Database>;

/**
 * For functions whose writes must commit together. They do not open a transaction of their own
 * (so a caller can add its own writes, or a job, to the same one); the caller opens it and passes it.
 */
export function requireTransaction(db: DB, fn: string): void {
  if (!db.isTransaction)
    throw new Error(`${fn} must run inside a transaction: db.transaction().execute((trx) => ${fn}(trx, ...)).`);
}

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
