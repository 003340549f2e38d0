import type { JobDefinition } from "./job-types";
import { createMiningJob, type MiningDeps, type MiningJob } from "./mining-job";
import { graphJobs } from "./graph-jobs";

/** Every job the worker runs, listed explicitly (nothing is wired by glob). */
export function buildJobs(deps: MiningDeps): { mining: MiningJob; all: JobDefinition[] } {
  const mining = createMiningJob(deps);
  return { mining, all: [mining as JobDefinition, ...graphJobs] };
}
