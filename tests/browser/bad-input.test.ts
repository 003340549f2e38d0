import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { spawn, type ChildProcess } from "node:child_process";
import { APP_URL, E2E_PORT_BASE } from "../helpers/browser";
import { sessionCookie } from "../helpers/http";
import { stackEnv, waitForHttp } from "@/workers/stack";
import { DATA_DIR } from "@/db/cluster";
import path from "node:path";
import fs from "node:fs";

let admin: string;
beforeAll(async () => {
  admin = await sessionCookie("admin");
});

const post = (url: string, body: string, cookie = admin, extra: Record<string, string> = {}) =>
  fetch(`${APP_URL}${url}`, {
    method: "POST",
    headers: { cookie, "content-type": "application/json", ...extra },
    body,
  });

describe("bad input gets a clear JSON error that names the field", () => {
  it("malformed JSON → 400 naming the body", async () => {
    const r = await post("/api/admin/venues", "{not json");
    expect(r.status).toBe(400);
    expect(await r.json()).toEqual({
      error: { code: "invalid", message: expect.stringMatching(/not valid JSON/), field: "body" },
    });
  });

  it("a wrong field → 400 naming that field", async () => {
    const r = await post("/api/admin/venues", JSON.stringify({ name: "Ok Name", issn: "12-34" }));
    expect(r.status).toBe(400);
    const j = (await r.json()) as { error: { field: string; message: string } };
    expect(j.error.field).toBe("issn");
    expect(j.error.message).toMatch(/ISSN/);
  });

  it("a unique violation → 409 on the field, found by PostgreSQL's error code", async () => {
    const body = JSON.stringify({ name: "Duplicate Test Venue", isMethodsVenue: false });
    expect((await post("/api/admin/venues", body)).status).toBe(200);
    const r = await post("/api/admin/venues", body);
    expect(r.status).toBe(409);
    expect(await r.json()).toMatchObject({ error: { code: "exists", field: "name" } });
  });
  it("an oversized body → 413, also when Content-Length is not sent", async () => {
    const big = JSON.stringify({ name: "x".repeat(300 * 1024) });
    const r = await post("/api/admin/venues", big);
    expect(r.status).toBe(413);
    expect(await r.json()).toMatchObject({ error: { code: "too_large", field: "body" } });
    // A streamed body has no Content-Length: the limit must still hold while reading.
    const stream = new ReadableStream({
      start(c) {
        for (let i = 0; i < 40; i++) c.enqueue(new TextEncoder().encode("x".repeat(10 * 1024)));
        c.close();
      },
    });
    const r2 = await fetch(`${APP_URL}/api/admin/venues`, {
      method: "POST",
      headers: { cookie: admin, "content-type": "application/json" },
      body: stream,
      duplex: "half",
    } as RequestInit);
    expect(r2.status).toBe(413);
  });
});

// Every page and route handler with a dynamic segment (found on disk), reached with ids that cannot
// name anything: each answers 404, the same as a well-formed id of a row that does not exist.
function dynamicFiles(dir: string): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const p = path.join(dir, e.name);
    if (e.isDirectory()) return dynamicFiles(p);
    return /^(page\.tsx|route\.ts)$/.test(e.name) && /\[[^.\]][^\]]*\]/.test(p) ? [p] : [];
  });
}
const urlOf = (file: string, id: string) =>
  "/" +
  path
    .relative("app", file)
    .replace(/\/(page\.tsx|route\.ts)$/, "")
    .split(path.sep)
    .filter((s) => !/^\(.*\)$/.test(s))
    .map((s) => (/^\[.*\]$/.test(s) ? id : s))
    .join("/");

// One retry on a transport error only: under load undici can reuse a keep-alive socket the server
// has just closed (ECONNRESET). A server that really failed fails the second try too.
const fetchOnceMore = (url: string, init: RequestInit) => fetch(url, init).catch(() => fetch(url, init));

describe("a malformed id answers 404 on every page and route that takes one", () => {
  // The invitation page takes any token and explains a bad one itself (tested in admin-people).
  const files = dynamicFiles("app").filter((f) => !f.includes("[token]"));
  it("finds them", () => expect(files.length).toBeGreaterThanOrEqual(15));
  for (const file of files) {
    it(file, async () => {
      const url = urlOf(file, "not-an-id");
      if (file.endsWith("page.tsx")) {
        const r = await fetchOnceMore(`${APP_URL}${url}`, { headers: { cookie: admin }, redirect: "manual" });
        expect({ url, status: r.status }).toEqual({ url, status: 404 });
        return;
      }
      for (const method of ["GET", "POST", "PUT", "PATCH"]) {
        const r = await fetchOnceMore(`${APP_URL}${url}`, {
          method,
          headers: { cookie: admin, "content-type": "application/json" },
          ...(method === "GET" ? {} : { body: "{}" }),
        });
        if (r.status === 405) continue; // the route has no such method
        expect({ url, method, status: r.status }).toEqual({ url, method, status: 404 });
        expect(((await r.json()) as { error: { code: string } }).error.code).toBe("not_found");
      }
    });
  }
});

describe("the database being down", () => {
  let web: ChildProcess;
  const port = E2E_PORT_BASE + 99;
  beforeAll(async () => {
    // The same build, pointed at a port where no PostgreSQL listens.
    const env = stackEnv({
      appPort: port,
      smtpPort: E2E_PORT_BASE - 475,
      mailHttpPort: E2E_PORT_BASE - 474,
      databaseUrl: "postgres://postgres@127.0.0.1:1/none",
      dataDir: path.join(DATA_DIR, "e2e"),
    });
    web = spawn("node_modules/.bin/next", ["start", "-H", "127.0.0.1", "-p", String(port)], { env, stdio: "ignore" });
    await waitForHttp(`http://127.0.0.1:${port}/`, 60_000);
  });
  afterAll(() => {
    web?.kill("SIGTERM");
  });

  it("gives a clear page and a clear JSON error, no stack trace", async () => {
    const cookie = admin.replace(new RegExp(`localhost:${E2E_PORT_BASE}`, "g"), `localhost:${port}`);
    const page = await fetch(`http://localhost:${port}/home`, { headers: { cookie }, redirect: "manual" });
    const html = await page.text();
    expect(html).toMatch(/database (is not reachable|may be down)/i);
    expect(html).not.toMatch(/ECONNREFUSED|at .*\.js:\d+/);
    const api = await fetch(`http://localhost:${port}/api/venues`, { headers: { cookie } });
    expect(api.status).toBe(503);
    const j = (await api.json()) as { error: { code: string; message: string } };
    expect(j.error.code).toBe("database_unavailable");
    expect(JSON.stringify(j)).not.toMatch(/ECONNREFUSED|127\.0\.0\.1:1/);
  });
});
