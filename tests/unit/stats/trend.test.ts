import { describe, expect, it } from "vitest";
import jStat from "jstat";
import { cochranArmitage } from "@/lib/stats/trend";

// Infant malformation by mother's alcohol consumption (drinks/day 0, <1, 1–2, 3–5, ≥6), the textbook
// example of Agresti, Categorical Data Analysis (section on the linear trend / M² test), with scores
// 0, 0.5, 1.5, 4.0, 7.0. Agresti reports M² ≈ 6.57, p ≈ 0.010 (from memory).
const scores = [0, 0.5, 1.5, 4.0, 7.0];
const present = [48, 38, 5, 1, 1];
const absent = [17066, 14464, 788, 126, 37];
const groups = scores.map((score, i) => ({ score, cases: present[i], total: present[i] + absent[i] }));

describe("cochranArmitage", () => {
  it("reproduces Agresti's infant malformation example: z² ≈ 6.57, p ≈ 0.010 (from memory)", () => {
    const r = cochranArmitage(groups);
    expect(r.chiSquare).toBeGreaterThan(6.565);
    expect(r.chiSquare).toBeLessThan(6.575);
    expect(r.pValue).toBeGreaterThan(0.0095);
    expect(r.pValue).toBeLessThan(0.0105);
    expect(r.direction).toBe("increasing");
    expect(r.describe()).toBe("The share rises over the years (z = 2.56, two-sided p = 0.010).");
  });

  it("cross-checks against jstat: z² = N·r² with r the Pearson correlation of score and outcome", () => {
    // Expand to one row per infant (32,574 rows) and let jstat compute r; M² = (N − 1)r² is Agresti's
    // statistic, the Cochran–Armitage z² is N·r².
    const x: number[] = [];
    const y: number[] = [];
    groups.forEach((g) => {
      for (let i = 0; i < g.total; i++) {
        x.push(g.score);
        y.push(i < g.cases ? 1 : 0);
      }
    });
    const r = jStat.corrcoeff(x, y);
    const N = x.length;
    const res = cochranArmitage(groups);
    expect(res.chiSquare).toBeCloseTo(N * r * r, 8);
    expect((N - 1) * r * r).toBeCloseTo(6.57, 2);
    // p from the normal tail agrees with jstat's χ²₁ upper tail.
    expect(res.pValue).toBeCloseTo(1 - jStat.chisquare.cdf(res.chiSquare, 1), 10);
  });

  it("reverses sign when the scores are reversed, is unchanged by shifting scores (years)", () => {
    const rev = cochranArmitage(groups.map((g) => ({ ...g, score: -g.score })));
    expect(rev.z).toBeCloseTo(-cochranArmitage(groups).z, 10);
    expect(rev.direction).toBe("decreasing");
    const years = cochranArmitage(groups.map((g) => ({ ...g, score: g.score + 2010 })));
    expect(years.z).toBeCloseTo(cochranArmitage(groups).z, 8);
  });

  it("describes a non-significant trend without claiming one, and an untestable one", () => {
    const flatish = cochranArmitage([
      { score: 2019, cases: 10, total: 50 },
      { score: 2020, cases: 11, total: 50 },
      { score: 2021, cases: 12, total: 50 },
    ]);
    expect(flatish.pValue).toBeGreaterThan(0.05);
    expect(flatish.describe()).toMatch(/^No clear trend over the years: the share rises slightly/);
    const none = cochranArmitage([
      { score: 1, cases: 0, total: 5 },
      { score: 2, cases: 0, total: 5 },
    ]);
    expect(Number.isNaN(none.z)).toBe(true);
    expect(none.direction).toBe("none");
    expect(none.describe()).toMatch(/No trend can be tested/);
  });

  it("rejects bad input with a clear error", () => {
    expect(() => cochranArmitage([{ score: 1, cases: 1, total: 2 }])).toThrow(/at least two groups/);
    expect(() =>
      cochranArmitage([
        { score: 1, cases: 3, total: 2 },
        { score: 2, cases: 0, total: 1 },
      ]),
    ).toThrow(/cases/);
    expect(() =>
      cochranArmitage([
        { score: Number.NaN, cases: 1, total: 2 },
        { score: 2, cases: 0, total: 1 },
      ]),
    ).toThrow(/score/);
  });
});
