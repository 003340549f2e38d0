/**
 * `npm run db:backup` / `npm run db:restore`: rows and stored files survive losing both.
 * The outside references: PostgreSQL's own pg_dump and pg_restore do the dump and the restore (the
 * test also asks `pg_restore --list` what the archive holds), and coreutils' `sha256sum` checks the
 * manifest and the files before and after. A database's content is compared table by table: row
 * counts and an md5 over every row's text, computed by PostgreSQL itself.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { execFileSync, spawnSync } from "node:child_process";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import pg from "pg";
import { sql } from "kysely";
import { createTestDatabase } from "@/tests/helpers/db";
import { databaseUrl, findBinDir } from "@/db/cluster";
import { folderStorage } from "@/lib/storage";
import { ingest } from "../helpers/ingest";
import { goodPdf } from "@/tests/integration/mining/fixtures";
import type { DB } from "@/db";

const ROOT = path.resolve(import.meta.dirname, "..", "..");
let work: string;
let filesDir: string;
let backupDir: string;
let url: string;
let dbName: string;
let before: Map<string, string>;
let filesBefore: Map<string, string>;

/** The npm scripts' own command line (package.json: db:backup, db:restore). */
function cli(...args: string[]) {
  const r = spawnSync(process.execPath, ["--import", "tsx", "db/backup.ts", ...args], { cwd: ROOT, encoding: "utf8" });
  return { code: r.status, out: `${r.stdout}${r.stderr}` };
}

/** coreutils' sha256sum over every file under dir, keyed by relative path. */
function sha256sum(dir: string): Map<string, string> {
  const files = fs
    .readdirSync(dir, { recursive: true, withFileTypes: true })
    .filter((e) => e.isFile())
    .map((e) => path.relative(dir, path.join(e.parentPath, e.name)));
  if (!files.length) return new Map();
  const out = execFileSync("sha256sum", files, { cwd: dir, encoding: "utf8" });
  return new Map(
    out
      .trim()
      .split("\n")
      .map((l) => {
        const [sum, file] = l.split(/\s+\*?/, 2);
        return [file, sum] as [string, string];
      }),
  );
}

async function admin<T>(fn: (c: pg.Client) => Promise<T>): Promise<T> {
  const c = new pg.Client({ connectionString: databaseUrl("test", "postgres") });
  await c.connect();
  try {
    return await fn(c);
  } finally {
    await c.end();
  }
}
const databaseExists = (name: string) =>
  admin(async (c) => (await c.query("select 1 from pg_database where datname = $1", [name])).rowCount === 1);

/** Every table and materialised view outside the system schemas: "count md5" of its rows, by PostgreSQL. */
async function snapshot(connectionString: string): Promise<Map<string, string>> {
  const c = new pg.Client({ connectionString });
  await c.connect();
  try {
    const rels = await c.query<{ s: string; t: string }>(
      `select schemaname as s, tablename as t from pg_tables where schemaname not in ('pg_catalog', 'information_schema')
       union all select schemaname, matviewname from pg_matviews order by 1, 2`,
    );
    const out = new Map<string, string>();
    for (const { s, t } of rels.rows) {
      const q = `"${s}"."${t}"`;
      const r = await c.query<{ n: string; h: string | null }>(
        `select count(*)::text as n, md5(string_agg(x::text, '|' order by x::text)) as h from ${q} x`,
      );
      out.set(q, `${r.rows[0].n} ${r.rows[0].h ?? "-"}`);
    }
    return out;
  } finally {
    await c.end();
  }
}

async function putRows(db: DB) {
  const storage = folderStorage(filesDir);
  const user = await db
    .insertInto("User")
    .values({ email: "backup-curator@echoline.local", name: "Backup Curator (invented)", role: "curator" })
    .returning("id")
    .executeTakeFirstOrThrow();
  const pdf = await ingest(db, storage, {
    data: await goodPdf(),
    filename: "invented-study.pdf",
    metadata: { title: "An invented study of scale reliability", year: 2011 },
    uploadedBy: user.id,
  });
  const txt = await ingest(db, storage, {
    data: new TextEncoder().encode("Methods\nReliability above .70 is acceptable (Invented & Author, 1999, p. 12).\n"),
    filename: "invented-note.txt",
    uploadedBy: user.id,
  });
  await db
    .insertInto("statements")
    .values(
      [pdf.articleId, txt.articleId].map((article_id, i) => ({
        article_id,
        ordinal: 1,
        page: 1,
        section: "methods" as const,
        sentence: `Reliability above .70 is acceptable (sentence ${i}).`,
        kind: "threshold" as const,
        statistic: "cronbach_alpha" as const,
        statistic_label: null,
        comparator: ">=" as const,
        value: 0.7,
        framing: "fixed" as const,
        procedure_key: null,
        fingerprint: `fingerprint-${i}`,
      })),
    )
    .execute();
}

beforeAll(async () => {
  work = fs.mkdtempSync(path.join(os.tmpdir(), "echoline-backup-"));
  filesDir = path.join(work, "files");
  backupDir = path.join(work, "backup");
  const t = await createTestDatabase();
  url = t.url;
  dbName = t.name;
  await putRows(t.db);
  const counts = await t.db
    .selectNoFrom([
      sql<number>`(select count(*) from articles)::int`.as("articles"),
      sql<number>`(select count(*) from statements)::int`.as("statements"),
      sql<number>`(select count(*) from "User" where email = 'backup-curator@echoline.local')::int`.as("users"),
    ])
    .executeTakeFirstOrThrow();
  expect(counts).toEqual({ articles: 2, statements: 2, users: 1 });
  await t.db.destroy();
  before = await snapshot(url);
  filesBefore = sha256sum(filesDir);
  expect(filesBefore.size).toBe(2);
});

afterAll(async () => {
  await admin(async (c) => {
    const r = await c.query<{ datname: string }>("select datname from pg_database where datname like $1", [
      `${dbName}%`,
    ]);
    for (const { datname } of r.rows) await c.query(`drop database if exists "${datname}" with (force)`);
  });
  if (work) fs.rmSync(work, { recursive: true, force: true });
});

describe("backup, destroy, restore (pg_dump / pg_restore custom format)", () => {
  it("backs up the database and every stored file with a manifest that sha256sum agrees with", () => {
    const r = cli("backup", "--url", url, "--files", filesDir, "--out", backupDir);
    expect(r.code, r.out).toBe(0);
    const manifest = JSON.parse(fs.readFileSync(path.join(backupDir, "manifest.json"), "utf8")) as {
      dump: { path: string; sha256: string };
      files: { path: string; sha256: string }[];
    };
    const sums = sha256sum(backupDir);
    expect(sums.get("database.dump")).toBe(manifest.dump.sha256);
    expect(new Map(manifest.files.map((f) => [f.path, f.sha256]))).toEqual(filesBefore);
    for (const f of manifest.files) expect(sums.get(`files/${f.path}`)).toBe(f.sha256);
    // pg_restore reads the archive: it is PostgreSQL's custom format and holds the tables' data.
    const list = execFileSync(
      path.join(findBinDir()!, "pg_restore"),
      ["--list", path.join(backupDir, "database.dump")],
      {
        encoding: "utf8",
      },
    );
    expect(list).toMatch(/Format: CUSTOM/);
    for (const table of ["articles", "statements", "User"])
      expect(list).toMatch(new RegExp(`TABLE DATA public "?${table}"? `));
  });

  it("after the database is dropped and the files deleted, a tampered backup is refused and restores nothing", async () => {
    await admin((c) => c.query(`drop database "${dbName}" with (force)`));
    fs.rmSync(filesDir, { recursive: true, force: true });
    expect(await databaseExists(dbName)).toBe(false);

    const tampered = path.join(work, "tampered");
    fs.cpSync(backupDir, tampered, { recursive: true });
    const manifest = JSON.parse(fs.readFileSync(path.join(tampered, "manifest.json"), "utf8")) as {
      files: { path: string }[];
    };
    const victim = path.join(tampered, "files", manifest.files[0].path);
    const bytes = fs.readFileSync(victim);
    bytes[bytes.length >> 1] ^= 0xff;
    fs.writeFileSync(victim, bytes);
    const r = cli("restore", tampered, "--url", url, "--files", filesDir);
    expect(r.code).toBe(1);
    expect(r.out).toContain(`${manifest.files[0].path}: SHA-256 differs from the manifest`);
    expect(await databaseExists(dbName)).toBe(false);
    expect(fs.existsSync(filesDir)).toBe(false);
  });

  it("restores every row and every file, files private to the owner", async () => {
    const r = cli("restore", backupDir, "--url", url, "--files", filesDir);
    expect(r.code, r.out).toBe(0);
    const after = await snapshot(url);
    expect([...after.keys()]).toEqual([...before.keys()]);
    expect(after).toEqual(before);
    expect(after.get('"public"."articles"')).toMatch(/^2 /);
    expect(after.get('"public"."statements"')).toMatch(/^2 /);
    expect(sha256sum(filesDir)).toEqual(filesBefore);
    for (const rel of filesBefore.keys())
      expect((fs.statSync(path.join(filesDir, rel)).mode & 0o777).toString(8)).toBe("600");
  });

  it("refuses to restore over an existing database unless told, then keeps the replaced one", async () => {
    const refused = cli("restore", backupDir, "--url", url, "--files", filesDir);
    expect(refused.code).toBe(1);
    expect(refused.out).toMatch(/exists\. Pass --replace/);
    // A change made after the backup: --replace brings the backup's state back and keeps this one aside.
    await admin(async () => {
      const c = new pg.Client({ connectionString: url });
      await c.connect();
      await c.query("delete from statements");
      await c.end();
    });
    const replaced = cli("restore", backupDir, "--url", url, "--files", filesDir, "--replace");
    expect(replaced.code, replaced.out).toBe(0);
    expect(await snapshot(url)).toEqual(before);
    const kept = replaced.out.match(/kept as (\S+);/)?.[1];
    expect(kept).toMatch(new RegExp(`^${dbName}_before_restore_\\d{14}$`));
    const keptStatements = await admin(async () => {
      const c = new pg.Client({ connectionString: databaseUrl("test", kept!) });
      await c.connect();
      const n = (await c.query<{ n: number }>("select count(*)::int as n from statements")).rows[0].n;
      await c.end();
      return n;
    });
    expect(keptStatements).toBe(0);
  });
});
