// Repairs for text taken from a PDF text layer, page by page.

const LIGATURES: Record<string, string> = { ﬁ: "fi", ﬂ: "fl", ﬀ: "ff", ﬃ: "ffi", ﬄ: "ffl", ﬅ: "st", ﬆ: "st" };

export function fixLigatures(text: string): string {
  return text.replace(/[ﬀ-ﬆ]/g, (c) => LIGATURES[c] ?? c);
}

// Prefixes that usually form real compounds ("self-report", "item-total", "two-factor"): when a line
// breaks after one of them the hyphen is kept, unless the document itself spells the joined word.
const KEEP_HYPHEN_PREFIX =
  /(?:^|[^\p{L}])(self|non|cross|item|well|quasi|semi|multi|two|one|three|four|five|six|seven|eight|nine|ten|first|second|third|test|follow|early|late|long|short|high|low)-$/iu;

/**
 * Join words broken at line ends. "relia-\nbility" → "reliability"; a hyphen before a capital or a
 * digit, or after a compound-forming prefix, is a real hyphen ("item-\ntotal" → "item-total",
 * "Kaiser-\nMeyer"). The document's own vocabulary decides first: if it writes "item-total" elsewhere
 * the hyphen stays, if it writes "comprises" elsewhere the parts are joined.
 */
export function joinHyphenated(text: string, vocabulary: Set<string> = new Set()): string {
  // The look-behind only starts matches at a word's first letter, where the leftmost match starts
  // anyway; without it every letter of every word was tried as a start (quadratic in word length).
  return text.replace(/(?<!\p{L})(\p{L}+)-[ \t]*\n[ \t]*([\p{L}\d]+)/gu, (m, a: string, b: string) => {
    const joined = `${a}${b}`.toLowerCase();
    const hyphened = `${a}-${b}`.toLowerCase();
    if (vocabulary.has(hyphened)) return `${a}-${b}`;
    if (vocabulary.has(joined)) return `${a}${b}`;
    if (/^[\p{Lu}\d]/u.test(b) || KEEP_HYPHEN_PREFIX.test(`${a}-`)) return `${a}-${b}`;
    return `${a}${b}`;
  });
}

function vocabularyOf(pages: string[]): Set<string> {
  const v = new Set<string>();
  for (const p of pages) {
    // words not broken at a line end
    for (const m of p.matchAll(/(?<![\p{L}-])[\p{L}]+(?:-[\p{L}]+)*(?![\p{L}]|-\s*\n)/gu)) v.add(m[0].toLowerCase());
  }
  return v;
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
        // Short pages (a title page, a table) have no body to tell running lines from.
        if (
          edgeIdx.has(i) &&
          nonEmptyIdx.length >= 6 &&
          pages.length >= 2 &&
          (edgeCount.get(norm(l)) ?? 0) >= minPages &&
          t.length < 160
        )
          return false;
        return true;
      })
      .join("\n");
  });
}

export function repairPages(pages: string[]): string[] {
  const cleaned = removeRunningLines(pages.map((p) => fixLigatures(p.replace(/\r\n?/g, "\n"))));
  const vocabulary = vocabularyOf(cleaned);
  return cleaned.map((p) => joinHyphenated(p, vocabulary));
}

/**
 * Decimals broken by extraction or typesetting, repaired so that no sentence ends at them: "0. 70"
 * (a line or item break after the point) → "0.70"; "= . 70" → "= .70"; the middle dot of journals
 * that set decimals with it ("0·70", "12·5") → "0.70". A full stop after a zero before a number is not
 * a sentence end in prose ("0. 70 …" never is), so only a lone leading zero is joined; "in 2010. 70
 * participants" stays as it is. The replacement keeps the text's length where it can (positions of later
 * sentences are found by search, not offset). Measured on none: a rule of thumb, no source.
 */
export function repairDecimals(text: string): string {
  return text
    .replace(/(?<![\d.,])0\. (\d)/g, "0.$1")
    .replace(/([=<>≤≥]\s?)\. (\d)/g, "$1.$2")
    .replace(/(\d)·(\d)/g, "$1.$2");
}
