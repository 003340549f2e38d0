import { describe, expect, it } from "vitest";
import jStat from "jstat";
import { wilson } from "@/lib/stats/wilson";
import { newcombeDifference } from "@/lib/stats/newcombe";
import { normalQuantile, twoSidedNormalP, zForConfidence } from "@/lib/stats/distributions";

// Published limits are given to 4 decimals and were probably computed with z = 1.96 rather than
// 1.959964, so a check allows one unit of the 4th decimal.
const close4 = (actual: number, expected: number) =>
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(0.0001 + 1e-12);

describe("wilson: Newcombe (1998a), Statistics in Medicine 17:857–872, examples of Table II", () => {
  // Method 3 (score, no continuity correction). Limits from memory of the paper's table.
  it.each([
    [81, 263, 0.2553, 0.3662],
    [15, 148, 0.0624, 0.1605],
    [0, 20, 0.0, 0.1611],
    [1, 29, 0.0061, 0.1718],
  ])("%i/%i → %f to %f (method 3, from memory)", (x, n, lo, hi) => {
    const r = wilson(x, n);
    close4(r.lower, lo);
    close4(r.upper, hi);
    expect(r.p).toBeCloseTo(x / n, 12);
  });

  // Method 4 (score with continuity correction), from memory. 81/263 is left out on purpose: I do not
  // remember its method-4 limits reliably enough to make them a check.
  it.each([
    [15, 148, 0.0598, 0.1645],
    [0, 20, 0.0, 0.2005],
    [1, 29, 0.0018, 0.1963],
  ])("%i/%i → %f to %f (method 4, cc, from memory)", (x, n, lo, hi) => {
    const r = wilson(x, n, 0.95, { cc: true });
    close4(r.lower, lo);
    close4(r.upper, hi);
  });
});

describe("wilson: independent checks", () => {
  // The score interval is by definition the set of π with |p̂ − π| ≤ z·sqrt(π(1 − π)/n) (and with a
  // correction of 1/(2n) on the left for cc). Checking that the limits solve that equation, with z
  // from jstat directly, tests the closed form without reusing it.
  it.each([
    [81, 263],
    [15, 148],
    [1, 29],
    [7, 9],
    [500, 1000],
  ])("limits of %i/%i solve the score equation", (x, n) => {
    const z = jStat.normal.inv(0.975, 0, 1);
    const p = x / n;
    const r = wilson(x, n);
    for (const pi of [r.lower, r.upper]) {
      expect(Math.abs(p - pi)).toBeCloseTo(z * Math.sqrt((pi * (1 - pi)) / n), 10);
    }
    const c = wilson(x, n, 0.95, { cc: true });
    for (const pi of [c.lower, c.upper]) {
      expect(Math.abs(p - pi) - 1 / (2 * n)).toBeCloseTo(z * Math.sqrt((pi * (1 - pi)) / n), 10);
    }
  });

  it("z for 95% is the tabled 1.959964 (standard normal tables) and agrees with jstat", () => {
    expect(zForConfidence(0.95)).toBeCloseTo(1.959964, 6);
    expect(normalQuantile(0.995)).toBeCloseTo(2.575829, 6);
    // Tail function cross-checked against jstat's chi-square on 1 df: P(|Z| > z) = P(χ²₁ > z²).
    for (const z of [0.5, 1.96, 2.5632, 3.3]) {
      expect(twoSidedNormalP(z)).toBeCloseTo(1 - jStat.chisquare.cdf(z * z, 1), 10);
    }
  });

  it("n = 0 gives p NaN and the whole range; wider at 99% than 95%; bad input is rejected", () => {
    const empty = wilson(0, 0);
    expect(Number.isNaN(empty.p)).toBe(true);
    expect([empty.lower, empty.upper]).toEqual([0, 1]);
    const a = wilson(15, 148, 0.95);
    const b = wilson(15, 148, 0.99);
    expect(b.lower).toBeLessThan(a.lower);
    expect(b.upper).toBeGreaterThan(a.upper);
    expect(wilson(20, 20).upper).toBe(1);
    expect(() => wilson(5, 3)).toThrow(/between 0 and n/);
    expect(() => wilson(-1, 3)).toThrow(RangeError);
    expect(() => wilson(1.5, 3)).toThrow(RangeError);
    expect(() => wilson(1, 3, 1.2)).toThrow(/confidence/);
  });
});

describe("newcombeDifference: Newcombe (1998b), Statistics in Medicine 17:873–890, worked examples", () => {
  // Method 10 (hybrid score, no cc). Limits from memory of the paper's table of examples (a)–(g).
  // For (c) 6/7 − 2/7 I first recalled 0.0636 to 0.8423; rechecking the formula (the same code
  // reproduces (a), (b), (d)–(f) and all Wilson rows above) showed that 0.8423 is method 11's upper
  // limit, and the method-10 limits the paper gives are 0.0582 to 0.8062 (from memory, second look).
  it.each([
    ["(a)", 56, 70, 48, 80, 0.0524, 0.3339],
    ["(b)", 9, 10, 3, 10, 0.1705, 0.809],
    ["(c)", 6, 7, 2, 7, 0.0582, 0.8062],
    ["(d)", 5, 56, 0, 29, -0.0381, 0.1926],
    ["(e)", 0, 10, 0, 20, -0.1611, 0.2775],
    ["(f)", 10, 10, 0, 20, 0.6791, 1.0],
  ])("%s %i/%i − %i/%i → %f to %f (method 10, from memory)", (_l, x1, n1, x2, n2, lo, hi) => {
    const r = newcombeDifference(x1, n1, x2, n2);
    close4(r.lower, lo);
    close4(r.upper, hi);
    expect(r.difference).toBeCloseTo(x1 / n1 - x2 / n2, 12);
  });

  it.each([
    ["(a)", 56, 70, 48, 80, 0.0428, 0.3422],
    ["(c)", 6, 7, 2, 7, -0.029, 0.8423],
  ])("%s %i/%i − %i/%i method 11 (cc) → %f to %f (from memory)", (_l, x1, n1, x2, n2, lo, hi) => {
    const r = newcombeDifference(x1, n1, x2, n2, 0.95, { cc: true });
    close4(r.lower, lo);
    close4(r.upper, hi);
  });

  it("is antisymmetric: swapping the groups mirrors the interval", () => {
    const a = newcombeDifference(56, 70, 48, 80);
    const b = newcombeDifference(48, 80, 56, 70);
    expect(b.lower).toBeCloseTo(-a.upper, 12);
    expect(b.upper).toBeCloseTo(-a.lower, 12);
  });

  it("an empty group gives NaN and [-1, 1]", () => {
    const r = newcombeDifference(3, 10, 0, 0);
    expect(Number.isNaN(r.difference)).toBe(true);
    expect([r.lower, r.upper]).toEqual([-1, 1]);
  });
});
