// `npm run build:miner`: bundles the mining CLI (lib/mining/cli.ts and what it imports from the
// project) into one ES module, .build/miner/cli.mjs, so that `npm run mine` starts without
// transpiling TypeScript on every run (tsx took most of a whole CLI run's time on small files).
// Packages under node_modules stay outside the bundle and load as usual (pdf-parse only when a PDF
// arrives). esbuild is the one tsx already depends on, so nothing new is installed.
import { createRequire } from "node:module";
import path from "node:path";

const root = path.resolve(import.meta.dirname, "../..");
const require = createRequire(import.meta.url);

function esbuildPath() {
  try {
    return require.resolve("esbuild");
  } catch {
    return createRequire(require.resolve("tsx")).resolve("esbuild");
  }
}

const { build } = await import(esbuildPath());
await build({
  entryPoints: [path.join(root, "lib/mining/cli.ts")],
  outfile: path.join(root, ".build/miner/cli.mjs"),
  bundle: true,
  platform: "node",
  format: "esm",
  target: "node20",
  minify: true,
  sourcemap: "linked",
  // pdf-parse (with pdf.js) stays outside: it is loaded lazily, only when a PDF arrives, and finds its
  // worker file next to itself. Everything else is bundled, so start-up resolves and parses one file.
  external: ["pdf-parse", "pdfjs-dist"],
  tsconfig: path.join(root, "tsconfig.json"),
  logLevel: "warning",
  banner: { js: "// Built by lib/mining/build.mjs from lib/mining/*.ts; do not edit." },
});
