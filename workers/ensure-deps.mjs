// Installs the packages when node_modules is missing or older than the lock file, using only
// Node's own modules (tsx and everything else may not be installed yet).
import { existsSync, statSync } from "node:fs";
import { execSync } from "node:child_process";
import path from "node:path";

const root = path.resolve(import.meta.dirname, "..");
const marker = path.join(root, "node_modules", ".package-lock.json");
const lock = path.join(root, "package-lock.json");
if (!existsSync(marker) || statSync(marker).mtimeMs < statSync(lock).mtimeMs) {
  console.log("[setup] installing packages (npm ci) …");
  execSync("npm ci --no-audit --no-fund", { cwd: root, stdio: "inherit" });
}
