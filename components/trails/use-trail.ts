"use client";
import { useQuery } from "@tanstack/react-query";
import { fetchJson } from "@/lib/http/fetch-json";
import type { TrailGraphView } from "@/lib/dashboards/trail-view";

/** One statement's trail (for a practice, when given), built live from the citation graph. */
export function useStatementTrail(statementId: string, practiceId?: string) {
  return useQuery({
    queryKey: ["trail", statementId, practiceId ?? null],
    queryFn: () =>
      fetchJson<TrailGraphView>(`/api/trails/${statementId}${practiceId ? `?practice=${practiceId}` : ""}`),
  });
}
