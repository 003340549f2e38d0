import JaroWinklerDistance from "natural/lib/natural/distance/jaro-winkler_distance.js";
import { editionOf, firstAuthorSurname, mainTitle, normaliseTitle, normaliseYear, surnameKey } from "./normalise";
import type { ParsedReference, WorkCandidate } from "./types";

export type ReferenceLike = ParsedReference | WorkCandidate;

function jw(a: string, b: string): number {
  return JaroWinklerDistance(a, b);
}

/** Dice over tokens, a token pair counting as shared when Jaro–Winkler ≥ 0.9 (so typos still count). */
function softTokenDice(a: string[], b: string[]): number {
  if (a.length === 0 || b.length === 0) return 0;
  const used = new Array<boolean>(b.length).fill(false);
  let shared = 0;
  for (const t of a) {
    let best = -1;
    let bestScore = 0.9;
    for (let j = 0; j < b.length; j++) {
      if (used[j]) continue;
      const s = t === b[j] ? 1 : jw(t, b[j]);
      if (s >= bestScore) {
        bestScore = s;
        best = j;
        if (s === 1) break;
      }
    }
    if (best >= 0) {
      used[best] = true;
      shared++;
    }
  }
  return (2 * shared) / (a.length + b.length);
}

/**
 * Joins runs of 2–4 adjacent tokens when the joined form is a token of the other title, so
 * "self report" meets "selfreport" (from "self-report") and "open ended" meets "openended".
 */
function mergeCompounds(tokens: string[], other: ReadonlySet<string>): string[] {
  const out: string[] = [];
  for (let i = 0; i < tokens.length;) {
    let taken = 1;
    if (!other.has(tokens[i])) {
      for (let k = Math.min(4, tokens.length - i); k >= 2; k--) {
        if (other.has(tokens.slice(i, i + k).join(""))) {
          taken = k;
          break;
        }
      }
    }
    out.push(tokens.slice(i, i + taken).join(""));
    i += taken;
  }
  return out;
}

const NUMBERISH = /^(\d+|[ivx]+)$/;

/**
 * Similarity of two normalised titles in [0, 1]: 0.4 × character-level Jaro–Winkler on the titles
 * without spaces (catches typos, OCR damage and compounds written apart) + 0.6 × the square of a
 * token-level soft Dice. Jaro–Winkler alone rates "reliability of short scales" and "validity of
 * short scales" near 0.9 because it rewards long shared stretches; squaring Dice makes one
 * unmatched content word cost what it should. Titles that differ in a number or roman numeral
 * ("Part II", "Study 3") are kept apart.
 */
export function titleSimilarity(a: string, b: string): number {
  if (!a || !b) return 0;
  const ca = a.replace(/ /g, "");
  const cb = b.replace(/ /g, "");
  if (ca === cb) return 1;
  const ta0 = a.split(" ");
  const tb0 = b.split(" ");
  const ta = mergeCompounds(ta0, new Set(tb0));
  const tb = mergeCompounds(tb0, new Set(ta));
  const dice = softTokenDice(ta, tb);
  let s = 0.4 * jw(ca, cb) + 0.6 * dice * dice;
  const na = ta
    .filter((t) => NUMBERISH.test(t))
    .sort()
    .join(" ");
  const nb = tb
    .filter((t) => NUMBERISH.test(t))
    .sort()
    .join(" ");
  if (na !== nb) s *= 0.85;
  return s;
}

function authorOf(r: ReferenceLike): string | null {
  return "authors" in r ? firstAuthorSurname(r.authors) : firstAuthorSurname(r.firstAuthor);
}

/**
 * How alike two references (or a reference and a stored work) are, in [0, 1]:
 * 0.60 × title similarity (the better of full titles and, when only one has a subtitle, main
 * titles) + 0.25 × first-author agreement + 0.15 × year agreement, less 0.15 when both state
 * different editions. Surnames agree at Jaro–Winkler ≥ 0.92 (one typo); years fully when equal,
 * half when one apart (online-first versus print) or when either is missing. A missing title
 * scores 0 on the title part, so author and year alone never reach a sensible threshold.
 * The weights were set by hand and the threshold is measured on tests/fixtures/reference-pairs.
 */
export function scorePair(a: ReferenceLike, b: ReferenceLike): number {
  const ta = normaliseTitle(a.title);
  const tb = normaliseTitle(b.title);
  let title = titleSimilarity(ta, tb);
  const ma = mainTitle(a.title);
  const mb = mainTitle(b.title);
  if ((ma === null) !== (mb === null)) title = Math.max(title, titleSimilarity(ma ?? ta, mb ?? tb));

  const sa = surnameKey(authorOf(a));
  const sb = surnameKey(authorOf(b));
  const author = sa && sb ? (sa === sb || jw(sa, sb) >= 0.92 ? 1 : 0) : 0.5;

  const ya = normaliseYear(a.year);
  const yb = normaliseYear(b.year);
  const year = ya === null || yb === null ? 0.5 : ya === yb ? 1 : Math.abs(ya - yb) === 1 ? 0.5 : 0;

  const ea = editionOf(a.title) ?? ("raw" in a ? editionOf(a.raw) : null);
  const eb = editionOf(b.title) ?? ("raw" in b ? editionOf(b.raw) : null);
  const editionPenalty = ea !== null && eb !== null && ea !== eb ? 0.15 : 0;

  const score = 0.6 * title + 0.25 * author + 0.15 * year - editionPenalty;
  return Math.min(1, Math.max(0, score));
}
