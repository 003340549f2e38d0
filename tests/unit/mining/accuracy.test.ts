// Measured accuracy of the miner on the hand-labelled gold set (tests/fixtures/gold, labels written
// before the extractor). Thresholds are the product's acceptance bar, not a published standard.
import { readFileSync } from "node:fs";
import path from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { createMiner, isErrorLine, mineText } from "@/lib/mining/index";
import { ensureGoldPdfs, generatedDir, interleavedExcerpts, pdfExcerpts } from "@/tests/fixtures/make-gold-pdfs";
import { f1, loadGold, newTally, score } from "./gold";

const gold = loadGold();

describe("miner accuracy on the gold set", () => {
  const t = newTally();
  const pdfTally = newTally();

  beforeAll(async () => {
    await ensureGoldPdfs();
    for (const { excerpt, text } of gold) score(t, excerpt, mineText(text).statements, "txt");
    const miner = createMiner();
    // The interleaved drawings are the same excerpts again, drawn line by line across the columns.
    for (const { id, file: name } of [...pdfExcerpts.map((e) => ({ id: e.id, file: e.id })), ...interleavedExcerpts]) {
      const file = path.join(generatedDir, `${name}.pdf`);
      const out = await miner.mine({ data: new Uint8Array(readFileSync(file)), filename: file });
      if (isErrorLine(out.line)) throw new Error(`${id}: ${out.line.error.message}`);
      const excerpt = gold.find((g) => g.excerpt.id === id)!.excerpt;
      score(t, excerpt, out.line.statements, "pdf");
      score(pdfTally, excerpt, out.line.statements, "pdf");
    }
    await miner.close();
    const goldStatements = gold.reduce(
      (n, g) => n + g.excerpt.sentences.reduce((m, s) => m + s.statements.length, 0),
      0,
    );
    const negatives = gold.reduce((n, g) => n + g.excerpt.negatives.length, 0);
    const row = (name: string, v: number, bar: number) => ({ measure: name, value: Number(v.toFixed(3)), bar });
    console.log(
      `gold: ${gold.length} excerpts, ${goldStatements} labelled statements, ${negatives} negatives; ${pdfExcerpts.length} also as PDF (${interleavedExcerpts.length} of them also drawn interleaved)`,
    );
    console.table([
      row("threshold F1", f1(t, "threshold"), 0.92),
      row("reported F1", f1(t, "reported"), 0.9),
      row("procedure F1", f1(t, "procedure"), 0),
      row("comparator accuracy", t.comparatorOk / t.matched, 0.97),
      row("value accuracy", t.valueOk / t.matched, 0.97),
      row("framing accuracy", t.framingOk / t.framingN, 0.85),
      row("locator presence accuracy", t.locatorOk / t.locatorN, 0.95),
      row("name of an 'other' statistic", t.labelOk / Math.max(1, t.labelN), 0),
      row("negatives without statement", t.negativesClean / t.negatives, 0.97),
      row("PDF only: threshold F1", f1(pdfTally, "threshold"), 0.92),
      row("PDF only: reported F1", f1(pdfTally, "reported"), 0.9),
    ]);
    if (t.errors.length) console.log(`disagreements:\n${t.errors.join("\n")}`);
  });

  it("finds threshold claims (F1 >= 0.92)", () => expect(f1(t, "threshold")).toBeGreaterThanOrEqual(0.92));
  it("finds reported values (F1 >= 0.90)", () => expect(f1(t, "reported")).toBeGreaterThanOrEqual(0.9));
  it("gets comparator and value right on matched statements (>= 0.97)", () => {
    expect(t.comparatorOk / t.matched).toBeGreaterThanOrEqual(0.97);
    expect(t.valueOk / t.matched).toBeGreaterThanOrEqual(0.97);
  });
  it("gets framing right (>= 0.85)", () => expect(t.framingOk / t.framingN).toBeGreaterThanOrEqual(0.85));
  it("tells whether citations carry a locator (>= 0.95)", () =>
    expect(t.locatorOk / t.locatorN).toBeGreaterThanOrEqual(0.95));
  it("gives no statement for at least 97% of the hard negatives", () =>
    expect(t.negativesClean / t.negatives).toBeGreaterThanOrEqual(0.97));
  it("holds on the PDF versions too", () => {
    expect(f1(pdfTally, "threshold")).toBeGreaterThanOrEqual(0.92);
    expect(f1(pdfTally, "reported")).toBeGreaterThanOrEqual(0.9);
    expect(pdfTally.negativesClean / pdfTally.negatives).toBeGreaterThanOrEqual(0.97);
  });
});
