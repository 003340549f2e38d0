import { sql, type Transaction } from "kysely";
import { inTransaction, type DB, type Database } from "@/db";
import type { WorkType } from "@/lib/vocabulary";
import { HttpError } from "@/lib/server/errors";
import { firstAuthorSurname, normaliseTitle, normaliseYear } from "@/lib/resolve";

type Handle = DB | Transaction<Database>;

/**
 * Types works that nobody (no curator) has typed yet: a work that is one of our articles takes its
 * venue's methods flag; an outside work cited as a book is a methods source (methods books are how
 * fields pass cut-offs on); everything else stays unknown so an unread article is never counted as
 * empirical precedent by default.
 */
export async function typeWorks(db: Handle, workIds?: readonly string[]): Promise<void> {
  const only = workIds ? sql`and w.id = any(${workIds as string[]}::uuid[])` : sql``;
  await sql`
    update works w set
      work_type = case when v.is_methods_venue then 'methods_source' else 'empirical' end,
      type_decided_by = 'venue'
    from articles a left join venues v on v.id = a.venue_id
    where a.id = w.article_id and w.type_decided_by <> 'curator' ${only}`.execute(db);
  await sql`
    update works w set work_type = 'methods_source', type_decided_by = 'reference_kind'
    where w.article_id is null and w.kind = 'book' and w.type_decided_by in ('default','reference_kind') ${only}`.execute(
    db,
  );
}

export async function setWorkType(db: Handle, workId: string, type: WorkType): Promise<void> {
  const r = await db
    .updateTable("works")
    .set({ work_type: type, type_decided_by: "curator" })
    .where("id", "=", workId)
    .where("merged_into", "is", null)
    .executeTakeFirst();
  if (Number(r.numUpdatedRows) === 0) throw new HttpError(404, "not_found", "That work was not found.");
}

/**
 * Merges `fromId` into `intoId`: its references (marked as placed by a curator), corpus article and
 * source checks move to the kept work, and the merged work points at it so old links still land.
 * The caller rebuilds every practice's trails (a merge can join two chains anywhere).
 */
export async function mergeWorks(db: Handle, fromId: string, intoId: string): Promise<void> {
  if (fromId === intoId) throw new HttpError(400, "invalid", "Pick two different works to merge.", "intoId");
  await inTransaction(db, async (trx) => {
    const both = await trx
      .selectFrom("works")
      .selectAll()
      .where("id", "in", [fromId, intoId])
      .where("merged_into", "is", null)
      .forUpdate()
      .execute();
    const from = both.find((w) => w.id === fromId);
    const into = both.find((w) => w.id === intoId);
    if (!from || !into)
      throw new HttpError(404, "not_found", "One of the two works was not found (or is already merged).");
    if (from.article_id && into.article_id) {
      throw new HttpError(
        409,
        "conflict",
        "Both works are articles of the corpus; two articles cannot be one work. Fix the article metadata instead.",
        "intoId",
      );
    }
    await trx
      .updateTable("references")
      .set({ work_id: intoId, work_set_by: "curator" })
      .where("work_id", "=", fromId)
      .execute();
    // The DOI index is unique among unmerged works: free it before the kept work takes it.
    await trx
      .updateTable("works")
      .set({ merged_into: intoId, article_id: null, doi: null })
      .where("id", "=", fromId)
      .execute();
    await trx
      .updateTable("works")
      .set({
        article_id: into.article_id ?? from.article_id,
        doi: into.doi ?? from.doi,
        title: into.title ?? from.title,
      })
      .where("id", "=", intoId)
      .execute();
    await sql`update source_checks set work_id = ${intoId} where work_id = ${fromId}
      and practice_id not in (select practice_id from source_checks where work_id = ${intoId})`.execute(trx);
    await trx.deleteFrom("source_checks").where("work_id", "=", fromId).execute();
    await typeWorks(trx, [intoId]);
  });
}

/**
 * Splits a wrong match: the given references leave the work for a new work made from the first of
 * them (its title, first author and year, so later references to the same thing can find it).
 * Returns the new work's id. The moved references are marked as placed by a curator, so
 * re-resolution does not score them back onto the work they were split from.
 */
export async function splitWork(db: Handle, workId: string, referenceIds: readonly string[]): Promise<string> {
  if (referenceIds.length === 0)
    throw new HttpError(400, "invalid", "Choose at least one reference to split off.", "referenceIds");
  return inTransaction(db, async (trx) => {
    const refs = await trx
      .selectFrom("references")
      .selectAll()
      .where("work_id", "=", workId)
      .where("id", "in", [...referenceIds])
      .execute();
    if (refs.length !== referenceIds.length)
      throw new HttpError(400, "invalid", "Some of those references do not belong to this work.", "referenceIds");
    // An outside work is nothing but its references; one of our articles stays a work without them.
    const work = await trx.selectFrom("works").select("article_id").where("id", "=", workId).executeTakeFirstOrThrow();
    const left = await trx
      .selectFrom("references")
      .select(sql<number>`count(*)`.as("n"))
      .where("work_id", "=", workId)
      .where("id", "not in", [...referenceIds])
      .executeTakeFirstOrThrow();
    if (Number(left.n) === 0 && !work.article_id)
      throw new HttpError(400, "invalid", "Leave at least one reference on the original work.", "referenceIds");
    const first = refs[0];
    const w = await trx
      .insertInto("works")
      .values({
        doi: null,
        title: first.title,
        normalised_title: first.title ? normaliseTitle(first.title) : null,
        first_author: firstAuthorSurname(Array.isArray(first.authors) ? first.authors : []),
        year: normaliseYear(first.year)?.toString() ?? null,
        kind: first.kind,
        article_id: null,
        merged_into: null,
      })
      .returning("id")
      .executeTakeFirstOrThrow();
    await trx
      .updateTable("references")
      .set({ work_id: w.id, work_set_by: "curator" })
      .where("id", "in", [...referenceIds])
      .execute();
    await typeWorks(trx, [w.id]);
    return w.id;
  });
}
