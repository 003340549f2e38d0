import { z } from "zod";
import { route } from "@/lib/server/request";
import { notFound } from "@/lib/server/errors";
import { getDb } from "@/db";
import { ReviewInput } from "@/lib/corpus/articles";
import { reviewStatement } from "@/db/queries/articles";

// A review hangs on (article, fingerprint), so it survives re-mining of the article.
export const PUT = route(
  {
    permission: "corpus:curate",
    params: z.object({ id: z.uuid(), statementId: z.uuid() }),
    notFound: "That statement",
    body: ReviewInput,
  },
  async ({ actor, params, body }) => {
    const found = await reviewStatement(getDb(), {
      articleId: params.id,
      statementId: params.statementId,
      reviewerId: actor.id,
      verdict: body.verdict,
      note: body.note ?? null,
    });
    if (!found) throw notFound("That statement");
    return { ok: true, verdict: body.verdict };
  },
);
