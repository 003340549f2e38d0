/**
 * A deterministic model of an invented literature for Echoline's demo corpus. Everything here is
 * invented: venues, methods books, publishers, authors, studies and numbers. The model is built so
 * that practices spread the way they do in real literatures: a few methods sources say something
 * (with a page), early empirical articles cite them, later articles cite those articles ("following
 * Brandt et al. (2003)"), some cite nothing, a few cite second-hand ("as cited in") and a few cite a
 * source for a value it does not give. Rates drift over the years so that dashboards have a story.
 *
 * DOIs use the prefix 10.99999, chosen as an invented registrant code so demo DOIs cannot be
 * mistaken for, or resolve to, real works (from memory: prefixes are assigned from 10.1000 upwards
 * and none this high is in use; not verified against the registry).
 *
 * Pure: no I/O, no clock, no Math.random. Same options → same corpus.
 */
import type { StatisticKey } from "@/lib/mining/contract";
import { Rng } from "./random";
import { INITIALS, OUTSIDE_JOURNALS, SURNAMES } from "./names";

export type Comparator = ">=" | ">" | "<=" | "<" | "=";
export type Framing = "fixed" | "contextual";
export type SectionKind = "introduction" | "methods" | "results" | "discussion" | "other" | "references";
export type DemoLicence = "CC BY 4.0";

export interface DemoPerson {
  family: string;
  /** "K." or "K. L." */
  initials: string;
}

export interface DemoVenue {
  key: string;
  name: string;
  abbreviation: string;
  isMethodsVenue: boolean;
  /** Stated on every page and in the venue's description: the venue is invented. */
  description: string;
  twoColumn: boolean;
  field: FieldKey;
  firstYear: number;
}

export type FieldKey = "methods" | "work" | "consumer" | "education" | "health" | "systems";

/** One thing a methods source really says, at a page (the ground truth for source checks). */
export interface SourceClaim {
  statistic: StatisticKey | null;
  comparator: Comparator | null;
  value: number | null;
  framing: Framing | null;
  /** For procedures: the key of the procedure the source warns about. */
  procedure?: string;
  page: string;
  says: string;
}

/** Anything that can be cited: a corpus article, a methods book, an outside article. */
export interface DemoWork {
  key: string;
  kind: "book" | "article";
  authors: DemoPerson[];
  year: number;
  title: string;
  /** Journal name for articles (a demo venue or an outside invented journal). */
  container: string | null;
  volume: number | null;
  issue: number | null;
  pages: string | null;
  publisher: string | null;
  edition: string | null;
  doi: string | null;
  /** Set when the work is an article of this corpus. */
  articleId: string | null;
  isMethodsSource: boolean;
  /** What the work really says about practices (methods sources only). */
  claims: SourceClaim[];
}

/** How a claim came to be sourced, as the generator decided it (kept for tests and the report). */
export type ClaimOrigin =
  | "methods_with_locator"
  | "methods_no_locator"
  | "precedent"
  | "precedent_silent"
  | "secondary"
  | "misquote"
  | "unsourced";

export interface DemoCitation {
  workKey: string;
  /** In-text author string as written: "Okafor & Lindqvist", "Brandt et al.". */
  authors: string;
  year: string;
  locator: string | null;
  secondary: boolean;
  /** For a secondary citation: the work it was read in (the one in the reference list). */
  citedInKey: string | null;
  narrative: boolean;
}

export interface DemoStatement {
  kind: "threshold" | "reported" | "procedure";
  statistic: StatisticKey | null;
  comparator: Comparator | null;
  value: number | null;
  framing: Framing | null;
  procedure: string | null;
  /** Practice group key (e.g. "alpha70", "fit_modern") for thresholds; null otherwise. */
  practice: string | null;
  origin: ClaimOrigin | null;
}

export interface DemoSentence {
  text: string;
  statements: DemoStatement[];
  citations: DemoCitation[];
  /** A sentence written to look like a statement but that is none (sample sizes, ages, p as result…). */
  hardNegative: boolean;
}

export interface DemoBlock {
  heading: string | null;
  level: 1 | 2;
  section: SectionKind;
  paragraphs: DemoSentence[][];
}

export interface DemoReference {
  workKey: string;
  text: string;
  doi: string | null;
  kind: "book" | "article";
}

export interface DemoArticle {
  id: string;
  /** Order of generation (chronological). */
  index: number;
  venueKey: string;
  venueName: string;
  year: number;
  volume: number;
  issue: number;
  firstPage: number;
  authors: DemoPerson[];
  title: string;
  doi: string;
  licence: DemoLicence;
  isMethodsArticle: boolean;
  twoColumn: boolean;
  abstract: string;
  keywords: string[];
  blocks: DemoBlock[];
  references: DemoReference[];
  isDemo: true;
}

export interface DemoCorpus {
  seed: number;
  venues: DemoVenue[];
  /** Books and outside articles (works not in the corpus), including the methods books. */
  outsideWorks: DemoWork[];
  /** Every citable work by key: outside works and corpus articles. */
  works: Record<string, DemoWork>;
  articles: DemoArticle[];
}

export interface GenerateOptions {
  count?: number;
  seed?: number;
  /** Approximate pages per empirical article (default 3); larger values add discussion text. */
  pagesPerArticle?: number;
}

export const DEFAULT_SEED = 20_240_611;
export const DEFAULT_COUNT = 330;
export const FIRST_YEAR = 1995;
export const LAST_YEAR = 2025;
export const DEMO_LICENCE: DemoLicence = "CC BY 4.0";
export const DOI_PREFIX = "10.99999";

// ---------------------------------------------------------------------------------------------
// Venues

export const DEMO_VENUES: readonly DemoVenue[] = [
  {
    key: "nrsm",
    name: "Northfield Review of Survey Methods",
    abbreviation: "NRSM",
    isMethodsVenue: true,
    twoColumn: false,
    field: "methods",
    firstYear: 1990,
    description: "Invented demo venue: a methods journal on measurement and survey analysis.",
  },
  {
    key: "qjws",
    name: "Quillmere Journal of Workplace Studies",
    abbreviation: "QJWS",
    isMethodsVenue: false,
    twoColumn: false,
    field: "work",
    firstYear: 1988,
    description: "Invented demo venue: empirical studies of work and organisations.",
  },
  {
    key: "trcb",
    name: "Tarnwick Review of Consumer Behaviour",
    abbreviation: "TRCB",
    isMethodsVenue: false,
    twoColumn: true,
    field: "consumer",
    firstYear: 1992,
    description: "Invented demo venue: empirical studies of consumers and markets.",
  },
  {
    key: "ejli",
    name: "Ebbrook Journal of Learning and Instruction",
    abbreviation: "EJLI",
    isMethodsVenue: false,
    twoColumn: false,
    field: "education",
    firstYear: 1985,
    description: "Invented demo venue: empirical studies of teaching and learning.",
  },
  {
    key: "cqhb",
    name: "Cardenhollow Quarterly of Health Behaviour",
    abbreviation: "CQHB",
    isMethodsVenue: false,
    twoColumn: true,
    field: "health",
    firstYear: 1991,
    description: "Invented demo venue: empirical studies of health behaviour.",
  },
  {
    key: "vjis",
    name: "Veldmark Journal of Information Systems Practice",
    abbreviation: "VJISP",
    isMethodsVenue: false,
    twoColumn: true,
    field: "systems",
    firstYear: 1994,
    description: "Invented demo venue: empirical studies of information systems in use.",
  },
];

/**
 * Per-venue habits, as [value in 1995, value in 2025] with linear drift in between. The stories:
 * Tarnwick's unsourced ".70 rule" climbs; Veldmark leans more and more on precedent while locators
 * vanish; Cardenhollow gets better at locators; Quillmere and Ebbrook drift gently.
 */
interface Habits {
  unsourced: [number, number];
  /** Extra unsourced weight for the alpha .70 rule only. */
  alphaUnsourced: [number, number];
  precedent: [number, number];
  secondary: number;
  misquote: [number, number];
  locator: [number, number];
  cmvProof: [number, number];
  analyses: { cfa: number; pls: [number, number]; efa: number; regression: number };
  weight: [number, number];
}
const HABITS: Record<string, Habits> = {
  qjws: {
    unsourced: [0.15, 0.25],
    alphaUnsourced: [0, 0.1],
    precedent: [0.15, 0.35],
    secondary: 0.05,
    misquote: [0.04, 0.08],
    locator: [0.6, 0.35],
    cmvProof: [0.05, 0.2],
    analyses: { cfa: 3, pls: [0, 1], efa: 1.5, regression: 1.5 },
    weight: [1, 2],
  },
  trcb: {
    unsourced: [0.1, 0.2],
    alphaUnsourced: [0, 0.45],
    precedent: [0.15, 0.3],
    secondary: 0.06,
    misquote: [0.05, 0.14],
    locator: [0.5, 0.25],
    cmvProof: [0.08, 0.3],
    analyses: { cfa: 2, pls: [0, 3], efa: 1, regression: 1 },
    weight: [0.8, 2.4],
  },
  ejli: {
    unsourced: [0.12, 0.14],
    alphaUnsourced: [0, 0.02],
    precedent: [0.15, 0.25],
    secondary: 0.04,
    misquote: [0.03, 0.04],
    locator: [0.7, 0.6],
    cmvProof: [0.02, 0.06],
    analyses: { cfa: 2, pls: [0, 0.3], efa: 2, regression: 2 },
    weight: [1, 1.5],
  },
  cqhb: {
    unsourced: [0.25, 0.12],
    alphaUnsourced: [0.05, 0],
    precedent: [0.1, 0.2],
    secondary: 0.05,
    misquote: [0.06, 0.03],
    locator: [0.35, 0.7],
    cmvProof: [0.04, 0.05],
    analyses: { cfa: 1.5, pls: [0, 0.5], efa: 1.5, regression: 3 },
    weight: [0.7, 1.6],
  },
  vjis: {
    unsourced: [0.12, 0.2],
    alphaUnsourced: [0, 0.08],
    precedent: [0.1, 0.55],
    secondary: 0.07,
    misquote: [0.04, 0.1],
    locator: [0.5, 0.15],
    cmvProof: [0.06, 0.35],
    analyses: { cfa: 1.5, pls: [0, 4], efa: 0.5, regression: 1 },
    weight: [0.3, 2.5],
  },
};

const lerp = ([a, b]: [number, number], year: number) => a + ((b - a) * (year - FIRST_YEAR)) / (LAST_YEAR - FIRST_YEAR);

// ---------------------------------------------------------------------------------------------
// Fields: constructs and populations per venue

interface Field {
  constructs: string[];
  populations: string[];
  settings: string[];
}
const FIELDS: Record<Exclude<FieldKey, "methods">, Field> = {
  work: {
    constructs: [
      "job demands",
      "emotional exhaustion",
      "work engagement",
      "turnover intention",
      "psychological safety",
      "role ambiguity",
      "supervisor support",
      "job crafting",
      "recovery after work",
      "affective commitment",
      "workload",
      "perceived autonomy",
    ],
    populations: [
      "night-shift nurses",
      "call-centre agents",
      "secondary-school teachers",
      "warehouse employees",
      "software developers",
      "municipal social workers",
      "hotel kitchen staff",
      "bus drivers",
    ],
    settings: ["regional hospitals", "logistics firms", "public agencies", "mid-sized manufacturers"],
  },
  consumer: {
    constructs: [
      "brand loyalty",
      "perceived value",
      "customer satisfaction",
      "purchase intention",
      "brand trust",
      "price fairness",
      "online word of mouth",
      "service quality",
      "impulse buying",
      "switching costs",
      "store atmosphere",
      "green purchase attitude",
    ],
    populations: [
      "online shoppers",
      "hotel guests",
      "supermarket customers",
      "mobile-plan subscribers",
      "restaurant patrons",
      "first-time car buyers",
      "festival visitors",
    ],
    settings: ["retail chains", "coastal resorts", "subscription services", "farmers' markets"],
  },
  education: {
    constructs: [
      "academic self-efficacy",
      "mathematics anxiety",
      "reading motivation",
      "classroom climate",
      "teacher support",
      "school engagement",
      "test anxiety",
      "peer belonging",
      "homework effort",
      "growth mindset",
      "self-regulated learning",
      "teacher enthusiasm",
    ],
    populations: [
      "lower-secondary pupils",
      "pre-service teachers",
      "first-year undergraduates",
      "vocational students",
      "primary-school teachers",
      "adult learners",
    ],
    settings: ["urban schools", "rural schools", "teacher colleges", "community colleges"],
  },
  health: {
    constructs: [
      "health literacy",
      "exercise intention",
      "patient satisfaction",
      "medication adherence",
      "perceived risk",
      "self-care behaviour",
      "sleep quality",
      "perceived stress",
      "social support",
      "dietary self-efficacy",
      "illness perception",
      "trust in clinicians",
    ],
    populations: [
      "outpatients with type 2 diabetes",
      "older adults living alone",
      "pregnant women",
      "university students",
      "cardiac rehabilitation patients",
      "shift workers",
      "family caregivers",
    ],
    settings: ["primary-care clinics", "community pharmacies", "rehabilitation centres", "public-health programmes"],
  },
  systems: {
    constructs: [
      "perceived usefulness",
      "perceived ease of use",
      "system quality",
      "intention to use",
      "information overload",
      "security concern",
      "user satisfaction",
      "habit",
      "technostress",
      "task–technology fit",
      "continuance intention",
      "perceived enjoyment",
    ],
    populations: [
      "hospital clerks using an electronic record",
      "small-business owners",
      "mobile-banking users",
      "university staff",
      "field engineers",
      "public-sector employees",
      "online learners",
    ],
    settings: ["enterprise software roll-outs", "mobile platforms", "cloud services", "public e-services"],
  },
};

// ---------------------------------------------------------------------------------------------
// Methods sources (the ground truth the trails should end at)

const P = (family: string, initials: string): DemoPerson => ({ family, initials });

const BOOKS: DemoWork[] = [
  {
    key: "okafor1994",
    kind: "book",
    authors: [P("Okafor", "E."), P("Lindqvist", "B.")],
    year: 1994,
    title: "Psychometric foundations for applied researchers",
    container: null,
    volume: null,
    issue: null,
    pages: null,
    publisher: "Kestrel House",
    edition: null,
    doi: null,
    articleId: null,
    isMethodsSource: true,
    claims: [
      {
        statistic: "cronbach_alpha",
        comparator: ">=",
        value: 0.7,
        framing: "contextual",
        page: "p. 112",
        says: "An alpha of .70 suffices in the early stages of research; basic research calls for .80 and decisions about individuals for .90.",
      },
      {
        statistic: "cronbach_alpha",
        comparator: ">=",
        value: 0.8,
        framing: "contextual",
        page: "p. 112",
        says: "Basic research calls for .80.",
      },
      {
        statistic: "cronbach_alpha",
        comparator: ">=",
        value: 0.9,
        framing: "contextual",
        page: "p. 112",
        says: "Decisions about individuals call for .90.",
      },
    ],
  },
  {
    key: "varga1999",
    kind: "book",
    authors: [P("Varga", "T."), P("Nakashima", "R.")],
    year: 1999,
    title: "Exploratory measurement in the social sciences",
    container: null,
    volume: null,
    issue: null,
    pages: null,
    publisher: "Harlow Bridge Press",
    edition: "2nd ed.",
    doi: null,
    articleId: null,
    isMethodsSource: true,
    claims: [
      {
        statistic: "cronbach_alpha",
        comparator: ">=",
        value: 0.6,
        framing: "contextual",
        page: "p. 87",
        says: "For exploratory work with new scales, an alpha of .60 can be acceptable.",
      },
    ],
  },
  {
    key: "ilunga1996",
    kind: "book",
    authors: [P("Ilunga", "P."), P("Petrakis", "S.")],
    year: 1996,
    title: "Factor analysis in practice",
    container: null,
    volume: null,
    issue: null,
    pages: null,
    publisher: "Greyfriars Lane Press",
    edition: null,
    doi: null,
    articleId: null,
    isMethodsSource: true,
    claims: [
      {
        statistic: "kmo",
        comparator: ">=",
        value: 0.6,
        framing: "fixed",
        page: "p. 58",
        says: "A KMO below .60 makes factoring inadvisable.",
      },
      {
        statistic: "factor_loading",
        comparator: ">=",
        value: 0.4,
        framing: "contextual",
        page: "p. 61",
        says: "Loadings of .40 are interpretable with more than 200 cases; smaller samples need .60.",
      },
    ],
  },
  {
    key: "demir2001",
    kind: "book",
    authors: [P("Demir", "A."), P("Achterberg", "H.")],
    year: 2001,
    title: "Structural models for survey researchers",
    container: null,
    volume: null,
    issue: null,
    pages: null,
    publisher: "Lowfield Academic",
    edition: null,
    doi: null,
    articleId: null,
    isMethodsSource: true,
    claims: [
      {
        statistic: "composite_reliability",
        comparator: ">=",
        value: 0.7,
        framing: "fixed",
        page: "p. 214",
        says: "Composite reliability should be at least .70.",
      },
      {
        statistic: "ave",
        comparator: ">=",
        value: 0.5,
        framing: "fixed",
        page: "p. 214",
        says: "The AVE should be at least .50.",
      },
      {
        statistic: "factor_loading",
        comparator: ">=",
        value: 0.7,
        framing: "fixed",
        page: "p. 212",
        says: "Standardised loadings of .70 or more.",
      },
    ],
  },
  {
    key: "brightwater1993",
    kind: "book",
    authors: [P("Brightwater", "L."), P("Solberg", "K.")],
    year: 1993,
    title: "Fitting structural models: A field guide",
    container: null,
    volume: null,
    issue: null,
    pages: null,
    publisher: "Fenwick & Rowe",
    edition: null,
    doi: null,
    articleId: null,
    isMethodsSource: true,
    claims: [
      {
        statistic: "cfi",
        comparator: ">=",
        value: 0.9,
        framing: "fixed",
        page: "p. 144",
        says: "A CFI of .90 or more indicates acceptable fit.",
      },
      {
        statistic: "rmsea",
        comparator: "<=",
        value: 0.08,
        framing: "fixed",
        page: "p. 144",
        says: "An RMSEA up to .08 indicates reasonable fit.",
      },
    ],
  },
];

/** The four methods-venue articles that the empirical literature cites; they are corpus articles. */
interface CoreMethodsArticle {
  key: string;
  year: number;
  authors: DemoPerson[];
  title: string;
  firstPage: number;
  claims: SourceClaim[];
  /** Sentences in which the article itself states its recommendation (its own methods text). */
  ownText: { text: string; statements: Omit<DemoStatement, "origin" | "practice">[] }[];
}
const CORE_METHODS: CoreMethodsArticle[] = [
  {
    key: "adeyemi1998",
    year: 1998,
    authors: [P("Adeyemi", "O."), P("Castellanos", "M.")],
    firstPage: 11,
    title: "Cut-off values for fit indices with continuous indicators: A simulation",
    claims: [
      {
        statistic: "cfi",
        comparator: ">=",
        value: 0.95,
        framing: "contextual",
        page: "p. 17",
        says: "CFI of .95 or more with continuous indicators and N above 250.",
      },
      {
        statistic: "tli",
        comparator: ">=",
        value: 0.95,
        framing: "contextual",
        page: "p. 17",
        says: "TLI of .95 or more under the same conditions.",
      },
      {
        statistic: "rmsea",
        comparator: "<=",
        value: 0.06,
        framing: "contextual",
        page: "p. 17",
        says: "RMSEA of .06 or less under the same conditions.",
      },
      {
        statistic: "srmr",
        comparator: "<=",
        value: 0.08,
        framing: "contextual",
        page: "p. 17",
        says: "SRMR of .08 or less under the same conditions.",
      },
    ],
    ownText: [
      {
        text: "For continuous indicators and samples above 250 cases, we therefore suggest a CFI of .95 or more, an RMSEA of .06 or less and an SRMR of .08 or less, while stressing that these values depend on the model and the data.",
        statements: [
          {
            kind: "threshold",
            statistic: "cfi",
            comparator: ">=",
            value: 0.95,
            framing: "contextual",
            procedure: null,
          },
          {
            kind: "threshold",
            statistic: "rmsea",
            comparator: "<=",
            value: 0.06,
            framing: "contextual",
            procedure: null,
          },
          {
            kind: "threshold",
            statistic: "srmr",
            comparator: "<=",
            value: 0.08,
            framing: "contextual",
            procedure: null,
          },
        ],
      },
      {
        text: "With ordinal indicators or fewer than 150 cases, a CFI of .95 rejected correct models too often to serve as a fixed rule.",
        statements: [
          {
            kind: "threshold",
            statistic: "cfi",
            comparator: ">=",
            value: 0.95,
            framing: "contextual",
            procedure: null,
          },
        ],
      },
    ],
  },
  {
    key: "szabo2003",
    year: 2003,
    authors: [P("Szabo", "E."), P("Nwosu", "C.")],
    firstPage: 101,
    title: "What a single-factor test can and cannot show about common method variance",
    claims: [
      {
        statistic: null,
        comparator: null,
        value: null,
        framing: null,
        procedure: "single_factor_cmv_proof",
        page: "p. 109",
        says: "A single-factor test cannot establish that common method variance is absent.",
      },
    ],
    ownText: [
      {
        text: "In every simulated condition the single-factor test was insensitive to method variance of moderate size, so it cannot show that common method variance is absent.",
        statements: [],
      },
    ],
  },
  {
    key: "mwangi2004",
    year: 2004,
    authors: [P("Mwangi", "J."), P("Forsberg", "L.")],
    firstPage: 27,
    title: "Collinearity diagnostics for survey models",
    claims: [
      {
        statistic: "vif",
        comparator: "<",
        value: 5,
        framing: "fixed",
        page: "p. 33",
        says: "VIF values should stay below 5; a limit of 10 is too lenient.",
      },
    ],
    ownText: [
      {
        text: "We recommend that variance inflation factors stay below 5, because the common limit of 10 let through collinearity that doubled the standard errors in our simulations.",
        statements: [
          { kind: "threshold", statistic: "vif", comparator: "<", value: 5, framing: "fixed", procedure: null },
        ],
      },
    ],
  },
  {
    key: "rautenbach2012",
    year: 2012,
    authors: [P("Rautenbach", "D."), P("Quispe", "A.")],
    firstPage: 115,
    title: "A ratio criterion for discriminant validity in composite models",
    claims: [
      {
        statistic: "htmt",
        comparator: "<",
        value: 0.85,
        framing: "contextual",
        page: "p. 121",
        says: "HTMT below .85 is a conservative criterion for distinct constructs.",
      },
      {
        statistic: "htmt",
        comparator: "<",
        value: 0.9,
        framing: "contextual",
        page: "p. 121",
        says: "HTMT below .90 may be used for conceptually close constructs.",
      },
    ],
    ownText: [
      {
        text: "An HTMT ratio below .85 is a conservative criterion for constructs that are conceptually distinct, whereas .90 may serve when constructs are conceptually close.",
        statements: [
          {
            kind: "threshold",
            statistic: "htmt",
            comparator: "<",
            value: 0.85,
            framing: "contextual",
            procedure: null,
          },
          { kind: "threshold", statistic: "htmt", comparator: "<", value: 0.9, framing: "contextual", procedure: null },
        ],
      },
    ],
  },
];

// ---------------------------------------------------------------------------------------------
// Practices asserted by empirical articles, with their true source and wording

type Analysis = "cfa" | "pls" | "efa" | "regression";

interface Template {
  /** Clause with {v} placeholders in order of `stats`; no final period. */
  t: string;
  cmps: Comparator[];
}
interface PracticeDef {
  key: string;
  stats: { statistic: StatisticKey; value: number }[];
  framing: Framing;
  minYear: number;
  source: { work: string; page: string };
  /** A source that does not give this value, cited for it anyway. */
  misquote?: { work: string; page: string };
  templates: Template[];
}

const PRACTICES: Record<string, PracticeDef> = {
  alpha70: {
    key: "alpha70",
    stats: [{ statistic: "cronbach_alpha", value: 0.7 }],
    framing: "fixed",
    minYear: 1995,
    source: { work: "okafor1994", page: "p. 112" },
    misquote: { work: "varga1999", page: "p. 87" },
    templates: [
      { t: "Internal consistency was considered acceptable when Cronbach's alpha exceeded {v}", cmps: [">"] },
      { t: "A Cronbach's alpha of {v} or higher was taken to indicate adequate reliability", cmps: [">="] },
      { t: "Scales were retained only if Cronbach's alpha was at least {v}", cmps: [">="] },
      { t: "Reliability was judged against the conventional criterion of α ≥ {v}", cmps: [">="] },
      { t: "Cronbach's alpha values above {v} were regarded as acceptable for all scales", cmps: [">"] },
      { t: "The usual rule that Cronbach's alpha should reach {v} was applied to every scale", cmps: [">="] },
    ],
  },
  alpha60: {
    key: "alpha60",
    stats: [{ statistic: "cronbach_alpha", value: 0.6 }],
    framing: "contextual",
    minYear: 2000,
    source: { work: "varga1999", page: "p. 87" },
    templates: [
      {
        t: "Because the scales were newly developed, Cronbach's alpha values of {v} or higher were considered acceptable at this exploratory stage",
        cmps: [">="],
      },
      { t: "For exploratory work such as this, a Cronbach's alpha above {v} was treated as sufficient", cmps: [">"] },
    ],
  },
  cr70: {
    key: "cr70",
    stats: [{ statistic: "composite_reliability", value: 0.7 }],
    framing: "fixed",
    minYear: 2002,
    source: { work: "demir2001", page: "p. 214" },
    templates: [
      {
        t: "Composite reliability values of {v} or above were taken as evidence of internal consistency",
        cmps: [">="],
      },
      { t: "Composite reliability was required to exceed {v} for every construct", cmps: [">"] },
      { t: "We required a composite reliability of at least {v} for each construct", cmps: [">="] },
    ],
  },
  ave50: {
    key: "ave50",
    stats: [{ statistic: "ave", value: 0.5 }],
    framing: "fixed",
    minYear: 2002,
    source: { work: "demir2001", page: "p. 214" },
    templates: [
      {
        t: "Convergent validity was established when the average variance extracted (AVE) was at least {v}",
        cmps: [">="],
      },
      { t: "An AVE above {v} was taken to indicate convergent validity", cmps: [">"] },
      { t: "Each construct had to reach an average variance extracted of {v} or more", cmps: [">="] },
    ],
  },
  load70: {
    key: "load70",
    stats: [{ statistic: "factor_loading", value: 0.7 }],
    framing: "fixed",
    minYear: 2002,
    source: { work: "demir2001", page: "p. 212" },
    templates: [
      { t: "Indicator loadings were expected to be at least {v}", cmps: [">="] },
      { t: "Items were retained when their standardised loadings exceeded {v}", cmps: [">"] },
    ],
  },
  load40: {
    key: "load40",
    stats: [{ statistic: "factor_loading", value: 0.4 }],
    framing: "fixed",
    minYear: 1997,
    source: { work: "ilunga1996", page: "p. 61" },
    templates: [
      { t: "Items loading at least {v} on their factor were retained", cmps: [">="] },
      { t: "Factor loadings of {v} or higher were considered salient", cmps: [">="] },
    ],
  },
  kmo60: {
    key: "kmo60",
    stats: [{ statistic: "kmo", value: 0.6 }],
    framing: "fixed",
    minYear: 1997,
    source: { work: "ilunga1996", page: "p. 58" },
    templates: [
      { t: "A KMO measure of sampling adequacy of at least {v} was required before factoring", cmps: [">="] },
      { t: "Sampling adequacy was judged acceptable when the KMO measure exceeded {v}", cmps: [">"] },
    ],
  },
  htmt85: {
    key: "htmt85",
    stats: [{ statistic: "htmt", value: 0.85 }],
    framing: "fixed",
    minYear: 2013,
    source: { work: "rautenbach2012", page: "p. 121" },
    templates: [
      { t: "Discriminant validity was assumed when the heterotrait–monotrait ratio (HTMT) was below {v}", cmps: ["<"] },
      { t: "HTMT values under {v} were taken as evidence of discriminant validity", cmps: ["<"] },
    ],
  },
  vif5: {
    key: "vif5",
    stats: [{ statistic: "vif", value: 5 }],
    framing: "fixed",
    minYear: 2005,
    source: { work: "mwangi2004", page: "p. 33" },
    templates: [
      {
        t: "Multicollinearity was not considered a problem when variance inflation factors (VIF) were below {v}",
        cmps: ["<"],
      },
      { t: "All VIF values were required to stay below {v}", cmps: ["<"] },
      { t: "A VIF under {v} was used as the cut-off for collinearity", cmps: ["<"] },
    ],
  },
  fit_modern: {
    key: "fit_modern",
    stats: [
      { statistic: "cfi", value: 0.95 },
      { statistic: "tli", value: 0.95 },
      { statistic: "rmsea", value: 0.06 },
      { statistic: "srmr", value: 0.08 },
    ],
    framing: "fixed",
    minYear: 1999,
    source: { work: "adeyemi1998", page: "p. 17" },
    templates: [
      {
        t: "Model fit was judged acceptable when CFI and TLI were at least {0}, RMSEA was at most {2} and SRMR was at most {3}",
        cmps: [">=", ">=", "<=", "<="],
      },
      { t: "Good fit was defined as CFI ≥ {0}, TLI ≥ {1}, RMSEA ≤ {2} and SRMR ≤ {3}", cmps: [">=", ">=", "<=", "<="] },
    ],
  },
  fit_classic: {
    key: "fit_classic",
    stats: [
      { statistic: "cfi", value: 0.9 },
      { statistic: "rmsea", value: 0.08 },
    ],
    framing: "fixed",
    minYear: 1995,
    source: { work: "brightwater1993", page: "p. 144" },
    misquote: { work: "adeyemi1998", page: "p. 17" },
    templates: [
      { t: "Fit was considered adequate when the CFI exceeded {0} and the RMSEA was below {1}", cmps: [">", "<"] },
      { t: "An acceptable model was one with CFI ≥ {0} and RMSEA ≤ {1}", cmps: [">=", "<="] },
    ],
  },
};

/** APA style: no leading zero for values below 1, two decimals unless a third is needed (".045"). */
function fmt(value: number): string {
  if (Number.isInteger(value)) return String(value);
  const s = value.toFixed(Math.abs(value * 100 - Math.round(value * 100)) < 1e-9 ? 2 : 3);
  return s.replace(/^0/, "");
}

// ---------------------------------------------------------------------------------------------
// Generator state

interface Assertion {
  articleKey: string;
  venueKey: string;
  year: number;
  practice: string;
  /** The methods work the assertion cited directly, if any (makes it usable for "as cited in"). */
  directSource: string | null;
}

class Ctx {
  rng: Rng;
  works: Record<string, DemoWork> = {};
  outside: DemoWork[] = [];
  outsideByField = new Map<string, DemoWork[]>();
  assertions: Assertion[] = [];
  /** `${articleKey}|${practice}` for every assertion, so the silent-precedent filter stays linear. */
  asserted = new Set<string>();
  corpusByVenue = new Map<string, string[]>();
  doiSeq = new Map<string, number>();
  constructor(seed: number) {
    this.rng = new Rng(seed);
  }
  nextDoi(venue: DemoVenue, year: number): string {
    const k = `${venue.key}.${year}`;
    const n = (this.doiSeq.get(k) ?? 0) + 1;
    this.doiSeq.set(k, n);
    return `${DOI_PREFIX}/${venue.key}.${year}.${String(n).padStart(3, "0")}`;
  }
}

function person(rng: Rng, taken: Set<string>): DemoPerson {
  for (;;) {
    const family = rng.pick(SURNAMES);
    if (taken.has(family)) continue;
    taken.add(family);
    const initials = rng.chance(0.3)
      ? `${rng.pick([...INITIALS])}. ${rng.pick([...INITIALS])}.`
      : `${rng.pick([...INITIALS])}.`;
    return { family, initials };
  }
}

function authorsFor(rng: Rng, year: number): DemoPerson[] {
  const taken = new Set<string>();
  const late = (year - FIRST_YEAR) / (LAST_YEAR - FIRST_YEAR);
  const n = rng.weighted<number>([
    [1, 0.25 - 0.15 * late],
    [2, 0.35],
    [3, 0.25 + 0.1 * late],
    [4, 0.1 + 0.1 * late],
    [5, 0.05 + 0.08 * late],
  ]);
  return Array.from({ length: n }, () => person(rng, taken));
}

/** In-text author string: APA 7 style (one, two with "&"/"and", three or more with "et al."). */
export function intextAuthors(authors: readonly DemoPerson[], narrative: boolean): string {
  if (authors.length === 1) return authors[0].family;
  if (authors.length === 2) return `${authors[0].family} ${narrative ? "and" : "&"} ${authors[1].family}`;
  return `${authors[0].family} et al.`;
}

function apaAuthors(authors: readonly DemoPerson[]): string {
  const names = authors.map((a) => `${a.family}, ${a.initials}`);
  if (names.length === 1) return names[0];
  return `${names.slice(0, -1).join(", ")}, & ${names[names.length - 1]}`;
}

export function referenceText(w: DemoWork): string {
  const head = `${apaAuthors(w.authors)} (${w.year}). `;
  if (w.kind === "book") return `${head}${w.title}${w.edition ? ` (${w.edition})` : ""}. ${w.publisher}.`;
  const vol = w.volume != null ? `, ${w.volume}${w.issue != null ? `(${w.issue})` : ""}` : "";
  const pages = w.pages ? `, ${w.pages}` : "";
  return `${head}${w.title}. ${w.container}${vol}${pages}.${w.doi ? ` https://doi.org/${w.doi}` : ""}`;
}

/** Tracks what one article cites, so in-text citations and the reference list always agree. */
class CiteBook {
  works = new Map<string, DemoWork>();
  /** Works this article has only read about ("as cited in"); citing them directly too would be incoherent. */
  private secondhand = new Set<string>();
  private byIntext = new Map<string, string>();
  constructor(
    private ctx: Ctx,
    private selfYear: number,
  ) {}
  /** A work is citable when it is not newer than the article and no other cited work reads the same in text. */
  canCite(key: string): boolean {
    const w = this.ctx.works[key];
    if (!w || w.year > this.selfYear || this.secondhand.has(key)) return false;
    const k = `${intextAuthors(w.authors, false)}|${w.year}`;
    const other = this.byIntext.get(k);
    return other === undefined || other === key;
  }
  private add(w: DemoWork) {
    this.works.set(w.key, w);
    this.byIntext.set(`${intextAuthors(w.authors, false)}|${w.year}`, w.key);
  }
  cite(key: string, locator: string | null, narrative: boolean): DemoCitation {
    const w = this.ctx.works[key];
    if (!this.canCite(key)) throw new Error(`demo generator: cannot cite ${key}`);
    this.add(w);
    return {
      workKey: key,
      authors: intextAuthors(w.authors, narrative),
      year: String(w.year),
      locator,
      secondary: false,
      citedInKey: null,
      narrative,
    };
  }
  /** "as cited in": only the work it was read in enters the reference list (APA 7, sec. 8.6). */
  citeSecondary(originalKey: string, viaKey: string): DemoCitation | null {
    const orig = this.ctx.works[originalKey];
    if (!this.canCite(viaKey) || this.works.has(originalKey)) return null;
    this.secondhand.add(originalKey);
    const via = this.ctx.works[viaKey];
    this.add(via);
    return {
      workKey: originalKey,
      authors: intextAuthors(orig.authors, false),
      year: String(orig.year),
      locator: null,
      secondary: true,
      citedInKey: viaKey,
      narrative: false,
    };
  }
  references(): DemoReference[] {
    const list = [...this.works.values()].sort((a, b) => {
      const fa = a.authors.map((p) => p.family).join(" ");
      const fb = b.authors.map((p) => p.family).join(" ");
      return fa.localeCompare(fb, "en") || a.year - b.year || a.key.localeCompare(b.key);
    });
    return list.map((w) => ({ workKey: w.key, text: referenceText(w), doi: w.doi, kind: w.kind }));
  }
}

function parenText(cites: readonly DemoCitation[], ctx: Ctx): string {
  const parts = cites.map((c) => {
    if (c.secondary && c.citedInKey) {
      const via = ctx.works[c.citedInKey];
      return `${c.authors}, ${c.year}, as cited in ${intextAuthors(via.authors, false)}, ${via.year}`;
    }
    return `${c.authors}, ${c.year}${c.locator ? `, ${c.locator}` : ""}`;
  });
  return `(${parts.join("; ")})`;
}
function narrativeText(c: DemoCitation): string {
  return `${c.authors} (${c.year}${c.locator ? `, ${c.locator}` : ""})`;
}

const KEEP_CASE = /^(Cronbach|McDonald|[A-Z]{2,}|α)/;
const lowerFirst = (s: string) => (KEEP_CASE.test(s) ? s : s.charAt(0).toLowerCase() + s.slice(1));
const upperFirst = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);

function sentence(
  text: string,
  statements: DemoStatement[] = [],
  citations: DemoCitation[] = [],
  hardNegative = false,
): DemoSentence {
  return { text, statements, citations, hardNegative };
}

// ---------------------------------------------------------------------------------------------
// Outside works (cited in introductions; never in the corpus)

function buildOutside(ctx: Ctx) {
  for (const b of BOOKS) ctx.works[b.key] = b;
  ctx.outside.push(...BOOKS);
  const fields = Object.keys(FIELDS) as (keyof typeof FIELDS)[];
  fields.forEach((f, fi) => {
    const list: DemoWork[] = [];
    const journal = OUTSIDE_JOURNALS[fi % OUTSIDE_JOURNALS.length];
    const jcode = journal.split(" ")[0].toLowerCase().slice(0, 5);
    for (let i = 0; i < 26; i++) {
      const year = ctx.rng.int(1980, 2024);
      const [c1, c2] = ctx.rng.sample(FIELDS[f].constructs, 2);
      const title = `${upperFirst(c1)} and ${c2} ${ctx.rng.pick(["revisited", "in everyday settings", "over time", "across groups", "in practice", "reconsidered"])}`;
      const w: DemoWork = {
        key: `ext-${f}-${i}`,
        kind: "article",
        authors: authorsFor(ctx.rng, year),
        year,
        title,
        container: journal,
        volume: Math.max(1, year - 1975),
        issue: ctx.rng.int(1, 4),
        pages: pagesRange(ctx.rng),
        publisher: null,
        edition: null,
        doi: ctx.rng.chance(0.7) ? `${DOI_PREFIX}/ext.${jcode}.${year}.${String(i + 1).padStart(3, "0")}` : null,
        articleId: null,
        isMethodsSource: false,
        claims: [],
      };
      ctx.works[w.key] = w;
      list.push(w);
    }
    ctx.outside.push(...list);
    ctx.outsideByField.set(f, list);
  });
}

function pagesRange(rng: Rng): string {
  const a = rng.int(1, 480);
  return `${a}–${a + rng.int(12, 24)}`;
}

// ---------------------------------------------------------------------------------------------
// Empirical articles

interface Draft {
  venue: DemoVenue;
  year: number;
  key: string;
  coreMethods?: CoreMethodsArticle;
}

function chooseAnalysis(rng: Rng, venueKey: string, year: number): Analysis {
  const a = HABITS[venueKey].analyses;
  return rng.weighted<Analysis>([
    ["cfa", a.cfa],
    ["pls", year >= 2006 ? lerp(a.pls, year) : 0],
    ["efa", a.efa],
    ["regression", a.regression],
  ]);
}

function practicesFor(rng: Rng, analysis: Analysis, year: number): string[] {
  const alpha = year >= 2000 && rng.chance(0.08) ? "alpha60" : "alpha70";
  const fit = year < 1999 || rng.chance(Math.max(0.3, 0.9 - (year - 1999) * 0.025)) ? "fit_classic" : "fit_modern";
  const ok = (k: string) => PRACTICES[k].minYear <= year;
  const base: string[] = {
    cfa: [alpha, "cr70", "ave50", fit, ...(rng.chance(0.6) ? ["htmt85"] : [])],
    pls: ["load70", alpha, "cr70", "ave50", "htmt85", "vif5"],
    efa: ["kmo60", "load40", alpha],
    regression: [alpha, "vif5"],
  }[analysis];
  return base.filter((k) => ok(k) && (k === alpha || k === fit || rng.chance(0.85)));
}

interface ArticleCtx {
  ctx: Ctx;
  venue: DemoVenue;
  year: number;
  key: string;
  cites: CiteBook;
  asserted: Set<string>;
}

/** Decides how one threshold claim is sourced and writes the sentence. */
function thresholdSentence(a: ArticleCtx, practiceKey: string): DemoSentence {
  const { ctx, venue, year, cites } = a;
  const rng = ctx.rng;
  const def = PRACTICES[practiceKey];
  const h = HABITS[venue.key];
  const tpl = rng.pick(def.templates);
  const clause = fillTemplate(
    tpl.t,
    def.stats.map((s) => s.value),
  );

  const precedents = ctx.assertions.filter(
    (x) => x.practice === practiceKey && x.year < year && x.articleKey !== a.key && cites.canCite(x.articleKey),
  );
  const sameVenue = precedents.filter((x) => x.venueKey === venue.key);
  const pool = sameVenue.length && rng.chance(0.85) ? sameVenue : precedents;
  const sourceOk = cites.canCite(def.source.work) && ctx.works[def.source.work].year < year;
  const misOk = def.misquote && cites.canCite(def.misquote.work) && ctx.works[def.misquote.work].year < year;
  const secondaryPool = pool.filter((x) => x.directSource === def.source.work);
  // Earlier articles of the venue that never asserted this practice: a trail ends there as precedent.
  const silentPool = (ctx.corpusByVenue.get(venue.key) ?? []).filter(
    (k) =>
      ctx.works[k].year < year &&
      !ctx.works[k].isMethodsSource &&
      cites.canCite(k) &&
      !ctx.asserted.has(`${k}|${practiceKey}`),
  );

  let pUnsourced = lerp(h.unsourced, year) + (practiceKey === "alpha70" ? lerp(h.alphaUnsourced, year) : 0);
  if (!sourceOk && !pool.length) pUnsourced = 1;
  const origin = rng.weighted<ClaimOrigin>([
    ["unsourced", pUnsourced],
    ["precedent", pool.length ? lerp(h.precedent, year) * 0.88 : 0],
    ["precedent_silent", silentPool.length ? 0.04 : 0],
    ["secondary", secondaryPool.length && sourceOk && !cites.works.has(def.source.work) ? h.secondary : 0],
    ["misquote", misOk ? lerp(h.misquote, year) : 0],
    ["methods_with_locator", sourceOk ? (1 - pUnsourced) * lerp(h.locator, year) : 0],
    ["methods_no_locator", sourceOk ? (1 - pUnsourced) * (1 - lerp(h.locator, year)) : 0],
  ]);

  let citations: DemoCitation[] = [];
  let narrative = false;
  if (origin === "precedent") {
    const picked = rng.sample(pool, rng.chance(0.25) ? 2 : 1);
    narrative = picked.length === 1 && rng.chance(0.55);
    citations = picked.filter((p) => cites.canCite(p.articleKey)).map((p) => cites.cite(p.articleKey, null, narrative));
  } else if (origin === "precedent_silent") {
    narrative = rng.chance(0.5);
    citations = [cites.cite(rng.pick(silentPool), null, narrative)];
  } else if (origin === "secondary") {
    const via = rng.pick(secondaryPool);
    const c = cites.citeSecondary(def.source.work, via.articleKey);
    if (c) citations = [c];
  } else if (origin === "misquote" && def.misquote) {
    narrative = rng.chance(0.3);
    citations = [cites.cite(def.misquote.work, rng.chance(0.8) ? def.misquote.page : null, narrative)];
  } else if (origin === "methods_with_locator" || origin === "methods_no_locator") {
    narrative = rng.chance(0.3);
    const loc = origin === "methods_with_locator" ? locatorVariant(rng, def.source.page) : null;
    citations = [cites.cite(def.source.work, loc, narrative)];
  }

  let text: string;
  if (!citations.length) text = `${clause}.`;
  else if (narrative)
    text = `${rng.pick(["Following", "In line with", "As in", "Consistent with"])} ${narrativeText(citations[0])}, ${lowerFirst(clause)}.`;
  else text = `${clause} ${parenText(citations, ctx)}.`;

  const statements: DemoStatement[] = def.stats.map((s, i) => ({
    kind: "threshold",
    statistic: s.statistic,
    comparator: tpl.cmps[i],
    value: s.value,
    framing: def.framing,
    procedure: null,
    practice: practiceKey,
    origin: citations.length ? origin : "unsourced",
  }));
  a.asserted.add(practiceKey);
  ctx.asserted.add(`${a.key}|${practiceKey}`);
  ctx.assertions.push({
    articleKey: a.key,
    venueKey: venue.key,
    year,
    practice: practiceKey,
    directSource: origin === "methods_with_locator" || origin === "methods_no_locator" ? def.source.work : null,
  });
  return sentence(text, statements, citations);
}

/** `{v}` is the first value, `{0}`…`{3}` the value of that statistic of the practice. */
function fillTemplate(t: string, values: number[]): string {
  return t.replace(/\{(v|\d)\}/g, (_, k: string) => {
    const v = values[k === "v" ? 0 : Number(k)];
    if (v === undefined) throw new Error(`demo template "${t}" has no value ${k}`);
    return fmt(v);
  });
}

/** Most locators are "p. N"; some writers give a range or the chapter. */
function locatorVariant(rng: Rng, page: string): string {
  const n = Number(page.replace(/\D+/g, ""));
  return rng.weighted<string>([
    [page, 0.8],
    [`pp. ${n}–${n + 1}`, 0.15],
    [`p. ${n}`, 0.05],
  ]);
}

const r2 = (x: number) => Math.round(x * 100) / 100;
const r3 = (x: number) => Math.round(x * 1000) / 1000;

function reported(statistic: StatisticKey, value: number): DemoStatement {
  return {
    kind: "reported",
    statistic,
    comparator: "=",
    value,
    framing: null,
    procedure: null,
    practice: null,
    origin: null,
  };
}

function empiricalArticle(ctx: Ctx, d: Draft, index: number, pagesPerArticle: number): DemoArticle {
  const rng = ctx.rng;
  const { venue, year } = d;
  const field = FIELDS[venue.field as Exclude<FieldKey, "methods">];
  const authors = authorsFor(rng, year);
  const constructs = rng.sample(field.constructs, rng.int(3, 4));
  const [c1, c2, c3] = constructs;
  const population = rng.pick(field.populations);
  const setting = rng.pick(field.settings);
  const n = rng.int(12, 90) * 10 + rng.int(0, 9);
  const analysis = chooseAnalysis(rng, venue.key, year);
  const cites = new CiteBook(ctx, year);
  const a: ArticleCtx = { ctx, venue, year, key: d.key, cites, asserted: new Set() };
  const design = rng.pick([
    "A cross-sectional survey",
    "A two-wave study",
    "A multi-site survey",
    "Evidence from a panel",
    "A field study",
  ]);
  const title = `${upperFirst(c1)} and ${c2} among ${population}: ${design}`;
  const outside = ctx.outsideByField.get(venue.field) ?? [];

  // Introduction: topical claims backed by outside works and earlier articles of the venue.
  const intro: DemoSentence[][] = [];
  const citeOutside = (k: number) => {
    const ws = rng.sample(
      outside.filter((w) => cites.canCite(w.key)),
      k,
    );
    return ws.map((w) => cites.cite(w.key, null, false));
  };
  const p1: DemoSentence[] = [];
  {
    const cs = citeOutside(2);
    p1.push(
      sentence(
        `${upperFirst(c1)} has been linked to ${c2} in several occupational and social settings${cs.length ? ` ${parenText(cs, ctx)}` : ""}.`,
        [],
        cs,
      ),
    );
    const cs2 = citeOutside(1);
    p1.push(
      sentence(
        `Less is known about how ${c3 ?? c2} shapes this relation among ${population}${cs2.length ? `, although early evidence points in that direction ${parenText(cs2, ctx)}` : ""}.`,
        [],
        cs2,
      ),
    );
    p1.push(
      sentence(
        `This invented study examines that question in ${setting}, where ${c1} is a recurring concern for practitioners.`,
      ),
    );
  }
  intro.push(p1);
  {
    const lit: DemoSentence[] = [];
    for (const c of constructs.slice(1)) {
      const cs = citeOutside(rng.int(1, 2));
      lit.push(
        sentence(
          `${upperFirst(rng.pick(LIT_OPENERS).replace("{c}", c).replace("{p}", population))}${cs.length ? ` ${parenText(cs, ctx)}` : ""}.`,
          [],
          cs,
        ),
      );
    }
    lit.push(sentence(rng.pick(LIT_GAPS).replace("{c}", c1).replace("{p}", population) + "."));
    intro.push(lit);
  }
  const earlier = (ctx.corpusByVenue.get(venue.key) ?? []).filter((k) => ctx.works[k].year < year && cites.canCite(k));
  if (earlier.length) {
    const picked = rng.sample(earlier, rng.int(1, 2));
    const cs = picked.map((k) => cites.cite(k, null, false));
    intro.push([
      sentence(
        `Earlier studies in this journal examined related questions with different groups ${parenText(cs, ctx)}.`,
        [],
        cs,
      ),
      sentence(`Their results were mixed, which motivates a closer look at measurement in the present study.`),
    ]);
  }
  intro.push([
    sentence(
      `We therefore ask whether ${c1} predicts ${c2}, and whether ${c3 ?? "tenure"} moderates that association.`,
    ),
  ]);
  const hypotheses: DemoSentence[][] = [
    [
      sentence(`Hypothesis 1: ${upperFirst(c1)} is positively related to ${c2} among ${population}.`),
      sentence(`Hypothesis 2: The association between ${c1} and ${c2} is stronger when ${c3 ?? "tenure"} is high.`),
      sentence(
        `Both hypotheses follow from the view that ${c1} shapes how people appraise their situation, which in turn guides ${c2}.`,
      ),
    ],
  ];

  // Method
  const participants: DemoSentence[] = [
    sentence(`A total of ${n} ${population} from ${rng.int(2, 9)} ${setting} took part (N = ${n}).`, [], [], true),
    sentence(
      `Participants were aged between ${rng.int(18, 25)} and ${rng.int(55, 68)} years (M = ${(rng.int(300, 450) / 10).toFixed(1)}, SD = ${(rng.int(60, 120) / 10).toFixed(1)}).`,
      [],
      [],
      true,
    ),
    sentence(
      `Data were collected between ${rng.pick(["January", "March", "April", "September"])} and ${rng.pick(["June", "July", "November", "December"])} ${year - rng.int(1, 2)}.`,
      [],
      [],
      true,
    ),
  ];
  if (rng.chance(0.3))
    participants.push(
      sentence(
        `Each participant received a voucher worth €${rng.pick([5, 10, 15, 20])} for taking part.`,
        [],
        [],
        true,
      ),
    );
  const procedure: DemoSentence[] = [
    sentence(
      rng.pick([
        "Participation was voluntary and anonymous, and participants could withdraw at any time without giving a reason.",
        "The study followed the ethical guidelines of the participating institutions, and all participants gave informed consent.",
      ]),
    ),
    sentence(
      `Questionnaires were distributed ${rng.pick(["online", "on paper during working hours", "through the organisations' internal mail", "by trained research assistants"])} and took about ${rng.int(10, 25)} minutes to complete.`,
      [],
      [],
      true,
    ),
    sentence(`Of ${n + rng.int(40, 300)} invited ${population}, ${n} returned usable questionnaires.`, [], [], true),
  ];
  const points = rng.pick([5, 7]);
  const practices = practicesFor(rng, analysis, year);
  const measures: DemoSentence[] = [
    sentence(
      `All constructs were measured with established multi-item scales rated on a ${points}-point Likert scale ranging from 1 (strongly disagree) to ${points} (strongly agree).`,
      [],
      [],
      true,
    ),
    sentence(
      `${upperFirst(c1)} was measured with ${rng.int(4, 9)} items and ${c2} with ${rng.int(3, 8)} items; Table ${rng.int(1, 2)} lists the wording.`,
      [],
      [],
      true,
    ),
  ];
  for (const c of constructs.slice(2)) {
    const cs = citeOutside(1);
    measures.push(
      sentence(
        `${upperFirst(c)} was assessed with ${rng.int(3, 8)} items adapted from earlier work${cs.length ? ` ${parenText(cs, ctx)}` : ""}; a sample item reads "${rng.pick(ITEM_STEMS).replace("{c}", c)}".`,
        [],
        cs,
      ),
    );
  }
  const alphaKey = practices.find((k) => k === "alpha70" || k === "alpha60");
  const alphaThreshold = alphaKey ? PRACTICES[alphaKey].stats[0].value : 0.7;
  if (alphaKey) measures.push(thresholdSentence(a, alphaKey));
  const alphas = constructs.slice(0, 3).map(() => r2(alphaThreshold + 0.04 + rng.float() * 0.2));
  if (rng.chance(0.5)) {
    measures.push(
      sentence(
        `In the present sample, internal consistency was α = ${fmt(alphas[0])} for ${c1} and α = ${fmt(alphas[1])} for ${c2}.`,
        [reported("cronbach_alpha", alphas[0]), reported("cronbach_alpha", alphas[1])],
      ),
    );
  } else {
    measures.push(
      sentence(
        `Cronbach's alpha was ${fmt(alphas[0])} for ${c1}, ${fmt(alphas[1])} for ${c2} and ${fmt(alphas[2])} for ${c3 ?? "the control scale"}.`,
        alphas.map((v) => reported("cronbach_alpha", v)),
      ),
    );
  }

  const analysisSentences: DemoSentence[] = [];
  analysisSentences.push(
    sentence(
      `Analyses were carried out in R (version ${rng.int(3, 4)}.${rng.int(0, 4)}.${rng.int(0, 3)}).`,
      [],
      [],
      true,
    ),
  );
  const resultsSentences: DemoSentence[] = [];
  for (const k of practices) {
    if (k === alphaKey) continue;
    analysisSentences.push(thresholdSentence(a, k));
    const rep = reportedFor(rng, k, c1, c2);
    if (rep) resultsSentences.push(rep);
  }
  if (rng.chance(0.6)) {
    analysisSentences.push(
      sentence(
        rng.pick([
          "The significance level was set at α = .05 for all tests.",
          "Statistical significance was evaluated at α = .05 (two-tailed).",
        ]),
        [
          {
            kind: "threshold",
            statistic: "p_value",
            comparator: "<",
            value: 0.05,
            framing: "fixed",
            procedure: null,
            practice: null,
            origin: "unsourced",
          },
        ],
      ),
    );
  }
  // Misdescribed procedures and their correct counterparts (which are no statements).
  if (rng.chance(lerp(HABITS[venue.key].cmvProof, year))) {
    const cite =
      cites.canCite("szabo2003") && year > 2003 && rng.chance(0.35) ? [cites.cite("szabo2003", null, false)] : [];
    const pct = (rng.int(180, 390) / 10).toFixed(1);
    analysisSentences.push(
      sentence(
        `A single-factor test showed that one factor explained only ${pct}% of the variance, indicating that common method variance was not a problem in this study${cite.length ? ` ${parenText(cite, ctx)}` : ""}.`,
        [
          {
            kind: "procedure",
            statistic: null,
            comparator: null,
            value: null,
            framing: null,
            procedure: "single_factor_cmv_proof",
            practice: null,
            origin: cite.length ? "misquote" : "unsourced",
          },
        ],
        cite,
      ),
    );
  } else if (year > 2004 && rng.chance(0.08) && cites.canCite("szabo2003")) {
    const cite = [cites.cite("szabo2003", "p. 109", false)];
    analysisSentences.push(
      sentence(
        `Because a single-factor test cannot rule out common method variance, a theoretically unrelated marker variable was also modelled ${parenText(cite, ctx)}.`,
        [],
        cite,
        true,
      ),
    );
  }
  if (analysis === "regression" && rng.chance(0.12)) {
    if (rng.chance(0.55)) {
      analysisSentences.push(
        sentence(
          `To address endogeneity we used two-stage least squares: the residuals from the first-stage regression of ${c1} on the instrument were entered in place of ${c1} in the second-stage model.`,
          [
            {
              kind: "procedure",
              statistic: null,
              comparator: null,
              value: null,
              framing: null,
              procedure: "two_stage_residual_substitution",
              practice: null,
              origin: "unsourced",
            },
          ],
        ),
      );
    } else {
      analysisSentences.push(
        sentence(
          `In the second stage of the two-stage least squares estimation, the fitted values of ${c1} from the first stage replaced the observed scores.`,
          [],
          [],
          true,
        ),
      );
    }
  }

  const method: DemoBlock[] = [
    { heading: "2. Method", level: 1, section: "methods", paragraphs: [] },
    { heading: "2.1 Participants and procedure", level: 2, section: "methods", paragraphs: [participants, procedure] },
    { heading: "2.2 Measures", level: 2, section: "methods", paragraphs: [measures] },
    { heading: "2.3 Data analysis", level: 2, section: "methods", paragraphs: [analysisSentences] },
  ];

  // Results: reported values, then effects whose p-values are results, not statements.
  const beta = (rng.int(12, 55) / 100).toFixed(2).replace(/^0/, "");
  const effects: DemoSentence[] = [
    sentence(
      `${upperFirst(c1)} was positively related to ${c2} (β = ${beta}, p ${rng.chance(0.5) ? "< .001" : `= .00${rng.int(1, 9)}`}).`,
      [],
      [],
      true,
    ),
    sentence(
      `${upperFirst(c3 ?? "tenure")} moderated the association, b = ${(rng.int(5, 30) / 100).toFixed(2)}, 95% CI [${(rng.int(1, 4) / 100).toFixed(2)}, ${(rng.int(31, 45) / 100).toFixed(2)}].`,
      [],
      [],
      true,
    ),
    sentence(
      `Table ${rng.int(2, 4)} reports the means, standard deviations and correlations of all study variables.`,
      [],
      [],
      true,
    ),
  ];
  if (rng.chance(0.5))
    effects.push(
      sentence(
        `Participants older than ${rng.int(35, 50)} years reported higher ${c2}, t(${n - 2}) = ${(rng.int(200, 450) / 100).toFixed(2)}, p = .0${rng.int(1, 4)}.`,
        [],
        [],
        true,
      ),
    );
  const results: DemoBlock = {
    heading: "3. Results",
    level: 1,
    section: "results",
    paragraphs: [
      resultsSentences.length ? resultsSentences : [sentence("The measurement model was retained without changes.")],
      effects,
    ],
  };

  // Discussion, with extra paragraphs for long benchmark articles.
  const discussion: DemoSentence[][] = [
    [
      sentence(
        `The findings suggest that ${c1} matters for ${c2} among ${population}, in line with the wider literature.`,
      ),
      sentence(
        `Practitioners in ${setting} may wish to monitor ${c1} alongside ${c2} when they plan support programmes.`,
      ),
    ],
    [
      sentence(
        `Several limitations apply: the data were self-reported, the design does not allow causal conclusions, and the sample came from a single region.`,
      ),
      sentence(
        `Future work could follow the same participants over a longer period and add observer ratings of ${c2}.`,
      ),
    ],
  ];
  if (alphaKey === "alpha70" && rng.chance(0.06) && cites.canCite("varga1999") && year > 1999) {
    const c = [cites.cite("varga1999", "p. 87", false)];
    discussion[1].push(
      sentence(
        `Although an alpha of .70 is often treated as sufficient, values around .60 may be acceptable when a scale is used for exploratory research ${parenText(c, ctx)}.`,
        [
          {
            kind: "threshold",
            statistic: "cronbach_alpha",
            comparator: ">=",
            value: 0.6,
            framing: "contextual",
            procedure: null,
            practice: "alpha60",
            origin: "methods_with_locator",
          },
        ],
        c,
      ),
    );
  }
  const extra = Math.max(0, Math.round((pagesPerArticle - 3) * (venue.twoColumn ? 11 : 8.5)));
  const blocks: DemoBlock[] = [
    { heading: "1. Introduction", level: 1, section: "introduction", paragraphs: intro },
    { heading: "1.1 Hypotheses", level: 2, section: "introduction", paragraphs: hypotheses },
    ...method,
    results,
    { heading: "4. Discussion", level: 1, section: "discussion", paragraphs: discussion },
    {
      heading: "4.1 Implications",
      level: 2,
      section: "discussion",
      paragraphs: fillerParagraphs(rng, 6, constructs, population),
    },
  ];
  if (extra > 0)
    blocks.push({
      heading: "4.2 Further considerations",
      level: 2,
      section: "discussion",
      paragraphs: fillerParagraphs(rng, extra, constructs, population),
    });
  blocks.push({
    heading: "5. Conclusion",
    level: 1,
    section: "discussion",
    paragraphs: [
      [
        sentence(
          `This invented study adds evidence on ${c1} and ${c2} among ${population}; its measures and cut-offs are reported so that readers can judge them.`,
        ),
      ],
    ],
  });

  const doi = ctx.nextDoi(venue, year);
  const abstract = `This invented demo article reports a study of ${c1} and ${c2} among ${n} ${population}. ${upperFirst(c1)} was associated with ${c2}, and the association depended on ${c3 ?? "tenure"}. The text, names and numbers are invented for demonstration.`;
  return finishArticle(ctx, d, index, {
    authors,
    title,
    doi,
    abstract,
    keywords: constructs.slice(0, 3),
    blocks,
    cites,
    isMethodsArticle: false,
  });
}

function reportedFor(rng: Rng, practiceKey: string, c1: string, c2: string): DemoSentence | null {
  switch (practiceKey) {
    case "cr70": {
      const v = [r2(0.78 + rng.float() * 0.15), r2(0.78 + rng.float() * 0.15)];
      return sentence(
        `Composite reliability was ${fmt(v[0])} for ${c1} and ${fmt(v[1])} for ${c2}.`,
        v.map((x) => reported("composite_reliability", x)),
      );
    }
    case "ave50": {
      const v = [r2(0.52 + rng.float() * 0.2), r2(0.52 + rng.float() * 0.2)];
      return sentence(
        `The AVE was ${fmt(v[0])} for ${c1} and ${fmt(v[1])} for ${c2}.`,
        v.map((x) => reported("ave", x)),
      );
    }
    case "load70":
    case "load40": {
      const lo = practiceKey === "load70" ? 0.71 : 0.45;
      const v = r2(lo + rng.float() * 0.1);
      return sentence(`The lowest standardised loading was ${fmt(v)}.`, [reported("factor_loading", v)]);
    }
    case "kmo60": {
      const v = r2(0.7 + rng.float() * 0.2);
      return sentence(`The KMO measure of sampling adequacy was ${fmt(v)}.`, [reported("kmo", v)]);
    }
    case "htmt85": {
      const v = r2(0.55 + rng.float() * 0.28);
      return sentence(`The largest HTMT ratio was ${fmt(v)}, between ${c1} and ${c2}.`, [reported("htmt", v)]);
    }
    case "vif5": {
      const v = r2(1.2 + rng.float() * 2.6);
      return sentence(`The highest VIF was ${v.toFixed(2)}.`, [reported("vif", v)]);
    }
    case "fit_modern":
    case "fit_classic": {
      const cfi = r2(0.92 + rng.float() * 0.06);
      const tli = r2(cfi - 0.01);
      const rmsea = r3(0.03 + rng.float() * 0.045);
      const srmr = r3(0.025 + rng.float() * 0.04);
      return sentence(
        `The measurement model fitted the data well, CFI = ${fmt(cfi)}, TLI = ${fmt(tli)}, RMSEA = ${fmt(rmsea)}, SRMR = ${fmt(srmr)}.`,
        [reported("cfi", cfi), reported("tli", tli), reported("rmsea", rmsea), reported("srmr", srmr)],
      );
    }
    default:
      return null;
  }
}

const LIT_OPENERS = [
  "Several studies have examined {c} as an antecedent of well-being and performance",
  "Research on {c} has grown steadily over the past two decades",
  "{c} is usually described as a relatively stable characteristic of {p}",
  "Reviews of the field describe {c} as a central but loosely defined concept",
  "Work on {c} has mostly relied on convenience samples",
  "Longitudinal evidence on {c} remains scarce",
];
const LIT_GAPS = [
  "Few studies have examined {c} among {p}, and even fewer have reported how their measures performed",
  "It therefore remains unclear whether findings on {c} generalise to {p}",
  "The present study addresses this gap with a larger sample of {p}",
];
const ITEM_STEMS = [
  "I often think about {c} at the end of the day",
  "In my situation, {c} is something I notice every week",
  "People around me would say that {c} matters to me",
];

const FILLER = [
  "A second reading of the results points to the importance of context when {c} is interpreted.",
  "Readers should keep in mind that the associations reported here are modest in size.",
  "The present design cannot separate stable differences between people from changes within them.",
  "Where {p} have more control over their routines, {c} may play a different role.",
  "The findings are consistent with accounts that treat {c} as a resource rather than a burden.",
  "Training programmes could address {c} directly and evaluate the effect with a comparison group.",
  "Managers and practitioners often ask for simple rules, but the evidence here calls for judgement.",
  "Measurement choices shape what can be concluded, and they deserve as much attention as the hypotheses.",
  "The pattern of results invites a more careful reading of how {c} is understood by {p} themselves.",
  "One interpretation is that {c} operates through everyday routines rather than through single events.",
  "Qualitative follow-up interviews could show which aspects of {c} participants find most salient.",
  "Comparisons with other settings would help to judge how far the present results travel.",
  "The measures used here were designed for general populations and may miss features specific to {p}.",
  "Organisations that wish to act on these results should start with small, well-evaluated changes.",
  "A longer observation window would reveal whether the associations reported here are stable.",
  "Replication with independent samples remains the most convincing test of the present account.",
  "The role of {c} deserves attention in training and in the design of support programmes.",
  "Differences between sites were small, which suggests that local conditions played a limited role.",
];

function fillerParagraphs(rng: Rng, k: number, constructs: string[], population: string): DemoSentence[][] {
  return Array.from({ length: k }, () =>
    Array.from({ length: rng.int(4, 6) }, () =>
      sentence(rng.pick(FILLER).replace("{c}", rng.pick(constructs)).replace("{p}", population)),
    ),
  );
}

function finishArticle(
  ctx: Ctx,
  d: Draft,
  index: number,
  x: {
    authors: DemoPerson[];
    title: string;
    doi: string;
    abstract: string;
    keywords: string[];
    blocks: DemoBlock[];
    cites: CiteBook;
    isMethodsArticle: boolean;
    firstPage?: number;
  },
): DemoArticle {
  const { venue, year } = d;
  const rng = ctx.rng;
  const firstPage = x.firstPage ?? rng.int(1, 400);
  const references = x.cites.references();
  const blocks = references.length
    ? [
        ...x.blocks,
        {
          heading: "References",
          level: 1 as const,
          section: "references" as const,
          paragraphs: [references.map((r) => sentence(r.text))],
        },
      ]
    : x.blocks;
  const volume = Math.max(1, year - venue.firstYear + 1);
  const issue = rng.int(1, 4);
  const work: DemoWork = {
    key: d.key,
    kind: "article",
    authors: x.authors,
    year,
    title: x.title,
    container: venue.name,
    volume,
    issue,
    pages: `${firstPage}–${firstPage + rng.int(9, 20)}`,
    publisher: null,
    edition: null,
    doi: x.doi,
    articleId: d.key,
    isMethodsSource: venue.isMethodsVenue,
    claims: d.coreMethods?.claims ?? [],
  };
  ctx.works[d.key] = work;
  const list = ctx.corpusByVenue.get(venue.key) ?? [];
  list.push(d.key);
  ctx.corpusByVenue.set(venue.key, list);
  return {
    id: d.key,
    index,
    venueKey: venue.key,
    venueName: venue.name,
    year,
    volume,
    issue,
    firstPage,
    authors: x.authors,
    title: x.title,
    doi: x.doi,
    licence: DEMO_LICENCE,
    isMethodsArticle: x.isMethodsArticle,
    twoColumn: venue.twoColumn,
    abstract: x.abstract,
    keywords: x.keywords,
    blocks,
    references,
    isDemo: true,
  };
}

// ---------------------------------------------------------------------------------------------
// Methods-venue articles

const METHODS_TOPICS = [
  { title: "Reporting reliability for short scales", practice: "alpha" },
  { title: "How many cases does an exploratory factor analysis need?", practice: "loading" },
  { title: "Fit indices with ordinal indicators: A second look", practice: "fit" },
  { title: "Discriminant validity checks in composite models", practice: "htmt" },
  { title: "Convergent validity beyond a single number", practice: "ave" },
  { title: "Remedies for common method variance in single-source surveys", practice: "cmv" },
];

function methodsArticle(ctx: Ctx, d: Draft, index: number): DemoArticle {
  const rng = ctx.rng;
  const cites = new CiteBook(ctx, d.year);
  const core = d.coreMethods;
  const ok = (k: string) => cites.canCite(k) && ctx.works[k].year < d.year;
  const body: DemoSentence[] = [];
  let title: string;
  let authors: DemoPerson[];
  if (core) {
    title = core.title;
    authors = core.authors;
    for (const t of core.ownText) {
      body.push(
        sentence(
          t.text,
          t.statements.map((s) => ({ ...s, practice: null, origin: null })),
        ),
      );
    }
  } else {
    const topic = rng.pick(METHODS_TOPICS);
    title = `${topic.title}${rng.chance(0.5) ? "" : `: ${rng.pick(["Evidence from simulated data", "A review of practice", "Recommendations for applied researchers"])}`}`;
    authors = authorsFor(rng, d.year);
    const recs: [string, string, string | null, DemoStatement[]][] = [];
    if (ok("okafor1994"))
      recs.push([
        "For instruments in early development, Cronbach's alpha values of .70 may be tolerable, whereas scores used for decisions about individuals call for .90 or more",
        "okafor1994",
        "p. 112",
        [thr("cronbach_alpha", ">=", 0.7), thr("cronbach_alpha", ">=", 0.9)],
      ]);
    if (ok("varga1999"))
      recs.push([
        "With newly written items in exploratory work, an alpha of .60 can be defended, but not for established instruments",
        "varga1999",
        "p. 87",
        [thr("cronbach_alpha", ">=", 0.6)],
      ]);
    if (ok("ilunga1996"))
      recs.push([
        "Loadings of .40 can be interpreted when the sample exceeds 200 cases, whereas smaller samples call for loadings of .60 or more",
        "ilunga1996",
        "p. 61",
        [thr("factor_loading", ">=", 0.4), thr("factor_loading", ">=", 0.6)],
      ]);
    if (ok("adeyemi1998"))
      recs.push([
        "A CFI of .95 is a reasonable target with continuous indicators and large samples, but the same value is too strict for ordinal indicators in small samples",
        "adeyemi1998",
        "p. 17",
        [thr("cfi", ">=", 0.95)],
      ]);
    if (ok("rautenbach2012"))
      recs.push([
        "An HTMT ratio below .85 is a conservative criterion, and .90 may be used when constructs are conceptually close",
        "rautenbach2012",
        "p. 121",
        [thr("htmt", "<", 0.85), thr("htmt", "<", 0.9)],
      ]);
    for (const [text, work, page, st] of rng.sample(recs, rng.int(1, Math.min(3, recs.length)))) {
      const c = [cites.cite(work, page, false)];
      body.push(sentence(`${text} ${parenText(c, ctx)}.`, st, c));
    }
    if (topic.practice === "cmv" && ok("szabo2003")) {
      const c = [cites.cite("szabo2003", "p. 109", false)];
      body.push(
        sentence(
          `A single-factor test cannot show that common method variance is absent ${parenText(c, ctx)}.`,
          [],
          c,
          true,
        ),
      );
    }
  }
  const intro: DemoSentence[][] = [
    [
      sentence(
        "Applied researchers often report cut-off values as if they were fixed rules, although the sources behind them usually attach conditions.",
      ),
      sentence(
        "This invented methods article examines one such practice with simulated data and a review of published reports.",
      ),
    ],
  ];
  const books = ["brightwater1993", "okafor1994", "ilunga1996", "varga1999", "demir2001"].filter(ok);
  if (books.length) {
    const c = rng.sample(books, Math.min(2, books.length)).map((k) => cites.cite(k, null, false));
    intro[0].push(
      sentence(
        `Textbook guidance on such values was mostly written for small models and continuous data ${parenText(c, ctx)}.`,
        [],
        c,
      ),
    );
  }
  const methodSentences: DemoSentence[] = [
    sentence(`We simulated ${rng.int(2, 8) * 100} data sets for each of ${rng.int(12, 48)} conditions.`, [], [], true),
    sentence(
      `Sample sizes ranged from ${rng.pick([100, 150, 200])} to ${rng.pick([800, 1000, 1500])} cases, and indicators had ${rng.pick([5, 7])} response categories.`,
      [],
      [],
      true,
    ),
  ];
  const results: DemoSentence[] = [
    sentence(
      `Across conditions, the rate of wrongly rejected models varied between ${rng.int(2, 8)}% and ${rng.int(20, 60)}%.`,
      [],
      [],
      true,
    ),
    sentence("Larger samples made every criterion stricter in practice, because small misfit became easier to detect."),
  ];
  const blocks: DemoBlock[] = [
    { heading: "1. Introduction", level: 1, section: "introduction", paragraphs: intro },
    { heading: "2. Method", level: 1, section: "methods", paragraphs: [methodSentences] },
    {
      heading: "3. Results",
      level: 1,
      section: "results",
      paragraphs: [
        results,
        ...fillerParagraphs(
          rng,
          4,
          ["the criterion", "sample size", "model size", "the cut-off"],
          "applied researchers",
        ),
      ],
    },
    {
      heading: "4. Discussion and recommendations",
      level: 1,
      section: "discussion",
      paragraphs: [
        body,
        [
          sentence(
            "Cut-off values are aids to judgement; reporting the conditions under which they were derived matters more than the numbers themselves.",
          ),
        ],
      ],
    },
  ];
  const doi = ctx.nextDoi(d.venue, d.year);
  return finishArticle(ctx, d, index, {
    authors,
    title,
    doi,
    blocks,
    cites,
    isMethodsArticle: true,
    firstPage: core?.firstPage,
    abstract: `This invented demo methods article studies when a common cut-off value is defensible. The text, names and numbers are invented for demonstration.`,
    keywords: ["measurement", "cut-off values", "simulation"],
  });
}

function thr(statistic: StatisticKey, comparator: Comparator, value: number): DemoStatement {
  return {
    kind: "threshold",
    statistic,
    comparator,
    value,
    framing: "contextual",
    procedure: null,
    practice: null,
    origin: "methods_with_locator",
  };
}

// ---------------------------------------------------------------------------------------------

/** Builds the whole invented literature. Throws on options outside sensible bounds. */
export function generateCorpus(opts: GenerateOptions = {}): DemoCorpus {
  const count = opts.count ?? DEFAULT_COUNT;
  const seed = opts.seed ?? DEFAULT_SEED;
  const pagesPerArticle = opts.pagesPerArticle ?? 3;
  if (!Number.isInteger(count) || count < 1 || count > 20_000)
    throw new Error(`count must be an integer between 1 and 20000, got ${count}`);
  if (!Number.isInteger(seed)) throw new Error(`seed must be an integer, got ${seed}`);
  if (!Number.isFinite(pagesPerArticle) || pagesPerArticle < 1 || pagesPerArticle > 500)
    throw new Error(`pagesPerArticle must be between 1 and 500, got ${pagesPerArticle}`);

  const ctx = new Ctx(seed);
  buildOutside(ctx);
  const venues = DEMO_VENUES.slice();
  const methodsVenue = venues.find((v) => v.isMethodsVenue)!;
  const empiricalVenues = venues.filter((v) => !v.isMethodsVenue);

  const drafts: Draft[] = [];
  const core = CORE_METHODS.slice(0, Math.min(CORE_METHODS.length, Math.max(0, count - 1)));
  for (const c of core) drafts.push({ venue: methodsVenue, year: c.year, key: c.key, coreMethods: c });
  const extraMethods = Math.max(0, Math.round(count * 0.06) - core.length);
  for (let i = 0; i < extraMethods && drafts.length < count; i++)
    drafts.push({ venue: methodsVenue, year: ctx.rng.int(FIRST_YEAR, LAST_YEAR), key: "" });
  const empiricalCount = count - drafts.length;
  const years: number[] = [];
  const span = LAST_YEAR - FIRST_YEAR + 1;
  // Every year gets at least one article; the rest follow a growing literature.
  for (let i = 0; i < Math.min(span, empiricalCount); i++) years.push(FIRST_YEAR + i);
  const yearWeights = Array.from({ length: span }, (_, i) => [FIRST_YEAR + i, 1 + i * 0.12] as const);
  while (years.length < empiricalCount) years.push(ctx.rng.weighted(yearWeights));
  years.forEach((year, i) => {
    // Round-robin for the first five keeps every venue present even in tiny corpora.
    const venue =
      i < empiricalVenues.length
        ? empiricalVenues[i]
        : ctx.rng.weighted(empiricalVenues.map((v) => [v, lerp(HABITS[v.key].weight, year)] as const));
    drafts.push({ venue, year, key: "" });
  });
  const order = drafts
    .map((d, i) => ({ d, i }))
    .sort(
      (x, y) => x.d.year - y.d.year || Number(Boolean(y.d.coreMethods)) - Number(Boolean(x.d.coreMethods)) || x.i - y.i,
    )
    .map((x) => x.d);

  const articles: DemoArticle[] = [];
  order.forEach((d, index) => {
    if (!d.key) d.key = `${d.venue.key}-${d.year}-${String(index + 1).padStart(4, "0")}`;
    articles.push(
      d.venue.isMethodsVenue ? methodsArticle(ctx, d, index) : empiricalArticle(ctx, d, index, pagesPerArticle),
    );
  });
  return { seed, venues, outsideWorks: ctx.outside, works: ctx.works, articles };
}

/** Counts of threshold claims by how the generator sourced them (for logs and the report). */
export function originCounts(corpus: DemoCorpus): Record<ClaimOrigin, number> {
  const out: Record<ClaimOrigin, number> = {
    methods_with_locator: 0,
    methods_no_locator: 0,
    precedent: 0,
    precedent_silent: 0,
    secondary: 0,
    misquote: 0,
    unsourced: 0,
  };
  for (const a of corpus.articles) {
    if (a.isMethodsArticle) continue;
    for (const b of a.blocks)
      for (const p of b.paragraphs)
        for (const s of p) {
          const t = s.statements.find((x) => x.kind === "threshold" && x.practice);
          if (t?.origin) out[t.origin]++;
        }
  }
  return out;
}

/** The full text of one sentence list, for tests and for plain-text export. */
export function articlePlainText(a: DemoArticle): string {
  return a.blocks
    .map((b) =>
      [b.heading ?? "", ...b.paragraphs.map((p) => p.map((s) => s.text).join(b.section === "references" ? "\n" : " "))]
        .filter(Boolean)
        .join("\n"),
    )
    .join("\n\n");
}
