import type { Sourcing } from "@/lib/vocabulary";

/**
 * The four sourcing colours, used identically in every chart, table and badge. Each is paired with a
 * text label and an SVG pattern so colour is never the only signal.
 */
export const SOURCING: Record<
  Sourcing,
  { label: string; short: string; color: string; pattern: "solid" | "dots" | "lines" | "cross" }
> = {
  unsourced: { label: "No source given", short: "Unsourced", color: "var(--src-unsourced)", pattern: "solid" },
  cited_no_locator: { label: "Cited, no page", short: "No locator", color: "var(--src-nolocator)", pattern: "lines" },
  cited_with_locator: { label: "Cited with page", short: "With locator", color: "var(--src-locator)", pattern: "dots" },
  secondary_only: {
    label: "Second-hand only (as cited in)",
    short: "Secondary",
    color: "var(--src-secondary)",
    pattern: "cross",
  },
};
export const SOURCING_ORDER: Sourcing[] = ["unsourced", "cited_no_locator", "cited_with_locator", "secondary_only"];
