/**
 * The mining job: read one article's stored file, run the miner, store what the contract schema
 * accepted in one transaction. Bad input is a finished job with a `failed` article and its reason;
 * only trouble on our side (database, storage) is retried, and the last try marks the article failed.
 */
import { sql, type Transaction } from "kysely";
import type { Job, JobResult, JobWithMetadata, PgBoss } from "pg-boss";
import { z } from "zod";
import { env } from "@/lib/env";
import type { Database, DB } from "@/db";
import type { FileStorage } from "@/lib/storage";
import { SuccessLine, ErrorLine } from "@/lib/mining/contract";
import type { ProcedurePattern } from "@/lib/mining/procedures";
import { mineArticle, type MiningJobData } from "@/lib/jobs/mining";
import { resolveArticle } from "@/lib/jobs/graph";
import { miningPreset, type RetryPreset } from "@/lib/jobs/presets";
import type { ArticleStatus } from "@/db/schema/corpus";
import { recordEvent } from "@/lib/corpus/events";
import { replaceMinedRows } from "@/lib/corpus/store-mined";
import { enabledProcedures } from "@/lib/corpus/procedures-store";
import { documentMetaUpdate } from "@/lib/metadata/document";
import { applyBatchMetadataByDoi } from "@/lib/corpus/batches";

/**
 * What the worker needs of the extractor (lib/mining's createMiner and createIsolatedMiner return
 * this). mine() may take the input buffer over (the isolated miner transfers it to its thread), so
 * the caller must not use `data` afterwards.
 */
export type MinerLike = {
  mine(input: {
    data: Uint8Array;
    filename: string;
  }): Promise<{ line: unknown; timings?: { readMs: number; mineMs: number }; meta?: unknown }>;
  close(): Promise<void> | void;
};
export type MinerFactory = (opts: { procedures: ProcedurePattern[] }) => MinerLike;

export type MiningDeps = {
  db: DB;
  storage: FileStorage;
  boss: PgBoss;
  createMiner: MinerFactory;
  /** Called after the rows are written and before commit; tests inject a failure here. */
  beforeCommit?: (trx: Transaction<Database>, articleId: string) => Promise<void>;
  log?: Pick<Console, "info" | "error" | "warn">;
  /** Retry preset of the mining queue; default miningPreset(). Must match the queue's settings. */
  retry?: RetryPreset;
  /** Test hook: runs after the article is marked `reading`, before the file is read. */
  afterReading?: (articleId: string) => Promise<void>;
  /** Timings per mined article, for the benchmark. */
  onMined?: (t: { articleId: string; pages: number; readMs: number; mineMs: number; storeMs: number }) => void;
};

export type MiningJob = {
  name: string;
  preset: RetryPreset;
  concurrency: number;
  /** A batch of mining jobs (work with `perJobResults`): each article is settled on its own. */
  handler(jobs: Job<MiningJobData>[]): Promise<JobResult[]>;
  /** Mines one article; resolves when it is done or failed, rejects only for a retryable error. */
  run(articleId: string, retryCount?: number): Promise<"done" | "failed" | "missing">;
  /**
   * Handler of the dead-letter queue (work with `includeMetadata`): a job whose tries all stopped
   * without an outcome (worker crashed, claim expired) marks its article failed. Throws to retry.
   */
  handleStopped(jobs: JobWithMetadata<MiningJobData>[]): Promise<void>;
  close(): Promise<void>;
};

class Retryable extends Error {}

export function createMiningJob(deps: MiningDeps): MiningJob {
  const log = deps.log ?? console;
  const { db } = deps;
  const retry = deps.retry ?? miningPreset();
  // One warm miner per process, rebuilt only when curators change the enabled procedure list. A
  // replaced miner is closed once no job of this process still uses it: closing it under a job
  // that is about to mine would fail that article with "the miner was closed".
  type Held = { key: string; miner: MinerLike; users: number; retired: boolean };
  let miner: Held | null = null;
  const retire = async (h: Held) => {
    h.retired = true;
    if (h.users === 0) await h.miner.close();
  };
  async function acquireMiner(): Promise<Held> {
    const procedures = await enabledProcedures(db);
    const key = JSON.stringify(procedures);
    if (!miner || miner.key !== key) {
      const old = miner;
      miner = { key, miner: deps.createMiner({ procedures }), users: 0, retired: false };
      if (old)
        void retire(old).catch((err) =>
          log.error("[mining] closing the replaced miner failed:", (err as Error).message),
        );
    }
    miner.users++;
    return miner;
  }
  async function releaseMiner(h: Held) {
    h.users--;
    if (h.retired && h.users === 0) await h.miner.close();
  }

  async function setStatus(articleId: string, status: "reading" | "mining" | "queued", message: string | null = null) {
    await db.transaction().execute(async (trx) => {
      await trx
        .updateTable("articles")
        .set({ status, updated_at: sql`now()` })
        .where("id", "=", articleId)
        .execute();
      await recordEvent(trx, articleId, status === "queued" ? "retry" : status, message);
    });
  }

  /** Marks the article failed; with `onlyIf`, only while its status is one of those (returns whether it did). */
  async function fail(articleId: string, code: string, message: string, onlyIf?: ArticleStatus[]): Promise<boolean> {
    // A failed article has no mined rows: a re-mine that fails must not leave the old run behind.
    return db.transaction().execute(async (trx) => {
      if (onlyIf) {
        const a = await trx
          .selectFrom("articles")
          .select("status")
          .where("id", "=", articleId)
          .forUpdate()
          .executeTakeFirst();
        if (!a || !onlyIf.includes(a.status)) return false;
      }
      await trx.deleteFrom("statements").where("article_id", "=", articleId).execute();
      await trx.deleteFrom("citations").where("article_id", "=", articleId).execute();
      await trx.deleteFrom("references").where("article_id", "=", articleId).execute();
      await trx
        .updateTable("articles")
        .set({ status: "failed", failure_code: code, failure_message: message, updated_at: sql`now()` })
        .where("id", "=", articleId)
        .execute();
      await recordEvent(trx, articleId, "failed", `${code}: ${message}`);
      return true;
    });
  }

  async function run(articleId: string): Promise<"done" | "failed" | "missing"> {
    const article = await db
      .selectFrom("articles")
      .innerJoin("stored_files", "stored_files.sha256", "articles.file_sha256")
      .select(["articles.id", "articles.original_filename", "stored_files.storage_key"])
      .where("articles.id", "=", articleId)
      .executeTakeFirst();
    if (!article) return "missing";
    await setStatus(articleId, "reading");
    if (deps.afterReading) await deps.afterReading(articleId);
    let data: Uint8Array;
    try {
      data = await deps.storage.get(article.storage_key);
    } catch (err) {
      throw new Retryable(`The stored file could not be read: ${(err as Error).message}`);
    }
    const held = await acquireMiner();
    let result: Awaited<ReturnType<MinerLike["mine"]>>;
    try {
      result = await held.miner.mine({ data, filename: article.original_filename });
    } catch (err) {
      // The miner is meant to turn every bad input into an error line; if it throws instead, the
      // same bytes would throw again, so retrying is pointless.
      log.error(`[mining] miner threw on article ${articleId}:`, err);
      await fail(
        articleId,
        "internal",
        `The miner stopped on this file (${(err as Error).message ?? "unknown error"}). The error was logged.`,
      );
      return "failed";
    } finally {
      await releaseMiner(held);
    }
    const asError = ErrorLine.safeParse(result.line);
    if (asError.success) {
      await fail(articleId, asError.data.error.code, asError.data.error.message);
      return "failed";
    }
    const parsed = SuccessLine.safeParse(result.line);
    if (!parsed.success) {
      const issue = parsed.error.issues[0];
      log.error(`[mining] contract violation on article ${articleId}:`, issue);
      await fail(
        articleId,
        "internal",
        `The miner's output did not match the mining contract (${issue?.path.join(".")}: ${issue?.message}).`,
      );
      return "failed";
    }
    const line = parsed.data;
    await setStatus(articleId, "mining");
    const t0 = performance.now();
    await db.transaction().execute(async (trx) => {
      // Serialises two workers that got two jobs for the same article (a re-mine during a mine).
      const locked = await trx
        .selectFrom("articles")
        .select(["id", "title", "authors", "year", "doi", "licence", "venue_id"])
        .where("id", "=", articleId)
        .forUpdate()
        .executeTakeFirst();
      if (!locked) return;
      await replaceMinedRows(trx, articleId, line);
      // A metadata file's entry (matched by the document's DOI) wins over the document's own claims.
      const docDoi = (result.meta as { doi?: string | null } | undefined)?.doi ?? null;
      await applyBatchMetadataByDoi(trx, articleId, locked.doi ?? docDoi);
      const current = await trx
        .selectFrom("articles")
        .select(["title", "authors", "year", "doi", "licence", "venue_id"])
        .where("id", "=", articleId)
        .executeTakeFirstOrThrow();
      const metaUpdate = await documentMetaUpdate(trx, current, result.meta);
      await trx
        .updateTable("articles")
        .set({
          ...metaUpdate,
          status: "done",
          pages: line.pages,
          failure_code: null,
          failure_message: null,
          mined_at: sql`now()`,
          miner_version: env().ECHOLINE_MINER_VERSION,
          updated_at: sql`now()`,
        })
        .where("id", "=", articleId)
        .execute();
      await recordEvent(
        trx,
        articleId,
        "done",
        `${line.statements.length} statements, ${line.citations.length} citations, ${line.references.length} references from ${line.pages} pages.`,
      );
      // Follow-up graph work commits with the mined rows, or not at all.
      await resolveArticle.send(trx, { articleId });
      if (deps.beforeCommit) await deps.beforeCommit(trx, articleId);
    });
    deps.onMined?.({
      articleId,
      pages: line.pages,
      readMs: result.timings?.readMs ?? 0,
      mineMs: result.timings?.mineMs ?? 0,
      storeMs: performance.now() - t0,
    });
    return "done";
  }

  const limit = retry.retryLimit;
  const JobData = z.object({ articleId: z.string().uuid() });
  async function handleOne(job: Job<MiningJobData>) {
    const parsed = JobData.safeParse(job.data);
    if (!parsed.success) {
      log.error(`[mining] job ${job.id} has no valid articleId; dropped.`);
      return;
    }
    const { articleId } = parsed.data;
    if (job.retryCount > 0) {
      // Still `reading`/`mining` from the previous try: that try never came back (worker crashed,
      // or its claim expired). Say so in the article's history before trying again.
      const a = await db.selectFrom("articles").select("status").where("id", "=", articleId).executeTakeFirst();
      if (a && (a.status === "reading" || a.status === "mining")) {
        await recordEvent(
          db,
          articleId,
          "retry",
          `Try ${job.retryCount} of ${limit + 1} stopped without finishing (worker crashed or timed out); trying again.`,
        );
      }
    }
    try {
      const r = await run(articleId);
      if (r === "missing") log.warn(`[mining] article ${articleId} no longer exists; job ${job.id} dropped.`);
    } catch (err) {
      const message = (err as Error).message ?? String(err);
      log.error(`[mining] article ${articleId}, try ${job.retryCount + 1} of ${limit + 1}:`, message);
      try {
        if (job.retryCount >= limit) {
          await fail(articleId, "internal", `Mining failed after ${limit + 1} tries: ${message}`);
          return;
        }
        await setStatus(articleId, "queued", `Try ${job.retryCount + 1} failed (${message}); retrying.`);
      } catch (inner) {
        log.error(`[mining] could not record the failure of ${articleId}:`, (inner as Error).message);
      }
      throw err;
    }
  }

  async function handleEach(jobs: Job<MiningJobData>[]): Promise<JobResult[]> {
    const out: JobResult[] = [];
    for (const job of jobs) {
      try {
        await handleOne(job);
        out.push({ id: job.id, status: "completed" });
      } catch {
        out.push({ id: job.id, status: "failed" });
      }
    }
    return out;
  }

  return {
    name: mineArticle.name,
    preset: retry,
    concurrency: mineArticle.concurrencyNow(),
    // pg-boss hands a batch (work with `perJobResults`); each article is settled on its own, so one
    // retry never re-mines the others.
    handler: handleEach,
    handleStopped: async (jobs) => {
      for (const job of jobs) {
        const parsed = JobData.safeParse(job.data);
        if (!parsed.success) {
          log.error(`[mining] stopped job ${job.id} has no valid articleId; dropped.`);
          continue;
        }
        const { articleId } = parsed.data;
        // A re-mine sent since then owns the article now; its own outcome will be recorded.
        const newer = (await deps.boss.findJobs<MiningJobData>(mineArticle.name, { key: articleId })).filter(
          (j) => j.id !== job.sourceId && (j.state === "created" || j.state === "retry" || j.state === "active"),
        );
        if (newer.length) continue;
        const tries = (job.sourceRetryCount ?? limit) + 1;
        // Only an article still in progress: one the handler already failed (a retryable error on
        // the last try lands here too) keeps the reason it was given.
        const marked = await fail(
          articleId,
          "stopped",
          `Mining stopped ${tries} ${tries === 1 ? "time" : "times"} without finishing (worker crashed or timed out).`,
          ["queued", "reading", "mining"],
        );
        if (marked) log.warn(`[mining] article ${articleId}: ${tries} tries stopped without finishing; marked failed.`);
      }
    },
    run: async (articleId) => run(articleId),
    close: async () => {
      const h = miner;
      miner = null;
      if (h) await retire(h);
    },
  };
}
