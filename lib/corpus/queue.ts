/**
 * Sending mining jobs. Jobs are inserted through the caller's Kysely transaction (pg-boss's `db`
 * option), so an article and its job are committed together or not at all.
 */
import { CompiledQuery } from "kysely";
import { PgBoss, type Queue } from "pg-boss";
import type { DB } from "@/db";
// eslint-disable-next-line boundaries/dependencies -- TODO(lead): remove after jobs/screens merge (the job registry moves to lib/)
import { miningPreset, type RetryPreset } from "@/workers/job-types";

export const MINING_QUEUE = "mine-article";
/**
 * pg-boss moves a mining job here once its last try has failed without the handler settling the
 * article itself: the worker died, or the claim expired. Its handler marks the article `failed`.
 */
export const MINING_STOPPED_QUEUE = "mine-article-stopped";
export type MiningJobData = { articleId: string; reason?: "upload" | "remine" };

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
export function bossDb(db: DB) {
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

/** The mining queue's settings. Jobs are sent without options of their own, so they inherit these. */
export function miningQueueOptions(preset: RetryPreset = miningPreset()) {
  return {
    retryLimit: preset.retryLimit,
    retryDelay: preset.retryDelay,
    retryBackoff: preset.retryBackoff,
    expireInSeconds: preset.expireInSeconds,
    // Absent, not undefined, when off: pg-boss rejects a heartbeatSeconds key whose value is undefined.
    ...(preset.heartbeatSeconds ? { heartbeatSeconds: preset.heartbeatSeconds } : {}),
    deadLetter: MINING_STOPPED_QUEUE,
  };
}

// Marking an article failed is one short transaction; a few tries cover a database restart.
const stoppedQueueOptions = { retryLimit: 5, retryDelay: 10, retryBackoff: true, expireInSeconds: 60 };

// One sending instance per database handle. It supervises and polls nothing (worker processes do)
// and leaves pg-boss's background index builds to the workers: those need multi-statement results,
// which a Kysely adapter cannot return.
const senders = new WeakMap<object, Promise<PgBoss>>();
const quiet = { supervise: false, schedule: false, registerInstance: false } as const;

export function senderFor(db: DB): Promise<PgBoss> {
  let p = senders.get(db);
  if (!p) {
    p = (async () => {
      // Installs or upgrades pg-boss's schema when no worker has done so yet (e.g. a first upload).
      const installer = new PgBoss({ db: bossDb(db), ...quiet, migrate: true, bamIntervalSeconds: 3600 });
      installer.on("error", () => {});
      await installer.start();
      await installer.stop({ graceful: false, close: false });
      const boss = new PgBoss({ db: bossDb(db), ...quiet, migrate: false });
      boss.on("error", (err: Error) => console.error("[queue] pg-boss error:", err.message));
      await boss.start();
      // Creates the queues when missing, but leaves the settings of existing ones to the workers.
      await ensureMiningQueue(boss);
      return boss;
    })();
    p.catch(() => senders.delete(db));
    senders.set(db, p);
  }
  return p;
}

async function createIfMissing(
  boss: PgBoss,
  name: string,
  options: Parameters<PgBoss["createQueue"]>[1],
): Promise<Queue | null> {
  const existing = await boss.getQueue(name);
  if (existing) return existing;
  try {
    await boss.createQueue(name, options);
  } catch (err) {
    // Another process created it between our check and our create.
    if (!(await boss.getQueue(name))) throw err;
  }
  return null;
}

/**
 * Creates the mining queue and its dead-letter queue when missing. With `reconcile` (worker
 * processes), an existing mining queue is brought to `preset`: queues created before the dead-letter
 * queue and the heartbeat existed get them, and a changed preset takes effect.
 */
export async function ensureMiningQueue(
  boss: PgBoss,
  opts: { preset?: RetryPreset; reconcile?: boolean } = {},
): Promise<void> {
  const wanted = miningQueueOptions(opts.preset);
  // The dead-letter queue first: a queue may only name one that exists.
  await createIfMissing(boss, MINING_STOPPED_QUEUE, stoppedQueueOptions);
  const existing = await createIfMissing(boss, MINING_QUEUE, wanted);
  if (!existing || !opts.reconcile) return;
  const differs =
    existing.retryLimit !== wanted.retryLimit ||
    existing.retryDelay !== wanted.retryDelay ||
    existing.retryBackoff !== wanted.retryBackoff ||
    existing.expireInSeconds !== wanted.expireInSeconds ||
    (existing.heartbeatSeconds ?? null) !== (wanted.heartbeatSeconds ?? null) ||
    existing.deadLetter !== wanted.deadLetter;
  if (differs) await boss.updateQueue(MINING_QUEUE, { ...wanted, heartbeatSeconds: wanted.heartbeatSeconds ?? null });
}

/**
 * Enqueues mining of one article inside `trx`. The singleton key keeps one waiting job per article:
 * a second re-mine request while one waits returns null instead of queueing twice. Retry, expiry,
 * heartbeat and dead letter come from the queue (ensureMiningQueue).
 */
export async function enqueueMining(boss: PgBoss, trx: DB, data: MiningJobData): Promise<string | null> {
  return boss.send(MINING_QUEUE, data, { singletonKey: data.articleId, db: bossDb(trx) });
}
