"use client";
import { ResponsiveBar } from "@nivo/bar";
import { ResponsiveLine } from "@nivo/line";
import { useId } from "react";
import { SOURCING, SOURCING_ORDER } from "@/components/ui/sourcing";
import type { Row } from "@/lib/dashboards/csv";

const theme = {
  text: { fill: "var(--ink)" },
  axis: { ticks: { text: { fill: "var(--ink-2)" } } },
  grid: { line: { stroke: "var(--rule)" } },
};

// The sourcing colours and patterns of components/ui/sourcing.ts, so colour is never the only signal.
const SOURCING_SERIES: BarSeries[] = SOURCING_ORDER.map((x) => ({
  key: x,
  label: SOURCING[x].label,
  color: SOURCING[x].color,
  pattern: SOURCING[x].pattern,
}));
// Both charts of dashboard 1 share these margins so their years line up.
const YEAR_MARGIN = { top: 10, right: 30, bottom: 40, left: 56 };

/** Dashboard 1: share of articles per year, stacked by sourcing; clicking a bar opens that year's trail graph. */
export function SourcingByYearChart({ rows, onYear }: { rows: Row[]; onYear?: (year: number) => void }) {
  const data = rows.map((r) =>
    Object.fromEntries([
      ["year", String(r.year)],
      ...SOURCING_SERIES.map((x) => [x.label, Number(r[`${x.key}_share`] ?? 0)]),
    ]),
  );
  const uid = useId().replace(/:/g, "");
  return (
    <div className="space-y-2">
      <SeriesLegend series={SOURCING_SERIES} />
      <div style={{ height: 320 }} aria-hidden="true">
        <ResponsiveBar
          data={data}
          keys={SOURCING_SERIES.map((x) => x.label)}
          indexBy="year"
          margin={YEAR_MARGIN}
          colors={({ id }) => SOURCING_SERIES.find((x) => x.label === id)?.color ?? "var(--ink-2)"}
          defs={seriesDefs(SOURCING_SERIES, uid)}
          fill={SOURCING_SERIES.map((x, i) => ({ match: { id: x.label }, id: `${uid}-bar-${i}` }))}
          valueFormat=">-.0%"
          axisLeft={{ format: ">-.0%", legend: "share of articles", legendPosition: "middle", legendOffset: -46 }}
          enableLabel={false}
          theme={theme}
          onClick={(d) => onYear?.(Number(d.indexValue))}
        />
      </div>
    </div>
  );
}

/** The share asserting as a line over its 95% Wilson interval drawn as a band. */
export function ShareLineChart({ rows, prefix = "share" }: { rows: Row[]; prefix?: string }) {
  const pts = rows.map((r) => ({ x: String(r.year), y: Number(r[prefix] ?? 0) }));
  const band = ({ xScale, yScale }: { xScale: (x: string) => number; yScale: (y: number) => number }) => {
    const at = (r: Row, k: string) => `${xScale(String(r.year))},${yScale(Number(r[k] ?? 0))}`;
    if (rows.length === 0) return null;
    const d = `M${rows.map((r) => at(r, `${prefix}_upper`)).join("L")}L${[...rows]
      .reverse()
      .map((r) => at(r, `${prefix}_lower`))
      .join("L")}Z`;
    return (
      <path d={d} fill="var(--rule)" fillOpacity={0.7} stroke="var(--ink-2)" strokeDasharray="3 3" strokeWidth={1} />
    );
  };
  return (
    <div className="space-y-2">
      <ul className="flex flex-wrap gap-x-5 text-sm text-ink-2" aria-hidden="true">
        <li className="flex items-center gap-1.5">
          <svg width="18" height="10">
            <line x1="0" y1="5" x2="18" y2="5" stroke="var(--accent)" strokeWidth="2" />
          </svg>
          share asserting it
        </li>
        <li className="flex items-center gap-1.5">
          <svg width="18" height="12">
            <rect
              x="0.5"
              y="0.5"
              width="17"
              height="11"
              fill="var(--rule)"
              stroke="var(--ink-2)"
              strokeDasharray="3 3"
            />
          </svg>
          95% Wilson interval
        </li>
      </ul>
      <div style={{ height: 220 }} aria-hidden="true">
        <ResponsiveLine
          data={[{ id: "share asserting it", data: pts }]}
          margin={YEAR_MARGIN}
          yScale={{ type: "linear", min: 0, max: 1 }}
          axisLeft={{ format: ">-.0%" }}
          colors={["var(--accent)"]}
          lineWidth={2}
          pointSize={5}
          enableSlices="x"
          theme={theme}
          layers={["grid", "axes", band as never, "lines", "points", "slices", "mesh"]}
        />
      </div>
    </div>
  );
}

/** One bar series: the row key it reads, its legend label, and a fill that does not rely on colour alone. */
export type BarSeries = { key: string; label: string; color: string; pattern?: "solid" | "lines" | "dots" | "cross" };

const seriesDefs = (series: BarSeries[], uid: string) =>
  series.map((x, i) => {
    const id = `${uid}-bar-${i}`;
    if (x.pattern === "dots")
      return {
        id,
        type: "patternDots",
        background: x.color,
        color: "var(--paper)",
        size: 3,
        padding: 3,
        stagger: true,
      };
    if (x.pattern === "lines")
      return {
        id,
        type: "patternLines",
        background: x.color,
        color: "var(--paper)",
        spacing: 5,
        rotation: -45,
        lineWidth: 1.5,
      };
    if (x.pattern === "cross")
      return {
        id,
        type: "patternLines",
        background: x.color,
        color: "var(--paper)",
        spacing: 5,
        rotation: 45,
        lineWidth: 1.5,
      };
    return { id, type: "patternLines", background: x.color, color: x.color, spacing: 8, rotation: 0, lineWidth: 0 };
  });

/** A legend in HTML with the same fills as the bars (nivo's own legend shows only the base colour). */
function SeriesLegend({ series }: { series: BarSeries[] }) {
  const uid = useId().replace(/:/g, "");
  return (
    <ul className="flex flex-wrap gap-x-5 gap-y-1 text-sm text-ink-2" aria-hidden="true">
      {series.map((x, i) => (
        <li key={x.key} className="flex items-center gap-1.5">
          <svg width="14" height="14" viewBox="0 0 14 14">
            <defs>
              {x.pattern === "dots" && (
                <pattern id={`${uid}-${i}`} width="5" height="5" patternUnits="userSpaceOnUse">
                  <rect width="5" height="5" fill={x.color} />
                  <circle cx="2.5" cy="2.5" r="1.2" fill="var(--paper)" />
                </pattern>
              )}
              {(x.pattern === "lines" || x.pattern === "cross") && (
                <pattern
                  id={`${uid}-${i}`}
                  width="5"
                  height="5"
                  patternUnits="userSpaceOnUse"
                  patternTransform={`rotate(${x.pattern === "lines" ? -45 : 45})`}
                >
                  <rect width="5" height="5" fill={x.color} />
                  <line x1="0" y1="0" x2="0" y2="5" stroke="var(--paper)" strokeWidth="1.5" />
                </pattern>
              )}
            </defs>
            <rect
              x="0.5"
              y="0.5"
              width="13"
              height="13"
              fill={!x.pattern || x.pattern === "solid" ? x.color : `url(#${uid}-${i})`}
              stroke="var(--ink)"
              strokeWidth="1"
            />
          </svg>
          {x.label}
        </li>
      ))}
    </ul>
  );
}

/**
 * Bars for one or more series. `stacked` is only for parts of one whole (shares that add up to 1);
 * different measures side by side are `grouped`. Long category names (venues) read better with
 * `horizontal`. Shares are drawn on a 0–100% axis.
 */
export function SimpleBarChart({
  rows,
  series,
  indexBy,
  percent,
  mode = "stacked",
  horizontal,
  axisLabel,
}: {
  rows: Row[];
  series: BarSeries[];
  indexBy: string;
  percent?: boolean;
  mode?: "stacked" | "grouped";
  horizontal?: boolean;
  axisLabel?: string;
}) {
  // A horizontal chart draws its first row at the bottom: reverse so the table's first row is on top.
  const ordered = horizontal ? [...rows].reverse() : rows;
  // SVG pattern ids are global to the page, and one page can hold several of these charts.
  const uid = useId().replace(/:/g, "");
  const data = ordered.map((r) =>
    Object.fromEntries([[indexBy, String(r[indexBy])], ...series.map((x) => [x.label, Number(r[x.key] ?? 0)])]),
  );
  const format = percent ? ">-.0%" : undefined;
  const valueAxis = {
    format,
    legend: axisLabel,
    legendPosition: "middle" as const,
    legendOffset: horizontal ? 36 : -42,
  };
  const height = horizontal
    ? Math.max(160, rows.length * (mode === "grouped" ? 22 * series.length + 14 : 30) + 60)
    : 260;
  return (
    <div className="space-y-2">
      {series.length > 1 && <SeriesLegend series={series} />}
      <div style={{ height }} aria-hidden="true">
        <ResponsiveBar
          data={data}
          keys={series.map((x) => x.label)}
          indexBy={indexBy}
          layout={horizontal ? "horizontal" : "vertical"}
          groupMode={mode}
          valueScale={percent && mode === "stacked" ? { type: "linear", min: 0, max: 1 } : { type: "linear", min: 0 }}
          margin={
            horizontal ? { top: 10, right: 30, bottom: 50, left: 280 } : { top: 10, right: 30, bottom: 40, left: 56 }
          }
          colors={({ id }) => series.find((x) => x.label === id)?.color ?? "var(--ink-2)"}
          defs={seriesDefs(series, uid)}
          fill={series.map((x, i) => ({ match: { id: x.label }, id: `${uid}-bar-${i}` }))}
          borderColor="var(--ink)"
          borderWidth={1}
          valueFormat={format}
          axisLeft={horizontal ? { tickSize: 0, tickPadding: 8 } : valueAxis}
          axisBottom={horizontal ? valueAxis : {}}
          enableLabel={false}
          theme={theme}
        />
      </div>
    </div>
  );
}
