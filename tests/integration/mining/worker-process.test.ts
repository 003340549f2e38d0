/**
 * The worker as a process (`node --import tsx workers/index.ts`, what `npm run worker` runs) against
 * this suite's own database: a worker killed in the middle of a job, a document that never finishes,
 * and SIGTERM while a document is being mined. Waits poll the database with a deadline; nothing
 * sleeps a fixed time.
 */
import { spawn, type ChildProcess } from "node:child_process";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestDatabase } from "@/tests/helpers/db";
import { folderStorage } from "@/lib/storage";
import { ingest } from "../../helpers/ingest";
import { seedProcedures } from "@/lib/corpus/procedures-store";
import { TEST_HANG_FILENAME } from "@/lib/mining/isolated";
import type { RetryPreset } from "@/lib/jobs/presets";
import { rowCounts, waitForArticles } from "./harness";
import { pdfOf } from "./fixtures";
import type { DB } from "@/db";

const root = path.resolve(import.meta.dirname, "../../..");
let t: Awaited<ReturnType<typeof createTestDatabase>>;
let filesDir: string;
const children = new Set<ChildProcess>();

beforeAll(async () => {
  t = await createTestDatabase();
  await seedProcedures(t.db);
  filesDir = fs.mkdtempSync(path.join(os.tmpdir(), "echoline-worker-test-"));
});
afterAll(async () => {
  for (const c of children) if (c.exitCode === null && c.signalCode === null) c.kill("SIGKILL");
  await t?.drop();
  fs.rmSync(filesDir, { recursive: true, force: true });
});

type Worker = {
  child: ChildProcess;
  output: () => string;
  exited: Promise<{ code: number | null; signal: NodeJS.Signals | null }>;
};

/** Starts a worker process and resolves once it says it is ready. */
async function startWorker(env: Record<string, string>): Promise<Worker> {
  const child = spawn(process.execPath, ["--import", "tsx", "workers/index.ts"], {
    cwd: root,
    env: {
      ...process.env,
      DATABASE_URL: t.url,
      ECHOLINE_FILES_DIR: filesDir,
      ECHOLINE_WORKER_QUEUES: "mine-article",
      ECHOLINE_WORKER_SUPERVISE_SECONDS: "1",
      ECHOLINE_TEST_HOOKS: "1",
      ...env,
    },
    stdio: ["ignore", "pipe", "pipe"],
  });
  children.add(child);
  let out = "";
  child.stdout!.on("data", (d: Buffer) => (out += d.toString()));
  child.stderr!.on("data", (d: Buffer) => (out += d.toString()));
  const exited = new Promise<{ code: number | null; signal: NodeJS.Signals | null }>((resolve) =>
    child.once("exit", (code, signal) => resolve({ code, signal })),
  );
  await until(
    async () => out.includes("[worker] ready") || child.exitCode !== null,
    60_000,
    () => `worker did not start:\n${out}`,
  );
  if (child.exitCode !== null) throw new Error(`worker exited at start (${child.exitCode}):\n${out}`);
  return { child, output: () => out, exited };
}

async function until(check: () => Promise<boolean>, timeoutMs: number, what: () => string): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (!(await check())) {
    if (Date.now() > deadline) throw new Error(`timed out: ${what()}`);
    await new Promise((r) => setTimeout(r, 150));
  }
}

const events = (db: DB, id: string) =>
  db.selectFrom("job_events").select(["state", "message"]).where("article_id", "=", id).orderBy("id").execute();
const readingCount = async (db: DB, id: string) => (await events(db, id)).filter((e) => e.state === "reading").length;

async function kill(w: Worker) {
  w.child.kill("SIGKILL");
  await w.exited;
}

describe("the worker process", () => {
  it("a worker killed in the middle of a job: retried, and failed with the reason once the tries are used up", async () => {
    // Two tries, claims expiring after 2 s: the production preset (heartbeat 30 s, 4 tries) takes
    // minutes to run out. The heartbeat is off here because its floor is 10 s; expiry is the same
    // pg-boss path (a lost claim becomes a retry, the last one goes to the dead-letter queue).
    const preset: Omit<RetryPreset, "heartbeatSeconds"> & { heartbeatSeconds: null } = {
      retryLimit: 1,
      retryDelay: 0,
      retryBackoff: false,
      expireInSeconds: 2,
      heartbeatSeconds: null,
    };
    const env = { ECHOLINE_MINING_RETRY: JSON.stringify(preset) };
    const hang = { ...env, ECHOLINE_TEST_WORKER_HANG_AFTER_READING: "1" };

    // The first worker creates the queues with the short preset; the upload's sender only uses them.
    const first = await startWorker(hang);
    const data = await pdfOf([
      ["Methods", "Reliability above .70 was treated as acceptable (Quandt & Maréchal, 2004, p. 31)."],
    ]);
    const { articleId } = await ingest(t.db, folderStorage(filesDir), {
      data,
      filename: "crash.pdf",
      uploadedBy: null,
    });

    await until(
      async () => (await readingCount(t.db, articleId)) >= 1,
      30_000,
      () => `first try never started:\n${first.output()}`,
    );
    await kill(first);
    // The try that died leaves the article `reading` until the claim is found expired.
    expect(
      (await t.db.selectFrom("articles").select("status").where("id", "=", articleId).executeTakeFirstOrThrow()).status,
    ).toBe("reading");

    const second = await startWorker(hang);
    await until(
      async () => (await readingCount(t.db, articleId)) >= 2,
      30_000,
      () => `second try never started:\n${second.output()}`,
    );
    await kill(second);

    // A healthy worker: it must not get a third try (that would mine the article to `done`), only
    // the dead-lettered job, which marks the article failed.
    const third = await startWorker(env);
    const [final] = [...(await waitForArticles(t.db, [articleId], 30_000)).values()];
    expect(final.status).toBe("failed");
    expect(final.failure_code).toBe("stopped");
    expect(final.failure_message).toBe("Mining stopped 2 times without finishing (worker crashed or timed out).");
    const history = await events(t.db, articleId);
    expect(history.filter((e) => e.state === "reading")).toHaveLength(2);
    expect(
      history.some((e) => e.state === "retry" && /Try 1 of 2 stopped without finishing/.test(e.message ?? "")),
    ).toBe(true);
    expect(history.at(-1)).toMatchObject({
      state: "failed",
      message: expect.stringMatching(/^stopped: Mining stopped 2 times/),
    });
    expect(await rowCounts(t.db, [articleId])).toEqual({ statements: 0, citations: 0, references: 0 });
    await kill(third);
  }, 120_000);

  it("the heartbeat notices a killed worker long before its claim expires (the production mechanism)", async () => {
    // One try, a claim that would last 5 min, and pg-boss's smallest heartbeat (10 s).
    const env = {
      ECHOLINE_MINING_RETRY: JSON.stringify({
        retryLimit: 0,
        retryDelay: 0,
        retryBackoff: false,
        expireInSeconds: 300,
        heartbeatSeconds: 10,
      }),
    };
    const first = await startWorker({ ...env, ECHOLINE_TEST_WORKER_HANG_AFTER_READING: "1" });
    const { articleId } = await ingest(t.db, folderStorage(filesDir), {
      data: await pdfOf([["Heartbeat fixture, invented."]]),
      filename: "heartbeat.pdf",
      uploadedBy: null,
    });
    await until(
      async () => (await readingCount(t.db, articleId)) >= 1,
      30_000,
      () => `never started:\n${first.output()}`,
    );
    const killedAt = Date.now();
    await kill(first);
    const second = await startWorker(env);
    const [final] = [...(await waitForArticles(t.db, [articleId], 60_000)).values()];
    expect(final).toMatchObject({
      status: "failed",
      failure_code: "stopped",
      failure_message: "Mining stopped 1 time without finishing (worker crashed or timed out).",
    });
    // Well inside the 300 s expiry: heartbeat 10 s + supervise 1 s + worker start-up and polling.
    expect(Date.now() - killedAt).toBeLessThan(60_000);
    await kill(second);
  }, 120_000);

  it("a document that never finishes ends failed (timeout) and the worker goes on to the next; SIGTERM waits for the document in progress", async () => {
    const w = await startWorker({ ECHOLINE_MINER_HARD_TIMEOUT_SECONDS: "4" });
    const storage = folderStorage(filesDir);
    // The isolated miner's thread loops forever on this file name (ECHOLINE_TEST_HOOKS=1).
    const hung = await ingest(t.db, storage, {
      data: await pdfOf([["Hang fixture one, invented."]]),
      filename: TEST_HANG_FILENAME,
      uploadedBy: null,
    });
    const next = await ingest(t.db, storage, {
      data: await pdfOf([
        [
          "Method",
          "Internal consistency was adequate, Cronbach's alpha = .81.",
          "Loadings of at least .40 were retained (Vellacourt, 2012).",
        ],
      ]),
      filename: "next.pdf",
      uploadedBy: null,
    });
    const done = await waitForArticles(t.db, [hung.articleId, next.articleId], 60_000);
    expect(done.get(hung.articleId)).toMatchObject({ status: "failed", failure_code: "timeout" });
    expect(done.get(hung.articleId)!.failure_message).toMatch(/longer than 4 s/);
    expect(done.get(next.articleId)!.status).toBe("done");
    // Both mined statements of the next article (alpha = .81 reported, the .40 threshold), counted by hand.
    expect((await rowCounts(t.db, [next.articleId])).statements).toBe(2);
    expect(w.child.exitCode).toBeNull();

    // SIGTERM while a document is in progress: the worker waits for its outcome, then exits 0.
    const third = await ingest(t.db, storage, {
      data: await pdfOf([["Hang fixture two, invented."]]),
      filename: TEST_HANG_FILENAME,
      uploadedBy: null,
    });
    await until(
      async () => (await readingCount(t.db, third.articleId)) >= 1,
      30_000,
      () => `never started:\n${w.output()}`,
    );
    const t0 = Date.now();
    w.child.kill("SIGTERM");
    const exit = await w.exited;
    const tookMs = Date.now() - t0;
    expect(exit).toEqual({ code: 0, signal: null });
    expect(w.output()).toContain("[worker] stopped");
    // The bound in workers/index.ts (18 s, under the 20 s after which `npm start` kills it).
    expect(tookMs).toBeLessThan(18_000);
    const a = await t.db
      .selectFrom("articles")
      .select(["status", "failure_code"])
      .where("id", "=", third.articleId)
      .executeTakeFirstOrThrow();
    expect(a).toEqual({ status: "failed", failure_code: "timeout" });
  }, 120_000);
});
