// The number reader (lib/mining/numbers.ts). Expected values are hand-computed from the text as
// written; where the written form is one JavaScript accepts, Number() (ECMAScript's StringToNumber)
// is the outside check.
import { describe, expect, it } from "vitest";
import { parseNumber, readNumbers, readRanges, readRatios, readValues, wordValue } from "@/lib/mining/numbers";

const values = (s: string) => readValues(s).map((n) => n.value);
const roles = (s: string) => readNumbers(s).map((n) => [n.raw, n.role]);

describe("readNumbers: plain forms agree with JavaScript's Number()", () => {
  for (const written of ["0.70", ".70", "12", "3.29", "0.05", "1000", "2.5", ".001", "-0.31"]) {
    it(`reads "${written}" as Number("${written}")`, () => {
      expect(parseNumber(written)).toBe(Number(written));
    });
  }
  it("reads thousands separators as one number (1,133 = 1133)", () => {
    expect(parseNumber("1,133")).toBe(1133);
    expect(readNumbers("n = 1,133 nurses").map((n) => [n.value, n.role])).toEqual([[1133, "count"]]);
  });
  it("reads a typographic minus (U+2212) as a minus sign", () => {
    expect(parseNumber("−0.31")).toBe(-0.31);
  });
  it("does not read a dash between two numbers as a minus sign (1–5 is a range)", () => {
    expect(values("rated from 1–5 daily")).toEqual([1, 5]);
  });
});

describe("readNumbers: forms Number() does not accept", () => {
  it("reads a middle-dot decimal (0·7 = 0.7, ·83 = 0.83)", () => {
    expect(parseNumber("0·7")).toBe(0.7);
    expect(values("alpha was 0·83 and ·79")).toEqual([0.83, 0.79]);
  });
  it('joins a decimal broken after its point ("0. 70" = 0.70), but not "Study 2. 70 people"', () => {
    expect(values("a value of 0. 70 is needed")).toEqual([0.7]);
    expect(readNumbers("see Study 2. 70 people took part").map((n) => [n.value, n.role])).toEqual([
      [2, "label"],
      [70, "count"],
    ]);
  });
  it("gives a percentage its proportion (80% = 0.80; 27 percent = 0.27)", () => {
    const [p] = readNumbers("a power of 80%");
    expect(p.value).toBe(80);
    expect(p.percent).toBe(true);
    expect(p.proportion).toBeCloseTo(0.8, 12);
    expect(readNumbers("27 percent of the variance")[0].proportion).toBeCloseTo(0.27, 12);
    expect(parseNumber("5%")).toBeCloseTo(0.05, 12);
  });
  it("reads number words (five = 5, twenty-five = 25, a hundred = 100)", () => {
    expect(wordValue("five")).toBe(5);
    expect(wordValue("twenty-five")).toBe(25);
    expect(wordValue("a hundred")).toBe(100);
    expect(wordValue("zero")).toBe(0);
    expect(wordValue("umpteen")).toBeNull();
    expect(parseNumber("ten")).toBe(10);
  });
  it('does not read "one" as a pronoun ("one of the items", "no one")', () => {
    expect(values("one of the items was removed")).toEqual([]);
    expect(values("no one objected")).toEqual([]);
  });
});

describe("readNumbers: things that look like numbers but are not values", () => {
  it('list markers: "(1) noise exposure, (2) tolerance"', () => {
    expect(roles("The parts: (1) noise exposure, (2) tolerance and (3) strain")).toEqual([
      ["1", "list_marker"],
      ["2", "list_marker"],
      ["3", "list_marker"],
    ]);
  });
  it('labels: "Test 1", "Table 3", "Key Concept 12.5", "section 4.2", "Study 2"', () => {
    for (const s of [
      "Test 1 asks for",
      "listed in Table 3",
      "in Key Concept 12.5",
      "see section 4.2",
      "Study 2 used",
    ]) {
      expect(readNumbers(s).map((n) => n.role)).toEqual(["label"]);
    }
  });
  it('counts: "12 predictors", "five items", "a 7-point scale", "two-tailed"', () => {
    expect(roles("12 predictors were entered")).toEqual([["12", "count"]]);
    expect(roles("five items were dropped")).toEqual([["five", "count"]]);
    expect(roles("a 7-point scale")).toEqual([["7", "count"]]);
    expect(roles("two-tailed tests")).toEqual([["two", "count"]]);
  });
  it('citation numbers glued to a value: "0.8.21–25" is 0.8 followed by references 21–25', () => {
    const nums = readNumbers("loadings above 0.8.21–25 were kept");
    expect(nums.map((n) => [n.value, n.role])).toEqual([
      [0.8, "value"],
      [21, "reference"],
    ]);
    expect(values("loadings above 0.8.21–25 were kept")).toEqual([0.8]);
  });
  it('citation brackets after a value: "0.80 [21–25]", "(21)." and a caret superscript', () => {
    expect(values("a minimum omega of 0.80 [21–25] was adopted")).toEqual([0.8]);
    expect(values("as recommended (21).")).toEqual([]);
    expect(values("values above 0.70^14 are acceptable")).toEqual([0.7]);
  });
  it('keeps a decimal in parentheses as a value ("acceptable (.70)") and test statistics attached to a letter', () => {
    expect(values("acceptable (.70) reliability")).toEqual([0.7]);
    expect(values("t(45) = 2.10")).toEqual([45, 2.1]);
  });
});

describe("readRanges", () => {
  const ranges = (s: string) => readRanges(s).map((r) => [r.low.value, r.high.value, r.form]);
  it('"between .15 and .5", "from 0.60 to 0.70", "0.60 to 0.70", ".60–.70"', () => {
    expect(ranges("between .15 and .5 are fine")).toEqual([[0.15, 0.5, "between"]]);
    expect(ranges("from 0.60 to 0.70")).toEqual([[0.6, 0.7, "from_to"]]);
    expect(ranges("0.60 to 0.70")).toEqual([[0.6, 0.7, "to"]]);
    expect(ranges("values of .60–.70")).toEqual([[0.6, 0.7, "dash"]]);
  });
  it("a graded scale is a list, not a range (.60 questionable, .70 acceptable, .80 good)", () => {
    expect(ranges(".60 questionable, .70 acceptable, .80 good")).toEqual([]);
  });
  it("a descending pair is no range, and a ratio is none (two to one)", () => {
    expect(ranges("from .90 to .70")).toEqual([]);
    expect(ranges("a ratio of two to one")).toEqual([]);
  });
});

describe("readRatios", () => {
  it('"10:1" = 10, "5 : 1" = 5, "ten to one" = 10, "3:2" = 1.5', () => {
    expect(readRatios("a ratio of 10:1").map((r) => r.value)).toEqual([10]);
    expect(readRatios("at 5 : 1").map((r) => r.value)).toEqual([5]);
    expect(readRatios("ten to one").map((r) => r.value)).toEqual([10]);
    expect(readRatios("3:2 split").map((r) => r.value)).toEqual([1.5]);
  });
  it('"0.60 to 0.70" is not a ratio', () => {
    expect(readRatios("0.60 to 0.70")).toEqual([]);
  });
});
