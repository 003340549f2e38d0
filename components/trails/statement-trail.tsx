"use client";
import { TrailGraph } from "./trail-graph";
import { useStatementTrail } from "./use-trail";
import { DataTable } from "@/components/dashboards/data-table";
import { toCsv } from "@/lib/dashboards/csv";

export function StatementTrail({ statementId, practiceId }: { statementId: string; practiceId?: string }) {
  const q = useStatementTrail(statementId, practiceId);
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
