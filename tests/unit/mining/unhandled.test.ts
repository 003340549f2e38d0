// Damaged PDFs must not leave a pdf.js promise rejecting with no handler (Node would report an
// "unhandledRejection" and, with --unhandled-rejections=throw, the default since Node 15, end the
// worker process). Many byte-flipped copies of a good PDF are mined, with the normal time limit and
// with limits so short that documents are abandoned mid-read (the path that destroys a document
// while pdf.js still has requests open), under a spy on process "unhandledRejection".
import { readFileSync } from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ContractLine, createMiner, isErrorLine } from "@/lib/mining/index";
import { ensureGoldPdfs, generatedDir } from "@/tests/fixtures/make-gold-pdfs";

const seen: unknown[] = [];
const spy = (reason: unknown) => void seen.push(reason);
let sources: Uint8Array[] = [];

beforeAll(async () => {
  await ensureGoldPdfs();
  sources = ["12-app-usability.pdf", "15-hospital-ehr.pdf", "03-teacher-efficacy-interleaved.pdf"].map(
    (f) => new Uint8Array(readFileSync(path.join(generatedDir, f))),
  );
  process.on("unhandledRejection", spy);
});
afterAll(() => {
  process.off("unhandledRejection", spy);
});

// A small linear congruential generator (the constants of ANSI C's rand, from memory) so every run
// flips the same bytes.
function flipper(seed: number) {
  let s = seed;
  const next = () => (s = (s * 1103515245 + 12345) % 2147483648) / 2147483648;
  return (src: Uint8Array) => {
    const b = new Uint8Array(src);
    const flips = 1 + Math.floor(next() * 40);
    for (let k = 0; k < flips; k++) b[Math.floor(next() * b.length)] ^= 1 << Math.floor(next() * 8);
    return b;
  };
}

const settle = () => new Promise((r) => setTimeout(r, 200));

describe("no unhandled promise rejection from pdf.js", () => {
  it.each([
    { timeoutMs: 20_000, count: 120, seed: 1 },
    { timeoutMs: 1, count: 60, seed: 2 },
    { timeoutMs: 5, count: 60, seed: 3 },
  ])("flipped-byte PDFs, time limit $timeoutMs ms", async ({ timeoutMs, count, seed }) => {
    const miner = createMiner({ timeoutMs });
    const flip = flipper(seed);
    const codes = new Map<string, number>();
    for (let i = 0; i < count; i++) {
      const out = await miner.mine({ data: flip(sources[i % sources.length]), filename: `flipped-${i}.pdf` });
      expect(ContractLine.safeParse(out.line).success).toBe(true);
      const code = isErrorLine(out.line) ? out.line.error.code : "ok";
      codes.set(code, (codes.get(code) ?? 0) + 1);
    }
    await miner.close();
    // Rejections surface after the microtask queue drains; give abandoned pdf.js work time to finish.
    await settle();
    expect(seen).toEqual([]);
    // The run must really have exercised damage (and, with the short limits, abandonment).
    expect(codes.get("corrupt") ?? 0).toBeGreaterThan(0);
    if (timeoutMs < 10) expect(codes.get("timeout") ?? 0).toBeGreaterThan(count / 5);
  });
});
