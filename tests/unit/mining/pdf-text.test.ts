// The PDF text layer as the miner sees it, checked against Debian's pdftotext (poppler-utils), the
// outside reference, on the generated gold PDFs.
import { execFileSync } from "node:child_process";
import { readFileSync } from "node:fs";
import path from "node:path";
import { PDFParse } from "pdf-parse";
import { beforeAll, describe, expect, it } from "vitest";
import { repairPages } from "@/lib/mining/text-repair";
import { createMiner, extractPdfPages, isErrorLine } from "@/lib/mining/index";
import { ensureGoldPdfs, generatedDir, interleavedExcerpts, pdfExcerpts } from "@/tests/fixtures/make-gold-pdfs";

function words(s: string): string[] {
  return s
    .replace(/-\s*\n\s*/g, "")
    .replace(/[^\p{L}\p{N}.%]+/gu, " ")
    .toLowerCase()
    .split(/\s+/)
    .filter(Boolean);
}
/** Word-multiset overlap (Dice coefficient on bags of words). */
function similarity(a: string[], b: string[]): number {
  const count = new Map<string, number>();
  for (const w of a) count.set(w, (count.get(w) ?? 0) + 1);
  let common = 0;
  for (const w of b) {
    const c = count.get(w) ?? 0;
    if (c > 0) {
      common++;
      count.set(w, c - 1);
    }
  }
  return (2 * common) / Math.max(1, a.length + b.length);
}

/** The page texts the miner reads (positions → reading order), before text repair. */
async function ourPages(file: string): Promise<string[]> {
  return (await extractPdfPages(new Uint8Array(readFileSync(file)))).pages;
}

/** pdf-parse's own getText(): drawing order, kept to show what the layout step repairs. */
async function pdfParsePages(file: string): Promise<string[]> {
  const p = new PDFParse({ data: new Uint8Array(readFileSync(file)), verbosity: 0 });
  try {
    return (await p.getText()).pages.map((x) => x.text);
  } finally {
    await p.destroy();
  }
}

/** Share of b's consecutive word pairs also found in a: a bag of words cannot see order, this can. */
function bigramRecall(a: string, b: string): number {
  const pairs = (w: string[]) => w.slice(1).map((x, j) => `${w[j]} ${x}`);
  const have = new Set(pairs(words(a)));
  const want = pairs(words(b));
  return want.filter((x) => have.has(x)).length / Math.max(1, want.length);
}

function pdftotextPages(file: string, layout: boolean): string[] {
  const out = execFileSync("pdftotext", [...(layout ? ["-layout"] : []), "-enc", "UTF-8", file, "-"], {
    encoding: "utf8",
  });
  const pages = out.split("\f");
  if (!pages.at(-1)!.trim()) pages.pop();
  return pages;
}

describe("PDF text layer against pdftotext", () => {
  beforeAll(() => ensureGoldPdfs());

  for (const { id, columns } of pdfExcerpts) {
    it(`${id}: every page has the same words as pdftotext (similarity >= 0.95)`, async () => {
      const file = path.join(generatedDir, `${id}.pdf`);
      const ours = await ourPages(file);
      const plain = pdftotextPages(file, false);
      const layout = pdftotextPages(file, true);
      expect(ours.length).toBe(plain.length);
      for (let i = 0; i < ours.length; i++) {
        expect(similarity(words(ours[i]), words(plain[i]))).toBeGreaterThanOrEqual(0.95);
        expect(similarity(words(ours[i]), words(layout[i]))).toBeGreaterThanOrEqual(0.95);
      }
      if (columns === 2) expect(bigramRecall(ours.join("\n"), plain.join("\n"))).toBeGreaterThanOrEqual(0.9);
    });
  }

  for (const { id, file: name } of interleavedExcerpts) {
    it(`${name}: a page drawn line by line across the columns reads in pdftotext's column order`, async () => {
      const file = path.join(generatedDir, `${name}.pdf`);
      const ours = await ourPages(file);
      const plain = pdftotextPages(file, false);
      const drawn = await pdfParsePages(file);
      expect(ours.length).toBe(plain.length);
      // Page 1 holds two full columns; pdf-parse's drawing order scrambles it (the fixture bites) ...
      expect(bigramRecall(drawn[0], plain[0])).toBeLessThan(0.9);
      // ... and the geometry restores the order pdftotext (Debian poppler-utils) reads, page by page.
      for (let i = 0; i < ours.length; i++) {
        expect(similarity(words(ours[i]), words(plain[i]))).toBeGreaterThanOrEqual(0.95);
        expect(bigramRecall(ours[i], plain[i])).toBeGreaterThanOrEqual(0.9);
      }
      // Same text as the column-by-column drawing of the same excerpt.
      expect(ours).toEqual(await ourPages(path.join(generatedDir, `${id}.pdf`)));
    });
  }

  it("interleaved drawing: a sentence running over lines of the left column comes out intact", async () => {
    const file = path.join(generatedDir, "15-hospital-ehr-interleaved.pdf");
    const out = await createMiner().mine({ data: new Uint8Array(readFileSync(file)), filename: file });
    if (isErrorLine(out.line)) throw new Error(out.line.error.message);
    // Gold sentence of tests/fixtures/gold/15-hospital-ehr.txt; it spans six lines of the left column.
    expect(out.line.statements.map((s) => s.sentence)).toContain(
      "To deal with the endogeneity of record usability, a two-stage least squares procedure was used in which the first-stage residuals replaced usability as the regressor in the second-stage model [5].",
    );
    const plain = pdftotextPages(file, false).join("\n").replace(/-\n/g, "").replace(/\s+/g, " ");
    expect(plain).toContain("a two-stage least squares procedure was used in which the first-stage residuals");
    // pdf-parse alone breaks it: the right column's lines fall between the left column's.
    const drawn = (await pdfParsePages(file)).join("\n").replace(/-\n/g, "").replace(/\s+/g, " ");
    expect(drawn).not.toContain("a two-stage least squares procedure was used in which the first-stage residuals");
  });

  it("two-column pages keep a sentence that runs over several column lines intact", async () => {
    const file = path.join(generatedDir, "15-hospital-ehr.pdf");
    const out = await createMiner().mine({ data: new Uint8Array(readFileSync(file)), filename: file });
    if (isErrorLine(out.line)) throw new Error(out.line.error.message);
    const sentences = out.line.statements.map((s) => s.sentence);
    expect(sentences).toContain(
      "To deal with the endogeneity of record usability, a two-stage least squares procedure was used in which the first-stage residuals replaced usability as the regressor in the second-stage model [5].",
    );
    // and pdftotext (plain) reads the same sentence in the same order
    const plain = pdftotextPages(file, false).join("\n").replace(/-\n/g, "").replace(/\s+/g, " ");
    expect(plain).toContain("a two-stage least squares procedure was used in which the first-stage residuals");
  });

  it("running headers, footers and page numbers are removed and line-end hyphens repaired", async () => {
    const file = path.join(generatedDir, "12-app-usability.pdf");
    const pages = repairPages(await ourPages(file));
    expect(pages.length).toBeGreaterThanOrEqual(2);
    const all = pages.join("\n");
    expect(all).not.toContain("Licensed for text mining");
    expect(all).not.toContain("Journal of Digital Care Design (2020)");
    expect(all).not.toMatch(/\p{Ll}-\n\p{Ll}/u);
  });
});
