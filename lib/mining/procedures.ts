// Curated list of analysis steps that are commonly misdescribed. Curators edit this list in the web
// app; the miner only receives it. Patterns are regex sources, matched case-insensitively against one
// sentence: every `allOf` must match, at least one `anyOf` (when given), no `noneOf`.
export type ProcedurePattern = {
  key: string;
  label: string;
  description: string;
  allOf: string[];
  anyOf?: string[];
  noneOf?: string[];
};

export const defaultProcedures: ProcedurePattern[] = [
  {
    key: "two_stage_residual_substitution",
    label: "2SLS with residuals substituted for the regressor",
    description:
      "A two-stage least squares description in which the first-stage residuals, not the fitted (predicted) values, replace the endogenous regressor in the second stage.",
    allOf: [
      "(two[- ]stage least squares|2sls|two[- ]stage (procedure|approach|model|estimation)|first[- ]stage)",
      "residuals?",
    ],
    anyOf: ["(in place of|instead of|replac\\w*|substitut\\w*|entered|used as (the )?(regressor|predictor))"],
    // A control-function description (residuals added next to the regressor) is a different, valid method.
    noneOf: ["control function", "(alongside|in addition to|as well as) (the )?(original|endogenous)"],
  },
  {
    key: "single_factor_cmv_proof",
    label: "Single-factor test as proof of no common method bias",
    description:
      "A single-factor (one-factor) test presented as evidence that common method variance or bias is absent or not a concern.",
    allOf: [
      "(single[- ]factor|one[- ]factor|single (general )?factor|first factor|harman)",
      "(common[- ]method|method (variance|bias)|\\bcmv\\b|\\bcmb\\b)",
    ],
    // The sentence must present the test as settling the question.
    anyOf: [
      "not (a |an )?(serious )?(concern|problem|issue|threat)",
      "\\b(absent|ruled out|no evidence|unlikely|not present|not a pervasive|was not found|did not (pose|affect|exist|bias))",
      "(demonstrat|prov|confirm|establish|show)\\w* that (common[- ]method|method|cmv|cmb|there)",
      "(is|was) not (an? )?(significant|substantial|major)",
    ],
    noneOf: [
      "(cannot|does not|do not|is not able to|unable to) (rule out|prove|demonstrate|show)",
      "insensitive",
      "limitation",
    ],
  },
];

export function compileProcedures(list: ProcedurePattern[]): (sentence: string) => ProcedurePattern | null {
  const compiled = list.map((p) => ({
    p,
    all: p.allOf.map((s) => new RegExp(s, "i")),
    any: (p.anyOf ?? []).map((s) => new RegExp(s, "i")),
    none: (p.noneOf ?? []).map((s) => new RegExp(s, "i")),
  }));
  return (sentence) => {
    for (const c of compiled) {
      if (!c.all.every((r) => r.test(sentence))) continue;
      if (c.any.length && !c.any.some((r) => r.test(sentence))) continue;
      if (c.none.some((r) => r.test(sentence))) continue;
      return c.p;
    }
    return null;
  };
}
