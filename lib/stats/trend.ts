import { twoSidedNormalP } from "./distributions";

export interface TrendGroup {
  /** Ordered score of the group, e.g. the publication year. */
  score: number;
  cases: number;
  total: number;
}

export type TrendDirection = "increasing" | "decreasing" | "none";

export interface TrendResult {
  z: number;
  chiSquare: number;
  /** Two-sided p-value of z (equal to the upper tail of chiSquare on 1 df). */
  pValue: number;
  /** Sign of z: the direction of the fitted linear trend, significant or not. NaN z gives "none". */
  direction: TrendDirection;
  /** One sentence in plain words for a dashboard, e.g. "The share rises over the years (z = 2.56, two-sided p = 0.010)". */
  describe(options?: { over?: string; alpha?: number }): string;
}

function formatP(p: number): string {
  if (p < 0.001) return "p < 0.001";
  return `p = ${p.toFixed(3)}`;
}

/**
 * Cochran–Armitage test for a linear trend in proportions across ordered groups (for Echoline,
 * years). The statistic is the score statistic of the linear-logistic model with the variance under
 * H0 taken with p̄(1 - p̄) (the Cochran–Armitage form); Agresti's M² = (N - 1) r² differs from
 * z² only by the factor (N - 1)/N.
 *
 * No variation (no cases at all, only cases, or a single distinct score) leaves the test undefined:
 * z, chiSquare and pValue are NaN and direction is "none".
 */
export function cochranArmitage(groups: readonly TrendGroup[]): TrendResult {
  if (!Array.isArray(groups) || groups.length < 2) {
    throw new RangeError("cochranArmitage needs at least two groups");
  }
  groups.forEach((g, i) => {
    if (!Number.isFinite(g.score)) throw new RangeError(`group ${i}: score must be a finite number`);
    if (!Number.isInteger(g.total) || g.total < 0)
      throw new RangeError(`group ${i}: total must be a non-negative integer`);
    if (!Number.isInteger(g.cases) || g.cases < 0 || g.cases > g.total) {
      throw new RangeError(`group ${i}: cases must be an integer between 0 and total (${g.total})`);
    }
  });

  const N = groups.reduce((s, g) => s + g.total, 0);
  const R = groups.reduce((s, g) => s + g.cases, 0);
  let z = Number.NaN;
  if (N > 0 && R > 0 && R < N) {
    const pBar = R / N;
    const meanScore = groups.reduce((s, g) => s + g.total * g.score, 0) / N;
    // Centring the scores first avoids cancellation when scores are years (≈2000) and N is large.
    const t = groups.reduce((s, g) => s + (g.score - meanScore) * (g.cases - g.total * pBar), 0);
    const ssScore = groups.reduce((s, g) => s + g.total * (g.score - meanScore) ** 2, 0);
    const variance = pBar * (1 - pBar) * ssScore;
    if (variance > 0) z = t / Math.sqrt(variance);
  }
  const chiSquare = z * z;
  const pValue = Number.isNaN(z) ? Number.NaN : twoSidedNormalP(z);
  const direction: TrendDirection = Number.isNaN(z) || z === 0 ? "none" : z > 0 ? "increasing" : "decreasing";

  return {
    z,
    chiSquare,
    pValue,
    direction,
    describe({ over = "the years", alpha = 0.05 } = {}) {
      if (Number.isNaN(z))
        return `No trend can be tested over ${over}: the share does not vary or there is too little data.`;
      const stats = `(z = ${z.toFixed(2)}, two-sided ${formatP(pValue)})`;
      if (direction === "none") return `The share is flat over ${over} ${stats}.`;
      const verb = direction === "increasing" ? "rises" : "falls";
      if (pValue < alpha) return `The share ${verb} over ${over} ${stats}.`;
      return `No clear trend over ${over}: the share ${verb} slightly, within what chance alone would give ${stats}.`;
    },
  };
}
