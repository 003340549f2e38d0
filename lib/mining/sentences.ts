// Sentence segmentation for methods prose.
// natural's SentenceTokenizer (deep import: the package root loads database clients and dotenv) does the
// splitting at terminal punctuation and quotes. It does not serve on its own for scholarly text: it splits
// ".85" (decimals without a leading zero, the APA style for statistics bounded by 1), "Fig. 2", "p. 12",
// "et al." and initials, and its own abbreviation option matches substrings anywhere ("p." inside
// "step."). So those dots are masked before it runs and restored after.
import SentenceTokenizer from "natural/lib/natural/tokenizers/sentence_tokenizer.js";

const DOT = "\u2024"; // ONE DOT LEADER: never present in extracted text, same length as "."

const abbreviations = [
  "e.g.", "i.e.", "et al.", "etc.", "vs.", "cf.", "ca.", "approx.", "resp.", "Fig.", "Figs.", "Tab.", "No.", "Nos.",
  "Vol.", "vol.", "no.", "pp.", "p.", "chap.", "Chap.", "ch.", "sec.", "Sec.", "para.", "Eq.", "eq.", "Dr.", "Mr.",
  "Ms.", "Mrs.", "Prof.", "Inc.", "Ltd.", "Co.", "St.", "Ed.", "Eds.", "ed.", "eds.", "Rev.", "Suppl.", "min.",
  "max.", "Jr.", "approx.", "viz.", "al.", "Proc.", "Symp.", "Univ.", "Dept.", "n.d.", "S.D.", "M.A.", "Ph.D.",
];

function escape(s: string): string {
  return s.replace(/[.*+?^${}()|[\]\\]/g, "\\$&");
}
const abbrevRe = new RegExp(
  `(?<![\\p{L}])(${abbreviations.sort((a, b) => b.length - a.length).map(escape).join("|")})`,
  "gu",
);

function mask(text: string): string {
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

const tokenizer = new SentenceTokenizer([], true);

// natural's tokenize() is quadratic in its input: for every sentence it finds it builds one RegExp per
// placeholder of the whole input (revertReplacements / revertDelimiters), so a 300-page discussion
// section took minutes (measured: 9 s for 74 pages, 34 s for 149). Here it does not serve as is, so it
// only ever gets short pieces, cut where it would cut anyway: at a space that follows a sentence
// delimiter (. ? ! …) and precedes a character that cannot continue a delimiter run. Its delimiter
// pattern ([.?!… ]*)([.?!…])(["'”’)}\]]?) cannot match across such a space, and its URI and number
// placeholders never contain a space, so the pieces' sentences are exactly those of the whole text
// (tests/unit/mining/sentences-scale.test.ts checks this against natural on the whole text).
const PIECE_CHARS = 600;
const SAFE_CUT = /[.?!…] (?=[^.?!… ])/g;

function tokenizeInPieces(masked: string): string[] {
  if (masked.length <= PIECE_CHARS) return tokenizer.tokenize(masked);
  const out: string[] = [];
  let from = 0;
  SAFE_CUT.lastIndex = PIECE_CHARS;
  for (let m = SAFE_CUT.exec(masked); m; m = SAFE_CUT.exec(masked)) {
    const cut = m.index + 1;
    for (const s of tokenizer.tokenize(masked.slice(from, cut))) out.push(s);
    from = cut;
    SAFE_CUT.lastIndex = cut + PIECE_CHARS;
  }
  for (const s of tokenizer.tokenize(masked.slice(from))) out.push(s);
  return out;
}

export function splitSentences(text: string): string[] {
  const flat = text.replace(/\s+/g, " ").trim();
  if (!flat) return [];
  const masked = mask(flat);
  const raw = tokenizeInPieces(masked);
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
