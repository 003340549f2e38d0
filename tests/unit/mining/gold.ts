// Shared scoring of the miner against the gold set (tests/fixtures/gold). Matching rule: a predicted
// statement matches a gold one when excerpt, normalised sentence, kind and statistic agree; among
// candidates, the one with the same value is preferred.
import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import type { GoldExcerpt, GoldStatement } from "@/tests/fixtures/gold/gold-types";
import type { Statement } from "@/lib/mining/contract";
import { normaliseSentence } from "@/lib/mining/sentences";

export const goldDir = path.resolve(import.meta.dirname, "../../fixtures/gold");

export function loadGold(): { excerpt: GoldExcerpt; text: string }[] {
  return readdirSync(goldDir)
    .filter((f) => f.endsWith(".json"))
    .sort()
    .map((f) => ({
      excerpt: JSON.parse(readFileSync(path.join(goldDir, f), "utf8")) as GoldExcerpt,
      text: readFileSync(path.join(goldDir, f.replace(/\.json$/, ".txt")), "utf8"),
    }));
}

export type Tally = {
  tp: Record<string, number>;
  fp: Record<string, number>;
  fn: Record<string, number>;
  matched: number;
  comparatorOk: number;
  valueOk: number;
  framingN: number;
  framingOk: number;
  locatorN: number;
  locatorOk: number;
  /** statements of statistic "other" whose gold names the statistic, and those named the same */
  labelN: number;
  labelOk: number;
  negatives: number;
  negativesClean: number;
  errors: string[];
};

export function newTally(): Tally {
  return {
    tp: {},
    fp: {},
    fn: {},
    matched: 0,
    comparatorOk: 0,
    valueOk: 0,
    framingN: 0,
    framingOk: 0,
    locatorN: 0,
    locatorOk: 0,
    labelN: 0,
    labelOk: 0,
    negatives: 0,
    negativesClean: 0,
    errors: [],
  };
}

const inc = (r: Record<string, number>, k: string) => (r[k] = (r[k] ?? 0) + 1);

function citationClass(s: Statement): GoldStatement["citation"] {
  if (!s.citations.length) return "none";
  return s.citations.some((c) => c.locator) ? "with_locator" : "no_locator";
}

export function score(t: Tally, excerpt: GoldExcerpt, predicted: Statement[], label: string): void {
  const pred = predicted.map((p) => ({ p, n: normaliseSentence(p.sentence), used: false }));
  const golds = excerpt.sentences.flatMap((s) =>
    s.statements.map((g) => ({ g, n: normaliseSentence(s.text), text: s.text })),
  );
  for (const { g, n, text } of golds) {
    const cands = pred.filter(
      (x) => !x.used && x.n === n && x.p.kind === g.kind && (g.kind === "procedure" || x.p.statistic === g.statistic),
    );
    const hit = cands.find((x) => x.p.value === g.value) ?? cands[0];
    if (!hit) {
      inc(t.fn, g.kind);
      t.errors.push(`${label} ${excerpt.id} MISSED ${g.kind} ${g.statistic} ${g.comparator} ${g.value} | ${text}`);
      continue;
    }
    hit.used = true;
    inc(t.tp, g.kind);
    if (g.kind === "procedure") continue;
    t.matched++;
    if (hit.p.comparator === g.comparator) t.comparatorOk++;
    else
      t.errors.push(
        `${label} ${excerpt.id} COMPARATOR ${g.statistic} got ${hit.p.comparator} want ${g.comparator} | ${text}`,
      );
    if (hit.p.value !== null && g.value !== null && Math.abs(hit.p.value - g.value) < 1e-9) t.valueOk++;
    else t.errors.push(`${label} ${excerpt.id} VALUE ${g.statistic} got ${hit.p.value} want ${g.value} | ${text}`);
    if (g.statistic_label) {
      t.labelN++;
      // underscores stand for spaces in the gold sources, so both are read alike
      const norm = (x: string) =>
        x
          .toLowerCase()
          .replace(/[’]/g, "'")
          .replace(/[_\s]+/g, " ");
      if (norm(hit.p.statistic_label ?? "") === norm(g.statistic_label)) t.labelOk++;
      else
        t.errors.push(`${label} ${excerpt.id} LABEL got ${hit.p.statistic_label} want ${g.statistic_label} | ${text}`);
    }
    if (g.kind === "threshold") {
      t.framingN++;
      if (hit.p.framing === g.framing) t.framingOk++;
      else
        t.errors.push(`${label} ${excerpt.id} FRAMING ${g.statistic} got ${hit.p.framing} want ${g.framing} | ${text}`);
    }
    if (g.citation !== "none") {
      t.locatorN++;
      if (citationClass(hit.p) === g.citation) t.locatorOk++;
      else t.errors.push(`${label} ${excerpt.id} LOCATOR got ${citationClass(hit.p)} want ${g.citation} | ${text}`);
    }
  }
  for (const x of pred) {
    if (x.used) continue;
    inc(t.fp, x.p.kind);
    t.errors.push(
      `${label} ${excerpt.id} EXTRA ${x.p.kind} ${x.p.statistic} ${x.p.comparator} ${x.p.value} | ${x.p.sentence}`,
    );
  }
  for (const neg of excerpt.negatives) {
    t.negatives++;
    const n = normaliseSentence(neg);
    if (!predicted.some((p) => normaliseSentence(p.sentence) === n)) t.negativesClean++;
  }
}

export function f1(t: Tally, kind: string): number {
  const tp = t.tp[kind] ?? 0;
  const p = tp / Math.max(1, tp + (t.fp[kind] ?? 0));
  const r = tp / Math.max(1, tp + (t.fn[kind] ?? 0));
  return p + r === 0 ? 0 : (2 * p * r) / (p + r);
}
