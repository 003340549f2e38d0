/**
 * The worker process (`npm run worker`; `npm start` runs one too). Any number of them may run
 * against one database. SIGTERM/SIGINT stop taking new jobs and wait for the ones in progress.
 */
import type { Job } from "pg-boss";
import { createDb, defaultDatabaseUrl } from "@/db";
import { getStorage } from "@/lib/storage";
import { createMiner } from "@/lib/mining";
import { ensureMiningQueue, MINING_QUEUE, type MiningJobData } from "@/lib/corpus/queue";
import { createWorkerBoss, ensureQueue } from "./boss";
import { buildJobs } from "./jobs";

const url = defaultDatabaseUrl();
const db = createDb(url, 4);
const boss = createWorkerBoss(url);
await boss.start();

const { mining, all } = buildJobs({
  db,
  storage: getStorage(),
  boss,
  createMiner: ({ procedures }) => createMiner({ procedures }),
  onMined: process.env.ECHOLINE_WORKER_TIMINGS === "1" ? (t) => console.log(`[timing] ${JSON.stringify(t)}`) : undefined,
});

await ensureMiningQueue(boss);
// ECHOLINE_WORKER_QUEUES=a,b runs only those queues (dedicated mining machines; the benchmark).
const only = process.env.ECHOLINE_WORKER_QUEUES?.split(",").map((s) => s.trim()).filter(Boolean);
const selected = only?.length ? all.filter((j) => only.includes(j.name)) : all;
// Mining fetches two jobs at a time and keeps fetching while batches come back full: with one job
// per fetch, each article waited out a poll interval (measured: ~0.9 s idle per article).
if (selected.some((j) => j.name === MINING_QUEUE)) await boss.work(MINING_QUEUE, { localConcurrency: mining.concurrency ?? 1, batchSize: 2, burstWhenBatchFull: true, perJobResults: true, pollingIntervalSeconds: 1 }, (jobs: Job<MiningJobData>[]) => mining.handleEach(jobs));
for (const job of selected) {
  if (job.name === MINING_QUEUE) continue;
  await ensureQueue(boss, job);
  await boss.work(job.name, { localConcurrency: job.concurrency ?? 1, pollingIntervalSeconds: 1 }, async (jobs: Job<object>[]) => {
    await job.handler(jobs);
  });
  if (job.cron) await boss.schedule(job.name, job.cron, null, { ...job.preset });
}
console.log(`[worker] ready (pid ${process.pid}): ${selected.map((j) => j.name).join(", ")}`);

let stopping = false;
async function shutdown(signal: string) {
  if (stopping) return;
  stopping = true;
  console.log(`[worker] ${signal}: finishing work in progress …`);
  try {
    await boss.stop({ graceful: true, timeout: 60_000 });
    await mining.close();
    await db.destroy();
  } catch (err) {
    console.error("[worker] error while stopping:", (err as Error).message);
  }
  console.log("[worker] stopped");
  process.exit(0);
}
process.on("SIGTERM", () => void shutdown("SIGTERM"));
process.on("SIGINT", () => void shutdown("SIGINT"));
// A stray rejection in one job is logged, never the end of the process.
process.on("unhandledRejection", (err) => console.error("[worker] unhandled rejection:", err));
