/**
 * Every job the worker runs, listed explicitly (nothing is wired by glob): the registry entry
 * (lib/jobs/registry.ts) and its handler. Dependencies come in as arguments, so tests build the
 * same list with their own database, miner, sender or SMTP transport.
 */
import type { Job, JobResult, JobWithMetadata, PgBoss } from "pg-boss";
import { mineArticle, mineArticleStopped, type MiningJobData } from "@/lib/jobs/mining";
import { JOBS } from "@/lib/jobs/registry";
import { createMiningJob, type MiningDeps, type MiningJob } from "./mining-job";
import { createGraphHandlers, type GraphJobDeps } from "./graph-jobs";
import { createMailHandler, type MailDeps } from "./mail-job";
import type { Registered } from "./handler";

export type WorkerDeps = MiningDeps & { graph?: Partial<GraphJobDeps>; mail?: MailDeps };

export function buildJobs(deps: WorkerDeps): { mining: MiningJob; all: Registered[] } {
  const mining = createMiningJob(deps);
  const all: Registered[] = [
    {
      job: mineArticle as never,
      handler: (jobs) => mining.handler(jobs as Job<MiningJobData>[]) as Promise<JobResult[]>,
    },
    // Whoever mines also settles the mining jobs that died: their articles end `failed`.
    {
      job: mineArticleStopped as never,
      includeMetadata: true,
      handler: async (jobs) => {
        await mining.handleStopped(jobs as unknown as JobWithMetadata<MiningJobData>[]);
        return jobs.map((j) => ({ id: j.id, status: "completed" as const }));
      },
    },
    ...createGraphHandlers({ db: deps.db, ...deps.graph }),
    createMailHandler(deps.mail),
  ];
  // Every registry job has exactly one handler here.
  const missing = JOBS.filter((j) => !all.some((r) => r.job.name === j.name)).map((j) => j.name);
  if (missing.length) throw new Error(`No handler for job(s): ${missing.join(", ")}`);
  return { mining, all };
}

/**
 * Starts pg-boss workers for `list` and the cron schedules of their jobs. Plain polling (see
 * workers/boss.ts); jobs with a batch size keep fetching while batches come back full.
 */
export async function registerJobs(
  boss: PgBoss,
  list: Registered[],
  opts: { pollingIntervalSeconds?: number; concurrency?: Partial<Record<string, number>> } = {},
): Promise<void> {
  for (const { job, handler, includeMetadata } of list) {
    const batchSize = job.batchSize ?? 1;
    await boss.work(
      job.name,
      {
        localConcurrency: opts.concurrency?.[job.name] ?? job.concurrencyNow(),
        batchSize,
        burstWhenBatchFull: batchSize > 1,
        perJobResults: true,
        includeMetadata: includeMetadata ?? false,
        pollingIntervalSeconds: opts.pollingIntervalSeconds ?? 1,
      },
      (jobs: Job<object>[]) => handler(jobs),
    );
    // Scheduled with the job's own data: a schedule without data sends null, which no schema takes.
    if (job.cron) await boss.schedule(job.name, job.cron.expression, job.cron.data as object);
  }
}
