import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launchBrowser, signInAs, APP_URL, demoAccount, E2E_DATABASE_URL } from "../helpers/browser";
import { createDb } from "@/db";
import { hashPassword } from "@/lib/server/passwords";
import type { Role } from "@/db/schema/accounts";
import { DEMO_VENUES } from "@/lib/demo/corpus";

// What each role must see in the main navigation (written out here, not derived from the app's map).
const EXPECTED_NAV: Record<Role, string[]> = {
  admin: ["Home", "Articles", "Dashboards", "Cited works", "Upload", "Practices", "People", "Venues", "Captured mail"],
  curator: ["Home", "Articles", "Dashboards", "Cited works", "Upload", "Practices"],
  editor: ["Home", "Articles", "Dashboards", "Cited works", "Practices"],
  instructor: ["Home", "Articles", "Dashboards", "Cited works", "Practices"],
  reader: ["Home", "Articles", "Dashboards", "Cited works", "Practices"],
};

let b: Awaited<ReturnType<typeof launchBrowser>>;
beforeAll(async () => {
  b = await launchBrowser();
});
afterAll(async () => b?.close());

describe("sign-in through the real UI", () => {
  for (const role of Object.keys(EXPECTED_NAV) as Role[]) {
    it(`${role} signs in with a password and sees the ${role} navigation`, async () => {
      await b.context.clearCookies();
      await signInAs(b.page, role);
      const nav = await b.page.getByTestId("main-nav").getByRole("link").allTextContents();
      expect(nav).toEqual(EXPECTED_NAV[role]);
      await expect(b.page.getByTestId("who").textContent()).resolves.toContain(role[0].toUpperCase() + role.slice(1));
      // The session cookie is httpOnly and sameSite.
      const cookie = (await b.context.cookies()).find((c) => c.name.includes("session-token"));
      expect(cookie?.httpOnly).toBe(true);
      expect(cookie?.sameSite).toBe("Lax");
      await b.page.getByRole("button", { name: "Sign out" }).click();
      await b.page.waitForURL(`${APP_URL}/`);
    });
  }

  it("shows an editor the venues they are linked to", async () => {
    await signInAs(b.page, "editor");
    // The seed links the demo editor to the first empirical demo venue.
    const first = DEMO_VENUES.find((v) => !v.isMethodsVenue)!;
    await b.page.getByRole("heading", { name: "Your venues" }).waitFor();
    await expect(b.page.getByText(first.name).isVisible()).resolves.toBe(true);
  });

  it("gives the same answer for a wrong password and an unknown e-mail", async () => {
    await b.context.clearCookies();
    const attempt = async (email: string, password: string) => {
      await b.page.goto(`${APP_URL}/sign-in`);
      await b.page.getByLabel("E-mail", { exact: true }).fill(email);
      await b.page.getByLabel("Password", { exact: true }).fill(password);
      await b.page.getByRole("button", { name: "Sign in", exact: true }).click();
      const alert = b.page.getByRole("alert").filter({ hasText: /./ });
      await alert.waitFor();
      return alert.textContent();
    };
    const wrong = await attempt(demoAccount("reader").email, "not-the-password");
    const unknown = await attempt("nobody-here@echoline.local", "not-the-password");
    expect(wrong).toBe(unknown);
    expect(wrong).toMatch(/do not match/);
  });

  it("shows field errors from the form schema before sending", async () => {
    await b.page.goto(`${APP_URL}/sign-in`);
    await b.page.getByLabel("E-mail", { exact: true }).fill("not-an-email");
    await b.page.getByRole("button", { name: "Sign in", exact: true }).click();
    const input = b.page.getByLabel("E-mail", { exact: true });
    await expect(input.getAttribute("aria-invalid")).resolves.toBe("true");
    await expect(b.page.getByText("Enter an e-mail address").first().isVisible()).resolves.toBe(true);
  });

  it("rate-limits repeated wrong passwords for one account", async () => {
    // An account of this test's own, so the lock-out does not spill into other suites.
    const email = "locked.out@echoline.local";
    const db = createDb(E2E_DATABASE_URL, 1);
    await db
      .insertInto("User")
      .values({
        email,
        name: "Lock-out Test",
        role: "reader",
        password_hash: await hashPassword("the-right-password"),
        emailVerified: null,
        image: null,
        deactivated_at: null,
      })
      .onConflict((oc) => oc.doNothing())
      .execute();
    await db.destroy();
    let last = "";
    for (let i = 0; i < 7; i++) {
      await b.page.goto(`${APP_URL}/sign-in`);
      await b.page.getByLabel("E-mail", { exact: true }).fill(email);
      await b.page.getByLabel("Password", { exact: true }).fill(`wrong-${i}`);
      await b.page.getByRole("button", { name: "Sign in", exact: true }).click();
      const alert = b.page.getByRole("alert").filter({ hasText: /./ });
      await alert.waitFor();
      last = (await alert.textContent()) ?? "";
    }
    expect(last).toMatch(/Too many attempts/);
    // Locked out even with the right password, until the window passes.
    await b.page.getByLabel("Password", { exact: true }).fill("the-right-password");
    const answered = b.page.waitForResponse((r) => r.url().includes("/api/auth/callback/credentials"));
    await b.page.getByRole("button", { name: "Sign in", exact: true }).click();
    await answered;
    await b.page
      .getByRole("alert")
      .filter({ hasText: /Too many attempts/ })
      .waitFor();
    expect(new URL(b.page.url()).pathname).toBe("/sign-in");
  });

  it("sends anonymous visitors of a signed-in page to sign-in", async () => {
    await b.context.clearCookies();
    await b.page.goto(`${APP_URL}/admin/people`);
    expect(new URL(b.page.url()).pathname).toBe("/sign-in");
  });
});
