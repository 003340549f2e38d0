import type { DB } from "@/db";
import type { ArticleStatus } from "@/lib/vocabulary";
import { MINING_QUEUE } from "./queue";

/** Every status change of an article is also a row of job_events: the article's history. */
export async function recordEvent(
  db: DB,
  articleId: string,
  state: ArticleStatus | "retry",
  message: string | null,
): Promise<void> {
  await db.insertInto("job_events").values({ article_id: articleId, job_name: MINING_QUEUE, state, message }).execute();
}
