/** A mined sentence in the evidence face, with the matched number and the citations marked. */
type Cite = { authors: string; year: string | null };

function valuePatterns(value: number): RegExp {
  // ".70", "0.70", "0.7", "70%" are all the way methods text writes 0.70.
  const s = String(value);
  const [int, frac = ""] = s.split(".");
  const fracPart = frac ? `\\.${frac}0*` : "(?:\\.0+)?";
  const intPart = int === "0" ? "0?" : int;
  return new RegExp(`(?<![\\d.])${intPart}${fracPart}(?![\\d])`);
}

export function Evidence({
  sentence,
  value,
  citations,
}: {
  sentence: string;
  value: number | null;
  citations: Cite[];
}) {
  const ranges: { start: number; end: number; kind: "value" | "cite" }[] = [];
  for (const c of citations) {
    const first = c.authors.split(/[\s,&]+/).find((w) => w.length > 1);
    if (!first) continue;
    const at = sentence.indexOf(first);
    if (at < 0) continue;
    const yearAt = c.year ? sentence.indexOf(c.year, at) : -1;
    const end = yearAt >= 0 && yearAt - at < 120 ? yearAt + c.year!.length : at + first.length;
    ranges.push({ start: at, end, kind: "cite" });
  }
  if (value !== null) {
    const m = valuePatterns(value).exec(sentence);
    if (m && !ranges.some((r) => m.index < r.end && m.index + m[0].length > r.start))
      ranges.push({ start: m.index, end: m.index + m[0].length, kind: "value" });
  }
  ranges.sort((a, b) => a.start - b.start);
  const parts: React.ReactNode[] = [];
  let pos = 0;
  ranges.forEach((r, i) => {
    if (r.start < pos) return;
    parts.push(sentence.slice(pos, r.start));
    parts.push(
      <mark key={i} className={r.kind}>
        {sentence.slice(r.start, r.end)}
      </mark>,
    );
    pos = r.end;
  });
  parts.push(sentence.slice(pos));
  return <p className="evidence">{parts}</p>;
}
