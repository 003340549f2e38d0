import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createHash } from "node:crypto";
import { createTestDatabase } from "@/tests/helpers/db";
import type { DB } from "@/db";
import { listWorksPage, worksCursorParam, worksCursorText, type WorksCursor } from "@/db/queries/works-list";

// Invented works and one invented citing article. The oracle for the order is PostgreSQL sorting the
// whole list in one statement (order by reference count desc, id), which keyset paging must reproduce
// page by page without repeating or skipping a work.
let t: Awaited<ReturnType<typeof createTestDatabase>>;
let db: DB;
const TOTAL = 137;

beforeAll(async () => {
  t = await createTestDatabase();
  db = t.db;
  const sha = createHash("sha256").update("works-list").digest("hex");
  await db
    .insertInto("stored_files")
    .values({ sha256: sha, size_bytes: 1, media_type: "text/plain", storage_key: sha })
    .execute();
  const art = await db
    .insertInto("articles")
    .values({
      file_sha256: sha,
      original_filename: "citing.txt",
      source_kind: "text",
      title: "An invented article citing many invented works",
      authors: JSON.stringify(["Quellmalz, B."]),
      status: "done",
    })
    .returning("id")
    .executeTakeFirstOrThrow();
  let ordinal = 0;
  for (let i = 0; i < TOTAL; i++) {
    const w = await db
      .insertInto("works")
      .values({
        title: `Invented work number ${i}${i % 10 === 0 ? " on reliability" : ""}`,
        first_author: `Author${i}`,
        year: String(1970 + (i % 50)),
        merged_into: null,
        article_id: null,
        doi: null,
        normalised_title: null,
      })
      .returning("id")
      .executeTakeFirstOrThrow();
    // Many ties on purpose: 0–6 references per work.
    for (let r = 0; r < i % 7; r++)
      await db
        .insertInto("references")
        .values({
          article_id: art.id,
          ordinal: ordinal++,
          raw: `Author${i} (${1970 + (i % 50)}). Invented work number ${i}.`,
          authors: JSON.stringify([`Author${i}`]),
          year: String(1970 + (i % 50)),
          title: `Invented work number ${i}`,
          doi: null,
          kind: "article",
          work_id: w.id,
          container: null,
        })
        .execute();
  }
}, 120_000);
afterAll(async () => t?.drop());

async function allPages(q?: string, limit = 20) {
  const seen: { id: string; references: number }[] = [];
  let after: WorksCursor | undefined;
  let pages = 0;
  for (;;) {
    const page = await listWorksPage(db, { q, after, limit });
    pages++;
    seen.push(...page.rows.map((r) => ({ id: r.id, references: r.references })));
    if (!page.next) break;
    // The cursor travels through the URL and back.
    after = worksCursorParam.parse(worksCursorText(page.next));
  }
  return { seen, pages };
}

describe("the works list, keyset-paged", () => {
  it("walks every work exactly once, most cited first, in the order of one full sort", async () => {
    const { rows: oracle } = await db
      .selectFrom("works as w")
      .leftJoin("references as r", "r.work_id", "w.id")
      .select(["w.id", (eb) => eb.fn.count<number>("r.id").as("n")])
      .where("w.merged_into", "is", null)
      .groupBy("w.id")
      .orderBy((eb) => eb.fn.count("r.id"), "desc")
      .orderBy("w.id")
      .execute()
      .then((rows) => ({ rows }));
    const { seen, pages } = await allPages();
    expect(seen.map((s) => s.id)).toEqual(oracle.map((o) => o.id));
    expect(seen.map((s) => s.references)).toEqual(oracle.map((o) => Number(o.n)));
    expect(new Set(seen.map((s) => s.id)).size).toBe(TOTAL);
    expect(pages).toBe(Math.ceil(TOTAL / 20));
  });

  it("pages a search the same way, and a last page that is exactly full has no next page", async () => {
    const matching = Math.ceil(TOTAL / 10); // works 0, 10, …, 130 have "on reliability" in the title
    const { seen } = await allPages("on reliability", 7);
    expect(seen).toHaveLength(matching);
    const exact = await listWorksPage(db, { q: "on reliability", limit: matching });
    expect(exact.rows).toHaveLength(matching);
    expect(exact.next).toBeNull();
  });

  it("refuses a malformed cursor instead of guessing", () => {
    expect(worksCursorParam.safeParse("12;drop table works").success).toBe(false);
    expect(worksCursorParam.safeParse("").success).toBe(false);
  });
});
