import type { Comparator, Practice, ThresholdStatement } from "./types";

/**
 * Default absolute tolerance when comparing a statement's value with a practice's value. 0.005 is
 * half a unit of the second decimal, so ".70", "0.7" and "0.700" match 0.70 while ".75" does not;
 * cut-offs in methods sections are written to two decimals (common practice, no source).
 */
export const DEFAULT_VALUE_TOLERANCE = 0.005;

export type ComparatorFamily = "lower_bound" | "upper_bound" | "equal";

/** ">=" and ">" both set a lower bound; authors use them interchangeably for the same rule. */
export function comparatorFamily(c: Comparator): ComparatorFamily {
  switch (c) {
    case ">=":
    case ">":
      return "lower_bound";
    case "<=":
    case "<":
      return "upper_bound";
    case "=":
      return "equal";
  }
}

/** Reads ".70", "0.70", "0,70" (decimal comma) and numbers; anything else is null. */
export function parseStatValue(v: number | string | null | undefined): number | null {
  if (typeof v === "number") return Number.isFinite(v) ? v : null;
  if (typeof v !== "string") return null;
  const t = v
    .trim()
    .replace(/^([<>]=?|=|≥|≤)\s*/, "")
    .replace(/^([−-])?,/, "$1.")
    .replace(/^([−-]?\d*),(\d+)$/, "$1.$2")
    .replace("−", "-");
  if (!/^-?(\d+\.?\d*|\.\d+)$/.test(t)) return null;
  const n = Number(t);
  return Number.isFinite(n) ? n : null;
}

export function statementAssertsPractice(
  statement: ThresholdStatement,
  practice: Practice,
  tolerance = DEFAULT_VALUE_TOLERANCE,
): boolean {
  if (!statement.statistic || !statement.comparator) return false;
  // A sentence that names a cut-off to argue against it never asserts the practice.
  if (statement.framing === "disputed") return false;
  const value = parseStatValue(statement.value);
  if (value === null) return false;
  if (statement.statistic !== practice.statistic) return false;
  if (comparatorFamily(statement.comparator) !== comparatorFamily(practice.comparator)) return false;
  // The tiny epsilon keeps 0.705 vs 0.70 on the inclusive side despite binary floating point.
  if (Math.abs(value - practice.value) > tolerance + 1e-9) return false;
  if (practice.framing !== null && statement.framing !== practice.framing) return false;
  return true;
}

/** Ids of the practices a threshold statement asserts, in the order the practices were given. */
export function matchPractices(
  statement: ThresholdStatement,
  practices: readonly Practice[],
  options: { tolerance?: number } = {},
): string[] {
  const tolerance = options.tolerance ?? DEFAULT_VALUE_TOLERANCE;
  if (!Number.isFinite(tolerance) || tolerance < 0) throw new RangeError("tolerance must be a non-negative number");
  return practices.filter((p) => statementAssertsPractice(statement, p, tolerance)).map((p) => p.id);
}
