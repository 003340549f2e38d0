import { afterAll, beforeAll, describe, expect, it } from "vitest";
import Papa from "papaparse";
import { launchBrowser, signInAs, followTrailToSentence, APP_URL, E2E_DATABASE_URL } from "../helpers/browser";
import { practiceIdByKey } from "../helpers/db";
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
  await db.transaction().execute((trx) => rebuildAllTrails(trx));
  await refreshSummaries(db);
  // The e2e database may also hold other suites' articles (the demo corpus): keep to the fixture's venues.
  only = `venues=${ids.venues.methods},${ids.venues.applied}`;
  alpha = await practiceIdByKey(db, "cronbach_alpha-ge-0.7-fixed");
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

// Screens of issue 8, on the same invented fixture: words instead of keys, no verdict assumed, plurals.
describe("screens in words", () => {
  it("opens a dashboard without a chosen practice on the most asserted one and says so", async () => {
    await b.page.goto(`${APP_URL}/dashboards/practice-over-time?${only}`);
    const why = b.page.getByTestId("practice-shown");
    await why.waitFor();
    expect(await why.textContent()).toMatch(/most asserted practice \(\d[\d,]* statements? matched to it\)/);
    // The filter names the default the same way instead of "first for this statistic".
    expect(await b.page.getByLabel("Practice").locator("option").first().textContent()).toBe("Most asserted");
  });

  it("shows a disputed cut-off with its own badge in words and an 'other' statistic by its written name", async () => {
    const st = await db
      .insertInto("statements")
      .values({
        article_id: ids.articles.M,
        ordinal: 99,
        page: 4,
        section: "methods",
        sentence: "An expected cell count of at least 5 is often demanded, but this rule is far too strict (M).",
        kind: "threshold",
        statistic: "other",
        statistic_label: "expected cell count",
        comparator: ">=",
        value: 5,
        framing: "disputed",
        procedure_key: null,
        sourcing: "unsourced",
        fingerprint: "M-disputed-99",
      })
      .returning("id")
      .executeTakeFirstOrThrow();
    try {
      await b.page.goto(`${APP_URL}/articles/${ids.articles.M}`);
      const item = b.page.locator(`[id="statement-${st.id}"]`);
      await item.waitFor();
      const text = (await item.textContent()) ?? "";
      expect(text).toContain("Disputed: argued against");
      expect(text).toContain("expected cell count");
      expect(text).toContain("≥ 5");
      expect(text).not.toContain("No source"); // a disputed cut-off is not counted, so no sourcing badge
      // The other statements of the article speak words, not keys.
      const page = (await b.page.locator("main").textContent()) ?? "";
      for (const key of ["cronbach_alpha", ">=", "cited_no_locator", "threshold"]) expect(page).not.toContain(key);
      expect(page).toContain("Cronbach's α");
    } finally {
      await db.deleteFrom("statements").where("id", "=", st.id).execute();
    }
  });

  it("asks a curator for a verdict instead of assuming one, and counts citing articles in good English", async () => {
    const book = await db
      .selectFrom("works")
      .select("id")
      .where("title", "ilike", "Psychometric foundations for invented scales%")
      .where("merged_into", "is", null)
      .executeTakeFirstOrThrow();
    const curator = await launchBrowser();
    try {
      await signInAs(curator.page, "curator");
      await curator.page.goto(`${APP_URL}/works/${book.id}`);
      const form = curator.page.getByRole("form", { name: "Record what this work says" });
      await form.waitFor();
      expect(await form.locator('input[name="verdict"]:checked').count()).toBe(0);
      await form.getByRole("button", { name: "Save source check" }).click();
      const group = form.getByRole("group", { name: "What the work says" });
      await form.getByText("Choose what the work says.").waitFor();
      const describedBy = (await group.getAttribute("aria-describedby")) ?? "";
      const errIds = describedBy.split(" ").filter(Boolean);
      const described = await Promise.all(errIds.map((id) => curator.page.locator(`[id="${id}"]`).textContent()));
      expect(described).toContain("Choose what the work says.");
      expect(await form.getByText("Choose a practice.").count()).toBe(1);
      // Hand count (fixture): the invented book is cited once by M and once by A2.
      expect(await curator.page.getByRole("heading", { name: /^Cited by/ }).textContent()).toBe(
        "Cited by 2 articles (2 references)",
      );
      const table = curator.page.getByRole("table", { name: "Articles citing this work" });
      expect(await table.locator("tbody tr").count()).toBe(2);
      await table.getByRole("button", { name: /Year/ }).click();
      expect(await table.locator("th", { hasText: "Year" }).getAttribute("aria-sort")).toMatch(/ascending|descending/);
    } finally {
      await curator.close();
    }
  });
});
