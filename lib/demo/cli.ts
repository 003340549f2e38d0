/**
 * `npm run demo:generate -- --out DIR [--count N] [--seed S] [--pages P]`
 * Writes the invented demo PDFs plus metadata.csv and metadata.bib (doi, title, authors, year,
 * venue, licence per file) to DIR, for manual uploads and for benchmarks.
 */
import { mkdir, writeFile } from "node:fs/promises";
import path from "node:path";
import { parseArgs } from "node:util";
import { DEFAULT_COUNT, DEFAULT_SEED, generateCorpus, originCounts } from "./corpus";
import { pdfFilename, renderArticlePdf, renderMetadataBibtex, renderMetadataCsv } from "./render";

function intOption(name: string, raw: string | undefined, fallback: number): number {
  if (raw === undefined) return fallback;
  const n = Number(raw);
  if (!Number.isInteger(n)) throw new Error(`--${name} must be an integer, got "${raw}"`);
  return n;
}

async function main(): Promise<void> {
  const { values } = parseArgs({
    options: {
      out: { type: "string" },
      count: { type: "string" },
      seed: { type: "string" },
      pages: { type: "string" },
      help: { type: "boolean" },
    },
    strict: true,
  });
  if (values.help || !values.out) {
    console.error("usage: npm run demo:generate -- --out DIR [--count N] [--seed S] [--pages P]");
    process.exit(values.help ? 0 : 1);
  }
  const count = intOption("count", values.count, DEFAULT_COUNT);
  const seed = intOption("seed", values.seed, DEFAULT_SEED);
  const pagesPerArticle = intOption("pages", values.pages, 3);
  const corpus = generateCorpus({ count, seed, pagesPerArticle });
  const out = path.resolve(values.out);
  await mkdir(out, { recursive: true });
  const t0 = performance.now();
  for (const a of corpus.articles) await writeFile(path.join(out, pdfFilename(a)), await renderArticlePdf(a));
  await writeFile(path.join(out, "metadata.csv"), renderMetadataCsv(corpus));
  await writeFile(path.join(out, "metadata.bib"), renderMetadataBibtex(corpus));
  const secs = (performance.now() - t0) / 1000;
  console.error(`wrote ${corpus.articles.length} invented demo PDFs and metadata to ${out} in ${secs.toFixed(1)} s`);
  console.error(`threshold claims by sourcing: ${JSON.stringify(originCounts(corpus))}`);
}

main().catch((err: unknown) => {
  console.error(err instanceof Error ? err.message : String(err));
  process.exit(1);
});
