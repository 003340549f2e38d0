// Sentence segmentation for methods prose.
// Splitting follows natural's SentenceTokenizer (terminal punctuation and quotes; see tokenizeLikeNatural
// for why its rule is applied here rather than its module called). It does not serve on its own for
// scholarly text: it splits ".85" (decimals without a leading zero, the APA style for statistics bounded
// by 1), "Fig. 2", "p. 12", "et al." and initials, and its own abbreviation option matches substrings
// anywhere ("p." inside "step."). So those dots are masked before the split and restored after.

const DOT = "\u2024"; // ONE DOT LEADER: never present in extracted text, same length as "."

const abbreviations = [
  "e.g.",
  "i.e.",
  "et al.",
  "etc.",
  "vs.",
  "cf.",
  "ca.",
  "approx.",
  "resp.",
  "Fig.",
  "Figs.",
  "Tab.",
  "No.",
  "Nos.",
  "Vol.",
  "vol.",
  "no.",
  "pp.",
  "p.",
  "chap.",
  "Chap.",
  "ch.",
  "sec.",
  "Sec.",
  "para.",
  "Eq.",
  "eq.",
  "Dr.",
  "Mr.",
  "Ms.",
  "Mrs.",
  "Prof.",
  "Inc.",
  "Ltd.",
  "Co.",
  "St.",
  "Ed.",
  "Eds.",
  "ed.",
  "eds.",
  "Rev.",
  "Suppl.",
  "min.",
  "max.",
  "Jr.",
  "approx.",
  "viz.",
  "al.",
  "Proc.",
  "Symp.",
  "Univ.",
  "Dept.",
  "n.d.",
  "S.D.",
  "M.A.",
  "Ph.D.",
];

function escape(s: string): string {
  return s.replace(/[.*+?^${}()|[\]\\]/g, "\\$&");
}
const abbrevRe = new RegExp(
  `(?<![\\p{L}])(${abbreviations
    .sort((a, b) => b.length - a.length)
    .map(escape)
    .join("|")})`,
  "gu",
);

/** The text with every dot that does not end a sentence replaced by DOT (exported for tests). */
export function mask(text: string): string {
  let t = text.replace(abbrevRe, (m) => m.replaceAll(".", DOT));
  // decimals: .85, 0.85, 4.2.1, "α = .05"
  t = t.replace(/(^|[\s(=<>≥≤~±\[,;:–—-])\.(\d)/g, (_m, a: string, d: string) => `${a}${DOT}${d}`);
  t = t.replace(/(\d)\.(\d)/g, `$1${DOT}$2`);
  t = t.replace(/(\d)\.(\d)/g, `$1${DOT}$2`);
  // initials: "K. Dervishi", "R. B. Kowalczyk", "Okafor, E." inside a sentence
  t = t.replace(/(?<![\p{L}])(\p{Lu})\.(?=\s*(\p{Lu}[\p{L}'’-]|\p{Lu}\.|,|&|and\b|\())/gu, `$1${DOT}`);
  // dotted DOIs / URLs / section numbers "2.1"
  t = t.replace(/\b(10\.\d{4,9}\/\S+|https?:\/\/\S+|doi:\S+)/gi, (m) => m.replaceAll(".", DOT));
  return t;
}

// Where natural does not serve: its tokenize() is quadratic in its input. For every sentence it finds it
// builds one RegExp per placeholder of the whole input (revertReplacements / revertDelimiters), so one
// 300-page discussion section took minutes (measured: 9.0 s of mining for 74 pages, 34 s for 149), and
// even fed short pieces its placeholder round trip was a third of the miner's time on the demo corpus.
// What it decides, once the dots above are masked, is small: a sentence ends after each match of its
// delimiter pattern, except inside what its URI pattern matches (its number placeholders protect only
// "1.5"-like dots, which are masked already). That rule is applied here in one linear pass, with
// natural's own two patterns (natural 8.1.1, lib/natural/tokenizers/sentence_tokenizer.js);
// tests/unit/mining/sentences-scale.test.ts checks that the output equals natural's on whole texts.
const NATURAL_URI =
  /(https?:\/\/\S+|www\.\S+|ftp:\/\/\S+|(mailto:)?[a-zA-Z0-9._%+-]+@[a-zA-Z0-9.-]+\.[a-zA-Z]{2,}|file:\/\/\S+)/gi;
const NATURAL_DELIMITER = /([.?!… ]*)([.?!…])(["'”’)}\]]?)/g;

/** A character absent from the text, to stand for one URI while delimiters are found (natural uses "{{URI_n}}"). */
function holeFor(text: string): string {
  for (let c = 0xe000; c <= 0xf8ff; c++) {
    const h = String.fromCharCode(c);
    if (!text.includes(h)) return h;
  }
  throw new Error("Text uses every private-use character; it cannot be split into sentences.");
}

/** natural's SentenceTokenizer([], true).tokenize(text), without its quadratic placeholder round trip. */
export function tokenizeLikeNatural(text: string): string[] {
  const uris: string[] = [];
  const hole = holeFor(text);
  // Every form of NATURAL_URI needs one of these; skipping its pass saves a scan that tries each letter.
  const holed = /@|:\/\/|www\./i.test(text) ? text.replace(NATURAL_URI, (m) => (uris.push(m), hole)) : text;
  const out: string[] = [];
  let from = 0;
  let u = 0;
  const take = (piece: string) => {
    const restored = uris.length ? piece.replaceAll(hole, () => uris[u++]) : piece;
    out.push(restored.trim());
  };
  for (const m of holed.matchAll(NATURAL_DELIMITER)) {
    const end = m.index + m[0].length;
    take(holed.slice(from, end));
    from = end;
  }
  take(holed.slice(from));
  // natural drops empty sentences at both ends only; the caller skips the rest.
  while (out.length && out[out.length - 1] === "") out.pop();
  while (out.length && out[0] === "") out.shift();
  return out;
}

export function splitSentences(text: string): string[] {
  const flat = text.replace(/\s+/g, " ").trim();
  if (!flat) return [];
  const masked = mask(flat);
  const raw = tokenizeLikeNatural(masked);
  const out: string[] = [];
  for (const s of raw) {
    const restored = s.replaceAll(DOT, ".").trim();
    if (!restored) continue;
    // natural splits before a lower-case continuation ("… (p. 12). and then") only rarely; a piece that
    // starts lower-case or with a closing bracket belongs to the previous sentence.
    if (out.length && /^[a-z)\],;]/.test(restored)) out[out.length - 1] += ` ${restored}`;
    else out.push(restored);
  }
  return out;
}

export function normaliseSentence(s: string): string {
  return s
    .normalize("NFKC")
    .replace(/[‐‑‒–—−]/g, "-")
    .replace(/[“”„]/g, '"')
    .replace(/[‘’]/g, "'")
    .replace(/\s+/g, " ")
    .replace(/\s+([.,;:)])/g, "$1")
    .trim()
    .toLowerCase();
}
