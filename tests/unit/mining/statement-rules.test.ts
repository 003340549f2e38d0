// Focused checks of the statement layer (lib/mining/statements.ts) on invented sentences. The expected
// statements follow the trade's reading of each sentence (common practice, no source): a negated rule
// asserts the opposite bound, a cut-off named to be argued against is disputed, an obtained value is
// reported however it is described, and a worked example asserts nothing.
import { describe, expect, it } from "vitest";
import { extractStatements, type RawStatement } from "@/lib/mining/statements";

const noProcedure = () => null;
const mine = (s: string) => extractStatements(s, noProcedure).filter((x) => x.kind !== "procedure");
const brief = (x: RawStatement) =>
  [x.kind, x.statistic, x.comparator, x.value, x.framing ?? "-"].join(" ") +
  (x.statistic_label ? ` [${x.statistic_label}]` : "");
const briefs = (s: string) => mine(s).map(brief);

describe("comparators with negation", () => {
  const cases: [string, string][] = [
    [
      "Reliability coefficients should never drop below .7 for group comparisons.",
      "threshold cronbach_alpha >= 0.7 fixed",
    ],
    ["The VIF of any predictor must not exceed 5.", "threshold vif <= 5 fixed"],
    ["Composite reliability was required to be not lower than 0.70.", "threshold composite_reliability >= 0.7 fixed"],
    ["The SRMR should not be greater than .08.", "threshold srmr <= 0.08 fixed"],
    ["AVE values ought not to fall below 0.50.", "threshold ave >= 0.5 fixed"],
    ["The KMO statistic should be no less than 0.5.", "threshold kmo >= 0.5 fixed"],
    [
      "Items whose corrected item-total correlations fail to reach .30 were removed.",
      "threshold item_total_correlation >= 0.3 fixed",
    ],
  ];
  for (const [sentence, want] of cases) it(sentence, () => expect(briefs(sentence)).toEqual([want]));

  it("a negated result reverses the bound it reports (none exceeded 2.1: <= 2.1; no loading lower than .55: >= .55)", () => {
    expect(briefs("None of the VIFs exceeded 2.1.")).toEqual(["reported vif <= 2.1 -"]);
    expect(briefs("No loading was lower than .55.")).toEqual(["reported factor_loading >= 0.55 -"]);
  });
});

describe("disputed framing", () => {
  const cases: [string, string][] = [
    [
      "The common VIF limit of 10 let through collinearity that doubled the standard errors.",
      "threshold vif <= 10 disputed",
    ],
    [
      "The arbitrary .70 rule for Cronbach's alpha has been criticised as a ritual.",
      "threshold cronbach_alpha >= 0.7 disputed",
    ],
    ["There is no basis for the .05 convention in significance testing.", "threshold p_value < 0.05 disputed"],
    ["The CFI cut-off of .95 should not be applied mechanically to every model.", "threshold cfi >= 0.95 disputed"],
    ["Contrary to popular belief, a VIF of 10 is not a safe upper bound.", "threshold vif <= 10 disputed"],
  ];
  for (const [sentence, want] of cases) it(sentence, () => expect(briefs(sentence)).toEqual([want]));

  it("a plain rule stays fixed and a rule made to depend on purpose stays contextual", () => {
    expect(briefs("An HTMT below .85 indicates discriminant validity.")).toEqual(["threshold htmt < 0.85 fixed"]);
    expect(briefs("Depending on model complexity, RMSEA values up to .10 can be tolerated.")).toEqual([
      "threshold rmsea <= 0.1 contextual",
    ]);
  });
});

describe("named statistics outside the closed list become 'other' with their label", () => {
  it("expected cell count, Mardia's coefficient, Gini coefficient", () => {
    expect(briefs("For the chi-square tests, the expected cell count should be at least 5 in every cell.")).toEqual([
      "threshold other >= 5 fixed [expected cell count]",
    ]);
    expect(briefs("Mardia's coefficient should not exceed 5.00 for multivariate normality to be assumed.")).toEqual([
      "threshold other <= 5 fixed [Mardia's coefficient]",
    ]);
    expect(briefs("The Gini coefficient should not exceed 0.4 for a balanced allocation.")).toEqual([
      "threshold other <= 0.4 fixed [Gini coefficient]",
    ]);
  });
  it("the new keys are their own statistics, not 'other'", () => {
    expect(briefs("A first-stage F above 10 was required.")).toEqual(["threshold first_stage_f > 10 fixed"]);
    expect(briefs("Tolerance values below 0.10 indicate collinearity.")).toEqual(["threshold tolerance >= 0.1 fixed"]);
    expect(briefs("A Q² above zero indicates predictive relevance.")).toEqual(["threshold q_squared > 0 fixed"]);
    expect(briefs("The difference amounted to d = 0.41.")).toEqual(["reported cohen_d = 0.41 -"]);
    expect(briefs("A minimum sample size of 200 is often recommended for such models.")).toEqual([
      "threshold minimum_sample_size >= 200 fixed",
    ]);
  });
  it("statements of a tracked statistic carry no label", () => {
    expect(mine("Cronbach's alpha should exceed .70.")[0].statistic_label ?? null).toBeNull();
  });
});

describe("significance alpha versus a scale's alpha, and kappa written K", () => {
  it("an alpha level in a testing context is a significance level, a design value with = (label rule 10)", () => {
    expect(briefs("All tests were two-tailed with an alpha level of .01.")).toEqual(["threshold p_value = 0.01 fixed"]);
  });
  it("an alpha level in a reliability context is Cronbach's alpha", () => {
    expect(
      briefs(
        "Reliability was evaluated with an alpha level of 0.70 or higher as the criterion of internal consistency.",
      ),
    ).toEqual(["threshold cronbach_alpha >= 0.7 fixed"]);
  });
  it("a p-value named in words is a cut-off only as a rule", () => {
    expect(briefs("A p-value of less than 0.05 was considered to show a statistically significant result.")).toEqual([
      "threshold p_value < 0.05 fixed",
    ]);
    expect(briefs("The difference between wards was not significant (p-value of 0.41).")).toEqual([]);
  });
  it("Cohen's K is kappa", () => {
    expect(briefs("Agreement was summarised with Cohen's K, and a K of at least 0.60 was required.")).toEqual([
      "threshold cohen_kappa >= 0.6 fixed",
    ]);
  });
  it("two statistics given one value are two statements", () => {
    expect(briefs("McDonald's omega and Cronbach's alpha were both .94 for the distress scale.")).toEqual([
      "reported mcdonald_omega = 0.94 -",
      "reported cronbach_alpha = 0.94 -",
    ]);
  });
});

describe("kind: what the number does decides", () => {
  it("an obtained value interpreted as good is reported", () => {
    expect(briefs("Cronbach's alpha for engagement was .86, which was interpreted as good.")).toEqual([
      "reported cronbach_alpha = 0.86 -",
    ]);
    expect(briefs("The obtained KMO of .92 is excellent.")).toEqual(["reported kmo = 0.92 -"]);
  });
  it("an obtained value above a required level is a reported value and a cut-off, whose comparator the comparing word does not change (label rule 9)", () => {
    expect(briefs("The alpha of the crafting scale was .78, exceeding the required level of .70.")).toEqual([
      "reported cronbach_alpha = 0.78 -",
      "threshold cronbach_alpha >= 0.7 fixed",
    ]);
  });
  it("a value within a recommended range is reported, and the range is a cut-off band", () => {
    expect(briefs("The RMSEA of 0.06 falls within the recommended range of 0.05 and 0.08.")).toEqual([
      "reported rmsea = 0.06 -",
      "threshold rmsea >= 0.05 fixed",
      "threshold rmsea <= 0.08 fixed",
    ]);
  });
  it("a power used to plan is a design cut-off; a percentage of power is a proportion", () => {
    expect(briefs("A power of .80 was used to plan the sample size.")).toEqual([
      "threshold statistical_power = 0.8 fixed",
    ]);
    expect(briefs("The sample size was planned for a power of 80% to detect small effects.")).toEqual([
      "threshold statistical_power = 0.8 fixed",
    ]);
  });
  it("a share of variance explained is a reported R² (27% = .27), and a factor's share is an 'other' statistic (label rule 17)", () => {
    expect(briefs("The twelve predictors accounted for 27% of the variance in strain.")).toEqual([
      "reported r_squared = 0.27 -",
    ]);
    expect(briefs("The first factor accounted for 27% of the variance.")).toEqual([
      "reported other = 0.27 - [variance explained]",
    ]);
  });
  it("number words and ratio forms are values", () => {
    expect(briefs("At least ten cases per indicator were required for the factor analysis.")).toEqual([
      "threshold sample_size_ratio >= 10 fixed",
    ]);
    expect(briefs("A ratio of five to one between cases and parameters was regarded as the minimum.")).toEqual([
      "threshold sample_size_ratio >= 5 fixed",
    ]);
  });
  it("worked examples, definitions and conditionals about a scale's bounds are not statements", () => {
    for (const s of [
      "For example, a VIF of 8 implies that the variance of a coefficient is eight times larger.",
      "If kappa is below 0, agreement is worse than chance.",
      "Kappa equals 1 for perfect agreement.",
      "An alpha of .90 would mean that 90% of the variance is true-score variance.",
    ])
      expect(briefs(s), s).toEqual([]);
  });
  it("p-values reported as results, section numbers and reference numbers are not statements", () => {
    expect(briefs("Nurses with more experience gave lower ratings (p = 0.03).")).toEqual([]);
    expect(briefs("Loadings are described in section 4.2 and listed in Table 3 (see reference (12)).")).toEqual([]);
  });
  it("number forms reach the statement: middle dot, broken decimal, glued citation numbers", () => {
    expect(briefs("In our sample Cronbach's alpha was 0·83.")).toEqual(["reported cronbach_alpha = 0.83 -"]);
    expect(briefs("The KMO was 0. 88 for the tolerance items.")).toEqual(["reported kmo = 0.88 -"]);
    expect(briefs("Loadings should exceed 0.5.21–23.")).toEqual(["threshold factor_loading > 0.5 fixed"]);
    expect(briefs("A minimum omega of 0.80 [24–26] was adopted.")).toEqual(["threshold mcdonald_omega >= 0.8 fixed"]);
  });
});

// The annotation manual's rule 18 (label-rules.md of the held-out set's manual): every line of pasted
// software output, formula or table row gives nothing, even with a statistic name and a value.
describe("pasted output, formulas and table rows give no statement", () => {
  it.each([
    "CFI = 0.948, TLI = 0.937, RMSEA = 0.058 [0.049, 0.067], SRMR = 0.044",
    "Comparative Fit Index (CFI)                    0.948",
    "omega = (sum(lambda))^2 / ((sum(lambda))^2 + sum(theta))",
    "Cronbach's Alpha    N of Items    .874    12",
  ])("%s", (line) => expect(briefs(line)).toEqual([]));
  it("a prose sentence with the same values still reports them, without its interval's bounds", () => {
    expect(briefs("The comfort model fitted well, with RMSEA = .052 [.041, .063] and CFI = .957.")).toEqual([
      "reported rmsea = 0.052 -",
      "reported cfi = 0.957 -",
    ]);
  });
});
