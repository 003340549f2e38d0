/**
 * `npm start`: PostgreSQL (private cluster), migrations, seed, job queues, build, then the mail fake,
 * the worker and the web server, all on loopback. A child that dies is restarted with backoff
 * (workers/stack.ts). Ctrl-C stops every one of them, PostgreSQL last.
 */
import type { Kysely } from "kysely";
import path from "node:path";
import { up, down, ensureDatabase, DATA_DIR } from "@/db/cluster";
import { createDb } from "@/db";
import { migrateToLatest } from "@/db/migrate";
import { seedAll } from "@/db/seed";
import { startStack, runBuild, stackEnv, type Stack } from "./stack";
import { loadDemoCorpus } from "@/lib/demo/load";
import { installQueues } from "@/lib/jobs/registry";
import { clusterDatabaseUrl, env, EnvError } from "@/lib/env";

const t0 = Date.now();
let config;
try {
  config = env();
} catch (err) {
  console.error(`[echoline] could not start: ${err instanceof EnvError ? err.message : String(err)}`);
  process.exit(1);
}
const cfg = {
  appPort: config.PORT,
  smtpPort: config.SMTP_PORT,
  mailHttpPort: config.MAIL_FAKE_HTTP_PORT,
  // The same URL `npm run worker` derives when DATABASE_URL is unset (lib/env.ts databaseUrl).
  databaseUrl: clusterDatabaseUrl("dev", "echoline", config),
  dataDir: DATA_DIR,
};
if (config.DATABASE_URL && config.DATABASE_URL !== cfg.databaseUrl)
  console.warn(
    `[echoline] DATABASE_URL is set but npm start runs its own cluster (${cfg.databaseUrl}); unset it so a worker in another terminal joins this one.`,
  );

let stack: Stack | null = null;
let stopping = false;
async function shutdown(code = 0) {
  if (stopping) return;
  stopping = true;
  console.log("\n[echoline] stopping …");
  await stack?.stop();
  down("dev");
  process.exit(code);
}
process.on("SIGINT", () => void shutdown(0));
process.on("SIGTERM", () => void shutdown(0));

try {
  up("dev");
  await ensureDatabase("dev", "echoline");
  Object.assign(process.env, stackEnv(cfg));
  const db = createDb(cfg.databaseUrl, 2);
  await migrateToLatest(db as unknown as Kysely<unknown>);
  await seedAll(db);
  // Queues before any process sends a job (the web app and the demo loader only send).
  await installQueues(db);
  await db.destroy();
  if (config.ECHOLINE_SKIP_BUILD !== "1") await runBuild(process.env);
  stack = await startStack(cfg, (s) => (stack = s));
  console.log(
    `\n[echoline] ready in ${((Date.now() - t0) / 1000).toFixed(1)} s at http://localhost:${cfg.appPort}  (mail fake: http://localhost:${cfg.mailHttpPort}/, data: ${path.relative(process.cwd(), DATA_DIR)}/)`,
  );
  console.log("[echoline] demo accounts are listed in README.md; Ctrl-C stops everything.");
  if (config.ECHOLINE_DEMO !== "0") {
    // Through the real pipeline: the files are ingested and the worker mines them in the background.
    const demoDb = createDb(cfg.databaseUrl, 2);
    loadDemoCorpus(demoDb, { cacheDir: path.join(DATA_DIR, "demo"), log: (s) => console.log(`[demo] ${s}`) })
      .then((r) =>
        console.log(
          `[demo] invented demo corpus: ${r.created} new articles queued for mining, ${r.skipped} already loaded`,
        ),
      )
      .catch((err) => console.error("[demo] could not load the demo corpus:", err instanceof Error ? err.message : err))
      .finally(() => demoDb.destroy());
  }
} catch (err) {
  console.error("[echoline] could not start:", err instanceof Error ? err.message : err);
  await shutdown(1);
}
