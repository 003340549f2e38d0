import type { ArticleStatus } from "@/lib/vocabulary";

/** Mining has ended, one way or the other: polling can stop. */
export const isFinished = (s: ArticleStatus | string) => s === "done" || s === "failed";
