import { describe, expect, it } from "vitest";
import { LEGIBLE_ZOOM, NODE_H, NODE_W, viewportFor } from "@/lib/trails/graph-viewport";

// Screen position = graph position × zoom + (x, y): the transform @xyflow/react applies for a
// viewport {x, y, zoom} (its documented Viewport type; from memory). Each check below places the
// nodes on screen with that transform and asks what a reader would see in the box.
const box = { width: 1200, height: 560 };
const onScreen = (v: { x: number; y: number; zoom: number }, n: { position: { x: number; y: number } }) => ({
  left: n.position.x * v.zoom + v.x,
  right: (n.position.x + NODE_W) * v.zoom + v.x,
  top: n.position.y * v.zoom + v.y,
  bottom: (n.position.y + NODE_H) * v.zoom + v.y,
});
const inside = (r: ReturnType<typeof onScreen>) =>
  r.left >= 0 && r.right <= box.width && r.top >= 0 && r.bottom <= box.height;

// 45 years, one column per year (260 apart), a few rows in some years: a practice's graph as the
// dashboard draws it.
const years = Array.from({ length: 45 }, (_, i) => 1980 + i);
const nodes = years.flatMap((year, c) =>
  Array.from({ length: 1 + (c % 3) }, (_, r) => ({ position: { x: c * 260, y: r * 96 }, year })),
);

describe("the trail graph's first view", () => {
  it("opens on the most recent years at a legible zoom, the latest year in view", () => {
    const v = viewportFor(nodes, "decade", box);
    expect(v.zoom).toBeGreaterThanOrEqual(LEGIBLE_ZOOM);
    for (const n of nodes.filter((x) => x.year === 2024)) expect(inside(onScreen(v, n))).toBe(true);
    // The oldest years are off to the left until the reader widens or pans.
    for (const n of nodes.filter((x) => x.year === 1980)) expect(onScreen(v, n).right).toBeLessThan(0);
  });

  it("shows every node when all years are asked for, even at a small zoom", () => {
    const v = viewportFor(nodes, "all", box);
    expect(v.zoom).toBeLessThan(LEGIBLE_ZOOM);
    for (const n of nodes) expect(inside(onScreen(v, n))).toBe(true);
  });

  it("centres a short trail that fits, without blowing it up", () => {
    const few = [2019, 2020, 2022].map((year, c) => ({ position: { x: c * 260, y: 0 }, year }));
    const v = viewportFor(few, "decade", box);
    expect(v.zoom).toBeLessThanOrEqual(1.2);
    for (const n of few) expect(inside(onScreen(v, n))).toBe(true);
    const first = onScreen(v, few[0]);
    const last = onScreen(v, few[2]);
    expect(Math.abs(first.left - (box.width - last.right))).toBeLessThan(1);
  });

  it("keeps nodes without a year in the picture when nothing has one", () => {
    const undated = [0, 1].map((r) => ({ position: { x: 0, y: r * 96 }, year: null }));
    const v = viewportFor(undated, "decade", box);
    for (const n of undated) expect(inside(onScreen(v, n))).toBe(true);
  });
});
