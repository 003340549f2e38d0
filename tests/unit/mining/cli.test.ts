// The CLI as a person runs it: one JSON line per file on stdout, valid against the contract, exit 2 on
// any failure.
import { spawnSync } from "node:child_process";
import { mkdirSync, writeFileSync } from "node:fs";
import path from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { ContractLine } from "@/lib/mining/contract";
import { generatedDir, makeSimplePdf } from "@/tests/fixtures/make-gold-pdfs";

const root = path.resolve(import.meta.dirname, "../../..");
const dir = path.join(generatedDir, "cli");
const goodPdf = path.join(dir, "good.pdf");
const badBin = path.join(dir, "bad.bin");

beforeAll(async () => {
  mkdirSync(dir, { recursive: true });
  await makeSimplePdf(goodPdf, [
    "2. Method",
    "Internal consistency was acceptable, as Cronbach's alpha should be at least .70 (Okafor & Lindqvist, 1994, p. 112).",
    "In this sample Cronbach's alpha was .84.",
    "References",
    "Okafor, E., & Lindqvist, B. (1994). Psychometric foundations for applied researchers. Kestrel House.",
  ]);
  writeFileSync(badBin, Buffer.from(Array.from({ length: 3000 }, (_, i) => (i * 7919) % 256)));
});

describe("mine CLI", () => {
  it("prints one valid line per file, goes on after failures and exits 2", () => {
    const rel = (f: string) => path.relative(root, f);
    const r = spawnSync("npm", ["run", "--silent", "mine", "--", rel(goodPdf), rel(badBin), "no/such/file.pdf"], {
      cwd: root,
      encoding: "utf8",
      timeout: 60_000,
    });
    expect(r.status).toBe(2);
    const lines = r.stdout.trim().split("\n");
    expect(lines).toHaveLength(3);
    const parsed = lines.map((l) => ContractLine.parse(JSON.parse(l)));
    expect(parsed.map((p) => p.file)).toEqual([rel(goodPdf), rel(badBin), "no/such/file.pdf"]);
    const [ok, bad, missing] = parsed;
    if ("error" in ok) throw new Error(ok.error.message);
    expect(ok.pages).toBe(1);
    expect(ok.statements.map((s) => [s.kind, s.statistic, s.comparator, s.value])).toEqual([
      ["threshold", "cronbach_alpha", ">=", 0.7],
      ["reported", "cronbach_alpha", "=", 0.84],
    ]);
    expect(ok.statements[0].citations[0]).toMatchObject({
      authors: "Okafor & Lindqvist",
      year: "1994",
      locator: "p. 112",
    });
    expect(ok.references).toHaveLength(1);
    expect("error" in bad && bad.error.code).toBe("not_pdf");
    expect("error" in missing && missing.error.code).toBe("not_found");
  });
  it("exits 0 when every file was mined", () => {
    const r = spawnSync("npm", ["run", "--silent", "mine", "--", path.relative(root, goodPdf)], {
      cwd: root,
      encoding: "utf8",
      timeout: 60_000,
    });
    expect(r.status).toBe(0);
    expect(r.stdout.trim().split("\n")).toHaveLength(1);
  });
});
