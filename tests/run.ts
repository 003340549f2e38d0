/**
 * `npm test`: every set-up step the tests need, then every test. On a fresh Debian machine it
 * installs Chromium and poppler-utils (pdftotext) when missing, starts the private test cluster,
 * builds the app, runs vitest (unit, integration, browser), and stops the cluster again.
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

let code = 1;
try {
  ensureDebianPackages();
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
