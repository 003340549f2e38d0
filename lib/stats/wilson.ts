import { zForConfidence } from "./distributions";
import { assertCounts } from "./validate";

export interface ProportionInterval {
  /** Observed proportion x/n; NaN when n = 0. */
  p: number;
  lower: number;
  upper: number;
}

export interface WilsonOptions {
  /**
   * Continuity-corrected score interval (method 4 of Newcombe 1998a). Off by default: the plain
   * score interval (method 3) has coverage closer to nominal on average, which is what benchmarks want.
   */
  cc?: boolean;
}

/**
 * Wilson score interval for a single proportion, Newcombe (1998a) methods 3 (plain) and 4 (cc).
 *
 * n = 0: there is no information, so p is NaN and the interval is the whole range [0, 1] rather
 * than an error; callers showing a rate for an empty venue-year can print "no data" off the NaN.
 */
export function wilson(x: number, n: number, confidence = 0.95, options: WilsonOptions = {}): ProportionInterval {
  assertCounts(x, n);
  const z = zForConfidence(confidence);
  if (n === 0) return { p: Number.NaN, lower: 0, upper: 1 };
  const p = x / n;
  const z2 = z * z;

  if (options.cc) {
    // Closed form from Newcombe (1998a), eqs. for method 4; the limits are pinned at 0 and 1 when x
    // is 0 or n, where the square root would describe the wrong side.
    const denom = 2 * (n + z2);
    const lower =
      x === 0 ? 0 : (2 * n * p + z2 - 1 - z * Math.sqrt(z2 - 2 - 1 / n + 4 * p * (n * (1 - p) + 1))) / denom;
    const upper =
      x === n ? 1 : (2 * n * p + z2 + 1 + z * Math.sqrt(z2 + 2 - 1 / n + 4 * p * (n * (1 - p) - 1))) / denom;
    return { p, lower: Math.max(0, lower), upper: Math.min(1, upper) };
  }

  const centre = (p + z2 / (2 * n)) / (1 + z2 / n);
  const half = (z / (1 + z2 / n)) * Math.sqrt((p * (1 - p)) / n + z2 / (4 * n * n));
  // At x = 0 or x = n the exact limit is 0 or 1; floating point would leave ~1e-17 otherwise.
  const lower = x === 0 ? 0 : Math.max(0, centre - half);
  const upper = x === n ? 1 : Math.min(1, centre + half);
  return { p, lower, upper };
}
