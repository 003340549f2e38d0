"use client";
import { useEffect, useRef } from "react";
import { useRouter } from "next/navigation";
import { isFinished } from "@/components/upload/status";
import { LABELS, type ArticleStatus } from "@/lib/vocabulary";
import { useArticleStatus } from "./use-article";

/**
 * The article's status, polled from the light status endpoint while it is unfinished; the page
 * re-renders (statements and counts) once when mining ends.
 */
export function LiveStatus({
  articleId,
  initial,
  reason,
}: {
  articleId: string;
  initial: ArticleStatus;
  reason: string | null;
}) {
  const router = useRouter();
  const q = useArticleStatus(articleId, { status: initial, failure_message: reason });
  const status = q.data?.status ?? initial;
  const last = useRef(initial);
  useEffect(() => {
    if (status !== last.current && isFinished(status)) router.refresh();
    last.current = status;
  }, [status, router]);
  return (
    <p aria-live="polite">
      <span className={`font-medium ${status === "failed" ? "text-accent" : ""}`} data-testid="article-status">
        {LABELS.articleStatus[status]}
      </span>
      {status === "failed" && q.data?.failure_message && (
        <span className="ml-2 text-ink-2">{q.data.failure_message}</span>
      )}
    </p>
  );
}
