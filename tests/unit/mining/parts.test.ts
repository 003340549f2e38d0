// Unit checks of the miner's parts. Expected values are worked out by hand from the APA 7 manual's
// citation and reference conventions (from memory: narrative vs parenthetical, "et al.", "as cited in",
// locators "p."/"pp."/"para.") and the DOI Handbook's rule that DOIs are case-insensitive (from memory).
import { describe, expect, it } from "vitest";
import { findCitations, stripCitations } from "@/lib/mining/citations";
import { mineText } from "@/lib/mining/index";
import { compileProcedures, defaultProcedures } from "@/lib/mining/procedures";
import { normaliseDoi, parseReference, parseReferenceList } from "@/lib/mining/references";
import { parseHeading } from "@/lib/mining/sections";
import { splitSentences } from "@/lib/mining/sentences";
import { extractStatements } from "@/lib/mining/statements";
import { fixLigatures, joinHyphenated, removeRunningLines } from "@/lib/mining/text-repair";

const match = compileProcedures(defaultProcedures);
const stmts = (s: string) =>
  extractStatements(stripCitations(s), match, { hasCitation: findCitations(s, new Map()).length > 0 });

describe("sentences", () => {
  it("survives abbreviations, decimals and initials", () => {
    const text =
      "Reliability was checked (e.g., α = .85; see Fig. 2 and Table 3, p. 14). Values of 0.70, i.e. the usual cut-off, were used vs. .60 in ca. 12 studies. K. A. Okafor et al. reported No. 4 of pp. 3–5. The end.";
    expect(splitSentences(text)).toEqual([
      "Reliability was checked (e.g., α = .85; see Fig. 2 and Table 3, p. 14).",
      "Values of 0.70, i.e. the usual cut-off, were used vs. .60 in ca. 12 studies.",
      "K. A. Okafor et al. reported No. 4 of pp. 3–5.",
      "The end.",
    ]);
  });
  it("splits at question marks and keeps cf. inside", () => {
    expect(splitSentences("Is .70 enough? Most say so, cf. Moreau (2011). Fine.")).toEqual([
      "Is .70 enough?",
      "Most say so, cf. Moreau (2011).",
      "Fine.",
    ]);
  });
});

describe("citations", () => {
  const none = new Map();
  it("parenthetical with locator, several in one parenthesis, letter years", () => {
    expect(findCitations("as required (Okafor & Lindqvist, 1994, p. 112).", none)).toEqual([
      { authors: "Okafor & Lindqvist", year: "1994", locator: "p. 112", secondary: false },
    ]);
    expect(findCitations("(Brandt et al., 2003; Moreau, 2011a)", none).map((c) => `${c.authors} ${c.year}`)).toEqual([
      "Brandt et al. 2003",
      "Moreau 2011a",
    ]);
  });
  it("narrative citations, with and without locators", () => {
    expect(findCitations("Okafor and Lindqvist (1994) argued", none)[0]).toMatchObject({
      authors: "Okafor & Lindqvist",
      year: "1994",
      locator: null,
    });
    expect(findCitations("Brandt et al. (2003, pp. 45–47) argued", none)[0]).toMatchObject({
      authors: "Brandt et al.",
      locator: "pp. 45–47",
    });
    expect(
      findCitations("as Moreau (2011, chap. 3) and Ekwueme (2010, para. 4) said", none).map((c) => c.locator),
    ).toEqual(["chap. 3", "para. 4"]);
    expect(findCitations("(Obuya, 2001, sec. 4.2)", none)[0].locator).toBe("sec. 4.2");
  });
  it('"as cited in": the original is secondary and the citing source is listed too', () => {
    const c = findCitations("(Whitcombe, 2000, as cited in Marangoni & Yilmaz, 2014)", none);
    expect(c).toEqual([
      {
        authors: "Whitcombe",
        year: "2000",
        locator: null,
        secondary: true,
        citedIn: { authors: "Marangoni & Yilmaz", year: "2014" },
      },
      { authors: "Marangoni & Yilmaz", year: "2014", locator: null, secondary: false },
    ]);
  });
  it("numbered citations resolve through the reference list, ranges and lists included", () => {
    const refs = parseReferenceList(
      [
        '[3] S. Pires, R. Kwan, and L. Odu, "Older adults and wearable monitors," in Proc. Symp. Assistive Computing, 2017, pp. 12–19.',
        "[4] M. Ekwueme, Survey Data Analysis for Engineers, 3rd ed. Carrow Press, 2010.",
        '[5] J. Salo, "Usefulness beliefs among retirees," Gerontechnics Journal, vol. 4, pp. 101–115, 2016.',
        '[6] B. Ferraro and D. Lusk, "Convergence checks," Measurement Methods Quarterly, vol. 18, no. 1, pp. 39–50, 2008.',
      ].join("\n"),
    );
    const byNum = new Map(refs.map((r) => [r.number!, r]));
    expect(findCitations("as shown [4]–[6].", byNum).map((c) => c.number)).toEqual([4, 5, 6]);
    expect(findCitations("as shown [3, 5].", byNum).map((c) => `${c.authors} ${c.year}`)).toEqual([
      "Pires et al. 2017",
      "Salo 2016",
    ]);
    expect(findCitations("as shown [4-6].", byNum)).toHaveLength(3);
    expect(findCitations("Following [6, p. 144], we", byNum)[0]).toMatchObject({
      authors: "Ferraro & Lusk",
      year: "2008",
      locator: "p. 144",
    });
  });
  it("does not take statistics, tables or bare years for citations", () => {
    expect(
      findCitations("Participants (N = 200) rated items (M = 3.2, SD = 0.8; see Table 2) in Wave 3 (2019).", none),
    ).toEqual([]);
  });
});

describe("references", () => {
  it("journal article with DOI URL, normalised to lower case", () => {
    const r = parseReference(
      "Brandt, K., Oyelaran, S., & Veit, P. (2003). Sleep debt in rotating shift teams. Occupational Rhythm Review, 12(3), 201–219. https://doi.org/10.5555/ORR.2003.0123",
    );
    expect(r).toMatchObject({
      authors: ["Brandt, K.", "Oyelaran, S.", "Veit, P."],
      year: "2003",
      title: "Sleep debt in rotating shift teams",
      container: "Occupational Rhythm Review",
      doi: "10.5555/orr.2003.0123",
      kind: "article",
    });
  });
  it("book, chapter, and doi: prefix", () => {
    expect(
      parseReference("Halvorsen, J. (2008). Measuring fatigue: A practical guide (2nd ed.). Northfield Academic."),
    ).toMatchObject({ kind: "book", title: "Measuring fatigue: A practical guide", container: null });
    expect(
      parseReference(
        "Quenneville, P., & Tarrant, G. (2009). Brands as attachment figures. In H. Solberg (Ed.), Handbook of consumer relationships (pp. 61–90). Meridian Books.",
      ),
    ).toMatchObject({ kind: "chapter", container: "Handbook of consumer relationships" });
    expect(normaliseDoi("Journal, 7(2), 88–104. doi:10.5555/JSS.2011.07.088.")).toBe("10.5555/jss.2011.07.088");
  });
  it("splits an author–year list whose entries run over several lines", () => {
    const list = parseReferenceList(
      "Ambrose, J., & Overby, T. (1977). Late answers and early answers in\npostal surveys. Journal of Survey Marketing, 14(3), 396–402.\nKowalczyk, R. B. (2005). Latent variable models for survey data. Orchard Press.",
    );
    expect(list).toHaveLength(2);
    expect(list[0].title).toBe("Late answers and early answers in postal surveys");
  });
});

describe("sections", () => {
  it("recognises headings, numbered or not", () => {
    expect(parseHeading("2. Method")?.section).toBe("methods");
    expect(parseHeading("2.1 Measures")).toMatchObject({ section: "methods", level: 2 });
    expect(parseHeading("Findings")?.section).toBe("results");
    expect(parseHeading("General discussion")?.section).toBe("discussion");
    expect(parseHeading("Theoretical background")?.section).toBe("introduction");
    expect(parseHeading("This is a sentence of prose that ends.")).toBeNull();
  });
  it("keeps each statement's section, cuts the reference list and says unknown without headings", () => {
    const doc = mineText(
      "1. Introduction\nAlpha above .70 is fine (Okafor, 1994).\n\n2. Method\n2.1 Measures\nCronbach's alpha was .84.\n\n3. Results\nThe CFI was .96.\n\n4. Discussion\nAn alpha of .60 may be acceptable for exploratory research.\n\nReferences\nOkafor, E. (1994). Psychometric foundations. Kestrel House.",
    );
    expect(doc.statements.map((s) => s.section)).toEqual(["introduction", "methods", "results", "discussion"]);
    expect(doc.references).toHaveLength(1);
    expect(mineText("Cronbach's alpha was .84 in this sample of nurses.").statements[0].section).toBe("unknown");
  });
});

describe("text repair", () => {
  it("joins line-end hyphenation but keeps real hyphens", () => {
    expect(joinHyphenated("the relia-\nbility of the item-\ntotal correlation and Kaiser-\nMeyer")).toBe(
      "the reliability of the item-total correlation and Kaiser-Meyer",
    );
  });
  it("replaces ligatures", () =>
    expect(fixLigatures("ﬁt, ﬂow, eﬀect, eﬃcient, baﬄe")).toBe("fit, flow, effect, efficient, baffle"));
  it("removes running heads, footers and page numbers repeated across pages", () => {
    const bodies = [
      [
        "Night work slows recovery.",
        "Nurses were surveyed twice.",
        "Sleep was logged for a week.",
        "Most wards took part.",
      ],
      [
        "Alpha was computed per scale.",
        "Omega was reported as well.",
        "Two items were dropped.",
        "Fit was acceptable.",
      ],
      ["Recovery differed by ward.", "Effects were small.", "Older nurses slept longer.", "The pattern held in 2019."],
    ];
    const pages = bodies.map((b, i) =>
      ["Journal of Shift Studies 7 (2011)", ...b, `Page ${i + 1} of 3`, String(i + 41)].join("\n"),
    );
    expect(removeRunningLines(pages).map((p) => p.trim())).toEqual(bodies.map((b) => b.join("\n")));
  });
});

describe("statements: hard cases", () => {
  it("significance alpha is a p_value level (a setting, so =, label rule 10), coefficient alpha is cronbach_alpha", () => {
    expect(stmts("The alpha level was set at .05.")).toMatchObject([
      { kind: "threshold", statistic: "p_value", comparator: "=", value: 0.05 },
    ]);
    expect(stmts("Tests used α = .05.")[0]).toMatchObject({ statistic: "p_value", value: 0.05 });
    expect(stmts("Coefficients were tested at the .01 level.")[0]).toMatchObject({ statistic: "p_value", value: 0.01 });
    expect(stmts("The scale was reliable (α = .91).")[0]).toMatchObject({
      kind: "reported",
      statistic: "cronbach_alpha",
      value: 0.91,
    });
  });
  it("p < .05 considered significant is a threshold; reported p-values are not statements", () => {
    expect(stmts("A p < .05 was considered significant.")).toMatchObject([
      { kind: "threshold", statistic: "p_value", comparator: "<", value: 0.05 },
    ]);
    expect(stmts("The effect was significant, t(120) = 2.9, p = .004.")).toEqual([]);
    expect(stmts("Both paths were significant (p < .001).")).toEqual([]);
    expect(stmts("All coefficients were significant at the .05 level.")).toEqual([]);
  });
  it("numbers that are not statistics give nothing", () => {
    for (const s of [
      "The sample comprised 312 employees (N = 312), aged 19 to 64 years.",
      "Items were rated on a 5-point Likert scale.",
      "Participants received $10, and 54% were women.",
      "Table 3 shows the correlations for the 2019 wave.",
    ])
      expect(stmts(s)).toEqual([]);
  });
  it("comparators as worded, one statement per statistic in compound rules", () => {
    expect(
      stmts("RMSEA below .06 and SRMR below .08 indicate good fit.").map((s) => [s.statistic, s.comparator, s.value]),
    ).toEqual([
      ["rmsea", "<", 0.06],
      ["srmr", "<", 0.08],
    ]);
    expect(stmts("CFI and TLI of .95 or higher were required.").map((s) => [s.statistic, s.comparator])).toEqual([
      ["cfi", ">="],
      ["tli", ">="],
    ]);
    expect(stmts("VIF values should not exceed 5.")[0]).toMatchObject({ statistic: "vif", comparator: "<=", value: 5 });
    expect(stmts("Loadings of at least .50 were retained.")[0]).toMatchObject({ comparator: ">=", framing: "fixed" });
    expect(stmts("Values above .70 are considered acceptable for Cronbach's alpha.")[0]).toMatchObject({
      statistic: "cronbach_alpha",
      comparator: ">",
      value: 0.7,
    });
  });
  it("contextual framing when the value depends on purpose or stage", () => {
    expect(stmts("In early stages of research, an alpha of .60 may be acceptable.")[0]).toMatchObject({
      framing: "contextual",
    });
    expect(
      stmts(
        "Reliability of .70 is sufficient for group comparisons, whereas .90 is needed for individual decisions.",
      ).map((s) => s.framing),
    ).toEqual(["contextual", "contextual"]);
  });
  it("reported values, several in one sentence", () => {
    expect(stmts("CFI = .96, RMSEA = .045.").map((s) => [s.kind, s.statistic, s.comparator, s.value])).toEqual([
      ["reported", "cfi", "=", 0.96],
      ["reported", "rmsea", "=", 0.045],
    ]);
    expect(stmts("The model fitted well, RMSEA < .05.")[0]).toMatchObject({ kind: "reported", comparator: "<" });
  });
  it("procedures from the curated list", () => {
    expect(
      stmts(
        "In the second stage, the first-stage residuals were used instead of the endogenous variable in the two-stage least squares model.",
      )[0],
    ).toMatchObject({ kind: "procedure", procedure: "two_stage_residual_substitution", statistic: null, value: null });
    expect(stmts("In the second stage of 2SLS we entered the predicted values from the first stage.")).toEqual([]);
    expect(stmts("A single-factor test showed that common method bias was not a concern.")[0]).toMatchObject({
      procedure: "single_factor_cmv_proof",
    });
    expect(stmts("We note that a single-factor test cannot rule out common method bias.")).toEqual([]);
    const custom = compileProcedures([
      { key: "median_split", label: "Median split", description: "d", allOf: ["median split"] },
    ]);
    expect(extractStatements("Scores were dichotomised by a median split.", custom)[0]).toMatchObject({
      procedure: "median_split",
    });
  });
});
