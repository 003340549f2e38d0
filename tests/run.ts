/**
 * `npm test`: every set-up step the tests need, then every test. On a fresh Debian machine it
 * installs Chromium and poppler-utils (pdftotext) when missing, checks formatting, types and the
 * layer rules (prettier, tsc, eslint: the first failure stops the run), starts the private test
 * cluster, builds the app, runs vitest (unit, integration, browser), and stops the cluster again.
 * ECHOLINE_SKIP_CHECKS=1 skips the three checks while iterating on one suite.
 */
import { execFileSync, spawn } from "node:child_process";
import fs from "node:fs";
import { up, down } from "@/db/cluster";
import { prepareTemplate } from "./setup/db-global";
import { runBuild } from "@/workers/stack";

const t0 = Date.now();
const step = (s: string) => console.log(`[test] ${s} (${((Date.now() - t0) / 1000).toFixed(0)} s)`);

function ensureDebianPackages() {
  const missing: string[] = [];
  if (!fs.existsSync("/usr/bin/chromium")) missing.push("chromium");
  if (!fs.existsSync("/usr/bin/pdftotext")) missing.push("poppler-utils");
  if (!missing.length) return;
  if (process.getuid?.() !== 0)
    throw new Error(`Missing Debian packages: ${missing.join(", ")}. Install them with apt-get (needs root).`);
  step(`installing ${missing.join(", ")}`);
  const env = { ...process.env, DEBIAN_FRONTEND: "noninteractive" };
  execFileSync("apt-get", ["update", "-qq"], { stdio: "inherit", env });
  execFileSync("apt-get", ["install", "-y", "-qq", ...missing], { stdio: "inherit", env });
}

/** The static checks, cheapest first. Each failure stops the run and says what to run to fix it. */
const CHECKS: { name: string; cmd: string; args: string[]; fix: string }[] = [
  {
    name: "formatting (prettier --check .)",
    cmd: "node_modules/.bin/prettier",
    args: ["--check", "--log-level", "warn", "."],
    fix: "npx prettier --write <the files listed above>",
  },
  { name: "types (tsc --noEmit)", cmd: "node_modules/.bin/tsc", args: ["--noEmit"], fix: "fix the type errors above" },
  {
    name: "lint and layer rules (eslint .)",
    cmd: "node_modules/.bin/eslint",
    args: [".", "--cache", "--cache-location", "node_modules/.cache/eslint/"],
    fix: "fix the errors above; the layer rules are explained in DEVELOPERS.md",
  },
];

function runChecks(): boolean {
  for (const c of CHECKS) {
    step(`checking ${c.name}`);
    try {
      execFileSync(c.cmd, c.args, { stdio: "inherit" });
    } catch {
      console.error(`[test] FAILED: ${c.name}. Nothing else was run. To fix: ${c.fix}.`);
      return false;
    }
  }
  return true;
}

let code = 1;
try {
  ensureDebianPackages();
  if (process.env.ECHOLINE_SKIP_CHECKS !== "1" && !runChecks()) process.exit(1);
  step("starting the test cluster");
  up("test");
  await prepareTemplate();
  if (process.env.ECHOLINE_SKIP_BUILD !== "1") {
    step("building the app");
    await runBuild();
  }
  step("running vitest");
  code = await new Promise<number>((resolve) => {
    const args = ["run", ...process.argv.slice(2)];
    const p = spawn("node_modules/.bin/vitest", args, {
      stdio: "inherit",
      env: { ...process.env, ECHOLINE_TEMPLATE_READY: "1" },
    });
    p.on("exit", (c) => resolve(c ?? 1));
  });
} catch (err) {
  console.error("[test] set-up failed:", err instanceof Error ? err.message : err);
  code = 1;
} finally {
  down("test");
  step(`done, exit ${code}`);
}
process.exit(code);
