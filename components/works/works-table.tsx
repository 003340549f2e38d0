"use client";
import Link from "next/link";
import type { ColumnDef } from "@tanstack/react-table";
import { LABELS, type WorkType } from "@/lib/vocabulary";
import { PagedTable } from "@/components/ui/paged-table";

export type WorkRow = {
  id: string;
  title: string | null;
  first_author: string | null;
  year: string | null;
  work_type: WorkType;
  in_corpus: boolean;
  references: number;
};

const columns: ColumnDef<WorkRow, unknown>[] = [
  {
    id: "work",
    header: "Work",
    accessorFn: (w) => w.title ?? w.first_author ?? "Untitled work",
    cell: (c) => (
      <Link className="underline" href={`/works/${c.row.original.id}`}>
        {String(c.getValue())}
      </Link>
    ),
  },
  { id: "author", header: "First author", accessorFn: (w) => w.first_author ?? "—" },
  { id: "year", header: "Year", accessorFn: (w) => w.year ?? "n.d.", meta: { numeric: true } },
  { id: "type", header: "Type", accessorFn: (w) => LABELS.workType[w.work_type] },
  { id: "corpus", header: "In the corpus", accessorFn: (w) => (w.in_corpus ? "Yes" : "No") },
  { id: "references", header: "References to it", accessorKey: "references", meta: { numeric: true } },
];

/** One keyset page of works (the server pages; this table sorts the page it shows). */
export function WorksTable({ rows, summary }: { rows: WorkRow[]; summary: string }) {
  return (
    <PagedTable
      data={rows}
      columns={columns}
      label="Works"
      noun={["work", "works"]}
      pageSize={Math.max(rows.length, 1)}
      summary={summary}
      getRowId={(w) => w.id}
    />
  );
}
