"use client";
import Link from "next/link";
import type { ColumnDef } from "@tanstack/react-table";
import { LABELS, type WorkSetBy } from "@/lib/vocabulary";
import { PagedTable } from "@/components/ui/paged-table";

export type CitingRow = {
  id: string;
  article_id: string;
  article_title: string | null;
  year: number | null;
  citations: number;
  with_locator: number;
  work_set_by: WorkSetBy | string;
};

const columns: ColumnDef<CitingRow, unknown>[] = [
  {
    id: "article",
    header: "Citing article",
    accessorFn: (r) => r.article_title ?? "Untitled",
    cell: (c) => (
      <Link className="underline" href={`/articles/${c.row.original.article_id}`}>
        {String(c.getValue())}
      </Link>
    ),
  },
  {
    id: "year",
    header: "Year",
    accessorFn: (r) => r.year,
    cell: (c) => c.row.original.year ?? "n.d.",
    sortUndefined: "last",
    meta: { numeric: true },
  },
  { id: "citations", header: "In-text citations", accessorKey: "citations", meta: { numeric: true } },
  { id: "with_locator", header: "With a page", accessorKey: "with_locator", meta: { numeric: true } },
  {
    id: "set_by",
    header: "Matched",
    accessorFn: (r) => LABELS.workSetBy[r.work_set_by as WorkSetBy] ?? r.work_set_by,
  },
];

/** Every reference that resolves to this work: 25 a page, newest first, sortable by any column. */
export function CitingArticlesTable({ rows }: { rows: CitingRow[] }) {
  return (
    <PagedTable
      data={rows}
      columns={columns}
      label="Articles citing this work"
      noun={["reference", "references"]}
      initialSorting={[{ id: "year", desc: true }]}
      getRowId={(r) => r.id}
    />
  );
}
