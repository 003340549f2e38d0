"use client";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { fetchJson } from "@/lib/http/fetch-json";
import type { PracticeForm } from "@/lib/forms/practice";
import type { StatisticKey } from "@/lib/vocabulary";

export type PracticeOption = { id: string; key: string; label: string; statistic: StatisticKey };

export const practicesKey = ["practices"] as const;

/** Every practice (for pickers), with the statistic keys the filter offers. */
export function usePractices() {
  return useQuery({
    queryKey: practicesKey,
    queryFn: () => fetchJson<{ practices: PracticeOption[]; statistics: StatisticKey[] }>("/api/practices"),
  });
}

export function useCreatePractice() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: PracticeForm) =>
      fetchJson<{ id: string; key: string; label: string }>("/api/practices", { method: "POST", json: body }),
    onSuccess: () => {
      qc.invalidateQueries({ queryKey: practicesKey });
      qc.invalidateQueries({ queryKey: ["dashboard"] });
    },
  });
}
