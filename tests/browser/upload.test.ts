/**
 * A curator uploads a PDF through the real upload page, watches it reach "Mined" without reloading,
 * and then reads its statements. The built app, its worker and a test database (tests/setup/app-global.ts).
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { APP_URL, launchBrowser, signInAs } from "@/tests/helpers/browser";
import { goodPdf } from "@/tests/integration/mining/fixtures";

let browser: Awaited<ReturnType<typeof launchBrowser>>;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

describe("upload through the browser", () => {
  it("uploads a PDF, shows live progress to Mined, then its statements", async () => {
    const { page } = browser;
    await signInAs(page, "curator");
    await page.goto(`${APP_URL}/upload`);
    // A marker on window: if the page reloaded while waiting, it would be gone.
    await page.evaluate(() => ((window as unknown as { __noReload: number }).__noReload = 1));
    const pdf = Buffer.from(await goodPdf());
    await page
      .getByLabel("Article files")
      .setInputFiles({ name: "ward-climate.pdf", mimeType: "application/pdf", buffer: pdf });
    await expect.poll(() => page.getByTestId("upload-row").count()).toBe(1);
    await page.getByRole("button", { name: /^Upload/ }).click();
    const status = page.getByTestId("upload-status").first();
    // Waits on the page's own polling; the assertion fails if it never gets there.
    await page.waitForFunction(
      () => /^(Mined|Failed|Refused)/.test(document.querySelector('[data-testid="upload-status"]')?.textContent ?? ""),
      null,
      { timeout: 90_000 },
    );
    expect(await status.textContent()).toMatch(/^Mined/);
    expect(await page.getByTestId("batch-counts").textContent()).toContain("1 of 1 finished · 1 mined · 0 failed");
    expect(await page.evaluate(() => (window as unknown as { __noReload?: number }).__noReload)).toBe(1);

    await page.getByRole("link", { name: "ward-climate.pdf" }).click();
    await page.waitForURL(/\/articles\/[0-9a-f-]{36}$/);
    await page.getByTestId("statement").first().waitFor();
    const statements = await page.getByTestId("statement").allTextContents();
    expect(statements.some((s) => s.includes("Reliability above .70 is acceptable"))).toBe(true);
    // The matched value and the citation are highlighted in the evidence face.
    expect(await page.locator("p.evidence mark.value").first().textContent()).toBe(".70");
    expect(await page.locator("p.evidence mark.cite").first().textContent()).toContain("Brandtner & Oyelaran, 2003");
    expect(await page.getByTestId("article-status").textContent()).toBe("Mined");
  });
});
