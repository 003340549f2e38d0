import { PgBoss } from "pg-boss";
import type { Executor } from "@/db";
import { bossDb } from "@/lib/jobs/boss-db";

/**
 * pg-boss over a suite's database, only for reading jobs through pg-boss's own API (findJobs,
 * getJobById, getQueueStats), never through its tables. Never started: nothing polls.
 */
export function jobReader(db: Executor): PgBoss {
  const boss = new PgBoss({ db: bossDb(db), supervise: false, schedule: false, migrate: false });
  boss.on("error", () => {});
  return boss;
}

/** Polls `check` until it returns a value (not undefined) or the deadline passes. */
export async function until<T>(
  check: () => Promise<T | undefined>,
  timeoutMs: number,
  what: string | (() => string),
): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const v = await check();
    if (v !== undefined) return v;
    if (Date.now() > deadline)
      throw new Error(`timed out after ${timeoutMs} ms: ${typeof what === "function" ? what() : what}`);
    await new Promise((r) => setTimeout(r, 100));
  }
}
