// The mining contract of product.md ("Mining contract"): one JSON line per file. The worker stores
// exactly what these schemas accept, so every line is validated before it leaves the miner.
import { z } from "zod";
import { COMPARATORS, FRAMINGS, SECTIONS, STATEMENT_KINDS, STATISTIC_KEYS } from "@/lib/vocabulary";

export const statisticKeys = STATISTIC_KEYS;
export const StatisticKey = z.enum(STATISTIC_KEYS);
export type StatisticKey = z.infer<typeof StatisticKey>;

export const Section = z.enum(SECTIONS);
export type Section = z.infer<typeof Section>;
export const Comparator = z.enum(COMPARATORS);
export type Comparator = z.infer<typeof Comparator>;
export const Framing = z.enum(FRAMINGS);
export type Framing = z.infer<typeof Framing>;

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
  kind: z.enum(STATEMENT_KINDS),
  statistic: StatisticKey.nullable(),
  /** The statistic's name as written when `statistic` is "other" ("expected cell count"); else null. */
  statistic_label: z.string().min(1).max(120).nullable().optional(),
  comparator: Comparator.nullable(),
  value: z.number().finite().nullable(),
  framing: Framing.nullable(),
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
