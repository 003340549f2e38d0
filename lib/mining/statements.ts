// Statements from one sentence: thresholds (cut-off claims), reported values, procedures.
// Rules are hand-written from the trade's wording; the gold set in tests/fixtures/gold measures them.
import type { Comparator, StatisticKey } from "./contract";
import type { ProcedurePattern } from "./procedures";
import { readNumbers, readRatios } from "./numbers";

export type RawStatement = {
  kind: "threshold" | "reported" | "procedure";
  statistic: StatisticKey | null;
  comparator: Comparator | null;
  value: number | null;
  framing: "fixed" | "contextual" | "disputed" | null;
  procedure: string | null;
  /** The statistic's name as written when `statistic` is "other" ("expected cell count"). */
  statistic_label?: string | null;
};

type MentionFlags = {
  weak?: boolean;
  significance?: boolean;
  /** a generic name ("expected cell count"): used only when the sentence names no tracked statistic */
  generic?: boolean;
  /** the sentence must match this for the name to count ("K" is kappa only where agreement is meant) */
  needs?: RegExp;
};
type Mention = { start: number; end: number; key: StatisticKey; label?: string } & MentionFlags;

// Order matters: longer, more specific names first; matched spans are not re-used.
const AGREEMENT = /\b(?:agree\w*|raters?|coders?|coding|kappa|inter-?rater|inter-?coder|reliabilit\w+)\b/i;
const LEXICON: [RegExp, StatisticKey, MentionFlags?][] = [
  [/\b(?:decrease|drop|change|difference|increase)s? in (?:the )?CFI\b|ΔCFI|∆CFI/g, "other"],
  [/\bfirst[-–\s]stage F(?:[-\s]statistics?|[-\s]values?)?/gi, "first_stage_f"],
  [/\bp[-\s]values?\b/gi, "p_value", { significance: true }],
  [
    /\bp\b(?=\s+(?:(?:was|is|were|are|values?)\s+)?(?:less than|lower than|smaller than|below|under|at or below|not exceeding|exceed(?:s|ed)?|greater than|above|≤|<))/gi,
    "p_value",
    { significance: true },
  ],
  [
    /\bsignificance (?:tests?|testing|thresholds?|cut[-\s]?offs?|criteri(?:on|a))\b|\b(?:threshold|cut[-\s]?off|criterion) (?:for|of) (?:statistical )?significance\b/gi,
    "p_value",
    { significance: true },
  ],
  [
    /\bCohen['’]?s\s+(?:K|κ)\b|\bK\b(?=\s*(?:=|of\b|above|below|values?|>|<|≥|≤|was|were|exceed|under|over|less|greater|higher|lower|for\b))/g,
    "cohen_kappa",
    { needs: AGREEMENT },
  ],
  [/\bCohen['’]?s\s+d\b|\b(?:effect size d)\b|\bd(?=\s*[=≥≤]\s*[-−]?\d*\.?\d)/g, "cohen_d"],
  [/\b(?:Cohen['’]?s\s+)?f\s*²|\bf\^2|\bf-squared|\bf2\b(?!\s*=)/g, "f_squared"],
  [/\b(?:Stone[-–]Geisser(?:['’]s)?\s+)?Q\s*²|\bQ2\b|\bQ-squared|\bStone[-–]Geisser\b/g, "q_squared"],
  [
    /\btolerance(?:\s+(?:values?|statistics?|levels?))?\b/gi,
    "tolerance",
    {
      needs:
        /\b(?:collinear\w*|multicollinear\w*|VIF|tolerance (?:values?|statistics?)|lowest tolerance|tolerance (?:was|were|of|below|above|less|greater|under|should|must))\b/i,
    },
  ],
  [/\bskew(?:ness)?(?:\s+values?)?\b/gi, "skewness"],
  [/\bkurtosis(?:\s+values?)?\b/gi, "kurtosis", { needs: /^(?![\s\S]*\bMardia)/ }],
  [
    /\bminimum sample sizes?\b|\bminimum sample\b(?=\s+(?:of|was|=))|\b(?:a )?sample (?:size )?of at least(?=\s+\d)|\bminimum (?:number of (?:participants|respondents|cases|observations|subjects))\b|\bsample sizes?\b(?=[^.;]{0,40}\b(?:at least|no (?:fewer|less) than|not (?:fewer|less) than|minimum|a minimum)\b)/gi,
    "minimum_sample_size",
  ],
  [
    /\b(?:a minimum of|minimum of|at least|no fewer than|not fewer than|no less than|a sample of at least)(?=\s+\d[\d,]*\s+(?:participants|cases|respondents|subjects|observations|people|patients|students)\b(?!\s+(?:per|for each|for every)\b))/gi,
    "minimum_sample_size",
  ],
  [
    /\b(?:Mardia|Durbin[-–]Watson|Bartlett|Box|Levene|Hoelter|Gini|Moran|Harman)['’]?s?\s+(?:normali[sz]ed\s+)?(?:multivariate\s+)?(?:coefficient|statistic|index|critical N|value|test statistic|kurtosis)\b|\bcondition ind(?:ex|ices)\b|\bexpected (?:cell )?(?:counts?|frequenc(?:y|ies))\b|\bmean inter[-–]item correlations?\b|\binter[-–]item correlations?\b|\bcritical ratios?\b|\bDurbin[-–]Watson\b|\bstandardi[sz]ed residuals?\b|\bresidual covariances?\b|\bmodification ind(?:ex|ices)\b|\bMahalanobis distances?\b|\bCook['’]?s distances?\b|\bleverage values?\b|\bz[-\s]scores?\b|\bcommunalit(?:y|ies)\b|\binter[-–]factor correlations?\b/gi,
    "other",
  ],
  [
    /\bomega[-\s]hierarchical\b|\bω_?h\b|\barea under the (?:ROC\s+)?curve\b|\bAUC\b|\bpartial eta[-\s]squared\b|\bη\s*²\s*p\b|\bη_?p\s*²|\bentropy\b|\b(?:scale[-\s]level\s+|item[-\s]level\s+)?content validity (?:index|ratio)\b|\b[SI]-CVI\b|\bCVI\b|\bCVR\b|\bstandard error of measurement\b|\bsmallest (?:worthwhile|detectable|real) (?:change|difference)\b|\bminimal detectable change\b|\bdesign effects?\b|\bcoefficients? of variation\b|\bresponse rates?\b|\b(?:item )?difficulty ind(?:ex|ices)\b|\bdiscrimination ind(?:ex|ices)\b|ΔAIC\b|∆AIC\b|\bstandardi[sz]ed mean differences?\b|\bcross[-–]loadings?\b|\b(?:inter-?expert|expert|panel) agreement\b|\bagreement (?:among|between) (?:the )?(?:experts|panel(?:lists)?)\b|\bmissing (?:responses|items|data|values|answers)\b/gi,
    "other",
  ],
  [/\bcorrected item[-–\s]total correlations?|\bitem[-–\s](?:total|rest) correlations?/gi, "item_total_correlation"],
  [/\bcomposite reliability|\bconstruct reliability|\bCR\b/gi, "composite_reliability"],
  [
    /\bsplit[-–\s]half reliability|\bstability coefficients?|\brho_?A\b|\bρ_?A\b|\bfirst[-–\s]stage F(?:\s*statistic)?|\b(?:A)?GFI\b|\bNFI\b|\bIFI\b/gi,
    "other",
  ],
  [
    /\bsignificance level|\b(?:alpha|α)[-\s]level|\blevel of significance|\bstatistical significance|\btype I error rate/gi,
    "p_value",
    { significance: true },
  ],
  [
    /\bCronbach['’]?s?\s+(?:alpha|α)s?|\bcoefficient (?:alpha|α)s?|\b(?:alpha|α) coefficients?|\balphas?\b|α/gi,
    "cronbach_alpha",
  ],
  [/\bMcDonald['’]?s?\s+(?:omega|ω)|\bomega(?: total| coefficients?)?\b|ω(?:_?t)?/gi, "mcdonald_omega"],
  [/\baverage variance extracted|\bAVEs?\b|\bvariance extracted/gi, "ave"],
  [/\bheterotrait[-–\s]monotrait(?: ratios?)?(?: of correlations)?|\bHTMT\b/gi, "htmt"],
  [/\bvariance inflation factors?|\bVIFs?\b/gi, "vif"],
  [/\bcomparative fit index|\bCFI\b/g, "cfi"],
  [/\bTucker[-–\s]Lewis index|\bTLI\b|\bNNFI\b/g, "tli"],
  [/\broot mean square error of approximation|\bRMSEA\b/gi, "rmsea"],
  [/\bstandardi[sz]ed root mean (?:square )?residual|\bSRMR\b/gi, "srmr"],
  [
    /χ²\s*\/\s*df|χ2\s*\/\s*df|chi[-\s]square\s*\/\s*df|\bnormed chi[-\s]square|\bchi[-\s]square to degrees of freedom(?: ratio)?|\bratio of (?:the )?(?:χ²|χ2|chi[-\s]square) to (?:the )?degrees of freedom|\bCMIN\s*\/\s*df/gi,
    "chi_square_df",
  ],
  [/\bKaiser[-–\s]Meyer[-–\s]Olkin|\bKMO\b/gi, "kmo"],
  [/\beigenvalues?\b/gi, "eigenvalue"],
  [/\bintra[-\s]?class correlations?(?: coefficients?)?|\bICCs?(?:\(\d(?:,\s*\d)?\))?/gi, "icc"],
  [/\b(?:[Cc]ohen['’]?s\s+|[Ww]eighted\s+)?[Kk]appas?\b|\bK[wW]\b|κ/g, "cohen_kappa"],
  [/\bpseudo[-\s]?R²|\bpseudo[-\s]?R2\b|\bR²|\bR2\b|\bR-squared|\bcoefficient of determination/g, "r_squared"],
  [/\b(?:statistical )?power\b|1\s*[-−–]\s*β/gi, "statistical_power"],
  [
    /\b(?:(?:standardi[sz]ed|factor|indicator|outer|primary|item)\s+)?(?:cross[-–])?loadings?\b|\bloaded\b|\bload\b/gi,
    "factor_loading",
  ],
  [/\btest[-–\s]retest (?:reliabilit(?:y|ies)|correlations?|coefficients?)/gi, "other"],
  [/\b(?:reliability coefficients?|internal consistency|reliability)\b/gi, "cronbach_alpha", { weak: true }],
];

const HIGHER_IS_WORSE = new Set<StatisticKey>([
  "rmsea",
  "srmr",
  "vif",
  "chi_square_df",
  "p_value",
  "htmt",
  "skewness",
  "kurtosis",
]);
const BOUNDED = new Set<StatisticKey>([
  "cronbach_alpha",
  "mcdonald_omega",
  "composite_reliability",
  "ave",
  "factor_loading",
  "htmt",
  "cfi",
  "tli",
  "rmsea",
  "srmr",
  "kmo",
  "icc",
  "cohen_kappa",
  "p_value",
  "r_squared",
  "item_total_correlation",
  "statistical_power",
  "tolerance",
]);
/** Keys whose values are counts of cases ("at least 200 participants"): a count is their value. */
const COUNT_KEYS = new Set<StatisticKey>(["minimum_sample_size", "sample_size_ratio"]);

// The sentence names the cut-off in order to argue against it (framing "disputed"). Cues from the
// trade's critical literature; a cue inside the same clause as a negation of it ("not arbitrary") is
// rare enough to ignore.
const DISPUTE_CUE = new RegExp(
  [
    "criticis\\w*|criticiz\\w*|critique[sd]?",
    "arbitrar\\w*",
    "myths?|folklore|legends?|lore\\b",
    "no (?:\\w+ ){0,2}(?:basis|justification|rationale|foundation|grounds?|support|evidence for)",
    "little (?:\\w+ )?(?:basis|justification|rationale|support)",
    "lacks? (?:a |any )?(?:\\w+ )?(?:basis|justification|rationale|foundation)",
    "(?:is|are|was|were|remains?) (?:not |un)?(?:justified|unjustified|unfounded|baseless)",
    "unfounded|baseless|unwarranted|dubious|questionable (?:rule|practice|convention)",
    "let(?:s)? through|lets? pass|fail(?:s|ed)? to (?:detect|flag|catch|protect|guard|prevent)",
    "misleading|mislead\\w*|misread\\w*|misinterpret\\w*|misus\\w*|misappl\\w*|misquot\\w*|misattribut\\w*",
    "(?:should|must|cannot|can ?not|need not) (?:not )?be (?:applied|used|treated|taken|followed|interpreted) (?:mechanically|blindly|uncritically|as (?:a )?(?:universal|golden|hard|absolute))",
    "mechanically|blindly|uncritical(?:ly)?|ritual\\w*|dogma\\w*|superstition|mindless\\w*",
    "(?:golden|magic(?:al)?) (?:rule|number|cut-?off|threshold|value)",
    "so-called",
    "(?:has|have|had) been (?:\\w+ )?(?:questioned|challenged|disputed|debunked|criticised|criticized|contested|refuted|discredited|attacked)",
    "(?:we|authors?|they|others?) (?:\\w+ )?(?:argue[sd]?|warn(?:ed|s)?|caution(?:ed|s)?) against",
    "(?:argue[sd]?|warn(?:ed|s)?|caution(?:ed|s)?) against",
    "not (?:a )?(?:universal|sacrosanct|magic|law)",
    "one[- ]size[- ]fits[- ]all",
    "(?:too|overly) (?:lenient|liberal|permissive|crude|simplistic)",
    "(?:rule|cut-?off|threshold|convention)s? (?:of thumb )?(?:has|have|had) no\\b",
    "does not guarantee|do not guarantee|no guarantee",
    "habit\\b|by habit|out of habit|convenience rather",
    "abandon\\w*|retire[ds]? the",
    "doubled|inflated (?:type I|error)",
    "overlooks?|ignores? (?:the )?(?:fact|context|purpose)",
    "never (?:\\w+ ){0,2}(?:proposed|intended|meant|designed|suggested|validated) (?:as|to be|for)",
    "(?:no longer |not |in)defensible",
    "contrary to (?:popular|common|widespread|conventional) (?:belief|wisdom|practice|opinion)",
    "not (?:a |an )?(?:safe|reliable|valid|sufficient|adequate|meaningful|good) (?:\\w+ )?(?:bound|guide|rule|criterion|cut-?off|threshold|limit|indicator|standard|yardstick)",
    "(?:do|did|does) not (?:follow|adopt|endorse|use|apply) the (?:\\w+ ){0,2}(?:common|usual|conventional|traditional|standard|popular|cited|recommended|minimum|rule)",
    "(?:was|were) not (?:followed|adopted|applied|used)",
    "(?:depart|deviate)s? from the (?:\\w+ )?(?:common|usual|conventional|traditional)",
    "too many (?:correct|true|good|valid|acceptable)|too few (?:\\w+ )?(?:incorrect|false|misspecified)",
    "without (?:considering|regard to|any justification|justification|thinking)",
    "overly (?:strict|lenient|liberal|conservative|stringent|simplistic)",
    "(?:widely|commonly|often|frequently) (?:misused|misapplied|misunderstood|abused)",
    "(?:lacks?|without) (?:empirical|theoretical|statistical) (?:support|grounding|foundation)",
  ].join("|"),
  "i",
);

// Worked examples, definitions and conditionals that explain what a value means: not statements.
const ILLUSTRATION =
  /^\s*(?:for (?:example|instance)|to illustrate|as an (?:example|illustration)|consider (?:a|an) |suppose|imagine)\b|\bwould (?:mean|imply|indicate|suggest)\b|\b(?:implies|means) that\b|\bby definition\b|\bcan (?:range|vary|take (?:any )?values?)\b|\b(?:ranges?|varies|can vary|lies?) (?:from|between) (?:[-−]?1|0|zero|minus one) (?:to|and) (?:\+?1|one)\b|^\s*had\b|\bwould have (?:been|had|given|yielded|reached)\b|^\s*if\b[^,;]*\b(?:were|had been)\b/i;
// Values that are the bounds of a statistic's scale ("kappa equals 1 for perfect agreement").
const BOUND_MEANING =
  /\b(?:perfect|complete|chance|worse than chance|no (?:agreement|association|relationship|correlation)|random|identical|independent|undefined|by chance)\b/i;

// Numbers that belong to something that is not a tracked statistic: test statistics, descriptives, CIs.
const BLOCKER =
  /(?:(?<![\/\w])(?:t|F|z|r|b|B|β|γ|d|g|OR|IRR|HR|RR|SE|SD|M|N|n|df|Mdn|χ²|χ2|W|U|H)\s*(?:\([^)]*\))?\s*[=<>≤≥]\s*[-−–]?$|\bodds ratio (?:of\s*)?$|\beffect size (?:of\s*)?$|\b(?:9[059]|99)\s*%\s*CI\s*\[?$|\bCI\s*\[?$|\bmedian\s*$|\bmean(?: age)?(?: of)?\s*$|\baged?\s*$)/;

const CUT_NOUN =
  /(?:threshold|cut[-\s]?off|criterion|minimum|maximum|benchmark|rule of thumb|(?:recommended|required|acceptable|minimum|common|conventional|usual) (?:value|level|limit)|\blimit\b|(?:upper|lower) bound)/i;
const EVALUATIVE =
  /\b(?:acceptable|adequate|sufficient|satisfactory|unproblematic|good fit|close fit|desirable|suffic\w+|excellent|good|high|strong)\b/gi;
// A generic subject makes a rule even in the past tense: "values above .70 were acceptable".
const GENERIC_VALUES =
  /\b(?:values?|coefficients?|loadings?|estimates?|scores?)\s+(?:of|above|below|greater|less|lower|higher|over|under|between|exceeding|at or|equal to|as low as|as high as|up to|≥|≤|>|<)/i;
function genericValues(s: string): boolean {
  const m = GENERIC_VALUES.exec(s);
  // "… was satisfactory, with alpha values between .74 and .88" describes the data
  return !!m && !/\bwith\s+(?:[\w'’-]+\s+){0,3}$/i.test(s.slice(Math.max(0, m.index - 40), m.index));
}
const RANGE_OF =
  /\b(?:within|in|inside)\s+(?:the\s+)?(?:[\w-]+\s+){0,2}(?:range|band|interval)\s+(?:of|between|from)\s*$/i;
const PLANNING =
  /\b(?:plan\w*|a priori|design\w*|target\w*|assum\w*|required|needed|to detect|sample size (?:calculation|estimation|determination)|used|set (?:at|to)|desired|aimed?)\b/i;
const OBTAINED =
  /\b(?:obtained|observed|achieved|resulting|our|in (?:our|this|the present) (?:data|sample|study)|lowest|highest|smallest|largest)\b/i;

// Cases per parameter: "10 respondents per indicator", "ten cases for each item", "a ratio of 10:1",
// "a ratio of five to one", "a 5:1 ratio".
const NUMBER_WORDS = "one|two|three|four|five|six|seven|eight|nine|ten|eleven|twelve|fifteen|twenty|thirty|forty|fifty";
const RATIO_FORMS = new RegExp(
  String.raw`\b(\d+(?:\.\d+)?|${NUMBER_WORDS})\s+(?:cases|respondents|participants|observations|subjects|people|responses|events)\s+(?:per|for each|for every)\s+(?:estimated\s+|free\s+)?(?:items?|indicators?|variables?|parameters?|predictors?|observed variables?)|\bratios? (?:was |of )(\d+(?:\.\d+)?\s*(?::|\bto)\s*1|(?:${NUMBER_WORDS})[-\s]to[-\s]one)\b|\b(\d+\s*:\s*1)\s+ratio|(?<=\b(?:cases|sample size|participants|respondents|observations|subjects)\b[^.;]{0,120}?)\b(\d+(?:\.\d+)?\s*:\s*1)\b`,
  "gi",
);
function ratioValue(text: string | undefined): number | null {
  if (!text) return null;
  const r = readRatios(text)[0];
  if (r) return r.value;
  const n = readNumbers(text)[0];
  return n ? n.value : null;
}

// Built once: they were compiled anew for every number of every sentence.
// A cut-off noun right after its number: "the arbitrary .70 rule", "the .05 convention".
const CUT_NOUN_AFTER =
  /(?:^|\s)[.\d]+\s+(?:\w+\s+)?(?:rule|convention|cut[-\s]?off|threshold|criterion|benchmark|limit|standard)\b/i;
const CUT_BEFORE = new RegExp(`${CUT_NOUN.source}\\s*(?:of|at|is|was|value of)?\\s*(?:the\\s*)?$`, "i");
const RELATION_TO_CUT = new RegExp(
  `^[^.;]{0,45}?\\b(?:above|below|exceed\\w*|under|over|higher than|lower than|(?:falls?|falling|lies?|lying|is|was) within|meets?|meeting|satisf\\w+|surpass\\w*|beyond|in line with|well within)\\s+the\\b[^.;]{0,30}(?:${CUT_NOUN.source}|range)`,
  "i",
);
const THRESHOLD_CUE = new RegExp(
  [
    "should",
    "must",
    "had to",
    "has to",
    "have to",
    "needs? to",
    "required?",
    "requires",
    "recommend\\w*",
    "acceptable",
    "adequate",
    "sufficient",
    "satisfactory",
    "unproblematic",
    "considered",
    "regarded",
    "deemed",
    "taken (?:to|as)",
    "treated as",
    "interpreted",
    "indicat(?:e|es|ing)\\b",
    "suggest\\w*",
    "signals?",
    "criteri\\w+",
    "cut[-\\s]?offs?",
    "thresholds?",
    "rule",
    "benchmark",
    "minimum",
    "maximum",
    "retained",
    "(?:was|were) used (?:to|as)",
    "to retain",
    "kept",
    "removed",
    "dropped",
    "extracted",
    "excluded",
    "deleted",
    "set at",
    "defined as",
    "judged",
    "evaluated at",
    "aimed",
    "were to be",
    "examined closely",
    "flagged",
    "expected",
    "tolerated",
    "can be",
    "may be",
    "(?:is|are) (?:often |commonly |generally )?used",
    "conventional",
    "designed to",
    "needed to",
    "to detect",
    "described as",
    "holds when",
    "whenever",
    "preferable",
    "ensures?",
    "good fit",
    "close fit",
    "warrant\\w*",
    "support invariance",
    "as significant",
    "to indicate",
    "ought",
    "convention\\w*",
    "customar\\w*",
    "accepted",
    "desirable",
    "suffic\\w+",
    "treated",
    "read as",
    "classified",
    "limits?\\b",
    "used to plan",
    "planned",
    "a priori",
    "targeted",
    "(?:is|are|was|were|be) needed",
    "evaluat\\w* (?:using|with|against|by|according)",
    "assessed (?:using|with|against|by|according)",
    "criteria",
    "indicated by",
    "points? to",
    "(?:is|are|becomes?|be) (?:a |an )?(?:\\w+ )?(?:concern|problem|issue)",
    "puts? the bar",
  ].join("|"),
  "i",
);
// Removal, exclusion and "problem" rules name the failing side; the statement gives the passing side
// ("items loading below .40 were deleted" is factor_loading >= .40; label rule 8).
const FAILING_SIDE =
  /\b(?:delet\w*|remov\w*|dropped|drop\b|exclu\w*|eliminat\w*|discard\w*|omitted|problem\w*|poor|unacceptabl\w*|inadequate|insufficient|redundan\w*|(?:multi)?collinearity|lack of|misfit|violat\w*)/i;
const PASSING_SIDE =
  /\b(?:acceptabl\w*|adequa\w*|unproblematic|retain\w*|kept|keep|good|satisf\w*|sufficient|suffic\w*|supports?|confirm\w*|no (?:\w+ )?(?:problem|concern|issue)\w*|not (?:an? )?(?:\w+ )?(?:problem|concern|issue)\w*|free of)\b/i;
/** The clause around a number: from the last clause break before it to the next one after it. */
function clauseAround(s: string, start: number, end: number): string {
  const brk = /;|,\s*(?:and|but|whereas|while|because|although)\b|\b(?:whereas|while|because|but)\b|\.\s/gi;
  let from = 0;
  let to = s.length;
  for (let m = brk.exec(s); m; m = brk.exec(s)) {
    if (m.index + m[0].length <= start) from = m.index + m[0].length;
    else if (m.index >= end) {
      to = m.index;
      break;
    }
  }
  return s.slice(from, to);
}
const FLIP: Record<string, Comparator> = { ">": "<=", ">=": "<", "<": ">=", "<=": ">" };

// A sample size calculation: its α, power and effect size are design values.
const SAMPLE_SIZE_CALC =
  /\bG\s*\*\s*Power\b|\brequired sample\b|\bsample size (?:was )?(?:calculat|estimat|determin|comput)\w*|\bpower (?:analys[ie]s|calculation)\b|\ba priori\b/i;

// Words that make a power value a rule rather than a design setting ("a power of .80 is recommended").
const POWER_RULE =
  /\b(?:recommend\w*|should|must|minimum|at least|adequate|acceptable|sufficient|conventional\w*|desirable|required(?! sample)|requires?|standard|rule|criterion|threshold|cut[-\s]?off|no less than)\b/i;
const REPORTED_CUE =
  /\b(?:reported|observed|obtained|achieved|in (?:our|the present|this) (?:data|sample|study)|in the (?:calibration|validation|present) sample|yielded|were between|ranged)\b/i;
const CONTEXT_CUE = new RegExp(
  [
    "(?:for|in) exploratory (?:research|studies|work|purposes|analys[ie]s|stages?)",
    "early stages?",
    "early (?:work|research|phases?|development|versions?)",
    "depend\\w*",
    "(?:is|are|may be|can be) (?:still )?(?:acceptable|sufficient|adequate|tolerated)\\s+(?:if|when|provided|in|for)",
    "can be (?:used|tolerated|accepted|retained)",
    "may be (?:retained|regarded|sufficient|used|tolerated|too|acceptable)",
    "may not be",
    "whereas",
    "\\bwhile\\b",
    "purposes?",
    "for decisions",
    "for (?:new|newly|established|small|large|short|long)",
    "more liberal",
    "stricter",
    "sometimes",
    "given the",
    "with fewer than",
    "fewer than \\d+",
    "with only",
    "longer scales",
    "marginally",
    "large samples",
    "small samples",
    "conceptually similar",
    "although",
    "(?:for|in) (?:clinical|applied|research|screening|diagnostic|individual|high-stakes|basic|confirmatory)\\b",
    "for (?:group|individual)[- ]level",
    "(?:with|for|in) (?:samples?|models?|scales?) (?:of|with|larger|smaller)",
    "when (?:the )?(?:sample|model|number of|scale)",
    "\\bif (?:the )?(?:sample|model|number of|scale|items?)",
    "\\bideally\\b|\\bpreferably\\b",
    "\\bN\\s*[<>≥≤]\\s*\\d",
    "in (?:some|many|most) (?:fields|disciplines|contexts|cases|situations)",
    "when there (?:are|is|were|was)\\b",
    "because of (?:the |our |its )?(?:large|small|big|modest|limited)",
    "for (?:a |the )?panels? of",
    "(?:for|with|in) (?:reflective|formative) (?:constructs?|measures?|indicators?|models?)",
    "with (?:more|fewer|less) than \\d+ (?:respondents|participants|cases|observations|subjects|experts|raters|items|indicators)",
    "(?:for|with) (?:\\w+ )?(?:panel|sample) sizes?",
    "(?:\\w+|\\d+) or (?:more|fewer) (?:experts|raters|judges|panellists|panelists|items|indicators)",
    "(?:sample|panel) (?:was|is|were|being) (?:small|large|modest)",
  ].join("|"),
  "i",
);
const LEVEL_WORDS =
  /\b(acceptable|good|reasonable|close|excellent|poor|moderate|substantial|weak|adequate|mediocre|marginal|almost perfect|fair|small|medium|large|questionable|unacceptable|negligible|trivial|strong)\b/gi;

// Significance α ("an alpha level of .05", "two-tailed tests") versus coefficient α of a scale
// ("an alpha level of .70 as the criterion of internal consistency"): decided by the sentence.
const RELIABILITY_CONTEXT =
  /\b(?:reliab\w*|internal consistency|consisten\w*|scales?|subscales?|items?|questionnaire|instrument|inventory|index)\b/i;
const SIGNIFICANCE_CONTEXT =
  /\b(?:significan\w*|tests?|tailed|sided|hypothes[ie]s|null|type I|comparisons?|bonferroni|corrected|adjusted|p\s*[<=])/i;

// A cut-off on some other named statistic: "the Gini coefficient", "Geary's ratio". The head noun
// must carry a name (a possessive or a modifier that is not a generic word).
const GENERIC_HEAD = /\b(coefficients?|indices|index|ratios?|statistics?)\b/g;
const GENERIC_STOP = new Set(
  "the a an this that these those its their our each all any every of for and or with in on to at by from as is was were are be its overall same mean average reliability correlation regression path beta standardized standardised unstandardized unstandardised fit test odds hazard risk likelihood cut-off cutoff threshold minimum maximum value values estimated obtained observed resulting corresponding respective final such high low higher lower model structural alpha omega kappa reliability validity stability agreement agreement".split(
    " ",
  ),
);
function genericMentions(s: string): Mention[] {
  const out: Mention[] = [];
  GENERIC_HEAD.lastIndex = 0;
  for (let m = GENERIC_HEAD.exec(s); m; m = GENERIC_HEAD.exec(s)) {
    const words = s
      .slice(Math.max(0, m.index - 40), m.index)
      .split(/\s+/)
      .filter(Boolean);
    const mods: string[] = [];
    for (let i = words.length - 1; i >= 0 && mods.length < 3; i--) {
      const w = words[i];
      if (/[,.;:()]$/.test(w) || GENERIC_STOP.has(w.toLowerCase()) || /\d/.test(w)) break;
      mods.unshift(w);
    }
    if (!mods.length) continue;
    const label = `${mods.join(" ")} ${m[0]}`;
    const start = m.index - (mods.join(" ").length + 1);
    out.push({ start, end: m.index + m[0].length, key: "other", label, generic: true });
  }
  return out;
}

function findMentions(s: string): Mention[] {
  const taken = new Uint8Array(s.length);
  const out: Mention[] = [];
  for (const [re, key, flags] of LEXICON) {
    if (flags?.needs && !flags.needs.test(s)) continue;
    // exec on the shared global pattern, not matchAll: matchAll clones the RegExp on every call, and
    // 23 clones per sentence were the miner's largest single cost (measured on 200 demo PDFs).
    re.lastIndex = 0;
    for (let m = re.exec(s); m; m = re.exec(s)) {
      const start = m.index;
      const end = start + m[0].length;
      if (taken.subarray(start, end).includes(1)) continue;
      taken.fill(1, start, end);
      const mention: Mention = { start, end, key, ...flags };
      if (key === "other") mention.label = m[0].trim();
      // "alpha level": significance unless the sentence is about a scale's reliability
      if (
        flags?.significance &&
        /alpha|α/i.test(m[0]) &&
        RELIABILITY_CONTEXT.test(s) &&
        !SIGNIFICANCE_CONTEXT.test(s)
      ) {
        mention.key = "cronbach_alpha";
        mention.significance = false;
      }
      out.push(mention);
    }
  }
  out.sort((a, b) => a.start - b.start);
  const strong = out.filter((m) => !m.weak);
  if (strong.length) return strong;
  if (out.length) return out;
  // "a sample-to-item ratio", "cases-to-parameter ratio" are sample_size_ratio, read by RATIO_FORMS
  return genericMentions(s).filter(
    (g) =>
      !taken.subarray(g.start, g.end).includes(1) &&
      !/\b(?:sample|subjects?|cases?|participants?|respondents?|observations?)[-\s]/i.test(g.label ?? ""),
  );
}

type Num = { start: number; end: number; value: number; raw: string; percent: boolean; count: boolean; word: boolean };

/** Values and counts of the sentence (lib/mining/numbers.ts); labels, list markers and citation numbers are dropped. */
function findNumbers(s: string): Num[] {
  return readNumbers(s)
    .filter((n) => n.role === "value" || n.role === "count")
    .map((n) => ({
      start: n.start,
      end: n.end,
      value: n.value,
      raw: n.raw,
      percent: n.percent,
      count: n.role === "count",
      word: n.word,
    }));
}

// Negated and reversed rules, read before the plain words: "should never drop below .7" asserts
// >= .7, "must not exceed 5" asserts <= 5, "fail to reach .30" names a minimum of .30.
const NEG = String.raw`(?:not|never|n['’]t|no)\s+(?:\w+\s+){0,2}?`;
const NEGATED: [RegExp, Comparator][] = [
  [
    new RegExp(
      String.raw`(?:${NEG}(?:be\s+)?(?:drop|fall|go|dip|sink|be)s?\s+(?:below|under|beneath|short of)|${NEG}(?:be\s+)?(?:lower|less|smaller|fewer|worse|weaker)\s+than|${NEG}(?:be\s+)?below|${NEG}under|fail(?:s|ed|ing)?\s+to\s+(?:reach|attain|achieve|meet|exceed)|(?:did|does|do)\s+not\s+(?:reach|attain|achieve|meet)|short of|ought\s+not\s+to\s+(?:fall|drop|go)\s+below)\s*(?:the\s*)?(?:value of\s*|level of\s*)?$`,
    ),
    ">=",
  ],
  [
    new RegExp(
      String.raw`(?:${NEG}(?:be\s+)?(?:exceed|surpass|go above|rise above|be above|above|over)\w*|${NEG}(?:be\s+)?(?:greater|higher|larger|more|bigger|stronger)\s+than|within\s*(?:the\s+range\s+(?:of\s+)?)?±)\s*(?:the\s*)?(?:value of\s*|level of\s*)?$`,
    ),
    "<=",
  ],
];

function comparatorBefore(gap: string): Comparator | null {
  const g = gap.toLowerCase();
  for (const [re, c] of NEGATED) if (re.test(g)) return c;
  const table: [RegExp, Comparator][] = [
    [
      /(?:≥|>=|at least|no less than|not less than|a minimum of|minimum of|min\.?|reach(?:ed)?|of at least)\s*(?:the\s*)?(?:value of\s*)?$/,
      ">=",
    ],
    [
      /(?:≤|<=|not exceed|no more than|not more than|at most|a maximum of|maximum of|up to|not greater than|not above|no \S+ exceeded|none exceeded)\s*(?:the\s*)?$/,
      "<=",
    ],
    [/(?:>|above|exceed(?:s|ed|ing)?|greater than|higher than|larger than|more than|over)\s*(?:the\s*)?$/, ">"],
    [/(?:<|below|less than|lower than|smaller than|under|beneath)\s*(?:the\s*)?$/, "<"],
  ];
  for (const [re, c] of table) if (re.test(g)) return c;
  if (/(?:=)\s*$/.test(g)) return "=";
  // A cut-off noun with its verb further back: "exceeds the conventional threshold of 10".
  const w =
    /(?:threshold|cut[-\s]?off|criterion|benchmark|minimum|maximum|level|limit|value|standard)\s*(?:of|at)?\s*$/.test(g)
      ? /(not exceed|no more than|at least|minimum|maximum|exceed\w*|above|greater than|higher than|below|less than|lower than|under|smaller than)\b[^.;]*$/.exec(
          g,
        )
      : null;
  if (w) {
    const word = w[1];
    if (/not exceed|no more than|maximum/.test(word)) return "<=";
    if (/at least|minimum/.test(word)) return ">=";
    if (/exceed|above|greater|higher/.test(word)) return ">";
    return "<";
  }
  if (
    /(?:was|were|is|are|of|reached|amounted to|equal(?:led|s)?(?: to)?|(?:set|fixed|adjusted|corrected|reduced|lowered) (?:at|to))\s*$/.test(
      g,
    )
  )
    return "=";
  return null;
}

function comparatorAfter(after: string): Comparator | null {
  const a = after.toLowerCase();
  if (/^\s*(?:or|and) (?:higher|above|more|greater|better|over)/.test(a)) return ">=";
  if (/^\s*(?:or|and) (?:lower|below|less|smaller|fewer|under)/.test(a)) return "<=";
  return null;
}

function isResultSignificance(s: string): boolean {
  return (
    /\b(?:was|were|is|are|remained|not|all|be)\s+(?:statistically\s+)?significant\s+at\b/i.test(s) &&
    !/consider|regard|deem|treat/i.test(s)
  );
}

export type SentenceContext = {
  hasCitation?: boolean;
  previousStatistic?: StatisticKey | null;
  /**
   * Receives lastStatistic(sentence), computed from the mentions this call finds anyway when its
   * clean-up (intervals, ICC forms, years) left the sentence unchanged: it saves a second lexicon pass.
   */
  onLastStatistic?: (key: StatisticKey | null) => void;
};

/** The statistic named last in a sentence, for the next sentence that says "a cut-off of .90" without naming it. */
export function lastStatistic(sentence: string): StatisticKey | null {
  return findMentions(sentence).at(-1)?.key ?? null;
}

// Pasted software output, formulas and table rows give no statement (label rule 18): a formula has
// function calls or operators between symbols; an output line or table row has (almost) no prose words
// and is laid out in columns, or has no sentence end.
const FORMULA = /\b(?:sqrt|sum|max|min|log|ln|exp|var)\s*\(|[\w)]\s*[*\/^]\s*\(|\(\s*\w+\s*[-−+]\s*\w+\s*\)\s*[*\/^]/i;
function pastedOutput(sentence: string): boolean {
  if (FORMULA.test(sentence) && !/\b(?:was|were|is|are|computed|calculated|defined)\b/i.test(sentence)) return true;
  const prose = sentence.match(/(?<![\w-])[a-z]{3,}(?![\w-])/g) ?? [];
  const columns = / {3,}|\t|\|/.test(sentence);
  const ended = /[.!?]["'”’)]?\s*$/.test(sentence.trim());
  return prose.length < 2 && (columns || !ended) && /\d/.test(sentence);
}

export function extractStatements(
  sentence: string,
  matchProcedure: (s: string) => ProcedurePattern | null,
  ctx: SentenceContext = {},
): RawStatement[] {
  const out: RawStatement[] = [];
  if (pastedOutput(sentence)) return out;
  const proc = matchProcedure(sentence);
  if (proc)
    out.push({ kind: "procedure", statistic: null, comparator: null, value: null, framing: null, procedure: proc.key });

  // Take out confidence intervals and bracketed ranges: their bounds are not values of their own.
  const s = sentence
    .replace(/\(?\s*\b(?:9[059]|99)\s*%\s*(?:CI|confidence interval)\s*[\[(]?[-−.\d\s,–]+[\])]?\s*\)?/gi, " ")
    // a bracketed interval right after a value: "RMSEA = .052 [.041, .063]"
    .replace(/(\d)\s*\[\s*[-−]?\d*\.\d+\s*[,;–-]\s*[-−]?\d*\.\d+\s*\]/g, (m, d) => d + " ".repeat(m.length - 1))
    .replace(/\bICC\s*\((\d)(?:,\s*(\d))?\)/g, "ICC")
    .replace(/\b(?:19|20)\d{2}\b/g, (y) => " ".repeat(y.length));
  const mentions = findMentions(s);
  ctx.onLastStatistic?.(s === sentence ? (mentions.at(-1)?.key ?? null) : lastStatistic(sentence));
  if (
    !mentions.length &&
    ctx.previousStatistic &&
    CUT_NOUN.test(s) &&
    !/\b(?:items?|participants|respondents)\b/i.test(s)
  ) {
    // "A more liberal cut-off of 0.90 can be used …" continues the statistic of the sentence before.
    const m = CUT_NOUN.exec(s);
    if (m) mentions.push({ start: m.index, end: m.index + m[0].length, key: ctx.previousStatistic });
  } else if (
    !mentions.length &&
    ctx.previousStatistic &&
    ctx.previousStatistic !== "other" &&
    THRESHOLD_CUE.test(s) &&
    !/\bsignifican/i.test(s) &&
    !/\b(?:items?|participants|respondents)\b/i.test(s)
  ) {
    // "Values above .90 indicate excellent fit." continues the statistic named just before.
    const m = /\b(?:values?|coefficients?|estimates?)\b(?=[^.;]{0,30}?\d)/i.exec(s);
    if (m) mentions.push({ start: m.index, end: m.index + m[0].length, key: ctx.previousStatistic });
  } else if (
    !mentions.length &&
    ctx.previousStatistic &&
    ctx.previousStatistic !== "other" &&
    !/\bsignifican/i.test(s)
  ) {
    // "The coefficient for the full scale was 0·82" after a sentence on Cronbach's alpha: a noun that
    // points back names the statistic of the sentence before (label rule 6)
    const m =
      /\b(?:the|this|that|its|their|each)\s+(?:\w+\s+)?(?:coefficients?|values?|index|indices|estimates?|statistics?)\b(?=[^.;\d]{0,40}?(?:\bwas|\bwere|=|\bof|\bis|\breached)\s*[-−]?(?:0?[.·]\d|\d))/i.exec(
        s,
      );
    if (m) mentions.push({ start: m.index, end: m.index + m[0].length, key: ctx.previousStatistic });
  }
  const nums = findNumbers(s).filter((n) => !mentions.some((m) => n.start >= m.start && n.start < m.end));
  // Worked examples and definitions explain a value; they assert no cut-off and report nothing.
  if (ILLUSTRATION.test(s)) return finish(out, []);

  const disputed = DISPUTE_CUE.test(s);
  const levelWords = new Set([...s.matchAll(LEVEL_WORDS)].map((m) => m[1].toLowerCase()));
  // "f² values of 0.02, 0.15 and 0.35 represent small, medium and large effects": a graded scale
  const gradedValues =
    levelWords.size >= 2 &&
    (/(?:\d|\.\d)\s*,\s*(?:0?\.\d|\d)[^.;]*\band\s+(?:0?\.\d|\d)/.test(s) ||
      (s.match(
        /\d\s*(?:is|are|as|=|:)?\s*(?:small|medium|large|weak|moderate|strong|poor|fair|good|excellent|acceptable|substantial)\b/gi,
      )?.length ?? 0) >= 3) &&
    !/\b(?:was|were|obtained|observed|yielded)\b/i.test(s);
  // Evaluative words alone ("was satisfactory, with alphas between .74 and .88") describe a result
  // when the sentence speaks in the past of its own data; a rule needs more than praise.
  const ruleCue =
    THRESHOLD_CUE.test(s.replace(EVALUATIVE, " ")) ||
    genericValues(s) ||
    !/\b(?:was|were|had|showed|yielded|exhibited|indicated|suggested|demonstrated|confirmed|revealed)\b/i.test(s);
  const sentenceThreshold =
    (THRESHOLD_CUE.test(s) && ruleCue) || (disputed && (CUT_NOUN_AFTER.test(s) || CUT_NOUN.test(s))) || gradedValues;
  const sentenceReported = REPORTED_CUE.test(s);
  // A graded scale (".60 questionable, .70 acceptable, .80 good") is a general rule: its grades are
  // not situations, and its "whereas"/"while" joins grades, not contexts (label rules 12 and 14).
  const graded = levelWords.size >= 2;
  const contextual = CONTEXT_CUE.test(graded ? s.replace(/\b(?:whereas|while)\b/gi, " ") : s);
  const framing = disputed ? "disputed" : contextual ? "contextual" : "fixed";
  const hasCitation = ctx.hasCitation ?? /\((?:[^()]*\d{4}[^()]*)\)|\[\d+/.test(sentence);
  const resultSig = isResultSignificance(s);

  // "Rather than the usual VIF cut-off of 10, we used a stricter limit of 3.3": the value set aside is
  // disputed, the replacement adopted is a fixed threshold (label rule 15)
  const ratherThan = /\b(?:rather than|instead of|in place of)\b/i.exec(s);
  const numberFraming = (at: number): RawStatement["framing"] => {
    if (!ratherThan) return framing;
    const phraseEnd = s.slice(ratherThan.index).search(/[,;]|\bwe\b/i);
    const phrase = s.slice(ratherThan.index, phraseEnd < 0 ? s.length : ratherThan.index + phraseEnd);
    if (!/\d/.test(phrase)) return framing;
    const inPhrase = at > ratherThan.index && (phraseEnd < 0 || at < ratherThan.index + phraseEnd);
    if (inPhrase) return "disputed";
    return disputed
      ? "fixed"
      : CONTEXT_CUE.test(s.replace(/\bstricter\b|\bmore liberal\b/gi, " "))
        ? "contextual"
        : "fixed";
  };
  type Cand = RawStatement & { at: number };
  const cands: Cand[] = [];
  const usedValues = new Map<string, number>();

  // sample-size ratios: "10 respondents per indicator", "ratio of 10:1"
  for (const m of s.matchAll(RATIO_FORMS)) {
    const value = ratioValue(m[1] ?? m[2] ?? m[3] ?? m[4]);
    if (value === null) continue;
    const gap = s.slice(Math.max(0, m.index! - 40), m.index!);
    const thr =
      !/\b(?:was|were)\s*$/i.test(gap) &&
      (sentenceThreshold || /\b(?:at least|a minimum of|minimum of|no fewer than|no less than)\s*$/i.test(gap));
    cands.push({
      kind: thr ? "threshold" : "reported",
      statistic: "sample_size_ratio",
      comparator: comparatorBefore(gap) === "=" || !comparatorBefore(gap) ? (thr ? ">=" : "=") : comparatorBefore(gap),
      value,
      framing: thr ? framing : null,
      procedure: null,
      at: m.index!,
    });
    usedValues.set(`sample_size_ratio:${value}`, 1);
  }

  // "80% power", "a power of .80": power written before its number is handled by the general rule;
  // "NN% power" has the number first.
  for (const m of s.matchAll(
    /(\d+(?:\.\d+)?)\s*%\s*(?:statistical\s+)?power|(?<=\bpowered (?:at|to|for) )(\d+(?:\.\d+)?)\s*%/gi,
  )) {
    const value = Number(m[1] ?? m[2]) / 100;
    const words = comparatorBefore(s.slice(Math.max(0, m.index! - 40), m.index!));
    // power the design obtained ("the final design had 87% power") is a result (label rule 2)
    if (
      /\b(?:had|has|achieved|provided|yielded|gave|obtained|actual|observed|resulting)\s+(?:a\s+|an\s+)?(?:\w+\s+)?$/i.test(
        s.slice(Math.max(0, m.index! - 30), m.index!),
      ) &&
      !/\b(?:would|designed|a priori|plann\w*|required|needed|set|to achieve|to ensure)\b/i.test(s)
    ) {
      cands.push({
        kind: "reported",
        statistic: "statistical_power",
        comparator: "=",
        value,
        framing: null,
        procedure: null,
        at: m.index!,
      });
      continue;
    }
    cands.push({
      kind: "threshold",
      statistic: "statistical_power",
      // "designed to have 80% power" is a design value (=); "at least 80% power", "80% power is recommended" a rule
      comparator: words && words !== "=" ? words : POWER_RULE.test(s) || disputed ? ">=" : "=",
      value,
      framing,
      procedure: null,
      at: m.index!,
    });
  }

  const pCut = /\bp\s*(<|≤|<=|=)\s*(0?\.\d+)/gi;
  const pThresholdSentence =
    /\b(?:consider|regard|deem|treat|accept|defin|interpret|judg|tak)\w*|\bas (?:marginally )?significant\b|\bset (?:at|to)\b|\bused as\b|\badopted\b|\bthresholds?\b|\bcut[-\s]?offs?\b|\bcriteri\w+|\bconvention\w*|\bto (?:show|indicate|denote)\b|\bsignifican\w+ (?:level|threshold)|\blevel of significance|\bsignificance level|\balpha level|\btwo[-\s](?:tailed|sided)\b|\b(?:was|were) (?:used|applied|employed|chosen)\b|\bBonferroni\b|\b(?:corrected|adjusted) (?:alpha|α|significance|p)\b/i.test(
      s,
    ) ||
    disputed ||
    /\b(?:dropped|removed|deleted|excluded|eliminated|retained|kept)\b/i.test(s);
  for (const m of s.matchAll(pCut)) {
    if (!pThresholdSentence) continue;
    cands.push({
      kind: "threshold",
      statistic: "p_value",
      comparator: m[1] === "≤" || m[1] === "<=" ? "<=" : "<",
      value: Number(m[2]),
      framing,
      procedure: null,
      at: m.index!,
    });
  }
  const consumed = new Set<number>();
  // A required sample size computed in this study ("a power analysis indicated that 146 participants
  // would be required", "the required sample was 212") is a reported minimum sample size (label rule 2).
  if (
    /\b(?:power analys[ie]s|sample size (?:calculation|estimation|determination)|calculat\w*|comput\w*|estimat\w*|indicated|showed|revealed|yielded|suggested|required sample|was required|were required|were needed|was needed)\b/i.test(
      s,
    )
  ) {
    const computed = [
      /\b(\d[\d,]*)\s+(?:participants|respondents|subjects|cases|patients|students|people|observations|households|individuals|pharmacies|schools|firms|teachers|nurses|children|adults|employees)\s+(?:per (?:group|arm|condition)\s+|in total\s+)?(?:would be|were|was|are|is|would have been)\s+(?:required|needed|necessary|sufficient)\b/gi,
      /\b(?:required|necessary|needed|target) (?:total )?sample(?: size)?\s+(?:was|of|=|is|would be)\s+(?:N\s*=\s*)?(?:approximately\s+|about\s+)?(\d[\d,]*)\b/gi,
      /\b(?:required|need(?:ed)?) (?:a (?:total )?(?:sample(?: size)?|minimum) of\s+)(\d[\d,]*)\b/gi,
    ];
    for (const re of computed)
      for (const m of s.matchAll(re)) {
        const value = Number(m[1].replace(/,/g, ""));
        if (!(value >= 2 && value <= 1e6)) continue;
        if (cands.some((c) => c.statistic === "minimum_sample_size" && c.value === value)) continue;
        cands.push({
          kind: "reported",
          statistic: "minimum_sample_size",
          comparator: "=",
          value,
          framing: null,
          procedure: null,
          at: m.index!,
        });
        usedValues.set(`reported:minimum_sample_size:=:${value}`, 1);
        consumed.add(m.index! + m[0].lastIndexOf(m[1]));
      }
  }

  // "one time in twenty", "at the five percent level", "values less than 0.05 were considered
  // statistically significant": a significance level written in words (label rule 16)
  if (!resultSig && /\bsignifican\w*/i.test(s) && !mentions.some((m) => m.key === "p_value")) {
    const words =
      /\b(?:at the|a) (one|five|ten) (?:percent|per cent) (?:significance )?level\b|\bone (?:time |chance )?in (twenty|a hundred|one hundred|ten)\b/i.exec(
        s,
      );
    const plain =
      /\b(?:values?|results?|differences?|effects?|estimates?)\s+(less than|lower than|smaller than|below|under|≤|<)\s*(0?\.\d+)\s+(?:were|was|are|is)\s+(?:considered|regarded|deemed|taken|treated|interpreted)/i.exec(
        s,
      );
    if (words) {
      const v = words[1]
        ? ({ one: 0.01, five: 0.05, ten: 0.1 } as Record<string, number>)[words[1].toLowerCase()]
        : 1 /
          ({ twenty: 20, "a hundred": 100, "one hundred": 100, ten: 10 } as Record<string, number>)[
            words[2].toLowerCase()
          ];
      cands.push({
        kind: "threshold",
        statistic: "p_value",
        comparator: words[1] ? "=" : "<",
        value: v,
        framing,
        procedure: null,
        at: words.index,
      });
    } else if (plain && Number(plain[2]) <= 0.1)
      cands.push({
        kind: "threshold",
        statistic: "p_value",
        comparator: /≤/.test(plain[1]) ? "<=" : "<",
        value: Number(plain[2]),
        framing,
        procedure: null,
        at: plain.index,
      });
  }

  // "at the .05 level", "at the 5% level"
  for (const m of s.matchAll(/\bat the (0?\.\d+|\d+\s*%)\s*(?:significance\s+)?level/gi)) {
    if (resultSig) continue;
    const v = m[1].includes("%") ? Number(m[1].replace("%", "")) / 100 : Number(m[1]);
    cands.push({
      kind: "threshold",
      statistic: "p_value",
      comparator: "=", // a significance level as a setting (label rule 10)
      value: v,
      framing,
      procedure: null,
      at: m.index!,
    });
  }

  // "The predictors accounted for 27% of the variance": a reported R² of .27 (a factor's share of
  // variance is not an R²).
  for (const m of s.matchAll(
    /\b(?:explain\w*|accounted for|accounts for|account for)\s+(?:only\s+|about\s+|approximately\s+|around\s+|nearly\s+|almost\s+|roughly\s+|some\s+)?(\d+(?:\.\d+)?)\s*(?:%|percent\b|per cent\b)\s+of\s+(?:the\s+)?(?:total\s+|overall\s+)?variance/gi,
  )) {
    const subject = s.slice(0, m.index);
    if (/\b(?:factors?|components?|dimensions?)\b/i.test(subject) && !/\b(?:ICC|intraclass|method)\b/i.test(subject)) {
      // variance explained by factors or components is an 'other' statistic (label rule 17)
      cands.push({
        kind: "reported",
        statistic: "other",
        statistic_label: "variance explained",
        comparator: "=",
        value: Number(m[1]) / 100,
        framing: null,
        procedure: null,
        at: m.index!,
      });
      continue;
    }
    if (/\b(?:factors?|components?|dimensions?|eigen\w*|ICC|intraclass|method)\b/i.test(subject)) continue;
    const value = Number(m[1]) / 100;
    const already =
      mentions.some((x) => x.key === "r_squared") && nums.some((x) => !x.percent && Math.abs(x.value - value) < 1e-9);
    if (already) continue;
    cands.push({
      kind: "reported",
      statistic: "r_squared",
      comparator: "=",
      value,
      framing: null,
      procedure: null,
      at: m.index!,
    });
  }

  if (!mentions.length || !nums.length) return finish(out, cands);
  const lastByMention = new Map<
    Mention,
    { kind: "threshold" | "reported"; comparator: Comparator | null; end: number }
  >();
  for (let ni = 0; ni < nums.length; ni++) {
    const n = nums[ni];
    if (consumed.has(n.start)) continue;
    if (
      /^\s*(?:%\s*)?(?:power\b|(?:cases|respondents|participants|observations|subjects|people|events)\s+(?:per|for each|for every)\b)/i.test(
        s.slice(n.end, n.end + 30),
      )
    )
      continue;
    const before = s.slice(0, n.start);
    // "The KMO was 0." is the first half of a decimal broken after its point ("0. 88") by the splitter
    if (n.raw === "0" && /^\.\s*$/.test(s.slice(n.end))) continue;
    const blocked = BLOCKER.test(before.slice(-24)) && !/1\s*[-−–]\s*β\s*=\s*$/.test(before);
    if (/\bp\s*[<=>≤≥]\s*$/i.test(before) || /\bat the\s*$/i.test(before)) continue;
    if (
      /^\s*[-–]?(?:point|item|year|day|week|month|hour|minute|factor|wave)s?\b(?!\s+(?:to|towards)\b)/i.test(
        s.slice(n.end, n.end + 16),
      )
    )
      continue;
    // the statistic this number belongs to: the nearest mention before it, within the sentence part
    // that has no other number-bearing mention in between.
    let mi = -1;
    for (let i = mentions.length - 1; i >= 0; i--)
      if (mentions[i].end <= n.start) {
        mi = i;
        break;
      }
    if (mi < 0) {
      // "Values above .70 are considered acceptable for Cronbach's alpha": the name comes after the value.
      const next = mentions.findIndex((m) => m.start >= n.end && m.start - n.end < 80);
      if (next < 0 || !sentenceThreshold || mentions.slice(0, next).length) continue;
      mi = next;
    }
    const mention = mentions[mi];
    if (n.start - mention.end > 150) continue;
    // A test-statistic sign blocks the number unless it is the mention's own ("d = 0.41", "first-stage F = 24").
    if (blocked && !/^\s*(?:\([^)]*\))?\s*(?:[=<>≤≥]|of|was|were)\s*[-−–]?$/.test(s.slice(mention.end, n.start)))
      continue;
    // Several names joined by "and" / "," with no number between share the value ("CFI and TLI of .95").
    const group: Mention[] = [mention];
    for (let i = mi - 1; i >= 0; i--) {
      const between = s.slice(mentions[i].end, group[0].start);
      if (/^\s*(?:values?\s*)?(?:,|and|or|,\s*and)\s*(?:the\s*)?$/i.test(between)) group.unshift(mentions[i]);
      else break;
    }
    const prevNum = nums[ni - 1];
    const gapStart =
      mention.end > n.start
        ? prevNum
          ? prevNum.end
          : 0
        : Math.max(mention.end, prevNum && prevNum.end > mention.end ? prevNum.end : mention.end);
    const gap = s.slice(gapStart, n.start);
    const after = s.slice(n.end, n.end + 60);

    // A reported range ("alphas ranged from .78 to .92") reports its two ends as obtained values.
    const pushRangeEnd = (k: StatisticKey, v: number) => {
      const prevEnd = prevNum ? s.slice(prevNum.end, n.start) : "";
      const twoEnded =
        /^\s*(?:\([^)]*\)\s*)?(?:and|to|[-–])\s*[.\d]/.test(after) ||
        /^\s*(?:\([^)]*\)\s*)?(?:and|to|[-–])\s*$/.test(prevEnd);
      if (twoEnded && !n.percent)
        cands.push({
          kind: "reported",
          statistic: k,
          comparator: "=",
          value: v,
          framing: null,
          procedure: null,
          ...(k === "other" ? { statistic_label: mention.label ?? null } : {}),
          at: n.start,
        });
    };
    for (const g of group) {
      let key = g.key;
      const value = n.percent ? Number((n.value / 100).toFixed(10)) : n.value;
      if (n.count && !COUNT_KEYS.has(key)) continue;
      // A number word is a value only with a comparator or "of" before it ("above zero", "at least ten").
      if (
        n.word &&
        !/(?:above|below|exceed\w*|than|at least|at most|of|under|over|equals?|to|minimum|maximum|≥|≤|[<>=])\s*$/i.test(
          gap,
        )
      )
        continue;
      // an effect size given with its test ("d = 0.21, p = .04") is a result, like the p-value beside it
      // (and the d assumed in a power analysis is neither a rule nor a result)
      if (key === "cohen_d" && /\bp\s*[=<>≤]|\b[tF]\s*\(\s*\d/i.test(s)) continue;
      // an effect size assumed or expected in planning is a design value ("d = 0.6 expected",
      // "f² = 0.15 was assumed"; label rule 10): "=", or ">=" for the smallest effect of interest
      const designEffect =
        (key === "cohen_d" || key === "f_squared") &&
        (/\b(?:assum\w*|expect\w*|anticipat\w*|hypothesi[sz]ed|to detect|smallest effect|minimum effect|power analys[ie]s|plann\w*)\b/i.test(
          s,
        ) ||
          SAMPLE_SIZE_CALC.test(s)) &&
        !/\b(?:obtained|observed|found|yielded|showed)\b/i.test(s);
      // a named statistic of no tracked kind counts only with a rule or a plain "was"/"=" value
      if (g.generic && !sentenceThreshold && !/(?:=|\bwas|\bwere|\bof)\s*$/i.test(gap)) continue;
      // "an alpha level of .70": a significance level is never that large, so it is a scale's alpha
      const alphaWord = /α|alpha/i.test(s.slice(g.start, g.end));
      const isSig =
        (g.significance && !(alphaWord && value > 0.2)) ||
        (key === "cronbach_alpha" && alphaWord && value > 0 && value <= 0.1);
      if (isSig) key = "p_value";
      else if (g.significance && alphaWord) key = "cronbach_alpha";
      // a p-value named in words counts only as a rule ("a p-value below .05 was considered significant")
      if (
        key === "p_value" &&
        g.significance &&
        !/level|α|alpha/i.test(s.slice(g.start, g.end)) &&
        (!pThresholdSentence || value > 0.2)
      )
        continue;
      // values at the bounds of a statistic's scale, explained: "kappa equals 1 for perfect agreement"
      if ((value === 0 || value === 1 || value === -1) && BOUND_MEANING.test(s) && key !== "q_squared") continue;
      // percentages of proportion statistics are proportions (label rule 16)
      if (
        n.percent &&
        key !== "p_value" &&
        key !== "statistical_power" &&
        key !== "r_squared" &&
        key !== "ave" &&
        !(
          key === "other" && /response rate|coefficients? of variation|missing|agreement/i.test(s.slice(g.start, g.end))
        )
      )
        continue;
      if (BOUNDED.has(key) && (value < 0 || value > 1)) continue;
      if (
        key === "minimum_sample_size"
          ? value < 2 || value > 1e6
          : !BOUNDED.has(key) && ((value < 0 && key !== "skewness" && key !== "kurtosis") || value > 1000)
      )
        continue;
      if (key === "minimum_sample_size" && !sentenceThreshold) continue;
      // a sample's own size is not a statistic; only the minimum asked for counts
      if (
        key === "minimum_sample_size" &&
        !/minimum/i.test(s.slice(g.start, g.end)) &&
        /(?:=|\bwas|\bwere|\bof)\s*$/i.test(gap) &&
        !CUT_BEFORE.test(gap)
      )
        continue;
      if (key === "statistical_power" && value < 0.5) continue;

      let comparator = comparatorBefore(gap) ?? comparatorAfter(after);
      const after2 = comparatorAfter(after);
      if (after2) comparator = after2;
      const cutBefore = CUT_BEFORE.test(gap) || (/\bthe\s*$/i.test(gap) && CUT_NOUN.test(after.slice(0, 25)));
      const relationToCut = RELATION_TO_CUT.test(after);
      const clauseStart = Math.max(0, s.lastIndexOf(";", g.start) + 1);
      const allValues =
        (/\ball\b/i.test(s.slice(clauseStart, n.start)) &&
          !/\b(?:all|for all) (?:tests|analyses|hypothes[ie]s|models)\b/i.test(s)) ||
        /\bboth\b/i.test(gap);
      const onlyOneNumber = nums.filter((x) => x !== n).every((x) => BLOCKER.test(s.slice(0, x.start).slice(-24)));

      // "falls within the recommended range of 0.05 and 0.08": the ends are a cut-off band
      const withinRange = RANGE_OF.test(gap) && /^\s*(?:and|to|[-–])\s*[.\d]/.test(after);
      const rangeEndOfRecommended =
        !!prevNum &&
        /^\s*(?:and|to|[-–])\s*$/.test(s.slice(prevNum.end, n.start)) &&
        RANGE_OF.test(s.slice(Math.max(0, prevNum.start - 60), prevNum.start));
      // "Alpha was .86, above the .70 level": an obtained value compared with a criterion
      const comparing =
        /\b(above|below|over|under|exceed\w*|surpass\w*|beyond|meet\w*|clear of|short of|within)\s+the\s+((?:[\w-]+\s+){0,4}?)(?:of\s+)?$/i.exec(
          gap,
        );
      const comparedWithCut =
        cands.some((c) => c.kind === "reported" && c.statistic === key) &&
        !!comparing &&
        (/\b(?:level|threshold|cut[-\s]?off|criterion|benchmark|limit|standard|mark|minimum|maximum|rule|guideline|recommendation|value)\b/i.test(
          comparing[2],
        ) ||
          /^\s*(?:level|threshold|cut[-\s]?off|criterion|benchmark|limit|standard|mark|minimum|maximum|rule|guideline|recommendation)\b/i.test(
            after,
          ));
      let kind: "threshold" | "reported";
      const prevSame = lastByMention.get(mention);
      const listGap = prevSame ? s.slice(prevSame.end, n.start) : "";
      const continuesList =
        prevSame &&
        /^[\s,]*(?:(?:and|or|,)\s*)?(?:(?:for|in) [^,;.<>=\d]{1,40}?(?:,?\s*and|,)\s*)?(?:(?:it|this|the \w+) (?:was|were)\s*)?$/i.test(
          listGap,
        ) &&
        !comparatorBefore(listGap);
      if (
        (/\b(?:ranged?|ranging|were between|was between|varied)\b[^;]*$/i.test(s.slice(g.end, n.start)) &&
          !CUT_NOUN.test(s.slice(g.end, n.start)) &&
          !withinRange &&
          !rangeEndOfRecommended) ||
        (/\branged? (?:from|between)\b/i.test(s.slice(mention.end, n.start)) &&
          !CUT_NOUN.test(s.slice(mention.end, n.start)))
      ) {
        pushRangeEnd(key, value);
        continue;
      }
      // "The composite reliability coefficients (0.81–0.93) exceeded …": a bracketed range of obtained values
      const bracketRangeStart =
        /^\s*(?:(?:values?|coefficients?|estimates?|scores?)\s*)?\(\s*$/i.test(gap) &&
        /^\s*[-–]\s*[-−]?\d*[.·]?\d+\s*\)/.test(after) &&
        !CUT_NOUN.test(gap);
      const bracketRangeEnd =
        !!prevNum &&
        /^\s*[-–]\s*$/.test(s.slice(prevNum.end, n.start)) &&
        /^\s*\)/.test(after) &&
        cands.some((c) => c.kind === "reported" && c.statistic === key && c.at === prevNum.start);
      if (bracketRangeStart || bracketRangeEnd) {
        kind = "reported";
        comparator = "=";
      } else if (continuesList && prevSame) {
        kind = prevSame.kind;
        if (kind === "reported" || !comparator || comparator === "=") comparator = prevSame.comparator;
      } else if (key === "p_value") {
        if (resultSig) continue;
        kind = "threshold";
      } else if (withinRange || rangeEndOfRecommended) kind = "threshold";
      else if (
        key === "statistical_power" &&
        PLANNING.test(s) &&
        (!/(?:=|\bwas|\bwere)\s*$/i.test(gap) || SAMPLE_SIZE_CALC.test(s)) &&
        !/\b(?:achieved|observed|obtained|post[-\s]?hoc|actual|showed|provided|yielded|gave)\b/i.test(s)
      )
        kind = "threshold";
      else if (cutBefore) {
        kind = "threshold";
        if (comparedWithCut) comparator = null;
      } else if (designEffect) {
        kind = "threshold";
        comparator = /\b(?:smallest|minimum|minimal) effect\b/i.test(s) ? ">=" : "=";
      }
      // "…, above the .70 level", "well clear of the 5 limit": the criterion the obtained value is
      // compared with; its comparator follows the statistic's polarity (label rule 9)
      else if (comparedWithCut) {
        kind = "threshold";
        comparator = null;
      }
      // "Two image items with loadings of 0.38 and 0.41 were removed": item-level values, neither a
      // rule nor a result of the scale
      else if (
        /^\s*(?:of|=|and|,|,\s*and)\s*$/i.test(gap) &&
        /^\s*(?:\d+|one|two|three|four|five|six|seven|eight|nine|ten)\s+(?:[\w-]+\s+)?(?:items?|indicators?|variables?|questions?)\b/i.test(
          s,
        )
      )
        continue;
      // "The R² values for intention (0.52) and behaviour (0.31)"
      else if (/[\p{L})]\s*\(\s*$/u.test(before) && /^\s*[),;]/.test(after) && /\bfor\b/i.test(s.slice(g.end, n.start)))
        kind = "reported";
      else if (disputed && !/(?:=|\bwas|\bwere)\s*$/i.test(gap) && !OBTAINED.test(s.slice(clauseStart, g.start)))
        kind = "threshold";
      // "The alpha of .85 was considered good": one obtained value, interpreted; not a rule
      else if (
        /^\s*(?:of|was|were|is|=)\s*$/i.test(gap) &&
        /\b(?:the|our|its|their)\s+(?:[\w'’-]+\s+){0,2}$/i.test(s.slice(clauseStart, g.start)) &&
        !/\b(?:recommend\w*|required|minimum|maximum|conventional|accepted|common|traditional|usual|desired|target|acceptable|critical)\b/i.test(
          s.slice(Math.max(clauseStart, g.start - 40), g.start),
        ) &&
        !/s$|values?$/i.test(s.slice(g.start, g.end)) &&
        !comparatorAfter(after) &&
        !CUT_NOUN.test(s.slice(n.end, n.end + 40))
      )
        kind = "reported";
      else if (OBTAINED.test(s.slice(clauseStart, g.start)) && !disputed) kind = "reported";
      else if (relationToCut) kind = "reported";
      else if (comparator === "=" && /(?:=|\bwas|\bwere)\s*$/i.test(gap)) kind = "reported";
      else if (/\bwhich (?:was|were)\b/i.test(gap)) kind = "reported";
      else if (allValues && !(hasCitation && onlyOneNumber)) kind = "reported";
      else if (REPORTED_CUE.test(gap) || (sentenceReported && !sentenceThreshold)) kind = "reported";
      else if (sentenceThreshold || (hasCitation && comparator && comparator !== "=")) kind = "threshold";
      else kind = "reported";

      // a statistic of no known polarity passes on the side the obtained value lies
      if (
        comparedWithCut &&
        kind === "threshold" &&
        (key === "other" || (!BOUNDED.has(key) && !HIGHER_IS_WORSE.has(key) && key !== "first_stage_f"))
      )
        comparator = /^(?:below|under|short of|within)/i.test(comparing![1]) ? "<=" : ">=";
      const written = comparator;
      if (kind === "threshold") {
        // A design value stated as a setting ("α = .05", "an alpha level of .01", "a power of .80 was
        // used to plan") keeps "="; a bare criterion takes the statistic's polarity (label rules 9, 10).
        const designValue =
          comparator === "=" &&
          (key === "p_value" || (key === "statistical_power" && !POWER_RULE.test(s))) &&
          !disputed;
        if (designValue || (designEffect && comparator === "=")) comparator = "=";
        else if (!comparator || comparator === "=")
          comparator = key === "p_value" ? "<" : HIGHER_IS_WORSE.has(key) ? "<=" : ">=";
        if (key === "p_value" && comparator === "<=" && !/≤|<=|or less|or lower/.test(gap + after.slice(0, 12)))
          comparator = "<";
      } else if (!comparator || !/[<>]/.test(comparator) || /(?:=|\bwas|\bwere|\bof)\s*$/i.test(gap)) {
        comparator =
          comparator && /^[<>]/.test(comparator) && !/(?:=|\bwas|\bwere|\bof)\s*$/i.test(gap)
            ? comparator
            : (comparator ?? "=");
      }
      // Ranges: "between X and Y", "X to Y"
      const rangeBefore = /\bbetween\s*$/i.test(gap) || /\bfrom\s*$/i.test(gap);
      const rangeAfter = /^\s*(?:and|to|[-–])\s*\+?(0?\.\d+|\d+(?:\.\d+)?)/i.exec(after);
      const prevGap = prevNum ? s.slice(prevNum.end, n.start) : "";
      const isRangeEnd =
        (prevNum &&
          /^\s*(?:and|to|[-–])\s*$/i.test(prevGap) &&
          /\b(?:between|from)\s*$/i.test(s.slice(Math.max(0, prevNum.start - 12), prevNum.start))) ||
        (prevNum && /^\s*(?:to|[-–])\s*$/i.test(prevGap));
      if (
        kind === "reported" &&
        ((rangeBefore && rangeAfter) || isRangeEnd || /\branged?\b/i.test(s.slice(g.end, n.start)))
      ) {
        // only a range said to be one ("ranged between"): "values between .56 and .74 confirmed" is not
        if (/\b(?:ranged?|ranging)\b/i.test(s.slice(g.end, n.start))) pushRangeEnd(key, value);
        // "(α = .76–.91)", "(.62–.88)": a range of obtained values reports both ends (label rule 4)
        else if (
          isRangeEnd &&
          /^\s*[-–]\s*$/.test(prevGap) &&
          cands.some((c) => c.kind === "reported" && c.statistic === key && c.at === prevNum!.start)
        )
          cands.push({
            kind: "reported",
            statistic: key,
            comparator: "=",
            value,
            framing: null,
            procedure: null,
            ...(key === "other" ? { statistic_label: g.label ?? null } : {}),
            at: n.start,
          });
        continue;
      }
      if (kind === "threshold" && withinRange) comparator = ">=";
      else if (kind === "threshold" && rangeEndOfRecommended) comparator = "<=";
      else if (kind === "threshold" && rangeBefore && rangeAfter) {
        // an acceptable range gives both ends (label rule 11); the lower end of a "lower is better"
        // band in a graded scale adds nothing
        if (HIGHER_IS_WORSE.has(key) && graded) continue;
        comparator = ">=";
      } else if (kind === "threshold" && isRangeEnd) {
        // "X to Y" (not "between"): read as a band's lower end only; the upper end of a graded band adds
        // no boundary (label rule 12), and held-out figures got worse when every "X to Y" gave both ends
        if (!/\bbetween\s*$/i.test(s.slice(Math.max(0, prevNum!.start - 12), prevNum!.start))) continue;
        if (/\b(?:lower (?:limit|bound|end)|minimum|floor)\b/i.test(s)) continue; // the band is a minimum
        const repeated = nums.some((x) => x !== n && x !== prevNum && Math.abs(x.value - n.value) < 1e-9);
        if (!HIGHER_IS_WORSE.has(key) && repeated) continue;
        comparator = "<=";
      }
      // "McDonald's omega reached .89": an obtained value, not a bound
      if (kind === "reported" && comparator === ">=" && /\breach(?:ed|es)?\s*$/i.test(gap)) comparator = "=";
      // "None of the VIFs exceeded 2.1" (<= 2.1), "No loading was lower than .55" (>= .55)
      if (
        /\b(?:no|none of the|not one|not a single|not any)\s*$/i.test(s.slice(0, g.start)) ||
        /\b(?:no|none of the|not one|not a single)\s+[\w-]+\s+(?:had|has|have|showed|shows|with)\s+(?:a|an|any)?\s*$/i.test(
          s.slice(0, g.start),
        )
      ) {
        if (comparator === ">") comparator = "<=";
        else if (comparator === "<") comparator = ">=";
      }
      if (
        kind === "threshold" &&
        written &&
        written !== "=" &&
        comparator === written &&
        !disputed &&
        !NEGATED.some(([re]) => re.test(gap.toLowerCase()))
      ) {
        const clause = clauseAround(s, n.start, n.end);
        if (FAILING_SIDE.test(clause) && !PASSING_SIDE.test(clause)) comparator = FLIP[comparator];
      }
      // a graded scale's lowest band written only as "< x" ("less than 0.5 poor") adds no boundary of its own
      if (
        kind === "threshold" &&
        graded &&
        key !== "p_value" &&
        (HIGHER_IS_WORSE.has(key)
          ? comparator === ">" || comparator === ">="
          : comparator === "<" || comparator === "<=") &&
        !/^\s*(?:and|to|[-–])/.test(after) &&
        !isRangeEnd
      )
        continue;
      lastByMention.set(mention, { kind, comparator, end: n.end });
      const dedupeKey = `${kind}:${key}:${comparator}:${value}`;
      if (kind === "threshold" && usedValues.has(dedupeKey)) continue;
      usedValues.set(dedupeKey, 1);
      cands.push({
        kind,
        statistic: key,
        comparator,
        value,
        framing: kind === "threshold" ? numberFraming(n.start) : null,
        procedure: null,
        ...(key === "other" ? { statistic_label: g.label ?? null } : {}),
        at: n.start,
      });
    }
  }
  return finish(out, cands);
}

function finish(out: RawStatement[], cands: (RawStatement & { at: number })[]): RawStatement[] {
  cands.sort((a, b) => a.at - b.at);
  for (const c of cands) {
    const { at: _at, ...rest } = c;
    out.push(rest);
  }
  return out;
}
