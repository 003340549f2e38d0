import { z } from "zod";
import { route } from "@/lib/server/request";
import { getDb } from "@/db";
import { notFound } from "@/lib/server/errors";
import { statementTrailView } from "@/lib/dashboards/trail-view";
import { firstPracticeOf } from "@/db/queries/practices";

// One statement's trail, built live from the graph (a handful of batched queries).
export const GET = route(
  {
    permission: "corpus:read",
    params: z.object({ statementId: z.uuid() }),
    notFound: "That statement",
    query: z.object({ practice: z.uuid().optional() }),
  },
  async ({ params, query }) => {
    const db = getDb();
    const practiceId = query.practice ?? (await firstPracticeOf(db, params.statementId));
    if (!practiceId) throw notFound("A trail for that statement (it asserts no tracked practice)");
    const view = await statementTrailView(db, params.statementId, practiceId);
    if (!view) throw notFound("A trail for that statement");
    return view;
  },
);
