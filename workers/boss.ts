import { PgBoss } from "pg-boss";
import { env } from "@/lib/env";

/**
 * The worker's own pg-boss: its own small pool on the same PostgreSQL, so it can run pg-boss's
 * maintenance. Several worker processes on one database are safe: pg-boss claims each job with
 * SKIP LOCKED, so a job runs in one process at a time.
 */
export function createWorkerBoss(connectionString: string, opts: { superviseIntervalSeconds?: number } = {}): PgBoss {
  // How often this instance looks for expired claims and lost heartbeats (pg-boss's default is 60 s).
  // Every worker supervises, and pg-boss lets one instance per interval do the pass, so 15 s costs
  // little and gets a dead worker's article back to work within ~45 s (heartbeat 30 s + 15 s).
  // ECHOLINE_WORKER_SUPERVISE_SECONDS is for tests that spawn workers and cannot wait that long.
  const supervise = opts.superviseIntervalSeconds ?? env().ECHOLINE_WORKER_SUPERVISE_SECONDS;
  // Plain polling (every second, see workers/index.ts), not LISTEN/NOTIFY: jobs are sent through a
  // Kysely transaction by a sender that cannot notify, and a notify-enabled queue then falls back
  // to a slow backstop poll (measured: ~25 s between jobs).
  const boss = new PgBoss({
    connectionString,
    max: 4,
    application_name: "echoline-worker",
    superviseIntervalSeconds: supervise,
    monitorIntervalSeconds: supervise,
  });
  boss.on("error", (err: Error) => console.error("[worker] pg-boss error:", err.message));
  boss.on("warning", (w: { message: string }) => {
    // Node 20 runs pg-boss fine although its package asks for 22; that warning is noise here.
    if (!/engine|node/i.test(w.message)) console.warn("[worker] pg-boss warning:", w.message);
  });
  return boss;
}
