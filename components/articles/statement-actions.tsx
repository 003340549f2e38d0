"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";

export function ReviewButtons({
  articleId,
  statementId,
  mine,
}: {
  articleId: string;
  statementId: string;
  mine: "correct" | "incorrect" | "corrected" | null;
}) {
  const [verdict, setVerdict] = useState(mine);
  const [error, setError] = useState<string | null>(null);
  async function send(v: "correct" | "incorrect") {
    setError(null);
    const r = await fetch(`/api/articles/${articleId}/statements/${statementId}/review`, {
      method: "PUT",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({ verdict: v }),
    });
    if (r.ok) setVerdict(v);
    else
      setError(
        ((await r.json().catch(() => null)) as { error?: { message?: string } } | null)?.error?.message ??
          "Could not save the review.",
      );
  }
  return (
    <span className="inline-flex items-center gap-2 text-sm" role="group" aria-label="Review this statement">
      <button
        type="button"
        aria-pressed={verdict === "correct"}
        onClick={() => send("correct")}
        className={`rounded border px-2 py-0.5 ${verdict === "correct" ? "border-ink bg-ink text-paper" : "border-rule"}`}
      >
        Correct
      </button>
      <button
        type="button"
        aria-pressed={verdict === "incorrect"}
        onClick={() => send("incorrect")}
        className={`rounded border px-2 py-0.5 ${verdict === "incorrect" ? "border-accent bg-accent text-paper" : "border-rule"}`}
      >
        Incorrect
      </button>
      <span aria-live="polite" className="text-accent">
        {error}
      </span>
    </span>
  );
}

export function RemineButton({ articleId }: { articleId: string }) {
  const router = useRouter();
  const [msg, setMsg] = useState<string | null>(null);
  return (
    <span className="inline-flex items-center gap-2">
      <button
        type="button"
        className="rounded border border-rule px-3 py-1 hover:bg-paper-2"
        onClick={async () => {
          const r = await fetch(`/api/articles/${articleId}/remine`, { method: "POST" });
          const body = (await r.json().catch(() => null)) as { error?: { message?: string } } | null;
          setMsg(
            r.ok
              ? "Queued for re-mining; reviews stay with their statements."
              : (body?.error?.message ?? "Could not queue the article."),
          );
          router.refresh();
        }}
      >
        Re-mine
      </button>
      <span aria-live="polite" className="text-sm text-ink-2">
        {msg}
      </span>
    </span>
  );
}
