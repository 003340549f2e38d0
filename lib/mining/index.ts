// Public API of the miner, shared by the CLI (lib/mining/cli.ts) and the background worker.
import type { PDFParse } from "pdf-parse";
import { findCitations, stripCitations } from "./citations";
import {
  ContractLine,
  type DocumentCitation,
  type ErrorCode,
  type ErrorLine,
  type Reference,
  type Section,
  type Statement,
  SuccessLine,
} from "./contract";
import { checkJats, looksLikeXml, parseJats } from "./jats";
import { compileProcedures, defaultProcedures, type ProcedurePattern } from "./procedures";
import { normaliseDoi, parseReferenceList } from "./references";
import { isReferenceHeading, parseHeading } from "./sections";
import { splitSentences } from "./sentences";
import { extractStatements, lastStatistic } from "./statements";
import { type PositionedItem, pageLinesInReadingOrder } from "./layout";
import { closesSentence, nonProseLine, nonProseSentence } from "./nonprose";
import { loadPdfParse } from "./pdfjs";
import { repairDecimals, repairPages } from "./text-repair";

export type { ProcedurePattern } from "./procedures";
export { defaultProcedures } from "./procedures";
export * from "./contract";

export type ArticleMeta = {
  title: string | null;
  authors: string[];
  year: string | null;
  doi: string | null;
  venue: string | null;
  licence: string | null;
  firstPageText: string | null;
};
export type MineOutput = { line: ContractLine; timings: { readMs: number; mineMs: number }; meta: ArticleMeta };
export type MinerOptions = {
  procedures?: ProcedurePattern[];
  maxPages?: number;
  maxBytes?: number;
  timeoutMs?: number;
};
export type Miner = {
  mine(input: { data: Uint8Array; filename: string }): Promise<MineOutput>;
  close(): Promise<void>;
};
export type MineTextOptions = { procedures?: ProcedurePattern[]; file?: string };
export type MinedDocument = Omit<SuccessLine, "file">;

export const DEFAULT_MAX_BYTES = 50 * 1024 * 1024;
export const DEFAULT_MAX_PAGES = 2000;
export const DEFAULT_TIMEOUT_MS = 60_000;

const emptyMeta = (): ArticleMeta => ({
  title: null,
  authors: [],
  year: null,
  doi: null,
  venue: null,
  licence: null,
  firstPageText: null,
});

class MineError extends Error {
  constructor(
    readonly code: ErrorCode,
    message: string,
  ) {
    super(message);
  }
}

/** `nonProse`: code, console output, formulas or table rows; its sentences give no statements. */
type Block = { section: Section; nonProse: boolean; chunks: { page: number; text: string; newParagraph?: boolean }[] };

export type MinePagesOptions = MineTextOptions & {
  referenceLines?: string[];
  /** Per page (index 0 = page 1): the trimmed lines that the PDF layer set in a monospaced font. */
  monoLines?: ReadonlySet<string>[];
};

/** Mine already-extracted page texts (one string per page). */
export function minePages(pages: string[], opts: MinePagesOptions = {}): MinedDocument {
  const matchProcedure = compileProcedures(opts.procedures ?? defaultProcedures);
  const blocks: Block[] = [];
  const refLines: string[] = [...(opts.referenceLines ?? [])];
  let section: Section = "unknown";
  let topSection: Section = "unknown";
  let inRefs = false;
  let current: Block = { section, nonProse: false, chunks: [] };
  blocks.push(current);
  let paragraphBreak = false;
  const startBlock = (nonProse: boolean) => {
    current = { section, nonProse, chunks: [] };
    blocks.push(current);
  };
  pages.forEach((pageText, pi) => {
    const page = pi + 1;
    const mono = opts.monoLines?.[pi];
    for (const line of pageText.split("\n")) {
      const t = line.trim();
      if (isReferenceHeading(t)) {
        inRefs = true;
        continue;
      }
      if (inRefs) {
        // An appendix after the references goes back to the body.
        if (/^(?:appendix|appendices|supplementary material)\b/i.test(t) && t.length < 60) inRefs = false;
        else {
          refLines.push(line);
          continue;
        }
      }
      const h = t ? parseHeading(t) : null;
      // A line inside a paragraph (previous line did not end a sentence) is not a heading.
      const prev = current.chunks.at(-1)?.text.trimEnd() ?? "";
      if (h && (!prev || /[.!?:)"”]$/.test(prev) || /\n\s*$/.test(current.chunks.at(-1)?.text ?? "\n"))) {
        if (h.section) {
          if (
            h.level === 1 ||
            ["results", "discussion", "introduction"].includes(h.section) ||
            topSection === "unknown" ||
            topSection === "other"
          ) {
            topSection = h.section;
          }
          section =
            h.section === "methods" && ["results", "discussion"].includes(topSection) && h.level > 1
              ? topSection
              : h.section;
          if (h.level === 1) topSection = h.section;
        } else if (h.level > 1 || (section !== "unknown" && section !== "other" && !/^\d/.test(t))) {
          section = topSection === "unknown" ? "other" : section;
        } else {
          section = section === "unknown" && blocks.length === 1 && !current.chunks.length ? "unknown" : "other";
          if (h.level === 1 && /^\d/.test(t)) topSection = "other";
        }
        startBlock(false);
        continue;
      }
      if (!t) {
        // A blank line between two lines of one page is a paragraph break: the sentence ends there even
        // without a full stop (a heading-like line, a caption, a list item). Across a page it is not.
        const last = current.chunks.at(-1);
        if (last && last.page === page && !/[-‐–,]\s*$/.test(last.text)) paragraphBreak = true;
        continue;
      }
      const kind = mono?.has(t) ? "code" : nonProseLine(t);
      // A table-like or formula-like line that closes an open prose sentence ("… (Okafor,\n2002).",
      // "… reached\nα = .89.") is the tail of that sentence, not a table row or a formula.
      const last = current.chunks.at(-1);
      const tail =
        (kind === "table" || kind === "formula") &&
        !current.nonProse &&
        !paragraphBreak &&
        !!last &&
        !/[.!?:]\s*$/.test(last.text) &&
        closesSentence(t);
      const nonProse = kind !== null && !tail;
      if (nonProse !== current.nonProse) startBlock(nonProse);
      current.chunks.push({ page, text: line + "\n", newParagraph: paragraphBreak });
      paragraphBreak = false;
    }
  });

  const references: Reference[] = refLines.some((l) => l.trim()) ? parseReferenceList(refLines.join("\n")) : [];
  const numbered = new Map<number, Reference>();
  for (const r of references) if (r.number) numbered.set(r.number, r);

  const statements: Statement[] = [];
  const citations: DocumentCitation[] = [];
  for (const block of blocks) {
    if (!block.chunks.length) continue;
    let flat = "";
    const starts: { at: number; page: number }[] = [];
    // Paragraphs are split into sentences one by one, so a paragraph without a final full stop ends
    // its last sentence (the statement context, previousStatistic, still runs on through the block).
    const paragraphs: string[] = [];
    let paragraph = "";
    for (const c of block.chunks) {
      if (c.newParagraph && paragraph) {
        paragraphs.push(paragraph);
        paragraph = "";
      }
      const piece = repairDecimals(`${c.text.replace(/\s+/g, " ").trim()} `);
      starts.push({ at: flat.length, page: c.page });
      flat += piece;
      paragraph += piece;
    }
    if (paragraph) paragraphs.push(paragraph);
    let cursor = 0;
    // Sentences come in text order, so the page lookup walks forward with them (a scan of every
    // line start per sentence was quadratic in the length of a section).
    let si = 0;
    let previousStatistic: ReturnType<typeof lastStatistic> = null;
    for (const sentence of paragraphs.flatMap((p) => splitSentences(repairDecimals(p)))) {
      const at = flat.indexOf(sentence.slice(0, 20), cursor);
      const pos = at >= 0 ? at : cursor;
      cursor = at >= 0 ? at + sentence.length : cursor;
      while (si + 1 < starts.length && starts[si + 1].at <= pos) si++;
      const page = starts[si].page;
      // Code, output, formulas and table rows give neither statements nor citations ("[1] 0.5" is R's
      // printed output, not reference 1).
      if (block.nonProse || nonProseSentence(sentence)) continue;
      const cites = findCitations(sentence, numbered);
      for (const c of cites) citations.push({ ...c, page, sentence });
      const stripped = stripCitations(sentence);
      let last: ReturnType<typeof lastStatistic> = null;
      const found = extractStatements(stripped, matchProcedure, {
        hasCitation: cites.length > 0,
        previousStatistic,
        onLastStatistic: (k) => (last = k),
      });
      previousStatistic = last ?? previousStatistic;
      for (const st of found) {
        statements.push({ page, section: block.section, sentence, ...st, citations: cites });
      }
    }
  }
  return { pages: pages.length, statements, citations, references };
}

/** Mine plain text. A form feed (\f) separates pages, as pdftotext writes them. */
export function mineText(text: string, opts: MineTextOptions = {}): MinedDocument {
  const pages = text.split("\f");
  if (pages.length > 1 && !pages.at(-1)!.trim()) pages.pop();
  return minePages(pages, opts);
}

function metaFromText(firstPage: string): Partial<ArticleMeta> {
  const lines = firstPage
    .split("\n")
    .map((l) => l.trim())
    .filter(Boolean);
  const year = /\b(19[5-9]\d|20\d{2})\b/.exec(lines.slice(0, 8).join(" "))?.[1] ?? null;
  const licence =
    /https?:\/\/creativecommons\.org\/[^\s)]+/i.exec(firstPage)?.[0] ??
    /\bCC[- ]BY(?:[- ](?:NC|SA|ND))*(?:[- ]\d\.\d)?\b/.exec(firstPage)?.[0] ??
    null;
  return { title: lines[0] ?? null, year, doi: normaliseDoi(firstPage), licence, firstPageText: firstPage };
}

function errorOutput(file: string, code: ErrorCode, message: string, readMs = 0, mineMs = 0): MineOutput {
  const line: ErrorLine = { file, error: { code, message } };
  return { line, timings: { readMs, mineMs }, meta: emptyMeta() };
}

function withTimeout<T>(p: Promise<T>, ms: number, onTimeout: () => void): Promise<T> {
  let timer: NodeJS.Timeout | undefined;
  return Promise.race([
    p,
    new Promise<T>((_r, reject) => {
      timer = setTimeout(() => {
        onTimeout();
        reject(
          new MineError(
            "timeout",
            `Mining took longer than ${Math.round(ms / 1000)} s and was stopped; the file may be damaged or unusually complex.`,
          ),
        );
      }, ms);
      timer.unref?.();
    }),
  ]).finally(() => clearTimeout(timer));
}

function classifyPdfError(err: unknown): MineError {
  if (err instanceof MineError) return err;
  const name = err instanceof Error ? err.name : "";
  const msg = err instanceof Error ? err.message : String(err);
  if (name === "PasswordException" || /password/i.test(msg)) {
    return new MineError(
      "encrypted",
      "The PDF is encrypted (password protected); remove the protection before uploading it.",
    );
  }
  return new MineError("corrupt", `The PDF could not be read; it looks truncated or damaged (${msg.slice(0, 200)}).`);
}

// Keeping a parser warm (measured, 20 generated PDFs of 1–2 pages, 36 pages, median of 12 alternating
// runs on a busy 2-core machine): PDFParse binds one document at construction, but everything costly
// behind it is already loaded once per process. Under Node pdf.js runs a "fake" worker in this thread;
// its module (pdf.worker.mjs) is imported once and cached by pdf.js (PDFWorker._setupFakeWorkerGlobal),
// so a new document only builds a loopback port and message handler. Passing one shared PDFWorker
// (LoadParameters.worker) to every document gave 121 ms against 120 ms per 20 documents: no gain, so
// it is not done. Fonts and parsed objects are cached per document inside pdf.js and cannot be shared;
// standardFontDataUrl only loads glyph outlines for rendering and made text extraction slower
// (≈ +50%). What does pay is keeping the process (or the isolated miner's thread) alive: the first
// document costs ~1 s of module loading, later ones ~4–6 ms a page.
//
// The slice of pdf.js's document proxy the miner uses. pdf-parse keeps the loaded document in a
// field its typings call private; it is reached structurally and checked, so a change inside
// pdf-parse falls back to its own getText() (drawing order) instead of failing.
type PdfTextContent = {
  items: ReadonlyArray<(PositionedItem & { fontName?: string }) | { type: string }>;
  styles?: Record<string, { fontFamily?: string } | undefined>;
};
type PdfPage = { getTextContent(): Promise<PdfTextContent>; cleanup(): unknown };
type PdfDocument = { numPages: number; getPage(n: number): Promise<PdfPage> };

function loadedDocument(parser: PDFParse): PdfDocument | null {
  const doc: unknown = (parser as unknown as { doc?: unknown }).doc;
  if (!doc || typeof doc !== "object") return null;
  const d = doc as Partial<PdfDocument>;
  return typeof d.getPage === "function" && typeof d.numPages === "number" ? (d as PdfDocument) : null;
}

const isPositioned = (it: PositionedItem | { type: string }): it is PositionedItem =>
  "str" in it && Array.isArray((it as PositionedItem).transform);

type PdfPages = { pages: string[]; monoLines: Set<string>[]; layoutMs: number };

/**
 * Page texts in reading order (see layout.ts); the geometry cost is reported separately. `monoLines`
 * holds, per page, the lines set mostly in a monospaced font (pdf.js names the font family of each
 * item's style "monospace" for fixed-pitch fonts): code listings and console output.
 */
async function pageTexts(parser: PDFParse, total: number): Promise<PdfPages> {
  const doc = loadedDocument(parser);
  if (!doc) {
    const text = await parser.getText({ pageJoiner: "" });
    const pages = text.pages.sort((a, b) => a.num - b.num).map((p) => p.text);
    return { pages, monoLines: pages.map(() => new Set()), layoutMs: 0 };
  }
  const pages: string[] = [];
  const monoLines: Set<string>[] = [];
  let layoutMs = 0;
  for (let n = 1; n <= total; n++) {
    const page = await doc.getPage(n);
    const content = await page.getTextContent();
    const t = performance.now();
    const styles = content.styles ?? {};
    const items = content.items.filter(isPositioned).map((it) => {
      const font = (it as { fontName?: string }).fontName;
      return font && styles[font]?.fontFamily === "monospace" ? { ...it, mono: true } : it;
    });
    const lines = pageLinesInReadingOrder(items);
    pages.push(lines.map((l) => l.text).join("\n"));
    monoLines.push(new Set(lines.filter((l) => l.mono).map((l) => l.text.trim())));
    layoutMs += performance.now() - t;
    page.cleanup();
    // In this thread pdf.js answers through microtasks only, so without a turn of the event loop no
    // timer could fire before the whole document is read: the time limit (withTimeout) was never
    // reached (measured: a 296-page PDF with timeoutMs 1 was read to the end in 2.3 s), and a worker's
    // queue heartbeats waited as long. One macrotask turn per page costs microseconds.
    await new Promise<void>((resolve) => setImmediate(resolve));
  }
  return { pages, monoLines, layoutMs };
}

/**
 * The page texts of a PDF in reading order, as the miner reads them before text repair. `layoutMs` is
 * the time spent on the geometry alone. Throws on unreadable PDFs (use createMiner for error lines).
 */
export async function extractPdfPages(
  data: Uint8Array,
  opts: { maxPages?: number; timeoutMs?: number } = {},
): Promise<{ pages: string[]; layoutMs: number }> {
  const { pages, layoutMs } = await readPdf(
    data,
    opts.maxPages ?? DEFAULT_MAX_PAGES,
    opts.timeoutMs ?? DEFAULT_TIMEOUT_MS,
  );
  return { pages, layoutMs };
}

async function readPdf(
  data: Uint8Array,
  maxPages: number,
  timeoutMs: number,
): Promise<PdfPages & { info: Record<string, unknown> }> {
  // Loading pdf.js (first document only) is not the document's time.
  const { PDFParse } = await loadPdfParse();
  // pdf.js takes ownership of (and may detach) the buffer it is given, so it gets a copy.
  // One parser per document: PDFParse binds its data at construction (see "Keeping a parser warm" above).
  const parser = new PDFParse({ data: new Uint8Array(data), verbosity: 0, stopAtErrors: false });
  let destroyed: Promise<void> | null = null;
  // Once, with its own handler: called on timeout and again when the document is done.
  const destroy = () => (destroyed ??= parser.destroy().catch(() => undefined));
  const work = (async () => {
    const info = await parser.getInfo();
    if (info.total === 0) throw new MineError("zero_pages", "The PDF has no pages.");
    if (info.total > maxPages)
      throw new MineError("too_many_pages", `The PDF has ${info.total} pages; the limit is ${maxPages}.`);
    const read = await pageTexts(parser, info.total);
    const raw: unknown = info.info;
    const infoDict = raw && typeof raw === "object" ? (raw as Record<string, unknown>) : {};
    return { ...read, info: infoDict };
  })();
  // After a timeout the work is abandoned and the destroyed document makes it reject; that rejection
  // has nobody left to report to, so it is dropped here explicitly.
  work.catch(() => undefined);
  try {
    return await withTimeout(work, timeoutMs, () => void destroy());
  } catch (err) {
    throw classifyPdfError(err);
  } finally {
    await destroy();
  }
}

function decodeUtf8(data: Uint8Array): string | null {
  try {
    const t = new TextDecoder("utf-8", { fatal: true }).decode(data);
    // Binary that happens to be valid UTF-8 is full of control characters.
    const controls = (t.match(/[\u0000-\u0008\u000e-\u001f]/g) ?? []).length;
    return controls > t.length * 0.01 ? null : t.replace(/^\uFEFF/, "");
  } catch {
    return null;
  }
}

export function createMiner(options: MinerOptions = {}): Miner {
  const maxBytes = options.maxBytes ?? DEFAULT_MAX_BYTES;
  const maxPages = options.maxPages ?? DEFAULT_MAX_PAGES;
  const timeoutMs = options.timeoutMs ?? DEFAULT_TIMEOUT_MS;
  const procedures = options.procedures ?? defaultProcedures;
  let closed = false;

  async function mine(input: { data: Uint8Array; filename: string }): Promise<MineOutput> {
    const file = input.filename;
    if (closed) return errorOutput(file, "internal", "The miner was closed.");
    const t0 = performance.now();
    const data = input.data;
    try {
      if (data.byteLength > maxBytes) {
        return errorOutput(
          file,
          "too_large",
          `The file is ${(data.byteLength / 1048576).toFixed(1)} MB; the limit is ${(maxBytes / 1048576).toFixed(0)} MB.`,
        );
      }
      if (data.byteLength === 0) return errorOutput(file, "empty", "The file is empty.");
      const head = new TextDecoder("latin1").decode(data.subarray(0, 1024));
      if (head.includes("%PDF-")) {
        const { pages: rawPages, info, monoLines } = await readPdf(data, maxPages, timeoutMs);
        const t1 = performance.now();
        const pages = repairPages(rawPages);
        const chars = pages.join("").replace(/\s/g, "").length;
        if (chars < Math.max(20, pages.length * 5)) {
          return errorOutput(
            file,
            "no_text_layer",
            `The PDF's ${pages.length} page(s) carry (almost) no text layer; it looks scanned and needs OCR before it can be mined.`,
            t1 - t0,
          );
        }
        const doc = minePages(pages, { procedures, monoLines });
        const line = SuccessLine.parse({ file, ...doc });
        const fromText = metaFromText(pages[0] ?? "");
        const str = (k: string) =>
          typeof info[k] === "string" && (info[k] as string).trim() ? (info[k] as string).trim() : null;
        const meta: ArticleMeta = {
          ...emptyMeta(),
          ...fromText,
          title: str("Title") ?? fromText.title ?? null,
          authors:
            str("Author")
              ?.split(/\s*(?:;|,| and |&)\s*/)
              .filter(Boolean) ?? [],
        };
        return { line, timings: { readMs: t1 - t0, mineMs: performance.now() - t1 }, meta };
      }
      const text = decodeUtf8(data);
      if (text === null)
        return errorOutput(file, "not_pdf", "The file is neither a PDF, JATS XML nor UTF-8 text; it cannot be mined.");
      if (!text.trim()) return errorOutput(file, "empty", "The file contains no text.");
      if (looksLikeXml(text.slice(0, 200))) {
        const check = checkJats(text);
        if (!check.ok) return errorOutput(file, check.code, check.message);
        const jats = parseJats(text);
        const t1 = performance.now();
        const doc = minePages([jats.lines.join("\n")], { procedures, referenceLines: jats.referenceLines });
        const line = SuccessLine.parse({ file, ...doc });
        return {
          line,
          timings: { readMs: t1 - t0, mineMs: performance.now() - t1 },
          meta: { ...jats.meta, firstPageText: null },
        };
      }
      const t1 = performance.now();
      const doc = mineText(text, { procedures });
      const line = SuccessLine.parse({ file, ...doc });
      const fromText = metaFromText(text.split("\f")[0]);
      return {
        line,
        timings: { readMs: t1 - t0, mineMs: performance.now() - t1 },
        meta: { ...emptyMeta(), ...fromText, firstPageText: null },
      };
    } catch (err) {
      const e =
        err instanceof MineError
          ? err
          : new MineError("internal", `Unexpected miner failure: ${err instanceof Error ? err.message : String(err)}`);
      return errorOutput(file, e.code, e.message, performance.now() - t0);
    }
  }

  return {
    mine,
    async close() {
      closed = true;
    },
  };
}
