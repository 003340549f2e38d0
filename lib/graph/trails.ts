import { sql } from "kysely";
import { requireTransaction, type DB } from "@/db";
import { buildAllTrails, buildTrail, type Trail, type TrailSummary } from "@/lib/trails";
import { dbTrailGraph, trailStarts } from "./trail-graph";
import type { SourceCheckVerdict } from "@/lib/vocabulary";

/** The source-check verdict for where a trail ends, when that end is a checked work. */
function supportedBy(s: TrailSummary, checks: Map<string, SourceCheckVerdict>): SourceCheckVerdict | null {
  const w = s.summaryEnd?.workId;
  return w ? (checks.get(w) ?? null) : null;
}

async function checksOf(db: DB, practiceId: string): Promise<Map<string, SourceCheckVerdict>> {
  const rows = await db
    .selectFrom("source_checks")
    .select(["work_id", "verdict"])
    .where("practice_id", "=", practiceId)
    .execute();
  return new Map(rows.map((r) => [r.work_id, r.verdict]));
}

/**
 * Rebuilds and stores every trail of one practice. The whole practice is rebuilt at once because a
 * new article or a merge can change trails far from where it happened; the builder memoises per
 * article so this costs one pass over the practice's part of the graph. Runs inside the caller's
 * transaction, so readers see the old trails or the new ones, never none.
 */
export async function rebuildPracticeTrails(trx: DB, practiceId: string): Promise<number> {
  requireTransaction(trx, "rebuildPracticeTrails");
  const starts = await trailStarts(trx, practiceId);
  const built = await buildAllTrails(starts, dbTrailGraph(trx), practiceId);
  const checks = await checksOf(trx, practiceId);
  const rows = [...built.values()];
  await trx.deleteFrom("trails").where("practice_id", "=", practiceId).execute();
  for (let i = 0; i < rows.length; i += 5000) {
    const chunk = rows.slice(i, i + 5000);
    await sql`insert into trails (statement_id, practice_id, end_kind, length, supported, steps)
      select s, ${practiceId}::uuid, e, l, v, st::jsonb from unnest(
        ${chunk.map((t) => t.statementId)}::uuid[], ${chunk.map((t) => t.summaryEnd.kind)}::text[],
        ${chunk.map((t) => t.length)}::int[], ${chunk.map((t) => supportedBy(t, checks))}::text[],
        ${chunk.map((t) => JSON.stringify(t.ends))}::text[]) as u(s, e, l, v, st)`.execute(trx);
  }
  return rows.length;
}

/** Every practice's trails, inside the caller's transaction. */
export async function rebuildAllTrails(trx: DB): Promise<{ practices: number; trails: number }> {
  const practices = await trx.selectFrom("practices").select("id").execute();
  let trails = 0;
  for (const p of practices) trails += await rebuildPracticeTrails(trx, p.id);
  return { practices: practices.length, trails };
}

/** One statement's trail with its steps, built live (one query per level of the chain). */
export async function statementTrail(db: DB, statementId: string, practiceId: string): Promise<Trail | null> {
  const [start] = await trailStarts(db, practiceId, statementId);
  if (!start) return null;
  return buildTrail(start, dbTrailGraph(db), practiceId);
}
