import { zForConfidence } from "./distributions";

export interface KappaResult {
  kappa: number;
  /** Observed proportion of agreement. */
  observed: number;
  /** Agreement expected by chance from the two raters' marginal distributions. */
  expected: number;
  n: number;
  /** Large-sample standard error (Fleiss, Cohen & Everitt 1969, non-null form). */
  se: number;
  lower: number;
  upper: number;
}

/**
 * Cohen's kappa for two raters over the same items, given as [rater A's label, rater B's label].
 * Categories are the union of labels seen. The interval is kappa ± z·SE with the non-null
 * asymptotic SE, clamped to [-1, 1].
 *
 * When chance agreement is 1 (both raters used one and the same single category) kappa is
 * undefined: kappa, se, lower and upper are NaN.
 */
export function cohenKappa(pairs: readonly (readonly [string, string])[], confidence = 0.95): KappaResult {
  if (!Array.isArray(pairs) || pairs.length === 0) {
    throw new RangeError("cohenKappa needs at least one rated pair");
  }
  const z = zForConfidence(confidence);
  const n = pairs.length;
  const cats = new Map<string, number>();
  for (const [i, pair] of pairs.entries()) {
    if (!Array.isArray(pair) || pair.length !== 2 || typeof pair[0] !== "string" || typeof pair[1] !== "string") {
      throw new TypeError(`pair ${i} must be [string, string]`);
    }
    for (const c of pair) if (!cats.has(c)) cats.set(c, cats.size);
  }
  const k = cats.size;
  const table: number[][] = Array.from({ length: k }, () => new Array<number>(k).fill(0));
  for (const [a, b] of pairs) table[cats.get(a)!][cats.get(b)!] += 1 / n;
  const row = table.map((r) => r.reduce((s, v) => s + v, 0));
  const col = table[0].map((_, j) => table.reduce((s, r) => s + r[j], 0));

  let observed = 0;
  let expected = 0;
  for (let i = 0; i < k; i++) {
    observed += table[i][i];
    expected += row[i] * col[i];
  }
  if (expected >= 1 - 1e-12) {
    return { kappa: Number.NaN, observed, expected, n, se: Number.NaN, lower: Number.NaN, upper: Number.NaN };
  }
  const kappa = (observed - expected) / (1 - expected);

  // Fleiss, Cohen & Everitt (1969), Psychological Bulletin 72:323–327, variance of kappa-hat.
  let a = 0;
  for (let i = 0; i < k; i++) a += table[i][i] * (1 - (row[i] + col[i]) * (1 - kappa)) ** 2;
  let b = 0;
  for (let i = 0; i < k; i++) {
    for (let j = 0; j < k; j++) if (i !== j) b += table[i][j] * (col[i] + row[j]) ** 2;
  }
  b *= (1 - kappa) ** 2;
  const c = (kappa - expected * (1 - kappa)) ** 2;
  const variance = Math.max(0, (a + b - c) / (n * (1 - expected) ** 2));
  const se = Math.sqrt(variance);
  return {
    kappa,
    observed,
    expected,
    n,
    se,
    lower: Math.max(-1, kappa - z * se),
    upper: Math.min(1, kappa + z * se),
  };
}

export interface Confusion {
  tp: number;
  fp: number;
  fn: number;
}

export interface PrecisionRecall {
  /** tp / (tp + fp); NaN when nothing was predicted. */
  precision: number;
  /** tp / (tp + fn); NaN when there was nothing to find. */
  recall: number;
  /** Harmonic mean of precision and recall; NaN when either is NaN, 0 when both are 0. */
  f1: number;
}

export function precisionRecall({ tp, fp, fn }: Confusion): PrecisionRecall {
  for (const [name, v] of [
    ["tp", tp],
    ["fp", fp],
    ["fn", fn],
  ] as const) {
    if (!Number.isInteger(v) || v < 0) throw new RangeError(`${name} must be a non-negative integer, got ${String(v)}`);
  }
  const precision = tp + fp === 0 ? Number.NaN : tp / (tp + fp);
  const recall = tp + fn === 0 ? Number.NaN : tp / (tp + fn);
  const f1 =
    Number.isNaN(precision) || Number.isNaN(recall)
      ? Number.NaN
      : precision + recall === 0
        ? 0
        : (2 * precision * recall) / (precision + recall);
  return { precision, recall, f1 };
}
