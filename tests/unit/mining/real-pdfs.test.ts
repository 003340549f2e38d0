// The miner on real, openly licensed PDFs from Debian packages (tests/fixtures/real-pdfs: manifest.json
// lists each document with what a reader found in it; install.sh fetches the packages with apt at run
// time; the PDFs themselves are never committed). The expected values are the manifest's, taken by
// hand from the documents and from Debian's pdftotext output; documents are named by package and file,
// never by author.
//
// Checks per document:
// - every must-find citation is found: a located one on its page with its year and a locator (the
//   locator string too when the manifest gives it, compared without spaces); an unlocated one on its
//   page with its year and no locator; a numbered one on its page with its number;
// - the number of references is within 10% of the true count;
// - non-prose statements are at most 5% of all statements, over all documents. Rule: a statement is
//   counted as non-prose when its page is one of the document's nonprose_pages (pages that are mostly
//   code, console output, formulas or tables) or when its sentence reads as code, output, a formula or
//   a table row by lib/mining/nonprose.ts (nonProseSentence).
//
// The manifest's field names are read leniently (see `field`), so small differences of spelling between
// the manifest's writer and this test do not hide a document; a document whose PDF is missing after
// install.sh fails its test.
import { execFileSync } from "node:child_process";
import { existsSync, readFileSync } from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createMiner, isErrorLine, type SuccessLine } from "@/lib/mining/index";
import { nonProseSentence } from "@/lib/mining/nonprose";

const dir = path.resolve(import.meta.dirname, "../../fixtures/real-pdfs");
const manifestFile = path.join(dir, "manifest.json");
const hasManifest = existsSync(manifestFile);

type Json = Record<string, unknown>;
type Doc = Json;

/** The first of several spellings a manifest field may have. */
function field<T>(o: Json | undefined, ...names: string[]): T | undefined {
  if (!o) return undefined;
  for (const n of names) if (o[n] !== undefined && o[n] !== null) return o[n] as T;
  return undefined;
}

function documents(): Doc[] {
  const m = JSON.parse(readFileSync(manifestFile, "utf8")) as Json | Doc[];
  return Array.isArray(m) ? m : (field<Doc[]>(m, "documents", "pdfs", "files", "items") ?? []);
}

// ECHOLINE_REAL_PDFS_EXTRACTED=DIR reads each PDF from DIR/<package><path> (packages fetched with
// `apt-get download` and unpacked with `dpkg-deb -x` into DIR/<package>) instead of running install.sh.
const extracted = process.env.ECHOLINE_REAL_PDFS_EXTRACTED;

function pdfPath(d: Doc): string {
  const p = field<string>(d, "path", "installed_path", "file", "pdf", "installedPath")!;
  if (extracted) return path.join(extracted, String(field(d, "package")), p);
  for (const c of [p, path.join(dir, p)]) if (existsSync(c)) return c;
  return p;
}

const name = (d: Doc) => String(field(d, "id", "name", "file", "path"));
const mustFind = (d: Doc) => field<Json>(d, "must_find", "mustFind", "expected") ?? d;
const list = (o: Json, ...names: string[]) => field<Json[]>(o, ...names) ?? [];
const squash = (s: string) => s.replace(/\s+/g, "").replace(/[–—]/g, "-").toLowerCase();

const mined = new Map<string, SuccessLine>();

describe.skipIf(!hasManifest)("real PDFs (tests/fixtures/real-pdfs)", () => {
  const docs = hasManifest ? documents() : [];

  beforeAll(async () => {
    // apt at run time; the script is the manifest writer's and decides where the PDFs go.
    if (!extracted) execFileSync("bash", [path.join(dir, "install.sh")], { stdio: ["ignore", "inherit", "inherit"] });
    const miner = createMiner();
    for (const d of docs) {
      const file = pdfPath(d);
      if (!existsSync(file)) continue;
      const out = await miner.mine({ data: new Uint8Array(readFileSync(file)), filename: file });
      if (!isErrorLine(out.line)) mined.set(name(d), out.line);
    }
    await miner.close();
  }, 900_000);

  afterAll(() => {
    const rows = docs.map((d) => {
      const m = mined.get(name(d));
      return {
        document: name(d),
        pages: m?.pages,
        statements: m?.statements.length,
        citations: m?.citations.length,
        references: m?.references.length,
      };
    });
    console.table(rows);
  });

  for (const d of docs) {
    it(`${name(d)}: every must-find citation, and the reference count within 10%`, () => {
      const m = mined.get(name(d));
      expect(m, `${pdfPath(d)} was not mined (missing after install.sh, or an error line)`).toBeDefined();
      const cites = m!.citations;
      const want = mustFind(d);
      const missed: string[] = [];
      for (const c of list(want, "located", "located_citations", "with_locator")) {
        const page = Number(field(c, "page"));
        const year = String(field(c, "year"));
        const loc = field<string>(c, "locator");
        const ok = cites.some(
          (x) =>
            x.page === page &&
            x.year.startsWith(year) &&
            x.locator !== null &&
            (!loc || squash(x.locator).includes(squash(loc)) || squash(loc).includes(squash(x.locator))),
        );
        if (!ok) missed.push(`located p.${page} ${year} ${loc ?? ""}`);
      }
      for (const c of list(want, "unlocated", "unlocated_citations", "without_locator")) {
        const page = Number(field(c, "page"));
        const year = String(field(c, "year"));
        if (!cites.some((x) => x.page === page && x.year.startsWith(year) && x.locator === null))
          missed.push(`unlocated p.${page} ${year}`);
      }
      for (const c of list(want, "numbered", "numbered_citations")) {
        const page = Number(field(c, "page"));
        const number = Number(field(c, "number", "n"));
        if (!cites.some((x) => x.page === page && x.number === number)) missed.push(`numbered p.${page} [${number}]`);
      }
      expect(missed, `missed in ${name(d)}`).toEqual([]);
      const refs = field<number | Json>(d, "references", "reference_count", "refs", "referenceCount");
      const trueRefs = typeof refs === "number" ? refs : field<number>(refs as Json | undefined, "count");
      if (typeof trueRefs === "number") {
        expect(
          Math.abs(m!.references.length - trueRefs),
          `${name(d)}: ${m!.references.length} references, ${trueRefs} in the document`,
        ).toBeLessThanOrEqual(0.1 * trueRefs);
      }
    });
  }

  it("non-prose statements (nonprose_pages or code/formula/table sentences) are at most 5% of all", () => {
    let all = 0;
    let nonProse = 0;
    for (const d of docs) {
      const m = mined.get(name(d));
      if (!m) continue;
      const pages = new Set(
        (field<number[]>(d, "nonprose_pages", "nonProsePages", "non_prose_pages") ?? []).map(Number),
      );
      for (const s of m.statements) {
        all++;
        if (pages.has(s.page) || nonProseSentence(s.sentence)) nonProse++;
      }
    }
    console.log(`non-prose statements: ${nonProse} of ${all}`);
    expect(nonProse).toBeLessThanOrEqual(Math.max(0, 0.05 * all));
  });
});
