import type { Job as BossJob, JobResult } from "pg-boss";
import type { z } from "zod";
import type { Job } from "@/lib/jobs/define";

/** A registry job and the function that runs a batch of it (workers/jobs.ts lists them). */
export type Registered = {
  job: Job;
  handler: (jobs: BossJob<object>[]) => Promise<JobResult[]>;
  /** Hand the handler pg-boss's metadata (retry counts, the source of a dead-lettered job). */
  includeMetadata?: boolean;
};

type Log = Pick<Console, "error">;

/**
 * Runs each job of a batch on its own: its data is checked with the job's schema (anything may sit
 * in the queue table), and it succeeds or fails (and is retried) without taking the others along.
 * Failures are logged with the job's name and id.
 */
export function eachJob<S extends z.ZodType>(
  job: Job<S>,
  fn: (data: z.output<S>, meta: { id: string; retryCount?: number }) => Promise<void>,
  log: Log = console,
): Registered {
  return {
    job: job as unknown as Job,
    handler: async (jobs) => {
      const out: JobResult[] = [];
      for (const j of jobs) {
        try {
          await fn(job.parse(j.data), { id: j.id, retryCount: (j as { retryCount?: number }).retryCount });
          out.push({ id: j.id, status: "completed" });
        } catch (err) {
          const message = err instanceof Error ? err.message : String(err);
          log.error(`[worker] ${job.name} job ${j.id} failed: ${message}`);
          out.push({ id: j.id, status: "failed", output: { message } });
        }
      }
      return out;
    },
  };
}
