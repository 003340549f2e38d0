import { idParams, route } from "@/lib/server/request";
import { notFound } from "@/lib/server/errors";
import { getDb } from "@/db";
import { articleStatus } from "@/db/queries/article-status";

// Polled once a second while an article is mined: one indexed row, not the whole detail.
export const GET = route(
  { permission: "corpus:read", params: idParams, notFound: "That article" },
  async ({ params }) => {
    const row = await articleStatus(getDb(), params.id);
    if (!row) throw notFound("That article");
    return row;
  },
);
