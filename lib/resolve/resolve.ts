import { normaliseDoi } from "./normalise";
import { scorePair } from "./score";
import type { ParsedReference, Resolution, WorkCandidate } from "./types";

/**
 * Score at or above which a title match is accepted, chosen by measurement on the 184 invented
 * pairs of tests/fixtures/reference-pairs/pairs.json (tests/unit/resolve/threshold.test.ts prints
 * the sweep). On the 123 training pairs precision and recall are both 1.000 from 0.90 to 0.92; 0.91
 * is the middle of that plateau. On the 61 held-out pairs at 0.91: precision 1.000, recall 0.974
 * (one miss of 39: a numbered reference misspelling "acquiescence" as "aquiescence"). These are
 * invented pairs written to resemble real reference lists, so expect lower figures on real ones.
 */
export const TITLE_MATCH_THRESHOLD = 0.91;

/**
 * Which candidate work a parsed reference is. A DOI match wins outright. Otherwise the
 * best-scoring candidate by title, first author and year is taken when it reaches the threshold.
 * A candidate whose DOI is present and differs from the reference's DOI is never taken by title:
 * two DOIs that disagree are stronger evidence than a similar title.
 */
export function resolveReference(
  ref: ParsedReference,
  candidates: readonly WorkCandidate[],
  threshold: number = TITLE_MATCH_THRESHOLD,
): Resolution | null {
  if (!ref || typeof ref !== "object" || !Array.isArray(ref.authors)) {
    throw new TypeError("resolveReference needs a parsed reference with an authors array");
  }
  if (!Array.isArray(candidates)) throw new TypeError("resolveReference needs an array of candidates");
  if (!Number.isFinite(threshold) || threshold < 0 || threshold > 1)
    throw new RangeError("threshold must be between 0 and 1");

  const doi = normaliseDoi(ref.doi) ?? normaliseDoi(/\b10\.\d{4,9}\/\S+/.exec(ref.raw ?? "")?.[0] ?? null);
  if (doi) {
    const hit = candidates.find((c) => normaliseDoi(c.doi) === doi);
    if (hit) return { id: hit.id, method: "doi", score: 1 };
  }
  let best: Resolution | null = null;
  for (const c of candidates) {
    const cdoi = normaliseDoi(c.doi);
    if (doi && cdoi && cdoi !== doi) continue;
    const score = scorePair(ref, c);
    if (score >= threshold && (!best || score > best.score)) best = { id: c.id, method: "title", score };
  }
  return best;
}
