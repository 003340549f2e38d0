/**
 * Sending mining jobs. Jobs are inserted through the caller's Kysely transaction (pg-boss's `db`
 * option), so an article and its job are committed together or not at all.
 */
import { CompiledQuery, type Kysely, type Transaction } from "kysely";
import { PgBoss } from "pg-boss";
import type { Database, DB } from "@/db";
import { RETRY } from "@/workers/job-types";

export const MINING_QUEUE = "mine-article";
export type MiningJobData = { articleId: string; reason?: "upload" | "remine" };

type Executor = Kysely<Database> | Transaction<Database>;

/** pg-boss's database adapter over a Kysely handle or transaction. */
export function bossDb(db: Executor) {
  return {
    executeSql: async (text: string, values?: unknown[]) => {
      const r = await db.executeQuery(CompiledQuery.raw(text, values ?? []));
      return { rows: r.rows as unknown[] as Record<string, unknown>[] };
    },
  };
}

export const miningQueueOptions = {
  retryLimit: RETRY.mining.retryLimit,
  retryDelay: RETRY.mining.retryDelay,
  retryBackoff: RETRY.mining.retryBackoff,
  expireInSeconds: RETRY.mining.expireInSeconds,
};

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
      await ensureMiningQueue(boss);
      return boss;
    })();
    p.catch(() => senders.delete(db));
    senders.set(db, p);
  }
  return p;
}

export async function ensureMiningQueue(boss: PgBoss): Promise<void> {
  if (!(await boss.getQueue(MINING_QUEUE))) {
    try {
      await boss.createQueue(MINING_QUEUE, miningQueueOptions);
    } catch (err) {
      // Another process created it between our check and our create.
      if (!(await boss.getQueue(MINING_QUEUE))) throw err;
    }
  }
}

/**
 * Enqueues mining of one article inside `trx`. The singleton key keeps one waiting job per article:
 * a second re-mine request while one waits returns null instead of queueing twice.
 */
export async function enqueueMining(boss: PgBoss, trx: Transaction<Database>, data: MiningJobData): Promise<string | null> {
  return boss.send(MINING_QUEUE, data, { ...miningQueueOptions, singletonKey: data.articleId, db: bossDb(trx) });
}
