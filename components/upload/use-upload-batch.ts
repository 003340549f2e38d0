"use client";
import { useQuery } from "@tanstack/react-query";
import { fetchJson } from "@/lib/http/fetch-json";
import type { ArticleStatus } from "@/lib/vocabulary";
import { isFinished } from "./status";

export type UploadedFile = {
  id: string;
  status: ArticleStatus;
  failure_code: string | null;
  failure_message: string | null;
  title: string | null;
};

export const uploadBatchKey = (batchId: string | null, ids: string[]) => ["upload-batch", batchId, ids.join(",")];

/**
 * The mining status of the files of one upload batch. Live progress by polling: once a second while a
 * file is still being sent or any file is unfinished, then it stops.
 */
export function useUploadBatch(batchId: string | null, articleIds: string[], sending: boolean) {
  return useQuery({
    queryKey: uploadBatchKey(batchId, articleIds),
    enabled: !!batchId && articleIds.length > 0,
    queryFn: () => fetchJson<{ files: UploadedFile[] }>(`/api/uploads/${batchId}?ids=${articleIds.join(",")}`),
    refetchInterval: (q) => {
      const files = q.state.data?.files ?? [];
      return sending || files.length < articleIds.length || files.some((f) => !isFinished(f.status)) ? 1000 : false;
    },
    staleTime: 0,
  });
}
