// Scoring of the miner against the frozen held-out set (tests/fixtures/miner-heldout/heldout.json),
// written blind by someone who had not read the miner. Only aggregate figures are printed; the
// sentence-level disagreements are shown only with ECHOLINE_HELDOUT_SHOW=1, which is for moving a
// failure to the tuning set (and replacing it from reserve.json), never for tuning in place.
import { readFileSync } from "node:fs";
import path from "node:path";
import type { MinedDocument, Statement } from "@/lib/mining/index";
import { normaliseSentence } from "@/lib/mining/sentences";

export const heldoutDir = path.resolve(import.meta.dirname, "../../fixtures/miner-heldout");

export type HeldoutStatement = {
  kind: "threshold" | "reported";
  statistic: string;
  statistic_label?: string | null;
  comparator: string;
  value: number;
  framing: "fixed" | "contextual" | "disputed" | null;
};
export type HeldoutCitation = {
  first_author: string;
  year: string;
  locator: string | null;
  secondary: boolean;
  cited_in?: { first_author: string; year: string };
};
export type HeldoutItem = {
  id: string;
  style: string;
  discipline?: string;
  class?: string;
  text: string;
  references?: string[];
  sentences: { text: string; statements: HeldoutStatement[]; citations?: HeldoutCitation[] }[];
};

export function loadHeldout(file = "heldout.json"): HeldoutItem[] {
  return (JSON.parse(readFileSync(path.join(heldoutDir, file), "utf8")) as { items: HeldoutItem[] }).items;
}

/** The document the miner gets: the passage, and for numbered styles its reference list after a heading. */
export function documentText(item: HeldoutItem): string {
  return item.references?.length ? `${item.text}\n\nReferences\n${item.references.join("\n")}` : item.text;
}

export type HeldoutTally = {
  tp: Record<string, number>;
  fp: Record<string, number>;
  fn: Record<string, number>;
  matchedThresholds: number;
  comparatorOk: number;
  matched: number;
  framingOk: number;
  goldCitations: number;
  foundCitations: number;
  locatorOk: number;
  secondaryOk: number;
  secondaryGold: number;
  secondaryFound: number;
  firstAuthorOk: number;
  negatives: number;
  negativesWithStatement: number;
  byStyle: Record<string, { tp: number; fp: number; fn: number }>;
  disagreements: string[];
};

export function newHeldoutTally(): HeldoutTally {
  return {
    tp: {},
    fp: {},
    fn: {},
    matchedThresholds: 0,
    comparatorOk: 0,
    matched: 0,
    framingOk: 0,
    goldCitations: 0,
    foundCitations: 0,
    locatorOk: 0,
    secondaryOk: 0,
    secondaryGold: 0,
    secondaryFound: 0,
    firstAuthorOk: 0,
    negatives: 0,
    negativesWithStatement: 0,
    byStyle: {},
    disagreements: [],
  };
}

const inc = (r: Record<string, number>, k: string) => (r[k] = (r[k] ?? 0) + 1);
const words = (s: string) => new Set(normaliseSentence(s).split(/\s+/).filter(Boolean));

/** Index of the gold sentence a mined sentence belongs to: the one sharing most words (Jaccard ≥ 0.5). */
function sentenceIndex(item: HeldoutItem, mined: string): number {
  const m = words(mined);
  let best = -1;
  let bestScore = 0.5;
  item.sentences.forEach((s, i) => {
    const g = words(s.text);
    let shared = 0;
    for (const w of m) if (g.has(w)) shared++;
    const jaccard = shared / Math.max(1, m.size + g.size - shared);
    if (jaccard >= bestScore) {
      best = i;
      bestScore = jaccard;
    }
  });
  return best;
}

const sameValue = (a: number | null, b: number) => a !== null && Math.abs(a - b) <= 1e-9 * Math.max(1, Math.abs(b));

/** First surname in an authors string as the miner writes it ("Okafor & Lindqvist", "Okafor et al."). */
export function firstSurname(authors: string): string {
  const first = authors.split(/\s*(?:&|,|;|\band\b|\bet al\b\.?)\s*/)[0] ?? "";
  return normaliseName(first);
}
export function normaliseName(s: string): string {
  return s
    .normalize("NFD")
    .replace(/\p{M}/gu, "")
    .toLowerCase()
    .replace(/\b(jr|sr|ii|iii)\b\.?/g, "")
    .replace(/[^\p{L}]/gu, "");
}

export function scoreItem(t: HeldoutTally, item: HeldoutItem, doc: MinedDocument): void {
  const style = (t.byStyle[item.style] ??= { tp: 0, fp: 0, fn: 0 });
  const preds = doc.statements
    .filter((s) => s.kind === "threshold" || s.kind === "reported")
    .map((p) => ({ p, at: sentenceIndex(item, p.sentence), used: false }));
  const show = (what: string, text: string) => t.disagreements.push(`${item.id} [${item.style}] ${what} | ${text}`);

  item.sentences.forEach((s, i) => {
    const mine = preds.filter((x) => x.at === i);
    if (s.statements.length === 0) {
      t.negatives++;
      if (mine.length) {
        t.negativesWithStatement++;
        show(`NEGATIVE gave ${mine.map((x) => describe(x.p)).join("; ")}`, s.text);
      }
    }
    for (const g of s.statements) {
      const cands = mine.filter((x) => !x.used && x.p.kind === g.kind && x.p.statistic === g.statistic);
      const hit = cands.find((x) => sameValue(x.p.value, g.value));
      if (!hit) {
        inc(t.fn, g.kind);
        style.fn++;
        show(`MISSED ${g.kind} ${g.statistic} ${g.comparator} ${g.value}`, s.text);
        continue;
      }
      hit.used = true;
      inc(t.tp, g.kind);
      style.tp++;
      t.matched++;
      if (hit.p.comparator === g.comparator) t.comparatorOk++;
      else show(`COMPARATOR got ${hit.p.comparator} want ${g.comparator}`, s.text);
      if (g.kind === "threshold") {
        t.matchedThresholds++;
        if (hit.p.framing === g.framing) t.framingOk++;
        else show(`FRAMING got ${hit.p.framing} want ${g.framing}`, s.text);
      }
    }
    // Citations of this sentence, from the document's list of every in-text citation.
    const cites = doc.citations.filter((c) => sentenceIndex(item, c.sentence) === i).map((c) => ({ c, used: false }));
    for (const g of s.citations ?? []) {
      t.goldCitations++;
      if (g.secondary) t.secondaryGold++;
      const hit = cites.find((x) => !x.used && x.c.year.replace(/\s/g, "") === g.year.replace(/\s/g, ""));
      if (!hit) {
        show(`CITATION MISSED ${g.year}`, s.text);
        continue;
      }
      hit.used = true;
      t.foundCitations++;
      if (Boolean(hit.c.locator) === Boolean(g.locator)) t.locatorOk++;
      else show(`LOCATOR got ${hit.c.locator} want ${g.locator}`, s.text);
      if (hit.c.secondary === g.secondary) t.secondaryOk++;
      else show(`SECONDARY got ${hit.c.secondary} want ${g.secondary}`, s.text);
      if (g.secondary && hit.c.secondary) t.secondaryFound++;
      if (firstSurname(hit.c.authors) === normaliseName(g.first_author)) t.firstAuthorOk++;
      else show(`FIRST AUTHOR got ${hit.c.authors}`, s.text);
    }
  });
  for (const x of preds) {
    if (x.used) continue;
    inc(t.fp, x.p.kind);
    style.fp++;
    // Statements on a negative sentence were shown above.
    if (x.at < 0 || item.sentences[x.at].statements.length > 0) show(`EXTRA ${describe(x.p)}`, x.p.sentence);
  }
}

function describe(p: Statement): string {
  return `${p.kind} ${p.statistic}${p.statistic_label ? `(${p.statistic_label})` : ""} ${p.comparator} ${p.value} ${p.framing ?? ""}`.trim();
}

export function prf(t: HeldoutTally, kind: string) {
  const tp = t.tp[kind] ?? 0;
  const p = tp / Math.max(1, tp + (t.fp[kind] ?? 0));
  const r = tp / Math.max(1, tp + (t.fn[kind] ?? 0));
  return { precision: p, recall: r, f1: p + r === 0 ? 0 : (2 * p * r) / (p + r) };
}
