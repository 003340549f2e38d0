// Statements from one sentence: thresholds (cut-off claims), reported values, procedures.
// Rules are hand-written from the trade's wording; the gold set in tests/fixtures/gold measures them.
import type { Comparator, StatisticKey } from "./contract";
import type { ProcedurePattern } from "./procedures";

export type RawStatement = {
  kind: "threshold" | "reported" | "procedure";
  statistic: StatisticKey | null;
  comparator: Comparator | null;
  value: number | null;
  framing: "fixed" | "contextual" | null;
  procedure: string | null;
};

type Mention = { start: number; end: number; key: StatisticKey; weak?: boolean; significance?: boolean };

// Order matters: longer, more specific names first; matched spans are not re-used.
const LEXICON: [RegExp, StatisticKey, { weak?: boolean; significance?: boolean }?][] = [
  [/\b(?:decrease|drop|change|difference|increase)s? in (?:the )?CFI\b|ΔCFI|∆CFI/g, "other"],
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
    /χ²\s*\/\s*df|χ2\s*\/\s*df|chi[-\s]square\s*\/\s*df|\bnormed chi[-\s]square|\bchi[-\s]square to degrees of freedom(?: ratio)?|\bCMIN\s*\/\s*df/gi,
    "chi_square_df",
  ],
  [/\bKaiser[-–\s]Meyer[-–\s]Olkin|\bKMO\b/gi, "kmo"],
  [/\beigenvalues?\b/gi, "eigenvalue"],
  [/\bintra[-\s]?class correlations?(?: coefficients?)?|\bICCs?(?:\(\d(?:,\s*\d)?\))?/gi, "icc"],
  [/\b(?:Cohen['’]?s\s+|weighted\s+)?kappas?\b|κ/gi, "cohen_kappa"],
  [/\bpseudo[-\s]?R²|\bpseudo[-\s]?R2\b|\bR²|\bR2\b|\bR-squared|\bcoefficient of determination/g, "r_squared"],
  [/\b(?:statistical )?power\b|1\s*[-−–]\s*β/gi, "statistical_power"],
  [
    /\b(?:(?:standardi[sz]ed|factor|indicator|outer|primary|item)\s+)?(?:cross[-–])?loadings?\b|\bloaded\b|\bload\b/gi,
    "factor_loading",
  ],
  [/\b(?:reliability coefficients?|internal consistency|reliability)\b/gi, "cronbach_alpha", { weak: true }],
];

const HIGHER_IS_WORSE = new Set<StatisticKey>(["rmsea", "srmr", "vif", "chi_square_df", "p_value", "htmt"]);
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
]);

// Numbers that belong to something that is not a tracked statistic: test statistics, descriptives, CIs.
const BLOCKER =
  /(?:(?<![\/\w])(?:t|F|z|r|b|B|β|γ|d|g|OR|IRR|HR|RR|SE|SD|M|N|n|df|Mdn|χ²|χ2|W|U|H)\s*(?:\([^)]*\))?\s*[=<>≤≥]\s*[-−–]?$|\bodds ratio (?:of\s*)?$|\beffect size (?:of\s*)?$|\b(?:9[059]|99)\s*%\s*CI\s*\[?$|\bCI\s*\[?$|\bmedian\s*$|\bmean(?: age)?(?: of)?\s*$|\baged?\s*$)/;

const CUT_NOUN =
  /(?:threshold|cut[-\s]?off|criterion|minimum|maximum|benchmark|rule of thumb|recommended (?:value|level))/i;
// Built once: they were compiled anew for every number of every sentence.
const CUT_BEFORE = new RegExp(`${CUT_NOUN.source}\\s*(?:of|at|is|was|value of)?\\s*(?:the\\s*)?$`, "i");
const RELATION_TO_CUT = new RegExp(
  `^[^.;]{0,45}?\\b(?:above|below|exceed\\w*|under|over|higher than|lower than)\\s+the\\b[^.;]{0,30}${CUT_NOUN.source}`,
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
    "indicat(?:e|es|ing)",
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
  ].join("|"),
  "i",
);
const REPORTED_CUE =
  /\b(?:reported|observed|obtained|achieved|in (?:our|the present|this) (?:data|sample|study)|in the (?:calibration|validation|present) sample|yielded|were between|ranged)\b/i;
const CONTEXT_CUE = new RegExp(
  [
    "(?:for|in) exploratory (?:research|studies|work|purposes|analys[ie]s|stages?)",
    "early stages?",
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
  ].join("|"),
  "i",
);
const LEVEL_WORDS =
  /\b(acceptable|good|reasonable|close|excellent|poor|moderate|substantial|weak|adequate|mediocre|marginal|almost perfect|fair)\b/gi;

function findMentions(s: string): Mention[] {
  const taken = new Uint8Array(s.length);
  const out: Mention[] = [];
  for (const [re, key, flags] of LEXICON) {
    // exec on the shared global pattern, not matchAll: matchAll clones the RegExp on every call, and
    // 23 clones per sentence were the miner's largest single cost (measured on 200 demo PDFs).
    re.lastIndex = 0;
    for (let m = re.exec(s); m; m = re.exec(s)) {
      const start = m.index;
      const end = start + m[0].length;
      if (taken.subarray(start, end).includes(1)) continue;
      taken.fill(1, start, end);
      out.push({ start, end, key, ...flags });
    }
  }
  out.sort((a, b) => a.start - b.start);
  const strong = out.filter((m) => !m.weak);
  return strong.length ? strong : out;
}

type Num = { start: number; end: number; value: number; raw: string; percent: boolean };

function findNumbers(s: string): Num[] {
  const out: Num[] = [];
  for (const m of s.matchAll(/(?<![\w.\/])[-−]?(?:\d{1,3}(?:,\d{3})+|\d+)?(?:\.\d+)?(?:\s*(%|percent))?(?![\w])/g)) {
    const raw = m[0];
    if (!/\d/.test(raw)) continue;
    const percent = Boolean(m[1]);
    const num = Number(
      raw
        .replace(/%|percent/g, "")
        .replace(/,/g, "")
        .replace("−", "-")
        .trim(),
    );
    if (!Number.isFinite(num)) continue;
    out.push({ start: m.index!, end: m.index! + raw.length, value: num, raw, percent });
  }
  return out;
}

function comparatorBefore(gap: string): Comparator | null {
  const g = gap.toLowerCase();
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
  const w = /(?:threshold|cut[-\s]?off|criterion|benchmark|minimum|maximum)\s*(?:of|at)?\s*$/.test(g)
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
  if (/(?:was|were|is|are|of|reached)\s*$/.test(g)) return "=";
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

export function extractStatements(
  sentence: string,
  matchProcedure: (s: string) => ProcedurePattern | null,
  ctx: SentenceContext = {},
): RawStatement[] {
  const out: RawStatement[] = [];
  const proc = matchProcedure(sentence);
  if (proc)
    out.push({ kind: "procedure", statistic: null, comparator: null, value: null, framing: null, procedure: proc.key });

  // Take out confidence intervals and bracketed ranges: their bounds are not values of their own.
  const s = sentence
    .replace(/\(?\s*\b(?:9[059]|99)\s*%\s*(?:CI|confidence interval)\s*[\[(]?[-−.\d\s,–]+[\])]?\s*\)?/gi, " ")
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
  }
  const nums = findNumbers(s).filter((n) => !mentions.some((m) => n.start >= m.start && n.start < m.end));

  const sentenceThreshold = THRESHOLD_CUE.test(s);
  const sentenceReported = REPORTED_CUE.test(s);
  const levelWords = new Set([...s.matchAll(LEVEL_WORDS)].map((m) => m[1].toLowerCase()));
  const contextual = CONTEXT_CUE.test(s) || levelWords.size >= 2;
  const hasCitation = ctx.hasCitation ?? /\((?:[^()]*\d{4}[^()]*)\)|\[\d+/.test(sentence);
  const resultSig = isResultSignificance(s);

  type Cand = RawStatement & { at: number };
  const cands: Cand[] = [];
  const usedValues = new Map<string, number>();

  // sample-size ratios: "10 respondents per indicator", "ratio of 10:1"
  for (const m of s.matchAll(
    /(\d+(?:\.\d+)?)\s+(?:cases|respondents|participants|observations|subjects|people)\s+(?:per|for each)\s+(?:estimated\s+)?(?:item|indicator|variable|parameter|predictor)s?|ratio of (\d+)\s*:\s*1/gi,
  )) {
    const value = Number(m[1] ?? m[2]);
    const gap = s.slice(Math.max(0, m.index! - 40), m.index!);
    const thr = !/\b(?:was|were)\s*$/i.test(gap) && sentenceThreshold;
    cands.push({
      kind: thr ? "threshold" : "reported",
      statistic: "sample_size_ratio",
      comparator: comparatorBefore(gap) === "=" || !comparatorBefore(gap) ? (thr ? ">=" : "=") : comparatorBefore(gap),
      value,
      framing: thr ? (contextual ? "contextual" : "fixed") : null,
      procedure: null,
      at: m.index!,
    });
    usedValues.set(`sample_size_ratio:${value}`, 1);
  }

  // "80% power", "a power of .80": power written before its number is handled by the general rule;
  // "NN% power" has the number first.
  for (const m of s.matchAll(/(\d+(?:\.\d+)?)\s*%\s*(?:statistical\s+)?power/gi)) {
    const value = Number(m[1]) / 100;
    cands.push({
      kind: "threshold",
      statistic: "statistical_power",
      comparator: ">=",
      value,
      framing: contextual ? "contextual" : "fixed",
      procedure: null,
      at: m.index!,
    });
  }

  const pCut = /\bp\s*(<|≤|<=|=)\s*(0?\.\d+)/gi;
  const pThresholdSentence =
    /\b(?:consider|regard|deem|treat)\w*|\bas (?:marginally )?significant\b|\bset at\b|\bused as\b|\badopted\b/i.test(
      s,
    );
  for (const m of s.matchAll(pCut)) {
    if (!pThresholdSentence) continue;
    cands.push({
      kind: "threshold",
      statistic: "p_value",
      comparator: m[1] === "≤" || m[1] === "<=" ? "<=" : "<",
      value: Number(m[2]),
      framing: contextual ? "contextual" : "fixed",
      procedure: null,
      at: m.index!,
    });
  }
  // "at the .05 level", "at the 5% level"
  for (const m of s.matchAll(/\bat the (0?\.\d+|\d+\s*%)\s*(?:significance\s+)?level/gi)) {
    if (resultSig) continue;
    const v = m[1].includes("%") ? Number(m[1].replace("%", "")) / 100 : Number(m[1]);
    cands.push({
      kind: "threshold",
      statistic: "p_value",
      comparator: "<",
      value: v,
      framing: contextual ? "contextual" : "fixed",
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
    if (
      /^\s*(?:%\s*)?(?:power|cases|respondents|participants|observations|subjects|people)\b/i.test(
        s.slice(n.end, n.end + 20),
      )
    )
      continue;
    const before = s.slice(0, n.start);
    if (BLOCKER.test(before.slice(-24)) && !/1\s*[-−–]\s*β\s*=\s*$/.test(before)) continue;
    if (/\bp\s*[<=>≤≥]\s*$/i.test(before) || /\bat the\s*$/i.test(before)) continue;
    if (/^\s*[-–]?(?:point|item|year|day|week|month|hour|minute|factor|wave)s?\b/i.test(s.slice(n.end, n.end + 12)))
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

    for (const g of group) {
      let key = g.key;
      const value = n.percent ? n.value / 100 : n.value;
      const isSig =
        g.significance ||
        (key === "cronbach_alpha" && /α|alpha/i.test(s.slice(g.start, g.end)) && value > 0 && value <= 0.1);
      if (isSig) key = "p_value";
      if (n.percent && key !== "p_value" && key !== "statistical_power") continue;
      if (BOUNDED.has(key) && (value < 0 || value > 1)) continue;
      if (!BOUNDED.has(key) && (value < 0 || value > 1000)) continue;
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
          !CUT_NOUN.test(s.slice(g.end, n.start))) ||
        /\branged? (?:from|between)\b/i.test(s.slice(mention.end, n.start))
      )
        continue;
      if (continuesList && prevSame) {
        kind = prevSame.kind;
        if (kind === "reported" || !comparator || comparator === "=") comparator = prevSame.comparator;
      } else if (key === "p_value") {
        if (resultSig) continue;
        kind = "threshold";
      } else if (cutBefore) kind = "threshold";
      else if (relationToCut) kind = "reported";
      else if (comparator === "=" && /(?:=|\bwas|\bwere)\s*$/i.test(gap)) kind = "reported";
      else if (/\bwhich (?:was|were)\b/i.test(gap)) kind = "reported";
      else if (allValues && !(hasCitation && onlyOneNumber)) kind = "reported";
      else if (REPORTED_CUE.test(gap) || (sentenceReported && !sentenceThreshold)) kind = "reported";
      else if (sentenceThreshold || (hasCitation && comparator && comparator !== "=")) kind = "threshold";
      else kind = "reported";

      if (kind === "threshold") {
        if (!comparator || comparator === "=")
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
      const rangeAfter = /^\s*(?:and|to|[-–])\s*(0?\.\d+|\d+(?:\.\d+)?)/i.exec(after);
      const prevGap = prevNum ? s.slice(prevNum.end, n.start) : "";
      const isRangeEnd =
        (prevNum &&
          /^\s*(?:and|to|[-–])\s*$/i.test(prevGap) &&
          /\b(?:between|from)\s*$/i.test(s.slice(Math.max(0, prevNum.start - 12), prevNum.start))) ||
        (prevNum && /^\s*to\s*$/i.test(prevGap));
      if (
        kind === "reported" &&
        ((rangeBefore && rangeAfter) || isRangeEnd || /\branged?\b/i.test(s.slice(g.end, n.start)))
      )
        continue;
      if (kind === "threshold" && rangeBefore && rangeAfter) {
        if (HIGHER_IS_WORSE.has(key)) continue; // lower bound of a "lower is better" band says little
        comparator = ">=";
      } else if (kind === "threshold" && isRangeEnd) {
        if (!/\bbetween\s*$/i.test(s.slice(Math.max(0, prevNum!.start - 12), prevNum!.start))) continue; // "X to Y": lower bound only
        const repeated = nums.some((x) => x !== n && x !== prevNum && Math.abs(x.value - n.value) < 1e-9);
        if (!HIGHER_IS_WORSE.has(key) && repeated) continue;
        comparator = "<=";
      }
      if (comparator === ">" && /\b(?:no|none of the|not one)\s*$/i.test(s.slice(0, g.start))) comparator = "<=";
      lastByMention.set(mention, { kind, comparator, end: n.end });
      const dedupeKey = `${kind}:${key}:${comparator}:${value}`;
      if (kind === "threshold" && usedValues.has(dedupeKey)) continue;
      usedValues.set(dedupeKey, 1);
      cands.push({
        kind,
        statistic: key,
        comparator,
        value,
        framing: kind === "threshold" ? (contextual ? "contextual" : "fixed") : null,
        procedure: null,
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
