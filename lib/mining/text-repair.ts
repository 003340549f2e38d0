// Repairs for text taken from a PDF text layer, page by page.

const LIGATURES: Record<string, string> = { "ﬁ": "fi", "ﬂ": "fl", "ﬀ": "ff", "ﬃ": "ffi", "ﬄ": "ffl", "ﬅ": "st", "ﬆ": "st" };

export function fixLigatures(text: string): string {
  return text.replace(/[ﬀ-ﬆ]/g, (c) => LIGATURES[c] ?? c);
}

// Prefixes that keep their hyphen when a line breaks after them ("self-\nreport" stays "self-report").
const KEEP_HYPHEN_PREFIX = /(?:^|[^\p{L}])(self|non|co|cross|item|well|multi|semi|quasi|pre|post|re|anti|inter|intra|two|one|three|four|five|six|seven|eight|nine|ten|first|second|third|high|low|long|short|full|part|test|follow|sub|meta|socio|web|time|long|large|small)-$/iu;

/**
 * Join words broken at line ends. "relia-\nbility" → "reliability"; a hyphen after a known prefix or
 * before a capital or a digit is a real hyphen ("item-\ntotal" → "item-total", "Kaiser-\nMeyer").
 */
export function joinHyphenated(text: string): string {
  return text.replace(/([\p{L}]+)-[ \t]*\n[ \t]*([\p{L}\d]+)/gu, (m, a: string, b: string) => {
    if (/^[\p{Lu}\d]/u.test(b) || KEEP_HYPHEN_PREFIX.test(`${a}-`)) return `${a}-${b}`;
    return `${a}${b}`;
  });
}

/** Remove lines repeated at the top or bottom of most pages (running heads, footers) and bare page numbers. */
export function removeRunningLines(pages: string[]): string[] {
  const lines = pages.map((p) => p.split("\n"));
  const norm = (l: string) => l.trim().replace(/\d+/g, "#").replace(/\s+/g, " ").toLowerCase();
  const edgeCount = new Map<string, number>();
  for (const ls of lines) {
    const nonEmpty = ls.filter((l) => l.trim());
    const edges = new Set([...nonEmpty.slice(0, 2), ...nonEmpty.slice(-2)].map(norm));
    for (const e of edges) edgeCount.set(e, (edgeCount.get(e) ?? 0) + 1);
  }
  const minPages = Math.max(2, Math.ceil(pages.length * 0.5));
  return lines.map((ls) => {
    const nonEmptyIdx = ls.map((l, i) => (l.trim() ? i : -1)).filter((i) => i >= 0);
    const edgeIdx = new Set([...nonEmptyIdx.slice(0, 2), ...nonEmptyIdx.slice(-2)]);
    return ls
      .filter((l, i) => {
        const t = l.trim();
        if (!t) return true;
        if (edgeIdx.has(i) && /^(?:page\s+)?\d{1,4}(?:\s*(?:of|\/)\s*\d{1,4})?$/i.test(t)) return false;
        if (edgeIdx.has(i) && pages.length >= 2 && (edgeCount.get(norm(l)) ?? 0) >= minPages && t.length < 160) return false;
        return true;
      })
      .join("\n");
  });
}

export function repairPages(pages: string[]): string[] {
  return removeRunningLines(pages.map((p) => fixLigatures(p.replace(/\r\n?/g, "\n")))).map(joinHyphenated);
}
