import { STATISTIC_KEYS, type Comparator, type Framing, type StatisticKey } from "@/lib/vocabulary";

export { STATISTIC_KEYS };
export type { Comparator, Framing, StatisticKey };

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
