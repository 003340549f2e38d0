import { Kysely, PostgresDialect, type Transaction } from "kysely";
import pg from "pg";
import type { Database } from "./schema";
import { databaseUrl } from "@/lib/env";

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

/** DATABASE_URL, else the dev cluster exactly as `npm start` derives it (lib/env.ts). */
export function defaultDatabaseUrl(): string {
  return databaseUrl();
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

/** A pool handle or a transaction: query modules take either. */
export type Executor = DB | Transaction<Database>;

/**
 * Runs `fn` inside `db` when the caller already opened a transaction, else in a new one, so a
 * function that needs atomicity can still join its caller's transaction (and the jobs sent in it).
 */
export function inTransaction<T>(db: Executor, fn: (trx: Transaction<Database>) => Promise<T>): Promise<T> {
  return db.isTransaction ? fn(db as Transaction<Database>) : db.transaction().execute(fn);
}
