import { afterAll, beforeAll, describe, expect, it } from "vitest";
import pg from "pg";
import {
  launchBrowser,
  APP_URL,
  MAIL_URL,
  E2E_DATABASE_URL,
  demoAccount,
  waitForMail,
  mailFakeHeaders,
} from "../helpers/browser";

let b: Awaited<ReturnType<typeof launchBrowser>>;
beforeAll(async () => {
  b = await launchBrowser();
});
afterAll(async () => b?.close());

async function requestLink(email: string) {
  await b.context.clearCookies();
  await b.page.goto(`${APP_URL}/sign-in`);
  await b.page.getByLabel("E-mail for the link").fill(email);
  await b.page.getByRole("button", { name: "E-mail me a sign-in link" }).click();
  await b.page.waitForURL(`${APP_URL}/sign-in/check-email`);
}

const linkIn = (text: string) => {
  const m = text.match(new RegExp(`${APP_URL}/sign-in/link\\?\\S+`));
  if (!m) throw new Error(`no sign-in link in mail: ${text}`);
  return m[0];
};

describe("magic-link sign-in through the mail fake", () => {
  it("signs in with the e-mailed link, once", async () => {
    const email = demoAccount("curator").email;
    const t = Date.now();
    await requestLink(email);
    const mail = await waitForMail(email, t);
    expect(mail.subject).toMatch(/sign-in link/);
    const link = linkIn(mail.text);
    await b.page.goto(link);
    await b.page.waitForURL(`${APP_URL}/home`);
    await expect(b.page.getByTestId("who").textContent()).resolves.toContain("Curator");

    // The same link again, signed out: it says it was used.
    await b.context.clearCookies();
    await b.page.goto(link);
    await expect(b.page.getByTestId("link-state").getAttribute("data-state")).resolves.toBe("used");
  });

  it("says so when a link has expired", async () => {
    const email = demoAccount("reader").email;
    const t = Date.now();
    await requestLink(email);
    const link = linkIn((await waitForMail(email, t)).text);
    const c = new pg.Client({ connectionString: E2E_DATABASE_URL });
    await c.connect();
    await c.query(`update "VerificationToken" set expires = now() - interval '1 minute' where identifier = $1`, [
      email,
    ]);
    await c.end();
    await b.page.goto(link);
    await expect(b.page.getByTestId("link-state").getAttribute("data-state")).resolves.toBe("expired");
  });

  it("sends nothing to an unknown address but answers the same way", async () => {
    const email = "stranger@echoline.local";
    await requestLink(email);
    await expect(b.page.getByRole("heading", { level: 1 }).textContent()).resolves.toBe("Check your e-mail");
    const list = (await (
      await fetch(`${MAIL_URL}/messages?to=${email}`, { headers: mailFakeHeaders() })
    ).json()) as unknown[];
    expect(list).toEqual([]);
  });
});
