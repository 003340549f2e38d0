"use client";
import { useQuery } from "@tanstack/react-query";
import { TrailGraph } from "./trail-graph";
import type { TrailGraphView } from "@/lib/dashboards/trail-view";
import { DataTable } from "@/components/dashboards/data-table";
import { toCsv } from "@/lib/dashboards/csv";

export function StatementTrail({ statementId, practiceId }: { statementId: string; practiceId?: string }) {
  const q = useQuery({
    queryKey: ["trail", statementId, practiceId],
    queryFn: async (): Promise<TrailGraphView> => {
      const r = await fetch(`/api/trails/${statementId}${practiceId ? `?practice=${practiceId}` : ""}`);
      const body = await r.json();
      if (!r.ok) throw new Error(body?.error?.message ?? "The trail could not be loaded.");
      return body;
    },
  });
  if (q.isPending) return <p role="status">Following the citations…</p>;
  if (q.isError)
    return (
      <p role="alert" className="text-accent">
        {q.error.message}
      </p>
    );
  return (
    <div className="space-y-3">
      {q.data.practice && <p className="font-medium">{q.data.practice.label}</p>}
      <TrailGraph data={q.data} />
      <DataTable
        id="table-trail"
        table={{ title: "Citations along this trail", columns: q.data.columns, rows: q.data.rows }}
        csvHref={`data:text/csv;charset=utf-8,${encodeURIComponent(toCsv(q.data.columns, q.data.rows))}`}
      />
    </div>
  );
}
