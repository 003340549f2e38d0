"use client";
import { useMemo } from "react";
import type { ColumnDef } from "@tanstack/react-table";
import type { Table } from "@/lib/dashboards/queries";
import type { Row } from "@/lib/dashboards/csv";
import { plural } from "@/lib/vocabulary";
import { PagedTable } from "@/components/ui/paged-table";
import { cellText, columnLabel } from "./column-labels";

/**
 * The exact data of a chart, as a table: the screen-reader view and what the CSV holds (the CSV keeps
 * the machine column names; the screen shows words). Sorts and pages like every long list.
 */
export function DataTable({ table, csvHref, id }: { table: Table; csvHref: string; id: string }) {
  const columns = useMemo<ColumnDef<Row, unknown>[]>(
    () =>
      table.columns.map((c) => ({
        id: c,
        header: columnLabel(c),
        accessorFn: (r: Row) => r[c] ?? null,
        cell: (x) => cellText(c, x.getValue()),
        sortUndefined: "last",
        meta: { numeric: table.rows.some((r) => typeof r[c] === "number") },
      })),
    [table],
  );
  return (
    <details className="mt-3" open={false}>
      <summary className="cursor-pointer text-sm text-ink-2">
        Table view: {table.title} ({plural(table.rows.length, "row")})
      </summary>
      <div className="mt-2 rounded border border-rule p-2">
        <PagedTable id={id} data={table.rows} columns={columns} label={table.title} className="text-xs" />
      </div>
      <a className="mt-2 inline-block text-sm underline" href={csvHref} download>
        Download CSV of this table
      </a>
    </details>
  );
}
