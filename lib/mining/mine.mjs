// Entry of `npm run mine`: runs the prebuilt CLI bundle (.build/miner/cli.mjs, from `npm run
// build:miner`) when it is there and newer than every source it was built from; otherwise the
// TypeScript sources through tsx, as before, so a fresh checkout or an edited source still mines
// correctly (only slower to start).
import { readdirSync, statSync } from "node:fs";
import path from "node:path";
import { pathToFileURL } from "node:url";

const root = path.resolve(import.meta.dirname, "../..");
const bundle = path.join(root, ".build/miner/cli.mjs");

function newestSource() {
  let newest = 0;
  const dirs = [path.join(root, "lib/mining")];
  const files = [path.join(root, "lib/vocabulary.ts"), path.join(root, "package-lock.json")];
  for (const d of dirs) for (const f of readdirSync(d)) if (/\.(ts|mjs)$/.test(f)) files.push(path.join(d, f));
  for (const f of files) {
    try {
      newest = Math.max(newest, statSync(f).mtimeMs);
    } catch {
      // a source that is not there cannot be newer
    }
  }
  return newest;
}

function bundleIsFresh() {
  try {
    return statSync(bundle).mtimeMs >= newestSource();
  } catch {
    return false;
  }
}

if (bundleIsFresh()) {
  await import(pathToFileURL(bundle).href);
} else {
  const { register } = await import("tsx/esm/api");
  register();
  await import(pathToFileURL(path.join(root, "lib/mining/cli.ts")).href);
}
