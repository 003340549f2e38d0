import { sql } from "kysely";
import { z } from "zod";
import { route } from "@/lib/server/request";
import { notFound } from "@/lib/server/errors";
import { getDb } from "@/db";
import { ReviewInput } from "@/lib/corpus/articles";

// A review hangs on (article, fingerprint), so it survives re-mining of the article.
export const PUT = route({ permission: "corpus:curate", body: ReviewInput }, async ({ actor, params, body }) => {
  const ids = z.object({ id: z.string().uuid(), statementId: z.string().uuid() }).safeParse(params);
  if (!ids.success) throw notFound("That statement");
  const db = getDb();
  const s = await db
    .selectFrom("statements")
    .select(["article_id", "fingerprint"])
    .where("id", "=", ids.data.statementId)
    .where("article_id", "=", ids.data.id)
    .executeTakeFirst();
  if (!s) throw notFound("That statement");
  await db
    .insertInto("statement_reviews")
    .values({
      article_id: s.article_id,
      fingerprint: s.fingerprint,
      reviewer_id: actor.id,
      verdict: body.verdict,
      note: body.note ?? null,
    })
    .onConflict((oc) =>
      oc
        .columns(["article_id", "fingerprint", "reviewer_id"])
        .doUpdateSet({ verdict: body.verdict, note: body.note ?? null, updated_at: sql`now()` }),
    )
    .execute();
  return { ok: true, verdict: body.verdict };
});
