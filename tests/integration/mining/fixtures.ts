/**
 * Invented articles rendered to PDF with pdfkit, for the mining integration tests. Every person,
 * journal and study here is invented.
 */
import PDFDocument from "pdfkit";

export const GOOD_PAGES: string[][] = [
  [
    "Shift Rhythms and Ward Climate: A Study of Invented Hospitals",
    "Okafor, T. and Lindqvist, M.",
    "Journal of Invented Care Studies, 2019. Licence: CC BY 4.0. doi:10.5555/jics.2019.014",
    "Method",
    "Participants completed the ward climate scale on two occasions.",
    "Reliability above .70 is acceptable for research purposes (Brandtner & Oyelaran, 2003, p. 112).",
    "Internal consistency was good, Cronbach's alpha = .84.",
  ],
  [
    "Results",
    "The measurement model fitted well, with CFI = .95 and RMSEA = .05 (Haverkamp, 2011).",
    "Loadings below .40 were removed, as recommended by Sorensby (2008).",
    "References",
    "Brandtner, K., & Oyelaran, S. (2003). Measuring invented constructs. Fictive Press.",
    "Haverkamp, L. (2011). Fit indices in invented models. Journal of Made-up Methods, 4(2), 1-20.",
    "Sorensby, P. (2008). Loadings and their limits. Imaginary Review, 12, 33-49.",
  ],
];

function render(
  pages: string[][],
  options: PDFKit.PDFDocumentOptions = {},
  draw?: (doc: PDFKit.PDFDocument) => void,
): Promise<Uint8Array> {
  return new Promise((resolve, reject) => {
    const doc = new PDFDocument({ autoFirstPage: false, info: { Title: pages[0]?.[0] ?? "Invented" }, ...options });
    const chunks: Buffer[] = [];
    doc.on("data", (c: Buffer) => chunks.push(c));
    doc.on("end", () => resolve(new Uint8Array(Buffer.concat(chunks))));
    doc.on("error", reject);
    for (const lines of pages) {
      doc.addPage({ size: "A4", margin: 60 });
      if (draw) draw(doc);
      else for (const l of lines) doc.fontSize(11).text(l, { paragraphGap: 6 });
    }
    doc.end();
  });
}

export const goodPdf = () => render(GOOD_PAGES);
/** Any invented pages as a PDF (one string array per page). */
export const pdfOf = (pages: string[][]) => render(pages);
/** pdfkit's standard security handler (RC4/AES with a user password): readers must refuse it. */
export const encryptedPdf = () =>
  render(GOOD_PAGES, { userPassword: "invented-secret", ownerPassword: "owner", pdfVersion: "1.7" });
/** Pages with drawings only, like a scan without OCR. */
export const imageOnlyPdf = () =>
  render([[], [], []], {}, (doc) => {
    for (let i = 0; i < 40; i++)
      doc.rect(60 + (i % 8) * 55, 80 + Math.floor(i / 8) * 90, 40, 60).fill(i % 2 ? "#333" : "#999");
  });

/**
 * A page tree that really is gigantic: one blank page object listed `count` times. (A bare lie in
 * /Count is not enough: pdf.js recounts the pages when the last one is missing, and then the file
 * is simply a good one-page PDF.)
 */
export async function hugePageCountPdf(count = 100_000): Promise<Uint8Array> {
  const objects = [
    "<< /Type /Catalog /Pages 2 0 R >>",
    `<< /Type /Pages /Count ${count} /Kids [${Array(count).fill("3 0 R").join(" ")}] >>`,
    "<< /Type /Page /Parent 2 0 R /MediaBox [0 0 595 842] >>",
  ];
  let body = "%PDF-1.4\n";
  const offsets: number[] = [];
  objects.forEach((o, i) => {
    offsets.push(body.length);
    body += `${i + 1} 0 obj\n${o}\nendobj\n`;
  });
  const xref = body.length;
  body += `xref\n0 ${objects.length + 1}\n0000000000 65535 f \n${offsets.map((o) => `${String(o).padStart(10, "0")} 00000 n \n`).join("")}`;
  body += `trailer\n<< /Size ${objects.length + 1} /Root 1 0 R >>\nstartxref\n${xref}\n%%EOF\n`;
  return new Uint8Array(Buffer.from(body, "latin1"));
}

/** A small deterministic generator, so a failing case can be reproduced from its seed. */
export function rng(seed: number) {
  let s = seed >>> 0 || 1;
  return () => {
    // xorshift32 (Marsaglia 2003, "Xorshift RNGs", J. Stat. Software 8(14)): plenty for test noise.
    s ^= s << 13;
    s >>>= 0;
    s ^= s >>> 17;
    s ^= s << 5;
    s >>>= 0;
    return s / 0x100000000;
  };
}

/** Byte ranges of every stream's data (between `stream` and `endstream`). */
export function streamRanges(pdf: Uint8Array): [number, number][] {
  const s = Buffer.from(pdf).toString("latin1");
  const out: [number, number][] = [];
  const re = /stream\r?\n/g;
  let m: RegExpExecArray | null;
  while ((m = re.exec(s))) {
    if (s.slice(Math.max(0, m.index - 3), m.index) === "end") continue;
    const start = m.index + m[0].length;
    const end = s.indexOf("endstream", start);
    if (end > start) out.push([start, end]);
    re.lastIndex = Math.max(re.lastIndex, end + 9);
  }
  return out;
}

/**
 * Flips bits in the first bytes of every content stream, where a deflate stream keeps its header
 * and first block codes: damage there leaves no page readable. (Flips elsewhere are often
 * harmless, e.g. inside a dictionary value the reader ignores, and then the PDF is still good.)
 */
export function flipStreams(pdf: Uint8Array, rand: () => number): Uint8Array {
  const d = pdf.slice();
  for (const [a, b] of streamRanges(pdf)) {
    const n = 1 + Math.floor(rand() * 3);
    for (let k = 0; k < n; k++) {
      // Past the two-byte zlib header, whose level bits a reader may ignore.
      const p = a + 2 + Math.floor(rand() * Math.min(8, b - a - 2));
      d[p] ^= 1 << Math.floor(rand() * 8);
    }
  }
  return d;
}
