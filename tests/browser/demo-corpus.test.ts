/**
 * The reader's path on the invented demo corpus, loaded through the real pipeline (files ingested,
 * mined by the running worker, resolved and traced by the graph jobs), not by inserting rows.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launchBrowser, signInAs, followTrailToSentence, APP_URL, E2E_DATABASE_URL } from "../helpers/browser";
import { practiceIdByKey } from "../helpers/db";
import { sessionCookie } from "../helpers/http";
import { createDb, type DB } from "@/db";
import { loadDemoCorpus } from "@/lib/demo/load";
import { folderStorage } from "@/lib/storage";
import { DATA_DIR } from "@/db/cluster";
import path from "node:path";

const COUNT = 40;
let db: DB;
let b: Awaited<ReturnType<typeof launchBrowser>>;
let alpha: string;

async function until<T>(what: string, probe: () => Promise<T | null>, timeoutMs: number): Promise<T> {
  const end = Date.now() + timeoutMs;
  for (;;) {
    const v = await probe();
    if (v !== null) return v;
    if (Date.now() > end) throw new Error(`timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 500));
  }
}

beforeAll(async () => {
  db = createDb(E2E_DATABASE_URL, 2);
  // The e2e worker reads files from the e2e data folder (ECHOLINE_DATA_DIR of tests/setup/app-global.ts).
  const r = await loadDemoCorpus(db, {
    count: COUNT,
    storage: folderStorage(path.join(DATA_DIR, "e2e", "files")),
    cacheDir: path.join(DATA_DIR, "demo-e2e"),
  });
  expect(r.created + r.skipped).toBe(COUNT);
  await until(
    "every demo article to be mined",
    async () => {
      const left = await db
        .selectFrom("articles")
        .select((eb) => eb.fn.countAll<number>().as("n"))
        .where("is_demo", "=", true)
        .where("status", "not in", ["done", "failed"])
        .executeTakeFirstOrThrow();
      return Number(left.n) === 0 ? true : null;
    },
    240_000,
  );
  alpha = await practiceIdByKey(db, "cronbach_alpha-ge-0.7-fixed");
  const cookie = await sessionCookie("reader");
  // The graph jobs run after mining; wait until the dashboard the reader opens has their output.
  await until(
    "trails and summaries of the demo corpus",
    async () => {
      const j = (await (
        await fetch(`${APP_URL}/api/dashboards/trail-ends?practice=${alpha}`, { headers: { cookie } })
      ).json()) as { tables?: { lengths?: { rows: unknown[] } } };
      return (j.tables?.lengths?.rows.length ?? 0) > 0 ? true : null;
    },
    240_000,
  );
  b = await launchBrowser();
  await signInAs(b.page, "reader");
}, 600_000);

afterAll(async () => {
  await b?.close();
  await db?.destroy();
});

describe("a reader on the demo corpus", () => {
  it("mined every demo PDF without failures", async () => {
    const failed = await db
      .selectFrom("articles")
      .select(["original_filename", "failure_message"])
      .where("is_demo", "=", true)
      .where("status", "=", "failed")
      .execute();
    expect(failed).toEqual([]);
    const s = await db
      .selectFrom("statements")
      .innerJoin("articles", "articles.id", "statements.article_id")
      .select((eb) => eb.fn.countAll<number>().as("n"))
      .where("articles.is_demo", "=", true)
      .where("statements.kind", "=", "threshold")
      .executeTakeFirstOrThrow();
    expect(Number(s.n)).toBeGreaterThan(COUNT);
  });

  it("opens practice over time, filters by venue in the URL, and downloads its CSV", async () => {
    await b.page.goto(`${APP_URL}/dashboards/practice-over-time?practice=${alpha}`);
    await b.page
      .getByText(/^Table view:/)
      .first()
      .click();
    const rows = b.page.locator("#table-byYear tbody tr");
    await rows.first().waitFor();
    expect(await rows.count()).toBeGreaterThan(3);
    const venue = await db
      .selectFrom("venues")
      .innerJoin("articles", "articles.venue_id", "venues.id")
      .select("venues.id")
      .where("articles.is_demo", "=", true)
      .where("venues.is_methods_venue", "=", false)
      .executeTakeFirstOrThrow();
    await b.page.goto(`${APP_URL}/dashboards/practice-over-time?practice=${alpha}&venues=${venue.id}`);
    expect(new URL(b.page.url()).searchParams.get("venues")).toBe(venue.id);
    const csv = await b.page.request.get(
      `${APP_URL}/api/dashboards/practice-over-time?practice=${alpha}&venues=${venue.id}&format=csv&table=byYear`,
    );
    expect(csv.status()).toBe(200);
    expect(csv.headers()["content-type"]).toContain("text/csv");
    expect((await csv.text()).split("\n").length).toBeGreaterThan(1);
  });

  it("goes from a chart to a trail, down to the sentence in its article, and back", async () => {
    const sentence = await followTrailToSentence(b.page, `${APP_URL}/dashboards/trail-ends?practice=${alpha}`);
    expect(sentence).toMatch(/\d/);
  });
});
