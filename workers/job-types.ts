import type { Job } from "pg-boss";

/**
 * One background job: its queue name, retry preset and handler. workers/index.ts registers the
 * explicit list in workers/jobs.ts; nothing is wired by glob.
 */
export type RetryPreset = { retryLimit: number; retryDelay: number; retryBackoff: boolean; expireInSeconds: number };

export const RETRY = {
  // Mining: a few tries with growing delay, then the article ends `failed` with the reason.
  mining: { retryLimit: 3, retryDelay: 5, retryBackoff: true, expireInSeconds: 15 * 60 },
  graph: { retryLimit: 5, retryDelay: 10, retryBackoff: true, expireInSeconds: 30 * 60 },
  housekeeping: { retryLimit: 1, retryDelay: 60, retryBackoff: false, expireInSeconds: 10 * 60 },
} satisfies Record<string, RetryPreset>;

export type JobDefinition<T extends object = object> = {
  name: string;
  preset: RetryPreset;
  /** How many jobs of this queue one worker process runs at once. */
  concurrency?: number;
  /** Cron schedule (pg-boss `schedule`), if the job also runs periodically. */
  cron?: string;
  handler: (jobs: Job<T>[]) => Promise<void>;
};
