// In-text citations: author–year (parenthetical and narrative) and numbered ([12], [3, 5], [4–6], [4]–[6]).
// Decision on "as cited in": the work named before "as cited in" is the one the author did not read, so it
// is returned with secondary: true and citedIn = the work it was read in; the citing source is also
// returned on its own (secondary: false), because the author did read that one.
import type { Reference, StatementCitation } from "./contract";

// A generational suffix ("Jr", "Jr.", "Sr.", "III") stays with the surname it follows.
const SUFFIX = String.raw`(?:,?\s(?:Jr|Sr)\.?|\s(?:II|III|IV)\b)`;
const SURNAME = String.raw`(?<![\p{L}'’-])(?:(?:[Vv]an der|[Vv]an den|[Vv]an|[Vv]on|[Dd]e|[Dd]el|[Dd]ella|[Dd]a|[Dd]i|[Dd]u|[Dd]os|[Tt]en|[Tt]er|le|la|al|el)\s)?\p{Lu}[\p{L}'’]+(?:[-–]\p{Lu}?[\p{L}'’]+)*${SUFFIX}?`;
const AUTHORS = String.raw`${SURNAME}(?:\s+et\s+al\.?|(?:,\s*${SURNAME})*,?\s*(?:&|and)\s*${SURNAME})?`;
const YEAR = String.raw`(?:1[6-9]\d{2}|20\d{2})[a-z]?|n\.d\.|in press|forthcoming`;
// Locator terms after the Citation Style Language's locator list (page, chapter, section, paragraph,
// figure, table, note, volume, line, …), each followed by a number, roman numeral or range; "ff." /
// "f." (and following) may close it: "p. 361ff.", "pp. 12–14", "chap. 3", "sec. 2.1".
const FF = String.raw`(?:\s?ff?\.?(?![\p{L}]))?`;
const TERM = String.raw`(?:pp?\.?|pages?|[Cc]haps?\.|[Cc]hapters?|[Cc]h\.|[Ss]ecs?\.|[Ss]ections?|[Ss]ubsections?|§§?|paras?\.|paragraphs?|¶|[Ff]ig\.|[Ff]igs?\.|[Ff]igures?|[Tt]ables?|[Tt]heorems?|[Ll]emmas?|[Ee]quations?|[Ee]qs?\.|[Dd]efinitions?|[Aa]ppendix|[Ee]xamples?|notes?|n\.|vols?\.|ll?\.|lines?|art\.|bk\.|col\.|fol\.|op\.|pt\.|v\.|sub verbo|s\.v\.)`;
const TERM_LOC = String.raw`${TERM}\s*[\dA-Za-z]+(?:\.\d+)*${FF}(?:\s*[-–—]\s*[\dA-Za-z]+(?:\.\d+)*)?`;
// Several locators may follow one another: "p. 466, Table 22", "sections 2.10 and 2.16", "Section 7.5,
// especially Subsection 7.5.4".
const LOCATOR = String.raw`${TERM_LOC}(?:\s*(?:,|and|&)\s*(?:especially\s+)?(?:${TERM_LOC}|\d+(?:\.\d+)*(?:\s*[-–—]\s*\d+(?:\.\d+)*)?${FF}))*`;
// Harvard style puts a bare page after a colon: "(1978: 245)", "(2013:238)", "(Okafor 1994: 12–14)".
const COLON_PAGES = String.raw`[\dxivlc]+${FF}(?:\s*[-–—]\s*[\dxivlc]+)?(?:\s*,\s*\d+(?:\s*[-–—]\s*\d+)?)*`;
const LOCATED = String.raw`(?:\s*,\s*(${LOCATOR})|\s*:\s*(${COLON_PAGES}))`;
// "see", "e.g.,", "see also", "cf." and the like before a cited work; they may be stacked ("see, e.g.,").
const PREFIX = String.raw`(?:(?:[Ss]ee also|[Ss]ee|[Ee]\.g\.|[Ii]\.e\.|[Cc]f\.|[Aa]lso|[Ff]or example|[Ff]or a review, see|[Bb]ut see|[Cc]ompare|[Rr]eviewed in)[,:\s]+)*`;

const partRe = new RegExp(
  String.raw`^${PREFIX}(${AUTHORS}),?\s+((?:${YEAR})(?:\s*,\s*(?:${YEAR}))*)${LOCATED}?[.,;]?$`,
  "u",
);
// Inside the parentheses of a narrative citation "Okafor (1994, p. 12; Lind, 2000)" or
// "Okafor (1994, cited in Lind, 2000)": years, a locator, then more works or the work it was read in.
const yearsLocatorRe = new RegExp(
  String.raw`^((?:${YEAR})(?:\s*,\s*(?:${YEAR}))*)${LOCATED}?(?:\s*[,;]?\s*(?:as\s+)?(?:[Cc]ited|[Qq]uoted)\s+in:?\s+(.*)|\s*;\s*(.*))?$`,
  "u",
);
// The name and its parenthesis may touch ("Okafor(1978)"); a possessive is allowed ("Okafor's (1994)").
// Square brackets serve some styles as parentheses ("Okafor [1992]", "[Okafor, 2002; Lind, 2008]").
const narrativeRe = new RegExp(String.raw`(${AUTHORS})(?:['’]s)?\s*[(\[]([^()[\]]*)[)\]]`, "gu");
const notNames = new Set([
  "Table",
  "Tables",
  "Figure",
  "Figures",
  "Fig",
  "Study",
  "Studies",
  "Wave",
  "Sample",
  "Model",
  "Appendix",
  "Section",
  "Experiment",
  "Phase",
  "Time",
  "Grade",
  "Year",
  "In",
  "The",
  "Since",
  "During",
  "From",
  "Until",
  "After",
  "Before",
  "Version",
  "Step",
  "Stage",
  "Chapter",
  "Part",
  "Item",
  "Items",
  "Scale",
  "Round",
  "Trial",
  "Cohort",
  "Survey",
]);

function cleanLocator(l: string | undefined): string | null {
  return l ? l.replace(/\s+/g, " ").trim() : null;
}

// Sentence adverbs and connectives that a list of surnames may swallow when they open a sentence
// with a comma ("Originally, Bell and Okafor (2002)"); they are dropped from the front of the list.
const LEAD_WORDS = new Set(
  "However Moreover Thus Hence Therefore Furthermore Also Here Further Next Then Again Still Indeed Notably Instead Alternatively Specifically Following Like Unlike Both While Whereas Although Because Since Similarly Finally Recently Additionally Originally Conversely Nevertheless Nonetheless Meanwhile Later Earlier First Second Third Lastly Importantly Interestingly Consequently Accordingly Likewise Otherwise Yet So".split(
    " ",
  ),
);

function dropLeadWords(a: string): string {
  let t = a.trim();
  for (;;) {
    const m = /^(\p{Lu}[\p{L}]+),\s+(?=\p{Lu})/u.exec(t);
    if (!m || !(LEAD_WORDS.has(m[1]) || /ly$/.test(m[1]))) return t;
    t = t.slice(m[0].length);
  }
}

function normAuthors(a: string): string {
  const t = dropLeadWords(a)
    .replace(/\s+/g, " ")
    .trim()
    .replace(/\s+and\s+/g, " & ")
    .replace(/,\s*&/g, " &")
    .replace(/\bet al(?!\.)/, "et al.")
    .replace(/['’]s$/u, "");
  return t;
}

export type FoundCitation = StatementCitation;

function splitYears(years: string): string[] {
  return years.split(/\s*,\s*/).filter(Boolean);
}

/** One part of a parenthetical list, e.g. "Okafor & Lindqvist, 1994, p. 112" or "Whitcombe, 2000, as cited in X, 2014". */
function parsePart(part: string): FoundCitation[] {
  const p = part.trim().replace(/\s+/g, " ");
  // "as cited in", "cited in", "quoted in" (with or without "as"): the work before it was read second-hand.
  const ci = /^(.*?)[,;]?\s+(?:as\s+)?(?:cited|quoted)\s+in:?\s+(.*)$/i.exec(p);
  if (ci) {
    const original = parsePart(ci[1]);
    const citing = parsePart(ci[2]);
    if (original.length && citing.length) {
      return [
        ...original.map((o) => ({
          ...o,
          secondary: true,
          citedIn: { authors: citing[0].authors, year: citing[0].year },
        })),
        ...citing,
      ];
    }
    return [];
  }
  const m = partRe.exec(p);
  if (!m) return [];
  const authors = normAuthors(m[1]);
  if (notNames.has(authors.split(" ")[0])) return [];
  const years = splitYears(m[2]);
  const locator = cleanLocator(m[3] ?? m[4]);
  return years.map((year, i) => ({
    authors,
    year,
    locator: i === years.length - 1 ? locator : null,
    secondary: false,
  }));
}

function parseParenthetical(inner: string): FoundCitation[] {
  // Parts are separated by ";". A part without its own author ("2003, 2005") is not allowed after a ";".
  // Some authors separate works by a comma alone ("Okafor, 2002, Lind, 2014"): a part that does not
  // parse as a whole is tried again cut after each year that a name follows.
  const out: FoundCitation[] = [];
  for (const part of inner.split(/\s*;\s*/)) {
    const whole = parsePart(part);
    if (whole.length) {
      out.push(...whole);
      continue;
    }
    const pieces = part.split(/(?<=\b(?:1[6-9]\d{2}|20\d{2})[a-z]?),\s+(?=\p{Lu})/u);
    if (pieces.length > 1) for (const piece of pieces) out.push(...parsePart(piece));
  }
  return out;
}

function authorsFromReference(ref: Reference): string {
  const surnames = ref.authors
    .map((a) =>
      a
        .replace(/,.*$/, "")
        .replace(/^(?:\p{Lu}\.\s*)+/u, "")
        .trim(),
    )
    .filter(Boolean);
  if (surnames.length === 0) return ref.title ?? ref.raw.slice(0, 40);
  if (surnames.length === 1) return surnames[0];
  if (surnames.length === 2) return `${surnames[0]} & ${surnames[1]}`;
  return `${surnames[0]} et al.`;
}

function expandNumbers(spec: string): number[] {
  const nums: number[] = [];
  for (const piece of spec.split(/\s*,\s*/)) {
    const r = /^(\d+)\s*[-–—]\s*(\d+)$/.exec(piece);
    if (r) {
      const a = Number(r[1]);
      const b = Number(r[2]);
      if (b >= a && b - a < 50) for (let i = a; i <= b; i++) nums.push(i);
    } else if (/^\d+$/.test(piece)) nums.push(Number(piece));
  }
  return nums;
}

const numberedRe = new RegExp(
  String.raw`\[(\d+(?:\s*[-–—,]\s*\d+)*)(?:\s*,\s*(${LOCATOR}))?\](?:\s*[-–—]\s*\[(\d+)\])?`,
  "giu",
);

/** All in-text citations of one sentence, in order of appearance. */
export function findCitations(sentence: string, numbered: Map<number, Reference>): FoundCitation[] {
  // Every form below needs a bracket; most sentences have none, and the author patterns are costly.
  if (!sentence.includes("(") && !sentence.includes("[")) return [];
  const found: { at: number; c: FoundCitation[] }[] = [];
  const consumed: [number, number][] = [];
  // Parenthetical groups (balanced one level deep).
  for (const m of sentence.matchAll(/\(([^()]*(?:\([^()]*\)[^()]*)*)\)|\[([^[\]]*)\]/g)) {
    if (m[1] === undefined) {
      // [Okafor, 2002; Lind, 2008]: author–year inside square brackets.
      const c = /\p{L}{2}/u.test(m[2]) ? parseParenthetical(m[2]) : [];
      if (c.length) {
        found.push({ at: m.index!, c });
        consumed.push([m.index!, m.index! + m[0].length]);
      }
      continue;
    }
    const c = parseParenthetical(m[1]);
    if (c.length) {
      found.push({ at: m.index!, c });
      consumed.push([m.index!, m.index! + m[0].length]);
    }
  }
  for (const m of sentence.matchAll(narrativeRe)) {
    const start = m.index!;
    if (consumed.some(([a, b]) => start >= a && start < b)) continue;
    const authorsRaw = m[1];
    const first = authorsRaw.split(/\s/)[0];
    if (notNames.has(first)) continue;
    const inner = yearsLocatorRe.exec(m[2].trim());
    if (!inner) continue;
    const authors = normAuthors(authorsRaw);
    const years = splitYears(inner[1]);
    const locator = cleanLocator(inner[2] ?? inner[3]);
    const citing = inner[4] ? parseParenthetical(inner[4]) : [];
    const list: FoundCitation[] = years.map((year, i) => ({
      authors,
      year,
      locator: i === years.length - 1 ? locator : null,
      secondary: citing.length > 0,
      ...(citing.length ? { citedIn: { authors: citing[0].authors, year: citing[0].year } } : {}),
    }));
    list.push(...citing);
    if (inner[5]) list.push(...parseParenthetical(inner[5]));
    found.push({ at: start, c: list });
  }
  for (const m of sentence.matchAll(numberedRe)) {
    if (consumed.some(([a, b]) => m.index! >= a && m.index! < b)) continue;
    let nums = expandNumbers(m[1]);
    if (m[3]) {
      const last = nums.at(-1) ?? 0;
      const to = Number(m[3]);
      if (to > last && to - last < 50) for (let i = last + 1; i <= to; i++) nums.push(i);
    }
    // A year in square brackets ("Okafor [1992]") is no reference number unless the list has one that high.
    nums = nums.filter((n) => n > 0 && (numbered.size === 0 ? n < 1000 : numbered.has(n)));
    const list = nums.map((n, i): FoundCitation => {
      const ref = numbered.get(n);
      return {
        authors: ref ? authorsFromReference(ref) : `[${n}]`,
        year: ref?.year ?? "n.d.",
        locator: i === nums.length - 1 && m[2] ? m[2].replace(/\s+/g, " ") : null,
        secondary: false,
        number: n,
      };
    });
    if (list.length) found.push({ at: m.index!, c: list });
  }
  attachDetachedLocators(sentence, found);
  return found.sort((a, b) => a.at - b.at).flatMap((f) => f.c);
}

const loneLocatorRe = new RegExp(String.raw`\((${LOCATOR})\)`, "gu");
const locatorBeforeRe = new RegExp(String.raw`(?:^|[\s(])(${LOCATOR})\s+(?:of|in)\s+$`, "u");
const locatorAfterRe = new RegExp(String.raw`^\)?\s+(?:in|at)\s+(${LOCATOR})`, "u");

/**
 * Locators written apart from their citation: "Okafor (1999) … 'a quotation' (p. 140)", "Theorem 6.10
 * in Okafor (1994)", "(Okafor, 2022a) in sections 2.10 and 2.16". Each is given to the nearest
 * citation of the sentence that has none (the one before a lone locator; the one it names otherwise).
 */
function attachDetachedLocators(sentence: string, found: { at: number; c: FoundCitation[] }[]): void {
  if (!found.length) return;
  const byAt = [...found].sort((a, b) => a.at - b.at);
  for (const m of sentence.matchAll(loneLocatorRe)) {
    const before = byAt.filter((f) => f.at < m.index!).at(-1);
    const last = before?.c.at(-1);
    if (last && last.locator === null && !last.number) last.locator = cleanLocator(m[1]);
  }
  for (const f of byAt) {
    const first = f.c[0];
    const lastC = f.c.at(-1)!;
    const head = locatorBeforeRe.exec(sentence.slice(Math.max(0, f.at - 60), f.at));
    if (head && first.locator === null) first.locator = cleanLocator(head[1]);
    // The text right after the group: its closing bracket was consumed with it.
    const end = sentence.indexOf(")", f.at);
    const tail = end >= 0 ? locatorAfterRe.exec(sentence.slice(end, end + 80)) : null;
    if (tail && lastC.locator === null) lastC.locator = cleanLocator(tail[1]);
  }
}

/** The sentence with its citations taken out, so that years and page numbers are not read as values. */
export function stripCitations(sentence: string): string {
  if (!sentence.includes("(") && !sentence.includes("[")) return sentence.replace(/\s+/g, " ");
  let s = sentence.replace(/\(([^()]*(?:\([^()]*\)[^()]*)*)\)/g, (m, inner: string) =>
    parseParenthetical(inner).length ? " " : m,
  );
  s = s.replace(narrativeRe, (m, authors: string, inner: string) =>
    yearsLocatorRe.test(inner.trim()) && !notNames.has(authors.split(/\s/)[0]) ? authors : m,
  );
  s = s.replace(numberedRe, " ");
  return s.replace(/\s+/g, " ");
}
