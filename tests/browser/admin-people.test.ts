import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launchBrowser, signInAs, APP_URL, waitForMail } from "../helpers/browser";

let b: Awaited<ReturnType<typeof launchBrowser>>;
beforeAll(async () => {
  b = await launchBrowser();
});
afterAll(async () => b?.close());

async function passwordSignIn(email: string, password: string) {
  await b.context.clearCookies();
  await b.page.goto(`${APP_URL}/sign-in`);
  await b.page.getByLabel("E-mail", { exact: true }).fill(email);
  await b.page.getByLabel("Password", { exact: true }).fill(password);
  await b.page.getByRole("button", { name: "Sign in", exact: true }).click();
}

describe("admin: invite, change role, deactivate", () => {
  const email = "new.curator@echoline.local";
  const password = "a-long-enough-password";

  it("invites a person who then sets a password and signs in", async () => {
    await signInAs(b.page, "admin");
    await b.page.goto(`${APP_URL}/admin/people`);
    const t = Date.now();
    await b.page.getByLabel("E-mail", { exact: true }).fill(email);
    await b.page.getByLabel("Role", { exact: true }).selectOption("curator");
    await b.page.getByRole("button", { name: "Send invitation" }).click();
    await b.page.getByText(`Invitation sent to ${email}`).waitFor();
    const mail = await waitForMail(email, t);
    const link = mail.text.match(new RegExp(`${APP_URL}/invite/\\S+`))?.[0];
    expect(link).toBeTruthy();

    await b.context.clearCookies();
    await b.page.goto(link!);
    await b.page.getByLabel("Your name").fill("Invited Curator");
    await b.page.getByLabel("Password", { exact: true }).fill(password);
    await b.page.getByLabel("Password again").fill("something-else-entirely");
    await b.page.getByRole("button", { name: "Set password" }).click();
    await b.page.getByText("The two passwords differ.").waitFor();
    await b.page.getByLabel("Password again").fill(password);
    await b.page.getByRole("button", { name: "Set password" }).click();
    await b.page.waitForURL(/\/sign-in/);
    await passwordSignIn(email, password);
    await b.page.waitForURL(`${APP_URL}/home`);
    await expect(b.page.getByTestId("who").textContent()).resolves.toContain("Curator");
  });

  it("resends an invitation: a fresh link arrives and the first one stops working", async () => {
    const other = "second.invitee@echoline.local";
    await signInAs(b.page, "admin");
    await b.page.goto(`${APP_URL}/admin/people`);
    const t1 = Date.now();
    await b.page.getByLabel("E-mail", { exact: true }).fill(other);
    await b.page.getByRole("button", { name: "Send invitation" }).click();
    const first = (await waitForMail(other, t1)).text.match(/\/invite\/(\S+)/)?.[1];
    const t2 = Date.now();
    await b.page.getByTestId(`person-${other}`).getByRole("button", { name: "Resend invitation" }).click();
    const second = (await waitForMail(other, t2)).text.match(/\/invite\/(\S+)/)?.[1];
    expect(first).toBeTruthy();
    expect(second).toBeTruthy();
    expect(second).not.toBe(first);
    const old = await fetch(`${APP_URL}/api/invitations/accept`, {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({
        token: first,
        name: "Nobody",
        password: "a-long-enough-password",
        confirm: "a-long-enough-password",
      }),
    });
    expect(old.status).toBe(404);
  });

  it("changes the role, which takes effect at once, and deactivates", async () => {
    await signInAs(b.page, "admin");
    await b.page.goto(`${APP_URL}/admin/people`);
    await b.page.getByLabel(`Role of ${email}`).selectOption("reader");
    await b.page.waitForResponse((r) => r.url().includes("/api/admin/users") && r.request().method() === "GET");
    await passwordSignIn(email, password);
    await b.page.waitForURL(`${APP_URL}/home`);
    await expect(b.page.getByTestId("who").textContent()).resolves.toContain("Reader");

    await signInAs(b.page, "admin");
    await b.page.goto(`${APP_URL}/admin/people`);
    await b.page.getByTestId(`person-${email}`).getByRole("button", { name: "Deactivate" }).click();
    await b.page.getByTestId(`person-${email}`).getByText("deactivated").waitFor();
    await passwordSignIn(email, password);
    await b.page
      .getByRole("alert")
      .filter({ hasText: /do not match/ })
      .waitFor();
  });
});
