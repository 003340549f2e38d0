// Reading order of a PDF page rebuilt from the positions of its text items. pdf.js hands text over in
// content-stream (drawing) order, which is the reading order only when the producer drew the page
// column by column; journal PDFs are often drawn line by line across both columns, or in other
// orders. Here the page is cut into horizontal zones (full-width lines, and runs of two-column
// lines), a column gutter is looked for per page, and each two-column zone is read left column top to
// bottom, then right column. Pure geometry, no pdf.js types, so it can be tested on invented items.

/** One pdf.js text item, reduced to what the geometry needs (pdf.js `TextItem`). */
export type PositionedItem = {
  str: string;
  /** pdf.js transform [a, b, c, d, e, f]: e, f = origin of the baseline in PDF user space (y grows upwards). */
  transform: readonly number[];
  width: number;
  height: number;
  /** True when pdf.js reports the item's font as monospaced (its text style's fontFamily "monospace"). */
  mono?: boolean;
};

/** One line of a page in reading order; `mono` when most of its characters are set in a monospaced font. */
export type PageLine = { text: string; mono: boolean };

type Segment = { x0: number; x1: number; y: number; size: number; text: string; monoChars: number; chars: number };
type Row = { y: number; size: number; segs: Segment[] };

const median = (xs: number[]): number => {
  if (!xs.length) return 0;
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)];
};

/** Glue item texts of one line, adding a space where the items leave a visible gap. */
function glue(parts: { x0: number; x1: number; text: string; size: number }[]): string {
  let out = "";
  let lastX1 = Number.NEGATIVE_INFINITY;
  for (const p of parts) {
    // A gap wider than ~0.15 em reads as a word space (common practice, no source).
    if (out && p.x0 - lastX1 > 0.15 * p.size && !/\s$/.test(out) && !/^\s/.test(p.text)) out += " ";
    out += p.text;
    lastX1 = Math.max(lastX1, p.x1);
  }
  return out;
}

// Rotated text (margin notes, watermarks, vertical table heads) has no place in the line grid.
const isRotated = (it: PositionedItem) => Math.abs(it.transform[1]) > 1e-3 || Math.abs(it.transform[2]) > 1e-3;

/** Items on one baseline, split where the horizontal gap is wider than most word spaces. */
function rowsOf(items: PositionedItem[]): Row[] {
  const pieces = items
    .filter((it) => it.str.trim() && it.transform.length >= 6 && !isRotated(it))
    .map((it) => {
      const [, , c, d, e, f] = it.transform;
      const size = Math.hypot(c, d) || it.height || 1;
      const chars = it.str.replace(/\s/g, "").length;
      return { x0: e, x1: e + Math.max(0, it.width), y: f, size, text: it.str, chars, monoChars: it.mono ? chars : 0 };
    })
    .sort((a, b) => b.y - a.y || a.x0 - b.x0);
  type Piece = (typeof pieces)[number];
  const groups: { y: number; size: number; pieces: Piece[] }[] = [];
  for (const p of pieces) {
    const cur = groups.at(-1);
    // Baselines within 0.45 em of the larger font share a line: raised citation numbers and
    // subscripts stay on it, while lines of one column are at least 1 em apart. The line's baseline
    // is that of its largest type, not of a superscript that happened to come first.
    if (cur && Math.abs(cur.y - p.y) <= 0.45 * Math.max(cur.size, p.size)) {
      cur.pieces.push(p);
      if (p.size > cur.size) Object.assign(cur, { y: p.y, size: p.size });
    } else groups.push({ y: p.y, size: p.size, pieces: [p] });
  }
  const rows: Row[] = [];
  for (const g of groups) {
    const ps = g.pieces.sort((a, b) => a.x0 - b.x0);
    const row: Row = { y: g.y, size: median(ps.map((p) => p.size)), segs: [] };
    rows.push(row);
    let group: typeof ps = [];
    const flush = () => {
      if (!group.length) return;
      row.segs.push({
        x0: group[0].x0,
        x1: Math.max(...group.map((g) => g.x1)),
        y: row.y,
        size: row.size,
        text: glue(group),
        chars: group.reduce((n, g) => n + g.chars, 0),
        monoChars: group.reduce((n, g) => n + g.monoChars, 0),
      });
      group = [];
    };
    let lastX1 = Number.NEGATIVE_INFINITY;
    for (const p of ps) {
      // More than 0.8 em of white between items on one baseline: a separate segment (maybe a column
      // gutter, maybe a wide justified space; later steps join segments on the same side again).
      if (group.length && p.x0 - lastX1 > 0.8 * row.size) flush();
      group.push(p);
      lastX1 = Math.max(lastX1, p.x1);
    }
    flush();
  }
  return rows;
}

/**
 * A vertical band of white that most segments keep clear of, in the middle half of the text block,
 * with enough lines on both sides to be two columns. Coverage is counted on a 1 pt grid, so the cost
 * is linear in segments plus page width.
 */
function findGutter(rows: Row[]): { from: number; to: number } | null {
  const segs = rows.flatMap((r) => r.segs);
  if (segs.length < 6) return null;
  const minX = Math.min(...segs.map((s) => s.x0));
  const maxX = Math.max(...segs.map((s) => s.x1));
  const width = Math.ceil(maxX - minX);
  if (width < 50) return null;
  const diff = new Int32Array(width + 2);
  for (const s of segs) {
    diff[Math.max(0, Math.floor(s.x0 - minX))]++;
    diff[Math.min(width + 1, Math.ceil(s.x1 - minX))]--;
  }
  const cover = new Int32Array(width + 1);
  let run = 0;
  for (let i = 0; i <= width; i++) cover[i] = run += diff[i];
  // Full-width lines (title, abstract, running heads) may cross the gutter; columns may not.
  const allowed = Math.max(1, Math.floor(segs.length * 0.15));
  const lo = Math.floor(width * 0.25);
  const hi = Math.ceil(width * 0.75);
  let best: { from: number; to: number } | null = null;
  for (let i = lo; i <= hi; i++) {
    if (cover[i] > allowed) continue;
    let j = i;
    while (j + 1 <= hi && cover[j + 1] <= allowed) j++;
    // Extend to the real edges of the white band, beyond the middle half if need be.
    let a = i;
    let b = j;
    while (a - 1 >= 0 && cover[a - 1] <= allowed) a--;
    while (b + 1 <= width && cover[b + 1] <= allowed) b++;
    if (!best || b - a > best.to - best.from) best = { from: a, to: b };
    i = j;
  }
  if (!best) return null;
  const from = minX + best.from;
  const to = minX + best.to + 1;
  const bodySize = median(segs.map((s) => s.size));
  // A gutter is at least half an em wide (common practice, no source).
  if (to - from < 0.5 * bodySize) return null;
  const left = segs.filter((s) => s.x1 <= from + 0.5).length;
  const right = segs.filter((s) => s.x0 >= to - 0.5).length;
  // Both columns must carry a real share of the lines, or it is a ragged single column or a table edge.
  if (left < 3 || right < 3 || left < segs.length * 0.2 || right < segs.length * 0.2) return null;
  return { from, to };
}

/** The text of one page in reading order, one line per row (and per column side), "\n" between. */
export function pageTextInReadingOrder(items: PositionedItem[]): string {
  return pageLinesInReadingOrder(items)
    .map((l) => l.text)
    .join("\n");
}

/**
 * The lines of one page in reading order. An empty line stands for white between two lines of one
 * column that is taller than a paragraph break (more than 1.6 line pitches; common practice, no
 * source): the miner ends a sentence there even when the paragraph has no final full stop.
 */
export function pageLinesInReadingOrder(items: PositionedItem[]): PageLine[] {
  const rotated = items
    .filter((it) => it.str.trim() && it.transform.length >= 6 && isRotated(it))
    .map((it): PageLine => ({ text: it.str.trim(), mono: false }));
  const body = bodyInReadingOrder(rowsOf(items));
  // Rotated text goes after the body, in drawing order, so it cannot split a sentence.
  return [...body, ...rotated];
}

/** A line from segments: its text, and whether most of its characters are monospaced (≥ 60%; common practice, no source). */
function lineOf(segs: Segment[]): PageLine {
  const chars = segs.reduce((n, s) => n + s.chars, 0);
  const mono = segs.reduce((n, s) => n + s.monoChars, 0);
  return { text: glue(segs), mono: chars > 0 && mono >= 0.6 * chars };
}

type Placed = { y: number; x0: number; x1: number; size: number; line: PageLine };

const placed = (y: number, segs: Segment[]): Placed => ({
  y,
  x0: Math.min(...segs.map((s) => s.x0)),
  x1: Math.max(...segs.map((s) => s.x1)),
  size: median(segs.map((s) => s.size)),
  line: lineOf(segs),
});

/**
 * Lines of rows read top to bottom, with an empty line at a paragraph break: white between two rows
 * taller than 1.6 line pitches, or a line that stops well short of the column's right edge (more than
 * 3 em and a tenth of the column) in justified type, followed by one that starts indented or at the
 * left edge (the last line of a paragraph set without extra space). Common practice of typesetting, no source.
 */
function withGaps(rows: Placed[], pitch: number): PageLine[] {
  const out: PageLine[] = [];
  const left = Math.min(...rows.map((r) => r.x0));
  const right = Math.max(...rows.map((r) => r.x1));
  const width = right - left;
  // The short-line rule needs justified type (most lines reach the right edge); ragged-right text has
  // short lines everywhere.
  const justified = rows.filter((r) => right - r.x1 < r.size).length >= 0.5 * rows.length;
  let prev: Placed | null = null;
  for (const r of rows) {
    if (prev) {
      const gap = pitch > 0 && prev.y - r.y > 1.6 * pitch;
      const short = justified && rows.length >= 4 && right - prev.x1 > Math.max(3 * prev.size, 0.1 * width);
      const startsLine = r.x0 - left < 3 * r.size;
      if (gap || (short && startsLine && prev.line.text && r.line.text)) out.push({ text: "", mono: false });
    }
    out.push(r.line);
    prev = r;
  }
  return out;
}

function bodyInReadingOrder(rows: Row[]): PageLine[] {
  if (!rows.length) return [];
  const gutter = findGutter(rows);
  if (!gutter) {
    const steps = rows.slice(1).map((r, i) => rows[i].y - r.y);
    const pitch = median(steps.filter((s) => s > 0)) || median(rows.map((r) => r.size)) * 1.2;
    return withGaps(
      rows.map((r) => placed(r.y, r.segs)),
      pitch,
    );
  }
  const mid = (gutter.from + gutter.to) / 2;
  const spans = (s: Segment) => s.x0 < gutter.from - 0.5 && s.x1 > gutter.to + 0.5;
  // Line pitch within one column: the step from one row to the next on the same side.
  const steps: number[] = [];
  let lastLeft: number | null = null;
  let lastRight: number | null = null;
  for (const r of rows) {
    if (r.segs.some((s) => s.x1 <= mid)) {
      if (lastLeft !== null) steps.push(lastLeft - r.y);
      lastLeft = r.y;
    }
    if (r.segs.some((s) => s.x0 >= mid)) {
      if (lastRight !== null) steps.push(lastRight - r.y);
      lastRight = r.y;
    }
  }
  const pitch = median(steps.filter((s) => s > 0)) || median(rows.map((r) => r.size)) * 1.2;

  type Zone = { kind: "full" | "columns"; rows: Row[] };
  const zones: Zone[] = [];
  let prevY: number | null = null;
  for (const r of rows) {
    const kind: Zone["kind"] = r.segs.some(spans) ? "full" : "columns";
    const last = zones.at(-1);
    // White across the whole page taller than ~2 line pitches ends a zone: that is where running
    // heads and footers sit apart from the columns. A heading gap in one column is not enough, as
    // the other column still has lines there.
    const gapBreak = prevY !== null && prevY - r.y > 2 * pitch;
    if (last && last.kind === kind && !gapBreak) last.rows.push(r);
    else zones.push({ kind, rows: [r] });
    prevY = r.y;
  }

  const out: PageLine[] = [];
  for (const z of zones) {
    if (z.kind === "full") {
      out.push(
        ...withGaps(
          z.rows.map((r) => placed(r.y, r.segs)),
          pitch,
        ),
      );
      continue;
    }
    // A segment belongs to the side that holds most of it.
    const isLeft = (s: Segment) => mid - s.x0 >= s.x1 - mid;
    for (const left of [true, false]) {
      const side: Placed[] = [];
      for (const r of z.rows) {
        const segs = r.segs.filter((s) => isLeft(s) === left);
        if (segs.length) side.push(placed(r.y, segs));
      }
      out.push(...withGaps(side, pitch));
    }
  }
  return out;
}
