/**
 * The worker process (`npm run worker`; `npm start` runs one too). Any number of them may run
 * against one database. SIGTERM/SIGINT stop taking new jobs, wait a bounded time for the ones in
 * progress, close the mining thread and the database pool, and exit.
 */
import type { Job, JobWithMetadata } from "pg-boss";
import { createDb, defaultDatabaseUrl } from "@/db";
import { getStorage } from "@/lib/storage";
import { createIsolatedMiner } from "@/lib/mining/isolated";
import { ensureMiningQueue, MINING_QUEUE, MINING_STOPPED_QUEUE, type MiningJobData } from "@/lib/corpus/queue";
import { createWorkerBoss, ensureQueue } from "./boss";
import { buildJobs } from "./jobs";
import { miningPreset } from "./job-types";

// The supervisor of `npm start` (workers/stack.ts) sends SIGKILL 20 s after SIGTERM: finish within it.
const STOP_GRACE_MS = 14_000;
const STOP_DEADLINE_MS = 18_000;

function secondsFromEnv(name: string): number | undefined {
  const raw = process.env[name];
  if (raw === undefined || raw === "") return undefined;
  const n = Number(raw);
  if (!Number.isFinite(n) || n <= 0) throw new Error(`${name} must be a positive number of seconds, not "${raw}"`);
  return n;
}
// The isolated miner's hard limit per document (default: the miner's own 60 s + 2 s).
const hardTimeoutSeconds = secondsFromEnv("ECHOLINE_MINER_HARD_TIMEOUT_SECONDS");
const testHooks = process.env.ECHOLINE_TEST_HOOKS === "1";

const url = defaultDatabaseUrl();
const db = createDb(url, 4);
const boss = createWorkerBoss(url);
await boss.start();

const retry = miningPreset();
const { mining, all } = buildJobs({
  db,
  storage: getStorage(),
  boss,
  retry,
  // One mining thread per process, warm between documents; the job rebuilds it when the procedure
  // list changes and closes it on shutdown.
  createMiner: ({ procedures }) =>
    createIsolatedMiner({ procedures, hardTimeoutMs: hardTimeoutSeconds ? hardTimeoutSeconds * 1000 : undefined }),
  // Lets a test kill a worker in the middle of a job: the handler never returns after `reading`.
  afterReading:
    testHooks && process.env.ECHOLINE_TEST_WORKER_HANG_AFTER_READING === "1"
      ? () => new Promise<void>(() => {})
      : undefined,
  onMined:
    process.env.ECHOLINE_WORKER_TIMINGS === "1" ? (t) => console.log(`[timing] ${JSON.stringify(t)}`) : undefined,
});

await ensureMiningQueue(boss, { preset: retry, reconcile: true });
// ECHOLINE_WORKER_QUEUES=a,b runs only those queues (dedicated mining machines; the benchmark).
const only = process.env.ECHOLINE_WORKER_QUEUES?.split(",")
  .map((s) => s.trim())
  .filter(Boolean);
const selected = only?.length ? all.filter((j) => only.includes(j.name)) : all;
if (selected.some((j) => j.name === MINING_QUEUE)) {
  // Mining fetches two jobs at a time and keeps fetching while batches come back full: with one job
  // per fetch, each article waited out a poll interval (measured: ~0.9 s idle per article).
  await boss.work(
    MINING_QUEUE,
    {
      localConcurrency: mining.concurrency ?? 1,
      batchSize: 2,
      burstWhenBatchFull: true,
      perJobResults: true,
      pollingIntervalSeconds: 1,
    },
    (jobs: Job<MiningJobData>[]) => mining.handler(jobs),
  );
  // Whoever mines also settles the mining jobs that died: their articles end `failed`.
  await boss.work(
    MINING_STOPPED_QUEUE,
    { includeMetadata: true, pollingIntervalSeconds: 1 },
    (jobs: JobWithMetadata<MiningJobData>[]) => mining.handleStopped(jobs),
  );
}
for (const job of selected) {
  if (job.name === MINING_QUEUE) continue;
  await ensureQueue(boss, job);
  const batch = job.batchSize ?? 1;
  await boss.work(
    job.name,
    {
      localConcurrency: job.concurrency ?? 1,
      batchSize: batch,
      burstWhenBatchFull: batch > 1,
      perJobResults: true,
      pollingIntervalSeconds: 1,
    },
    (jobs: Job<object>[]) => job.handler(jobs),
  );
  if (job.cron) await boss.schedule(job.name, job.cron, null, { ...job.preset });
}
console.log(`[worker] ready (pid ${process.pid}): ${selected.map((j) => j.name).join(", ")}`);

let stopping = false;
async function shutdown(signal: string) {
  if (stopping) return;
  stopping = true;
  console.log(`[worker] ${signal}: finishing work in progress …`);
  // Whatever hangs (an unreachable database), the process still ends in bounded time.
  setTimeout(() => {
    console.error(`[worker] not stopped after ${STOP_DEADLINE_MS / 1000} s; exiting.`);
    process.exit(1);
  }, STOP_DEADLINE_MS).unref();
  let code = 0;
  try {
    // A job still running after the grace is failed back to its queue by pg-boss and retried
    // elsewhere; its late result (if any) is harmless.
    await boss.stop({ graceful: true, timeout: STOP_GRACE_MS });
  } catch (err) {
    code = 1;
    console.error("[worker] error while stopping the queue:", (err as Error).message);
  }
  try {
    // Ends the mining thread once no job uses it; one stuck past the grace dies with the process.
    await Promise.race([mining.close(), new Promise((r) => setTimeout(r, 2_000).unref())]);
    await db.destroy();
  } catch (err) {
    code = 1;
    console.error("[worker] error while closing:", (err as Error).message);
  }
  console.log("[worker] stopped");
  process.exit(code);
}
process.on("SIGTERM", () => void shutdown("SIGTERM"));
process.on("SIGINT", () => void shutdown("SIGINT"));
// A stray rejection in one job is logged, never the end of the process.
process.on("unhandledRejection", (err) => console.error("[worker] unhandled rejection:", err));
