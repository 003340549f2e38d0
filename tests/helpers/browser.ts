import { chromium, type BrowserContext, type Page } from "playwright-core";
import { inject } from "vitest";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { DEMO_ACCOUNTS } from "@/db/seed";
import { databaseUrl } from "@/db/cluster";
import type { Role } from "@/db/schema/accounts";

// ECHOLINE_E2E_PORT_BASE moves the browser suite's ports (app = base, SMTP = base - 475, mail page =
// base - 474; 3100/2625/2626 by default) so two checkouts can run it side by side.
export const E2E_PORT_BASE = Number(process.env.ECHOLINE_E2E_PORT_BASE ?? 3100);
export const APP_URL = `http://localhost:${E2E_PORT_BASE}`;
export const MAIL_URL = `http://127.0.0.1:${E2E_PORT_BASE - 474}`;
// The test cluster of this checkout (ECHOLINE_TEST_PG_PORT), as tests/setup/app-global.ts uses it.
export const E2E_DATABASE_URL = databaseUrl("test", "echoline_e2e");

// Launch flags for Debian's Chromium on this closed network (no background connections).
const ARGS = [
  "--headless",
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
];

export async function launchBrowser(): Promise<{ context: BrowserContext; page: Page; close: () => Promise<void> }> {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "echoline-chromium-"));
  const context = await chromium.launchPersistentContext(dir, {
    executablePath: "/usr/bin/chromium",
    args: ARGS,
    viewport: { width: 1280, height: 900 },
  });
  const page = context.pages()[0] ?? (await context.newPage());
  return {
    context,
    page,
    close: async () => {
      await context.close();
      fs.rmSync(dir, { recursive: true, force: true });
    },
  };
}

export function demoAccount(role: Role) {
  const a = DEMO_ACCOUNTS.find((x) => x.role === role);
  if (!a) throw new Error(`no demo account for ${role}`);
  return a;
}

/** Signs in through the real sign-in form and waits for the home page. */
export async function signInAs(page: Page, role: Role): Promise<void> {
  const a = demoAccount(role);
  await page.context().clearCookies();
  await page.goto(`${APP_URL}/sign-in`);
  await page.getByLabel("E-mail", { exact: true }).fill(a.email);
  await page.getByLabel("Password", { exact: true }).fill(a.password);
  await page.getByRole("button", { name: "Sign in", exact: true }).click();
  await page.waitForURL(`${APP_URL}/home`);
}

export type Mail = { id: string; to: string[]; subject: string; text: string };

/** The header that opens the mail fake's API (its token comes from tests/setup/app-global.ts). */
export function mailFakeHeaders(): Record<string, string> {
  return { "x-mail-fake-token": inject("mailFakeToken") };
}

/** Waits until the mail fake holds a message for `to` newer than `after` (polls its API; no sleeps as proxies). */
export async function waitForMail(to: string, after: number, timeoutMs = 20_000): Promise<Mail> {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    const r = await fetch(`${MAIL_URL}/messages?to=${encodeURIComponent(to)}`, { headers: mailFakeHeaders() });
    const list = (await r.json()) as (Mail & { at: string })[];
    const m = list.find((x) => Date.parse(x.at) >= after);
    if (m) return m;
    await new Promise((res) => setTimeout(res, 200));
  }
  throw new Error(`no mail for ${to} within ${timeoutMs} ms`);
}

/**
 * The reader's path from a dashboard: open the practice's trail graph, one statement's trail, then
 * the sentence in its article (which must carry the statement's anchor), and back.
 */
export async function followTrailToSentence(page: Page, dashboardUrl: string): Promise<string> {
  await page.goto(dashboardUrl);
  await page.getByRole("button", { name: "Open the trail graph" }).click();
  await page.waitForURL(/\/trails\?/);
  const trailLink = page.getByRole("link", { name: "its trail" }).first();
  await trailLink.waitFor();
  await trailLink.click();
  await page.waitForURL(/\/trails\/[0-9a-f-]{36}/);
  const sentence = page.getByRole("list", { name: "Trail steps" }).locator('a[href^="/articles/"]').first();
  await sentence.waitFor();
  const href = (await sentence.getAttribute("href")) ?? "";
  if (!/^\/articles\/[0-9a-f-]{36}#statement-[0-9a-f-]{36}$/.test(href))
    throw new Error(`unexpected sentence link ${href}`);
  await sentence.click();
  await page.waitForURL(/\/articles\/[0-9a-f-]{36}/);
  const anchor = page.locator(`[id="${href.split("#")[1]}"]`);
  await anchor.waitFor();
  const text = (await anchor.textContent()) ?? "";
  await page.goBack();
  await page.waitForURL(/\/trails\/[0-9a-f-]{36}/);
  return text;
}
