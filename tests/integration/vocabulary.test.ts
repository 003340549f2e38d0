// Every closed vocabulary of lib/vocabulary.ts against the CHECK constraint that the migrations put
// in the database: a value added on one side only fails here. The constraint's list is read from
// PostgreSQL's own catalogue (pg_get_constraintdef), not from our migration files.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { sql } from "kysely";
import { createTestDatabase } from "../helpers/db";
import * as V from "@/lib/vocabulary";

let t: Awaited<ReturnType<typeof createTestDatabase>>;
beforeAll(async () => {
  t = await createTestDatabase();
});
afterAll(async () => t?.drop());

/** The quoted literals of a CHECK (col in (...)) / (col = ANY (ARRAY[...])) definition. */
function literals(def: string): string[] {
  return [...def.matchAll(/'((?:[^']|'')*)'(?:::text)?/g)].map((m) => m[1].replace(/''/g, "'"));
}

const CASES: [table: string, column: string, list: readonly string[], extra?: string[]][] = [
  ["User", "role", V.ROLES],
  ["invitations", "role", V.ROLES],
  ["articles", "status", V.ARTICLE_STATUSES],
  ["articles", "source_kind", V.SOURCE_KINDS],
  ["statements", "section", V.SECTIONS],
  ["statements", "kind", V.STATEMENT_KINDS],
  ["statements", "statistic", V.STATISTIC_KEYS],
  ["statements", "comparator", V.COMPARATORS],
  ["statements", "framing", V.FRAMINGS],
  ["statements", "sourcing", V.SOURCINGS],
  ["references", "kind", V.REFERENCE_KINDS],
  ["references", "work_set_by", V.WORK_SET_BY],
  ["works", "kind", V.REFERENCE_KINDS],
  ["works", "work_type", V.WORK_TYPES],
  ["works", "type_decided_by", V.WORK_TYPE_DECIDERS],
  ["practices", "statistic", V.STATISTIC_KEYS],
  ["practices", "comparator", V.COMPARATORS],
  ["practices", "framing", V.FRAMINGS],
  ["trails", "end_kind", V.TRAIL_ENDS],
  ["trails", "supported", V.SOURCE_CHECK_VERDICTS],
  ["source_checks", "verdict", V.SOURCE_CHECK_VERDICTS],
  ["statement_reviews", "verdict", V.REVIEW_VERDICTS],
  ["screenings", "status", V.SCREENING_STATUSES],
  ["report_subscriptions", "frequency", V.REPORT_FREQUENCIES],
];

describe("vocabulary lists match the database's CHECK constraints", () => {
  it.each(CASES)("%s.%s", async (table, column, list) => {
    const r = await sql<{ def: string }>`
      select pg_get_constraintdef(c.oid) as def
      from pg_constraint c join pg_class t on t.oid = c.conrelid
      where t.relname = ${table} and c.contype = 'c'
        and pg_get_constraintdef(c.oid) ~ ${`\\m${column}\\M`}`.execute(t.db);
    // The constraint that lists the column's values (a table may have other checks on the column).
    const defs = r.rows.map((x) => x.def).filter((d) => /\bIN\b|ANY/i.test(d) && d.includes(column));
    expect(defs.length, `no CHECK list on ${table}.${column}`).toBeGreaterThan(0);
    const values = literals(defs[0]);
    expect([...values].sort()).toEqual([...list].sort());
  });

  it("every value has a human label", () => {
    const groups: [V.LabelGroup, readonly string[]][] = [
      ["role", V.ROLES],
      ["articleStatus", V.ARTICLE_STATUSES],
      ["sourceKind", V.SOURCE_KINDS],
      ["section", V.SECTIONS],
      ["statementKind", V.STATEMENT_KINDS],
      ["statistic", V.STATISTIC_KEYS],
      ["comparator", V.COMPARATORS],
      ["framing", V.FRAMINGS],
      ["sourcing", V.SOURCINGS],
      ["referenceKind", V.REFERENCE_KINDS],
      ["workType", V.WORK_TYPES],
      ["workTypeDecider", V.WORK_TYPE_DECIDERS],
      ["workSetBy", V.WORK_SET_BY],
      ["trailEnd", V.TRAIL_ENDS],
      ["sourceCheckVerdict", V.SOURCE_CHECK_VERDICTS],
      ["reviewVerdict", V.REVIEW_VERDICTS],
      ["screeningStatus", V.SCREENING_STATUSES],
      ["reportFrequency", V.REPORT_FREQUENCIES],
      ["dashboard", V.DASHBOARD_NAMES],
    ];
    for (const [group, list] of groups) {
      expect(Object.keys(V.LABELS[group]).sort(), group).toEqual([...list].sort());
      for (const key of list) expect(V.labelOf(group, key), `${group}.${key}`).not.toBe(key.includes("_") ? key : "");
    }
  });
});
