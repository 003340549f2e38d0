/**
 * `npm run bench:mine`: pages per second for (a) Debian's pdftotext alone, (b) text extraction
 * inside Echoline (the miner's PDF reading), (c) the whole pipeline through the queue to rows in
 * PostgreSQL with one and with two worker processes; plus each worker's peak memory (VmHWM) and the
 * peak on one 300-page PDF. Runs on the private test cluster, in databases of its own.
 * Targets (issue 3): (c, two workers) >= 35% of (a); miner's own work after text extraction < 20%
 * of the total; peak worker memory < 400 MB on the 300-page PDF.
 *
 * Real PDFs (the openly licensed documents of tests/fixtures/real-pdfs, installed by its install.sh,
 * or any folder of PDFs named by BENCH_REAL_PDFS): (r1) pdftotext as one process per file, (r2) the
 * mining CLI as one whole process per file (`node lib/mining/mine.mjs FILE`, the bundle of `npm run
 * build:miner`), (r3) the worker pipeline with one worker. Target: (r2) >= 25% of (r1)'s pages/s.
 * BENCH_REAL_ONLY=1 measures the real PDFs alone.
 */
import { spawn, execFileSync, type ChildProcess } from "node:child_process";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { up } from "@/db/cluster";
import { prepareTemplate } from "@/tests/setup/db-global";
import { createTestDatabase } from "@/tests/helpers/db";
import { folderStorage } from "@/lib/storage";
import { ingest } from "../helpers/ingest";
import { installQueues } from "@/lib/jobs/registry";
import { seedProcedures } from "@/lib/corpus/procedures-store";
import { createMiner } from "@/lib/mining";
import { generateCorpus } from "@/lib/demo/corpus";
import { renderArticlePdf } from "@/lib/demo/render";

const COUNT = Number(process.env.BENCH_COUNT ?? 200);
const PAGES_PER = Number(process.env.BENCH_PAGES_PER ?? 5);
const ROOT = path.resolve(import.meta.dirname, "../..");
const work = fs.mkdtempSync(path.join(os.tmpdir(), "echoline-bench-"));

function pagesOf(file: string): number {
  const info = execFileSync("pdfinfo", [file], { encoding: "utf8" });
  return Number(/^Pages:\s+(\d+)/m.exec(info)?.[1] ?? 0);
}

async function generate(): Promise<{ files: string[]; pages: number }> {
  const corpus = generateCorpus({ count: COUNT, pagesPerArticle: PAGES_PER });
  const files: string[] = [];
  let pages = 0;
  for (const a of corpus.articles.slice(0, COUNT)) {
    const f = path.join(work, `${a.id}.pdf`);
    fs.writeFileSync(f, await renderArticlePdf(a));
    files.push(f);
    pages += pagesOf(f);
  }
  return { files, pages };
}

async function bigPdf(): Promise<string> {
  // One article long enough for ~300 pages: the demo generator's long discussion text.
  const corpus = generateCorpus({ count: 1, pagesPerArticle: 300, seed: 7 });
  const f = path.join(work, "long.pdf");
  fs.writeFileSync(f, await renderArticlePdf(corpus.articles[0], { columns: 1 }));
  return f;
}

function pdftotextRate(files: string[], pages: number) {
  const t = performance.now();
  for (const f of files) execFileSync("pdftotext", ["-q", f, "-"], { maxBuffer: 64 * 1024 * 1024 });
  const s = (performance.now() - t) / 1000;
  return { seconds: s, pagesPerSecond: pages / s };
}

async function inProcess(files: string[], pages: number) {
  const miner = createMiner();
  // The first document loads pdf.js (~0.5–1 s); the workers of (c) are warm too, so (b) starts warm.
  await miner.mine({ data: new Uint8Array(fs.readFileSync(files[0])), filename: "warm-up.pdf" });
  let readMs = 0;
  let mineMs = 0;
  const t = performance.now();
  for (const f of files) {
    const r = await miner.mine({ data: new Uint8Array(fs.readFileSync(f)), filename: path.basename(f) });
    if ("error" in r.line) throw new Error(`${f}: ${r.line.error.message}`);
    readMs += r.timings.readMs;
    mineMs += r.timings.mineMs;
  }
  await miner.close();
  return { seconds: (performance.now() - t) / 1000, readPagesPerSecond: pages / (readMs / 1000), readMs, mineMs };
}

type Worker = {
  child: ChildProcess;
  pid: number;
  timings: { readMs: number; mineMs: number; storeMs: number }[];
  hwmKb: () => number;
  rssKb: () => number;
};

function startWorker(url: string, filesDir: string): Promise<Worker> {
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, ["--import", "tsx", "workers/index.ts"], {
      cwd: ROOT,
      env: {
        ...process.env,
        DATABASE_URL: url,
        ECHOLINE_FILES_DIR: filesDir,
        ECHOLINE_WORKER_TIMINGS: "1",
        ECHOLINE_WORKER_QUEUES: process.env.BENCH_QUEUES ?? "mine-article",
      },
      stdio: ["ignore", "pipe", "pipe"],
    });
    const w: Worker = {
      child,
      pid: child.pid!,
      timings: [],
      hwmKb: () => Number(/VmHWM:\s+(\d+)/.exec(fs.readFileSync(`/proc/${child.pid}/status`, "utf8"))?.[1] ?? 0),
      rssKb: () => Number(/VmRSS:\s+(\d+)/.exec(fs.readFileSync(`/proc/${child.pid}/status`, "utf8"))?.[1] ?? 0),
    };
    let buf = "";
    child.stdout!.on("data", (d: Buffer) => {
      buf += d.toString();
      let i: number;
      while ((i = buf.indexOf("\n")) >= 0) {
        const line = buf.slice(0, i);
        buf = buf.slice(i + 1);
        if (line.startsWith("[worker] ready")) resolve(w);
        if (line.startsWith("[timing] ")) {
          w.timings.push(JSON.parse(line.slice(9)));
          if (process.env.BENCH_VERBOSE) console.log(line);
        }
      }
    });
    child.stderr!.on("data", (d: Buffer) => {
      const s = d.toString();
      if (!/engine|ExperimentalWarning/i.test(s)) process.stderr.write(`[worker ${child.pid}] ${s}`);
    });
    child.on("exit", (code) => reject(new Error(`worker exited early (${code})`)));
  });
}

async function stopWorker(w: Worker) {
  await new Promise<void>((res) => {
    w.child.removeAllListeners("exit");
    w.child.once("exit", () => res());
    w.child.kill("SIGTERM");
  });
}

async function pipeline(files: string[], pages: number, workers: number) {
  const t = await createTestDatabase();
  await seedProcedures(t.db);
  const filesDir = path.join(work, `files-${workers}-${Date.now()}`);
  const storage = folderStorage(filesDir);
  await installQueues(t.db);
  const ws = await Promise.all(Array.from({ length: workers }, () => startWorker(t.url, filesDir)));
  // A ready worker that has mined nothing yet: the idle baseline (tsx, pg-boss, Kysely, the miner's modules).
  const idleMb = Math.max(...ws.map((w) => w.rssKb())) / 1024;
  const start = performance.now();
  for (const f of files)
    await ingest(t.db, storage, {
      data: new Uint8Array(fs.readFileSync(f)),
      filename: path.basename(f),
      uploadedBy: null,
    });
  const ingestSeconds = (performance.now() - start) / 1000;
  let done = 0;
  let failed = 0;
  for (;;) {
    const rows = await t.db.selectFrom("articles").select(["status"]).execute();
    done = rows.filter((r) => r.status === "done").length;
    failed = rows.filter((r) => r.status === "failed").length;
    if (done + failed === files.length) break;
    await new Promise((r) => setTimeout(r, 100));
  }
  const seconds = (performance.now() - start) / 1000;
  const hwm = ws.map((w) => w.hwmKb());
  const timings = ws.flatMap((w) => w.timings);
  await Promise.all(ws.map(stopWorker));
  const stmts = Number(
    (
      await t.db
        .selectFrom("statements")
        .select((eb) => eb.fn.countAll<number>().as("n"))
        .executeTakeFirstOrThrow()
    ).n,
  );
  await t.drop();
  const sum = (k: "readMs" | "mineMs" | "storeMs") => timings.reduce((s, x) => s + x[k], 0);
  if (process.env.BENCH_VERBOSE)
    console.log(`[bench] ${workers} worker(s): ingest ${ingestSeconds.toFixed(1)} s, total ${seconds.toFixed(1)} s`);
  return {
    workers,
    seconds,
    pagesPerSecond: pages / seconds,
    done,
    failed,
    statements: stmts,
    peakMb: Math.max(...hwm) / 1024,
    idleMb,
    readMs: sum("readMs"),
    mineMs: sum("mineMs"),
    storeMs: sum("storeMs"),
  };
}

/** The real PDFs: BENCH_REAL_PDFS (a folder), else the manifest's files after its install.sh has run. */
function realPdfs(): string[] {
  const walk = (d: string): string[] =>
    fs.readdirSync(d, { withFileTypes: true }).flatMap((e) => {
      const p = path.join(d, e.name);
      return e.isDirectory() ? walk(p) : e.name.toLowerCase().endsWith(".pdf") ? [p] : [];
    });
  if (process.env.BENCH_REAL_PDFS) return walk(process.env.BENCH_REAL_PDFS).sort();
  const dir = path.join(ROOT, "tests/fixtures/real-pdfs");
  const manifest = path.join(dir, "manifest.json");
  if (!fs.existsSync(manifest)) return [];
  if (fs.existsSync(path.join(dir, "install.sh")))
    execFileSync("bash", [path.join(dir, "install.sh")], { stdio: "inherit" });
  // Every string of the manifest that names an existing PDF file.
  const found = new Set<string>();
  const visit = (v: unknown): void => {
    if (typeof v === "string" && /\.pdf$/i.test(v)) {
      for (const p of [v, path.join(dir, v), path.join(ROOT, v)]) if (fs.existsSync(p)) found.add(path.resolve(p));
    } else if (Array.isArray(v)) v.forEach(visit);
    else if (v && typeof v === "object") Object.values(v).forEach(visit);
  };
  visit(JSON.parse(fs.readFileSync(manifest, "utf8")));
  return [...found].sort();
}

function wholeProcessRates(files: string[], pages: number) {
  execFileSync(process.execPath, [path.join(ROOT, "lib/mining/build.mjs")], { cwd: ROOT });
  const t0 = performance.now();
  for (const f of files) execFileSync("pdftotext", ["-q", f, "-"], { maxBuffer: 256 * 1024 * 1024 });
  const pdftotextS = (performance.now() - t0) / 1000;
  const t1 = performance.now();
  for (const f of files) {
    // exit 2 (a file that cannot be mined) still prints its line; only the time is measured here
    try {
      execFileSync(process.execPath, [path.join(ROOT, "lib/mining/mine.mjs"), f], {
        cwd: ROOT,
        maxBuffer: 256 * 1024 * 1024,
        stdio: ["ignore", "ignore", "ignore"],
      });
    } catch {
      /* counted in the time all the same */
    }
  }
  const cliS = (performance.now() - t1) / 1000;
  return { pdftotext: pages / pdftotextS, cli: pages / cliS, pdftotextS, cliS };
}

async function realSection() {
  const files = realPdfs();
  if (!files.length) {
    console.log("\n[bench] no real PDFs (set BENCH_REAL_PDFS or add tests/fixtures/real-pdfs/manifest.json)");
    return;
  }
  const pages = files.reduce((n, f) => n + pagesOf(f), 0);
  console.log(`\n[bench] real PDFs: ${files.length} files, ${pages} pages`);
  const r = wholeProcessRates(files, pages);
  const w = await pipeline(files, pages, 1);
  const pct = (x: number) => `${(100 * x).toFixed(0)}%`;
  console.log("\n| real PDFs | pages/s | share of pdftotext | notes |");
  console.log("|---|---:|---:|---|");
  console.log(
    `| (r1) pdftotext, one process per file | ${r.pdftotext.toFixed(1)} | 100% | ${r.pdftotextS.toFixed(1)} s |`,
  );
  console.log(
    `| (r2) mining CLI, one whole process per file | ${r.cli.toFixed(1)} | ${pct(r.cli / r.pdftotext)} | ${r.cliS.toFixed(1)} s; target >= 25%: ${r.cli / r.pdftotext >= 0.25 ? "met" : "NOT met"} |`,
  );
  console.log(
    `| (r3) worker pipeline, 1 worker | ${w.pagesPerSecond.toFixed(1)} | ${pct(w.pagesPerSecond / r.pdftotext)} | ${w.done} done, ${w.failed} failed, ${w.statements} statements; extraction ${(w.readMs / 1000).toFixed(1)} s, mining ${(w.mineMs / 1000).toFixed(1)} s, store ${(w.storeMs / 1000).toFixed(1)} s; peak RSS ${w.peakMb.toFixed(0)} MB (< 400 MB: ${w.peakMb < 400 ? "met" : "NOT met"}) |`,
  );
}

up("test");
await prepareTemplate();
if (process.env.BENCH_REAL_ONLY) {
  await realSection();
  fs.rmSync(work, { recursive: true, force: true });
  process.exit(0);
}
console.log(
  `[bench] generating ${COUNT} PDFs (~${PAGES_PER} pages each) with lib/demo … (load average ${os
    .loadavg()
    .map((x) => x.toFixed(2))
    .join(", ")})`,
);
const { files, pages } = await generate();
console.log(`[bench] ${files.length} PDFs, ${pages} pages`);
const a = pdftotextRate(files, pages);
const b = await inProcess(files, pages);
const c1 = await pipeline(files, pages, 1);
const c2 = await pipeline(files, pages, 2);
const long = await bigPdf();
const longPages = pagesOf(long);
const big = await pipeline([long], longPages, 1);

const pct = (x: number) => `${(100 * x).toFixed(0)}%`;
const minerShare = (r: { readMs: number; mineMs: number; storeMs: number }) =>
  r.mineMs / (r.readMs + r.mineMs + r.storeMs);
console.log("\n| measurement | pages/s | notes |");
console.log("|---|---:|---|");
console.log(
  `| (a) pdftotext alone, one process | ${a.pagesPerSecond.toFixed(1)} | ${pages} pages in ${a.seconds.toFixed(1)} s |`,
);
console.log(
  `| (b) text extraction inside Echoline | ${b.readPagesPerSecond.toFixed(1)} | read ${(b.readMs / 1000).toFixed(1)} s, mining after extraction ${(b.mineMs / 1000).toFixed(1)} s (${pct(b.mineMs / (b.readMs + b.mineMs))}) |`,
);
for (const c of [c1, c2]) {
  console.log(
    `| (c) whole pipeline, ${c.workers} worker(s) | ${c.pagesPerSecond.toFixed(1)} | ${pct(c.pagesPerSecond / a.pagesPerSecond)} of pdftotext; ${c.done} done, ${c.failed} failed, ${c.statements} statements; miner after extraction ${pct(minerShare(c))} of worker time (${pct(c.mineMs / (c.readMs + c.mineMs))} of extraction + mining); peak RSS ${c.peakMb.toFixed(0)} MB, idle ${c.idleMb.toFixed(0)} MB |`,
  );
}
console.log(
  `| 300-page PDF, 1 worker | ${big.pagesPerSecond.toFixed(1)} | ${longPages} pages, ${big.done ? "done" : "FAILED"}; extraction ${(big.readMs / 1000).toFixed(1)} s, mining after extraction ${(big.mineMs / 1000).toFixed(1)} s, store ${(big.storeMs / 1000).toFixed(1)} s; peak worker RSS ${big.peakMb.toFixed(0)} MB (idle worker ${big.idleMb.toFixed(0)} MB) |`,
);
console.log(
  `\nLoad average while measuring (1, 5, 15 min) at the end: ${os
    .loadavg()
    .map((x) => x.toFixed(2))
    .join(", ")} on ${os.cpus().length} cores.`,
);
console.log(
  `\nTargets: two workers >= 35% of pdftotext: ${c2.pagesPerSecond / a.pagesPerSecond >= 0.35 ? "met" : "NOT met"}; miner after extraction < 20%: ${minerShare(c2) < 0.2 ? "met" : "NOT met"}; peak < 400 MB on the 300-page PDF: ${big.peakMb < 400 ? "met" : "NOT met"}.`,
);
await realSection();
fs.rmSync(work, { recursive: true, force: true });
process.exit(0);
