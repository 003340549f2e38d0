/**
 * Metadata the document itself gives (JATS front matter, PDF document info and first page, as the
 * miner reports it). It only fills fields that are still empty: a curator's correction or an
 * uploaded metadata file always wins over what the file says about itself.
 */
import { z } from "zod";
import type { DB } from "@/db";
import { normaliseDoi } from "@/lib/corpus/doi";

const DocumentMeta = z
  .object({
    title: z.string().nullish(),
    authors: z.array(z.string()).nullish(),
    year: z.union([z.number(), z.string()]).nullish(),
    doi: z.string().nullish(),
    venue: z.string().nullish(),
    licence: z.string().nullish(),
    firstPageText: z.string().nullish(),
  })
  .passthrough();

type Current = {
  title: string | null;
  authors: string[];
  year: number | null;
  doi: string | null;
  licence: string | null;
  venue_id: string | null;
};

export async function documentMetaUpdate(trx: DB, current: Current, raw: unknown) {
  const parsed = DocumentMeta.safeParse(raw ?? {});
  const meta = parsed.success ? parsed.data : {};
  const out: {
    document_meta: string;
    title?: string;
    authors?: string;
    year?: number;
    doi?: string;
    licence?: string;
    venue_id?: string;
  } = {
    // The first page is kept short: it is there for the curator to check metadata against.
    document_meta: JSON.stringify({ ...meta, firstPageText: meta.firstPageText?.slice(0, 4000) ?? null }),
  };
  const title = meta.title?.replace(/\s+/g, " ").trim();
  if (!current.title && title) out.title = title.slice(0, 1000);
  if (current.authors.length === 0 && meta.authors?.length)
    out.authors = JSON.stringify(
      meta.authors
        .map((a) => a.trim())
        .filter(Boolean)
        .slice(0, 200),
    );
  const year = meta.year == null ? null : Number(String(meta.year).match(/\b(1[89]\d\d|20\d\d)\b/)?.[1]);
  if (current.year == null && year && year >= 1800 && year <= 2100) out.year = year;
  const doi = normaliseDoi(meta.doi);
  if (!current.doi && doi) {
    // Another article may already carry this DOI (unique); then the document's claim is ignored.
    const taken = await trx
      .selectFrom("articles")
      .select("id")
      .where((eb) => eb(eb.fn("lower", ["doi"]), "=", doi.toLowerCase()))
      .executeTakeFirst();
    if (!taken) out.doi = doi;
  }
  if (!current.licence && meta.licence?.trim()) out.licence = meta.licence.trim().slice(0, 500);
  if (!current.venue_id && meta.venue?.trim()) {
    const v = await trx
      .selectFrom("venues")
      .select("id")
      .where((eb) => eb(eb.fn("lower", ["name"]), "=", meta.venue!.trim().toLowerCase()))
      .executeTakeFirst();
    if (v) out.venue_id = v.id;
  }
  return out;
}
