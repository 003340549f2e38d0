import { z } from "zod";
import { env } from "@/lib/env";
import { defineJob } from "./define";
import { miningPreset, RETRY } from "./presets";

/**
 * pg-boss moves a mining job here once its last try has failed without the handler settling the
 * article itself: the worker died, or the claim expired. Its handler marks the article `failed`.
 */
export const mineArticleStopped = defineJob({
  name: "mine-article-stopped",
  schema: z.object({ articleId: z.uuid(), reason: z.enum(["upload", "remine"]).optional() }),
  preset: RETRY.settle,
});

/**
 * Mine one article. The singleton key keeps one waiting job per article: a second re-mine request
 * while one waits gets null instead of queueing twice.
 */
export const mineArticle = defineJob({
  name: "mine-article",
  schema: mineArticleStopped.schema,
  preset: () => miningPreset(),
  deadLetter: mineArticleStopped.name,
  // Two at a time, fetched again while batches come back full: with one job per fetch, each
  // article waited out a poll interval (measured: ~0.9 s idle per article).
  batchSize: 2,
  concurrency: () => env().ECHOLINE_MINING_CONCURRENCY,
  sendOptions: (d) => ({ singletonKey: d.articleId }),
});

export type MiningJobData = z.infer<typeof mineArticle.schema>;
