import { createDb } from "@/db";
import { memoryStorage } from "@/lib/storage";
import { loadDemoCorpus } from "@/lib/demo/load";
const db = createDb("postgres://postgres@127.0.0.1:54320/echoline_demo_smoke", 3);
const storage = memoryStorage();
for (const run of [1, 2]) {
  const t0 = Date.now();
  const r = await loadDemoCorpus(db, { count: Number(process.argv[2] ?? 40), storage, cacheDir: "/tmp/demo-cache-smoke", log: (s) => console.log(s) });
  console.log("run", run, r, Date.now() - t0, "ms");
}
const v = await db.selectFrom("venues").select(["name", "is_demo", "is_methods_venue"]).execute();
console.log(v);
const a = await db.selectFrom("articles").select(({ fn }) => [fn.countAll().as("n")]).where("is_demo", "=", true).where("status", "=", "queued").executeTakeFirst();
console.log(a);
await db.destroy();
process.exit(0);
