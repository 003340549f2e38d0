/**
 * Renders a demo article as a journal-like PDF (pdfkit): first page with title block, licence and
 * the "Invented demo article" line, running header with the invented venue, page numbers in the
 * footer, one or two columns. Lines are broken here rather than by pdfkit so that columns, headings
 * and page breaks are under our control and the output is byte-for-byte reproducible.
 */
import { existsSync, readFileSync } from "node:fs";
import PDFDocument from "pdfkit";
import { unparseCsv } from "@/lib/csv";
import type { DemoArticle, DemoCorpus, DemoPerson } from "./corpus";

// Greek letters and ≥/≤ are outside the WinAnsi encoding of the 14 core PDF fonts, so the body
// face is a TrueType font embedded when one is installed (Debian's fonts-liberation, else
// fonts-dejavu). Headings, the title block and running heads use core fonts: their text is plain
// Latin, and parsing one TrueType font per PDF instead of four keeps rendering fast (font parsing is
// most of the cost). Liberation Serif has the metrics of Times, so the two faces sit well together.
const BODY_FONT_CANDIDATES = [
  "/usr/share/fonts/truetype/liberation/LiberationSerif-Regular.ttf",
  "/usr/share/fonts/truetype/dejavu/DejaVuSerif.ttf",
];
const CORE = { serif: "Times-Roman", serifBold: "Times-Bold", serifItalic: "Times-Italic", sans: "Helvetica" } as const;
type FontRole = keyof typeof CORE;

let bodyFont: Buffer | null | undefined;
function loadBodyFont(): Buffer | null {
  if (bodyFont === undefined) {
    const p = BODY_FONT_CANDIDATES.find((f) => existsSync(f));
    bodyFont = p ? readFileSync(p) : null;
  }
  return bodyFont;
}

const ASCII_FALLBACK: [RegExp, string][] = [
  [/α/g, "alpha"],
  [/β/g, "beta"],
  [/χ²/g, "chi-square"],
  [/≥/g, ">="],
  [/≤/g, "<="],
  [/[ćč]/g, "c"],
  [/[śš]/g, "s"],
  [/ğ/g, "g"],
  [/ł/g, "l"],
  [/Ç/g, "C"],
  [/ç/g, "c"],
];
const toWinAnsi = (s: string) => ASCII_FALLBACK.reduce((acc, [re, rep]) => acc.replace(re, rep), s);

const A4 = { w: 595.28, h: 841.89 };
const MARGIN = { left: 56, right: 56, top: 64, bottom: 62 };

export interface RenderOptions {
  /** Forces one or two columns; default: the venue's layout. */
  columns?: 1 | 2;
}

type Doc = InstanceType<typeof PDFDocument>;

class Layout {
  private widthCache = new Map<string, number>();
  private font: FontRole = "serif";
  private size = 10;
  col = 0;
  y: number;
  regionTop: number;
  readonly colWidth: number;
  private readonly gap = 18;
  constructor(
    private doc: Doc,
    private cols: 1 | 2,
    private text: (role: FontRole, s: string) => string,
    private fontName: (r: FontRole) => string,
    startY: number,
  ) {
    this.y = startY;
    this.regionTop = startY;
    const full = A4.w - MARGIN.left - MARGIN.right;
    this.colWidth = cols === 1 ? full : (full - this.gap) / 2;
  }
  private get x(): number {
    return MARGIN.left + this.col * (this.colWidth + this.gap);
  }
  private get bottom(): number {
    return A4.h - MARGIN.bottom;
  }
  setFont(role: FontRole, size: number) {
    this.font = role;
    this.size = size;
    this.doc.font(this.fontName(role)).fontSize(size);
  }
  private width(word: string): number {
    const k = `${this.font}|${this.size}|${word}`;
    let w = this.widthCache.get(k);
    if (w === undefined) {
      w = this.doc.widthOfString(word);
      this.widthCache.set(k, w);
    }
    return w;
  }
  private advance(leading: number) {
    if (this.y + leading > this.bottom) this.nextColumn();
  }
  nextColumn() {
    if (this.col < this.cols - 1) {
      this.col++;
      this.y = this.regionTop;
    } else {
      this.doc.addPage({ size: [A4.w, A4.h], margin: 0 });
      this.doc.font(this.fontName(this.font)).fontSize(this.size);
      this.col = 0;
      this.regionTop = MARGIN.top;
      this.y = MARGIN.top;
    }
  }
  /** Greedy line breaking at spaces only: no hyphenation, so every word survives text extraction. */
  lines(s: string, width: number, firstIndent = 0, restIndent = 0): { text: string; indent: number }[] {
    const words = this.text(this.font, s).split(/\s+/).filter(Boolean);
    const space = this.width(" ");
    const out: { text: string; indent: number }[] = [];
    let cur: string[] = [];
    let curW = 0;
    let indent = firstIndent;
    for (const w of words) {
      const ww = this.width(w);
      if (cur.length && curW + space + ww > width - indent) {
        out.push({ text: cur.join(" "), indent });
        cur = [];
        curW = 0;
        indent = restIndent;
      }
      curW += (cur.length ? space : 0) + ww;
      cur.push(w);
    }
    if (cur.length) out.push({ text: cur.join(" "), indent });
    return out;
  }
  paragraph(
    s: string,
    role: FontRole,
    size: number,
    leading: number,
    opts: {
      firstIndent?: number;
      restIndent?: number;
      after?: number;
      keepWithNext?: number;
      fullWidth?: boolean;
    } = {},
  ) {
    this.setFont(role, size);
    const width = opts.fullWidth ? A4.w - MARGIN.left - MARGIN.right : this.colWidth;
    const ls = this.lines(s, width, opts.firstIndent ?? 0, opts.restIndent ?? 0);
    // A heading must not be the last line of a column.
    if (opts.keepWithNext && this.y + leading * (ls.length + opts.keepWithNext) > this.bottom) this.nextColumn();
    for (const l of ls) {
      this.advance(leading);
      this.doc.text(l.text, this.x + l.indent, this.y, { lineBreak: false });
      this.y += leading;
    }
    this.y += opts.after ?? 0;
  }
  /** Starts the (possibly two-column) body region below what is already on the page. */
  startRegion() {
    this.col = 0;
    this.regionTop = this.y;
  }
}

function authorLine(authors: readonly DemoPerson[]): string {
  return authors.map((a) => `${a.initials} ${a.family}`).join(", ");
}

export function pdfAuthor(authors: readonly DemoPerson[]): string {
  return authors.map((a) => `${a.family}, ${a.initials}`).join("; ");
}

/** The line every demo PDF carries on its first page (tests and curators look for it). */
export const INVENTED_LINE = "Invented demo article: every name, venue, study and number in it is invented.";

export async function renderArticlePdf(article: DemoArticle, opts: RenderOptions = {}): Promise<Buffer> {
  const body = loadBodyFont();
  const embedded = (r: FontRole) => r === "serif" && body !== null;
  const text = (r: FontRole, s: string) => (embedded(r) ? s : toWinAnsi(s));
  const fontName = (r: FontRole) => (embedded(r) ? "demo-body" : CORE[r]);
  const created = new Date(Date.UTC(article.year, 5, 1));
  const doc = new PDFDocument({
    size: [A4.w, A4.h],
    margin: 0,
    bufferPages: true,
    autoFirstPage: true,
    info: {
      Title: article.title,
      Author: pdfAuthor(article.authors),
      Subject: article.venueName,
      Keywords: `doi:${article.doi}; invented demo article; ${article.keywords.join("; ")}`,
      Creator: "Echoline demo generator",
      CreationDate: created,
      ModDate: created,
    },
  });
  if (body) doc.registerFont("demo-body", body);
  const chunks: Buffer[] = [];
  doc.on("data", (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on("end", () => resolve(Buffer.concat(chunks)));
    doc.on("error", reject);
  });

  const cols = opts.columns ?? (article.twoColumn ? 2 : 1);
  const L = new Layout(doc, 1, text, fontName, MARGIN.top - 20);
  L.paragraph(`${article.venueName} · invented demo venue`, "sans", 9, 12, { fullWidth: true });
  L.paragraph(`Volume ${article.volume}, Issue ${article.issue}, ${article.year}`, "sans", 9, 12, {
    fullWidth: true,
    after: 14,
  });
  L.paragraph(article.title, "serifBold", 17, 21, { fullWidth: true, after: 8 });
  L.paragraph(authorLine(article.authors), "serif", 11.5, 15, { fullWidth: true, after: 6 });
  L.paragraph(INVENTED_LINE, "serifItalic", 10, 13, { fullWidth: true });
  L.paragraph(`https://doi.org/${article.doi}`, "sans", 9, 12, { fullWidth: true });
  L.paragraph(
    `Licence: ${article.licence}. This article may be copied, mined and reused with attribution.`,
    "sans",
    9,
    12,
    { fullWidth: true, after: 12 },
  );
  L.paragraph("Abstract", "serifBold", 10.5, 14, { fullWidth: true });
  L.paragraph(article.abstract, "serif", 10, 13, { fullWidth: true, after: 4 });
  L.paragraph(`Keywords: ${article.keywords.join(", ")}`, "serifItalic", 9.5, 12, { fullWidth: true, after: 16 });

  const B = new Layout(doc, cols, text, fontName, L.y);
  B.startRegion();
  const size = cols === 2 ? 9.8 : 11;
  const leading = cols === 2 ? 12.4 : 14.6;
  for (const b of article.blocks) {
    if (b.heading)
      B.paragraph(b.heading, "serifBold", b.level === 1 ? size + 1.5 : size + 0.3, leading + 2, {
        keepWithNext: 2,
        after: 2,
      });
    for (const p of b.paragraphs) {
      if (b.section === "references") {
        for (const s of p) B.paragraph(s.text, "serif", size - 0.6, leading - 1.2, { restIndent: 14, after: 2 });
      } else {
        B.paragraph(p.map((s) => s.text).join(" "), "serif", size, leading, { after: 5 });
      }
    }
    B.y += 4;
  }

  const range = doc.bufferedPageRange();
  for (let i = range.start; i < range.start + range.count; i++) {
    doc.switchToPage(i);
    const pageNo = article.firstPage + i;
    doc.font(fontName("sans")).fontSize(8.5);
    if (i > 0) {
      doc.text(text("sans", `${article.venueName} · invented demo venue`), MARGIN.left, 34, { lineBreak: false });
      const right = `${article.year}, ${article.volume}(${article.issue})`;
      doc.text(right, A4.w - MARGIN.right - doc.widthOfString(right), 34, { lineBreak: false });
      doc
        .moveTo(MARGIN.left, 46)
        .lineTo(A4.w - MARGIN.right, 46)
        .lineWidth(0.4)
        .stroke();
    }
    const num = String(pageNo);
    doc.text(num, (A4.w - doc.widthOfString(num)) / 2, A4.h - 38, { lineBreak: false });
  }
  doc.end();
  return done;
}

const LICENCE_NOTE = "invented demo article";

export interface MetadataRow {
  filename: string;
  doi: string;
  title: string;
  authors: string;
  year: number;
  venue: string;
  licence: string;
}

export function pdfFilename(a: DemoArticle): string {
  return `${a.id}.pdf`;
}

export function metadataRows(corpus: DemoCorpus): MetadataRow[] {
  return corpus.articles.map((a) => ({
    filename: pdfFilename(a),
    doi: a.doi,
    title: a.title,
    authors: pdfAuthor(a.authors),
    year: a.year,
    venue: a.venueName,
    licence: a.licence,
  }));
}

/** CSV with a header row (doi, title, authors separated by "; ", year, venue, licence). */
export function renderMetadataCsv(corpus: DemoCorpus): string {
  return `${unparseCsv(metadataRows(corpus), { columns: ["filename", "doi", "title", "authors", "year", "venue", "licence"], newline: "\n" })}\n`;
}

const bibEscape = (s: string) => s.replace(/([&%$#_{}])/g, "\\$1");

/** BibTeX (@article per file); `file` names the PDF, `license` carries the licence. */
export function renderMetadataBibtex(corpus: DemoCorpus): string {
  return corpus.articles
    .map((a) => {
      const fields: [string, string][] = [
        ["title", a.title],
        ["author", a.authors.map((p) => `${p.family}, ${p.initials}`).join(" and ")],
        ["journal", a.venueName],
        ["year", String(a.year)],
        ["volume", String(a.volume)],
        ["number", String(a.issue)],
        ["doi", a.doi],
        ["license", a.licence],
        ["file", pdfFilename(a)],
        ["note", LICENCE_NOTE],
      ];
      return `@article{${a.id},\n${fields.map(([k, v]) => `  ${k} = {${bibEscape(v)}}`).join(",\n")}\n}\n`;
    })
    .join("\n");
}
