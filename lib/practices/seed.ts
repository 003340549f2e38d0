import { formatValue, labelOf } from "@/lib/vocabulary";
import type { Comparator, Framing, Practice, StatisticKey } from "./types";

export interface SeedPractice extends Practice {
  label: string;
}

/** APA-style number: no leading zero below 1 and two decimals there (".70"), plain integers above. */
export const formatPracticeValue = formatValue;

export function practiceLabel(p: Pick<Practice, "statistic" | "comparator" | "value" | "framing">): string {
  const base = `${labelOf("statistic", p.statistic)} ${labelOf("comparator", p.comparator)} ${formatValue(p.value)}`;
  if (p.framing === "fixed") return `${base}, as a fixed rule`;
  if (p.framing === "contextual") return `${base}, depending on context`;
  if (p.framing === "disputed") return `${base}, disputed`;
  return base;
}

export function practiceId(p: Pick<Practice, "statistic" | "comparator" | "value" | "framing">): string {
  const op = { ">=": "ge", ">": "gt", "<=": "le", "<": "lt", "=": "eq" }[p.comparator];
  return [p.statistic, op, String(p.value), ...(p.framing ? [p.framing] : [])].join("-");
}

function seed(
  statistic: StatisticKey,
  comparator: Comparator,
  value: number,
  framing: Framing | null = null,
): SeedPractice {
  const p = { statistic, comparator, value, framing };
  return { id: practiceId(p), ...p, label: practiceLabel(p) };
}

/**
 * Cut-offs that are common practice in the literature (common practice, no source): they are the
 * rules Echoline's curators most often want to track from day one. Echoline reports how a practice
 * is used and sourced; it does not set standards, and seeding a value here endorses none of them.
 * The comparator family makes "< 5" also catch "≤ 5" and so on.
 */
export const seedPractices: readonly SeedPractice[] = Object.freeze([
  seed("cronbach_alpha", ">=", 0.7, "fixed"),
  seed("composite_reliability", ">=", 0.7),
  seed("ave", ">=", 0.5),
  seed("factor_loading", ">=", 0.7),
  seed("factor_loading", ">=", 0.4),
  seed("htmt", "<", 0.85),
  seed("htmt", "<", 0.9),
  seed("vif", "<", 5),
  seed("vif", "<", 10),
  seed("cfi", ">=", 0.95),
  seed("cfi", ">=", 0.9),
  seed("tli", ">=", 0.95),
  seed("rmsea", "<=", 0.06),
  seed("rmsea", "<=", 0.08),
  seed("srmr", "<=", 0.08),
  seed("kmo", ">=", 0.6),
  seed("eigenvalue", ">", 1),
  seed("p_value", "<", 0.05),
  seed("statistical_power", ">=", 0.8),
  seed("item_total_correlation", ">=", 0.3),
  seed("mcdonald_omega", ">=", 0.7),
  seed("icc", ">=", 0.75),
  seed("cohen_kappa", ">=", 0.6),
]);
