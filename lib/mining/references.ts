// Reference list: split into entries and parse each (APA-like author–year entries and numbered entries).
import type { Reference } from "./contract";

const DOI_RE = /(?:https?:\/\/(?:dx\.)?doi\.org\/|doi:\s*|\b)(10\.\d{4,9}\/[^\s"<>]+)/i;

export function normaliseDoi(raw: string): string | null {
  const m = DOI_RE.exec(raw);
  if (!m) return null;
  return m[1].replace(/[.,;)\]]+$/, "").toLowerCase();
}

const NUMBERED_START = /^\s*(?:\[(\d{1,4})\]|(\d{1,4})\.\s)/;
const APA_START =
  /^\s*(?:\p{Lu}[\p{L}'’-]+(?:\s\p{Lu}[\p{L}'’-]+)*,\s(?:\p{Lu}\.\s?)+|\p{Lu}[\p{L}'’-]+ (?:et al\.|[A-Z]{2,}))/u;
const YEAR_PAREN = /\((1[6-9]\d{2}|20\d{2})[a-z]?(?:,[^)]*)?\)|\((n\.d\.|in press)\)/;

/** Split the text after a "References" heading into entries. Lines are joined until the next entry start. */
export function splitReferences(text: string): string[] {
  const lines = text
    .split("\n")
    .map((l) => l.trim())
    .filter(Boolean);
  const numbered = lines.filter((l) => NUMBERED_START.test(l)).length >= Math.max(2, lines.length * 0.3);
  const entries: string[] = [];
  for (const line of lines) {
    const starts = numbered
      ? NUMBERED_START.test(line)
      : APA_START.test(line) && (YEAR_PAREN.test(line) || /\b(1[6-9]\d{2}|20\d{2})\b/.test(line.slice(0, 120)));
    if (starts || entries.length === 0) entries.push(line);
    else {
      const prev = entries[entries.length - 1];
      // A line that ends in a hyphen inside a word was broken by layout; a DOI or URL continues without a space.
      if (/[\p{Ll}]-$/u.test(prev) && /^\p{Ll}/u.test(line)) entries[entries.length - 1] = prev.slice(0, -1) + line;
      else if (/(\/|\.)$/.test(prev) && /^[\w./-]+$/.test(line) && /doi|https?:/i.test(prev))
        entries[entries.length - 1] = prev + line;
      else entries[entries.length - 1] = `${prev} ${line}`;
    }
  }
  return entries.flatMap(splitRunIn);
}

// Run-in reference lists (entries set one after another in a block, not each on its own line; or
// lines whose starts the patterns above do not know, such as "Okafor EA (1994).") come out of the
// line pass as one entry holding several works. Such an entry is split again where a new work starts:
// before each author list followed by a parenthesised year, at consecutively numbered starts ("[1] …
// [2] …", "1. … 2. …"), or, for styles that put the year last, after "…, 1987." followed by a name.
const YEAR_PAREN_G = new RegExp(YEAR_PAREN.source, "g");
const NAME_TOKEN =
  /^(?:\p{Lu}[\p{L}'’-]*[,;]?|\p{Lu}\.(?:-?\p{Lu}\.)*[,;]?|&|and|et|al\.?,?|van|von|de|der|den|du|da|di|la|le|Jr\.?,?|Sr\.?,?|\.\.\.,?|…,?)$/u;
/** Where the author list that ends at `end` begins (walking back over name-like words), or null. */
function authorStart(text: string, end: number): number | null {
  const head = text.slice(0, end);
  const tokens = [...head.matchAll(/\S+/g)];
  let start: number | null = null;
  for (let i = tokens.length - 1, n = 0; i >= 0 && n < 40; i--, n++) {
    const tok = tokens[i][0];
    // A capitalised word closed by a full stop ("Press.", "York.") ends the previous entry.
    if (!NAME_TOKEN.test(tok) || (/^\p{Lu}\p{L}{2,}\.$/u.test(tok) && !/^(?:Jr|Sr)\.$/.test(tok))) break;
    start = tokens[i].index;
  }
  return start;
}

function consecutiveStarts(text: string, re: RegExp): number[] {
  const out: number[] = [];
  let expect: number | null = null;
  for (const m of text.matchAll(re)) {
    const n = Number(m[1]);
    if (expect === null || n === expect) {
      out.push(m.index + (m[0].length - m[0].trimStart().length));
      expect = n + 1;
    }
  }
  return out;
}

function cutAt(text: string, starts: number[]): string[] {
  const cuts = [...new Set(starts)].filter((s) => s > 0).sort((a, b) => a - b);
  const out: string[] = [];
  let from = 0;
  for (const c of cuts) {
    const piece = text.slice(from, c).trim();
    if (piece) out.push(piece);
    from = c;
  }
  const last = text.slice(from).trim();
  if (last) out.push(last);
  return out;
}

export function splitRunIn(entry: string): string[] {
  if (entry.length < 120) return [entry];
  const bracketed = consecutiveStarts(entry, /(?:^|\s)\[(\d{1,4})\]\s/g);
  if (bracketed.length >= 2) return cutAt(entry, bracketed);
  const dotted = consecutiveStarts(entry, /(?:^|\s)(\d{1,4})\.\s+(?=\p{Lu})/gu);
  if (dotted.length >= 3 && dotted[0] === 0) return cutAt(entry, dotted);
  const years = [...entry.matchAll(YEAR_PAREN_G)];
  if (years.length >= 2) {
    const starts = years.map((m) => authorStart(entry, m.index)).filter((s): s is number => s !== null);
    return cutAt(entry, starts);
  }
  const yearLast = [...entry.matchAll(/\b(?:1[6-9]|20)\d{2}[a-z]?\.\s+(?=\p{Lu}[\p{L}'’-]*\.?\s)/gu)];
  if (yearLast.length >= 1)
    return cutAt(
      entry,
      yearLast.map((m) => m.index + m[0].length),
    );
  return [entry];
}

function clean(s: string | undefined | null): string | null {
  const t = (s ?? "")
    .replace(/\s+/g, " ")
    .replace(/^[\s,.;:"“”]+|[\s,.;:"“”]+$/g, "")
    .trim();
  return t || null;
}

function kindOf(rest: string, container: string | null): Reference["kind"] {
  if (
    /\bIn\s+(?:[^,]*\(Eds?\.\)|Proc\.|Proceedings|.*\bEds?\.)/.test(rest) ||
    /\bin\s+(?:Proc\.|Proceedings)/i.test(rest)
  )
    return "chapter";
  if (container && /\d+\s*(?:\(\d+[^)]*\))?\s*,\s*(?:e?\d+|pp?\.)/.test(rest)) return "article";
  if (/\bvol\.\s*\d+|\bno\.\s*\d+/i.test(rest) && container) return "article";
  if (/\(\d+(?:st|nd|rd|th)?\s*ed\.\)|\bed\.|edition|Press|Publishing|Books|Academic|House|University/i.test(rest))
    return "book";
  if (/unpublished|manuscript|thesis|dissertation|report|retrieved/i.test(rest)) return "other";
  return container ? "article" : "other";
}

function parseApa(raw: string): Omit<Reference, "raw" | "doi" | "number"> {
  const ym = YEAR_PAREN.exec(raw);
  const authorsPart = ym ? raw.slice(0, ym.index) : raw.split(/\.\s/)[0];
  const year = ym ? (ym[0].match(/(1[6-9]\d{2}|20\d{2})[a-z]?|n\.d\.|in press/)?.[0] ?? null) : null;
  const authors = authorsPart
    .replace(/,?\s*&\s*/g, ", ")
    .replace(/\.\.\./g, ",")
    .split(/(?<=\.)\s*,\s*/)
    .map((a) => a.trim().replace(/,$/, ""))
    .filter((a) => /\p{L}/u.test(a));
  const after = ym ? raw.slice(ym.index + ym[0].length).replace(/^\.\s*/, "") : "";
  // title ends at the first ". " that is not inside an initial; a chapter has "In Editors (Ed.), Book".
  const chapter = /^(.*?[.?!])\s+In\s+(.*?)\((?:Eds?\.)\),\s*(.*?)(?:\(|\.\s|$)/.exec(after);
  if (chapter) {
    return { authors, year, title: clean(chapter[1]), container: clean(chapter[3]), kind: "chapter" };
  }
  const tm = /^(.*?[.?!])(?:\s+|$)(.*)$/.exec(after);
  const title = clean(tm ? tm[1] : after);
  const rest = tm ? tm[2] : "";
  let container: string | null = null;
  const art = /^([^,]+?),\s*\d+/.exec(rest);
  if (art && !/Press|Publishing|Books|House/.test(art[1])) container = clean(art[1]);
  const kind = kindOf(after, container);
  return { authors, year, title, container: kind === "article" ? container : null, kind };
}

function parseNumberedBody(body: string): Omit<Reference, "raw" | "doi" | "number"> {
  // IEEE-like: A. Author, B. Author, and C. Author, "Title," Container, vol. 1, no. 2, pp. 3–4, 2010.
  const q = /^(.*?),\s*[“"](.+?)[,.]?[”"]\s*,?\s*(.*)$/.exec(body);
  const year = (body.match(/\b(1[6-9]\d{2}|20\d{2})[a-z]?\b(?![^()]*\)\s*[A-Z])/g) ?? []).at(-1) ?? null;
  if (q) {
    const authors = q[1]
      .split(/\s*,\s*(?:and\s+)?|\s+and\s+/)
      .map((a) => a.trim())
      .filter(Boolean);
    const rest = q[3];
    const chapter = /^in\s+/i.test(rest);
    const container = clean(
      rest.replace(/^in\s+/i, "").split(/,\s*(?:vol\.|no\.|pp\.|\d{4}|[A-Z]\.\s*\w+,?\s*Eds?\.)/)[0],
    );
    return { authors, year, title: clean(q[2]), container, kind: chapter ? "chapter" : "article" };
  }
  // Book: A. Author, Title, 2nd ed. Place: Publisher, 2010.
  const parts = body.split(/,\s*/);
  const authorParts: string[] = [];
  let i = 0;
  while (i < parts.length && /^(?:and\s+)?(?:\p{Lu}\.\s*)+[\p{Lu}][\p{L}'’-]+$/u.test(parts[i].trim())) {
    authorParts.push(parts[i].replace(/^and\s+/, "").trim());
    i++;
  }
  const title = clean(parts[i]);
  return {
    authors: authorParts,
    year,
    title,
    container: null,
    kind: /ed\.|Press|Books|Academic|Vale|House/.test(body) ? "book" : "other",
  };
}

export function parseReference(raw: string): Reference {
  const text = raw.replace(/\s+/g, " ").trim();
  const doi = normaliseDoi(text);
  const nm = NUMBERED_START.exec(text);
  if (nm) {
    const number = Number(nm[1] ?? nm[2]);
    const body = text.slice(nm[0].length).trim();
    const parsed =
      YEAR_PAREN.test(body.slice(0, 200)) && APA_START.test(body) ? parseApa(body) : parseNumberedBody(body);
    return { raw: text, doi, number, ...parsed, title: stripEdition(parsed.title) };
  }
  const parsed = parseApa(text);
  return { raw: text, doi, number: null, ...parsed, title: stripEdition(parsed.title) };
}

export function parseReferenceList(text: string): Reference[] {
  return splitReferences(text).map(parseReference);
}

function stripEdition(title: string | null): string | null {
  return title ? clean(title.replace(/\s*\((?:\d+(?:st|nd|rd|th)|Rev\.|Revised)\s*ed\.\)\s*$/i, "")) : null;
}
