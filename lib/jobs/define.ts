/**
 * What a job is (lib/jobs/registry.ts lists them all): its queue name, the zod schema of its data,
 * its retry preset, and optionally a dead-letter queue, a cron schedule and a batch size. `send`
 * checks the data with the schema and inserts the job through the caller's Kysely handle, so a job
 * sent inside a transaction is committed or rolled back with the write that caused it.
 */
import { PgBoss, type SendOptions as BossSendOptions } from "pg-boss";
import type { z } from "zod";
import { bossDb, type Executor } from "./boss-db";
import type { RetryPreset } from "./presets";

export type SendOptions = Pick<BossSendOptions, "singletonKey" | "singletonSeconds" | "singletonNextSlot">;

export interface JobSpec<S extends z.ZodType> {
  name: string;
  schema: S;
  /** A function when the preset depends on the environment (mining: ECHOLINE_MINING_RETRY). */
  preset: RetryPreset | (() => RetryPreset);
  /** Where pg-boss moves a job whose last try failed; that queue must be listed before this one. */
  deadLetter?: string;
  /** Also sent on a schedule (pg-boss `schedule`), with this data. */
  cron?: { expression: string; data: z.input<S> };
  /** Jobs one worker fetches at once (each succeeds or fails on its own). */
  batchSize?: number;
  /** How many of this queue's jobs one worker process runs at once. */
  concurrency?: number | (() => number);
  /** Options every send of this job gets (singleton keys and windows), from its checked data. */
  sendOptions?(data: z.output<S>): SendOptions;
}

export type Job<S extends z.ZodType = z.ZodType> = Readonly<JobSpec<S>> & {
  /** Checks `data` and enqueues the job through `db` (a transaction: the job commits with it). */
  send(db: Executor, data: z.input<S>, options?: SendOptions): Promise<string | null>;
  /** Job data read back from the queue is a boundary: handlers check it with this. */
  parse(data: unknown): z.output<S>;
  presetNow(): RetryPreset;
  concurrencyNow(): number;
};

// A pg-boss instance that is never started only builds SQL and runs it on the handle it was made
// with: nothing polls, nothing holds a pool. One per handle (a transaction lives for one request).
const senders = new WeakMap<object, PgBoss>();
function senderOver(db: Executor): PgBoss {
  let boss = senders.get(db);
  if (!boss) {
    boss = new PgBoss({ db: bossDb(db), supervise: false, schedule: false, migrate: false, registerInstance: false });
    boss.on("error", (err: Error) => console.error("[jobs] pg-boss error:", err.message));
    senders.set(db, boss);
  }
  return boss;
}

export function defineJob<S extends z.ZodType>(spec: JobSpec<S>): Job<S> {
  const parse = (data: unknown) => spec.schema.parse(data) as z.output<S>;
  return {
    ...spec,
    parse,
    presetNow: () => (typeof spec.preset === "function" ? spec.preset() : spec.preset),
    concurrencyNow: () => (typeof spec.concurrency === "function" ? spec.concurrency() : (spec.concurrency ?? 1)),
    async send(db, data, options) {
      const checked = parse(data);
      try {
        return await senderOver(db).send(spec.name, checked as object, {
          ...spec.sendOptions?.(checked),
          ...options,
          db: bossDb(db),
        });
      } catch (err) {
        if ((err as { code?: string }).code === "PGBOSS_QUEUE_NOT_FOUND")
          throw new Error(
            `Job queue "${spec.name}" is missing: this database was set up without installQueues() ` +
              `(npm run db:migrate, npm start and every worker install it). ${(err as Error).message}`,
          );
        throw err;
      }
    },
  };
}
