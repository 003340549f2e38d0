/**
 * Backups of what Echoline cannot rebuild: the database, dumped by PostgreSQL's own pg_dump in its
 * custom format, and the stored files (lib/storage), together in one folder with a manifest of the
 * SHA-256 of every file. Restore checks the whole manifest before it touches anything, restores into
 * a fresh database and only then swaps it in, keeping the database it replaces under another name.
 *
 *   npm run db:backup  [-- --out DIR] [target]
 *   npm run db:restore -- BACKUP_DIR [--replace] [target]
 *   target: the dev cluster's `echoline` by default; `--test [--database NAME]` for the test
 *   cluster; `--url postgres://…` for any server. `--files DIR` overrides the storage folder.
 *
 * pg_dump and pg_restore come from the same Debian server binaries db/cluster.ts runs
 * (/usr/lib/postgresql/<version>/bin), so their version matches the private cluster's.
 */
import { createHash, randomBytes } from "node:crypto";
import { spawnSync } from "node:child_process";
import fs from "node:fs";
import path from "node:path";
import { pipeline } from "node:stream/promises";
import { Transform } from "node:stream";
import pg from "pg";
import { z } from "zod";
import { DATA_DIR, databaseUrl, findBinDir, status, up, down, type ClusterName } from "./cluster";
import { storageDir, FILE_MODE, DIR_MODE } from "@/lib/storage";

const MANIFEST = "manifest.json";
const DUMP = "database.dump";

const Entry = z.object({
  path: z.string().min(1),
  sha256: z.string().regex(/^[0-9a-f]{64}$/),
  bytes: z.number().int().nonnegative(),
});
const Manifest = z.object({
  format: z.literal("echoline-backup"),
  version: z.literal(1),
  created_at: z.string(),
  database: z.object({ name: z.string(), pg_dump: z.string() }),
  dump: Entry,
  files: z.array(Entry),
});
export type BackupManifest = z.infer<typeof Manifest>;

/** A refusal with a message that says what to change; the CLI prints it without a stack trace. */
export class BackupError extends Error {}

function pgBin(tool: "pg_dump" | "pg_restore"): string {
  const dir = findBinDir();
  if (!dir)
    throw new BackupError("PostgreSQL's binaries were not found under /usr/lib/postgresql (run npm run db:up once).");
  return path.join(dir, tool);
}

function run(tool: "pg_dump" | "pg_restore", args: string[]): string {
  const r = spawnSync(pgBin(tool), args, { encoding: "utf8", maxBuffer: 64 * 1024 * 1024 });
  if (r.error) throw r.error;
  if (r.status !== 0) throw new BackupError(`${tool} failed (exit ${r.status}): ${(r.stderr || r.stdout).trim()}`);
  return r.stdout;
}

async function sha256File(file: string): Promise<{ sha256: string; bytes: number }> {
  const h = createHash("sha256");
  let bytes = 0;
  for await (const chunk of fs.createReadStream(file) as AsyncIterable<Buffer>) {
    h.update(chunk);
    bytes += chunk.length;
  }
  return { sha256: h.digest("hex"), bytes };
}

/** Copies src to dst (through a temporary name, private modes) and returns the SHA-256 of what was copied. */
async function copyHashed(src: string, dst: string): Promise<{ sha256: string; bytes: number }> {
  fs.mkdirSync(path.dirname(dst), { recursive: true, mode: DIR_MODE });
  const tmp = `${dst}.${process.pid}.${randomBytes(4).toString("hex")}.tmp`;
  const h = createHash("sha256");
  let bytes = 0;
  const tap = new Transform({
    transform(chunk: Buffer, _enc, cb) {
      h.update(chunk);
      bytes += chunk.length;
      cb(null, chunk);
    },
  });
  try {
    await pipeline(fs.createReadStream(src), tap, fs.createWriteStream(tmp, { mode: FILE_MODE }));
    fs.renameSync(tmp, dst);
  } finally {
    fs.rmSync(tmp, { force: true });
  }
  return { sha256: h.digest("hex"), bytes };
}

/** Every regular file under dir, as paths relative to it (unfinished `.tmp` writes left out). */
function listFiles(dir: string): string[] {
  if (!fs.existsSync(dir)) return [];
  return fs
    .readdirSync(dir, { recursive: true, withFileTypes: true })
    .filter((e) => e.isFile() && !e.name.endsWith(".tmp"))
    .map((e) => path.relative(dir, path.join(e.parentPath, e.name)))
    .sort();
}

function databaseName(url: string): string {
  const name = decodeURIComponent(new URL(url).pathname.replace(/^\//, ""));
  if (!name) throw new BackupError(`The database URL names no database: ${redact(url)}`);
  return name;
}
const redact = (url: string) => url.replace(/\/\/([^:@/]+):[^@/]*@/, "//$1:***@");
const ident = (s: string) => `"${s.replace(/"/g, '""')}"`;
function withDatabase(url: string, database: string): string {
  const u = new URL(url);
  u.pathname = `/${encodeURIComponent(database)}`;
  return u.toString();
}

export async function backup(opts: { url: string; filesDir: string; out: string }): Promise<BackupManifest> {
  const out = path.resolve(opts.out);
  if (fs.existsSync(out) && fs.readdirSync(out).length > 0)
    throw new BackupError(`${out} is not empty; name a new folder with --out.`);
  fs.mkdirSync(out, { recursive: true, mode: DIR_MODE });
  fs.chmodSync(out, DIR_MODE);
  const version = run("pg_dump", ["--version"]).trim();
  const dumpFile = path.join(out, DUMP);
  run("pg_dump", ["--format=custom", "--no-password", `--file=${dumpFile}`, `--dbname=${opts.url}`]);
  fs.chmodSync(dumpFile, FILE_MODE);
  const files: BackupManifest["files"] = [];
  for (const rel of listFiles(opts.filesDir)) {
    const copied = await copyHashed(path.join(opts.filesDir, rel), path.join(out, "files", rel));
    files.push({ path: rel.split(path.sep).join("/"), ...copied });
  }
  const manifest: BackupManifest = {
    format: "echoline-backup",
    version: 1,
    created_at: new Date().toISOString(),
    database: { name: databaseName(opts.url), pg_dump: version },
    dump: { path: DUMP, ...(await sha256File(dumpFile)) },
    files,
  };
  // Written last: a folder without a manifest is an unfinished backup and restore refuses it.
  fs.writeFileSync(path.join(out, MANIFEST), `${JSON.stringify(manifest, null, 2)}\n`, { mode: FILE_MODE });
  return manifest;
}

/** Reads the manifest and checks every file it lists against its size and SHA-256; throws listing every problem. */
export async function verifyBackup(dir: string): Promise<BackupManifest> {
  const file = path.join(dir, MANIFEST);
  if (!fs.existsSync(file)) throw new BackupError(`${dir} has no ${MANIFEST}: not a finished Echoline backup.`);
  let parsed: BackupManifest;
  try {
    parsed = Manifest.parse(JSON.parse(fs.readFileSync(file, "utf8")));
  } catch (err) {
    throw new BackupError(
      `${file} is not a valid Echoline backup manifest: ${err instanceof Error ? err.message : err}`,
    );
  }
  const problems: string[] = [];
  const check = async (entry: z.infer<typeof Entry>, full: string) => {
    // A manifest could be edited to point outside the backup; never follow it there.
    if (path.isAbsolute(entry.path) || entry.path.split("/").includes("..")) {
      problems.push(`${entry.path}: not a path inside the backup`);
      return;
    }
    if (!fs.existsSync(full)) return void problems.push(`${entry.path}: missing`);
    const got = await sha256File(full);
    if (got.bytes !== entry.bytes) problems.push(`${entry.path}: ${got.bytes} bytes, the manifest says ${entry.bytes}`);
    else if (got.sha256 !== entry.sha256) problems.push(`${entry.path}: SHA-256 differs from the manifest`);
  };
  await check(parsed.dump, path.join(dir, parsed.dump.path));
  for (const f of parsed.files) await check(f, path.join(dir, "files", f.path));
  if (problems.length)
    throw new BackupError(
      `The backup in ${dir} does not match its manifest; nothing was restored.\n  ${problems.slice(0, 20).join("\n  ")}${problems.length > 20 ? `\n  … and ${problems.length - 20} more` : ""}`,
    );
  return parsed;
}

export type RestoreResult = { database: string; keptAs: string | null; filesWritten: number; filesKept: number };

export async function restore(opts: {
  dir: string;
  url: string;
  filesDir: string;
  /** Replace an existing database (it is kept, renamed); without it an existing database is refused. */
  replace?: boolean;
}): Promise<RestoreResult> {
  const dir = path.resolve(opts.dir);
  const manifest = await verifyBackup(dir);
  const target = databaseName(opts.url);
  const admin = new pg.Client({ connectionString: withDatabase(opts.url, "postgres") });
  await admin.connect();
  try {
    const exists = (await admin.query("select 1 from pg_database where datname = $1", [target])).rowCount === 1;
    if (exists && !opts.replace)
      throw new BackupError(
        `The database ${target} exists. Pass --replace to restore over it (it is kept as ${target}_before_restore_…), or restore into another with --url.`,
      );

    // Files first: adding content-addressed files never harms the running database.
    let filesWritten = 0;
    let filesKept = 0;
    const root = path.resolve(opts.filesDir);
    fs.mkdirSync(root, { recursive: true, mode: DIR_MODE });
    for (const f of manifest.files) {
      const dst = path.join(root, ...f.path.split("/"));
      if (fs.existsSync(dst) && (await sha256File(dst)).sha256 === f.sha256) {
        filesKept++;
        continue;
      }
      const copied = await copyHashed(path.join(dir, "files", ...f.path.split("/")), dst);
      if (copied.sha256 !== f.sha256) throw new BackupError(`${f.path} changed while it was restored; run again.`);
      filesWritten++;
    }

    const stamp = new Date().toISOString().replace(/[-:T]/g, "").slice(0, 14);
    const staging = `${target.slice(0, 30)}_restoring_${randomBytes(4).toString("hex")}`;
    await admin.query(`create database ${ident(staging)}`);
    try {
      run("pg_restore", [
        "--exit-on-error",
        "--single-transaction",
        "--no-password",
        `--dbname=${withDatabase(opts.url, staging)}`,
        path.join(dir, manifest.dump.path),
      ]);
    } catch (err) {
      await admin.query(`drop database if exists ${ident(staging)} with (force)`);
      throw err;
    }
    let keptAs: string | null = null;
    if (exists) {
      keptAs = `${target.slice(0, 40)}_before_restore_${stamp}`;
      // No new sessions, then end the open ones: a database in use cannot be renamed.
      await admin.query(`alter database ${ident(target)} allow_connections false`);
      await admin.query(
        "select pg_terminate_backend(pid) from pg_stat_activity where datname = $1 and pid <> pg_backend_pid()",
        [target],
      );
      await admin.query(`alter database ${ident(target)} rename to ${ident(keptAs)}`);
      await admin.query(`alter database ${ident(keptAs)} allow_connections true`);
    }
    await admin.query(`alter database ${ident(staging)} rename to ${ident(target)}`);
    return { database: target, keptAs, filesWritten, filesKept };
  } finally {
    await admin.end();
  }
}

function option(args: string[], name: string): string | undefined {
  const i = args.indexOf(name);
  if (i < 0) return undefined;
  const v = args[i + 1];
  if (!v || v.startsWith("--")) throw new BackupError(`${name} needs a value.`);
  return v;
}

async function main(argv: string[]): Promise<void> {
  const [cmd, ...args] = argv;
  if (cmd !== "backup" && cmd !== "restore")
    throw new BackupError(
      "usage: db/backup.ts backup|restore [BACKUP_DIR] [--out DIR] [--test [--database NAME] | --url URL] [--files DIR] [--replace]",
    );
  const explicitUrl = option(args, "--url");
  const cluster: ClusterName = args.includes("--test") ? "test" : "dev";
  const url = explicitUrl ?? databaseUrl(cluster, option(args, "--database") ?? "echoline");
  const filesDir = path.resolve(option(args, "--files") ?? storageDir());
  // The default target is the private cluster: start it for the run when it is stopped, and stop it again.
  const started = !explicitUrl && !status(cluster);
  if (started) up(cluster);
  try {
    if (cmd === "backup") {
      const out =
        option(args, "--out") ??
        path.join(DATA_DIR, "backups", `echoline-${new Date().toISOString().replace(/[-:]/g, "").replace(/\..*/, "")}`);
      const m = await backup({ url, filesDir, out });
      const bytes = m.files.reduce((s, f) => s + f.bytes, 0);
      console.log(
        `[backup] ${redact(url)} → ${out}\n[backup] database dump ${(m.dump.bytes / 1048576).toFixed(1)} MB, ${m.files.length} stored files (${(bytes / 1048576).toFixed(1)} MB), manifest with SHA-256 of each.` +
          (out.startsWith(DATA_DIR)
            ? "\n[backup] It is inside .data/: copy it to another disk to survive losing this one."
            : ""),
      );
    } else {
      const dir = args.find((a, i) => !a.startsWith("--") && !args[i - 1]?.match(/^--(url|database|files|out)$/));
      if (!dir) throw new BackupError("Name the backup folder: npm run db:restore -- .data/backups/echoline-…");
      const r = await restore({ dir, url, filesDir, replace: args.includes("--replace") });
      console.log(
        `[restore] ${dir} → database ${r.database} (${redact(url)}), ${r.filesWritten} files written, ${r.filesKept} already in place.` +
          (r.keptAs
            ? `\n[restore] The database it replaced is kept as ${r.keptAs}; drop it when you no longer need it.`
            : ""),
      );
    }
  } finally {
    if (started) down(cluster);
  }
}

if (import.meta.url === `file://${process.argv[1]}`) {
  main(process.argv.slice(2)).catch((err) => {
    console.error(err instanceof BackupError ? `[${process.argv[2] ?? "backup"}] ${err.message}` : err);
    process.exit(err instanceof BackupError ? 1 : 70);
  });
}
