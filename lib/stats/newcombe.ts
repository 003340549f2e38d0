import { wilson } from "./wilson";
import { assertConfidence } from "./distributions";

export interface DifferenceInterval {
  /** p1 - p2; NaN when either n is 0. */
  difference: number;
  lower: number;
  upper: number;
}

/**
 * Newcombe's hybrid score interval for p1 - p2 of two independent proportions: method 10 of
 * Newcombe (1998b), or method 11 with `cc: true` (built on continuity-corrected Wilson limits).
 * Each side combines the distances from each proportion to its own Wilson limit by
 * "square-and-add", so it inherits the Wilson interval's good behaviour near 0 and 1.
 *
 * Either n = 0: the difference is unknown, so difference is NaN and the interval is [-1, 1].
 */
export function newcombeDifference(
  x1: number,
  n1: number,
  x2: number,
  n2: number,
  confidence = 0.95,
  options: { cc?: boolean } = {},
): DifferenceInterval {
  assertConfidence(confidence);
  const a = wilson(x1, n1, confidence, options);
  const b = wilson(x2, n2, confidence, options);
  if (n1 === 0 || n2 === 0) return { difference: Number.NaN, lower: -1, upper: 1 };
  const d = a.p - b.p;
  const delta = Math.sqrt((a.p - a.lower) ** 2 + (b.upper - b.p) ** 2);
  const epsilon = Math.sqrt((a.upper - a.p) ** 2 + (b.p - b.lower) ** 2);
  return { difference: d, lower: Math.max(-1, d - delta), upper: Math.min(1, d + epsilon) };
}
