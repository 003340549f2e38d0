import type { DB } from "@/db";
// eslint-disable-next-line boundaries/dependencies -- TODO(lead): remove after jobs/screens merge (the job registry moves to lib/)
import { enqueueGraph, GRAPH_QUEUES, trailsOnce } from "@/workers/graph-jobs";

/** After a merge, split or retyping, any practice's trails may change: queue a rebuild of each. */
export async function rebuildAllSoon(db: DB): Promise<void> {
  for (const p of await db.selectFrom("practices").select("id").execute()) {
    await enqueueGraph(GRAPH_QUEUES.trails, { practiceId: p.id }, trailsOnce(p.id, 5));
  }
}
