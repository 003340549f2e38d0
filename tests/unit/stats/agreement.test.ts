import { describe, expect, it } from "vitest";
import { cohenKappa, precisionRecall } from "@/lib/stats/agreement";

function expand(table: number[][], labels: string[]): [string, string][] {
  const out: [string, string][] = [];
  table.forEach((row, i) =>
    row.forEach((count, j) => {
      for (let k = 0; k < count; k++) out.push([labels[i], labels[j]]);
    }),
  );
  return out;
}

describe("cohenKappa", () => {
  it("Agresti, Categorical Data Analysis, two pathologists' diagnoses of carcinoma (118 slides): κ = 0.493, ASE ≈ 0.057 (from memory)", () => {
    const table = [
      [22, 2, 2, 0],
      [5, 7, 14, 0],
      [0, 2, 36, 0],
      [0, 1, 17, 10],
    ];
    const r = cohenKappa(expand(table, ["1", "2", "3", "4"]));
    expect(r.n).toBe(118);
    expect(r.observed).toBeCloseTo(75 / 118, 12);
    expect(r.kappa).toBeCloseTo(0.493, 3);
    expect(r.se).toBeCloseTo(0.057, 3);
    expect(r.lower).toBeCloseTo(r.kappa - 1.959964 * r.se, 5);
  });

  it("hand-countable 2×2 examples: 20/5/10/15 of 50 → κ = 0.40; 45/15/25/15 → 0.1304; 25/35/5/35 → 0.2593 (textbook-style worked examples, from memory)", () => {
    expect(
      cohenKappa(
        expand(
          [
            [20, 5],
            [10, 15],
          ],
          ["yes", "no"],
        ),
      ).kappa,
    ).toBeCloseTo(0.4, 10);
    expect(
      cohenKappa(
        expand(
          [
            [45, 15],
            [25, 15],
          ],
          ["yes", "no"],
        ),
      ).kappa,
    ).toBeCloseTo(0.06 / 0.46, 10);
    expect(
      cohenKappa(
        expand(
          [
            [25, 35],
            [5, 35],
          ],
          ["yes", "no"],
        ),
      ).kappa,
    ).toBeCloseTo(0.14 / 0.54, 10);
  });

  it("perfect agreement is 1, agreement at chance level is 0, single-category data is undefined", () => {
    expect(
      cohenKappa(
        expand(
          [
            [10, 0],
            [0, 5],
          ],
          ["a", "b"],
        ),
      ).kappa,
    ).toBe(1);
    expect(
      cohenKappa(
        expand(
          [
            [5, 5],
            [5, 5],
          ],
          ["a", "b"],
        ),
      ).kappa,
    ).toBeCloseTo(0, 12);
    expect(
      Number.isNaN(
        cohenKappa([
          ["a", "a"],
          ["a", "a"],
        ]).kappa,
      ),
    ).toBe(true);
    expect(() => cohenKappa([])).toThrow(/at least one/);
  });
});

describe("precisionRecall", () => {
  it("definitions (common practice, no source needed beyond the definitions)", () => {
    const r = precisionRecall({ tp: 8, fp: 2, fn: 4 });
    expect(r.precision).toBeCloseTo(0.8, 12);
    expect(r.recall).toBeCloseTo(8 / 12, 12);
    expect(r.f1).toBeCloseTo((2 * 0.8 * (8 / 12)) / (0.8 + 8 / 12), 12);
    expect(Number.isNaN(precisionRecall({ tp: 0, fp: 0, fn: 3 }).precision)).toBe(true);
    expect(precisionRecall({ tp: 0, fp: 1, fn: 1 }).f1).toBe(0);
    expect(() => precisionRecall({ tp: -1, fp: 0, fn: 0 })).toThrow(/tp/);
  });
});
