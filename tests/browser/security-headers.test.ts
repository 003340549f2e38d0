/**
 * Security headers on pages and API routes, and a Content-Security-Policy the app really passes:
 * an admin walks the main pages in Chromium and no page logs a CSP violation. The references are the
 * browser itself (Chromium enforces the policy, fires `securitypolicyviolation` and logs "Refused to
 * …" on the console), the CSP Level 3 directive names, RFC 6797 for HSTS (sent only over HTTPS), and
 * the Fetch standard's `X-Content-Type-Options: nosniff` (all from memory).
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { APP_URL, launchBrowser, signInAs } from "@/tests/helpers/browser";
import { sessionCookie } from "@/tests/helpers/http";
import { pdfOf, GOOD_PAGES } from "@/tests/integration/mining/fixtures";

let b: Awaited<ReturnType<typeof launchBrowser>>;
type Violation = { page: Page; url: string; what: string };
const violations: Violation[] = [];

beforeAll(async () => {
  b = await launchBrowser();
  // Survives navigations: every page reports its violations to the test process.
  await b.context.exposeBinding("__echolineCsp", (src, what: string) => {
    violations.push({ page: src.page, url: src.page.url(), what });
  });
  await b.context.addInitScript(() => {
    document.addEventListener("securitypolicyviolation", (e) => {
      (window as unknown as { __echolineCsp: (s: string) => void }).__echolineCsp(
        `${e.effectiveDirective} blocked ${e.blockedURI || "inline"} (${e.sourceFile ?? ""}:${e.lineNumber})`,
      );
    });
  });
  b.context.on("console", (msg) => {
    const page = msg.page();
    if (page && /Content Security Policy|Refused to (load|execute|apply|connect|frame)/i.test(msg.text()))
      violations.push({ page, url: page.url(), what: `console: ${msg.text()}` });
  });
});
afterAll(async () => {
  await b?.close();
});

function directives(csp: string | null): Map<string, string[]> {
  return new Map(
    (csp ?? "")
      .split(";")
      .map((d) => d.trim().split(/\s+/))
      .filter((d) => d[0])
      .map(([name, ...values]) => [name.toLowerCase(), values]),
  );
}

function expectSecurityHeaders(res: Response, where: string) {
  const h = res.headers;
  const csp = directives(h.get("content-security-policy"));
  expect(csp.get("frame-ancestors"), where).toEqual(["'none'"]);
  expect(csp.get("default-src"), where).toEqual(["'self'"]);
  expect(csp.get("object-src"), where).toEqual(["'none'"]);
  // The build under test is a production build: no eval, and no script from another origin.
  expect(csp.get("script-src"), where).not.toContain("'unsafe-eval'");
  expect(
    csp.get("script-src")?.every((s) => s.startsWith("'")),
    where,
  ).toBe(true);
  expect(h.get("x-content-type-options"), where).toBe("nosniff");
  expect(h.get("referrer-policy"), where).toMatch(
    /^(same-origin|strict-origin|strict-origin-when-cross-origin|no-referrer)$/,
  );
  expect(h.get("x-frame-options"), where).toBe("DENY");
}

describe("security headers", () => {
  it("are on a page, a signed-in API answer and a refused one; HSTS only over HTTPS", async () => {
    const page = await fetch(`${APP_URL}/sign-in`);
    expect(page.status).toBe(200);
    expectSecurityHeaders(page, "/sign-in");
    // RFC 6797: HSTS is meaningful only over a secure transport, so plain HTTP on loopback gets none.
    expect(page.headers.get("strict-transport-security")).toBeNull();

    const cookie = await sessionCookie("admin");
    const api = await fetch(`${APP_URL}/api/venues`, { headers: { cookie } });
    expect(api.status).toBe(200);
    expectSecurityHeaders(api, "/api/venues");
    const refused = await fetch(`${APP_URL}/api/venues`);
    expect(refused.status).toBe(401);
    expectSecurityHeaders(refused, "/api/venues unauthenticated");

    // Behind a TLS proxy (X-Forwarded-Proto: https) the same page carries HSTS of at least a year.
    const tls = await fetch(`${APP_URL}/sign-in`, { headers: { "x-forwarded-proto": "https" } });
    expect(Number(tls.headers.get("strict-transport-security")?.match(/max-age=(\d+)/)?.[1])).toBeGreaterThanOrEqual(
      31536000,
    );
  });
});

async function visit(page: Page, path: string) {
  const res = await page.goto(`${APP_URL}${path}`);
  expect(res?.status(), path).toBeLessThan(400);
  // Client components (charts, graphs, tables) render after hydration; let the network settle.
  await page.waitForLoadState("networkidle");
}

describe("the Content-Security-Policy in the browser", () => {
  it("is enforced: a script-injected image from another origin is reported (the listener works)", async () => {
    // A page of its own, so its deliberate violation never mixes with the walk below.
    const probe = await b.context.newPage();
    await visit(probe, "/sign-in");
    await probe.evaluate(() => {
      const img = document.createElement("img");
      img.src = "http://attacker.invalid/pixel.png";
      document.body.append(img);
    });
    await expect
      .poll(() => violations.filter((v) => v.page === probe && /img-src/.test(v.what)).length, { timeout: 10_000 })
      .toBeGreaterThan(0);
    await probe.close();
  });

  it("logs no violation on the main pages, as an admin", async () => {
    const { page } = b;
    await signInAs(page, "admin");
    // An article of our own through the real upload page (invented text; no DOI, so it clashes with no other suite).
    await visit(page, "/upload");
    const pages = [
      [`${GOOD_PAGES[0][0]} (a second invented copy)`, ...GOOD_PAGES[0].slice(1, 2), ...GOOD_PAGES[0].slice(3)],
      GOOD_PAGES[1],
    ];
    const pdf = Buffer.from(await pdfOf(pages));
    await page
      .getByLabel("Article files")
      .setInputFiles({ name: "csp-check.pdf", mimeType: "application/pdf", buffer: pdf });
    await page.getByRole("button", { name: /^Upload/ }).click();
    await page.waitForFunction(
      () => /^(Mined|Failed|Refused)/.test(document.querySelector('[data-testid="upload-status"]')?.textContent ?? ""),
      null,
      { timeout: 90_000 },
    );
    await page.getByRole("link", { name: "csp-check.pdf" }).click();
    await page.waitForURL(/\/articles\/[0-9a-f-]{36}$/);
    await page.waitForLoadState("networkidle");
    const article = new URL(page.url()).pathname;

    for (const path of [
      "/",
      "/home",
      "/articles",
      article,
      "/dashboards",
      "/dashboards/practice-over-time",
      "/dashboards/trail-ends",
      "/dashboards/venues",
      "/dashboards/drift",
      "/trails",
      "/works",
      "/practices",
      "/practices/procedures",
      "/upload",
      "/admin/people",
      "/admin/venues",
      "/admin/mail",
    ])
      await visit(page, path);

    // The Captured mail page reads the mail fake server-side with the stack's token (a wrong or
    // missing token would show the "not running" alert instead of the list or its empty state).
    await visit(page, "/admin/mail");
    expect(await page.getByText("The mail fake is not running").count()).toBe(0);
    expect(await page.getByText(/No mail yet|To .*@/).count()).toBeGreaterThan(0);

    // A work's page and a statement's trail graph (@xyflow) when the corpus has them.
    await visit(page, "/works");
    const work = await page
      .locator('a[href^="/works/"]')
      .first()
      .getAttribute("href", { timeout: 2000 })
      .catch(() => null);
    if (work) await visit(page, work);
    await visit(page, article);
    const trail = await page
      .locator('a[href^="/trails/"]')
      .first()
      .getAttribute("href", { timeout: 2000 })
      .catch(() => null);
    if (trail) await visit(page, trail);

    // And signed out: the sign-in page itself.
    await page.context().clearCookies();
    await visit(page, "/sign-in");
    expect(violations.filter((v) => v.page === page).map(({ url, what }) => ({ url, what }))).toEqual([]);
  });
});
