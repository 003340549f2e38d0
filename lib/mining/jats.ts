// JATS XML: front matter for ArticleMeta, body sections as heading + paragraph lines, ref-list as entries.
import { XMLValidator } from "fast-xml-parser";

export type JatsDocument = { lines: string[]; referenceLines: string[]; meta: JatsMeta };
export type JatsMeta = {
  title: string | null;
  authors: string[];
  year: string | null;
  doi: string | null;
  venue: string | null;
  licence: string | null;
};

const ENTITIES: Record<string, string> = { amp: "&", lt: "<", gt: ">", quot: '"', apos: "'", nbsp: " " };
function decode(s: string): string {
  return s
    .replace(/&#x([0-9a-f]+);/gi, (_m, h: string) => String.fromCodePoint(parseInt(h, 16)))
    .replace(/&#(\d+);/g, (_m, d: string) => String.fromCodePoint(Number(d)))
    .replace(/&(\w+);/g, (m, n: string) => ENTITIES[n] ?? m);
}
function text(xml: string): string {
  return decode(xml.replace(/<[^>]+>/g, " "))
    .replace(/\s+/g, " ")
    .trim();
}
function first(xml: string, tag: string): string | null {
  const m = new RegExp(`<${tag}\\b[^>]*>([\\s\\S]*?)</${tag}>`, "i").exec(xml);
  return m ? text(m[1]) || null : null;
}

export type JatsCheck = { ok: true } | { ok: false; code: "not_jats" | "corrupt"; message: string };

export function looksLikeXml(head: string): boolean {
  return /^\s*(?:<\?xml|<!DOCTYPE|<[A-Za-z])/.test(head);
}

export function checkJats(xml: string): JatsCheck {
  const valid = XMLValidator.validate(xml);
  if (valid !== true)
    return {
      ok: false,
      code: "corrupt",
      message: `The XML is not well formed: ${valid.err.msg} (line ${valid.err.line}).`,
    };
  const root = /<(?!\?|!)([A-Za-z][\w:.-]*)/.exec(xml)?.[1];
  if (root !== "article" || !/<article-meta\b/.test(xml)) {
    return {
      ok: false,
      code: "not_jats",
      message: `The XML root is <${root ?? "?"}>, not a JATS <article> with <article-meta>; only JATS article XML can be mined.`,
    };
  }
  return { ok: true };
}

export function parseJats(xml: string): JatsDocument {
  const front = /<article-meta\b[\s\S]*?<\/article-meta>/.exec(xml)?.[0] ?? "";
  const journal = /<journal-meta\b[\s\S]*?<\/journal-meta>/.exec(xml)?.[0] ?? "";
  const authors = [...front.matchAll(/<contrib\b[^>]*contrib-type="author"[^>]*>([\s\S]*?)<\/contrib>/g)]
    .map((m) => {
      const sn = first(m[1], "surname");
      const gn = first(m[1], "given-names");
      return [sn, gn].filter(Boolean).join(", ");
    })
    .filter(Boolean);
  const licenceBlock = /<license\b([^>]*)>([\s\S]*?)<\/license>/.exec(front);
  const licenceUrl = licenceBlock
    ? (/xlink:href="([^"]+)"/.exec(licenceBlock[1])?.[1] ??
      /<ext-link[^>]*xlink:href="([^"]+)"/.exec(licenceBlock[2])?.[1])
    : null;
  const meta: JatsMeta = {
    title: first(front, "article-title"),
    authors,
    year: /<pub-date\b[\s\S]*?<year>(\d{4})<\/year>/.exec(front)?.[1] ?? null,
    doi: (/<article-id[^>]*pub-id-type="doi"[^>]*>([^<]+)</.exec(front)?.[1] ?? null)?.trim().toLowerCase() ?? null,
    venue: first(journal, "journal-title"),
    licence: licenceUrl ?? (licenceBlock ? text(licenceBlock[2]) || null : null),
  };
  const body = /<body\b[^>]*>([\s\S]*?)<\/body>/.exec(xml)?.[1] ?? "";
  const lines: string[] = [];
  const abstract = /<abstract\b[^>]*>([\s\S]*?)<\/abstract>/.exec(front)?.[1];
  if (abstract) lines.push(text(abstract), "");
  for (const m of body.matchAll(/<title\b[^>]*>([\s\S]*?)<\/title>|<p\b[^>]*>([\s\S]*?)<\/p>/g)) {
    if (m[1] !== undefined) {
      const t = text(m[1]);
      if (/^(references|bibliography)$/i.test(t)) continue;
      lines.push("", t);
    } else lines.push(text(m[2] ?? ""), "");
  }
  const refs = /<ref-list\b[^>]*>([\s\S]*?)<\/ref-list>/.exec(xml)?.[1] ?? "";
  const referenceLines = [...refs.matchAll(/<ref\b[^>]*>([\s\S]*?)<\/ref>/g)].map((m) => {
    const label = first(m[1], "label");
    const cite = m[1].replace(/<label>[\s\S]*?<\/label>/, "");
    const t = text(cite.replace(/<\/(surname|given-names)>/g, "$&,").replace(/<\/person-group>/g, "$&."));
    return label ? `[${label.replace(/[\[\].]/g, "")}] ${t}` : t;
  });
  return { lines, referenceLines, meta };
}
