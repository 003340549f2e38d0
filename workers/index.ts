/**
 * The worker process (`npm run worker`; `npm start` runs one too). Any number of them may run
 * against one database. SIGTERM/SIGINT stop taking new jobs, wait a bounded time for the ones in
 * progress, close the mining thread and the database pool, and exit.
 */
import { createDb } from "@/db";
import { databaseUrl, env } from "@/lib/env";
import { getStorage } from "@/lib/storage";
import { createIsolatedMiner } from "@/lib/mining/isolated";
import { ensureQueues } from "@/lib/jobs/registry";
import { mineArticle } from "@/lib/jobs/mining";
import { miningPreset } from "@/lib/jobs/presets";
import { createWorkerBoss } from "./boss";
import { buildJobs, registerJobs } from "./jobs";

// The supervisor of `npm start` (workers/stack.ts) sends SIGKILL 20 s after SIGTERM: finish within it.
const STOP_GRACE_MS = 14_000;
const STOP_DEADLINE_MS = 18_000;

// A wrong variable stops the worker here, with its name, before anything connects.
const config = env();
// The isolated miner's hard limit per document (default: the miner's own 60 s + 2 s).
const hardTimeoutSeconds = config.ECHOLINE_MINER_HARD_TIMEOUT_SECONDS;
const testHooks = config.ECHOLINE_TEST_HOOKS === "1";

// Derived exactly as `npm start` derives it, so a worker in a second terminal joins the same database.
const url = databaseUrl(config);
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
    testHooks && config.ECHOLINE_TEST_WORKER_HANG_AFTER_READING === "1" ? () => new Promise<void>(() => {}) : undefined,
  onMined: config.ECHOLINE_WORKER_TIMINGS === "1" ? (t) => console.log(`[timing] ${JSON.stringify(t)}`) : undefined,
});

// Workers bring every queue to its preset (the mining one may be overridden by ECHOLINE_MINING_RETRY).
await ensureQueues(boss, { reconcile: true, presets: { [mineArticle.name]: retry } });
// ECHOLINE_WORKER_QUEUES=a,b runs only those queues (dedicated mining machines; the benchmark).
// Whoever mines also settles the mining jobs that died.
const only = config.ECHOLINE_WORKER_QUEUES?.split(",")
  .map((s) => s.trim())
  .filter(Boolean);
if (only?.includes(mineArticle.name)) only.push(mineArticle.deadLetter!);
const selected = only?.length ? all.filter((r) => only.includes(r.job.name)) : all;
await registerJobs(boss, selected);
console.log(`[worker] ready (pid ${process.pid}): ${selected.map((r) => r.job.name).join(", ")}`);

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
