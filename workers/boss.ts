import { PgBoss } from "pg-boss";
import type { JobDefinition } from "./job-types";

/**
 * The worker's own pg-boss: its own small pool on the same PostgreSQL, so it can LISTEN for new
 * jobs and run pg-boss's maintenance. Several worker processes on one database are safe: pg-boss
 * claims each job with SKIP LOCKED, so a job runs in one process at a time.
 */
export function createWorkerBoss(connectionString: string): PgBoss {
  // Plain polling (every second, see workers/index.ts), not LISTEN/NOTIFY: jobs are sent through a
  // Kysely transaction by a sender that cannot notify, and a notify-enabled queue then falls back
  // to a slow backstop poll (measured: ~25 s between jobs).
  const boss = new PgBoss({ connectionString, max: 4, application_name: "echoline-worker" });
  boss.on("error", (err: Error) => console.error("[worker] pg-boss error:", err.message));
  boss.on("warning", (w: { message: string }) => {
    // Node 20 runs pg-boss fine although its package asks for 22; that warning is noise here.
    if (!/engine|node/i.test(w.message)) console.warn("[worker] pg-boss warning:", w.message);
  });
  return boss;
}

/** createQueue must come before send/work; racing processes may both try, which is harmless. */
export async function ensureQueue(boss: PgBoss, job: Pick<JobDefinition, "name" | "preset">, extra: { notify?: boolean } = {}): Promise<void> {
  if (await boss.getQueue(job.name)) return;
  try {
    await boss.createQueue(job.name, { ...job.preset, ...extra });
  } catch (err) {
    if (!(await boss.getQueue(job.name))) throw err;
  }
}
