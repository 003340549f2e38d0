// The document layer of the miner, piece by piece: citation forms, run-in reference lists, sentence
// and paragraph splitting, decimal repair and non-prose detection. All text is invented; the source of
// each expected value is named beside it.
import { describe, expect, it } from "vitest";
import { findCitations } from "@/lib/mining/citations";
import { mineText } from "@/lib/mining/index";
import { type PositionedItem, pageLinesInReadingOrder } from "@/lib/mining/layout";
import { nonProseLine, nonProseSentence } from "@/lib/mining/nonprose";
import { splitReferences, splitRunIn } from "@/lib/mining/references";
import { repairDecimals } from "@/lib/mining/text-repair";

const cite = (s: string) => findCitations(s, new Map());

describe("citation forms", () => {
  it("Harvard colon locators: (1978: 245) and (2013:238)", () => {
    // Harvard (author–date) style guides put the page after a colon (from memory).
    expect(cite("It is adequate (Okafor, 1978: 245).")).toEqual([
      { authors: "Okafor", year: "1978", locator: "245", secondary: false },
    ]);
    expect(cite("As argued (Lindqvist 2013:238), it holds.")[0]).toMatchObject({ year: "2013", locator: "238" });
    expect(cite("Okafor (1978: 245–247) agrees.")[0]).toMatchObject({ authors: "Okafor", locator: "245–247" });
  });

  it("'cited in' with or without 'as' makes the original secondary, with the work it was read in", () => {
    // APA 7th ed. §8.6 secondary sources, "(Original, year, as cited in Citing, year)" (from memory).
    for (const s of [
      "The rule is old (Okafor, 2001, as cited in Brandt, 2015).",
      "The rule is old (Okafor, 2001, cited in Brandt, 2015).",
    ]) {
      expect(cite(s)).toEqual([
        {
          authors: "Okafor",
          year: "2001",
          locator: null,
          secondary: true,
          citedIn: { authors: "Brandt", year: "2015" },
        },
        { authors: "Brandt", year: "2015", locator: null, secondary: false },
      ]);
    }
    expect(cite("Okafor (1994, cited in Lind, 2000) says so.")[0]).toMatchObject({
      authors: "Okafor",
      secondary: true,
      citedIn: { authors: "Lind", year: "2000" },
    });
  });

  it("a name touching its parenthesis, name suffixes and possessives keep the first author right", () => {
    // Invented sentences; the expected first author is the surname as written.
    expect(cite("As Okafor(1978) showed, it holds.")[0]).toMatchObject({ authors: "Okafor", year: "1978" });
    expect(cite("Ideas of Cureton (1966) and Bashaw and Anderson Jr (1967) apply.")[1]).toMatchObject({
      authors: "Bashaw & Anderson Jr",
      year: "1967",
    });
    expect(cite("The Okafor's (1994) rule is used.")[0]).toMatchObject({ authors: "Okafor" });
    // Capitalised surname particles belong to the surname (APA 7th ed. on "Van", "De", from memory).
    expect(cite("Abara, Van Reenen, and Zingaro (2013) study it.")[0].authors).toBe("Abara, Van Reenen & Zingaro");
    expect(cite("In De Vries (1999) it is shown.")[0].authors).toBe("De Vries");
    // Seen on a real PDF (pdftotext of a Debian r-cran vignette): an opening adverb or the tail of
    // "model" must not become part of the author list.
    expect(cite("Originally, Bell and Okafor (2002) proposed it.")[0].authors).toBe("Bell & Okafor");
    expect(cite("the panel model Newey and Lind (1987) use")[0].authors).toBe("Newey & Lind");
  });

  it("prefixes e.g., see also, and CSL locator terms with ff.", () => {
    // Locator terms after the Citation Style Language 1.0 locator list (page, chapter, section).
    const found = cite("This is common (e.g., Okafor, 1994; see also Lindqvist, 2000, pp. 12–14).");
    expect(found.map((c) => [c.authors, c.locator])).toEqual([
      ["Okafor", null],
      ["Lindqvist", "pp. 12–14"],
    ]);
    expect(cite("Okafor (1974, p. 361ff.) disagrees.")[0].locator).toBe("p. 361ff.");
    expect(cite("See Okafor (1974, chap. 3) and Lind (2001, sec. 2.1).").map((c) => c.locator)).toEqual([
      "chap. 3",
      "sec. 2.1",
    ]);
  });

  it("capitalised CSL terms, several locators, detached locators, brackets and comma-separated works", () => {
    // Shapes listed in tests/fixtures/real-pdfs/manifest.json (read there from the real PDFs); names invented.
    expect(cite("This is shown (Okafor, 2011, Section 1.11.5).")[0].locator).toBe("Section 1.11.5");
    expect(cite("See the table (Lindqvist, 2011, p. 466, Table 22).")[0].locator).toBe("p. 466, Table 22");
    expect(cite("Okafor (1999) wrote that “scales drift” (p. 140).")[0].locator).toBe("p. 140");
    expect(cite("See Theorem 6.10 in Okafor (1994).")[0].locator).toBe("Theorem 6.10");
    expect(cite("The details (Okafor et al., 2022a) in sections 2.10 and 2.16 apply.")[0].locator).toBe(
      "sections 2.10 and 2.16",
    );
    expect(cite("Effect sizes [Okafor, 2002; Lind, 2008] differ.").map((c) => c.year)).toEqual(["2002", "2008"]);
    expect(cite("As Okafor [1992] noted.")).toEqual([
      { authors: "Okafor", year: "1992", locator: null, secondary: false },
    ]);
    expect(cite("Models (Okafor, 2002, Lind, 2014) agree.").map((c) => c.authors)).toEqual(["Okafor", "Lind"]);
  });

  it("numbered citations without a reference list keep their number and stay valid", () => {
    // Contract (lib/mining/contract.ts): authors and year are strings, number a positive integer.
    expect(cite("The cut-off is .70 [3, p. 12].")).toEqual([
      { authors: "[3]", year: "n.d.", locator: "p. 12", secondary: false, number: 3 },
    ]);
    expect(cite("Vector index [0] is not a citation.")).toEqual([]);
  });
});

describe("run-in reference lists", () => {
  const runIn =
    "Abiodun F, Kessler-Voss M (2011). Measuring loneliness in large surveys. Research on Ageing Methods, 33(2), 210–228. " +
    "Lemberg T (1999). Longitudinal measurement in ageing research. Westmoor Press. " +
    "Okafor, E. A., & Lindqvist, B. (1994). Psychometric foundations. Kestrel House. " +
    "R Core Team (2017). A language for statistical computing. Vienna.";

  it("splits author–year entries set one after another into works (4 works written above)", () => {
    const parts = splitReferences(runIn);
    expect(parts.map((p) => p.slice(0, 12))).toEqual(["Abiodun F, K", "Lemberg T (1", "Okafor, E. A", "R Core Team "]);
  });

  it("splits numbered run-in entries and year-last entries", () => {
    expect(
      splitRunIn(
        "[1] E. Okafor, Reliability of short scales, J. Invented Stat. 3 (1994) 1–9. [2] B. Lindqvist, Loadings in practice, Westmoor, 2000. [3] T. Lemberg, On omega, Kestrel, 2001.",
      ),
    ).toHaveLength(3);
    expect(
      splitRunIn(
        "Don Okafor and Jack Lindqvist. The efficiency of invented comparisons. Invented Biometry, 43:913–928, 1987. A. Lemberg and F. Brandt. Numerical notes on invented probabilities. Journal of Invented Computation, 63:361–378, 1999.",
      ),
    ).toHaveLength(2);
  });

  it("leaves a single long entry whole", () => {
    const one =
      "Okafor, E. A. (1994). A very long title about the reliability of short scales in invented surveys of invented wards, with an appendix. Kestrel House.";
    expect(splitRunIn(one)).toEqual([one]);
  });
});

describe("sentences and paragraphs", () => {
  it("a paragraph without a final full stop ends at the paragraph break", () => {
    const doc = mineText("Scale reliability in short forms\n\nCronbach's alpha should exceed .70 (Okafor, 1994).\n");
    expect(doc.statements[0].sentence).toBe("Cronbach's alpha should exceed .70 (Okafor, 1994).");
  });

  it("does not cut at '0.' in '0. 70' and repairs the decimal; middle-dot decimals become points", () => {
    // Broken decimals as pdftotext prints a point at a line end (observed); middle dot as some journals set decimals.
    expect(repairDecimals("alpha was 0. 70 here")).toBe("alpha was 0.70 here");
    expect(repairDecimals("alpha = . 70")).toBe("alpha = .70");
    expect(repairDecimals("in 2010. 70 people")).toBe("in 2010. 70 people");
    expect(repairDecimals("alpha was 0·84")).toBe("alpha was 0.84");
    const doc = mineText("In this sample Cronbach's alpha was 0.\n84 for the short form.\n");
    expect(doc.statements).toHaveLength(1);
    expect(doc.statements[0]).toMatchObject({
      value: 0.84,
      sentence: "In this sample Cronbach's alpha was 0.84 for the short form.",
    });
  });
});

describe("non-prose lines", () => {
  it("console prompts, R output and code syntax", () => {
    // R's console prompt "> " and continuation "+ ", knitr's "## " output prefix, R's "[1]" index (from memory).
    expect(nonProseLine("R> fit <- lm(y ~ x, data = d)")).toBe("code");
    expect(nonProseLine("> alpha(myData, check.keys = TRUE)")).toBe("code");
    expect(nonProseLine("## raw_alpha std.alpha G6(smc) average_r")).toBe("output");
    expect(nonProseLine("[1] 0.68 0.55 0.50")).toBe("output");
    expect(nonProseLine("my.keys <- list(EA = c(1, 2, 3))")).toBe("code");
  });

  it("number rows and formulas", () => {
    expect(nonProseLine("0.68 0.55 0.50")).toBe("table");
    expect(nonProseLine("EA 0.84 0.74 0.72 0.91")).toBe("table");
    expect(nonProseLine("−2L(θ) = log |Λ⊤Z⊤ZΛ + I| + n (1 + log 2πr²)   (12)")).toBe("formula");
    expect(nonProseSentence("6 0.88 0.79 0.71 0.88 0.61 0.77")).toBe("table");
    // Prose that carries inline mathematics throughout (shape seen in pdftotext output of a Debian
    // r-cran vignette; symbols invented here).
    expect(
      nonProseSentence("Intervals follow as bjβˆ ± zασˆ bjV b⊤, where zα is the 1 − α quantile of the law of T."),
    ).toBe("formula");
  });

  it("prose with reported statistics stays prose", () => {
    // Lines of the gold excerpts (tests/fixtures/gold), as wrapped there.
    for (const l of [
      "The three-factor model showed acceptable fit (CFI = .953, TLI = .946, RMSEA = .052, 90% CI",
      "examined standardized loadings, which were .58, .77 and .69, all above the .40 benchmark",
      "With only three items, a coefficient alpha of .60 to .70 may be regarded as sufficient, although",
      "Kessler-Voss, 2011, p. 220). The observed alpha was .72 in 2014. Split by interview mode,",
    ])
      expect(nonProseLine(l)).toBeNull();
    expect(nonProseSentence("The new scale reached α = .74, and work engagement reached α = .89.")).toBeNull();
  });

  it("a displayed equation's last line does not pass for the tail of the sentence before it", () => {
    const doc = mineText(
      ["which gives the final estimating equation,", "∑", "n−1/2 xi[Ni(exp(xβ(τ))) − αi(τ)] = 0.", ""].join("\n"),
    );
    expect(doc.statements).toEqual([]);
    // …while a short closing line of prose still does ("… reached\nα = .89.").
    const prose = mineText("The new scale reached α = .74, and work engagement reached\nα = .89.\n");
    expect(prose.statements.map((s) => s.value)).toEqual([0.74, 0.89]);
  });

  it("keeps code, output and number rows out of statements but keeps the prose around them", () => {
    const text = [
      "Internal consistency was estimated for each scale:",
      "> alpha(scales, check.keys = TRUE)",
      "## raw_alpha 0.68 0.55 0.50",
      "0.68 0.55 0.50",
      "",
      "Cronbach's alpha should be at least .70 (Okafor, 1994, p. 12).",
    ].join("\n");
    const doc = mineText(text);
    expect(doc.statements.map((s) => [s.kind, s.value])).toEqual([["threshold", 0.7]]);
  });
});

describe("layout lines", () => {
  const item = (str: string, x: number, y: number, mono = false): PositionedItem => ({
    str,
    transform: [10, 0, 0, 10, x, y],
    width: str.length * 5,
    height: 10,
    mono,
  });
  it("marks lines set in a monospaced font and puts a blank line at a paragraph gap", () => {
    // Lines 12 pt apart, then 36 pt of white: three line pitches, a paragraph gap by any measure.
    const lines = pageLinesInReadingOrder([
      item("Reliability was estimated for each scale", 50, 700),
      item("as follows.", 50, 688),
      item("alpha(myData)", 50, 676, true),
      item("A new paragraph after white space", 50, 640),
      item("runs over two lines.", 50, 628),
    ]);
    expect(lines).toEqual([
      { text: "Reliability was estimated for each scale", mono: false },
      { text: "as follows.", mono: false },
      { text: "alpha(myData)", mono: true },
      { text: "", mono: false },
      { text: "A new paragraph after white space", mono: false },
      { text: "runs over two lines.", mono: false },
    ]);
  });
});

describe("tuning excerpt 31 (citation forms)", () => {
  it("gets first author, secondary flag and locator of every citation as written in the excerpt", async () => {
    // Expected values are the citations as written in tests/fixtures/gold/src/31-citation-forms.gold.
    const { readFileSync } = await import("node:fs");
    const text = readFileSync(new URL("../../fixtures/gold/31-citation-forms.txt", import.meta.url), "utf8");
    const got = mineText(text).citations.map((c) => [
      c.authors.split(/ & | et al\./)[0],
      c.year,
      c.locator,
      c.secondary,
    ]);
    expect(got).toEqual([
      ["Ferreira-Lindahl", "1978", "245", false],
      ["Ostrowski", "2013", "238", false],
      ["Bergström", "1962", null, true],
      ["Nakashima", "2008", null, false],
      ["Halvorsen", "1978", null, false],
      ["Pettersen", "1987", null, false],
      ["Grünewald", "2001", null, false],
      ["Mbeki-Torres", "2011", "pp. 12–14", false],
      ["Ranganathan", "1974", "p. 361ff.", false],
      ["Oyelowo", "2016", "chap. 3", false],
      ["Wainwright-Sato", "2012", "sec. 2.1", false],
    ]);
  });
});
