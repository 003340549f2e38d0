/**
 * The local mail fake holds sign-in links: its HTTP side needs the stack's token and a loopback Host,
 * and what it writes is the owner's alone. Mail goes in through nodemailer (a general-purpose SMTP
 * client, the same the app uses); requests go out through node:http so the Host header can be forged
 * as a DNS-rebinding page would send it (fetch does not let a caller set Host). File modes are POSIX
 * permission bits from stat(2), checked under the common umask 022.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import fs from "node:fs";
import http from "node:http";
import os from "node:os";
import path from "node:path";
import nodemailer from "nodemailer";
import { startMailFake } from "@/workers/mail-fake";

const TOKEN = "an-invented-token-for-this-test-only";
let dir: string;
let oldMask: number;
let fake: ReturnType<typeof startMailFake>;
let ports: { smtpPort: number; httpPort: number };

function get(pathname: string, headers: Record<string, string>): Promise<{ status: number; body: string }> {
  return new Promise((resolve, reject) => {
    const req = http.request({ host: "127.0.0.1", port: ports.httpPort, path: pathname, headers }, (res) => {
      let body = "";
      res.setEncoding("utf8");
      res.on("data", (c: string) => (body += c));
      res.on("end", () => resolve({ status: res.statusCode ?? 0, body }));
    });
    req.on("error", reject);
    req.end();
  });
}

beforeAll(async () => {
  oldMask = process.umask(0o022);
  dir = path.join(fs.mkdtempSync(path.join(os.tmpdir(), "echoline-mail-")), "mail");
  // What an older version left behind: a world-readable folder and message.
  fs.mkdirSync(dir, { mode: 0o755 });
  const old = {
    id: "old",
    at: "2020-01-01T00:00:00.000Z",
    from: "",
    to: ["a@echoline.local"],
    subject: "Old",
    text: "",
    html: null,
  };
  fs.writeFileSync(path.join(dir, "old.json"), JSON.stringify(old), { mode: 0o644 });
  fake = startMailFake({ smtpPort: 0, httpPort: 0, dir, token: TOKEN });
  ports = await fake.ready;
  const transport = nodemailer.createTransport({
    host: "127.0.0.1",
    port: ports.smtpPort,
    secure: false,
    ignoreTLS: true,
  });
  await transport.sendMail({
    from: "echoline@echoline.local",
    to: "curator@echoline.local",
    subject: "Your sign-in link",
    text: "http://localhost:3000/sign-in/link?token=secret-link",
  });
  transport.close();
});
afterAll(async () => {
  await fake?.close();
  process.umask(oldMask);
  fs.rmSync(path.dirname(dir), { recursive: true, force: true });
});

const local = () => `127.0.0.1:${ports.httpPort}`;

describe("the mail fake's HTTP side", () => {
  it("refuses a caller without the token (401) and with a wrong one", async () => {
    const none = await get("/messages", { host: local() });
    expect(none.status).toBe(401);
    expect(none.body).not.toContain("secret-link");
    const wrong = await get("/messages", { host: local(), "x-mail-fake-token": `${TOKEN}x` });
    expect(wrong.status).toBe(401);
    const page = await get("/", { host: `localhost:${ports.httpPort}` });
    expect(page.status).toBe(401);
    expect(page.body).not.toContain("Your sign-in link");
  });

  it("refuses a foreign Host even with the token (a DNS-rebinding page)", async () => {
    for (const host of [`attacker.invalid:${ports.httpPort}`, "attacker.invalid", `localhost:${ports.httpPort + 1}`]) {
      const r = await get("/messages", { host, "x-mail-fake-token": TOKEN });
      expect(r.status, host).toBe(403);
      expect(r.body).not.toContain("secret-link");
    }
  });

  it("answers the token on loopback names: JSON API by header, HTML page by ?token=", async () => {
    const api = await get("/messages?to=curator@echoline.local", { host: local(), "x-mail-fake-token": TOKEN });
    expect(api.status).toBe(200);
    const list = JSON.parse(api.body) as { subject: string; text: string }[];
    expect(list.map((m) => m.subject)).toEqual(["Your sign-in link"]);
    expect(list[0].text).toContain("secret-link");
    const page = await get(`/?token=${TOKEN}`, { host: `localhost:${ports.httpPort}` });
    expect(page.status).toBe(200);
    expect(page.body).toContain("Your sign-in link");
  });
});

describe("captured mail on disk", () => {
  it("is 0600 in a 0700 folder, including what an older version left world-readable", () => {
    const mode = (p: string) => (fs.statSync(p).mode & 0o777).toString(8);
    expect(mode(dir)).toBe("700");
    const files = fs.readdirSync(dir);
    expect(files).toHaveLength(2);
    for (const f of files) expect(mode(path.join(dir, f)), f).toBe("600");
  });
});
