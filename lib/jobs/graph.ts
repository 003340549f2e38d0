/**
 * Jobs of the citation graph. The chain after mining is: resolve an article's references → match
 * its statements to practices → rebuild the trails of the practices touched (debounced per practice)
 * → refresh the dashboard views (debounced). Handlers: workers/graph-jobs.ts.
 */
import { z } from "zod";
import { defineJob, type SendOptions } from "./define";
import { RETRY } from "./presets";

// Rebuilding a practice's trails walks its whole graph, so many articles mined together share one
// rebuild: a singleton key per practice with a short window. A request that finds the window taken
// goes into the next one (singletonNextSlot) rather than being dropped: the rebuild already queued or
// running may have started before this article's rows were there.
export const trailsOnce = (practiceId: string, seconds = 20): SendOptions => ({
  singletonKey: practiceId,
  singletonSeconds: seconds,
  singletonNextSlot: true,
});
// An older article that many new ones may cite is re-checked once per 10 s slot, not once per new
// article (the demo load queued 920 re-checks for 330 articles). A request that finds the slot taken
// goes into the next slot (singletonNextSlot), so an article arriving after a re-check started still
// gets one that sees it.
export const recheckOnce = (articleId: string): SendOptions => ({
  singletonKey: `recheck:${articleId}`,
  singletonSeconds: 10,
  singletonNextSlot: true,
});

export const resolveArticle = defineJob({
  name: "graph-resolve-article",
  schema: z.object({
    articleId: z.uuid(),
    /** true when re-run because a newer article arrived: no further fan-out */
    recheck: z.boolean().optional(),
  }),
  preset: RETRY.graph,
  // One at a time (two resolutions at once could each create the same outside work), but fetched
  // in batches: one job per poll measured 1 job/s on the demo corpus, each taking 20–70 ms.
  concurrency: 1,
  batchSize: 20,
  sendOptions: (d) => (d.recheck ? recheckOnce(d.articleId) : { singletonKey: d.articleId }),
});

const practiceData = z.object({ practiceId: z.uuid() });

/** A new practice: match every statement to it, then rebuild its trails. */
export const matchPractice = defineJob({
  name: "graph-match-practice",
  schema: practiceData,
  preset: RETRY.graph,
});

export const buildTrails = defineJob({
  name: "graph-build-trails",
  schema: practiceData,
  preset: RETRY.graph,
  sendOptions: (d) => trailsOnce(d.practiceId),
});

export const refreshSummaries = defineJob({
  name: "graph-refresh-summaries",
  schema: z.object({}),
  preset: RETRY.housekeeping,
  // Also every 15 minutes, as a backstop for a refresh lost to a crash. The schedule sends `{}`:
  // a schedule without data sends null, which the schema refuses (the first job of a fresh start
  // used to fail so).
  cron: { expression: "*/15 * * * *", data: {} },
  sendOptions: () => ({ singletonKey: "all", singletonSeconds: 20, singletonNextSlot: true }),
});

export type ResolveJob = z.infer<typeof resolveArticle.schema>;
export type PracticeJob = z.infer<typeof practiceData>;
