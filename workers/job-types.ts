import type { Job, JobResult } from "pg-boss";
import { z } from "zod";

/**
 * One background job: its queue name, retry preset and handler. workers/index.ts registers the
 * explicit list in workers/jobs.ts; nothing is wired by glob.
 */
export type RetryPreset = {
  retryLimit: number;
  retryDelay: number;
  retryBackoff: boolean;
  expireInSeconds: number;
  /** pg-boss fails (and retries) an active job whose worker stopped refreshing it for this long; >= 10. */
  heartbeatSeconds?: number;
};

export const RETRY = {
  // Mining: a few tries with growing delay, then the article ends `failed` with the reason.
  // expireInSeconds bounds one claim, and a claim may hold a batch of two documents mined one after
  // the other, each bounded by the isolated miner's hard limit (62 s by default): 5 min leaves room
  // for storage and the store transaction. The heartbeat notices a dead worker far sooner: pg-boss
  // refreshes it every 15 s while the handler runs, so 30 s without one means nobody is running it.
  mining: { retryLimit: 3, retryDelay: 5, retryBackoff: true, expireInSeconds: 5 * 60, heartbeatSeconds: 30 },
  graph: { retryLimit: 5, retryDelay: 10, retryBackoff: true, expireInSeconds: 30 * 60 },
  housekeeping: { retryLimit: 1, retryDelay: 60, retryBackoff: false, expireInSeconds: 10 * 60 },
} satisfies Record<string, RetryPreset>;

const PresetOverride = z
  .object({
    retryLimit: z.number().int().min(0).max(20),
    retryDelay: z.number().int().min(0),
    retryBackoff: z.boolean(),
    expireInSeconds: z.number().int().min(1),
    // null switches the heartbeat off (expiry alone then notices a dead worker).
    heartbeatSeconds: z.number().int().min(10).nullable(),
  })
  .partial()
  .strict();

/**
 * The mining preset in force: RETRY.mining, with the fields of ECHOLINE_MINING_RETRY (JSON, e.g.
 * `{"retryLimit":1,"retryDelay":0,"retryBackoff":false}`) laid over it. Tests use it to keep retries
 * fast, including in worker processes they spawn; this is the only place the variable is read.
 */
export function miningPreset(env: NodeJS.ProcessEnv = process.env): RetryPreset {
  const raw = env.ECHOLINE_MINING_RETRY;
  if (!raw) return { ...RETRY.mining };
  let json: unknown;
  try {
    json = JSON.parse(raw);
  } catch {
    throw new Error(`ECHOLINE_MINING_RETRY is not JSON: ${raw}`);
  }
  const parsed = PresetOverride.safeParse(json);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    throw new Error(`ECHOLINE_MINING_RETRY: ${issue?.path.join(".") || "(root)"}: ${issue?.message}`);
  }
  const { heartbeatSeconds, ...rest } = parsed.data;
  const out: RetryPreset = { ...RETRY.mining, ...rest };
  if (heartbeatSeconds === null) delete out.heartbeatSeconds;
  else if (heartbeatSeconds !== undefined) out.heartbeatSeconds = heartbeatSeconds;
  return out;
}

export type JobDefinition<T extends object = object> = {
  name: string;
  preset: RetryPreset;
  /** How many jobs of this queue one worker process runs at once. */
  concurrency?: number;
  /** Cron schedule (pg-boss `schedule`), if the job also runs periodically. */
  cron?: string;
  /**
   * Jobs fetched at once; the worker keeps fetching while batches come back full instead of waiting
   * out a poll interval per job. Each job of a batch succeeds or fails on its own.
   */
  batchSize?: number;
  handler: (jobs: Job<T>[]) => Promise<JobResult[]>;
};
