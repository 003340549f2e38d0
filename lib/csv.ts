/**
 * Every CSV Echoline writes goes through here. Titles, sentences and work titles come from uploaded
 * documents, so a cell may start with a spreadsheet formula ("=HYPERLINK(…)"): such a text cell is
 * prefixed with an apostrophe and quoted, which spreadsheets show as text and never evaluate.
 * Numbers stay numbers: a numeric cell (-0.5) is data, and so is a text cell that is exactly a
 * decimal number, because PostgreSQL's numeric and bigint values arrive as text ("-0.5", "-3").
 */
import Papa from "papaparse";

/**
 * What papaparse tests text cells against (it never applies the test to number or boolean cells):
 * a formula start that is not a whole plain decimal number.
 */
export const FORMULA_CELL = /^(?![-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?$)[=+\-@\t\r]/;

/** Papa.unparse with formula cells neutralised; same arguments as Papa.unparse. */
export function unparseCsv(data: Parameters<typeof Papa.unparse>[0], config: Papa.UnparseConfig = {}): string {
  return Papa.unparse(data, { ...config, escapeFormulae: FORMULA_CELL });
}
