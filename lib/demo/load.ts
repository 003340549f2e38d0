/**
 * Loads the invented demo corpus through the real pipeline: each PDF is ingested like an upload
 * (stored by SHA-256, article row, mining job) and the worker mines it. Idempotent: the generator
 * is deterministic, so a second run produces the same bytes, finds every hash already present and
 * creates nothing. Rendered PDFs are cached on disk so the second start does not render again.
 */
import { mkdir, readFile, rename, writeFile } from "node:fs/promises";
import path from "node:path";
import { sql } from "kysely";
import type { DB } from "@/db";
import { IngestError, ingestFile, sha256Hex } from "@/lib/corpus/ingest";
import { installQueues } from "@/lib/jobs/registry";
import { getStorage, type FileStorage } from "@/lib/storage";
import { DEFAULT_COUNT, DEFAULT_SEED, generateCorpus, type DemoVenue } from "./corpus";
import { pdfFilename, pdfAuthor, renderArticlePdf } from "./render";

/** Bump when the generator or renderer changes what they write, so stale cached PDFs are not reused. */
export const DEMO_GENERATOR_VERSION = 1;

export interface LoadDemoOptions {
  count?: number;
  seed?: number;
  log?: (s: string) => void;
  storage?: FileStorage;
  /** Where rendered PDFs are cached; default `.data/demo/` of the working directory. */
  cacheDir?: string;
}

/** Finds or creates the demo venues by name and returns their ids by venue key. */
export async function ensureDemoVenues(db: DB, venues: readonly DemoVenue[]): Promise<Map<string, string>> {
  const ids = new Map<string, string>();
  for (const v of venues) {
    const existing = await db.selectFrom("venues").select("id").where("name", "=", v.name).executeTakeFirst();
    if (existing) {
      ids.set(v.key, existing.id);
      continue;
    }
    const row = await db
      .insertInto("venues")
      .values({
        name: v.name,
        abbreviation: v.abbreviation,
        issn: null,
        is_methods_venue: v.isMethodsVenue,
        is_demo: true,
      })
      .returning("id")
      .executeTakeFirstOrThrow();
    ids.set(v.key, row.id);
  }
  return ids;
}

async function cachedPdf(file: string, render: () => Promise<Buffer>): Promise<Uint8Array> {
  try {
    return new Uint8Array(await readFile(file));
  } catch {
    const data = await render();
    // Write then rename: an interrupted start never leaves half a PDF in the cache.
    const tmp = `${file}.${process.pid}.tmp`;
    await writeFile(tmp, data);
    await rename(tmp, file);
    return new Uint8Array(data);
  }
}

export async function loadDemoCorpus(
  db: DB,
  opts: LoadDemoOptions = {},
): Promise<{ created: number; skipped: number }> {
  const log = opts.log ?? (() => {});
  const seed = opts.seed ?? DEFAULT_SEED;
  const count = opts.count ?? DEFAULT_COUNT;
  const corpus = generateCorpus({ count, seed });
  const storage = opts.storage ?? getStorage();
  const dir = opts.cacheDir ?? path.join(process.cwd(), ".data", "demo", `v${DEMO_GENERATOR_VERSION}-seed${seed}`);
  await mkdir(dir, { recursive: true });
  const venueIds = await ensureDemoVenues(db, corpus.venues);
  await installQueues(db);

  let created = 0;
  let skipped = 0;
  let doiTaken = 0;
  const started = Date.now();
  for (const [i, a] of corpus.articles.entries()) {
    const filename = pdfFilename(a);
    const data = await cachedPdf(path.join(dir, filename), () => renderArticlePdf(a));
    const sha = sha256Hex(data);
    const existing = await db.selectFrom("articles").select("id").where("file_sha256", "=", sha).executeTakeFirst();
    if (existing) {
      skipped++;
      continue;
    }
    // A corpus generated with another count or seed reuses DOIs for different files: keep the
    // article that is there rather than fail the start.
    const sameDoi = await db
      .selectFrom("articles")
      .select("id")
      .where(sql<string>`lower(doi)`, "=", a.doi.toLowerCase())
      .executeTakeFirst();
    if (sameDoi) {
      skipped++;
      doiTaken++;
      continue;
    }
    try {
      const r = await db.transaction().execute((trx) =>
        ingestFile(trx, storage, {
          data,
          filename,
          metadata: {
            title: a.title,
            authors: pdfAuthor(a.authors).split("; "),
            year: a.year,
            doi: a.doi,
            venueId: venueIds.get(a.venueKey),
            licence: a.licence,
          },
          uploadedBy: null,
          isDemo: true,
        }),
      );
      if (r.duplicate) skipped++;
      else created++;
    } catch (err) {
      // A curator may already have loaded a (different) file under a demo DOI: keep going.
      if (err instanceof IngestError && err.code === "doi_taken") {
        skipped++;
        doiTaken++;
      } else throw err;
    }
    if ((i + 1) % 50 === 0)
      log(
        `demo: ${i + 1}/${corpus.articles.length} files (${created} new) in ${((Date.now() - started) / 1000).toFixed(1)} s`,
      );
  }
  if (doiTaken)
    log(
      `demo: ${doiTaken} files skipped because an article already has their DOI (a demo corpus of another size or seed was loaded before)`,
    );
  log(
    `demo: ${created} articles queued for mining, ${skipped} already present (${((Date.now() - started) / 1000).toFixed(1)} s)`,
  );
  return { created, skipped };
}
