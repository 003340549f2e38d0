/**
 * Echoline's closed vocabularies, each written once. Zod enums (`z.enum(LIST)`), table types
 * (`(typeof LIST)[number]`), UI labels (`labelOf`) and the database's CHECK constraints are derived
 * from these lists; tests/integration/vocabulary.test.ts compares every list with the CHECK
 * constraint of the migrated database, so a value added here without a migration (or the reverse)
 * fails `npm test`.
 *
 * Adding a value: append it here, add a migration that replaces the CHECK constraint, and give it
 * a label below. Migrations spell their lists out (they never import today's code).
 */

export const ROLES = ["admin", "curator", "editor", "instructor", "reader"] as const;
export type Role = (typeof ROLES)[number];

export const ARTICLE_STATUSES = ["uploaded", "queued", "reading", "mining", "done", "failed"] as const;
export type ArticleStatus = (typeof ARTICLE_STATUSES)[number];

export const SOURCE_KINDS = ["pdf", "jats", "text"] as const;
export type SourceKind = (typeof SOURCE_KINDS)[number];

export const SECTIONS = ["methods", "results", "discussion", "introduction", "other", "unknown"] as const;
export type Section = (typeof SECTIONS)[number];

export const STATEMENT_KINDS = ["threshold", "reported", "procedure"] as const;
export type StatementKind = (typeof STATEMENT_KINDS)[number];

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
  "f_squared",
  "q_squared",
  "cohen_d",
  "first_stage_f",
  "tolerance",
  "skewness",
  "kurtosis",
  "minimum_sample_size",
  "other",
] as const;
export type StatisticKey = (typeof STATISTIC_KEYS)[number];

export const COMPARATORS = [">=", ">", "<=", "<", "="] as const;
export type Comparator = (typeof COMPARATORS)[number];

/**
 * Framing of a threshold. `disputed`: the sentence names the cut-off to argue against it; such a
 * statement never counts as asserting the practice.
 */
export const FRAMINGS = ["fixed", "contextual", "disputed"] as const;
export type Framing = (typeof FRAMINGS)[number];
/** Framings that assert the rule (dashboards and trails count only these). */
export const ASSERTING_FRAMINGS = ["fixed", "contextual"] as const satisfies readonly Framing[];

export const SOURCINGS = ["unsourced", "cited_no_locator", "cited_with_locator", "secondary_only"] as const;
export type Sourcing = (typeof SOURCINGS)[number];

export const REFERENCE_KINDS = ["book", "chapter", "article", "other"] as const;
export type ReferenceKind = (typeof REFERENCE_KINDS)[number];

export const WORK_TYPES = ["methods_source", "empirical", "unknown"] as const;
export type WorkType = (typeof WORK_TYPES)[number];

export const WORK_TYPE_DECIDERS = ["default", "venue", "reference_kind", "curator"] as const;
export type WorkTypeDecider = (typeof WORK_TYPE_DECIDERS)[number];

export const WORK_SET_BY = ["resolver", "curator"] as const;
export type WorkSetBy = (typeof WORK_SET_BY)[number];

export const TRAIL_ENDS = [
  "methods_source",
  "empirical_precedent",
  "unclassified",
  "unresolved",
  "no_citation",
  "cycle",
  "depth_limit",
] as const;
export type TrailEnd = (typeof TRAIL_ENDS)[number];

export const SOURCE_CHECK_VERDICTS = ["says_so", "says_otherwise", "silent", "not_checked"] as const;
export type SourceCheckVerdict = (typeof SOURCE_CHECK_VERDICTS)[number];

export const REVIEW_VERDICTS = ["correct", "incorrect", "corrected"] as const;
export type ReviewVerdict = (typeof REVIEW_VERDICTS)[number];

export const SCREENING_STATUSES = ["queued", "mining", "done", "failed"] as const;
export type ScreeningStatus = (typeof SCREENING_STATUSES)[number];

export const REPORT_FREQUENCIES = ["weekly", "monthly", "yearly"] as const;
export type ReportFrequency = (typeof REPORT_FREQUENCIES)[number];

export const DASHBOARD_NAMES = ["practice-over-time", "trail-ends", "venues", "drift", "trail-graph"] as const;
export type DashboardName = (typeof DASHBOARD_NAMES)[number];

/** Human words for every key the UI shows, with the trade's symbols (α, ω, ≥). */
export const LABELS = {
  role: { admin: "Admin", curator: "Curator", editor: "Editor", instructor: "Instructor", reader: "Reader" },
  articleStatus: {
    uploaded: "Uploaded",
    queued: "Queued",
    reading: "Reading the file",
    mining: "Mining",
    done: "Mined",
    failed: "Failed",
  },
  sourceKind: { pdf: "PDF", jats: "JATS XML", text: "Plain text" },
  section: {
    methods: "Methods",
    results: "Results",
    discussion: "Discussion",
    introduction: "Introduction",
    other: "Other section",
    unknown: "Section unknown",
  },
  statementKind: { threshold: "Cut-off claim", reported: "Reported value", procedure: "Procedure" },
  statistic: {
    cronbach_alpha: "Cronbach's α",
    mcdonald_omega: "McDonald's ω",
    composite_reliability: "Composite reliability",
    ave: "AVE",
    factor_loading: "Factor loading",
    htmt: "HTMT",
    vif: "VIF",
    cfi: "CFI",
    tli: "TLI",
    rmsea: "RMSEA",
    srmr: "SRMR",
    chi_square_df: "χ²/df",
    kmo: "KMO",
    eigenvalue: "Eigenvalue",
    icc: "ICC",
    cohen_kappa: "Cohen's κ",
    p_value: "Significance level (p)",
    r_squared: "R²",
    item_total_correlation: "Item–total correlation",
    sample_size_ratio: "Cases per parameter",
    statistical_power: "Statistical power",
    f_squared: "Effect size f²",
    q_squared: "Predictive relevance Q²",
    cohen_d: "Cohen's d",
    first_stage_f: "First-stage F",
    tolerance: "Tolerance",
    skewness: "Skewness",
    kurtosis: "Kurtosis",
    minimum_sample_size: "Minimum sample size",
    other: "Other statistic",
  },
  comparator: { ">=": "≥", ">": ">", "<=": "≤", "<": "<", "=": "=" },
  comparatorWords: {
    ">=": "at least",
    ">": "above",
    "<=": "at most",
    "<": "below",
    "=": "equal to",
  },
  framing: { fixed: "Fixed rule", contextual: "Depends on context", disputed: "Disputed" },
  sourcing: {
    unsourced: "No source",
    cited_no_locator: "Cited, no page",
    cited_with_locator: "Cited with page",
    secondary_only: "Second-hand only",
  },
  referenceKind: { book: "Book", chapter: "Book chapter", article: "Article", other: "Other" },
  workType: { methods_source: "Methods source", empirical: "Empirical study", unknown: "Not yet typed" },
  workTypeDecider: {
    default: "not yet decided",
    venue: "decided by its venue",
    reference_kind: "decided by the kind of reference (book, chapter, article)",
    curator: "set by a curator",
  },
  workSetBy: { resolver: "matched automatically", curator: "placed by a curator" },
  trailEnd: {
    methods_source: "Ends at a methods source",
    empirical_precedent: "Ends at an empirical precedent",
    unclassified: "Ends at a work not yet typed",
    unresolved: "Ends at an unresolved reference",
    no_citation: "No citation",
    cycle: "Runs in a circle",
    depth_limit: "Too long to follow",
  },
  sourceCheckVerdict: {
    says_so: "Says so",
    says_otherwise: "Says otherwise",
    silent: "Silent on it",
    not_checked: "Not checked",
  },
  reviewVerdict: { correct: "Confirmed", incorrect: "Rejected", corrected: "Corrected" },
  screeningStatus: { queued: "Queued", mining: "Mining", done: "Done", failed: "Failed" },
  reportFrequency: { weekly: "Weekly", monthly: "Monthly", yearly: "Yearly" },
  dashboard: {
    "practice-over-time": "Practice over time",
    "trail-ends": "Where trails end",
    venues: "Venue comparison",
    "trail-graph": "Trail graph",
    drift: "Drift from sources",
  },
} as const;

export type LabelGroup = keyof typeof LABELS;

/** The human label of `key` in `group`; an unknown key is shown as written rather than hidden. */
export function labelOf<G extends LabelGroup>(group: G, key: string | null | undefined): string {
  if (key === null || key === undefined) return "—";
  const map = LABELS[group] as Record<string, string>;
  return map[key] ?? key;
}

/** "1 article", "2 articles"; `plural` defaults to `singular + "s"`. */
export function plural(n: number, singular: string, pluralForm = `${singular}s`): string {
  return `${n.toLocaleString("en")} ${n === 1 ? singular : pluralForm}`;
}

/**
 * The statistic as people read it: the label of its key, or, for `other`, the name the sentence
 * used ("expected cell count").
 */
export function statisticName(statistic: string | null, statisticLabel?: string | null): string {
  if (statistic === "other" && statisticLabel) return statisticLabel;
  return labelOf("statistic", statistic);
}

/** "Cronbach's α ≥ 0.70" */
export function ruleText(rule: {
  statistic: string | null;
  statistic_label?: string | null;
  comparator: string | null;
  value: number | null;
}): string {
  const stat = statisticName(rule.statistic, rule.statistic_label);
  const cmp = rule.comparator ? labelOf("comparator", rule.comparator) : "";
  const value = rule.value === null ? "" : formatValue(rule.value);
  return [stat, cmp, value].filter(Boolean).join(" ");
}

/** APA-style number: no leading zero below 1 and at least two decimals there (".70"), plain integers above. */
export function formatValue(value: number): string {
  if (Number.isInteger(value)) return String(value);
  const abs = Math.abs(value);
  const decimals = Math.max(2, (String(abs).split(".")[1] ?? "").length);
  const s = abs.toFixed(decimals);
  return (value < 0 ? "−" : "") + (abs < 1 ? s.replace(/^0/, "") : s);
}
