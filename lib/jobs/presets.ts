/**
 * Retry and expiry presets of the job queues. A job's queue is created (and, by worker processes,
 * kept) with its preset; jobs are sent without options of their own, so they inherit it.
 */
import { z } from "zod";
import { env } from "@/lib/env";

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
  // Marking an article failed is one short transaction; a few tries cover a database restart.
  settle: { retryLimit: 5, retryDelay: 10, retryBackoff: true, expireInSeconds: 60 },
  // An SMTP server that is down for a while: 8 tries from 30 s doubling cover about two hours.
  mail: { retryLimit: 8, retryDelay: 30, retryBackoff: true, expireInSeconds: 2 * 60 },
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
 * fast, including in worker processes they spawn.
 */
export function miningPreset(raw: string | undefined = env().ECHOLINE_MINING_RETRY): RetryPreset {
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
