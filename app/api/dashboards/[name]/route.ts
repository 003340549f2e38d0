import { z } from "zod";
import { route } from "@/lib/server/request";
import { getDb } from "@/db";
import { filtersSchema } from "@/lib/dashboards/filters";
import { DASHBOARD_NAMES, dashboardData, dashboardCsv } from "@/lib/dashboards";

const query = filtersSchema.extend({
  format: z.enum(["json", "csv"]).optional(),
  table: z.string().max(40).optional(),
});

// Read-only dashboards: JSON for the charts, or CSV of one chart's exact table.
export const GET = route(
  { permission: "corpus:read", params: z.object({ name: z.enum(DASHBOARD_NAMES) }), notFound: "That dashboard", query },
  async ({ params, query }) => {
    const name = params.name;
    const data = await dashboardData(getDb(), name, query);
    if (query.format !== "csv") return data;
    const csv = dashboardCsv(data, query.table);
    return new Response(csv.body, {
      headers: {
        "content-type": "text/csv; charset=utf-8",
        "content-disposition": `attachment; filename="echoline-${name}-${csv.table}.csv"`,
      },
    });
  },
);
