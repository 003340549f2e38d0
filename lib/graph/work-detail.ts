import { sql } from "kysely";
import type { DB } from "@/db";

/** A work's page: the work, who cites it (and with which locator), and its source checks. */
export async function workDetail(db: DB, workId: string) {
  let work = await db.selectFrom("works").selectAll().where("id", "=", workId).executeTakeFirst();
  // A merged work's old links land on the work it was merged into.
  if (work?.merged_into)
    work = await db.selectFrom("works").selectAll().where("id", "=", work.merged_into).executeTakeFirst();
  if (!work) return null;
  const [refs, checks, article] = await Promise.all([
    sql<{
      id: string;
      raw: string;
      article_id: string;
      article_title: string | null;
      year: number | null;
      citations: number;
      with_locator: number;
      work_set_by: string;
    }>`
      select r.id, r.raw, r.article_id, a.title as article_title, a.year, r.work_set_by,
        count(c.id)::int as citations, (count(c.id) filter (where c.locator is not null))::int as with_locator
      from "references" r join articles a on a.id = r.article_id left join citations c on c.reference_id = r.id
      where r.work_id = ${work.id} group by r.id, a.id order by a.year desc nulls last, r.id limit 500`.execute(db),
    db
      .selectFrom("source_checks as s")
      .innerJoin("practices as p", "p.id", "s.practice_id")
      .select([
        "s.id",
        "s.practice_id",
        "p.label as practice_label",
        "s.verdict",
        "s.page",
        "s.quote",
        "s.stated_value",
        "s.checked_at",
      ])
      .where("s.work_id", "=", work.id)
      .orderBy("p.label")
      .execute(),
    work.article_id
      ? db.selectFrom("articles").select(["id", "title", "year"]).where("id", "=", work.article_id).executeTakeFirst()
      : undefined,
  ]);
  return { work, references: refs.rows, checks, article: article ?? null };
}

export async function listWorks(db: DB, opts: { q?: string; limit?: number } = {}) {
  const q = opts.q?.trim();
  return sql<{
    id: string;
    title: string | null;
    first_author: string | null;
    year: string | null;
    work_type: string;
    in_corpus: boolean;
    references: number;
  }>`
    select w.id, w.title, w.first_author, w.year, w.work_type, (w.article_id is not null) as in_corpus, count(r.id)::int as references
    from works w left join "references" r on r.work_id = w.id
    where w.merged_into is null ${q ? sql`and (w.title ilike ${"%" + q + "%"} or w.first_author ilike ${"%" + q + "%"})` : sql``}
    group by w.id order by count(r.id) desc, w.id limit ${opts.limit ?? 100}`
    .execute(db)
    .then((r) => r.rows);
}
