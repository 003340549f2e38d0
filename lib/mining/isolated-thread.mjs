// Entry of the isolated miner's worker thread (see isolated.ts). A worker thread starts with a plain
// Node loader whatever the parent used (tsx, vitest's transform), so TypeScript is registered here
// with tsx's own API before the miner is imported; this works the same under `node --import tsx`,
// vitest and a compiled parent. tsx also resolves the tsconfig `@/` paths.
import { register } from "tsx/esm/api";

register();
await import("./isolated-thread.ts");
