"use client";
import "@xyflow/react/dist/style.css";
import { useCallback, useEffect, useMemo, useRef, useState } from "react";
import { useRouter } from "next/navigation";
import {
  ReactFlow,
  Background,
  Controls,
  MarkerType,
  type Edge,
  type Node,
  type ReactFlowInstance,
} from "@xyflow/react";
import type { GraphEdge, GraphNode } from "@/lib/dashboards/trail-view";
import { LABELS, labelOf } from "@/lib/vocabulary";
import { NODE_W, viewportFor, type Span } from "@/lib/trails/graph-viewport";

export type TrailGraphData = { nodes: GraphNode[]; edges: GraphEdge[] };

// Layout: one column per year present, one row per node in that column.
const COL = 260;
const ROW = 96;
const HEIGHT = 560;

/**
 * Articles and works laid out by year (x) so a chain reads left to right in time; each edge carries
 * the citation's locator. It opens on the most recent decade at a readable size; "Years shown" widens
 * it. Clicking a statement opens the sentence in its article; a work, its page. Every node is also a
 * link in the list below the graph, for keyboards and screen readers.
 */
export function TrailGraph({ data }: { data: TrailGraphData }) {
  const router = useRouter();
  const box = useRef<HTMLDivElement>(null);
  const flow = useRef<ReactFlowInstance | null>(null);
  const [span, setSpan] = useState<Span>("decade");
  const { nodes, edges, placed, range } = useMemo(() => {
    const years = [...new Set(data.nodes.map((n) => n.year ?? 0))].sort((a, b) => a - b);
    const col = new Map(years.map((y, i) => [y, i]));
    const rowInCol = new Map<number, number>();
    const nodes: Node[] = data.nodes.map((n) => {
      const c = col.get(n.year ?? 0) ?? 0;
      const r = rowInCol.get(c) ?? 0;
      rowInCol.set(c, r + 1);
      const kind =
        n.kind === "statement"
          ? "claim"
          : n.kind === "work"
            ? labelOf("workType", n.workType ?? "unknown").toLowerCase()
            : "unresolved reference";
      return {
        id: n.id,
        position: { x: c * COL, y: r * ROW },
        data: {
          label: `${n.year ?? "n.d."} · ${n.label} [${kind}]${n.end ? ` → ${labelOf("trailEnd", n.end).toLowerCase()}` : ""}`,
          href: n.href,
        },
        style: {
          background: "var(--paper)",
          color: "var(--ink)",
          border: `${n.kind === "work" && n.workType === "methods_source" ? 3 : 1}px ${n.kind === "unresolved" ? "dashed" : "solid"} var(--ink-2)`,
          fontSize: 12,
          lineHeight: 1.3,
          width: NODE_W,
          cursor: n.href ? "pointer" : "default",
        },
      };
    });
    const edges: Edge[] = data.edges.map((e) => ({
      id: e.id,
      source: e.kind === "cites" ? e.to : e.from,
      target: e.kind === "cites" ? e.from : e.to,
      label: e.kind === "cites" ? (e.locator ?? "no page") + (e.secondary ? " (as cited in)" : "") : "asserted in",
      style: { stroke: "var(--ink-2)", strokeDasharray: e.kind === "asserted_in" ? "4 3" : undefined },
      markerEnd: { type: MarkerType.ArrowClosed },
      labelStyle: { fontSize: 11 },
    }));
    const placed = nodes.map((n, i) => ({ position: n.position, year: data.nodes[i].year }));
    const known = data.nodes.map((n) => n.year).filter((y): y is number => y !== null);
    const range = known.length ? { first: Math.min(...known), last: Math.max(...known) } : null;
    return { nodes, edges, placed, range };
  }, [data]);

  const show = useCallback(
    (s: Span, animate: boolean) => {
      const el = box.current;
      if (!flow.current || !el || placed.length === 0) return;
      const v = viewportFor(placed, s, { width: el.clientWidth, height: el.clientHeight });
      flow.current.setViewport(v, animate ? { duration: 250 } : undefined);
    },
    [placed],
  );
  // New data (a filter changed) opens on the chosen span again.
  useEffect(() => show(span, false), [show, span]);

  if (data.nodes.length === 0) return <p className="text-ink-2">No trails match these filters.</p>;
  const spanText = (s: Span) => {
    if (!range) return "All years";
    if (s === "all") return `All years (${range.first}–${range.last})`;
    const n = s === "decade" ? 10 : 20;
    return `Last ${n} years (${Math.max(range.first, range.last - n + 1)}–${range.last})`;
  };
  const spans: Span[] = !range
    ? ["all"]
    : range.last - range.first < 10
      ? ["all"]
      : range.last - range.first < 20
        ? ["decade", "all"]
        : ["decade", "two-decades", "all"];
  return (
    <div>
      <div className="mb-2 flex flex-wrap items-center gap-3 text-sm">
        {spans.length > 1 && (
          <label className="inline-flex items-center gap-2">
            <span className="font-medium">Years shown</span>
            <select
              value={span}
              onChange={(e) => setSpan(e.target.value as Span)}
              className="rounded border border-rule bg-paper px-2 py-1"
            >
              {spans.map((s) => (
                <option key={s} value={s}>
                  {spanText(s)}
                </option>
              ))}
            </select>
          </label>
        )}
        {span !== "all" && spans.length > 1 && (
          <button type="button" className="underline" onClick={() => setSpan("all")}>
            Show all years
          </button>
        )}
        <span className="text-ink-2">
          Older years are to the left: drag to pan, use + and − to zoom. {LABELS.trailEnd.methods_source}: thick border;
          unresolved reference: dashed.
        </span>
      </div>
      <div style={{ height: HEIGHT }} className="rounded border border-rule" aria-hidden="true" ref={box}>
        <ReactFlow
          nodes={nodes}
          edges={edges}
          minZoom={0.1}
          maxZoom={2}
          nodesDraggable={false}
          onInit={(inst) => {
            flow.current = inst as unknown as ReactFlowInstance;
            show(span, false);
          }}
          onNodeClick={(_, n) => {
            const h = (n.data as { href?: string }).href;
            if (h) router.push(h);
          }}
        >
          <Background />
          <Controls showInteractive={false} />
        </ReactFlow>
      </div>
      <ul className="mt-3 space-y-1 text-sm" aria-label="Trail steps">
        {data.nodes.map((n) => (
          <li key={n.id}>
            {n.href ? (
              <a className="underline" href={n.href}>
                {n.year ?? "n.d."} · {n.label}
              </a>
            ) : (
              <span>{n.label}</span>
            )}
            {n.kind === "statement" && (
              <>
                {" "}
                ·{" "}
                <a className="underline" href={`/trails/${n.id.slice("statement:".length)}`}>
                  its trail
                </a>
              </>
            )}
            {n.end && <span className="text-ink-2"> · {labelOf("trailEnd", n.end)}</span>}
            {n.sentence && <span className="evidence block text-ink-2">“{n.sentence}”</span>}
          </li>
        ))}
      </ul>
    </div>
  );
}
