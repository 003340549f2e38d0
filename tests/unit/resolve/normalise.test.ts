import { describe, expect, it } from "vitest";
import {
  editionOf,
  firstAuthorSurname,
  mainTitle,
  normaliseDoi,
  normaliseTitle,
  normaliseYear,
  referenceKey,
  resolveReference,
  scorePair,
} from "@/lib/resolve";

// All names and titles are invented.
describe("normaliseDoi (DOI Handbook: DOIs are case-insensitive; resolver prefixes are not part of the DOI)", () => {
  it.each([
    ["https://doi.org/10.55501/JAMP.2014.0031", "10.55501/jamp.2014.0031"],
    ["http://dx.doi.org/10.55501/jamp.2014.0031.", "10.55501/jamp.2014.0031"],
    ["doi:10.55501/jamp.2014.0031", "10.55501/jamp.2014.0031"],
    ["DOI 10.55501/jamp.2014.0031;", "10.55501/jamp.2014.0031"],
    ["10.55501/jamp.2014%2F0031", "10.55501/jamp.2014/0031"],
    ["10.55501/jamp. 2014.0031", "10.55501/jamp.2014.0031"],
  ])("%s → %s", (input, out) => expect(normaliseDoi(input)).toBe(out));
  it("rejects what is not a DOI", () => {
    expect(normaliseDoi("not a doi")).toBeNull();
    expect(normaliseDoi("")).toBeNull();
    expect(normaliseDoi(null)).toBeNull();
  });
});

describe("normaliseTitle", () => {
  it("folds case, diacritics, ligatures, OCR hyphen breaks, ampersands, stop words and editions", () => {
    expect(normaliseTitle("Measure- ment of Self-Report Bias: The Ångström & Beyond (2nd ed.)")).toBe(
      "measurement selfreport bias angstrom beyond",
    );
    expect(normaliseTitle("Signiﬁcance testing")).toBe("significance testing");
    expect(normaliseTitle("Coefficient α")).toBe("coefficient alpha");
    expect(normaliseTitle("THE TRAIT–STATE–OCCASION TEST")).toBe("traitstateoccasion test");
    expect(normaliseTitle(null)).toBe("");
  });
  it("finds the main title before a subtitle", () => {
    expect(mainTitle("Omega versus alpha: Choosing a coefficient")).toBe("omega versus alpha");
    expect(mainTitle("Does wording matter? Evidence from two panels")).toBe("does wording matter");
    expect(mainTitle("No subtitle here")).toBeNull();
  });
  it("reads editions", () => {
    expect(editionOf("Designing questionnaires (3rd ed.)")).toBe(3);
    expect(editionOf("Scale construction craft, second edition")).toBe(2);
    expect(editionOf("3rd edn")).toBe(3);
    expect(editionOf("Designing questionnaires")).toBeNull();
  });
});

describe("firstAuthorSurname", () => {
  it.each([
    ["Okafor, T. B.", "okafor"],
    ["T. B. Okafor", "okafor"],
    ["Okafor TB", "okafor"],
    ["van der Berg, L.", "van der berg"],
    ["Berg, L. van der", "van der berg"],
    ["L. van der Berg", "van der berg"],
    ["Zielińska, A.-M.", "zielinska"],
    ["Halvorsen, Ø. (Ed.)", "halvorsen"],
    ["Okafor, T. B., & Lindqvist, M.", "okafor"],
    ["Castellanos M., Brightwater H.", "castellanos"],
    ["National Panel on Survey Quality (NPSQ)", "national panel on survey quality"],
    ["Council for Educational Testing", "council for educational testing"],
  ])("%s → %s", (input, out) => expect(firstAuthorSurname(input)).toBe(out));
  it("takes the first of an array and copes with nothing", () => {
    expect(firstAuthorSurname(["Lindqvist, M.", "Okafor, T. B."])).toBe("lindqvist");
    expect(firstAuthorSurname([])).toBeNull();
    expect(firstAuthorSurname("  ")).toBeNull();
  });
});

describe("referenceKey and years", () => {
  it("blocks on particle-free surname and year", () => {
    expect(referenceKey({ authors: ["Berg, L. van der"], year: "2016b" })).toBe("berg:2016");
    expect(referenceKey({ firstAuthor: "L. van der Berg", year: "2016" })).toBe("berg:2016");
    expect(referenceKey({ authors: [], year: "n.d." })).toBe("?:?");
    expect(normaliseYear("(in press)")).toBeNull();
  });
});

describe("scorePair and resolveReference", () => {
  const ref = {
    raw: "Okafor, T. B., & Lindqvist, M. (2014). Reliability of short attitude scales. J Appl Meas Pract, 12, 45–67. doi:10.55501/JAMP.2014.0031",
    authors: ["Okafor, T. B.", "Lindqvist, M."],
    year: "2014",
    title: "Reliability of short attitude scales",
    doi: null,
  };
  const work = {
    id: "w1",
    doi: "https://doi.org/10.55501/jamp.2014.0031",
    title: "Reliability of short attitude scales: A simulation study",
    firstAuthor: "Okafor, T. B.",
    year: "2014",
  };
  const sibling = {
    id: "w2",
    doi: null,
    title: "Validity of short attitude scales",
    firstAuthor: "Okafor, T. B.",
    year: "2014",
  };

  it("matches by a DOI found in the raw text first", () => {
    expect(resolveReference(ref, [sibling, work])).toEqual({ id: "w1", method: "doi", score: 1 });
  });
  it("falls back to title, author and year, and refuses a near-miss", () => {
    const noDoi = { ...ref, raw: "Okafor (2014)" };
    expect(resolveReference(noDoi, [sibling, { ...work, doi: null }])).toMatchObject({ id: "w1", method: "title" });
    expect(resolveReference(noDoi, [sibling])).toBeNull();
    expect(scorePair(noDoi, sibling)).toBeLessThan(scorePair(noDoi, work));
  });
  it("rejects bad input clearly", () => {
    expect(() => resolveReference({} as never, [])).toThrow(/authors array/);
    expect(() => resolveReference(ref, [], 2)).toThrow(/threshold/);
  });
});
