import type { DB } from "@/db";
import { ValidationError } from "@/lib/errors";
import { toCsv, type Row } from "./csv";
import { driftView } from "./drift";
import type { Filters, PracticeRef } from "./filters";
import { practiceOverTime, trailEnds, venueComparison, type Table } from "./queries";
import { practiceTrailView } from "./trail-view";

import { DASHBOARD_NAMES, type DashboardName } from "@/lib/vocabulary";

export { DASHBOARD_NAMES, type DashboardName };
export const isDashboardName = (s: string | undefined): s is DashboardName =>
  (DASHBOARD_NAMES as readonly string[]).includes(s ?? "");

export interface DashboardPayload {
  practice: PracticeRef | null;
  tables: Record<string, Table>;
  notes: string[];
  graph?: { nodes: unknown[]; edges: unknown[] };
}

export async function dashboardData(db: DB, name: DashboardName, f: Filters): Promise<DashboardPayload> {
  switch (name) {
    case "practice-over-time":
      return practiceOverTime(db, f);
    case "trail-ends":
      return trailEnds(db, f);
    case "venues":
      return venueComparison(db, f);
    case "drift":
      return driftView(db, f);
    case "trail-graph": {
      const g = await practiceTrailView(db, f);
      return {
        practice: g.practice,
        tables: {
          edges: { title: "Citations in the practice's trail graph", columns: g.columns, rows: g.rows as Row[] },
        },
        notes: [],
        graph: { nodes: g.nodes, edges: g.edges },
      };
    }
  }
}

/** CSV of one table of a dashboard (the first when none is named). */
export function dashboardCsv(data: DashboardPayload, table?: string): { table: string; body: string } {
  const name = table ?? Object.keys(data.tables)[0];
  const t = data.tables[name];
  if (!t)
    throw new ValidationError(
      `This dashboard has no table "${name}"; it has ${Object.keys(data.tables).join(", ")}.`,
      "table",
    );
  return { table: name, body: toCsv(t.columns, t.rows) };
}

export { filtersSchema, filtersToSearch, type Filters } from "./filters";
export type { Table } from "./queries";
