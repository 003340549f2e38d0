/**
 * Metadata files uploaded beside the articles: BibTeX, RIS (parsed by citation-js into CSL-JSON,
 * the Citation Style Language's data model) or CSV (papaparse) with doi/title/authors/year/venue/
 * licence/file columns. Entries are matched to uploaded files by DOI, else by file name.
 */
import { Cite, plugins } from "@citation-js/core";
import "@citation-js/plugin-bibtex";
import "@citation-js/plugin-ris";
import Papa from "papaparse";
import { normaliseDoi } from "@/lib/corpus/doi";

export type MetadataEntry = {
  doi: string | null;
  title: string | null;
  authors: string[];
  year: number | null;
  venue: string | null;
  licence: string | null;
  /** File names the entry names (BibTeX `file`, RIS `L1`, CSV `file`), and the BibTeX key. */
  files: string[];
};
export type MetadataFormat = "bibtex" | "ris" | "csv";
export type ParsedMetadata = { format: MetadataFormat; entries: MetadataEntry[]; warnings: string[] };

export class MetadataError extends Error {}

type CslName = { family?: string; given?: string; literal?: string };
type Csl = {
  DOI?: string;
  title?: string;
  author?: CslName[];
  issued?: { "date-parts"?: (number | string)[][]; literal?: string };
  "container-title"?: string;
  "citation-key"?: string;
  license?: string;
};

export function detectFormat(text: string): MetadataFormat {
  const t = text.replace(/^\uFEFF/, "").trimStart();
  if (/^@\s*[a-z]+\s*[{(]/i.test(t) || /^%.*\n\s*@/i.test(t)) return "bibtex";
  if (/^TY {2}- /m.test(t)) return "ris";
  return "csv";
}

const nameOf = (n: CslName) => n.literal ?? [n.family, n.given].filter(Boolean).join(", ");
const yearOf = (v: unknown): number | null => {
  const m = String(v ?? "").match(/\b(1[89]\d\d|20\d\d|2100)\b/);
  return m ? Number(m[1]) : null;
};
const clean = (s: unknown): string | null => {
  if (typeof s !== "string" && typeof s !== "number") return null;
  const t = String(s).replace(/\s+/g, " ").trim();
  return t ? t : null;
};
const basenames = (v: unknown): string[] =>
  (Array.isArray(v) ? v : [v])
    .flatMap((x) => String(x ?? "").split(/[;\n]/))
    // BibTeX managers write `file = {Description:path/to/file.pdf:application/pdf}`.
    .map((x) => x.split(":").find((part) => /\.[a-z0-9]{2,5}$/i.test(part.trim())) ?? x)
    .map((x) => x.trim().split(/[\\/]/).pop() ?? "")
    .filter(Boolean);

type RawExtras = { files: string[]; licence: string | null; year: number | null };

function fromCsl(c: Csl, raw: RawExtras): MetadataEntry {
  return {
    doi: normaliseDoi(c.DOI),
    title: clean(c.title),
    authors: (c.author ?? []).map(nameOf).filter(Boolean),
    // citation-js leaves `issued` empty for RIS dates in the old "2011///" form; the raw tag still has it.
    year: yearOf(c.issued?.["date-parts"]?.[0]?.[0] ?? c.issued?.literal) ?? raw.year,
    venue: clean(c["container-title"]),
    licence: clean(c.license) ?? raw.licence,
    files: [...raw.files, ...(c["citation-key"] ? [c["citation-key"]] : [])],
  };
}

async function parseCitationJs(text: string, format: "bibtex" | "ris"): Promise<ParsedMetadata> {
  let csl: Csl[];
  try {
    csl = (await Cite.async(text)).data as Csl[];
  } catch (err) {
    throw new MetadataError(
      `The ${format === "bibtex" ? "BibTeX" : "RIS"} file could not be read: ${(err as Error).message}`,
    );
  }
  // CSL has no field for attached files, and citation-js drops `copyright`; those two come from the
  // raw records of the same parse, which are in the same order.
  let raw: RawExtras[] = [];
  try {
    if (format === "bibtex") {
      const entries = plugins.input.chain(text, { target: "@biblatex/entries+list" }) as {
        properties: Record<string, string>;
      }[];
      raw = entries.map((e) => ({
        files: basenames(e.properties.file),
        licence: clean(e.properties.copyright ?? e.properties.license ?? e.properties.licence),
        year: yearOf(e.properties.year ?? e.properties.date),
      }));
    } else {
      const records = plugins.input.chain(text, { target: "@else/list+object" }) as Record<string, unknown>[];
      raw = records.map((r) => ({
        files: basenames(r.L1 ?? r.L4),
        licence: clean(Array.isArray(r.C5) ? r.C5[0] : r.C5),
        year: yearOf(r.PY ?? r.Y1 ?? r.DA),
      }));
    }
  } catch {
    raw = [];
  }
  const warnings: string[] = [];
  if (raw.length !== csl.length) {
    warnings.push("File names and licences could not be read from this file; entries match by DOI only.");
    raw = [];
  }
  return {
    format,
    entries: csl.map((c, i) => fromCsl(c, raw[i] ?? { files: [], licence: null, year: null })),
    warnings,
  };
}

const CSV_COLUMNS: Record<string, keyof MetadataEntry> = {
  doi: "doi",
  title: "title",
  authors: "authors",
  author: "authors",
  year: "year",
  venue: "venue",
  journal: "venue",
  licence: "licence",
  license: "licence",
  file: "files",
  filename: "files",
  file_name: "files",
};

function parseCsv(text: string): ParsedMetadata {
  const r = Papa.parse<Record<string, string>>(text.replace(/^\uFEFF/, ""), {
    header: true,
    skipEmptyLines: "greedy",
    transformHeader: (h) => h.trim().toLowerCase().replace(/\s+/g, "_"),
  });
  const fields = r.meta.fields ?? [];
  const known = fields.filter((f) => f in CSV_COLUMNS);
  if (!known.includes("doi") && !known.some((f) => CSV_COLUMNS[f] === "files")) {
    throw new MetadataError(
      `The CSV needs a "doi" or "file" column to match rows to files; its columns are: ${fields.join(", ") || "(none)"}.`,
    );
  }
  const warnings = r.errors.slice(0, 5).map((e) => `CSV row ${(e.row ?? 0) + 2}: ${e.message}`);
  const entries = r.data.map((row) => {
    const get = (k: keyof MetadataEntry) =>
      fields
        .filter((f) => CSV_COLUMNS[f] === k)
        .map((f) => row[f])
        .find((v) => v && v.trim());
    return {
      doi: normaliseDoi(get("doi")),
      title: clean(get("title")),
      // Several authors in one cell are separated by semicolons (commas separate family and given name).
      authors: (get("authors") ?? "")
        .split(";")
        .map((a) => a.trim())
        .filter(Boolean),
      year: yearOf(get("year")),
      venue: clean(get("venue")),
      licence: clean(get("licence")),
      files: basenames(get("files")),
    };
  });
  return { format: "csv", entries, warnings };
}

export async function parseMetadata(text: string): Promise<ParsedMetadata> {
  if (!text.trim()) throw new MetadataError("The metadata file is empty.");
  const format = detectFormat(text);
  return format === "csv" ? parseCsv(text) : parseCitationJs(text, format);
}

const stem = (f: string) =>
  f
    .trim()
    .toLowerCase()
    .replace(/\.[a-z0-9]{2,5}$/i, "");

/** The entry for one uploaded file: same DOI (when the file's DOI is known), else same file name or stem. */
export function matchEntry(
  entries: MetadataEntry[],
  file: { filename: string; doi?: string | null },
): MetadataEntry | null {
  const doi = normaliseDoi(file.doi);
  if (doi) {
    const byDoi = entries.find((e) => e.doi && e.doi.toLowerCase() === doi.toLowerCase());
    if (byDoi) return byDoi;
  }
  const name = file.filename.trim().toLowerCase();
  return (
    entries.find((e) => e.files.some((f) => f.toLowerCase() === name)) ??
    entries.find((e) => e.files.some((f) => stem(f) === stem(name))) ??
    null
  );
}
