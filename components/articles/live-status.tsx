"use client";
import { useEffect, useRef } from "react";
import { useRouter } from "next/navigation";
import { useQuery } from "@tanstack/react-query";
import { STATUS_LABEL, isFinished } from "@/components/upload/status";
import type { ArticleStatus } from "@/lib/vocabulary";

/** The article's status, polled while it is unfinished; the page re-renders when mining ends. */
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
  const q = useQuery({
    queryKey: ["article-status", articleId],
    queryFn: async () => {
      const res = await fetch(`/api/articles/${articleId}`);
      const body = (await res.json()) as { article: { status: ArticleStatus; failure_message: string | null } };
      return body.article;
    },
    initialData: { status: initial, failure_message: reason },
    refetchInterval: (query) => (isFinished(query.state.data?.status ?? initial) ? false : 1000),
    staleTime: 0,
  });
  const status = q.data?.status ?? initial;
  const last = useRef(initial);
  useEffect(() => {
    if (status !== last.current && isFinished(status)) router.refresh();
    last.current = status;
  }, [status, router]);
  return (
    <p aria-live="polite">
      <span className={`font-medium ${status === "failed" ? "text-accent" : ""}`} data-testid="article-status">
        {STATUS_LABEL[status]}
      </span>
      {status === "failed" && q.data?.failure_message && (
        <span className="ml-2 text-ink-2">{q.data.failure_message}</span>
      )}
    </p>
  );
}
