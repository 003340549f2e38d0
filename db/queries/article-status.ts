import type { DB } from "@/db";

/** One small read for live progress: the article's status and, when it failed, why. */
export async function articleStatus(db: DB, id: string) {
  return (
    (await db
      .selectFrom("articles")
      .select(["id", "status", "failure_message"])
      .where("id", "=", id)
      .executeTakeFirst()) ?? null
  );
}
