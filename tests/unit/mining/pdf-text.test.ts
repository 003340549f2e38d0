// The PDF text layer as the miner sees it, checked against Debian's pdftotext (poppler-utils), the
// outside reference, on the generated gold PDFs.
import { execFileSync } from "node:child_process";
import { readFileSync } from "node:fs";
import path from "node:path";
import { PDFParse } from "pdf-parse";
import { beforeAll, describe, expect, it } from "vitest";
import { repairPages } from "@/lib/mining/text-repair";
import { createMiner, isErrorLine } from "@/lib/mining/index";
import { ensureGoldPdfs, generatedDir, pdfExcerpts } from "@/tests/fixtures/make-gold-pdfs";

function words(s: string): string[] {
  return s.replace(/-\s*\n\s*/g, "").replace(/[^\p{L}\p{N}.%]+/gu, " ").toLowerCase().split(/\s+/).filter(Boolean);
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

async function pdfParsePages(file: string): Promise<string[]> {
  const p = new PDFParse({ data: new Uint8Array(readFileSync(file)), verbosity: 0 });
  try {
    return (await p.getText()).pages.map((x) => x.text);
  } finally {
    await p.destroy();
  }
}

function pdftotextPages(file: string, layout: boolean): string[] {
  const out = execFileSync("pdftotext", [...(layout ? ["-layout"] : []), "-enc", "UTF-8", file, "-"], { encoding: "utf8" });
  const pages = out.split("\f");
  if (!pages.at(-1)!.trim()) pages.pop();
  return pages;
}

describe("PDF text layer against pdftotext", () => {
  beforeAll(() => ensureGoldPdfs());

  for (const { id, columns } of pdfExcerpts) {
    it(`${id}: every page has the same words as pdftotext (similarity >= 0.95)`, async () => {
      const file = path.join(generatedDir, `${id}.pdf`);
      const ours = await pdfParsePages(file);
      const plain = pdftotextPages(file, false);
      const layout = pdftotextPages(file, true);
      expect(ours.length).toBe(plain.length);
      for (let i = 0; i < ours.length; i++) {
        expect(similarity(words(ours[i]), words(plain[i]))).toBeGreaterThanOrEqual(0.95);
        expect(similarity(words(ours[i]), words(layout[i]))).toBeGreaterThanOrEqual(0.95);
      }
      if (columns === 2) {
        // Reading order: pdftotext's plain mode follows columns; a bag of words cannot see order, so
        // compare word sequences too (fraction of pdftotext's word bigrams also found in ours).
        const bigrams = (w: string[]) => new Set(w.slice(1).map((x, j) => `${w[j]} ${x}`));
        const a = bigrams(words(ours.join("\n")));
        const b = [...bigrams(words(plain.join("\n")))];
        expect(b.filter((x) => a.has(x)).length / b.length).toBeGreaterThanOrEqual(0.9);
      }
    });
  }

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
    const pages = repairPages(await pdfParsePages(file));
    expect(pages.length).toBeGreaterThanOrEqual(2);
    const all = pages.join("\n");
    expect(all).not.toContain("Licensed for text mining");
    expect(all).not.toContain("Journal of Digital Care Design (2020)");
    expect(all).not.toMatch(/\p{Ll}-\n\p{Ll}/u);
  });
});
