import { CompiledQuery, type Kysely, type Transaction } from "kysely";
import type { Database } from "@/db";

export type Executor = Kysely<Database> | Transaction<Database>;

/**
 * pg-boss's database adapter over a Kysely handle or transaction.
 *
 * pg-boss sends some statements as one multi-statement text that opens its own transaction (its
 * schema install: BEGIN; … ; COMMIT). When one of them fails, for instance because another process
 * installed the same schema a moment earlier (which pg-boss then treats as fine), the COMMIT never
 * runs and the pooled connection would go back to the pool inside an aborted transaction: every
 * later query on it failed with 25P02 "current transaction is aborted". This broke the demo load of
 * a first `npm start`, whose loader and worker install the schema at the same time. So on a pool
 * handle each call holds one connection and rolls back on failure before letting it go; inside a
 * caller's transaction the caller's own rollback does that.
 */
export function bossDb(db: Executor) {
  const rows = (r: { rows: unknown[] }) => ({ rows: r.rows as Record<string, unknown>[] });
  if (db.isTransaction) {
    return {
      executeSql: async (text: string, values?: unknown[]) =>
        rows(await db.executeQuery(CompiledQuery.raw(text, values ?? []))),
    };
  }
  return {
    executeSql: (text: string, values?: unknown[]) =>
      db.connection().execute(async (conn) => {
        try {
          return rows(await conn.executeQuery(CompiledQuery.raw(text, values ?? [])));
        } catch (err) {
          // Outside a transaction ROLLBACK only warns; inside a failed one it ends it.
          await conn.executeQuery(CompiledQuery.raw("rollback")).catch(() => {});
          throw err;
        }
      }),
  };
}
