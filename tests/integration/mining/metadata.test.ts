/**
 * Metadata files (BibTeX, RIS, CSV) parsed by citation-js and papaparse, and matched to uploaded
 * files by DOI or file name. Expected values are read off the invented fixtures by hand.
 */
import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { parseMetadata, matchEntry, detectFormat, MetadataError } from "@/lib/metadata";

const fixture = (f: string) => fs.readFileSync(path.join(import.meta.dirname, "../../fixtures/metadata", f), "utf8");

describe("metadata files", () => {
  it("reads BibTeX: DOI normalised from a doi.org URL, authors as family, given; file and licence kept", async () => {
    const m = await parseMetadata(fixture("invented.bib"));
    expect(m.format).toBe("bibtex");
    expect(m.entries).toHaveLength(2);
    const [a, b] = m.entries;
    expect(a).toMatchObject({
      doi: "10.5555/JICS.2019.014",
      title: "Shift Rhythms and Ward Climate",
      authors: ["Okafor, Tunde", "Lindqvist, Maren"],
      year: 2019,
      venue: "Journal of Invented Care Studies",
      licence: "CC BY 4.0",
    });
    expect(a.files).toContain("okafor2019.pdf");
    // A braced name is one literal author in BibTeX (the corporate-author convention).
    expect(b.authors).toEqual(["Brandtner, Kasimir", "Oyelaran Collective"]);
    expect(b.doi).toBeNull();
  });

  it("reads RIS: repeated AU tags, PY with slashes, L1 file name and C5 licence", async () => {
    const m = await parseMetadata(fixture("invented.ris"));
    expect(m.format).toBe("ris");
    expect(m.entries[0]).toMatchObject({
      doi: "10.5555/ir.2008.3",
      authors: ["Sorensby, Pia", "Tamaru-Welk, Idris"],
      year: 2008,
      venue: "Imaginary Review",
      files: ["sorensby2008.pdf"],
    });
    expect(m.entries[1]).toMatchObject({ title: "Fit indices in invented models", year: 2011, doi: null });
  });

  it("reads CSV with quoted commas, semicolon-separated authors and case-insensitive headers", async () => {
    const m = await parseMetadata(fixture("invented.csv"));
    expect(m.format).toBe("csv");
    expect(m.entries[0]).toEqual({
      doi: "10.5555/qrm.2021.77",
      title: "Reliability, again: an invented replication",
      authors: ["Quist, Amara", "Belloni-Farrow, Ruth"],
      year: 2021,
      venue: "Quarterly of Restated Methods",
      licence: "CC BY 4.0",
      files: ["quist2021.pdf"],
    });
    expect(m.entries[1].doi).toBeNull();
  });

  it("refuses a CSV that cannot be matched to files, and an empty file", async () => {
    await expect(parseMetadata("title,year\nX,2001\n")).rejects.toBeInstanceOf(MetadataError);
    await expect(parseMetadata("  \n")).rejects.toBeInstanceOf(MetadataError);
    expect(detectFormat("@misc{k, title={t}}")).toBe("bibtex");
  });

  it("matches by DOI first (case-insensitive), then by file name or its stem", async () => {
    const bib = (await parseMetadata(fixture("invented.bib"))).entries;
    const csv = (await parseMetadata(fixture("invented.csv"))).entries;
    expect(matchEntry(bib, { filename: "whatever.pdf", doi: "10.5555/jics.2019.014" })?.title).toBe(
      "Shift Rhythms and Ward Climate",
    );
    expect(matchEntry(bib, { filename: "OKAFOR2019.pdf" })?.year).toBe(2019);
    expect(matchEntry(bib, { filename: "brandtner2003.xml" })?.title).toBe("Measuring Invented Constructs");
    expect(matchEntry(csv, { filename: "nkemelu1999.txt" })?.licence).toBe("CC0 1.0");
    expect(matchEntry(csv, { filename: "unknown.pdf" })).toBeNull();
  });
});
