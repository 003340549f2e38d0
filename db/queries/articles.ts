import { sql } from "kysely";
import type { DB } from "@/db";
import type { ArticleMetadataInput } from "@/lib/corpus/schemas";
import type { ReviewVerdict } from "@/lib/vocabulary";
import { normaliseDoi } from "@/lib/corpus/doi";

// Articles, their statements' reviews and upload batches, as the route handlers and pages need them.

/** The curator's metadata correction (wins over the document and metadata files). False: no such article. */
export async function updateArticleMetadata(db: DB, id: string, m: ArticleMetadataInput): Promise<boolean> {
  const r = await db
    .updateTable("articles")
    .set({
      title: m.title,
      authors: JSON.stringify(m.authors),
      venue_id: m.venueId,
      year: m.year,
      doi: normaliseDoi(m.doi),
      licence: m.licence,
      updated_at: sql`now()`,
    })
    .where("id", "=", id)
    .executeTakeFirst();
  return Number(r.numUpdatedRows) > 0;
}

/** Locks the article's row for the rest of the caller's transaction (re-mining); null when missing. */
export async function lockArticle(trx: DB, id: string) {
  return trx.selectFrom("articles").select("id").where("id", "=", id).forUpdate().executeTakeFirst();
}

export async function articleStatus(db: DB, id: string) {
  return db.selectFrom("articles").select(["status", "original_filename"]).where("id", "=", id).executeTakeFirst();
}

/** The corpus at a glance (home page). */
export async function corpusCounts(db: DB) {
  const [a, s] = await Promise.all([
    db
      .selectFrom("articles")
      .select([
        sql<number>`count(*)`.as("articles"),
        sql<number>`count(*) filter (where status = 'done')`.as("done"),
        sql<number>`count(*) filter (where status = 'failed')`.as("failed"),
        sql<number>`count(*) filter (where status not in ('done','failed'))`.as("pending"),
      ])
      .executeTakeFirstOrThrow(),
    db
      .selectFrom("statements")
      .select(sql<number>`count(*)`.as("n"))
      .executeTakeFirstOrThrow(),
  ]);
  return { ...a, statements: s.n };
}

/**
 * A curator's verdict on one statement of one article. It hangs on (article, fingerprint), so it
 * survives re-mining. False when the statement is not one of that article's.
 */
export async function reviewStatement(
  db: DB,
  r: { articleId: string; statementId: string; reviewerId: string; verdict: ReviewVerdict; note: string | null },
): Promise<boolean> {
  const s = await db
    .selectFrom("statements")
    .select(["article_id", "fingerprint"])
    .where("id", "=", r.statementId)
    .where("article_id", "=", r.articleId)
    .executeTakeFirst();
  if (!s) return false;
  await db
    .insertInto("statement_reviews")
    .values({
      article_id: s.article_id,
      fingerprint: s.fingerprint,
      reviewer_id: r.reviewerId,
      verdict: r.verdict,
      note: r.note,
    })
    .onConflict((oc) =>
      oc
        .columns(["article_id", "fingerprint", "reviewer_id"])
        .doUpdateSet({ verdict: r.verdict, note: r.note, updated_at: sql`now()` }),
    )
    .execute();
  return true;
}

export async function batchExists(db: DB, id: string): Promise<boolean> {
  return !!(await db.selectFrom("upload_batches").select("id").where("id", "=", id).executeTakeFirst());
}

/**
 * A batch's files and their status. Duplicates belong to the batch that first brought them, so the
 * upload page also asks for those by id (`alsoIds`).
 */
export async function batchFiles(db: DB, batchId: string, alsoIds: readonly string[] = []) {
  return db
    .selectFrom("articles")
    .select(["id", "original_filename", "status", "failure_code", "failure_message", "title", "upload_batch_id"])
    .where((eb) =>
      alsoIds.length
        ? eb.or([eb("upload_batch_id", "=", batchId), eb("id", "in", [...alsoIds])])
        : eb("upload_batch_id", "=", batchId),
    )
    .orderBy("created_at")
    .execute();
}
