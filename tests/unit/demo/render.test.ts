import { execFileSync } from "node:child_process";
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { createHash } from "node:crypto";
import { afterAll, describe, expect, it } from "vitest";
import Papa from "papaparse";
import { Cite } from "@citation-js/core";
import "@citation-js/plugin-bibtex";
import { generateCorpus, type DemoArticle } from "@/lib/demo/corpus";
import { INVENTED_LINE, renderArticlePdf, renderMetadataBibtex, renderMetadataCsv } from "@/lib/demo/render";

// The outside reference for the text layer is Debian's poppler-utils (pdftotext, pdfinfo).
const dir = mkdtempSync(path.join(tmpdir(), "echoline-demo-"));
afterAll(() => rmSync(dir, { recursive: true, force: true }));
const corpus = generateCorpus({ count: 60, pagesPerArticle: 5 });
const norm = (s: string) => s.replace(/\s+/g, " ").trim();

async function write(a: DemoArticle): Promise<string> {
  const file = path.join(dir, `${a.id}.pdf`);
  writeFileSync(file, await renderArticlePdf(a));
  return file;
}
const pdftotext = (file: string, args: string[] = []) =>
  execFileSync("pdftotext", [...args, "-enc", "UTF-8", file, "-"], { encoding: "utf8" });
function pdfinfo(file: string): Record<string, string> {
  const out = execFileSync("pdfinfo", ["-enc", "UTF-8", file], { encoding: "utf8" });
  return Object.fromEntries(
    out
      .split("\n")
      .filter((l) => l.includes(":"))
      .map((l) => [l.slice(0, l.indexOf(":")), l.slice(l.indexOf(":") + 1).trim()]),
  );
}
const methodsSentences = (a: DemoArticle) =>
  a.blocks
    .filter((b) => b.section === "methods")
    .flatMap((b) => b.paragraphs.flat())
    .map((s) => s.text);

describe("demo PDFs, read back with pdftotext and pdfinfo", () => {
  const single = corpus.articles.find((a) => !a.twoColumn && !a.isMethodsArticle && a.year > 2010)!;
  const double = corpus.articles.find((a) => a.twoColumn && !a.isMethodsArticle && a.year > 2010)!;

  it("single column: title, the invented line and every methods sentence come out intact", async () => {
    const file = await write(single);
    const text = norm(pdftotext(file));
    expect(text).toContain(norm(single.title));
    expect(text).toContain(INVENTED_LINE);
    expect(text).toContain(`https://doi.org/${single.doi}`);
    expect(text).toContain("CC BY 4.0");
    const sentences = methodsSentences(single);
    expect(sentences.some((s) => /Cronbach's alpha|α/.test(s))).toBe(true);
    for (const s of sentences) expect(text).toContain(norm(s));
  });

  it("pdfinfo reports the page count, the info dictionary and A4; each page carries its journal page number", async () => {
    const file = await write(single);
    const info = pdfinfo(file);
    const pages = Number(info.Pages);
    expect(pages).toBeGreaterThanOrEqual(3);
    expect(info.Title).toBe(single.title);
    expect(info.Subject).toBe(single.venueName);
    expect(info.Keywords).toContain(`doi:${single.doi}`);
    expect(info.Author.split("; ")[0]).toBe(`${single.authors[0].family}, ${single.authors[0].initials}`);
    expect(info["Page size"]).toMatch(/595\.28 x 841\.89/);
    for (let p = 1; p <= pages; p++) {
      const lines = pdftotext(file, ["-f", String(p), "-l", String(p)])
        .split("\n")
        .map((l) => l.trim())
        .filter(Boolean);
      expect(lines.at(-1)).toBe(String(single.firstPage + p - 1));
      if (p > 1) expect(lines[0]).toContain(`${single.venueName} · invented demo venue`);
    }
  });

  it("two columns: pdftotext keeps nearly all methods sentences whole (a sentence may straddle a column break)", async () => {
    const file = await write(double);
    const text = norm(pdftotext(file));
    expect(text).toContain(INVENTED_LINE);
    const sentences = methodsSentences(double);
    const intact = sentences.filter((s) => text.includes(norm(s))).length;
    expect(intact / sentences.length).toBeGreaterThanOrEqual(0.8);
  });

  it("pagesPerArticle makes long PDFs for benchmarks", async () => {
    const long = generateCorpus({ count: 12, pagesPerArticle: 30 }).articles.find(
      (a) => !a.isMethodsArticle && !a.twoColumn,
    )!;
    const pages = Number(pdfinfo(await write(long)).Pages);
    expect(pages).toBeGreaterThanOrEqual(22);
    expect(pages).toBeLessThanOrEqual(40);
  });

  it("renders the same bytes twice (the loader's idempotency relies on the file hash)", async () => {
    const h = async () =>
      createHash("sha256")
        .update(await renderArticlePdf(double))
        .digest("hex");
    expect(await h()).toBe(await h());
  });
});

describe("upload metadata", () => {
  it("CSV parses (papaparse) into one row per file with doi, title, authors, year, venue, licence", () => {
    const parsed = Papa.parse<Record<string, string>>(renderMetadataCsv(corpus), {
      header: true,
      skipEmptyLines: true,
    });
    expect(parsed.errors).toEqual([]);
    expect(parsed.data).toHaveLength(corpus.articles.length);
    const row = parsed.data.find((r) => r.doi === corpus.articles[7].doi)!;
    expect(row.title).toBe(corpus.articles[7].title);
    expect(row.year).toBe(String(corpus.articles[7].year));
    expect(row.venue).toBe(corpus.articles[7].venueName);
    expect(row.licence).toBe("CC BY 4.0");
    expect(row.filename).toBe(`${corpus.articles[7].id}.pdf`);
  });

  it("BibTeX parses with citation-js into the same DOIs, titles and authors", () => {
    // citation-js's bundled typings declare a zero-argument constructor; the documented call takes the input.
    const CiteWithInput = Cite as unknown as new (input: string) => { data: unknown[] };
    const items = new CiteWithInput(renderMetadataBibtex(corpus)).data as {
      DOI?: string;
      title?: string;
      author?: { family?: string }[];
      issued?: { "date-parts"?: number[][] };
    }[];
    expect(items).toHaveLength(corpus.articles.length);
    for (const a of corpus.articles) {
      const it = items.find((x) => x.DOI === a.doi);
      expect(it, a.doi).toBeDefined();
      expect(it!.title).toBe(a.title);
      expect(it!.author?.map((p) => p.family)).toEqual(a.authors.map((p) => p.family));
      expect(it!.issued?.["date-parts"]?.[0]?.[0]).toBe(a.year);
    }
  });
});
