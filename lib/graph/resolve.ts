import { sql } from "kysely";
import type { DB } from "@/db";
import {
  firstAuthorSurname,
  normaliseDoi,
  normaliseTitle,
  normaliseYear,
  resolveReference,
  type ParsedReference,
  type WorkCandidate,
} from "@/lib/resolve";
import { typeWorks } from "./works";

interface WorkRow {
  id: string;
  doi: string | null;
  title: string | null;
  first_author: string | null;
  year: string | null;
  article_id: string | null;
}

const asCandidate = (w: WorkRow): WorkCandidate => ({
  id: w.id,
  doi: w.doi,
  title: w.title,
  firstAuthor: w.first_author,
  year: w.year,
});

/** Works worth scoring against a reference: same DOI, or same first-author surname and year, or same normalised title. */
async function candidatesFor(db: DB, ref: ParsedReference): Promise<WorkRow[]> {
  const doi = normaliseDoi(ref.doi);
  const surname = firstAuthorSurname(ref.authors);
  const year = normaliseYear(ref.year);
  const title = ref.title ? normaliseTitle(ref.title) : null;
  if (!doi && !(surname && year) && !title) return [];
  const r = await sql<WorkRow>`
    select id, doi, title, first_author, year, article_id from works
    where merged_into is null and (
      ${doi ? sql`lower(doi) = ${doi}` : sql`false`}
      or ${surname && year ? sql`(first_author = ${surname} and year = ${String(year)})` : sql`false`}
      or ${title ? sql`normalised_title = ${title}` : sql`false`})
    limit 200`.execute(db);
  return r.rows;
}

function workValues(ref: ParsedReference, kind: "book" | "chapter" | "article" | "other", articleId: string | null) {
  const year = normaliseYear(ref.year);
  return {
    doi: normaliseDoi(ref.doi),
    title: ref.title,
    normalised_title: ref.title ? normaliseTitle(ref.title) : null,
    first_author: firstAuthorSurname(ref.authors),
    year: year === null ? null : String(year),
    kind,
    article_id: articleId,
    merged_into: null,
  };
}

/**
 * Makes sure the article is a work of its own: an outside work that older articles already cite and
 * that matches the article (DOI, else title + first author + year) becomes the article's work, so
 * their trails now run into it. Returns the work id and whether an existing work was taken over.
 */
export async function ensureArticleWork(
  db: DB,
  articleId: string,
): Promise<{ workId: string; adopted: boolean } | null> {
  const a = await db
    .selectFrom("articles")
    .select(["id", "doi", "title", "authors", "year"])
    .where("id", "=", articleId)
    .executeTakeFirst();
  if (!a) return null;
  const own = await db.selectFrom("works").select("id").where("article_id", "=", articleId).executeTakeFirst();
  if (own) return { workId: own.id, adopted: false };
  const asRef: ParsedReference = {
    raw: a.title ?? "",
    authors: Array.isArray(a.authors) ? a.authors : [],
    year: a.year === null ? null : String(a.year),
    title: a.title,
    doi: a.doi,
  };
  const outside = (await candidatesFor(db, asRef)).filter((w) => w.article_id === null);
  const hit = resolveReference(asRef, outside.map(asCandidate));
  if (hit) {
    await db.updateTable("works").set({ article_id: articleId }).where("id", "=", hit.id).execute();
    await typeWorks(db, [hit.id]);
    return { workId: hit.id, adopted: true };
  }
  const w = await db
    .insertInto("works")
    .values(workValues(asRef, "article", articleId))
    .returning("id")
    .executeTakeFirstOrThrow();
  await typeWorks(db, [w.id]);
  return { workId: w.id, adopted: false };
}

/**
 * Resolves an article's references to works: a DOI match first, else title + first author + year
 * scored by lib/resolve with its measured threshold. A reference with no match makes a new work, so
 * later references to the same book land on it. References already resolved to one of our articles
 * are left alone, and so are those a curator placed by a merge or split; those resolved to an outside
 * work are re-scored, so they move to a corpus article that arrived since.
 */
export async function resolveArticleReferences(
  db: DB,
  articleId: string,
): Promise<{ resolved: number; created: number }> {
  const refs = await db
    .selectFrom("references as r")
    .leftJoin("works as w", "w.id", "r.work_id")
    .select([
      "r.id",
      "r.raw",
      "r.authors",
      "r.year",
      "r.title",
      "r.doi",
      "r.container",
      "r.kind",
      "r.work_id",
      "w.article_id as work_article",
    ])
    .where("r.article_id", "=", articleId)
    .where("r.work_set_by", "<>", "curator")
    .orderBy("r.ordinal")
    .execute();
  let resolved = 0;
  let created = 0;
  const touched: string[] = [];
  for (const r of refs) {
    if (r.work_id && r.work_article) continue;
    const ref: ParsedReference = {
      raw: r.raw,
      authors: Array.isArray(r.authors) ? r.authors : [],
      year: r.year,
      title: r.title,
      doi: r.doi,
      container: r.container,
      kind: r.kind,
    };
    const cands = (await candidatesFor(db, ref)).filter((w) => w.article_id !== articleId);
    // Prefer one of our articles: a reference that means a corpus article must lead into the corpus.
    const corpus = cands.filter((w) => w.article_id !== null);
    const hit = resolveReference(ref, corpus.map(asCandidate)) ?? resolveReference(ref, cands.map(asCandidate));
    let workId = hit?.id ?? null;
    if (!workId && r.work_id) continue; // keep the existing outside work
    if (!workId) {
      if (!ref.doi && !ref.title && !firstAuthorSurname(ref.authors)) continue; // nothing to make a work from: stays unresolved
      const w = await db
        .insertInto("works")
        .values(workValues(ref, r.kind, null))
        .returning("id")
        .executeTakeFirstOrThrow();
      workId = w.id;
      created++;
    }
    if (workId !== r.work_id) {
      await db.updateTable("references").set({ work_id: workId }).where("id", "=", r.id).execute();
      touched.push(workId);
    }
    resolved++;
  }
  if (touched.length) await typeWorks(db, touched);
  return { resolved, created };
}

/**
 * Older articles that may cite this one: their references share its DOI or its surname + year block
 * and do not yet lead to a corpus article, or they cite the outside work this article just took
 * over. Their resolution is re-run when this article arrives, and with it their trails.
 */
export async function articlesThatMayCite(db: DB, articleId: string): Promise<string[]> {
  const a = await db
    .selectFrom("articles")
    .select(["doi", "authors", "year"])
    .where("id", "=", articleId)
    .executeTakeFirst();
  if (!a) return [];
  const doi = normaliseDoi(a.doi);
  const surname = firstAuthorSurname(Array.isArray(a.authors) ? a.authors : []);
  const r = await sql<{ article_id: string }>`
    select distinct r.article_id from "references" r left join works w on w.id = r.work_id
    where r.article_id <> ${articleId} and (w.article_id = ${articleId} or w.article_id is null or w.id is null) and (
      w.article_id = ${articleId}
      or ${doi ? sql`lower(r.doi) = ${doi}` : sql`false`}
      or ${surname && a.year ? sql`(r.year like ${String(a.year) + "%"} and r.authors->>0 ilike ${"%" + surname + "%"})` : sql`false`})`.execute(
    db,
  );
  return r.rows.map((x) => x.article_id);
}
