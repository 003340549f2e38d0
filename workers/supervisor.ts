/**
 * `npm start`: PostgreSQL (private cluster), migrations, seed, build, then the mail fake, the worker
 * and the web server, all on loopback. Ctrl-C stops every one of them, PostgreSQL last.
 */
import type { Kysely } from "kysely";
import path from "node:path";
import { up, down, ensureDatabase, databaseUrl, DATA_DIR } from "@/db/cluster";
import { createDb } from "@/db";
import { migrateToLatest } from "@/db/migrate";
import { seedAll } from "@/db/seed";
import { startStack, runBuild, stackEnv, type Stack } from "./stack";
import { loadDemoCorpus } from "@/lib/demo/load";
import { senderFor } from "@/lib/corpus/queue";

const t0 = Date.now();
const cfg = {
  appPort: Number(process.env.PORT ?? 3000),
  smtpPort: Number(process.env.SMTP_PORT ?? 2525),
  mailHttpPort: Number(process.env.MAIL_FAKE_HTTP_PORT ?? 2526),
  databaseUrl: databaseUrl("dev", "echoline"),
  dataDir: DATA_DIR,
};

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
  await db.destroy();
  if (process.env.ECHOLINE_SKIP_BUILD !== "1") await runBuild(process.env);
  stack = await startStack(cfg);
  console.log(
    `\n[echoline] ready in ${((Date.now() - t0) / 1000).toFixed(1)} s at http://localhost:${cfg.appPort}  (mail fake: http://localhost:${cfg.mailHttpPort}/, data: ${path.relative(process.cwd(), DATA_DIR)}/)`,
  );
  console.log("[echoline] demo accounts are listed in README.md; Ctrl-C stops everything.");
  if (process.env.ECHOLINE_DEMO !== "0") {
    // Through the real pipeline: the files are ingested and the worker mines them in the background.
    const demoDb = createDb(cfg.databaseUrl, 2);
    loadDemoCorpus(demoDb, { cacheDir: path.join(DATA_DIR, "demo"), log: (s) => console.log(`[demo] ${s}`) })
      .then((r) =>
        console.log(
          `[demo] invented demo corpus: ${r.created} new articles queued for mining, ${r.skipped} already loaded`,
        ),
      )
      .catch((err) => console.error("[demo] could not load the demo corpus:", err instanceof Error ? err.message : err))
      // The loader's job sender polls through this handle: stop it before closing the pool.
      .finally(async () => {
        await (await senderFor(demoDb).catch(() => null))?.stop({ graceful: false, close: false }).catch(() => {});
        await demoDb.destroy();
      });
  }
} catch (err) {
  console.error("[echoline] could not start:", err instanceof Error ? err.message : err);
  await shutdown(1);
}
