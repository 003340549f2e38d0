// The mining contract of product.md ("Mining contract"): one JSON line per file. The worker stores
// exactly what these schemas accept, so every line is validated before it leaves the miner.
import { z } from "zod";

export const statisticKeys = [
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
export const StatisticKey = z.enum(statisticKeys);
export type StatisticKey = z.infer<typeof StatisticKey>;

export const Section = z.enum(["methods", "results", "discussion", "introduction", "other", "unknown"]);
export type Section = z.infer<typeof Section>;
export const Comparator = z.enum([">=", ">", "<=", "<", "="]);
export type Comparator = z.infer<typeof Comparator>;

export const StatementCitation = z.object({
  authors: z.string(),
  year: z.string(),
  locator: z.string().nullable(),
  secondary: z.boolean(),
  /** For a secondary citation: the work it was read in ("as cited in …"). */
  citedIn: z.object({ authors: z.string(), year: z.string() }).nullable().optional(),
  /** For a numbered citation: the reference number it was resolved from. */
  number: z.number().int().positive().nullable().optional(),
});
export type StatementCitation = z.infer<typeof StatementCitation>;

export const Statement = z.object({
  page: z.number().int().positive(),
  section: Section,
  sentence: z.string(),
  kind: z.enum(["threshold", "reported", "procedure"]),
  statistic: StatisticKey.nullable(),
  comparator: Comparator.nullable(),
  value: z.number().finite().nullable(),
  framing: z.enum(["fixed", "contextual"]).nullable(),
  /** Key of the matched procedure pattern (procedure statements only). */
  procedure: z.string().nullable().optional(),
  citations: z.array(StatementCitation),
});
export type Statement = z.infer<typeof Statement>;

export const DocumentCitation = StatementCitation.extend({
  page: z.number().int().positive(),
  sentence: z.string(),
});
export type DocumentCitation = z.infer<typeof DocumentCitation>;

export const Reference = z.object({
  raw: z.string(),
  authors: z.array(z.string()),
  year: z.string().nullable(),
  title: z.string().nullable(),
  container: z.string().nullable(),
  doi: z
    .string()
    .regex(/^10\.\S+$/)
    .nullable(),
  kind: z.enum(["book", "chapter", "article", "other"]),
  number: z.number().int().positive().nullable().optional(),
});
export type Reference = z.infer<typeof Reference>;

export const SuccessLine = z.object({
  file: z.string(),
  pages: z.number().int().nonnegative(),
  statements: z.array(Statement),
  citations: z.array(DocumentCitation),
  references: z.array(Reference),
});
export type SuccessLine = z.infer<typeof SuccessLine>;

export const errorCodes = [
  "not_pdf",
  "unsupported_type",
  "encrypted",
  "no_text_layer",
  "corrupt",
  "too_large",
  "zero_pages",
  "too_many_pages",
  "not_jats",
  "empty",
  "timeout",
  "not_found",
  "internal",
] as const;
export const ErrorCode = z.enum(errorCodes);
export type ErrorCode = z.infer<typeof ErrorCode>;

export const ErrorLine = z.object({
  file: z.string(),
  error: z.object({ code: ErrorCode, message: z.string().min(1) }),
});
export type ErrorLine = z.infer<typeof ErrorLine>;

export const ContractLine = z.union([SuccessLine, ErrorLine]);
export type ContractLine = z.infer<typeof ContractLine>;

export function isErrorLine(line: ContractLine): line is ErrorLine {
  return "error" in line;
}
