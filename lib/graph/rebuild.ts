import type { Executor } from "@/db";
import { buildTrails, trailsOnce } from "@/lib/jobs/graph";

/**
 * After a merge, split or retyping, any practice's trails may change: queue a rebuild of each, in
 * the caller's transaction so the rebuilds commit with the change that needs them.
 */
export async function rebuildAllSoon(db: Executor): Promise<void> {
  for (const p of await db.selectFrom("practices").select("id").execute()) {
    await buildTrails.send(db, { practiceId: p.id }, trailsOnce(p.id, 5));
  }
}
