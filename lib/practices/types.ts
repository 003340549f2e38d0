/** The miner's closed vocabulary of statistics (product brief, "Statistic keys"). */
export const STATISTIC_KEYS = [
  "cronbach_alpha",
  "mcdonald_omega",
  "composite_reliability",
  "ave",
  "factor_loading",
  "htmt",
  "vif",
  "cfi",
  "tli",
  "rmsea",
  "srmr",
  "chi_square_df",
  "kmo",
  "eigenvalue",
  "icc",
  "cohen_kappa",
  "p_value",
  "r_squared",
  "item_total_correlation",
  "sample_size_ratio",
  "statistical_power",
  "other",
] as const;

export type StatisticKey = (typeof STATISTIC_KEYS)[number];
export type Comparator = ">=" | ">" | "<=" | "<" | "=";
export type Framing = "fixed" | "contextual";

export interface Practice {
  id: string;
  statistic: StatisticKey;
  comparator: Comparator;
  value: number;
  /** null: the practice holds whatever the framing of the statement. */
  framing: Framing | null;
}

/** A mined threshold statement's claim; any part may be missing when the miner could not tell. */
export interface ThresholdStatement {
  statistic: StatisticKey | null;
  comparator: Comparator | null;
  /** A number, or the number as written (".70", "0,70") when the caller kept the text. */
  value: number | string | null;
  framing: Framing | null;
}

export function isStatisticKey(s: unknown): s is StatisticKey {
  return typeof s === "string" && (STATISTIC_KEYS as readonly string[]).includes(s);
}
