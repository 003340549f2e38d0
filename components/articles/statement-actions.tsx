"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import type { ReviewVerdict } from "@/lib/vocabulary";
import { useRemineArticle, useReviewStatement } from "./use-article";

export function ReviewButtons({
  articleId,
  statementId,
  mine,
}: {
  articleId: string;
  statementId: string;
  mine: ReviewVerdict | null;
}) {
  const [verdict, setVerdict] = useState(mine);
  const review = useReviewStatement(articleId, statementId);
  const send = (v: "correct" | "incorrect") => review.mutate(v, { onSuccess: () => setVerdict(v) });
  return (
    <span className="inline-flex items-center gap-2 text-sm" role="group" aria-label="Review this statement">
      <button
        type="button"
        aria-pressed={verdict === "correct"}
        disabled={review.isPending}
        onClick={() => send("correct")}
        className={`rounded border px-2 py-0.5 ${verdict === "correct" ? "border-ink bg-ink text-paper" : "border-rule"}`}
      >
        Correct
      </button>
      <button
        type="button"
        aria-pressed={verdict === "incorrect"}
        disabled={review.isPending}
        onClick={() => send("incorrect")}
        className={`rounded border px-2 py-0.5 ${verdict === "incorrect" ? "border-accent bg-accent text-paper" : "border-rule"}`}
      >
        Incorrect
      </button>
      <span aria-live="polite" className="text-accent">
        {review.error?.message}
      </span>
    </span>
  );
}

export function RemineButton({ articleId }: { articleId: string }) {
  const router = useRouter();
  const remine = useRemineArticle(articleId);
  return (
    <span className="inline-flex items-center gap-2">
      <button
        type="button"
        className="rounded border border-rule px-3 py-1 hover:bg-paper-2"
        disabled={remine.isPending}
        onClick={() => remine.mutate(undefined, { onSuccess: () => router.refresh() })}
      >
        Re-mine
      </button>
      <span aria-live="polite" className="text-sm text-ink-2">
        {remine.isSuccess
          ? "Queued for re-mining; reviews stay with their statements."
          : remine.isError
            ? remine.error.message
            : null}
      </span>
    </span>
  );
}
