/**
 * The authorization matrix: every page and route-handler method found on disk must have a row in
 * tests/authz-matrix/, and each row is requested as every role and as an anonymous visitor.
 */
import { beforeAll, describe, expect, it } from "vitest";
import fs from "node:fs";
import path from "node:path";
import { MATRIX, type MatrixRow } from "../authz-matrix";
import { APP_URL } from "../helpers/browser";
import { sessionCookie } from "../helpers/http";
import { ROLES, type Role } from "@/lib/vocabulary";

const ROOT = path.resolve(import.meta.dirname, "../..");

function walk(dir: string): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const p = path.join(dir, e.name);
    return e.isDirectory() ? walk(p) : [path.relative(ROOT, p)];
  });
}

const appFiles = walk(path.join(ROOT, "app"));
const METHODS = ["GET", "POST", "PUT", "PATCH", "DELETE"] as const;

function exportedMethods(file: string): string[] {
  const src = fs.readFileSync(path.join(ROOT, file), "utf8");
  const found = new Set<string>();
  for (const m of METHODS) {
    if (new RegExp(`export\\s+(const|async\\s+function|function)\\s+${m}\\b`).test(src)) found.add(m);
    if (new RegExp(`export\\s+const\\s*\\{[^}]*\\b${m}\\b[^}]*\\}`).test(src)) found.add(m);
  }
  return [...found];
}

describe("authorization matrix", () => {
  it("has a row for every page and every route-handler method on disk", () => {
    const missing: string[] = [];
    for (const f of appFiles.filter((f) => f.endsWith("/page.tsx"))) {
      if (!MATRIX.some((r) => r.file === f && r.method === "PAGE")) missing.push(`${f} PAGE`);
    }
    for (const f of appFiles.filter((f) => f.endsWith("/route.ts"))) {
      for (const m of exportedMethods(f))
        if (!MATRIX.some((r) => r.file === f && r.method === m)) missing.push(`${f} ${m}`);
    }
    expect(missing, "add these to tests/authz-matrix/").toEqual([]);
    for (const r of MATRIX)
      expect(fs.existsSync(path.join(ROOT, r.file)), `matrix row for missing file ${r.file}`).toBe(true);
  });

  it("finds no server actions outside the matrix (Echoline writes through route handlers)", () => {
    const sources = ["app", "components", "lib"]
      .flatMap((d) => walk(path.join(ROOT, d)))
      .filter((f) => /\.(ts|tsx)$/.test(f));
    const actions = sources.filter((f) => /^\s*["']use server["']/m.test(fs.readFileSync(path.join(ROOT, f), "utf8")));
    expect(actions, "server actions need matrix rows and a test path; use route handlers instead").toEqual([]);
  });

  const cookies: Partial<Record<Role, string>> = {};
  beforeAll(async () => {
    for (const role of ROLES) cookies[role] = await sessionCookie(role);
  });

  async function request(row: MatrixRow, cookie?: string) {
    const method = row.method === "PAGE" ? "GET" : row.method;
    const hasBody = method !== "GET" && method !== "DELETE";
    return fetch(`${APP_URL}${row.path}`, {
      method,
      redirect: "manual",
      headers: { ...(cookie ? { cookie } : {}), ...(hasBody ? { "content-type": "application/json" } : {}) },
      body: hasBody ? JSON.stringify(row.body ?? {}) : undefined,
    });
  }

  for (const row of MATRIX) {
    it(`${row.method} ${row.path}`, async () => {
      const anon = await request(row);
      expect(anon.status, "anonymous: never a server error").toBeLessThan(500);
      if (row.allow === "public") {
        expect([401, 403]).not.toContain(anon.status);
      } else if (row.method === "PAGE") {
        expect([303, 307, 308]).toContain(anon.status);
        expect(anon.headers.get("location") ?? "").toMatch(/\/sign-in/);
      } else {
        expect(anon.status).toBe(401);
        expect(await anon.json()).toMatchObject({ error: { code: "unauthenticated" } });
      }
      for (const role of ROLES) {
        const res = await request(row, cookies[role]);
        const allowed = row.allow === "public" || row.allow.includes(role);
        expect(res.status, `${role}: never a server error`).toBeLessThan(500);
        if (allowed) {
          expect([401, 403], `${role} should get through`).not.toContain(res.status);
          if (row.method === "PAGE")
            expect(res.headers.get("location") ?? "", `${role} sent to sign-in`).not.toMatch(/\/sign-in$/);
        } else {
          expect(res.status, `${role} must be refused`).toBe(403);
        }
      }
    });
  }
});
