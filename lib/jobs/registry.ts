/**
 * Every background job of Echoline, in one list. The worker registers a handler for each
 * (workers/jobs.ts); routes, lib code and tests send them with `job.send(trx, data)`. Queues are
 * created here and nowhere else.
 *
 * Adding a job: copy lib/jobs/mail.ts (name, zod schema, preset; cron, batch size and singleton
 * options when needed), append it to JOBS below (a dead-letter queue before the queue that names
 * it), and add its handler to workers/jobs.ts.
 */
import { PgBoss, type Queue } from "pg-boss";
import type { DB } from "@/db";
import { bossDb } from "./boss-db";
import type { Job } from "./define";
import { mineArticle, mineArticleStopped } from "./mining";
import { buildTrails, matchPractice, refreshSummaries, resolveArticle } from "./graph";
import { sendMail } from "./mail";
import type { RetryPreset } from "./presets";

export const JOBS = [
  mineArticleStopped,
  mineArticle,
  resolveArticle,
  matchPractice,
  buildTrails,
  refreshSummaries,
  sendMail,
] as const satisfies readonly Job[];

export type JobName = (typeof JOBS)[number]["name"];

/** The queue settings of a job: its preset (an override for tests) and its dead-letter queue. */
export function queueOptions(job: Job, preset: RetryPreset = job.presetNow()) {
  return {
    retryLimit: preset.retryLimit,
    retryDelay: preset.retryDelay,
    retryBackoff: preset.retryBackoff,
    expireInSeconds: preset.expireInSeconds,
    // Absent, not undefined, when off: pg-boss rejects a heartbeatSeconds key whose value is undefined.
    ...(preset.heartbeatSeconds ? { heartbeatSeconds: preset.heartbeatSeconds } : {}),
    ...(job.deadLetter ? { deadLetter: job.deadLetter } : {}),
  };
}

/**
 * Creates every queue that is missing. With `reconcile` (worker processes), an existing queue is
 * brought to its preset, so a changed preset takes effect and old queues gain a dead letter or a
 * heartbeat. Racing processes may both create a queue; the loser finds it there, which is fine.
 */
export async function ensureQueues(
  boss: PgBoss,
  opts: { reconcile?: boolean; presets?: Partial<Record<JobName, RetryPreset>> } = {},
): Promise<void> {
  for (const job of JOBS) {
    const wanted = queueOptions(job, opts.presets?.[job.name]);
    let existing: Queue | null = await boss.getQueue(job.name);
    if (!existing) {
      try {
        await boss.createQueue(job.name, wanted);
        continue;
      } catch (err) {
        existing = await boss.getQueue(job.name);
        if (!existing) throw err;
      }
    }
    if (!opts.reconcile) continue;
    const differs =
      existing.retryLimit !== wanted.retryLimit ||
      existing.retryDelay !== wanted.retryDelay ||
      existing.retryBackoff !== wanted.retryBackoff ||
      existing.expireInSeconds !== wanted.expireInSeconds ||
      (existing.heartbeatSeconds ?? null) !== (wanted.heartbeatSeconds ?? null) ||
      (existing.deadLetter ?? null) !== (wanted.deadLetter ?? null);
    if (differs) await boss.updateQueue(job.name, { ...wanted, heartbeatSeconds: wanted.heartbeatSeconds ?? null });
  }
}

const quiet = { supervise: false, schedule: false, registerInstance: false } as const;
const installed = new WeakMap<DB, Promise<void>>();

/**
 * Installs (or upgrades) pg-boss's schema and creates the queues, once per database handle: the
 * migrate script, `npm start`, the test template and the upload path call it; worker processes call
 * ensureQueues on their own pg-boss instead. pg-boss's background index builds are left to the
 * workers: those need multi-statement results, which a Kysely adapter cannot return.
 */
export function installQueues(db: DB): Promise<void> {
  let p = installed.get(db);
  if (!p) {
    p = (async () => {
      const installer = new PgBoss({ db: bossDb(db), ...quiet, migrate: true, bamIntervalSeconds: 3600 });
      installer.on("error", () => {});
      await installer.start();
      await installer.stop({ graceful: false, close: false });
      const boss = new PgBoss({ db: bossDb(db), ...quiet, migrate: false });
      boss.on("error", (err: Error) => console.error("[jobs] pg-boss error:", err.message));
      await ensureQueues(boss);
    })();
    p.catch(() => installed.delete(db));
    installed.set(db, p);
  }
  return p;
}
