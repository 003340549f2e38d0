// Loads pdf-parse (and with it pdf.js) once, on first use, without Node's source-map support.
//
// Why (measured with process.memoryUsage() under `node --import tsx`, which turns source maps on):
// pdf.js's legacy build carries core-js, which reads `new Error().stack` while its modules are
// evaluated. With source maps on, formatting that stack makes Node decode the map of every frame's
// file and keep it: pdf.mjs.map (2.3 MB) on import, pdf.worker.mjs.map (5.3 MB) when the first
// document starts pdf.js's in-thread worker. Importing the miner cost +157 MB RSS / +62 MB heap and
// the first PDF another ~290 MB RSS / ~150 MB heap; with the maps left out, +131 MB / +16 MB and
// ~180 MB / ~30 MB. So source maps are switched off only while these modules load (their stack traces
// then show the built files' own lines; every other module keeps its maps), and pdf.js gets its
// minified worker, which ships without a map, instead of looking up ./pdf.worker.mjs.
// A module that happens to load in the same few hundred milliseconds also loads without a map; that
// only changes how its stack traces read.
import { readFileSync } from "node:fs";
import { createRequire } from "node:module";
import { pathToFileURL } from "node:url";
import { runInThisContext } from "node:vm";

type PdfParseModule = typeof import("pdf-parse");

// A pdf.js bug (5.4.296, Catalog.getPageDict): while walking the page tree it prefetches the top-level
// kids into pageDictCache with xref.fetchAsync(ref) and does not wait for them. When one of those
// objects is damaged and the walk never comes back to it (a flipped byte in a kid's xref entry, or the
// cache being cleared by recovery), that promise rejects with nobody listening: Node reports an
// unhandled rejection (XRefEntryException, FormatError) though every promise the miner starts has a
// handler (reproduced with pdf.js alone, no pdf-parse, on flipped-byte copies of the gold PDFs). The
// miner cannot reach that promise, so the worker is loaded with one change: the prefetched promise
// gets a no-op handler as well; whoever awaits it later still sees the rejection. The text matched is
// the minified statement of this exact build; if it is not found once (another pdf.js version), the
// file is loaded unchanged and tests/unit/mining/unhandled.test.ts says so.
const UNWATCHED_PREFETCH = "o.put(r,n.fetchAsync(r))";
const WATCHED_PREFETCH = "o.put(r,(p=>(p.catch(()=>{}),p))(n.fetchAsync(r)))";

function patchedWorkerSource(file: string): string {
  const source = readFileSync(file, "utf8");
  if (source.split(UNWATCHED_PREFETCH).length !== 2) return source;
  return source.replace(UNWATCHED_PREFETCH, WATCHED_PREFETCH);
}

// The worker file is also not imported as a module: under `--import tsx` every ES module passes
// through tsx's loader thread, and this 1.1 MB file alone left ~77 MB more RSS behind there than a
// plain import (measured: +87 MB against +10 MB). It is a module only by its last statement
// (export{WorkerMessageHandler}, after it has set globalThis.pdfjsWorker) and one import.meta.url
// (the base for OpenJPEG's optional fallback file); with those two replaced it runs as a strict-mode
// function through node:vm, bypassing the loader. Dynamic import() inside it (only OpenJPEG's
// fallback, for JPX images, which text extraction does not need) then fails and pdf.js logs a
// warning, as it does whenever that file is missing. Anything unexpected: the ordinary import.
const WORKER_EXPORT = "export{WorkerMessageHandler};";

function runWorkerWithoutLoader(file: string): boolean {
  const source = patchedWorkerSource(file);
  if (
    source.split(WORKER_EXPORT).length !== 2 ||
    source.split("import.meta").length !== 2 ||
    !source.includes("import.meta.url")
  )
    return false;
  const body = source.replace(WORKER_EXPORT, "").replace("import.meta.url", JSON.stringify(pathToFileURL(file).href));
  try {
    runInThisContext(`(function () {"use strict";\n${body}\n})();`, { filename: file });
  } catch {
    return false;
  }
  const g = globalThis as { pdfjsWorker?: { WorkerMessageHandler?: unknown } };
  return typeof g.pdfjsWorker?.WorkerMessageHandler === "function";
}

async function loadWorker(file: string): Promise<void> {
  if (runWorkerWithoutLoader(file)) return;
  const source = patchedWorkerSource(file);
  await import(`data:text/javascript;base64,${Buffer.from(source).toString("base64")}`);
}

let loading: Promise<PdfParseModule> | null = null;

async function load(): Promise<PdfParseModule> {
  const mapsWereOn = process.sourceMapsEnabled;
  if (mapsWereOn) process.setSourceMapsEnabled(false);
  try {
    const mod = await import("pdf-parse");
    // The pdf.js that pdf-parse itself depends on, so that worker and API versions match.
    const fromPdfParse = createRequire(createRequire(import.meta.url).resolve("pdf-parse"));
    const workerFile = fromPdfParse.resolve("pdfjs-dist/legacy/build/pdf.worker.min.mjs");
    // Sets globalThis.pdfjsWorker, which pdf.js uses in place of importing its default worker file.
    await loadWorker(workerFile);
    return mod;
  } finally {
    if (mapsWereOn) process.setSourceMapsEnabled(true);
  }
}

/** pdf-parse, loaded once per process (or thread). */
export function loadPdfParse(): Promise<PdfParseModule> {
  loading ??= load().catch((err: unknown) => {
    // A failed load is retried by the next document rather than remembered.
    loading = null;
    throw err;
  });
  return loading;
}
