/**
 * The real worker code in-process against a suite's own test database: the worker's pg-boss, the
 * real miner, the real mining job. Tests wait by polling article state, never by sleeping a fixed time.
 */
import { sql } from "kysely";
import type { PgBoss } from "pg-boss";
import { createTestDatabase } from "@/tests/helpers/db";
import { memoryStorage, type FileStorage } from "@/lib/storage";
import { createMiner } from "@/lib/mining";
import { createIsolatedMiner, type IsolatedMinerOptions } from "@/lib/mining/isolated";
import { ensureQueues } from "@/lib/jobs/registry";
import { mineArticle, mineArticleStopped } from "@/lib/jobs/mining";
import { queueArticle, sha256Hex } from "@/lib/corpus/ingest";
import { seedProcedures } from "@/lib/corpus/procedures-store";
import { createWorkerBoss } from "@/workers/boss";
import { buildJobs, registerJobs } from "@/workers/jobs";
import type { MiningDeps, MiningJob } from "@/workers/mining-job";
import type { RetryPreset } from "@/lib/jobs/presets";
import type { DB } from "@/db";
import type { SourceKind } from "@/db/schema/corpus";

export type Harness = {
  db: DB;
  url: string;
  storage: FileStorage;
  boss: PgBoss;
  mining: MiningJob;
  errors: unknown[];
  stop(): Promise<void>;
};

/**
 * Retries without waiting, for suites that exercise them (production: RETRY.mining, 5 s growing).
 * The heartbeat stays off: its floor of 10 s would dominate, and expiry covers these suites.
 */
export const FAST_RETRY: RetryPreset = { retryLimit: 3, retryDelay: 0, retryBackoff: false, expireInSeconds: 60 };

export async function startHarness(
  opts: {
    beforeCommit?: MiningDeps["beforeCommit"];
    concurrency?: number;
    retry?: RetryPreset;
    /** The worker's isolated miner (its thread) instead of the in-process one. */
    isolated?: IsolatedMinerOptions;
  } = {},
): Promise<Harness> {
  const t = await createTestDatabase();
  await seedProcedures(t.db);
  const mem = memoryStorage();
  // The isolated miner takes the buffer it is given over; memoryStorage hands out its own copy, so
  // give the worker a fresh one each time, as folderStorage does by reading the file.
  const storage: FileStorage = {
    put: (sha, data) => mem.put(sha, data),
    get: async (key) => (await mem.get(key)).slice(),
  };
  const boss = createWorkerBoss(t.url, { superviseIntervalSeconds: 1 });
  await boss.start();
  await ensureQueues(boss, { reconcile: true, presets: opts.retry ? { [mineArticle.name]: opts.retry } : {} });
  const errors: unknown[] = [];
  const quietLog = { info: () => {}, warn: () => {}, error: (...a: unknown[]) => errors.push(a) };
  const isolated = opts.isolated;
  const { mining, all } = buildJobs({
    db: t.db,
    storage,
    boss,
    retry: opts.retry,
    createMiner: (o) => (isolated ? createIsolatedMiner({ ...isolated, ...o }) : createMiner(o)),
    log: quietLog,
    beforeCommit: opts.beforeCommit,
  });
  // Only the mining jobs: the graph jobs they send wait in their queues (their suites run them).
  await registerJobs(
    boss,
    all.filter((r) => r.job.name === mineArticle.name || r.job.name === mineArticleStopped.name),
    { pollingIntervalSeconds: 0.5, concurrency: { [mineArticle.name]: opts.concurrency ?? 2 } },
  );
  return {
    db: t.db,
    url: t.url,
    storage,
    boss,
    mining,
    errors,
    stop: async () => {
      await boss.stop({ graceful: true, timeout: 20_000 });
      await mining.close();
      await t.drop();
    },
  };
}

/** Polls until every listed article is done or failed (or the deadline passes). */
export async function waitForArticles(
  db: DB,
  ids: string[],
  timeoutMs = 90_000,
): Promise<Map<string, { status: string; failure_code: string | null; failure_message: string | null }>> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const rows = await db
      .selectFrom("articles")
      .select(["id", "status", "failure_code", "failure_message"])
      .where("id", "in", ids)
      .execute();
    const finished = rows.filter((r) => r.status === "done" || r.status === "failed");
    if (finished.length === ids.length) return new Map(rows.map((r) => [r.id, r]));
    if (Date.now() > deadline)
      throw new Error(`${ids.length - finished.length} of ${ids.length} articles not finished in time`);
    await new Promise((r) => setTimeout(r, 200));
  }
}

/**
 * Stores a file and queues it without the upload's type check, as if it had slipped past it: the
 * worker must still fail it cleanly.
 */
export async function enqueueRaw(
  h: Harness,
  data: Uint8Array,
  filename: string,
  kind: SourceKind = "pdf",
): Promise<string> {
  const sha = sha256Hex(data);
  const key = await h.storage.put(sha, data);
  return h.db.transaction().execute(async (trx) => {
    await trx
      .insertInto("stored_files")
      .values({ sha256: sha, size_bytes: data.length, media_type: "application/octet-stream", storage_key: key })
      .onConflict((oc) => oc.doNothing())
      .execute();
    const a = await trx
      .insertInto("articles")
      .values({ file_sha256: sha, original_filename: filename, source_kind: kind })
      .returning("id")
      .executeTakeFirstOrThrow();
    await queueArticle(trx, a.id, "upload");
    return a.id;
  });
}

export async function rowCounts(db: DB, ids: string[]) {
  const count = async (table: "statements" | "citations" | "references") =>
    Number(
      (
        await db
          .selectFrom(table)
          .select(sql<number>`count(*)`.as("n"))
          .where("article_id", "in", ids)
          .executeTakeFirstOrThrow()
      ).n,
    );
  return {
    statements: await count("statements"),
    citations: await count("citations"),
    references: await count("references"),
  };
}
