import { describe, expect, it } from "vitest";
import {
  matchPractices,
  parseStatValue,
  practiceLabel,
  seedPractices,
  STATISTIC_KEYS,
  type Practice,
  type ThresholdStatement,
} from "@/lib/practices";

const alphaFixed: Practice = {
  id: "a70f",
  statistic: "cronbach_alpha",
  comparator: ">=",
  value: 0.7,
  framing: "fixed",
};
const alphaAny: Practice = { id: "a70", statistic: "cronbach_alpha", comparator: ">=", value: 0.7, framing: null };
const alpha80: Practice = { id: "a80", statistic: "cronbach_alpha", comparator: ">=", value: 0.8, framing: null };
const alphaUpper: Practice = { id: "a70u", statistic: "cronbach_alpha", comparator: "<", value: 0.7, framing: null };
const pLevel: Practice = { id: "p05", statistic: "p_value", comparator: "<", value: 0.05, framing: null };
const all = [alphaFixed, alphaAny, alpha80, alphaUpper, pLevel];

const st = (s: Partial<ThresholdStatement>): ThresholdStatement => ({
  statistic: "cronbach_alpha",
  comparator: ">=",
  value: 0.7,
  framing: "fixed",
  ...s,
});

describe("matchPractices", () => {
  it("matches same statistic, comparator family, value and framing", () => {
    expect(matchPractices(st({}), all)).toEqual(["a70f", "a70"]);
    expect(matchPractices(st({ comparator: ">" }), all)).toEqual(["a70f", "a70"]);
    expect(matchPractices(st({ comparator: "<=" }), all)).toEqual(["a70u"]);
    expect(matchPractices(st({ comparator: "=" }), all)).toEqual([]);
  });

  it("treats .70, 0.7, 0.700 and 0,70 as the same value and honours the 0.005 tolerance", () => {
    for (const v of [".70", "0.7", "0.700", "0,70", 0.7, 0.704, 0.705]) {
      expect(matchPractices(st({ value: v }), all), String(v)).toEqual(["a70f", "a70"]);
    }
    expect(matchPractices(st({ value: 0.706 }), all)).toEqual([]);
    expect(matchPractices(st({ value: ".75" }), all)).toEqual([]);
    expect(matchPractices(st({ value: 0.72 }), all, { tolerance: 0.03 })).toEqual(["a70f", "a70"]);
  });

  it("never counts a disputed statement as asserting a practice, whatever the practice's framing", () => {
    // product.md, "framing": disputed = names the cut-off to argue against it.
    expect(matchPractices(st({ framing: "disputed" }), all)).toEqual([]);
    expect(matchPractices(st({ framing: "contextual" }), all)).toEqual(["a70"]);
  });

  it("requires the framing only when the practice sets one", () => {
    expect(matchPractices(st({ framing: "contextual" }), all)).toEqual(["a70"]);
    expect(matchPractices(st({ framing: null }), all)).toEqual(["a70"]);
  });

  it("keeps significance α (p_value) apart from coefficient α, and ignores incomplete statements", () => {
    expect(matchPractices({ statistic: "p_value", comparator: "<", value: ".05", framing: null }, all)).toEqual([
      "p05",
    ]);
    expect(matchPractices(st({ statistic: null }), all)).toEqual([]);
    expect(matchPractices(st({ value: null }), all)).toEqual([]);
    expect(matchPractices(st({ value: "seventy" }), all)).toEqual([]);
    expect(() => matchPractices(st({}), all, { tolerance: -1 })).toThrow(/tolerance/);
  });

  it("parses values as written", () => {
    expect(parseStatValue(".70")).toBe(0.7);
    expect(parseStatValue("≥ .90")).toBe(0.9);
    expect(parseStatValue("10")).toBe(10);
    expect(parseStatValue("1.2.3")).toBeNull();
  });
});

describe("seedPractices (common practice in the literature, no source)", () => {
  it("has unique ids, valid keys and human labels", () => {
    const ids = seedPractices.map((p) => p.id);
    expect(new Set(ids).size).toBe(ids.length);
    for (const p of seedPractices) expect(STATISTIC_KEYS).toContain(p.statistic);
    expect(seedPractices[0].label).toBe("Cronbach's α ≥ .70, as a fixed rule");
    expect(practiceLabel({ statistic: "vif", comparator: "<", value: 5, framing: null })).toBe("VIF < 5");
    expect(practiceLabel({ statistic: "rmsea", comparator: "<=", value: 0.06, framing: null })).toBe("RMSEA ≤ .06");
    expect(practiceLabel({ statistic: "eigenvalue", comparator: ">", value: 1, framing: null })).toBe("Eigenvalue > 1");
  });

  it("catches ≤ 5 with the VIF < 5 seed through the comparator family, but not < 10", () => {
    const ids = matchPractices({ statistic: "vif", comparator: "<=", value: 5, framing: "fixed" }, seedPractices);
    expect(ids).toEqual(["vif-lt-5"]);
  });
});
