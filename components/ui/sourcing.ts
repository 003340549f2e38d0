import { LABELS, SOURCINGS, type Sourcing } from "@/lib/vocabulary";

/**
 * The four sourcing colours, used identically in every chart, table and badge. Each is paired with a
 * text label (from the vocabulary module) and an SVG pattern so colour is never the only signal.
 */
export const SOURCING: Record<
  Sourcing,
  { label: string; color: string; pattern: "solid" | "dots" | "lines" | "cross" }
> = {
  unsourced: { label: LABELS.sourcing.unsourced, color: "var(--src-unsourced)", pattern: "solid" },
  cited_no_locator: { label: LABELS.sourcing.cited_no_locator, color: "var(--src-nolocator)", pattern: "lines" },
  cited_with_locator: { label: LABELS.sourcing.cited_with_locator, color: "var(--src-locator)", pattern: "dots" },
  secondary_only: { label: LABELS.sourcing.secondary_only, color: "var(--src-secondary)", pattern: "cross" },
};
export const SOURCING_ORDER: readonly Sourcing[] = SOURCINGS;
