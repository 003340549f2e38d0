import { afterAll, beforeAll, describe, expect, it } from "vitest";
import Papa from "papaparse";
import { launchBrowser, signInAs, followTrailToSentence, APP_URL, E2E_DATABASE_URL } from "../helpers/browser";
import { createDb, type DB } from "@/db";
import { loadFixture } from "../integration/graph/fixture";
import { handleResolve, type GraphJobDeps } from "@/workers/graph-jobs";
import { rebuildAllTrails } from "@/lib/graph/trails";
import { refreshSummaries } from "@/lib/graph/summaries";

// The reader's path from the issue: open each dashboard, filter it, open a trail from the chart down
// to a sentence and back, and download a CSV. The invented fixture corpus is loaded into the e2e
// database first (its counts are checked by hand in tests/integration/graph).
let b: Awaited<ReturnType<typeof launchBrowser>>;
let db: DB;
let ids: Awaited<ReturnType<typeof loadFixture>>;
let alpha: string;
let only: string;

beforeAll(async () => {
  db = createDb(E2E_DATABASE_URL, 2);
  ids = await loadFixture(db);
  const deps: GraphJobDeps = { db, send: async () => undefined };
  for (const k of ["M", "A1", "A2", "A3", "A4"]) await handleResolve(deps, { articleId: ids.articles[k] });
  await rebuildAllTrails(db);
  await refreshSummaries(db);
  // The e2e database may also hold other suites' articles (the demo corpus): keep to the fixture's venues.
  only = `venues=${ids.venues.methods},${ids.venues.applied}`;
  alpha = (
    await db
      .selectFrom("practices")
      .select("id")
      .where("key", "=", "cronbach_alpha-ge-0.7-fixed")
      .executeTakeFirstOrThrow()
  ).id;
  b = await launchBrowser();
  await signInAs(b.page, "reader");
});
afterAll(async () => {
  await b?.close();
  await db?.destroy();
});

describe("dashboards for a reader", () => {
  it("opens each dashboard with a heading and a table view", async () => {
    for (const [path, heading] of [
      ["practice-over-time", "Practice over time"],
      ["trail-ends", "Where trails end"],
      ["venues", "Venue comparison"],
      ["drift", "Drift from sources"],
    ]) {
      await b.page.goto(`${APP_URL}/dashboards/${path}?practice=${alpha}&${only}`);
      await expect(b.page.getByRole("heading", { level: 1 }).textContent()).resolves.toBe(heading);
      await b.page
        .getByText(/^Table view:/)
        .first()
        .waitFor();
    }
  });

  it("keeps a filter in the URL and the numbers follow it", async () => {
    await b.page.goto(`${APP_URL}/dashboards/practice-over-time?practice=${alpha}&${only}`);
    await b.page
      .getByText(/^Table view:/)
      .first()
      .click();
    // Hand count (fixture): 2019 has 3 eligible articles, 2 asserting.
    await b.page.locator("#table-byYear tbody tr").nth(2).waitFor();
    const row2019 = await b.page.locator("#table-byYear tbody tr").nth(2).locator("td").allTextContents();
    expect(row2019.slice(0, 3)).toEqual(["2019", "3", "2"]);
    await b.page.getByLabel("From year").fill("2019");
    await b.page.getByLabel("From year").blur();
    await b.page.waitForURL(/from=2019/);
    await b.page
      .getByText(/^Table view:/)
      .first()
      .click();
    await expect(b.page.locator("#table-byYear tbody tr").count()).resolves.toBe(1);
  });

  it("downloads a CSV equal to the table", async () => {
    const r = await b.page.request.get(
      `${APP_URL}/api/dashboards/trail-ends?practice=${alpha}&${only}&format=csv&table=lengths`,
    );
    expect(r.headers()["content-type"]).toContain("text/csv");
    const csv = Papa.parse<string[]>((await r.text()).trim()).data;
    const json = (await (
      await b.page.request.get(`${APP_URL}/api/dashboards/trail-ends?practice=${alpha}&${only}`)
    ).json()) as { tables: { lengths: { rows: { length: number; statements: number }[] } } };
    expect(csv.slice(1)).toEqual(json.tables.lengths.rows.map((x) => [String(x.length), String(x.statements)]));
  });

  it("opens a trail from the chart down to a sentence and back", async () => {
    const sentence = await followTrailToSentence(b.page, `${APP_URL}/dashboards/trail-ends?practice=${alpha}&${only}`);
    expect(sentence).toMatch(/alpha|α/i);
  });
});
