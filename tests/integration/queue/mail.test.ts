/**
 * Mail is a job. With SMTP unreachable the admin's invitation still commits, the mail job fails and
 * is retried on its own (read back through pg-boss's getJobById), and "resend" later gives a fresh
 * link that arrives at a working SMTP server (the local mail fake) with every value escaped.
 * Waits poll state with a deadline; nothing sleeps a fixed time.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import fs from "node:fs";
import net from "node:net";
import os from "node:os";
import path from "node:path";
import type { PgBoss } from "pg-boss";
import { createTestDatabase } from "@/tests/helpers/db";
import { jobReader, until } from "@/tests/helpers/jobs";
import { createWorkerBoss } from "@/workers/boss";
import { registerJobs } from "@/workers/jobs";
import { createMailHandler } from "@/workers/mail-job";
import { startMailFake } from "@/workers/mail-fake";
import { ensureQueues } from "@/lib/jobs/registry";
import { sendMail, type MailJobData } from "@/lib/jobs/mail";
import { mailTransport } from "@/lib/mail/transport";
import { invitePerson, resendInvitation } from "@/lib/accounts/invitations";
import { findInvitation } from "@/db/queries/accounts";

let t: Awaited<ReturnType<typeof createTestDatabase>>;
let boss: PgBoss;
let fake: ReturnType<typeof startMailFake> | null = null;
let mailDir: string;
const logged: string[] = [];
const log = { info: (s: string) => logged.push(s), error: (s: string) => logged.push(s) };

/** A port nobody listens on: bound by us for a moment, then released. */
async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const s = net.createServer();
    s.once("error", reject);
    s.listen(0, "127.0.0.1", () => {
      const { port } = s.address() as net.AddressInfo;
      s.close(() => resolve(port));
    });
  });
}
const smtp = (port: number) => ({ host: "127.0.0.1", port, user: "echoline", password: "local", from: "x@y.z" });

// The inviting admin chose a display name with markup in it.
const admin = { id: "", name: "<script>alert(1)</script> Ines Okonkwo-Brandt", email: "admin@example.invalid" };
const invitee = "new.curator@example.invalid";

beforeAll(async () => {
  t = await createTestDatabase();
  admin.id = (
    await t.db
      .insertInto("User")
      .values({
        email: admin.email,
        name: admin.name,
        role: "admin",
        emailVerified: null,
        image: null,
        password_hash: null,
        deactivated_at: null,
      })
      .returning("id")
      .executeTakeFirstOrThrow()
  ).id;
  mailDir = fs.mkdtempSync(path.join(os.tmpdir(), "echoline-mail-test-"));
  boss = createWorkerBoss(t.url, { superviseIntervalSeconds: 1 });
  boss.on("error", () => {});
  await boss.start();
  // Two tries one second apart instead of the production preset (8 tries from 30 s, doubling).
  await ensureQueues(boss, {
    reconcile: true,
    presets: { [sendMail.name]: { retryLimit: 1, retryDelay: 1, retryBackoff: false, expireInSeconds: 30 } },
  });
});
afterAll(async () => {
  await boss?.stop({ graceful: false, close: true }).catch(() => {});
  await fake?.close();
  await t?.drop();
  fs.rmSync(mailDir, { recursive: true, force: true });
});

describe("mail as a job", () => {
  let userId = "";
  let firstLink = "";

  it("an invitation commits while SMTP is down; its mail job fails, is retried, and fails for good", async () => {
    const dead = await freePort();
    await registerJobs(boss, [createMailHandler({ transport: () => mailTransport(smtp(dead)), log })], {
      pollingIntervalSeconds: 0.5,
    });
    // What the route runs: nothing here waits for SMTP, so the admin's request cannot fail on it.
    const created = await t.db
      .transaction()
      .execute((trx) => invitePerson(trx, { email: invitee, role: "curator", venueIds: [] }, admin));
    userId = created.userId;
    expect(created.mailJobId).toBeTruthy();
    const reader = jobReader(t.db);
    const get = () => reader.getJobById<MailJobData>(sendMail.name, created.mailJobId!);

    // First try refused → state `retry`; second try refused → `failed` with the SMTP error.
    const retried = await until(
      async () => ((await get())?.retryCount ?? 0) >= 1 || undefined,
      20_000,
      "the mail job was not retried",
    );
    expect(retried).toBe(true);
    const failed = await until(
      async () => {
        const j = await get();
        return j?.state === "failed" ? j : undefined;
      },
      20_000,
      "the mail job did not end failed",
    );
    expect(failed.retryCount).toBe(1);
    expect(JSON.stringify(failed.output)).toMatch(/ECONNREFUSED/);
    expect(logged.some((l) => l.includes(`send-mail job ${created.mailJobId} failed`))).toBe(true);
    // The person and the invitation are there all the same.
    expect(await t.db.selectFrom("invitations").select("id").where("user_id", "=", userId).execute()).toHaveLength(1);
    firstLink = failed.data.to === invitee && failed.data.template === "invitation" ? failed.data.link : "";
    expect(firstLink).toMatch(/\/invite\/[\w-]{20,}$/);
    await boss.offWork(sendMail.name);
  });

  it("resending gives a fresh link that reaches a working SMTP server, with the inviter's name escaped", async () => {
    const [smtpPort, httpPort] = [await freePort(), await freePort()];
    fake = startMailFake({ smtpPort, httpPort, dir: mailDir, token: "mail-fake-token-for-this-test" });
    await registerJobs(boss, [createMailHandler({ transport: () => mailTransport(smtp(smtpPort)), log })], {
      pollingIntervalSeconds: 0.5,
    });
    const r = await t.db.transaction().execute((trx) => resendInvitation(trx, userId, admin));
    expect(r).toMatchObject({ mailJobId: expect.any(String) });

    const mail = await until(
      async () => fake!.messages.find((m) => m.to.includes(invitee)),
      20_000,
      "no invitation mail reached the mail fake",
    );
    expect(mail.subject).toBe("You are invited to Echoline");
    // HTML escaping of < > & (WHATWG HTML, "escaping a string"): the markup arrives as text.
    expect(mail.html).toContain("&lt;script&gt;alert(1)&lt;/script&gt; Ines Okonkwo-Brandt");
    expect(mail.html).not.toContain("<script>");
    // The new link works and the one in the failed mail no longer does.
    const link = /\/invite\/([\w-]+)/.exec(mail.text)![1];
    expect(await findInvitation(t.db, link)).toMatchObject({ user_id: userId, accepted_at: null });
    expect(await findInvitation(t.db, firstLink.split("/invite/")[1])).toBeUndefined();
    const id = (r as { mailJobId: string }).mailJobId;
    await until(
      async () => ((await jobReader(t.db).getJobById(sendMail.name, id))?.state === "completed" ? true : undefined),
      10_000,
      "the resent mail job did not complete",
    );
  });

  it("resending for someone who already chose a password says so instead of sending", async () => {
    await t.db.updateTable("invitations").set({ accepted_at: new Date() }).where("user_id", "=", userId).execute();
    expect(await t.db.transaction().execute((trx) => resendInvitation(trx, userId, admin))).toBe("accepted");
  });
});
