// Runs inside the isolated miner's worker thread (started by isolated.ts through isolated-thread.mjs):
// one warm miner, one document at a time.
import { parentPort, workerData } from "node:worker_threads";
import { createMiner } from "./index";
import { env } from "../env";
import { type ThreadData, type ThreadRequest, TEST_HANG_FILENAME, TEST_OOM_FILENAME } from "./isolated";

// One page with one line of Helvetica; the cross-reference table is left out on purpose (pdf.js
// rebuilds it), which keeps this hand-written file valid without byte offsets.
const WARM_UP_PDF = `%PDF-1.4
1 0 obj << /Type /Catalog /Pages 2 0 R >> endobj
2 0 obj << /Type /Pages /Kids [3 0 R] /Count 1 >> endobj
3 0 obj << /Type /Page /Parent 2 0 R /MediaBox [0 0 300 200] /Resources << /Font << /F1 4 0 R >> >> /Contents 5 0 R >> endobj
4 0 obj << /Type /Font /Subtype /Type1 /BaseFont /Helvetica >> endobj
5 0 obj << /Length 64 >> stream
BT /F1 11 Tf 20 150 Td (Reliability was adequate, alpha = .81.) Tj ET
endstream endobj
trailer << /Root 1 0 R >>
%%EOF
`;

const data = workerData as Partial<ThreadData> | null;
if (parentPort && data?.echolineMiner === true) {
  const port = parentPort;
  const miner = createMiner(data.options ?? {});
  const hooks = env().ECHOLINE_TEST_HOOKS === "1";
  port.on("message", async (req: ThreadRequest) => {
    if (hooks && req.filename === TEST_HANG_FILENAME) {
      // A tight loop, like pdf.js stuck in a damaged content stream: no timer in this thread can fire.
      for (;;);
    }
    if (hooks && req.filename === TEST_OOM_FILENAME) {
      const hoard: number[][] = [];
      for (;;) hoard.push(new Array<number>(1e6).fill(1.5));
    }
    const output = await miner.mine({ data: req.data, filename: req.filename });
    port.postMessage({ id: req.id, output });
  });
  // Warm up before reporting ready: the first PDF loads pdf.js's worker module (~1 s), a cost of
  // starting the thread that must not count against the first real document's time limit.
  void miner
    .mine({ data: new TextEncoder().encode(WARM_UP_PDF), filename: "warm-up.pdf" })
    .finally(() => port.postMessage({ ready: true }));
}
