/**
 * Storing a mined article: all rows or none, re-mining keeps reviews, the same file twice is one
 * article. The real worker code and miner against a suite-owned test database.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ingest } from "../../helpers/ingest";
import { queueArticle } from "@/lib/corpus/ingest";
import { sourcingOf, fingerprints } from "@/lib/corpus/store-mined";
import { startHarness, waitForArticles, rowCounts, FAST_RETRY, type Harness } from "./harness";
import { goodPdf } from "./fixtures";

let h: Harness;
let failNext = false;
beforeAll(async () => {
  h = await startHarness({
    concurrency: 1,
    // Production waits 5 s and more between tries; this suite only needs to see one happen.
    retry: FAST_RETRY,
    beforeCommit: async () => {
      if (failNext) {
        failNext = false;
        throw new Error("injected failure after the rows were written");
      }
    },
  });
});
afterAll(async () => {
  await h?.stop();
});

const text = (s: string) => new TextEncoder().encode(s);
const ARTICLE = [
  "Methods",
  "Reliability above .70 is acceptable (Okafor & Lindqvist, 1994, p. 112).",
  "A loading of at least .40 was required (Brandtner, 2003).",
  "Values of .80 or higher indicate good reliability (Sorensby, 2008, as cited in Haverkamp, 2011).",
  "Reliability above .70 is acceptable.",
  "",
  "References",
  "Brandtner, K. (2003). Measuring invented constructs. Fictive Press.",
  "Okafor, T., & Lindqvist, M. (1994). Invented scales. Journal of Made-up Methods, 2, 100-120.",
].join("\n");

describe("sourcing and fingerprints", () => {
  it("decides sourcing from a statement's citations", () => {
    expect(sourcingOf([])).toBe("unsourced");
    expect(sourcingOf([{ locator: null, secondary: true }])).toBe("secondary_only");
    expect(
      sourcingOf([
        { locator: "p. 4", secondary: false },
        { locator: null, secondary: true },
      ]),
    ).toBe("cited_with_locator");
    expect(sourcingOf([{ locator: null, secondary: false }])).toBe("cited_no_locator");
  });
  it("gives identical sentences different, stable fingerprints by position, insensitive to spacing and quotes", () => {
    const a = fingerprints([
      { sentence: "Alpha  above .70 is ‘fine’.", kind: "threshold", statistic: "cronbach_alpha" },
      { sentence: "Alpha above .70 is 'fine'.", kind: "threshold", statistic: "cronbach_alpha" },
    ]);
    const b = fingerprints([
      { sentence: "alpha above .70 is 'fine'.", kind: "threshold", statistic: "cronbach_alpha" },
    ]);
    expect(a[0]).not.toBe(a[1]);
    expect(b[0]).toBe(a[0]);
  });
});

describe("mining pipeline", () => {
  it("stores the same file once and reports the duplicate", async () => {
    const data = await goodPdf();
    const first = await ingest(h.db, h.storage, { data, filename: "a.pdf", uploadedBy: null });
    const second = await ingest(h.db, h.storage, { data, filename: "copy-of-a.pdf", uploadedBy: null });
    expect(second).toEqual({ articleId: first.articleId, duplicate: true });
    const n = await h.db
      .selectFrom("articles")
      .select((eb) => eb.fn.countAll<number>().as("n"))
      .executeTakeFirstOrThrow();
    expect(Number(n.n)).toBe(1);
    const done = await waitForArticles(h.db, [first.articleId]);
    expect(done.get(first.articleId)!.status).toBe("done");
    // Metadata from the document itself filled the empty fields.
    const a = await h.db
      .selectFrom("articles")
      .select(["title", "doi", "licence", "pages"])
      .where("id", "=", first.articleId)
      .executeTakeFirstOrThrow();
    expect(a).toMatchObject({
      title: "Shift Rhythms and Ward Climate: A Study of Invented Hospitals",
      doi: "10.5555/jics.2019.014",
      licence: "CC BY 4.0",
      pages: 2,
    });
  });

  it("stores all of an article's rows or none: a failure before commit leaves nothing", async () => {
    failNext = true;
    const { articleId } = await ingest(h.db, h.storage, {
      data: text(ARTICLE + "\nOne."),
      filename: "atomic.txt",
      uploadedBy: null,
    });
    // The injected failure is retried (it is "ours", not the file's); the retry stores everything.
    await waitForArticles(h.db, [articleId]);
    const events = await h.db
      .selectFrom("job_events")
      .select(["state", "message"])
      .where("article_id", "=", articleId)
      .orderBy("id")
      .execute();
    const retry = events.findIndex((e) => e.state === "retry");
    expect(retry).toBeGreaterThan(0);
    expect(events[retry].message).toMatch(/injected failure/);
    expect(events.at(-1)!.state).toBe("done");
    const rows = await rowCounts(h.db, [articleId]);
    expect(rows.statements).toBeGreaterThanOrEqual(3);
    // No statement was stored twice (the rolled-back try left no rows behind).
    const ordinals = await h.db
      .selectFrom("statements")
      .select("ordinal")
      .where("article_id", "=", articleId)
      .execute();
    expect(new Set(ordinals.map((o) => o.ordinal)).size).toBe(ordinals.length);
  });

  it("while the failing transaction is open, no partial rows are visible", async () => {
    let seenInside = -1;
    let seenOutside = -1;
    const { articleId } = await ingest(h.db, h.storage, {
      data: text(ARTICLE + "\nTwo."),
      filename: "visible.txt",
      uploadedBy: null,
    });
    failNext = false;
    await waitForArticles(h.db, [articleId]);
    // Run the job directly with a probe: inside the transaction the rows exist, outside they do not.
    const { createMiningJob } = await import("@/workers/mining-job");
    const { createMiner } = await import("@/lib/mining");
    const probe = createMiningJob({
      db: h.db,
      storage: h.storage,
      boss: h.boss,
      createMiner: (o) => createMiner(o),
      log: { info: () => {}, warn: () => {}, error: () => {} },
      beforeCommit: async (trx, id) => {
        seenInside = (await trx.selectFrom("statements").select("id").where("article_id", "=", id).execute()).length;
        seenOutside = (await rowCounts(h.db, [id])).statements;
        throw new Error("injected");
      },
    });
    const before = await rowCounts(h.db, [articleId]);
    await expect(probe.run(articleId)).rejects.toThrow("injected");
    await probe.close();
    expect(seenInside).toBe(before.statements);
    // The outside reader still sees the previous run's rows (old or new, never a mixture).
    expect(seenOutside).toBe(before.statements);
    expect(await rowCounts(h.db, [articleId])).toEqual(before);
  });

  it("re-mining replaces the rows and keeps the curator's reviews on the same statements", async () => {
    const { articleId } = await ingest(h.db, h.storage, {
      data: text(ARTICLE),
      filename: "remine.txt",
      uploadedBy: null,
    });
    await waitForArticles(h.db, [articleId]);
    const user = await h.db
      .insertInto("User")
      .values({ email: "curator@invented.example", name: "Invented Curator", role: "curator" })
      .returning("id")
      .executeTakeFirstOrThrow();
    const before = await h.db
      .selectFrom("statements")
      .select(["id", "fingerprint", "sentence", "sourcing"])
      .where("article_id", "=", articleId)
      .orderBy("ordinal")
      .execute();
    expect(before.length).toBeGreaterThanOrEqual(3);
    // Sourcing as product.md defines it, on the stored rows.
    expect(before.find((s) => s.sentence.includes("p. 112"))!.sourcing).toBe("cited_with_locator");
    expect(before.find((s) => s.sentence.includes("Brandtner, 2003"))!.sourcing).toBe("cited_no_locator");
    expect(before.find((s) => s.sentence === "Reliability above .70 is acceptable.")!.sourcing).toBe("unsourced");
    await h.db
      .insertInto("statement_reviews")
      .values({ article_id: articleId, fingerprint: before[0].fingerprint, reviewer_id: user.id, verdict: "correct" })
      .execute();
    // A curator placed the Brandtner reference on a work by hand (as a split or merge does).
    const work = await h.db
      .insertInto("works")
      .values({
        title: "Measuring invented constructs",
        kind: "book",
        doi: null,
        normalised_title: null,
        first_author: "brandtner",
        year: "2003",
        article_id: null,
        merged_into: null,
      })
      .returning("id")
      .executeTakeFirstOrThrow();
    await h.db
      .updateTable("references")
      .set({ work_id: work.id, work_set_by: "curator" })
      .where("article_id", "=", articleId)
      .where("raw", "like", "Brandtner%")
      .execute();

    await h.db.transaction().execute((trx) => queueArticle(trx, articleId, "remine"));
    await waitForArticles(h.db, [articleId]);
    const after = await h.db
      .selectFrom("statements")
      .select(["id", "fingerprint"])
      .where("article_id", "=", articleId)
      .orderBy("ordinal")
      .execute();
    expect(after.map((s) => s.fingerprint)).toEqual(before.map((s) => s.fingerprint));
    expect(after[0].id).not.toBe(before[0].id);
    const reviewed = await h.db
      .selectFrom("statements")
      .innerJoin("statement_reviews", (j) =>
        j
          .onRef("statement_reviews.article_id", "=", "statements.article_id")
          .onRef("statement_reviews.fingerprint", "=", "statements.fingerprint"),
      )
      .select(["statements.sentence", "statement_reviews.verdict"])
      .where("statements.article_id", "=", articleId)
      .execute();
    expect(reviewed).toEqual([{ sentence: before[0].sentence, verdict: "correct" }]);
    // The re-mined Brandtner reference is a new row on the curator's work; the other is not marked.
    const refs = await h.db
      .selectFrom("references")
      .select(["raw", "work_id", "work_set_by"])
      .where("article_id", "=", articleId)
      .orderBy("ordinal")
      .execute();
    expect(refs.map((r) => [r.raw.slice(0, 9), r.work_set_by])).toEqual([
      ["Brandtner", "curator"],
      ["Okafor, T", "resolver"],
    ]);
    expect(refs[0].work_id).toBe(work.id);
    const linked = await h.db
      .selectFrom("statement_citations")
      .innerJoin("statements", "statements.id", "statement_citations.statement_id")
      .select("statement_id")
      .where("statements.article_id", "=", articleId)
      .execute();
    expect(linked.length).toBeGreaterThanOrEqual(3);
  });
});

describe("upload batches with a metadata file", () => {
  it("stores the parsed entries in the batch's typed columns and matches them by file name and, after mining, by DOI", async () => {
    const { parseMetadata } = await import("@/lib/metadata");
    const { createBatch, metadataForFile, applyBatchMetadataByDoi } = await import("@/lib/corpus/batches");
    const fs = await import("node:fs");
    const path = await import("node:path");
    // Invented BibTeX fixture; the expected values are read off the file by hand.
    const bib = fs.readFileSync(path.join(import.meta.dirname, "../../fixtures/metadata/invented.bib"), "utf8");
    const { entries } = await parseMetadata(bib);
    const batchId = await createBatch(h.db, { createdBy: null, metadataFilename: "invented.bib", entries });
    const stored = await h.db
      .selectFrom("upload_batches")
      .select(["metadata_filename", "metadata_entries"])
      .where("id", "=", batchId)
      .executeTakeFirstOrThrow();
    expect(stored.metadata_filename).toBe("invented.bib");
    expect(stored.metadata_entries.map((e) => e.title)).toEqual([
      "Shift Rhythms and Ward Climate",
      "Measuring Invented Constructs",
    ]);
    const byName = await metadataForFile(h.db, batchId, "okafor2019.pdf");
    expect(byName).toMatchObject({
      matched: true,
      metadata: { title: "Shift Rhythms and Ward Climate", year: 2019, licence: "CC BY 4.0" },
    });
    expect((await metadataForFile(h.db, batchId, "unlisted.pdf")).matched).toBe(false);
    // A batch without a metadata file keeps the column defaults (no file name, no entries).
    const plain = await createBatch(h.db, { createdBy: null });
    expect(
      await h.db
        .selectFrom("upload_batches")
        .select(["metadata_filename", "metadata_entries"])
        .where("id", "=", plain)
        .executeTakeFirstOrThrow(),
    ).toEqual({ metadata_filename: null, metadata_entries: [] });

    // An article of the batch whose file name matched nothing: the DOI read from the document does.
    const bytes = text("Methods\nAn invented sentence for the batch test.");
    const sha = (await import("@/lib/corpus/ingest")).sha256Hex(bytes);
    const key = await h.storage.put(sha, bytes);
    await h.db
      .insertInto("stored_files")
      .values({ sha256: sha, size_bytes: bytes.length, media_type: "text/plain", storage_key: key })
      .execute();
    const art = await h.db
      .insertInto("articles")
      .values({ file_sha256: sha, original_filename: "renamed.txt", source_kind: "text", upload_batch_id: batchId })
      .returning("id")
      .executeTakeFirstOrThrow();
    await h.db.transaction().execute((trx) => applyBatchMetadataByDoi(trx, art.id, "10.5555/jics.2019.014"));
    const filled = await h.db
      .selectFrom("articles")
      .select(["title", "authors", "year", "licence"])
      .where("id", "=", art.id)
      .executeTakeFirstOrThrow();
    expect(filled).toEqual({
      title: "Shift Rhythms and Ward Climate",
      authors: ["Okafor, Tunde", "Lindqvist, Maren"],
      year: 2019,
      licence: "CC BY 4.0",
    });
  });
});
