import { z } from "zod";
import { route } from "@/lib/server/request";
import { getDb } from "@/db";
import { notFound, HttpError } from "@/lib/server/errors";
import { statementTrailView } from "@/lib/dashboards/trail-view";

// One statement's trail, built live from the graph (a handful of batched queries).
export const GET = route(
  { permission: "corpus:read", query: z.object({ practice: z.uuid().optional() }) },
  async ({ params, query }) => {
    const statementId = z.uuid().safeParse(params.statementId);
    if (!statementId.success) throw new HttpError(400, "invalid", "That is not a statement id.", "statementId");
    const db = getDb();
    const practiceId =
      query.practice ??
      (
        await db
          .selectFrom("statement_practices")
          .select("practice_id")
          .where("statement_id", "=", statementId.data)
          .orderBy("practice_id")
          .executeTakeFirst()
      )?.practice_id;
    if (!practiceId) throw notFound("A trail for that statement (it asserts no tracked practice)");
    const view = await statementTrailView(db, statementId.data, practiceId);
    if (!view) throw notFound("A trail for that statement");
    return view;
  },
);
