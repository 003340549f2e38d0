"use client";
import { ResponsiveBar } from "@nivo/bar";
import { ResponsiveLine } from "@nivo/line";
import { SOURCING, SOURCING_ORDER } from "@/components/ui/sourcing";
import type { Row } from "@/lib/dashboards/csv";

const theme = { text: { fill: "var(--ink)" }, axis: { ticks: { text: { fill: "var(--ink-2)" } } }, grid: { line: { stroke: "var(--rule)" } } };

// The sourcing patterns of components/ui/sourcing.ts as nivo SVG defs, so colour is never the only signal.
const patternDefs = SOURCING_ORDER.map((s) => {
  const d = SOURCING[s];
  if (d.pattern === "solid") return { id: `pat-${s}`, type: "patternLines", background: d.color, color: d.color, spacing: 8, rotation: 0, lineWidth: 0 };
  if (d.pattern === "dots") return { id: `pat-${s}`, type: "patternDots", background: d.color, color: "var(--paper)", size: 3, padding: 3, stagger: true };
  if (d.pattern === "lines") return { id: `pat-${s}`, type: "patternLines", background: d.color, color: "var(--paper)", spacing: 5, rotation: -45, lineWidth: 1.5 };
  return { id: `pat-${s}`, type: "patternLines", background: d.color, color: "var(--paper)", spacing: 5, rotation: 45, lineWidth: 1.5 };
});

/** Dashboard 1: share of articles per year, stacked by sourcing; clicking a bar opens that year's trail graph. */
export function SourcingByYearChart({ rows, onYear }: { rows: Row[]; onYear?: (year: number) => void }) {
  const data = rows.map((r) => Object.fromEntries([["year", String(r.year)], ...SOURCING_ORDER.map((s) => [SOURCING[s].short, Number(r[`${s}_share`] ?? 0)])]));
  return (
    <div style={{ height: 320 }} aria-hidden="true">
      <ResponsiveBar
        data={data}
        keys={SOURCING_ORDER.map((s) => SOURCING[s].short)}
        indexBy="year"
        margin={{ top: 10, right: 140, bottom: 40, left: 50 }}
        colors={({ id }) => SOURCING[SOURCING_ORDER.find((s) => SOURCING[s].short === id) ?? "unsourced"].color}
        defs={patternDefs}
        fill={SOURCING_ORDER.map((s) => ({ match: { id: SOURCING[s].short }, id: `pat-${s}` }))}
        valueFormat=">-.0%"
        axisLeft={{ format: ">-.0%", legend: "share of articles", legendPosition: "middle", legendOffset: -42 }}
        enableLabel={false}
        theme={theme}
        onClick={(d) => onYear?.(Number(d.indexValue))}
        legends={[{ dataFrom: "keys", anchor: "right", direction: "column", translateX: 130, itemWidth: 120, itemHeight: 18 }]}
      />
    </div>
  );
}

/** Share asserting with its Wilson interval as dashed bounds. */
export function ShareLineChart({ rows, prefix = "share" }: { rows: Row[]; prefix?: string }) {
  const pts = (k: string) => rows.map((r) => ({ x: String(r.year), y: Number(r[k] ?? 0) }));
  return (
    <div style={{ height: 220 }} aria-hidden="true">
      <ResponsiveLine
        data={[
          { id: "upper 95%", data: pts(`${prefix}_upper`) },
          { id: "share", data: pts(prefix) },
          { id: "lower 95%", data: pts(`${prefix}_lower`) },
        ]}
        margin={{ top: 10, right: 110, bottom: 40, left: 50 }}
        yScale={{ type: "linear", min: 0, max: 1 }}
        axisLeft={{ format: ">-.0%" }}
        colors={["var(--ink-2)", "var(--accent)", "var(--ink-2)"]}
        enableSlices="x"
        theme={theme}
        legends={[{ anchor: "right", direction: "column", translateX: 100, itemWidth: 90, itemHeight: 18 }]}
      />
    </div>
  );
}

export function SimpleBarChart({ rows, keys, indexBy, percent }: { rows: Row[]; keys: string[]; indexBy: string; percent?: boolean }) {
  const data = rows.map((r) => Object.fromEntries([[indexBy, String(r[indexBy])], ...keys.map((k) => [k, Number(r[k] ?? 0)])]));
  return (
    <div style={{ height: 260 }} aria-hidden="true">
      <ResponsiveBar
        data={data}
        keys={keys}
        indexBy={indexBy}
        margin={{ top: 10, right: 170, bottom: 50, left: 50 }}
        colors={{ scheme: "greys" }}
        borderColor="var(--ink)"
        borderWidth={1}
        valueFormat={percent ? ">-.0%" : undefined}
        axisLeft={percent ? { format: ">-.0%" } : {}}
        enableLabel={false}
        theme={theme}
        legends={keys.length > 1 ? [{ dataFrom: "keys", anchor: "right", direction: "column", translateX: 160, itemWidth: 150, itemHeight: 18 }] : []}
      />
    </div>
  );
}
