// Normalisers shared by reference resolution. They fold the variation that reference styles,
// OCR and typing introduce, and nothing that can tell two works apart (numbers, part numbers).

/** Letters NFKD leaves alone but readers treat as their plain forms. */
const FOLD: Record<string, string> = {
  ø: "o",
  Ø: "O",
  ł: "l",
  Ł: "L",
  đ: "d",
  Đ: "D",
  æ: "ae",
  Æ: "AE",
  œ: "oe",
  Œ: "OE",
  ß: "ss",
  þ: "th",
  ı: "i",
};

export function foldAscii(s: string): string {
  return s
    .normalize("NFKD")
    .replace(/\p{M}+/gu, "")
    .replace(/[øØłŁđĐæÆœŒßþı]/g, (c) => FOLD[c] ?? c);
}

const DOI_PREFIX = /^(?:https?:\/\/)?(?:(?:dx\.)?doi\.org\/|doi\s*[:.]?\s*|doi\.org\/)/i;

/**
 * Canonical DOI: lower case (DOIs are case-insensitive), no resolver prefix or "doi:" label, no
 * trailing punctuation from the sentence, percent-escapes decoded, whitespace from line breaks
 * removed. Returns null when what remains is not a DOI (10.<registrant>/<suffix>).
 */
export function normaliseDoi(doi: string | null | undefined): string | null {
  if (typeof doi !== "string") return null;
  let d = doi.trim().replace(/[\u2010-\u2015\u2212]/g, "-");
  d = d.replace(/^(?:https?:\/\/)?(?:dx\.)?doi\.org\//i, "").replace(DOI_PREFIX, "");
  try {
    if (/%[0-9a-f]{2}/i.test(d)) d = decodeURIComponent(d);
  } catch {
    // A malformed escape is left as it is; the pattern check below decides.
  }
  d = d
    .replace(/\s+/g, "")
    .replace(/[.,;:)\]}>'"]+$/, "")
    .toLowerCase();
  return /^10\.\d{4,9}\/\S+$/.test(d) ? d : null;
}

const ORDINAL_WORDS: Record<string, number> = {
  first: 1,
  second: 2,
  third: 3,
  fourth: 4,
  fifth: 5,
  sixth: 6,
  seventh: 7,
  eighth: 8,
  ninth: 9,
  tenth: 10,
};
const EDITION_NUM = /\(?\b(\d{1,2})\s*(?:st|nd|rd|th|e|\.)?\s*(?:ed|edn|edition|aufl|auflage)\b\.?\)?/i;
const EDITION_WORD =
  /\(?\b(first|second|third|fourth|fifth|sixth|seventh|eighth|ninth|tenth)\s+(?:ed|edn|edition)\b\.?\)?/i;
const EDITION_OTHER = /\(?\b(?:rev(?:ised)?\.?|revised and expanded|expanded|updated)\s+(?:ed|edn|edition)\b\.?\)?/gi;

/** Edition number written in a title or raw reference ("2nd ed.", "Third edition"), else null. */
export function editionOf(text: string | null | undefined): number | null {
  if (!text) return null;
  const m = EDITION_NUM.exec(text);
  if (m) return Number(m[1]);
  const w = EDITION_WORD.exec(text);
  return w ? ORDINAL_WORDS[w[1].toLowerCase()] : null;
}

const STOP_WORDS = new Set([
  "a",
  "an",
  "the",
  "of",
  "and",
  "in",
  "on",
  "for",
  "to",
  "with",
  "at",
  "by",
  "from",
  "as",
  "into",
  "its",
  "or",
]);

const GREEK: Record<string, string> = {
  α: "alpha",
  β: "beta",
  γ: "gamma",
  δ: "delta",
  κ: "kappa",
  λ: "lambda",
  ρ: "rho",
  σ: "sigma",
  χ: "chi",
  ω: "omega",
  η: "eta",
};

function cleanTitle(title: string): string {
  // Greek letters are spelled out so "coefficient α" meets "coefficient alpha".
  let t = foldAscii(title.replace(/[αβγδκλρσχωη]/g, (c) => ` ${GREEK[c]} `)).replace(/\u00ad/g, "");
  // An OCR line break inside a word ("measure- ment") and a real hyphen ("self-report") both
  // become one token, so the two spellings agree.
  t = t.replace(/(\p{L})[-\u2010\u2011]\s+(\p{L})/gu, "$1$2").replace(/(\p{L})[-\u2010-\u2014](\p{L})/gu, "$1$2");
  t = t.replace(/&/g, " and ");
  t = t.replace(EDITION_NUM, " ").replace(EDITION_WORD, " ").replace(EDITION_OTHER, " ");
  return t.toLowerCase();
}

const ABBREVIATIONS: Record<string, string> = { vs: "versus", v: "versus" };

function tokensOf(cleaned: string): string[] {
  const all = cleaned
    .split(/[^\p{L}\p{N}]+/u)
    .filter(Boolean)
    .map((w) => ABBREVIATIONS[w] ?? w);
  const kept = all.filter((w) => !STOP_WORDS.has(w));
  return kept.length > 0 ? kept : all;
}

/** Lower-case, ASCII-folded, punctuation-free title without stop words or edition statements. */
export function normaliseTitle(title: string | null | undefined): string {
  if (typeof title !== "string") return "";
  return tokensOf(cleanTitle(title)).join(" ");
}

/** The title before its subtitle (first ":", "?", " – ", " — " or " - "), normalised; null if there is no subtitle. */
export function mainTitle(title: string | null | undefined): string | null {
  if (typeof title !== "string") return null;
  const m = /^(.+?)(?:\s*[:?]\s+|\s+[-–—]\s+|\s*[–—]\s*)(\S.*)$/u.exec(title.trim());
  if (!m) return null;
  const main = normaliseTitle(m[1]);
  return main && main !== normaliseTitle(title) ? main : null;
}

const PARTICLES = new Set([
  "van",
  "von",
  "der",
  "den",
  "de",
  "del",
  "della",
  "di",
  "da",
  "du",
  "la",
  "le",
  "ten",
  "ter",
  "op",
  "het",
  "dos",
  "das",
  "y",
  "zu",
  "vom",
]);
const CORPORATE =
  /\b(association|institute|institut|council|committee|commission|organi[sz]ation|society|group|agency|office|board|department|ministry|university|panel|centre|center|bureau|foundation|consortium|network|authority|collaboration|team|service|programme|program)\b/i;
const INITIAL = /^(?:\p{Lu}\.?-?){1,3}$|^\p{Lu}\.(?:-?\p{Lu}\.)*$/u;

function cleanName(s: string): string {
  return foldAscii(s)
    .replace(/\s*[([](?:eds?|hrsg|coord|trans)\.?[)\]]\s*/gi, " ")
    .replace(/\s*[([][A-Z0-9&.\- ]{2,}[)\]]\s*/g, " ") // corporate acronyms: "(NPSQ)"
    .replace(/\bet\s+al\.?/gi, " ")
    .replace(/\s+/g, " ")
    .trim();
}

function isInitial(token: string): boolean {
  return INITIAL.test(token.replace(/,$/, ""));
}

function lowerName(parts: string[]): string {
  return parts
    .join(" ")
    .toLowerCase()
    .replace(/[^a-z0-9' -]/g, "")
    .replace(/\s+/g, " ")
    .trim();
}

/**
 * Surname of the first author, lower case and ASCII-folded, particles kept ("van der berg").
 * Reads "Okafor, T. B.", "T. B. Okafor", "Okafor TB", "van der Berg, L.", "Berg, L. van der",
 * "L. van der Berg". A corporate author ("National Panel on Survey Quality") comes back whole.
 * Null when nothing name-like is left.
 */
export function firstAuthorSurname(author: string | readonly string[] | null | undefined): string | null {
  const first = Array.isArray(author) ? author[0] : author;
  if (typeof first !== "string") return null;
  // Some parsers leave the whole author list in one string; the first author is before ";" or "&".
  let s = cleanName(first.split(/\s*(?:;|&|\band\s+(?=\p{Lu}\.))\s*/u)[0] ?? "");
  s = s.replace(/[,.\s]+$/, "");
  if (!s) return null;

  const comma = s.indexOf(",");
  const noComma = comma < 0 ? s : s.slice(0, comma);
  if (CORPORATE.test(s) || (comma < 0 && noComma.split(" ").length >= 4 && !noComma.split(" ").some(isInitial))) {
    return lowerName([s.replace(/,/g, " ")]) || null;
  }

  if (comma >= 0) {
    const left = s.slice(0, comma).trim().split(/\s+/);
    const right = s
      .slice(comma + 1)
      .trim()
      .split(/\s+/)
      .filter(Boolean);
    if (left.length > 1 && isInitial(left[0])) {
      // "T. B. Okafor, M. Lindqvist": given names first, a comma between authors.
      return lowerName(left.filter((t) => !isInitial(t)));
    }
    // "Berg, L. van der": particles written after the initials belong before the surname.
    const trailingParticles = right.filter((t) => PARTICLES.has(t.toLowerCase()));
    // "Castellanos M., Brightwater H.": numbered-style initials before the comma between authors.
    const surnameTokens = left.filter((t) => !isInitial(t));
    return lowerName([...trailingParticles, ...(surnameTokens.length > 0 ? surnameTokens : left)]) || null;
  }

  const tokens = s.split(/\s+/);
  if (tokens.length > 1 && /^\p{Lu}{1,3}$/u.test(tokens[tokens.length - 1])) {
    return lowerName(tokens.slice(0, -1)); // "Okafor TB" (numbered styles)
  }
  let i = tokens.length - 1;
  while (i > 0 && PARTICLES.has(tokens[i - 1].toLowerCase())) i--;
  return lowerName(tokens.slice(i)) || null;
}

/** Surname reduced for comparison and blocking: no particles, spaces, hyphens or apostrophes. */
export function surnameKey(surname: string | null): string | null {
  if (!surname) return null;
  const tokens = surname.split(" ");
  const core = tokens.filter((t) => !PARTICLES.has(t));
  const key = (core.length > 0 ? core : tokens).join("").replace(/[^a-z0-9]/g, "");
  return key || null;
}

/** Four-digit year from "2019a", "(2019)", "2019/2020"; null for "n.d.", "in press" or nothing. */
export function normaliseYear(year: string | number | null | undefined): number | null {
  if (typeof year === "number") return Number.isInteger(year) ? year : null;
  if (typeof year !== "string") return null;
  const m = /(1[5-9]\d\d|20\d\d)/.exec(year);
  return m ? Number(m[1]) : null;
}

/**
 * Blocking key "surname:year" (e.g. "berg:2014"), "?" for a missing part. Candidates that share
 * it are the ones worth scoring; a typo in a surname escapes the block, so callers that can afford
 * it also block on year alone.
 */
export function referenceKey(ref: {
  authors?: readonly string[];
  firstAuthor?: string | null;
  year: string | null;
}): string {
  const surname = surnameKey(firstAuthorSurname(ref.authors ?? ref.firstAuthor ?? null));
  const year = normaliseYear(ref.year);
  return `${surname ?? "?"}:${year ?? "?"}`;
}
