/** The job registry: one entry per queue, dead letters listed before the queues that name them. */
import { describe, expect, it } from "vitest";
import { JOBS } from "@/lib/jobs/registry";
import { refreshSummaries } from "@/lib/jobs/graph";
import { miningPreset, RETRY } from "@/lib/jobs/presets";

describe("the job registry", () => {
  it("has unique names, and each dead-letter queue comes before the queue that uses it", () => {
    const names = JOBS.map((j) => j.name);
    expect(new Set(names).size).toBe(names.length);
    for (const [i, j] of JOBS.entries()) if (j.deadLetter) expect(names.indexOf(j.deadLetter)).toBeLessThan(i);
  });

  it("every cron schedule sends data its own schema accepts (a null payload failed the first refresh)", () => {
    for (const j of JOBS) if (j.cron) expect(() => j.parse(j.cron!.data)).not.toThrow();
    expect(() => refreshSummaries.parse(null)).toThrow();
  });

  it("ECHOLINE_MINING_RETRY lays its fields over the mining preset and names a wrong one", () => {
    expect(miningPreset('{"retryLimit":1,"heartbeatSeconds":null}')).toEqual({
      retryLimit: 1,
      retryDelay: RETRY.mining.retryDelay,
      retryBackoff: RETRY.mining.retryBackoff,
      expireInSeconds: RETRY.mining.expireInSeconds,
    });
    expect(() => miningPreset('{"retryLimit":"x"}')).toThrow(/ECHOLINE_MINING_RETRY: retryLimit/);
  });
});
