"use client";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { fetchJson } from "@/lib/http/fetch-json";
import type { ProcedureForm } from "@/lib/forms/procedure";

export const proceduresKey = ["procedures"] as const;

/** Adds a procedure (no id) or replaces one. */
export function useSaveProcedure(id: string | undefined) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: ProcedureForm) =>
      fetchJson(id ? `/api/procedures/${id}` : "/api/procedures", { method: id ? "PUT" : "POST", json: body }),
    onSuccess: () => qc.invalidateQueries({ queryKey: proceduresKey }),
  });
}
