import type { DB } from "@/db";
import type { ArticleStatus } from "@/lib/vocabulary";
import { mineArticle } from "@/lib/jobs/mining";

/** Every status change of an article is also a row of job_events: the article's history. */
export async function recordEvent(
  db: DB,
  articleId: string,
  state: ArticleStatus | "retry",
  message: string | null,
): Promise<void> {
  await db
    .insertInto("job_events")
    .values({ article_id: articleId, job_name: mineArticle.name, state, message })
    .execute();
}
