import { z } from "zod";
import { route } from "@/lib/server/request";
import { notFound } from "@/lib/server/errors";
import { getDb } from "@/db";
import { articleStatus } from "@/db/queries/article-status";

// Polled once a second while an article is mined: one indexed row, not the whole detail.
export const GET = route({ permission: "corpus:read" }, async ({ params }) => {
  const id = z.uuid().safeParse(params.id);
  if (!id.success) throw notFound("That article");
  const row = await articleStatus(getDb(), id.data);
  if (!row) throw notFound("That article");
  return row;
});
