/**
 * Route params are parsed by the schema each handler gives `route()`: a malformed id (or an unknown
 * dashboard name) answers 404 `not_found` on every route with a dynamic segment, before any database
 * work. The handlers are found on disk, so a new route with an id is checked without listing it.
 * The database URL points where nothing listens: a handler that reached the database would answer
 * 503, not 404.
 */
import { beforeAll, describe, expect, it, vi } from "vitest";
import fs from "node:fs";
import path from "node:path";
import { NextRequest } from "next/server";

vi.mock("@/lib/server/session", () => ({
  getActor: async () => ({
    id: "00000000-0000-4000-8000-0000000000aa",
    email: "a@example.invalid",
    name: "Test Admin",
    role: "admin",
    venueIds: [],
  }),
}));

const ROOT = path.resolve(import.meta.dirname, "../../..");
const METHODS = ["GET", "POST", "PUT", "PATCH", "DELETE"] as const;

function routeFiles(dir: string): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const p = path.join(dir, e.name);
    if (e.isDirectory()) return routeFiles(p);
    return e.name === "route.ts" ? [path.relative(ROOT, p)] : [];
  });
}

// next-auth's own catch-all handles its own paths; every other dynamic segment is ours.
const withParams = routeFiles(path.join(ROOT, "app/api")).filter((f) => /\[[^\]]+\]/.test(f) && !f.includes("[..."));
const segments = (f: string) => [...f.matchAll(/\[([^\]]+)\]/g)].map((m) => m[1]);

beforeAll(() => {
  process.env.DATABASE_URL = "postgres://postgres@127.0.0.1:1/none";
});

describe("a malformed id answers 404 on every route with one", () => {
  it("finds the routes with ids (the list below is not empty by accident)", () => {
    expect(withParams.length).toBeGreaterThanOrEqual(12);
  });

  for (const file of withParams) {
    for (const bad of ["not-an-id", "123", "00000000-0000-4000-8000-00000000000Z"]) {
      it(`${file} with "${bad}"`, async () => {
        const mod = (await import(path.join(ROOT, file))) as Record<string, unknown>;
        const handlers = METHODS.filter((m) => typeof mod[m] === "function");
        expect(handlers.length).toBeGreaterThan(0);
        const params = Object.fromEntries(segments(file).map((s) => [s, bad]));
        for (const method of handlers) {
          const url = `http://localhost/${file.replace(/^app\//, "").replace(/\/route\.ts$/, "")}`;
          const req = new NextRequest(url, {
            method,
            ...(method === "GET" ? {} : { body: "{}", headers: { "content-type": "application/json" } }),
          });
          const handler = mod[method] as (
            r: NextRequest,
            c: { params: Promise<Record<string, string>> },
          ) => Promise<Response>;
          const res = await handler(req, { params: Promise.resolve(params) });
          expect({ method, status: res.status }).toEqual({ method, status: 404 });
          const body = (await res.json()) as { error: { code: string; message: string } };
          expect(body.error.code).toBe("not_found");
          expect(body.error.message).toMatch(/was not found\.$/);
        }
      });
    }
  }
});

describe("errorResponse maps domain errors to the one error shape", () => {
  it("gives each kind its status, code, message and field", async () => {
    const { errorResponse } = await import("@/lib/server/request");
    const { NotFoundError, ConflictError, ValidationError, ForbiddenError, GoneError } = await import("@/lib/errors");
    const cases: [Error, number, object][] = [
      [new NotFoundError("That work"), 404, { code: "not_found", message: "That work was not found." }],
      [new ValidationError("Pick two.", "intoId"), 400, { code: "invalid", message: "Pick two.", field: "intoId" }],
      [new ConflictError("Taken.", "doi", "doi_taken"), 409, { code: "doi_taken", message: "Taken.", field: "doi" }],
      [new ForbiddenError(), 403, { code: "forbidden", message: "Your role does not allow this." }],
      [new GoneError("Expired."), 410, { code: "gone", message: "Expired." }],
    ];
    for (const [err, status, error] of cases) {
      const res = errorResponse(err);
      expect(res.status).toBe(status);
      expect(await res.json()).toEqual({ error });
    }
  });
});
