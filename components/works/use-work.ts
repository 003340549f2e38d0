"use client";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { fetchJson } from "@/lib/http/fetch-json";
import type { WorkType } from "@/lib/vocabulary";
import type { z } from "zod";
import type { sourceCheckSchema } from "@/lib/forms/source-check";

/** Every query about one work starts with this key; a curator's change invalidates them all. */
export const workKey = (id: string) => ["work", id] as const;

export function useRecordSourceCheck(workId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: z.output<typeof sourceCheckSchema>) =>
      fetchJson("/api/source-checks", { method: "POST", json: body }),
    onSuccess: () => {
      qc.invalidateQueries({ queryKey: workKey(workId) });
      // A verdict changes where the practice's trails end.
      qc.invalidateQueries({ queryKey: ["dashboard"] });
    },
  });
}

export function useSetWorkType(workId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (workType: WorkType) => fetchJson(`/api/works/${workId}`, { method: "PATCH", json: { workType } }),
    onSuccess: () => qc.invalidateQueries({ queryKey: workKey(workId) }),
  });
}

export function useMergeWork(workId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (intoId: string) =>
      fetchJson<{ workId: string }>(`/api/works/${workId}/merge`, { method: "POST", json: { intoId } }),
    onSuccess: (r) => {
      qc.invalidateQueries({ queryKey: workKey(workId) });
      qc.invalidateQueries({ queryKey: workKey(r.workId) });
    },
  });
}

export function useSplitWork(workId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (referenceIds: string[]) =>
      fetchJson<{ workId: string }>(`/api/works/${workId}/split`, { method: "POST", json: { referenceIds } }),
    onSuccess: () => qc.invalidateQueries({ queryKey: workKey(workId) }),
  });
}
