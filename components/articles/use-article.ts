"use client";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { fetchJson } from "@/lib/http/fetch-json";
import type { ArticleStatus, ReviewVerdict } from "@/lib/vocabulary";
import type { ArticleMetadataForm } from "@/lib/forms/article";
import { isFinished } from "@/components/upload/status";

export type ArticleStatusRow = { id: string; status: ArticleStatus; failure_message: string | null };

/** Every query about one article starts with this key, so one invalidation refreshes them all. */
export const articleKey = (id: string) => ["article", id] as const;

/**
 * The article's status from the light status endpoint, polled once a second until mining ends
 * (done or failed), then not at all.
 */
export function useArticleStatus(id: string, initial: Omit<ArticleStatusRow, "id">) {
  return useQuery({
    queryKey: [...articleKey(id), "status"],
    queryFn: () => fetchJson<ArticleStatusRow>(`/api/articles/${id}/status`),
    initialData: { id, ...initial },
    refetchInterval: (q) => (isFinished(q.state.data?.status ?? initial.status) ? false : 1000),
    staleTime: 0,
  });
}

export function useUpdateArticleMetadata(id: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: ArticleMetadataForm) => fetchJson(`/api/articles/${id}`, { method: "PATCH", json: body }),
    onSuccess: () => qc.invalidateQueries({ queryKey: articleKey(id) }),
  });
}

export function useRemineArticle(id: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => fetchJson(`/api/articles/${id}/remine`, { method: "POST" }),
    // The status goes back to queued: polling starts again.
    onSuccess: () => qc.invalidateQueries({ queryKey: articleKey(id) }),
  });
}

export function useReviewStatement(articleId: string, statementId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (verdict: Exclude<ReviewVerdict, "corrected">) =>
      fetchJson(`/api/articles/${articleId}/statements/${statementId}/review`, { method: "PUT", json: { verdict } }),
    onSuccess: () => qc.invalidateQueries({ queryKey: articleKey(articleId) }),
  });
}
