/**
 * Where the trail graph's camera starts. A practice spans decades; fitting every year into the box
 * shrinks the labels past reading, so the graph opens on the most recent decade at a legible zoom
 * and widens only when asked.
 */
export const NODE_W = 220;
export const NODE_H = 70;
const PAD = 24;
/** Below this zoom the 12px labels are no longer readable; a "recent years" view never goes under it. */
export const LEGIBLE_ZOOM = 0.8;
const MAX_ZOOM = 1.2;

export type Span = "decade" | "two-decades" | "all";
export type Viewport = { x: number; y: number; zoom: number };

/**
 * The viewport for a span of years: the span's nodes as large as fits (never under LEGIBLE_ZOOM
 * unless all years were asked for), centred when they fit, else with the most recent year at the
 * right edge and the first row at the top. Screen position = position × zoom + (x, y).
 */
export function viewportFor(
  nodes: { position: { x: number; y: number }; year: number | null }[],
  span: Span,
  box: { width: number; height: number },
): Viewport {
  const years = nodes.map((n) => n.year).filter((y): y is number => y !== null);
  const latest = years.length ? Math.max(...years) : null;
  const from = latest === null || span === "all" ? -Infinity : latest - (span === "decade" ? 9 : 19);
  const shown = nodes.filter((n) => n.year !== null && n.year >= from);
  const set = span === "all" || shown.length === 0 ? nodes : shown;
  if (set.length === 0) return { x: 0, y: 0, zoom: 1 };
  const minX = Math.min(...set.map((n) => n.position.x));
  const maxX = Math.max(...set.map((n) => n.position.x)) + NODE_W;
  const minY = Math.min(...set.map((n) => n.position.y));
  const maxY = Math.max(...set.map((n) => n.position.y)) + NODE_H;
  const fit = Math.min((box.width - 2 * PAD) / (maxX - minX), (box.height - 2 * PAD) / (maxY - minY));
  const zoom = Math.min(MAX_ZOOM, span === "all" ? Math.max(0.05, fit) : Math.max(LEGIBLE_ZOOM, fit));
  const contentW = (maxX - minX) * zoom;
  const x = contentW <= box.width - 2 * PAD ? (box.width - contentW) / 2 - minX * zoom : box.width - PAD - maxX * zoom;
  const contentH = (maxY - minY) * zoom;
  const y = contentH <= box.height - 2 * PAD ? (box.height - contentH) / 2 - minY * zoom : PAD - minY * zoom;
  return { x, y, zoom };
}
