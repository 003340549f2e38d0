"use client";
import "@xyflow/react/dist/style.css";
import { useMemo } from "react";
import { useRouter } from "next/navigation";
import { ReactFlow, Background, Controls, MarkerType, type Edge, type Node } from "@xyflow/react";
import type { GraphEdge, GraphNode } from "@/lib/dashboards/trail-view";

export type TrailGraphData = { nodes: GraphNode[]; edges: GraphEdge[] };

const END_LABEL: Record<string, string> = {
  methods_source: "methods source",
  empirical_precedent: "empirical precedent",
  unclassified: "not yet typed",
  unresolved: "unresolved",
  no_citation: "cites nothing",
};

/**
 * Articles and works laid out by year (x) so a chain reads left to right in time; each edge carries
 * the citation's locator. Clicking a statement opens the sentence in its article; a work, its page.
 * Every node is also a link in the list below the graph, for keyboards and screen readers.
 */
export function TrailGraph({ data }: { data: TrailGraphData }) {
  const router = useRouter();
  const { nodes, edges } = useMemo(() => {
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
            ? n.workType === "methods_source"
              ? "methods source"
              : (n.workType ?? "work")
            : "unresolved";
      return {
        id: n.id,
        position: { x: c * 240, y: r * 90 },
        data: {
          label: `${n.year ?? "n.d."} · ${n.label} [${kind}]${n.end ? ` → ${END_LABEL[n.end] ?? n.end}` : ""}`,
          href: n.href,
        },
        style: {
          background: "var(--paper)",
          color: "var(--ink)",
          border: `${n.kind === "work" && n.workType === "methods_source" ? 3 : 1}px ${n.kind === "unresolved" ? "dashed" : "solid"} var(--ink-2)`,
          fontSize: 11,
          width: 200,
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
      labelStyle: { fontSize: 10 },
    }));
    return { nodes, edges };
  }, [data]);
  if (data.nodes.length === 0) return <p className="text-ink-2">No trails match these filters.</p>;
  return (
    <div>
      <div style={{ height: 520 }} className="rounded border border-rule" aria-hidden="true">
        {/* A practice over decades is far wider than the box: fitting it all would shrink the labels
            past reading, so the first view stops at a legible zoom; drag to pan, the controls zoom out. */}
        <ReactFlow
          nodes={nodes}
          edges={edges}
          fitView
          fitViewOptions={{ minZoom: 0.6 }}
          minZoom={0.1}
          nodesDraggable={false}
          onNodeClick={(_, n) => {
            const h = (n.data as { href?: string }).href;
            if (h) router.push(h);
          }}
        >
          <Background />
          <Controls />
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
            {n.sentence && <span className="evidence block text-ink-2">“{n.sentence}”</span>}
          </li>
        ))}
      </ul>
    </div>
  );
}
