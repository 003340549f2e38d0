import type { ArticleStatus } from "@/lib/vocabulary";

export const STATUS_LABEL: Record<ArticleStatus, string> = {
  uploaded: "Uploaded",
  queued: "Queued",
  reading: "Reading",
  mining: "Mining",
  done: "Done",
  failed: "Failed",
};
export const isFinished = (s: string) => s === "done" || s === "failed";
