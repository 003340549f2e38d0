/**
 * pg-boss runs some of its statements as one multi-statement text with its own BEGIN … COMMIT (its
 * schema install). A failure in the middle must not hand a connection stuck in an aborted
 * transaction back to Echoline's pool: PostgreSQL then refuses every later statement on it with
 * SQLSTATE 25P02 (PostgreSQL 15 manual, Appendix A, "in_failed_sql_transaction"). A pool of one
 * connection makes the check deterministic: the next query is sure to get the same connection.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { sql } from "kysely";
import { PgBoss } from "pg-boss";
import { createTestDatabase } from "@/tests/helpers/db";
import { createDb, type DB } from "@/db";
import { bossDb } from "@/lib/jobs/boss-db";
import { installQueues } from "@/lib/jobs/registry";

let t: Awaited<ReturnType<typeof createTestDatabase>>;
let one: DB;
beforeAll(async () => {
  t = await createTestDatabase();
  one = createDb(t.url, 1);
});
afterAll(async () => {
  await one?.destroy();
  await t?.drop();
});

describe("pg-boss's adapter over the Kysely pool", () => {
  it("leaves no aborted transaction behind when a multi-statement text fails inside its own BEGIN", async () => {
    const adapter = bossDb(one);
    await expect(adapter.executeSql("begin; select 1/0; commit")).rejects.toThrow(/division by zero/);
    const r = await sql<{ ok: number }>`select 1 as ok`.execute(one);
    expect(r.rows).toEqual([{ ok: 1 }]);
    // And pg-boss's own statements still run through it afterwards.
    expect((await adapter.executeSql("select $1::int as n", [7])).rows).toEqual([{ n: 7 }]);
  });

  it("inside a caller's transaction, a failure still fails the caller's transaction", async () => {
    await expect(
      one.transaction().execute(async (trx) => {
        await expect(bossDb(trx).executeSql("select 1/0")).rejects.toThrow(/division by zero/);
        await sql`select 1`.execute(trx);
      }),
    ).rejects.toMatchObject({ code: "25P02" });
    expect((await sql<{ ok: number }>`select 1 as ok`.execute(one)).rows).toEqual([{ ok: 1 }]);
  });

  it("a sender and a worker installing pg-boss at the same time on a new database both end up usable", async () => {
    await sql`drop schema if exists pgboss cascade`.execute(t.db);
    const worker = new PgBoss({ connectionString: t.url, supervise: false, schedule: false });
    worker.on("error", () => {});
    await Promise.all([installQueues(one), worker.start()]);
    expect((await sql<{ ok: number }>`select 1 as ok`.execute(one)).rows).toEqual([{ ok: 1 }]);
    expect(await worker.getQueue("mine-article")).toBeTruthy();
    await worker.stop({ graceful: false });
  });
});
