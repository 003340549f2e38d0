import { sql } from "kysely";
import { z } from "zod";
import type { DB } from "@/db";
import type { WorkType } from "@/lib/vocabulary";

export type WorkListRow = {
  id: string;
  title: string | null;
  first_author: string | null;
  year: string | null;
  work_type: WorkType;
  in_corpus: boolean;
  references: number;
};

/** Where the next page starts: the last row's reference count and id (most cited first, then by id). */
export type WorksCursor = { references: number; id: string };

/** A cursor as it travels in the URL: `12.<uuid>`; anything else starts from the first page. */
export const worksCursorParam = z
  .string()
  .regex(/^\d{1,9}\.[0-9a-f-]{36}$/i)
  .transform((s): WorksCursor => {
    const [n, id] = s.split(".");
    return { references: Number(n), id };
  });
export const worksCursorText = (c: WorksCursor) => `${c.references}.${c.id}`;

const escapeLike = (s: string) => s.replace(/[\\%_]/g, (c) => `\\${c}`);

/**
 * One page of works, most cited first, keyset-paged on (reference count desc, id asc): a page never
 * repeats or skips a work when works are added between pages, and page 40 costs what page 1 does
 * apart from the one aggregate. `next` is null on the last page.
 */
export async function listWorksPage(
  db: DB,
  opts: { q?: string; after?: WorksCursor; limit?: number } = {},
): Promise<{ rows: WorkListRow[]; next: WorksCursor | null }> {
  const limit = opts.limit ?? 50;
  const q = opts.q?.trim();
  const like = q ? `%${escapeLike(q)}%` : null;
  const after = opts.after;
  const { rows } = await sql<WorkListRow>`
    select w.id, w.title, w.first_author, w.year, w.work_type, (w.article_id is not null) as in_corpus,
      count(r.id)::int as references
    from works w left join "references" r on r.work_id = w.id
    where w.merged_into is null
      ${like ? sql`and (w.title ilike ${like} or w.first_author ilike ${like})` : sql``}
    group by w.id
    ${after ? sql`having count(r.id) < ${after.references} or (count(r.id) = ${after.references} and w.id > ${after.id}::uuid)` : sql``}
    order by count(r.id) desc, w.id
    limit ${limit + 1}`.execute(db);
  const page = rows.slice(0, limit);
  const lastRow = page[page.length - 1];
  return {
    rows: page,
    next: rows.length > limit && lastRow ? { references: lastRow.references, id: lastRow.id } : null,
  };
}
