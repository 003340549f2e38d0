// The miner in its own worker thread. pdf.js runs in the thread that calls it, so a document that
// sends it into a tight loop or eats memory would stall or kill the whole worker process; here it
// only costs a thread. One long-lived thread per Miner, reused between documents (warm), replaced
// after a timeout or a memory breach.
import { Worker } from "node:worker_threads";
import { DEFAULT_TIMEOUT_MS, type ErrorCode, type MineOutput, type Miner, type MinerOptions } from "./index";

export type IsolatedMinerOptions = MinerOptions & {
  /** Hard limit per document; the thread is terminated when it passes. Default: timeoutMs + 2 s. */
  hardTimeoutMs?: number;
  /** V8 old-generation heap limit of the thread (resourceLimits.maxOldGenerationSizeMb). Default 300. */
  memoryLimitMb?: number;
  /**
   * Move the input buffer to the thread instead of copying it (default true). The caller's
   * Uint8Array is then detached (length 0) after mine() is called; only whole, unshared buffers move.
   */
  transferInput?: boolean;
};

export type ThreadRequest = { id: number; data: Uint8Array; filename: string };
export type ThreadData = { echolineMiner: true; options: MinerOptions };
type ThreadReply = { ready: true } | { id: number; output: MineOutput };

/** File names that simulate a runaway document, honoured by the thread only when ECHOLINE_TEST_HOOKS=1. */
export const TEST_HANG_FILENAME = "__echoline_test_hang__.pdf";
export const TEST_OOM_FILENAME = "__echoline_test_oom__.pdf";

export const DEFAULT_MEMORY_LIMIT_MB = 300;
// Loading tsx, pdf.js and the miner takes ~1 s on an idle core; a busy machine gets ample slack.
const STARTUP_LIMIT_MS = 60_000;

function errorOutput(file: string, code: ErrorCode, message: string, ms: number): MineOutput {
  return {
    line: { file, error: { code, message } },
    timings: { readMs: ms, mineMs: 0 },
    meta: { title: null, authors: [], year: null, doi: null, venue: null, licence: null, firstPageText: null },
  };
}

const seconds = (ms: number) => String(Math.round(ms / 100) / 10);

export function createIsolatedMiner(options: IsolatedMinerOptions = {}): Miner {
  const {
    hardTimeoutMs: hard,
    memoryLimitMb = DEFAULT_MEMORY_LIMIT_MB,
    transferInput = true,
    ...minerOptions
  } = options;
  const hardTimeoutMs = hard ?? (minerOptions.timeoutMs ?? DEFAULT_TIMEOUT_MS) + 2000;
  let worker: Worker | null = null;
  // Resolves when a thread has loaded the miner: the per-document limit starts only then.
  const readyOf = new WeakMap<Worker, Promise<boolean>>();
  let closed = false;
  let nextId = 1;
  let queue: Promise<unknown> = Promise.resolve();

  function spawn(): Worker {
    const threadData: ThreadData = { echolineMiner: true, options: minerOptions };
    const w = new Worker(new URL("./isolated-thread.mjs", import.meta.url), {
      workerData: threadData,
      // The parent's flags (e.g. --import tsx) are not needed: the entry registers tsx itself.
      execArgv: [],
      resourceLimits: { maxOldGenerationSizeMb: memoryLimitMb },
    });
    // An idle thread must not keep the process alive; a running job holds its own timer.
    w.unref();
    readyOf.set(
      w,
      new Promise<boolean>((resolve) => {
        const onReady = (msg: ThreadReply) => {
          if ("ready" in msg) {
            w.off("message", onReady);
            resolve(true);
          }
        };
        w.on("message", onReady);
        w.once("exit", () => resolve(false));
      }),
    );
    // Errors are handled per job; an error while idle (none expected) just retires the thread.
    w.on("error", () => {
      if (worker === w) worker = null;
    });
    w.on("exit", () => {
      if (worker === w) worker = null;
    });
    return w;
  }

  function retire(w: Worker) {
    if (worker === w) worker = null;
    void w.terminate().catch(() => undefined);
    // Start the replacement now, so the next document finds a warm thread.
    if (!closed) worker = spawn();
  }

  async function run(input: { data: Uint8Array; filename: string }): Promise<MineOutput> {
    const file = input.filename;
    if (closed) return errorOutput(file, "internal", "The miner was closed.", 0);
    const w = (worker ??= spawn());
    const id = nextId++;
    const started = await Promise.race([
      readyOf.get(w),
      new Promise<false>((r) => setTimeout(() => r(false), STARTUP_LIMIT_MS).unref()),
    ]);
    if (!started) {
      retire(w);
      return errorOutput(file, "internal", "The mining thread did not start; see the worker log.", 0);
    }
    const t0 = performance.now();
    return new Promise<MineOutput>((resolve) => {
      const done = (out: MineOutput) => {
        clearTimeout(timer);
        w.off("message", onMessage);
        w.off("error", onError);
        w.off("exit", onExit);
        resolve(out);
      };
      const onMessage = (msg: ThreadReply) => {
        if ("id" in msg && msg.id === id) done(msg.output);
      };
      const onError = (err: Error & { code?: string }) => {
        retire(w);
        const s = Math.round(performance.now() - t0);
        if (err.code === "ERR_WORKER_OUT_OF_MEMORY") {
          done(
            errorOutput(
              file,
              "too_large",
              `Mining this file needed more than ${memoryLimitMb} MB of memory and was stopped; the file may be damaged or unusually complex.`,
              s,
            ),
          );
        } else {
          done(errorOutput(file, "internal", `The mining thread failed: ${err.message.slice(0, 200)}`, s));
        }
      };
      const onExit = (code: number) => {
        retire(w);
        done(
          errorOutput(
            file,
            "internal",
            `The mining thread stopped unexpectedly (exit code ${code}).`,
            performance.now() - t0,
          ),
        );
      };
      const timer = setTimeout(() => {
        w.off("exit", onExit);
        retire(w);
        done(
          errorOutput(
            file,
            "timeout",
            `Mining took longer than ${seconds(hardTimeoutMs)} s and was stopped; the file may be damaged or unusually complex.`,
            performance.now() - t0,
          ),
        );
      }, hardTimeoutMs);
      w.on("message", onMessage);
      w.on("error", onError);
      w.on("exit", onExit);
      const { data } = input;
      const whole =
        data.byteOffset === 0 && data.byteLength === data.buffer.byteLength && data.buffer instanceof ArrayBuffer;
      // A view into a larger buffer (a pooled Buffer) would clone the whole backing store: copy the view.
      const payload = whole ? data : new Uint8Array(data);
      const request: ThreadRequest = { id, data: payload, filename: file };
      try {
        w.postMessage(request, transferInput || payload !== data ? [payload.buffer as ArrayBuffer] : []);
      } catch {
        // Not transferable after all (e.g. marked untransferable by Node): send a copy.
        w.postMessage({ ...request, data: new Uint8Array(payload) });
      }
    });
  }

  // Started now, so the first document does not wait for the thread to load the miner (~1 s).
  worker = spawn();

  return {
    mine(input) {
      const job = queue.then(() => run(input));
      queue = job.catch(() => undefined);
      return job;
    },
    async close() {
      closed = true;
      await queue;
      const w = worker;
      worker = null;
      if (w) await w.terminate();
    },
  };
}
