import jStat from "jstat";

// Thin wrappers around jstat so the rest of lib/stats never touches an untyped module and so bad
// input fails with a message that names the argument.

export function assertConfidence(confidence: number): void {
  if (!Number.isFinite(confidence) || confidence <= 0 || confidence >= 1) {
    throw new RangeError(`confidence must be a number strictly between 0 and 1, got ${String(confidence)}`);
  }
}

/** Two-sided critical value z such that P(|Z| <= z) = confidence. */
export function zForConfidence(confidence: number): number {
  assertConfidence(confidence);
  return jStat.normal.inv(1 - (1 - confidence) / 2, 0, 1);
}

export function normalQuantile(p: number): number {
  if (!Number.isFinite(p) || p <= 0 || p >= 1) {
    throw new RangeError(`normalQuantile needs 0 < p < 1, got ${String(p)}`);
  }
  return jStat.normal.inv(p, 0, 1);
}

export function normalCdf(x: number): number {
  return jStat.normal.cdf(x, 0, 1);
}

/** Two-sided p-value of a standard normal statistic; uses the lower tail so tiny p stay accurate. */
export function twoSidedNormalP(z: number): number {
  if (Number.isNaN(z)) return Number.NaN;
  return Math.min(1, 2 * jStat.normal.cdf(-Math.abs(z), 0, 1));
}

export function chiSquareCdf(x: number, dof: number): number {
  return jStat.chisquare.cdf(x, dof);
}
