import { unparseCsv } from "@/lib/csv";

export type Cell = string | number | boolean | null;
export type Row = Record<string, Cell>;

/**
 * A chart's table as CSV: the same rows, in the same column order, that the JSON carries, so a
 * download is exactly the data behind the chart. Numbers are written in full precision; text cells
 * that a spreadsheet would run as a formula are neutralised (lib/csv.ts).
 */
export function toCsv(columns: readonly string[], rows: readonly Row[]): string {
  return unparseCsv({ fields: [...columns], data: rows.map((r) => columns.map((c) => r[c] ?? "")) }, { newline: "\n" });
}
