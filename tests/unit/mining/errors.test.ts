// Bad input must come back as a contract error line, never a throw, a hang or a crash.
import { mkdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { ContractLine, createMiner, isErrorLine, type MineOutput } from "@/lib/mining/index";
import { ensureGoldPdfs, generatedDir, makeEncryptedPdf, makeImageOnlyPdf } from "@/tests/fixtures/make-gold-pdfs";

const dir = path.join(generatedDir, "errors");
const miner = createMiner({ timeoutMs: 20_000 });
const mine = (data: Uint8Array, filename = "x") => miner.mine({ data, filename });
const code = (o: MineOutput) => (isErrorLine(o.line) ? o.line.error.code : "ok");
let good: Uint8Array;

beforeAll(async () => {
  mkdirSync(dir, { recursive: true });
  await ensureGoldPdfs();
  await makeEncryptedPdf(path.join(dir, "encrypted.pdf"));
  await makeImageOnlyPdf(path.join(dir, "image-only.pdf"));
  good = new Uint8Array(readFileSync(path.join(generatedDir, "12-app-usability.pdf")));
});

describe("error codes", () => {
  it("encrypted PDF (pdfkit userPassword)", async () => {
    const o = await mine(new Uint8Array(readFileSync(path.join(dir, "encrypted.pdf"))));
    expect(code(o)).toBe("encrypted");
  });
  it("image-only PDF is no_text_layer and says it needs OCR", async () => {
    const o = await mine(new Uint8Array(readFileSync(path.join(dir, "image-only.pdf"))));
    expect(code(o)).toBe("no_text_layer");
    expect(isErrorLine(o.line) && o.line.error.message).toMatch(/scanned.*OCR/);
  });
  it("truncated PDF is corrupt", async () => {
    expect(code(await mine(good.subarray(0, Math.floor(good.length / 3))))).toBe("corrupt");
  });
  it("random bytes are not_pdf; empty file is empty; oversize is too_large; page limits hold", async () => {
    const rnd = new Uint8Array(4096).map((_, i) => (i * 2654435761) % 251);
    expect(code(await mine(rnd))).toBe("not_pdf");
    expect(code(await mine(new Uint8Array()))).toBe("empty");
    expect(code(await createMiner({ maxBytes: 1000 }).mine({ data: good, filename: "big.pdf" }))).toBe("too_large");
    expect(code(await createMiner({ maxPages: 1 }).mine({ data: good, filename: "long.pdf" }))).toBe("too_many_pages");
  });
  it("a PDF with an empty page tree is zero_pages", async () => {
    const pdf =
      "%PDF-1.4\n1 0 obj\n<< /Type /Catalog /Pages 2 0 R >>\nendobj\n2 0 obj\n<< /Type /Pages /Kids [] /Count 0 >>\nendobj\n";
    const xrefAt = pdf.length;
    const off = (n: number) => String(pdf.indexOf(`${n} 0 obj`)).padStart(10, "0");
    const full = `${pdf}xref\n0 3\n0000000000 65535 f \n${off(1)} 00000 n \n${off(2)} 00000 n \ntrailer\n<< /Size 3 /Root 1 0 R >>\nstartxref\n${xrefAt}\n%%EOF\n`;
    expect(["zero_pages", "corrupt"]).toContain(code(await mine(new TextEncoder().encode(full))));
    expect(code(await mine(new TextEncoder().encode(full)))).toBe("zero_pages");
  });
  it("XML that is not JATS is not_jats; JATS is mined with its front matter", async () => {
    expect(
      code(await mine(new TextEncoder().encode('<?xml version="1.0"?><rss><channel><title>x</title></channel></rss>'))),
    ).toBe("not_jats");
    expect(code(await mine(new TextEncoder().encode("<article><front><article-meta>")))).toBe("corrupt");
    const jats = `<?xml version="1.0"?><article><front><journal-meta><journal-title-group><journal-title>Journal of Shift Studies</journal-title></journal-title-group></journal-meta><article-meta><article-id pub-id-type="doi">10.5555/JSS.1</article-id><title-group><article-title>Recovery after night work</article-title></title-group><contrib-group><contrib contrib-type="author"><name><surname>Moreau</surname><given-names>C.</given-names></name></contrib></contrib-group><pub-date><year>2011</year></pub-date><permissions><license xlink:href="https://creativecommons.org/licenses/by/4.0/"><license-p>CC BY 4.0</license-p></license></permissions></article-meta></front><body><sec><title>Method</title><p>Cronbach's alpha should be at least .70 (Okafor &amp; Lindqvist, 1994, p. 112).</p></sec></body><back><ref-list><ref><mixed-citation>Okafor, E., &amp; Lindqvist, B. (1994). Psychometric foundations for applied researchers. Kestrel House.</mixed-citation></ref></ref-list></back></article>`;
    const o = await mine(new TextEncoder().encode(jats), "a.xml");
    expect(code(o)).toBe("ok");
    expect(o.meta).toMatchObject({
      title: "Recovery after night work",
      authors: ["Moreau, C."],
      year: "2011",
      doi: "10.5555/jss.1",
      venue: "Journal of Shift Studies",
      licence: "https://creativecommons.org/licenses/by/4.0/",
    });
    if (!isErrorLine(o.line)) {
      expect(o.line.statements[0]).toMatchObject({
        section: "methods",
        statistic: "cronbach_alpha",
        comparator: ">=",
        value: 0.7,
      });
      expect(o.line.references[0]).toMatchObject({ year: "1994", kind: "book" });
    }
  });
  it("file type comes from content, not the name", async () => {
    const o = await mine(good, "looks-like.txt");
    expect(code(o)).toBe("ok");
    expect(o.meta.title).toBe("Perceived Usability of a Medication Reminder App");
  });
});

describe("malformed files never throw or hang", () => {
  it("truncations, flipped bytes and random bytes of a good PDF all give valid contract lines", async () => {
    // A deterministic generator keeps the run reproducible (xorshift32).
    let seed = 0x9e3779b9;
    const rand = () => {
      seed ^= seed << 13;
      seed ^= seed >>> 17;
      seed ^= seed << 5;
      return (seed >>> 0) / 4294967296;
    };
    const cases: Uint8Array[] = [];
    for (let i = 1; i <= 10; i++) cases.push(good.subarray(0, Math.floor((good.length * i) / 11)));
    for (let i = 0; i < 14; i++) {
      const b = new Uint8Array(good);
      for (let k = 0; k < 1 + i * 3; k++) b[Math.floor(rand() * b.length)] ^= 1 << Math.floor(rand() * 8);
      cases.push(b);
    }
    for (let i = 0; i < 6; i++) {
      const b = new Uint8Array(2000).map(() => Math.floor(rand() * 256));
      b.set(new TextEncoder().encode("%PDF-1.7\n"), 0);
      cases.push(b);
    }
    const codes: string[] = [];
    for (const c of cases) {
      const o = await mine(c, "fuzz.pdf");
      expect(ContractLine.safeParse(o.line).success).toBe(true);
      codes.push(code(o));
    }
    expect(
      codes.every((c) => ["ok", "corrupt", "no_text_layer", "zero_pages", "timeout", "encrypted"].includes(c)),
    ).toBe(true);
  }, 120_000);
});
