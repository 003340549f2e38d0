/**
 * Handlers of the citation-graph jobs (lib/jobs/graph.ts). They take their database and their
 * sender as dependencies: the worker passes its own, tests pass theirs and record what is sent.
 */
import type { z } from "zod";
import type { DB } from "@/db";
import type { Job, SendOptions } from "@/lib/jobs/define";
import {
  buildTrails,
  matchPractice,
  refreshSummaries,
  resolveArticle,
  type PracticeJob,
  type ResolveJob,
} from "@/lib/jobs/graph";
import { articlesThatMayCite, ensureArticleWork, resolveArticleReferences } from "@/lib/graph/resolve";
import { matchArticle, matchPractice as matchStatementsToPractice } from "@/lib/graph/practices";
import { rebuildPracticeTrails } from "@/lib/graph/trails";
import { refreshSummaries as refreshViews } from "@/lib/graph/summaries";
import { eachJob, type Registered } from "./handler";

export interface GraphJobDeps {
  db: DB;
  /** Sends a follow-up job; by default `job.send(db, data, options)`. */
  send?: <S extends z.ZodType>(job: Job<S>, data: z.input<S>, options?: SendOptions) => Promise<unknown>;
  log?: Pick<Console, "error">;
}

const sender = (deps: GraphJobDeps): NonNullable<GraphJobDeps["send"]> =>
  deps.send ?? ((job, data, options) => job.send(deps.db, data, options));

export async function handleResolve(deps: GraphJobDeps, data: ResolveJob): Promise<void> {
  const { db } = deps;
  const send = sender(deps);
  const own = await ensureArticleWork(db, data.articleId);
  if (!own) return; // the article was deleted after the job was queued
  await resolveArticleReferences(db, data.articleId);
  const practices = new Set(await matchArticle(db, data.articleId));
  if (!data.recheck) {
    for (const older of await articlesThatMayCite(db, data.articleId))
      await send(resolveArticle, { articleId: older, recheck: true });
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
  for (const practiceId of practices) await send(buildTrails, { practiceId } satisfies PracticeJob);
  if (practices.size === 0) await send(refreshSummaries, {});
}

export function createGraphHandlers(deps: GraphJobDeps): Registered[] {
  const send = sender(deps);
  return [
    eachJob(resolveArticle, (d) => handleResolve(deps, d), deps.log),
    eachJob(
      matchPractice,
      async (d) => {
        await matchStatementsToPractice(deps.db, d.practiceId);
        await send(buildTrails, d);
      },
      deps.log,
    ),
    eachJob(
      buildTrails,
      async (d) => {
        await deps.db.transaction().execute((trx) => rebuildPracticeTrails(trx, d.practiceId));
        await send(refreshSummaries, {});
      },
      deps.log,
    ),
    eachJob(refreshSummaries, () => refreshViews(deps.db), deps.log),
  ];
}
