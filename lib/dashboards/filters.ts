import { z } from "zod";
import { sql } from "kysely";
import type { DB } from "@/db";
import { ASSERTING_FRAMINGS, STATISTIC_KEYS } from "@/lib/vocabulary";

const uuidList = z
  .string()
  .transform((s) =>
    s
      .split(",")
      .map((x) => x.trim())
      .filter(Boolean),
  )
  .pipe(z.array(z.uuid({ message: "venues must be a comma-separated list of venue ids" })).max(200));
const year = z.coerce.number().int().min(1800).max(2100);

/** Dashboard filters, as they sit in the URL (so links are shareable). */
export const filtersSchema = z.object({
  practice: z.uuid({ message: "practice must be a practice id" }).optional(),
  venues: uuidList.optional(),
  from: year.optional(),
  to: year.optional(),
  statistic: z.enum(STATISTIC_KEYS).optional(),
  // Disputed statements never assert a practice, so dashboards filter on the asserting framings only.
  framing: z.enum(ASSERTING_FRAMINGS).optional(),
});
export type Filters = z.infer<typeof filtersSchema>;

export interface PracticeRef {
  id: string;
  key: string;
  label: string;
  statistic: string;
  /** Statements matched to the practice (the whole corpus, before filters). */
  matched?: number;
}

/**
 * The practice a dashboard shows: the one asked for; else the most asserted practice (most matched
 * statements; ties: seeded first, then by key), among the statistic's practices under a statistic
 * filter. A practice that contradicts the statistic filter gives way to the statistic, so changing
 * the statistic in the UI never shows an empty mismatch.
 */
export async function pickPractice(db: DB, f: Filters): Promise<PracticeRef | null> {
  const { rows } = await sql<PracticeRef>`with ${practiceCte(f)} select * from p`.execute(db);
  return rows[0] ?? null;
}

const MATCHED = sql`(select count(*)::int from statement_practices sp where sp.practice_id = practices.id)`;

/**
 * The chosen practice as a CTE named `p` (id, key, label, statistic, matched; at most one row), so a
 * chart fetches its practice and its data in one statement (one round trip) instead of two. The
 * count per practice reads the statement_practices_practice index.
 */
export function practiceCte(f: Filters) {
  const stat = f.statistic ? sql`and statistic = ${f.statistic}` : sql``;
  const asked = f.practice
    ? sql`(select id, key, label, statistic, ${MATCHED} as matched, 0 as pri from practices
        where id = ${f.practice}::uuid ${stat}) union all`
    : sql``;
  return sql`p as (select id, key, label, statistic, matched from (${asked}
    (select id, key, label, statistic, ${MATCHED} as matched, 1 as pri from practices where true ${stat}
      order by ${MATCHED} desc, is_seeded desc, key limit 1)) x
    order by pri limit 1)`;
}

/** The framing_key of the roll-ups that keep a row set per framing ('*' = any framing). */
export const framingKey = (f: Filters): string => f.framing ?? "*";

/** The WHERE part shared by every fact view: venues, years and statement framing. */
export function factWhere(f: Filters, alias = "") {
  const c = (col: string) => sql.ref(alias ? `${alias}.${col}` : col);
  return sql`${f.venues?.length ? sql`and ${c("venue_id")} = any(${f.venues}::uuid[])` : sql``}
    ${f.from !== undefined ? sql`and ${c("year")} >= ${f.from}` : sql``}
    ${f.to !== undefined ? sql`and ${c("year")} <= ${f.to}` : sql``}
    ${f.framing ? sql`and ${c("framing")} = ${f.framing}` : sql``}`;
}

/** Venues and years only: the article counts have no framing. */
export function countWhere(f: Filters) {
  return sql`${f.venues?.length ? sql`and venue_id = any(${f.venues}::uuid[])` : sql``}
    ${f.from !== undefined ? sql`and year >= ${f.from}` : sql``}
    ${f.to !== undefined ? sql`and year <= ${f.to}` : sql``}`;
}

/** Back to URL form (for links between dashboards and the CSV link). */
export function filtersToSearch(f: Filters): string {
  const p = new URLSearchParams();
  if (f.practice) p.set("practice", f.practice);
  if (f.venues?.length) p.set("venues", f.venues.join(","));
  if (f.from !== undefined) p.set("from", String(f.from));
  if (f.to !== undefined) p.set("to", String(f.to));
  if (f.statistic) p.set("statistic", f.statistic);
  if (f.framing) p.set("framing", f.framing);
  return p.toString();
}
