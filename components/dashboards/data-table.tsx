import type { Table } from "@/lib/dashboards/queries";

/** The exact data of a chart, as a table: the screen-reader view and what the CSV holds. */
export function DataTable({ table, csvHref, id }: { table: Table; csvHref: string; id: string }) {
  return (
    <details className="mt-3" open={false}>
      <summary className="cursor-pointer text-sm text-ink-2">
        Table view: {table.title} ({table.rows.length} {table.rows.length === 1 ? "row" : "rows"})
      </summary>
      <div className="mt-2 max-h-96 overflow-auto rounded border border-rule">
        <table className="w-full text-xs" aria-label={table.title} id={id}>
          <thead className="bg-paper-2 sticky top-0">
            <tr>
              {table.columns.map((c) => (
                <th key={c} scope="col" className="px-2 py-1 text-left font-medium">
                  {c}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {table.rows.map((r, i) => (
              <tr key={i} className="border-t border-rule">
                {table.columns.map((c) => (
                  <td key={c} className="px-2 py-1">
                    {r[c] === null || r[c] === undefined ? "—" : String(r[c])}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <a className="mt-2 inline-block text-sm underline" href={csvHref} download>
        Download CSV of this table
      </a>
    </details>
  );
}
