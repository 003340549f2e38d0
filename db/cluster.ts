/**
 * A private PostgreSQL cluster inside the project's ignored `.data/` folder, on loopback only.
 * Idempotent: `up` creates the cluster on first run and starts it when it is not running; `down`
 * stops it. It never touches a system-wide cluster (its own data folder, port and socket folder).
 *
 *   node --import tsx db/cluster.ts up|down|status [--test]
 */
import { execFileSync, spawnSync } from "node:child_process";
import fs from "node:fs";
import path from "node:path";
import { clusterDatabaseUrl, env } from "@/lib/env";

export type ClusterName = "dev" | "test";

const ROOT = path.resolve(import.meta.dirname, "..");
export const DATA_DIR = path.join(ROOT, ".data");

export const CLUSTERS: Record<ClusterName, { port: number; dir: string }> = {
  dev: { port: env().ECHOLINE_PG_PORT, dir: path.join(DATA_DIR, "pg") },
  test: { port: env().ECHOLINE_TEST_PG_PORT, dir: path.join(DATA_DIR, "pg-test") },
};

/** The same URL the app and `npm run worker` derive (lib/env.ts), so they all meet in one database. */
export function databaseUrl(name: ClusterName, database: string): string {
  return clusterDatabaseUrl(name, database);
}

const isRoot = process.getuid?.() === 0;

export function findBinDir(): string | null {
  const base = "/usr/lib/postgresql";
  if (!fs.existsSync(base)) return null;
  const versions = fs
    .readdirSync(base)
    .filter((v) => fs.existsSync(path.join(base, v, "bin", "pg_ctl")))
    .sort((a, b) => Number(b) - Number(a));
  return versions.length ? path.join(base, versions[0], "bin") : null;
}

function ensureBinaries(): string {
  let bin = findBinDir();
  if (bin) return bin;
  if (!isRoot)
    throw new Error("PostgreSQL server binaries are missing; install Debian's 'postgresql' package (needs root).");
  console.log("[db] installing Debian's postgresql package …");
  execFileSync("apt-get", ["update", "-qq"], { stdio: "inherit" });
  execFileSync("apt-get", ["install", "-y", "-qq", "postgresql"], {
    stdio: "inherit",
    env: { ...process.env, DEBIAN_FRONTEND: "noninteractive" },
  });
  bin = findBinDir();
  if (!bin) throw new Error("PostgreSQL was installed but pg_ctl was not found under /usr/lib/postgresql.");
  return bin;
}

/** Run a server binary as the postgres user when we are root (initdb refuses to run as root). */
function runPg(bin: string, args: string[], opts: { allowFail?: boolean } = {}) {
  const cmd = isRoot ? "runuser" : bin;
  const full = isRoot ? ["-u", "postgres", "--", bin, ...args] : args;
  const r = spawnSync(cmd, full, { encoding: "utf8" });
  if (r.status !== 0 && !opts.allowFail) {
    throw new Error(`${path.basename(bin)} failed (${r.status}): ${r.stderr || r.stdout}`);
  }
  return r;
}

function ownToPostgres(p: string) {
  if (isRoot) execFileSync("chown", ["-R", "postgres:postgres", p]);
}

export function status(name: ClusterName): boolean {
  const bin = findBinDir();
  const { dir } = CLUSTERS[name];
  if (!bin || !fs.existsSync(path.join(dir, "PG_VERSION"))) return false;
  return runPg(path.join(bin, "pg_ctl"), ["-D", dir, "status"], { allowFail: true }).status === 0;
}

export function up(name: ClusterName): void {
  const bin = ensureBinaries();
  const { dir, port } = CLUSTERS[name];
  const socketDir = path.join(DATA_DIR, `sock-${name}`);
  fs.mkdirSync(DATA_DIR, { recursive: true });
  fs.mkdirSync(socketDir, { recursive: true });
  ownToPostgres(socketDir);
  if (!fs.existsSync(path.join(dir, "PG_VERSION"))) {
    console.log(`[db] creating the ${name} cluster in ${path.relative(ROOT, dir)} …`);
    fs.mkdirSync(dir, { recursive: true });
    ownToPostgres(dir);
    runPg(path.join(bin, "initdb"), ["-D", dir, "--auth=trust", "-U", "postgres", "-E", "UTF8", "--locale=C.UTF-8"]);
  }
  if (status(name)) return;
  // A crashed run can leave a stale pid file; pg_ctl handles it, but the log helps when it does not.
  const log = path.join(DATA_DIR, `pg-${name}.log`);
  if (!fs.existsSync(log)) fs.writeFileSync(log, "");
  ownToPostgres(log);
  const started = runPg(
    path.join(bin, "pg_ctl"),
    [
      "-D",
      dir,
      "-l",
      log,
      "-w",
      "-t",
      "60",
      "-o",
      `-c listen_addresses=127.0.0.1 -p ${port} -k ${socketDir} -c max_connections=200 -c shared_buffers=256MB -c fsync=${name === "test" ? "off" : "on"}`,
      "start",
    ],
    { allowFail: true },
  );
  if (started.status !== 0) {
    // Say why (the server's own log), e.g. the port is taken by another checkout's cluster.
    const tail = fs.readFileSync(log, "utf8").trim().split("\n").slice(-4).join("\n");
    const hint = /Address already in use/.test(tail)
      ? `\nPort ${port} is taken, probably by another checkout's ${name} cluster: stop it there (npm run db:down${name === "test" ? " -- --test" : ""}) or set ${name === "test" ? "ECHOLINE_TEST_PG_PORT" : "ECHOLINE_PG_PORT"}.`
      : "";
    throw new Error(`PostgreSQL (${name}) did not start:\n${tail}${hint}`);
  }
  console.log(`[db] ${name} cluster running on 127.0.0.1:${port}`);
}

export function down(name: ClusterName): void {
  const bin = findBinDir();
  if (!bin || !status(name)) return;
  runPg(path.join(bin, "pg_ctl"), ["-D", CLUSTERS[name].dir, "-m", "fast", "-w", "stop"]);
  console.log(`[db] ${name} cluster stopped`);
}

/** Create a database when it is missing (CREATE DATABASE has no IF NOT EXISTS). */
export async function ensureDatabase(name: ClusterName, database: string, template?: string): Promise<void> {
  const pg = (await import("pg")).default;
  const client = new pg.Client({ connectionString: databaseUrl(name, "postgres") });
  await client.connect();
  try {
    const r = await client.query("select 1 from pg_database where datname = $1", [database]);
    if (r.rowCount === 0) {
      await client.query(`create database "${database}"${template ? ` template "${template}"` : ""}`);
    }
  } finally {
    await client.end();
  }
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const cmd = process.argv[2];
  const name: ClusterName = process.argv.includes("--test") ? "test" : "dev";
  if (cmd === "up") {
    up(name);
    await ensureDatabase(name, name === "dev" ? "echoline" : "postgres");
  } else if (cmd === "down") down(name);
  else if (cmd === "status") console.log(status(name) ? "running" : "stopped");
  else {
    console.error("usage: db/cluster.ts up|down|status [--test]");
    process.exit(64);
  }
}
