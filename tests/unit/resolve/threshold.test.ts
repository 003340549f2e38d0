import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { resolveReference, TITLE_MATCH_THRESHOLD, type ParsedReference, type WorkCandidate } from "@/lib/resolve";
import { precisionRecall } from "@/lib/stats/agreement";

interface Pair {
  id: string;
  split: "train" | "holdout";
  same: boolean;
  variation: string;
  a: ParsedReference;
  b: WorkCandidate;
}

// Invented reference pairs (all people, titles, journals and publishers made up), labelled by hand.
const pairs: Pair[] = JSON.parse(
  fs.readFileSync(path.join(import.meta.dirname, "../../fixtures/reference-pairs/pairs.json"), "utf8"),
).pairs;

function measure(set: Pair[], threshold: number) {
  let tp = 0;
  let fp = 0;
  let fn = 0;
  const errors: string[] = [];
  for (const p of set) {
    const hit = resolveReference(p.a, [p.b], threshold) !== null;
    if (hit && p.same) tp++;
    else if (hit) {
      fp++;
      errors.push(`FP ${p.id} ${p.variation}`);
    } else if (p.same) {
      fn++;
      errors.push(`FN ${p.id} ${p.variation}`);
    }
  }
  return { ...precisionRecall({ tp, fp, fn }), tp, fp, fn, errors };
}

const train = pairs.filter((p) => p.split === "train");
const holdout = pairs.filter((p) => p.split === "holdout");
const thresholds = Array.from({ length: 31 }, (_, i) => Math.round((0.7 + i * 0.01) * 100) / 100);

describe("reference resolution threshold, measured on labelled pairs", () => {
  it("has enough pairs of both kinds, split by a fixed rule", () => {
    expect(pairs.length).toBeGreaterThanOrEqual(150);
    expect(pairs.filter((p) => !p.same).length).toBeGreaterThanOrEqual(50);
    expect(new Set(pairs.map((p) => p.id)).size).toBe(pairs.length);
    pairs.forEach((p, i) => expect(p.split).toBe(i % 3 === 2 ? "holdout" : "train"));
  });

  it("sweeps thresholds, picks one on the training split and checks it on the held-out split", () => {
    const rows = thresholds.map((t) => ({ t, train: measure(train, t), holdout: measure(holdout, t) }));
    const table = rows.map(
      (r) =>
        `${r.t.toFixed(2)}  train P=${r.train.precision.toFixed(3)} R=${r.train.recall.toFixed(3)}` +
        `  holdout P=${r.holdout.precision.toFixed(3)} R=${r.holdout.recall.toFixed(3)}`,
    );
    // Choice rule: highest F1 on the training split among thresholds with precision ≥ 0.97, and the
    // middle of the run of thresholds that tie on it, so the constant is not perched on an edge.
    const eligible = rows.filter((r) => r.train.precision >= 0.97);
    const bestF1 = Math.max(...eligible.map((r) => r.train.f1));
    const plateau = eligible.filter((r) => r.train.f1 === bestF1).map((r) => r.t);
    const chosen = plateau[Math.floor((plateau.length - 1) / 2)];
    const at = rows.find((r) => r.t === TITLE_MATCH_THRESHOLD)!;
    console.log(
      [
        `pairs: ${train.length} train (${train.filter((p) => p.same).length} same), ${holdout.length} holdout (${holdout.filter((p) => p.same).length} same)`,
        ...table,
        `best training plateau ${plateau[0]}–${plateau[plateau.length - 1]}, chosen ${chosen}; exported ${TITLE_MATCH_THRESHOLD}`,
        `errors at ${TITLE_MATCH_THRESHOLD}: train [${at.train.errors.join(", ")}] holdout [${at.holdout.errors.join(", ")}]`,
      ].join("\n"),
    );
    expect(TITLE_MATCH_THRESHOLD).toBe(chosen);
    for (const m of [at.train, at.holdout]) {
      expect(m.precision).toBeGreaterThanOrEqual(0.97);
      expect(m.recall).toBeGreaterThanOrEqual(0.9);
    }
  });

  it("picks the right work out of the whole candidate pool, not only out of its own pair", () => {
    const pool = new Map(pairs.map((p) => [p.b.id, p.b]));
    const candidates = [...pool.values()];
    let right = 0;
    let wrong = 0;
    const positives = pairs.filter((p) => p.same);
    for (const p of positives) {
      const r = resolveReference(p.a, candidates);
      if (r?.id === p.b.id) right++;
      else if (r) wrong++;
    }
    expect(wrong).toBe(0);
    expect(right / positives.length).toBeGreaterThanOrEqual(0.9);
  });
});

// A second held-out set, written by hand after the weights and the threshold above were frozen and
// never used to tune anything (tests/fixtures/reference-pairs/make_fresh_pairs.py): the first
// holdout was looked at while weighting title, author and year, so its figures are optimistic. The
// floors were set before this set was first run; the figures it gives are in the README.
describe("reference resolution on pairs written after the threshold was frozen", () => {
  const fresh: Pair[] = JSON.parse(
    fs.readFileSync(path.join(import.meta.dirname, "../../fixtures/reference-pairs/fresh-pairs.json"), "utf8"),
  ).pairs;
  it("keeps precision and recall at the exported threshold", () => {
    expect(fresh.length).toBeGreaterThanOrEqual(30);
    expect(fresh.filter((p) => !p.same).length).toBeGreaterThanOrEqual(10);
    const m = measure(fresh, TITLE_MATCH_THRESHOLD);
    console.log(
      `fresh pairs: ${fresh.length} (${fresh.filter((p) => p.same).length} same) at ${TITLE_MATCH_THRESHOLD}: P=${m.precision.toFixed(3)} R=${m.recall.toFixed(3)} F1=${m.f1.toFixed(3)}; errors [${m.errors.join(", ")}]`,
    );
    expect(m.precision).toBeGreaterThanOrEqual(0.9);
    expect(m.recall).toBeGreaterThanOrEqual(0.8);
  });
});
