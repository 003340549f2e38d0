/**
 * Reading and correcting articles. Dashboard eligibility: an article enters the dashboards only when
 * `articles.status = 'done' and articles.licence is not null` (see `dashboardEligible`).
 */
import { sql } from "kysely";
import { z } from "zod";
import type { DB } from "@/db";
import type { ArticleStatus } from "@/lib/vocabulary";

export const ARTICLE_STATUSES: ArticleStatus[] = ["uploaded", "queued", "reading", "mining", "done", "failed"];
export const UNFINISHED: ArticleStatus[] = ["uploaded", "queued", "reading", "mining"];

/** SQL condition the dashboards filter on: mined, and the licence (which must allow text mining) recorded. */
export const dashboardEligible = sql<boolean>`(articles.status = 'done' and articles.licence is not null)`;

export const ArticleFilters = z.object({
  status: z
    .enum(["uploaded", "queued", "reading", "mining", "done", "failed"])
    .optional()
    .or(z.literal("").transform(() => undefined)),
  venue: z
    .string()
    .uuid()
    .optional()
    .or(z.literal("").transform(() => undefined)),
  year: z.coerce
    .number()
    .int()
    .min(1800)
    .max(2100)
    .optional()
    .or(z.literal("").transform(() => undefined)),
  q: z.string().trim().max(200).optional(),
  page: z.coerce.number().int().min(1).max(10_000).default(1),
});
export type ArticleFilters = z.infer<typeof ArticleFilters>;
const PAGE = 50;

export async function listArticles(db: DB, f: ArticleFilters) {
  let q = db
    .selectFrom("articles")
    .leftJoin("venues", "venues.id", "articles.venue_id")
    .select([
      "articles.id",
      "articles.title",
      "articles.original_filename",
      "articles.year",
      "articles.status",
      "articles.failure_message",
      "articles.licence",
      "articles.pages",
      "articles.is_demo",
      "venues.name as venue",
      (eb) =>
        eb
          .selectFrom("statements")
          .select(sql<number>`count(*)`.as("n"))
          .whereRef("statements.article_id", "=", "articles.id")
          .as("statements"),
    ]);
  if (f.status) q = q.where("articles.status", "=", f.status);
  if (f.venue) q = q.where("articles.venue_id", "=", f.venue);
  if (f.year) q = q.where("articles.year", "=", f.year);
  if (f.q)
    q = q.where((eb) =>
      eb.or([
        eb("articles.title", "ilike", `%${escapeLike(f.q!)}%`),
        eb("articles.original_filename", "ilike", `%${escapeLike(f.q!)}%`),
      ]),
    );
  const rows = await q
    .orderBy("articles.created_at", "desc")
    .orderBy("articles.id")
    .limit(PAGE + 1)
    .offset((f.page - 1) * PAGE)
    .execute();
  return {
    articles: rows.slice(0, PAGE).map((r) => ({ ...r, statements: Number(r.statements) })),
    hasMore: rows.length > PAGE,
    page: f.page,
  };
}

const escapeLike = (s: string) => s.replace(/[\\%_]/g, (c) => `\\${c}`);

export async function getArticle(db: DB, id: string) {
  const article = await db
    .selectFrom("articles")
    .leftJoin("venues", "venues.id", "articles.venue_id")
    .selectAll("articles")
    .select(["venues.name as venue"])
    .where("articles.id", "=", id)
    .executeTakeFirst();
  if (!article) return null;
  const statements = await db
    .selectFrom("statements")
    .selectAll()
    .where("article_id", "=", id)
    .orderBy("ordinal")
    .execute();
  const links = await db
    .selectFrom("statement_citations")
    .innerJoin("citations", "citations.id", "statement_citations.citation_id")
    .innerJoin("statements", "statements.id", "statement_citations.statement_id")
    .select([
      "statement_citations.statement_id",
      "citations.authors",
      "citations.year",
      "citations.locator",
      "citations.secondary",
    ])
    .where("statements.article_id", "=", id)
    .orderBy("citations.ordinal")
    .execute();
  const reviews = await db
    .selectFrom("statement_reviews")
    .select(["fingerprint", "verdict", "reviewer_id"])
    .where("article_id", "=", id)
    .execute();
  const events = await db
    .selectFrom("job_events")
    .select(["state", "message", "at"])
    .where("article_id", "=", id)
    .orderBy("id", "desc")
    .limit(20)
    .execute();
  const counts = {
    citations: Number(
      (
        await db
          .selectFrom("citations")
          .select(sql<number>`count(*)`.as("n"))
          .where("article_id", "=", id)
          .executeTakeFirstOrThrow()
      ).n,
    ),
    references: Number(
      (
        await db
          .selectFrom("references")
          .select(sql<number>`count(*)`.as("n"))
          .where("article_id", "=", id)
          .executeTakeFirstOrThrow()
      ).n,
    ),
  };
  return {
    article,
    statements: statements.map((s) => ({
      ...s,
      citations: links.filter((l) => l.statement_id === s.id).map(({ statement_id: _s, ...c }) => c),
      reviews: reviews.filter((r) => r.fingerprint === s.fingerprint),
    })),
    events,
    counts,
  };
}

export { ArticleMetadataInput, ReviewInput } from "./schemas";
