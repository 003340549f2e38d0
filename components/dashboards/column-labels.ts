import { LABELS, labelOf } from "@/lib/vocabulary";

/**
 * Column headings for the table views of charts. The CSV keeps the machine names (for R and Python);
 * the screen shows these words. A `_share`, `_lower` or `_upper` column is named after its base.
 */
const BASE: Record<string, string> = {
  year: "Year",
  articles: "Articles",
  asserting: "Articles asserting it",
  share: "Share asserting it",
  statements: "Statements",
  length: "Citation hops",
  z: "z",
  chi_square: "χ²",
  p_value: "p",
  direction: "Direction",
  work_id: "Work id",
  title: "Title",
  first_author: "First author",
  work_type: "Type",
  in_corpus: "In the corpus",
  citations: "Citations",
  with_locator: "With a page",
  locator_rate: "Share with a page",
  locator: "Share with a page",
  venue_id: "Venue id",
  venue: "Venue",
  is_methods_venue: "Methods venue",
  rate: "Share asserting it",
  rate_vs_rest: "Difference from the rest",
  in_venue: "In-venue citations",
  in_venue_share: "In-venue share",
  in_venue_vs_rest: "In-venue share, difference from the rest",
  statement_id: "Statement id",
  article_id: "Article id",
  article_title: "Article",
  sentence: "Sentence",
  claimed_value: "Value claimed",
  work_title: "Work",
  verdict: "The source",
  stated_value: "Value the source states",
  page: "Page",
  quote: "Quote",
  from: "From",
  from_year: "From (year)",
  to: "To",
  to_year: "To (year)",
  kind: "Link",
  secondary: "Second-hand (as cited in)",
  count: "Count",
  not_built: "Trail not built yet",
  ...LABELS.sourcing,
  ...LABELS.trailEnd,
};

export function columnLabel(col: string): string {
  if (BASE[col]) return BASE[col];
  const m = /^(.*)_(share|lower|upper)$/.exec(col);
  if (m) {
    const base = m[1] === "in_venue" && m[2] !== "share" ? "In-venue share" : columnLabel(m[1]);
    return m[2] === "share" ? `${base}: share` : `${base}: 95% ${m[2]}`;
  }
  return col.replace(/_/g, " ");
}

const EDGE_KIND: Record<string, string> = { cites: "cites", asserted_in: "asserted in" };

/** A cell as the screen shows it: enum values in words, yes/no for flags, "—" for nothing. */
export function cellText(col: string, v: unknown): string {
  if (v === null || v === undefined || v === "") return "—";
  if (typeof v === "boolean") return v ? "yes" : "no";
  if (col === "verdict") return labelOf("sourceCheckVerdict", String(v));
  if (col === "work_type") return labelOf("workType", String(v));
  if (col === "kind") return EDGE_KIND[String(v)] ?? String(v);
  if (col === "end" || col === "end_kind") return labelOf("trailEnd", String(v));
  if (col === "sourcing") return labelOf("sourcing", String(v));
  return String(v);
}
