import { createHash } from "node:crypto";
import type { DB } from "@/db";
import type { Sourcing } from "@/db/schema/corpus";

// A small invented corpus (invented venues, authors and studies) whose dashboard numbers are
// counted by hand in dashboards.test.ts.
type Cite = { ref: number; locator?: string | null };
export interface FixtureArticle {
  key: string;
  venue: "methods" | "applied";
  year: number;
  title: string;
  authors: string[];
  doi?: string | null;
  status?: "done" | "failed";
  licence?: string | null;
  statements: { value: number; framing: "fixed" | "contextual"; sourcing: Sourcing; cites: Cite[] }[];
  references: { authors: string[]; year: string; title: string; doi?: string | null; kind?: "book" | "article" }[];
}

export const ARTICLES: FixtureArticle[] = [
  {
    key: "M",
    venue: "methods",
    year: 2010,
    title: "Reliability cut-offs reconsidered for invented scales",
    authors: ["Okonkwo, P."],
    doi: "10.5555/inv.2010.1",
    statements: [{ value: 0.7, framing: "fixed", sourcing: "cited_no_locator", cites: [{ ref: 0 }] }],
    references: [
      {
        authors: ["Vantongeren, H.", "Maalouf, R."],
        year: "1994",
        title: "Psychometric foundations for invented scales",
        kind: "book",
      },
    ],
  },
  {
    key: "A2",
    venue: "applied",
    year: 2019,
    title: "Night-shift fatigue among invented harbour pilots",
    authors: ["Siljander, K."],
    statements: [{ value: 0.7, framing: "fixed", sourcing: "cited_no_locator", cites: [{ ref: 0 }] }],
    references: [
      { authors: ["Brennemann, T.", "Adeyemi, L."], year: "2018", title: "Brand loyalty in invented coastal towns" },
      {
        authors: ["Vantongeren, H."],
        year: "1994",
        title: "Psychometric Foundations for Invented Scales.",
        kind: "book",
      },
    ],
  },
  {
    key: "A1",
    venue: "applied",
    year: 2018,
    title: "Brand loyalty in invented coastal towns",
    authors: ["Brennemann, T.", "Adeyemi, L."],
    statements: [
      { value: 0.7, framing: "fixed", sourcing: "cited_with_locator", cites: [{ ref: 0, locator: "p. 12" }] },
    ],
    references: [
      { authors: ["Okonkwo, P."], year: "2010", title: "Reliability cut-offs reconsidered", doi: "10.5555/INV.2010.1" },
    ],
  },
  {
    key: "A3",
    venue: "applied",
    year: 2019,
    title: "Teacher efficacy in invented districts",
    authors: ["Haverkamp, J."],
    statements: [{ value: 0.7, framing: "fixed", sourcing: "unsourced", cites: [] }],
    references: [],
  },
  {
    key: "A4",
    venue: "methods",
    year: 2019,
    title: "A note on invented sampling",
    authors: ["Quispe, D."],
    statements: [],
    references: [],
  },
  {
    key: "A5",
    venue: "applied",
    year: 2018,
    title: "Failed upload",
    authors: ["Nakamura-Ruiz, E."],
    status: "failed",
    statements: [{ value: 0.7, framing: "fixed", sourcing: "unsourced", cites: [] }],
    references: [],
  },
  {
    key: "A6",
    venue: "applied",
    year: 2019,
    title: "No licence recorded",
    authors: ["Ferreira-Lund, O."],
    licence: null,
    statements: [{ value: 0.7, framing: "fixed", sourcing: "unsourced", cites: [] }],
    references: [],
  },
];

export async function loadFixture(
  db: DB,
): Promise<{ venues: Record<string, string>; articles: Record<string, string>; statements: Record<string, string> }> {
  const venues: Record<string, string> = {};
  venues.methods = (
    await db
      .insertInto("venues")
      .values({ name: "Invented Journal of Measurement Methods", is_methods_venue: true })
      .returning("id")
      .executeTakeFirstOrThrow()
  ).id;
  venues.applied = (
    await db
      .insertInto("venues")
      .values({ name: "Invented Quarterly of Applied Studies", is_methods_venue: false })
      .returning("id")
      .executeTakeFirstOrThrow()
  ).id;
  const articles: Record<string, string> = {};
  const statements: Record<string, string> = {};
  for (const a of ARTICLES) {
    const sha = createHash("sha256").update(a.key).digest("hex");
    await db
      .insertInto("stored_files")
      .values({ sha256: sha, size_bytes: 1, media_type: "text/plain", storage_key: sha })
      .execute();
    const art = await db
      .insertInto("articles")
      .values({
        file_sha256: sha,
        original_filename: `${a.key}.txt`,
        source_kind: "text",
        venue_id: venues[a.venue],
        year: a.year,
        doi: a.doi ?? null,
        title: a.title,
        authors: JSON.stringify(a.authors),
        licence: a.licence === undefined ? "CC-BY-4.0" : a.licence,
        status: a.status ?? "done",
      })
      .returning("id")
      .executeTakeFirstOrThrow();
    articles[a.key] = art.id;
    const refIds: string[] = [];
    for (const [i, r] of a.references.entries()) {
      const row = await db
        .insertInto("references")
        .values({
          article_id: art.id,
          ordinal: i,
          raw: `${r.authors.join(", ")} (${r.year}). ${r.title}.`,
          authors: JSON.stringify(r.authors),
          year: r.year,
          title: r.title,
          doi: r.doi ?? null,
          kind: r.kind ?? "article",
          work_id: null,
          container: null,
        })
        .returning("id")
        .executeTakeFirstOrThrow();
      refIds.push(row.id);
    }
    let citeOrdinal = 0;
    for (const [i, s] of a.statements.entries()) {
      const st = await db
        .insertInto("statements")
        .values({
          article_id: art.id,
          ordinal: i,
          page: 3,
          section: "methods",
          sentence: `Reliability above ${s.value} was taken as acceptable (${a.key}).`,
          kind: "threshold",
          statistic: "cronbach_alpha",
          comparator: ">=",
          value: s.value,
          framing: s.framing,
          procedure_key: null,
          sourcing: s.sourcing,
          fingerprint: `${a.key}-${i}`,
        })
        .returning("id")
        .executeTakeFirstOrThrow();
      statements[`${a.key}.${i}`] = st.id;
      for (const c of s.cites) {
        const ref = a.references[c.ref];
        const cit = await db
          .insertInto("citations")
          .values({
            article_id: art.id,
            ordinal: citeOrdinal++,
            page: 3,
            sentence: "…",
            authors: ref.authors[0].split(",")[0],
            year: ref.year,
            locator: c.locator ?? null,
            secondary: false,
            reference_id: refIds[c.ref],
          })
          .returning("id")
          .executeTakeFirstOrThrow();
        await db.insertInto("statement_citations").values({ statement_id: st.id, citation_id: cit.id }).execute();
      }
    }
  }
  return { venues, articles, statements };
}
