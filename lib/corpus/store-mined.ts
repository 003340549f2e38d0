/**
 * Storing one mined article: what the contract schema accepted, all of it inside the caller's
 * transaction. Re-mining deletes the article's rows and inserts the new ones in that same
 * transaction, so readers see the old rows or the new rows, never a mixture.
 */
import { createHash } from "node:crypto";
import type { DB } from "@/db";
import type { Sourcing } from "@/lib/vocabulary";
import type { DocumentCitation, Statement, StatementCitation, SuccessLine } from "@/lib/mining/contract";

/** Sourcing of one statement, decided from its own citations (product.md, "sourcing"). */
export function sourcingOf(citations: readonly Pick<StatementCitation, "locator" | "secondary">[]): Sourcing {
  if (citations.length === 0) return "unsourced";
  if (citations.every((c) => c.secondary)) return "secondary_only";
  if (citations.some((c) => c.locator !== null && c.locator.trim() !== "")) return "cited_with_locator";
  return "cited_no_locator";
}

/** Case, spacing, quote and dash variants must not change a statement's identity across miner versions. */
export function normaliseSentence(s: string): string {
  return s
    .normalize("NFKC")
    .toLowerCase()
    .replace(/[\u2018\u2019\u201A\u201B\u2032]/g, "'")
    .replace(/[\u201C\u201D\u201E\u201F\u2033]/g, '"')
    .replace(/[\u2010-\u2015\u2212]/g, "-")
    .replace(/\s+/g, " ")
    .trim();
}

/**
 * Stable identity of each statement, so curator reviews (keyed by article + fingerprint) re-attach
 * after re-mining: normalised sentence + kind + statistic + its position among identical ones.
 */
export function fingerprints(statements: readonly Pick<Statement, "sentence" | "kind" | "statistic">[]): string[] {
  const seen = new Map<string, number>();
  return statements.map((s) => {
    const base = `${normaliseSentence(s.sentence)}\u0000${s.kind}\u0000${s.statistic ?? ""}`;
    const n = seen.get(base) ?? 0;
    seen.set(base, n + 1);
    return createHash("sha256").update(`${base}\u0000${n}`).digest("hex").slice(0, 32);
  });
}

const surname = (authors: string) =>
  normaliseSentence(authors)
    .split(/[\s,&]+/)
    .find((w) => w.length > 1 && w !== "et" && w !== "al.") ?? "";

function sameCitation(a: StatementCitation, b: DocumentCitation): boolean {
  return a.authors === b.authors && a.year === b.year && a.locator === b.locator && a.secondary === b.secondary;
}

export type StoreCounts = { statements: number; citations: number; references: number };

/** Replaces every mined row of `articleId` with the rows of `line`. Call inside a transaction. */
export async function replaceMinedRows(trx: DB, articleId: string, line: SuccessLine): Promise<StoreCounts> {
  // statement_citations go with their statements (on delete cascade).
  await trx.deleteFrom("statements").where("article_id", "=", articleId).execute();
  await trx.deleteFrom("citations").where("article_id", "=", articleId).execute();
  // A curator's placement of a reference on a work (merge or split) outlives re-mining: it is put
  // back on the new reference with the same text.
  const placed = await trx
    .selectFrom("references as r")
    .innerJoin("works as w", "w.id", "r.work_id")
    .select(["r.raw", "r.work_id"])
    .where("r.article_id", "=", articleId)
    .where("r.work_set_by", "=", "curator")
    .where("w.merged_into", "is", null)
    .execute();
  await trx.deleteFrom("references").where("article_id", "=", articleId).execute();
  const placedBy = new Map(placed.map((p) => [p.raw, p.work_id!]));

  const refIds: string[] = [];
  if (line.references.length) {
    const rows = await trx
      .insertInto("references")
      .values(
        line.references.map((r, i) => ({
          article_id: articleId,
          ordinal: i,
          raw: r.raw,
          authors: JSON.stringify(r.authors),
          year: r.year,
          title: r.title,
          container: r.container,
          doi: r.doi,
          kind: r.kind,
          ...(placedBy.has(r.raw) ? { work_id: placedBy.get(r.raw)!, work_set_by: "curator" as const } : {}),
        })),
      )
      .returning(["id", "ordinal"])
      .execute();
    for (const r of rows) refIds[r.ordinal] = r.id;
  }

  // A citation points at its entry of the reference list: by number for numbered styles, else by
  // first author's surname and year (the work-level resolution is the citation graph's job).
  const refFor = (c: StatementCitation): string | null => {
    if (c.number != null) {
      const i = line.references.findIndex((r) => r.number === c.number);
      return i >= 0 ? refIds[i] : null;
    }
    const name = surname(c.authors);
    if (!name) return null;
    const i = line.references.findIndex(
      (r) => r.year === c.year && r.authors.length > 0 && normaliseSentence(r.authors[0]).includes(name),
    );
    return i >= 0 ? refIds[i] : null;
  };

  const docCitations: DocumentCitation[] = [...line.citations];
  // Statement citations are the in-text citations of their sentence, so each should be in the
  // document list; one that is not (a miner inconsistency) is added there so the link can exist.
  const links: { statement: number; citation: number }[] = [];
  line.statements.forEach((s, si) => {
    const used = new Set<number>();
    for (const c of s.citations) {
      let ci = docCitations.findIndex((d, k) => !used.has(k) && d.sentence === s.sentence && sameCitation(c, d));
      if (ci < 0) ci = docCitations.findIndex((d, k) => !used.has(k) && d.page === s.page && sameCitation(c, d));
      if (ci < 0) {
        docCitations.push({ ...c, page: s.page, sentence: s.sentence });
        ci = docCitations.length - 1;
      }
      used.add(ci);
      links.push({ statement: si, citation: ci });
    }
  });

  const citationIds: string[] = [];
  for (let off = 0; off < docCitations.length; off += 1000) {
    const chunk = docCitations.slice(off, off + 1000);
    const rows = await trx
      .insertInto("citations")
      .values(
        chunk.map((c, i) => ({
          article_id: articleId,
          ordinal: off + i,
          page: c.page,
          sentence: c.sentence,
          authors: c.authors,
          year: c.year,
          locator: c.locator,
          secondary: c.secondary,
          reference_id: refFor(c),
        })),
      )
      .returning(["id", "ordinal"])
      .execute();
    for (const r of rows) citationIds[r.ordinal] = r.id;
  }

  const prints = fingerprints(line.statements);
  const statementIds: string[] = [];
  for (let off = 0; off < line.statements.length; off += 1000) {
    const chunk = line.statements.slice(off, off + 1000);
    const rows = await trx
      .insertInto("statements")
      .values(
        chunk.map((s, i) => ({
          article_id: articleId,
          ordinal: off + i,
          page: s.page,
          section: s.section,
          sentence: s.sentence,
          kind: s.kind,
          statistic: s.statistic,
          statistic_label: s.statistic === "other" ? (s.statistic_label ?? null) : null,
          comparator: s.comparator,
          value: s.value,
          framing: s.framing,
          procedure_key: s.procedure ?? null,
          sourcing: sourcingOf(s.citations),
          fingerprint: prints[off + i],
        })),
      )
      .returning(["id", "ordinal"])
      .execute();
    for (const r of rows) statementIds[r.ordinal] = r.id;
  }

  if (links.length) {
    const pairs = links.map((l) => ({ statement_id: statementIds[l.statement], citation_id: citationIds[l.citation] }));
    for (let off = 0; off < pairs.length; off += 2000) {
      await trx
        .insertInto("statement_citations")
        .values(pairs.slice(off, off + 2000))
        .onConflict((oc) => oc.doNothing())
        .execute();
    }
  }
  return { statements: line.statements.length, citations: docCitations.length, references: line.references.length };
}
