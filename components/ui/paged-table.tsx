"use client";
import { useId, useState } from "react";
import {
  flexRender,
  getCoreRowModel,
  getPaginationRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnDef,
  type SortingState,
} from "@tanstack/react-table";
import { plural } from "@/lib/vocabulary";

/** A column's look: right-aligned tabular figures for numbers. */
export type ColumnMeta = { numeric?: boolean };

/**
 * A long list as a table that sorts and pages in the browser (@tanstack/react-table for the state,
 * our own markup). Sorting is a button in each header (aria-sort on the header cell), paging is a
 * pair of buttons with the position announced; everything is reachable by keyboard. For lists of
 * at most a few thousand rows; longer ones page in their query module.
 */
export function PagedTable<T>({
  data,
  columns,
  label,
  noun = ["row", "rows"],
  pageSize = 25,
  initialSorting = [],
  id,
  className = "text-sm",
  getRowId,
  summary,
}: {
  data: T[];
  columns: ColumnDef<T, unknown>[];
  /** The table's accessible name (and caption for screen readers). */
  label: string;
  /** What a row is, for "Showing 1–25 of 175 articles". */
  noun?: [string, string];
  pageSize?: number;
  initialSorting?: SortingState;
  id?: string;
  className?: string;
  getRowId?: (row: T, index: number) => string;
  /** Replaces "1–25 of 175 rows" when the server pages (it alone knows where this page sits). */
  summary?: string;
}) {
  const [sorting, setSorting] = useState<SortingState>(initialSorting);
  const [pagination, setPagination] = useState({ pageIndex: 0, pageSize });
  const table = useReactTable({
    data,
    columns,
    state: { sorting, pagination },
    onSortingChange: (s) => {
      setSorting(s);
      setPagination((p) => ({ ...p, pageIndex: 0 }));
    },
    onPaginationChange: setPagination,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getPaginationRowModel: getPaginationRowModel(),
    getRowId,
  });
  const statusId = useId();
  const total = data.length;
  const first = total === 0 ? 0 : pagination.pageIndex * pagination.pageSize + 1;
  const last = Math.min(total, (pagination.pageIndex + 1) * pagination.pageSize);
  const pages = table.getPageCount();
  return (
    <div className="grid gap-2">
      <div className="overflow-x-auto">
        <table className={`w-full ${className}`} aria-label={label} aria-describedby={statusId} id={id}>
          <thead>
            {table.getHeaderGroups().map((hg) => (
              <tr key={hg.id} className="border-b border-rule text-left text-ink-2">
                {hg.headers.map((h) => {
                  const sorted = h.column.getIsSorted();
                  const numeric = (h.column.columnDef.meta as ColumnMeta | undefined)?.numeric;
                  return (
                    <th
                      key={h.id}
                      scope="col"
                      aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : undefined}
                      className={`py-1 pr-3 font-medium ${numeric ? "text-right" : ""}`}
                    >
                      {h.isPlaceholder ? null : h.column.getCanSort() ? (
                        <button
                          type="button"
                          onClick={h.column.getToggleSortingHandler()}
                          className="inline-flex items-center gap-1 rounded hover:text-ink focus-visible:outline focus-visible:outline-2"
                        >
                          {flexRender(h.column.columnDef.header, h.getContext())}
                          <span aria-hidden="true" className="text-xs">
                            {sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : "↕"}
                          </span>
                        </button>
                      ) : (
                        flexRender(h.column.columnDef.header, h.getContext())
                      )}
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((r) => (
              <tr key={r.id} className="border-b border-rule align-top">
                {r.getVisibleCells().map((c) => (
                  <td
                    key={c.id}
                    className={`py-1.5 pr-3 ${(c.column.columnDef.meta as ColumnMeta | undefined)?.numeric ? "text-right tabular-nums" : ""}`}
                  >
                    {flexRender(c.column.columnDef.cell, c.getContext())}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <nav className="flex flex-wrap items-center gap-3 text-sm" aria-label={`Pages of ${label}`}>
        <p id={statusId} aria-live="polite" className="text-ink-2 tabular-nums">
          {summary ??
            (total === 0
              ? `No ${noun[1]}`
              : pages <= 1
                ? `All ${plural(total, noun[0], noun[1])}`
                : `${first}–${last} of ${plural(total, noun[0], noun[1])}`)}
        </p>
        {pages > 1 && (
          <>
            <button
              type="button"
              className="rounded border border-rule px-2 py-0.5 disabled:opacity-50"
              onClick={() => table.previousPage()}
              disabled={!table.getCanPreviousPage()}
            >
              ← Previous
            </button>
            <span className="tabular-nums">
              Page {pagination.pageIndex + 1} of {pages}
            </span>
            <button
              type="button"
              className="rounded border border-rule px-2 py-0.5 disabled:opacity-50"
              onClick={() => table.nextPage()}
              disabled={!table.getCanNextPage()}
            >
              Next →
            </button>
          </>
        )}
      </nav>
    </div>
  );
}
