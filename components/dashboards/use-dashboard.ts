"use client";
import { useQuery } from "@tanstack/react-query";
import { fetchJson } from "@/lib/http/fetch-json";
import type { DashboardPayload } from "@/lib/dashboards";
import type { DashboardName } from "@/lib/vocabulary";

/** The practice a dashboard shows, with how many statements are matched to it. */
export type ShownPractice = NonNullable<DashboardPayload["practice"]>;

/** One dashboard under the filters of the URL (`search`); the key holds both, so each view caches apart. */
export function useDashboard(name: DashboardName, search: string) {
  return useQuery({
    queryKey: ["dashboard", name, search],
    queryFn: () => fetchJson<DashboardPayload>(`/api/dashboards/${name}?${search}`),
  });
}
