// The miner in a worker thread (lib/mining/isolated.ts): same lines as in-process, and a runaway
// document ends as an error line instead of taking the process down. The hang and the memory hog are
// simulated by file names the thread honours only with ECHOLINE_TEST_HOOKS=1.
import { readFileSync } from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createMiner, isErrorLine } from "@/lib/mining/index";
import { createIsolatedMiner, TEST_HANG_FILENAME, TEST_OOM_FILENAME } from "@/lib/mining/isolated";
import { ensureGoldPdfs, generatedDir } from "@/tests/fixtures/make-gold-pdfs";

const file = path.join(generatedDir, "15-hospital-ehr.pdf");
const read = () => new Uint8Array(readFileSync(file));

describe("createIsolatedMiner", () => {
  const previous = process.env.ECHOLINE_TEST_HOOKS;
  // Env is copied into a thread when it starts, so the hooks are switched on before the miner exists.
  process.env.ECHOLINE_TEST_HOOKS = "1";
  const miner = createIsolatedMiner({ hardTimeoutMs: 3000, memoryLimitMb: 300 });

  beforeAll(() => ensureGoldPdfs());
  afterAll(async () => {
    await miner.close();
    if (previous === undefined) delete process.env.ECHOLINE_TEST_HOOKS;
    else process.env.ECHOLINE_TEST_HOOKS = previous;
  });

  it("gives the same contract line as the in-process miner and takes the buffer over", async () => {
    const data = read();
    const isolated = await miner.mine({ data, filename: "ehr.pdf" });
    // transferred, not copied
    expect(data.byteLength).toBe(0);
    const inProcess = await createMiner().mine({ data: read(), filename: "ehr.pdf" });
    expect(isErrorLine(isolated.line)).toBe(false);
    expect(isolated.line).toEqual(inProcess.line);
    expect(isolated.meta).toEqual(inProcess.meta);
  });

  it("stops a document stuck in a tight loop at the hard limit, and the next document still mines", async () => {
    const t0 = performance.now();
    const hung = await miner.mine({ data: new Uint8Array(8), filename: TEST_HANG_FILENAME });
    const took = performance.now() - t0;
    expect(hung.line).toMatchObject({ file: TEST_HANG_FILENAME, error: { code: "timeout" } });
    if (!isErrorLine(hung.line)) throw new Error("expected an error line");
    expect(hung.line.error.message).toMatch(/longer than 3 s/);
    expect(took).toBeGreaterThanOrEqual(2900);
    // the limit plus slack for a busy machine; without the thread this call would never return
    expect(took).toBeLessThan(8000);
    const next = await miner.mine({ data: read(), filename: "after-hang.pdf" });
    expect(isErrorLine(next.line)).toBe(false);
  });

  it("turns a memory breach into an error line, and the next document still mines", async () => {
    // Its own miner with a generous time limit: on a busy machine filling 300 MB took longer than the
    // 3 s limit above, and the hog ended as a timeout instead of a memory breach.
    const roomy = createIsolatedMiner({ hardTimeoutMs: 60_000, memoryLimitMb: 300 });
    const hog = await roomy.mine({ data: new Uint8Array(8), filename: TEST_OOM_FILENAME }).finally(() => roomy.close());
    expect(hog.line).toMatchObject({ error: { code: "too_large" } });
    if (!isErrorLine(hog.line)) throw new Error("expected an error line");
    expect(hog.line.error.message).toMatch(/more than 300 MB of memory/);
    const next = await miner.mine({ data: read(), filename: "after-oom.pdf" });
    expect(isErrorLine(next.line)).toBe(false);
  });

  it("mines documents one after another when called concurrently", async () => {
    const outs = await Promise.all([1, 2, 3].map((n) => miner.mine({ data: read(), filename: `c${n}.pdf` })));
    expect(outs.map((o) => o.line.file)).toEqual(["c1.pdf", "c2.pdf", "c3.pdf"]);
    expect(outs.every((o) => !isErrorLine(o.line))).toBe(true);
  });

  it("close() ends the thread; later calls get an error line", async () => {
    const own = createIsolatedMiner();
    expect(isErrorLine((await own.mine({ data: read(), filename: "x.pdf" })).line)).toBe(false);
    await own.close();
    const after = await own.mine({ data: read(), filename: "x.pdf" });
    expect(after.line).toMatchObject({ error: { code: "internal" } });
  });
});
