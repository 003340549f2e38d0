/**
 * Bad input ends as a clear failure, never a crashed worker or partial rows (issue 3, "The worker").
 * At least 200 generated malformed files go through the real worker code and the real miner.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { IngestError } from "@/lib/corpus/ingest";
import { ingest } from "../../helpers/ingest";
import { startHarness, waitForArticles, enqueueRaw, rowCounts, type Harness } from "./harness";
import { goodPdf, encryptedPdf, imageOnlyPdf, hugePageCountPdf, flipStreams, rng } from "./fixtures";

let h: Harness;
beforeAll(async () => {
  h = await startHarness();
});
afterAll(async () => {
  await h?.stop();
});

type Case = { name: string; data: Uint8Array; raw?: boolean };

async function malformedCases(): Promise<Case[]> {
  const good = await goodPdf();
  const cases: Case[] = [];
  const seen = new Set<string>();
  const add = (c: Case) => {
    const k = Buffer.from(c.data).toString("base64");
    if (!seen.has(k)) {
      seen.add(k);
      cases.push(c);
    }
  };
  // Truncations at 110 offsets from just past the header to before the trailer. (A cut inside the
  // last ~130 bytes only loses the cross-reference table and trailer, which readers rebuild, so
  // such a file is still a good PDF: checked by hand against pdftotext, which reads it too.)
  const span = good.length - 130 - 9;
  for (let i = 0; i < 110; i++)
    add({ name: `truncated-${i}.pdf`, data: good.slice(0, 9 + Math.floor((span * i) / 110)) });
  const r = rng(20261201);
  for (let i = 0; cases.length < 170; i++) add({ name: `flipped-${i}.pdf`, data: flipStreams(good, r) });
  for (let i = 0; i < 25; i++) {
    const body = new Uint8Array(200 + Math.floor(r() * 4000)).map(() => Math.floor(r() * 256));
    add({ name: `random-after-header-${i}.pdf`, data: new Uint8Array([...Buffer.from("%PDF-1.7\n"), ...body]) });
  }
  const xml = [
    `<?xml version="1.0"?><catalog><book id="1"><title>Invented</title></book></catalog>`,
    `<?xml version="1.0" encoding="UTF-8"?><svg xmlns="http://www.w3.org/2000/svg"><text>alpha .70</text></svg>`,
    `<?xml version="1.0"?><rss version="2.0"><channel><title>Invented feed</title></channel></rss>`,
    `<html><body><p>Reliability above .70 is acceptable.</p></body></html>`,
    `<?xml version="1.0"?><article><front><article-meta>`,
    `<?xml version="1.0"?><note><to>Okafor</to><from>Lindqvist</from></note>`,
    `<?xml version="1.0"?><dataset><row a="1"/><row a="2"/></dataset>`,
    `<?xml version="1.0"?><!DOCTYPE x><x><y>unclosed</x>`,
    `<?xml version="1.0"?><article xmlns="urn:invented"><body/></article>`,
    `<?xml version="1.0"?><manuscript><section>Methods</section></manuscript>`,
  ];
  xml.forEach((x, i) => add({ name: `not-jats-${i}.xml`, data: new TextEncoder().encode(x) }));
  add({ name: "encrypted.pdf", data: await encryptedPdf() });
  add({ name: "scanned.pdf", data: await imageOnlyPdf() });
  add({ name: "gigantic-page-count.pdf", data: await hugePageCountPdf(5000) });
  // These never get past the upload's content check; handed to the worker anyway, it must cope.
  add({ name: "zero-length.pdf", data: new Uint8Array(), raw: true });
  for (let i = 0; i < 5; i++)
    add({ name: `random-${i}.bin`, data: new Uint8Array(500 + i * 300).map(() => Math.floor(r() * 256)), raw: true });
  return cases;
}

describe("malformed files through the real worker", () => {
  it("fails every malformed file with a reason, stores no rows for them, and keeps working", async () => {
    const cases = await malformedCases();
    expect(cases.length).toBeGreaterThanOrEqual(200);
    const ids: string[] = [];
    const names = new Map<string, string>();
    for (const c of cases) {
      if (c.raw) {
        // The door refuses them first (content decides the type, not the name).
        await expect(
          ingest(h.db, h.storage, { data: c.data, filename: c.name, uploadedBy: null }),
        ).rejects.toBeInstanceOf(IngestError);
        const id = await enqueueRaw(h, c.data, c.name);
        ids.push(id);
        names.set(id, c.name);
      } else {
        const { articleId, duplicate } = await ingest(h.db, h.storage, {
          data: c.data,
          filename: c.name,
          uploadedBy: null,
        });
        expect(duplicate).toBe(false);
        ids.push(articleId);
        names.set(articleId, c.name);
      }
    }
    const result = await waitForArticles(h.db, ids, 110_000);
    const notFailed = [...result.values()]
      .filter((a) => a.status !== "failed")
      .map((a) => names.get((a as { id?: string }).id ?? ""));
    expect(notFailed).toEqual([]);
    for (const a of result.values()) {
      expect(a.failure_code).toBeTruthy();
      expect(a.failure_message!.length).toBeGreaterThan(10);
    }
    expect(await rowCounts(h.db, ids)).toEqual({ statements: 0, citations: 0, references: 0 });
    const codes = new Map<string, number>();
    for (const a of result.values()) codes.set(a.failure_code!, (codes.get(a.failure_code!) ?? 0) + 1);
    console.log(`[malformed] ${cases.length} files, failure codes:`, Object.fromEntries(codes));
    // The specific cases get the specific reason.
    const byName = new Map([...result.entries()].map(([id, a]) => [names.get(id)!, a]));
    expect(byName.get("encrypted.pdf")!.failure_code).toBe("encrypted");
    expect(byName.get("scanned.pdf")!.failure_code).toBe("no_text_layer");
    expect(byName.get("gigantic-page-count.pdf")!.failure_code).toBe("too_many_pages");
    expect(byName.get("not-jats-0.xml")!.failure_code).toBe("not_jats");
    expect(byName.get("zero-length.pdf")!.failure_code).toBe("empty");

    // Every status change was recorded: uploaded → queued → reading → failed.
    const events = await h.db
      .selectFrom("job_events")
      .select(["state"])
      .where("article_id", "=", ids[0])
      .orderBy("id")
      .execute();
    expect(events.map((e) => e.state)).toEqual(["uploaded", "queued", "reading", "failed"]);

    // Still alive: a good PDF after all that is mined.
    const { articleId } = await ingest(h.db, h.storage, {
      data: await goodPdf(),
      filename: "good.pdf",
      uploadedBy: null,
    });
    const good = await waitForArticles(h.db, [articleId]);
    expect(good.get(articleId)!.status).toBe("done");
    expect((await rowCounts(h.db, [articleId])).statements).toBeGreaterThan(0);
  });
});
