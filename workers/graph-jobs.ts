import type { Job, JobResult } from "pg-boss";
import type { PgBoss } from "pg-boss";
import type { Transaction } from "kysely";
import { z } from "zod";
import { RETRY, type JobDefinition } from "./job-types";
import { getDb, type Database, type DB } from "@/db";
import { bossDb, senderFor } from "@/lib/corpus/queue";
import { articlesThatMayCite, ensureArticleWork, resolveArticleReferences } from "@/lib/graph/resolve";
import { matchArticle, matchPractice } from "@/lib/graph/practices";
import { rebuildPracticeTrails } from "@/lib/graph/trails";
import { refreshSummaries } from "@/lib/graph/summaries";

// Jobs of the citation-graph feature. The chain after mining is:
// resolve an article's references → match its statements to practices → rebuild the trails of the
// practices touched (debounced per practice) → refresh the dashboard views (debounced).
export const GRAPH_QUEUES = {
  resolve: "graph-resolve-article",
  matchPractice: "graph-match-practice",
  trails: "graph-build-trails",
  refresh: "graph-refresh-summaries",
} as const;

const resolveSchema = z.object({ articleId: z.uuid(), recheck: z.boolean().optional() });
const practiceSchema = z.object({ practiceId: z.uuid() });
export type ResolveJob = {
  articleId: string;
  /** true when re-run because a newer article arrived: no further fan-out */ recheck?: boolean;
};
export type PracticeJob = { practiceId: string };

const queueOptions = {
  retryLimit: RETRY.graph.retryLimit,
  retryDelay: RETRY.graph.retryDelay,
  retryBackoff: RETRY.graph.retryBackoff,
  expireInSeconds: RETRY.graph.expireInSeconds,
};

/** What the handlers need; tests pass their own database and a recording sender. */
export interface GraphJobDeps {
  db: () => DB;
  send: (
    name: string,
    data: object,
    options?: { singletonKey?: string; singletonSeconds?: number; singletonNextSlot?: boolean },
  ) => Promise<unknown>;
}

async function ensureQueues(boss: PgBoss): Promise<void> {
  for (const name of Object.values(GRAPH_QUEUES)) {
    if (await boss.getQueue(name)) continue;
    try {
      await boss.createQueue(name, queueOptions);
    } catch (err) {
      if (!(await boss.getQueue(name))) throw err;
    }
  }
}

const defaultDeps: GraphJobDeps = {
  db: getDb,
  send: async (name, data, options) => {
    const boss = await senderFor(getDb());
    await ensureQueues(boss);
    return boss.send(name, data, { ...queueOptions, ...options });
  },
};

// Rebuilding a practice's trails walks its whole graph, so many articles mined together share one
// rebuild: a singleton key per practice with a short window. A request that finds the window taken
// goes into the next one (singletonNextSlot) rather than being dropped: the rebuild already queued or
// running may have started before this article's rows were there.
export const trailsOnce = (practiceId: string, seconds = 20) => ({
  singletonKey: practiceId,
  singletonSeconds: seconds,
  singletonNextSlot: true,
});
const refreshOnce = { singletonKey: "all", singletonSeconds: 20, singletonNextSlot: true };
// An older article that many new ones may cite is re-checked once per 10 s slot, not once per new
// article (the demo load queued 920 re-checks for 330 articles). A request that finds the slot taken
// goes into the next slot (singletonNextSlot), so an article arriving after a re-check started still
// gets one that sees it.
export const recheckOnce = (articleId: string) => ({
  singletonKey: `recheck:${articleId}`,
  singletonSeconds: 10,
  singletonNextSlot: true,
});

export async function handleResolve(deps: GraphJobDeps, data: ResolveJob): Promise<void> {
  const db = deps.db();
  const own = await ensureArticleWork(db, data.articleId);
  if (!own) return; // the article was deleted after the job was queued
  await resolveArticleReferences(db, data.articleId);
  const practices = new Set(await matchArticle(db, data.articleId));
  if (!data.recheck) {
    for (const older of await articlesThatMayCite(db, data.articleId)) {
      await deps.send(
        GRAPH_QUEUES.resolve,
        { articleId: older, recheck: true } satisfies ResolveJob,
        recheckOnce(older),
      );
    }
  }
  // An older article's outside work that became this article changes trails of any practice.
  const all = own.adopted ? await db.selectFrom("practices").select("id").execute() : [];
  for (const p of all) practices.add(p.id);
  if (data.recheck)
    for (const p of await db
      .selectFrom("statement_practices")
      .innerJoin("statements", "statements.id", "statement_practices.statement_id")
      .select("practice_id")
      .where("statements.article_id", "=", data.articleId)
      .distinct()
      .execute())
      practices.add(p.practice_id);
  for (const practiceId of practices)
    await deps.send(GRAPH_QUEUES.trails, { practiceId } satisfies PracticeJob, trailsOnce(practiceId));
  if (practices.size === 0) await deps.send(GRAPH_QUEUES.refresh, {}, refreshOnce);
}

export function createGraphJobs(deps: GraphJobDeps = defaultDeps): JobDefinition[] {
  // Job data is a boundary (anything may sit in the queue table): checked before use.
  // Each job of a batch succeeds or fails (and is retried) on its own.
  const each =
    <T extends object>(name: string, schema: z.ZodType<T>, fn: (data: T) => Promise<void>) =>
    async (jobs: Job<object>[]): Promise<JobResult[]> => {
      const out: JobResult[] = [];
      for (const job of jobs) {
        try {
          await fn(schema.parse(job.data));
          out.push({ id: job.id, status: "completed" });
        } catch (err) {
          const message = err instanceof Error ? err.message : String(err);
          console.error(`[worker] ${name} job ${job.id} failed: ${message}`);
          out.push({ id: job.id, status: "failed", output: { message } });
        }
      }
      return out;
    };
  return [
    // One at a time (two resolutions at once could each create the same outside work), but fetched
    // in batches: one job per poll measured 1 job/s on the demo corpus, each taking 20–70 ms.
    {
      name: GRAPH_QUEUES.resolve,
      preset: RETRY.graph,
      concurrency: 1,
      batchSize: 20,
      handler: each(GRAPH_QUEUES.resolve, resolveSchema, (d) => handleResolve(deps, d)),
    },
    {
      name: GRAPH_QUEUES.matchPractice,
      preset: RETRY.graph,
      handler: each(GRAPH_QUEUES.matchPractice, practiceSchema, async (d) => {
        await matchPractice(deps.db(), d.practiceId);
        await deps.send(GRAPH_QUEUES.trails, d, trailsOnce(d.practiceId));
      }),
    },
    {
      name: GRAPH_QUEUES.trails,
      preset: RETRY.graph,
      handler: each(GRAPH_QUEUES.trails, practiceSchema, async (d) => {
        await deps
          .db()
          .transaction()
          .execute((trx) => rebuildPracticeTrails(trx, d.practiceId));
        await deps.send(GRAPH_QUEUES.refresh, {}, refreshOnce);
      }),
    },
    // Also every 15 minutes, as a backstop for a refresh lost to a crash.
    {
      name: GRAPH_QUEUES.refresh,
      preset: RETRY.housekeeping,
      cron: "*/15 * * * *",
      handler: each(GRAPH_QUEUES.refresh, z.object({}), () => refreshSummaries(deps.db())),
    },
  ];
}

export const graphJobs: JobDefinition[] = createGraphJobs();

/**
 * Called by the mining job inside the transaction that stores an article's rows, so follow-up graph
 * work is enqueued atomically with them (pg-boss `send(..., { db })` on the same transaction).
 */
export async function onArticleMined(boss: PgBoss, trx: Transaction<Database>, articleId: string): Promise<void> {
  await ensureQueues(boss);
  await boss.send(GRAPH_QUEUES.resolve, { articleId } satisfies ResolveJob, {
    ...queueOptions,
    singletonKey: articleId,
    db: bossDb(trx),
  });
}

/** For route handlers: enqueue work on the app's own sender. */
export const enqueueGraph = (name: string, data: object, options?: Parameters<GraphJobDeps["send"]>[2]) =>
  defaultDeps.send(name, data, options);
