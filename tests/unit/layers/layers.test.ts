/**
 * The layer rules of DEVELOPERS.md, checked two ways: no database access written in app/ (the same
 * grep the contributor guide gives), and the ESLint configuration really refusing each forbidden
 * import (lintText on a probe file placed in each folder, so a broken config cannot pass quietly).
 */
import { describe, expect, it } from "vitest";
import fs from "node:fs";
import path from "node:path";
import { ESLint } from "eslint";

const ROOT = path.resolve(import.meta.dirname, "../../..");

function filesUnder(dir: string): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const p = path.join(dir, e.name);
    return e.isDirectory() ? filesUnder(p) : [p];
  });
}

describe("app/ holds no data access", () => {
  it('grep -rnE "selectFrom|insertInto|updateTable|deleteFrom|sql`" app finds nothing', () => {
    const pattern = /selectFrom|insertInto|updateTable|deleteFrom|sql`/;
    const hits = filesUnder(path.join(ROOT, "app")).flatMap((f) =>
      fs
        .readFileSync(f, "utf8")
        .split("\n")
        .flatMap((line, i) => (pattern.test(line) ? [`${path.relative(ROOT, f)}:${i + 1}: ${line.trim()}`] : [])),
    );
    expect(hits, "move these queries into db/queries/ (a function that takes the handle)").toEqual([]);
  });

  it("the grep would see a query (the pattern matches the forms we write)", () => {
    const pattern = /selectFrom|insertInto|updateTable|deleteFrom|sql`/;
    for (const line of ['db.selectFrom("venues")', "await sql`select 1`.execute(db)", 'trx.deleteFrom("trails")'])
      expect(pattern.test(line)).toBe(true);
  });
});

describe("ESLint refuses imports across the layers", () => {
  const eslint = new ESLint({ cwd: ROOT });
  const lint = async (file: string, text: string) => {
    const [r] = await eslint.lintText(text, { filePath: path.join(ROOT, file) });
    return r.messages.filter((m) => m.ruleId === "boundaries/dependencies").map((m) => m.line);
  };

  it("lib/ imports no next, next-auth, react, app/, components/ or workers/", async () => {
    const text = [
      'import { redirect } from "next/navigation";',
      'import NextAuth from "next-auth";',
      'import { useState } from "react";',
      'import { GET } from "@/app/api/venues/route";',
      'import { EmptyState } from "@/components/ui/empty-state";',
      'import { buildJobs } from "@/workers/jobs";',
      'import { z } from "zod";',
      'import { getDb } from "@/db";',
      "export const x = [redirect, NextAuth, useState, GET, EmptyState, buildJobs, z, getDb];",
    ].join("\n");
    // Lines 7 and 8 (zod, db/) are allowed.
    expect(await lint("lib/corpus/probe.ts", text)).toEqual([1, 2, 3, 4, 5, 6]);
  }, 60_000);

  it("lib/server/ is the one exception for next and next-auth, but not for app/", async () => {
    const text = [
      'import { redirect } from "next/navigation";',
      'import NextAuth from "next-auth";',
      'import { GET } from "@/app/api/venues/route";',
      "export const x = [redirect, NextAuth, GET];",
    ].join("\n");
    expect(await lint("lib/server/probe.ts", text)).toEqual([3]);
  }, 60_000);

  it("components/ import no db/; workers/ import no app/", async () => {
    const comp =
      'import type { Role } from "@/db/schema/accounts";\nimport { ROLES } from "@/lib/vocabulary";\nexport const x: Role[] = [...ROLES];';
    expect(await lint("components/admin/probe.tsx", comp)).toEqual([1]);
    const worker =
      'import { GET } from "@/app/api/venues/route";\nimport { getDb } from "@/db";\nexport const x = [GET, getDb];';
    expect(await lint("workers/probe.ts", worker)).toEqual([1]);
  }, 60_000);
});
