// Creates the next migration file with a timestamp name and prints what to add to migrations/index.ts.
import fs from "node:fs";
import path from "node:path";

const name = (process.argv[2] ?? "").replace(/[^a-z0-9_]/gi, "_").toLowerCase();
if (!name) {
  console.error("usage: npm run db:new-migration -- short_name");
  process.exit(64);
}
const stamp = new Date().toISOString().replace(/[-:]/g, "").slice(0, 13).replace("T", "T");
const file = `${stamp}_${name}`;
const target = path.join(import.meta.dirname, "..", "migrations", `${file}.ts`);
fs.writeFileSync(
  target,
  `import { sql, type Kysely } from "kysely";\n\nexport async function up(db: Kysely<unknown>): Promise<void> {\n  await sql\`\`.execute(db);\n}\n\nexport async function down(db: Kysely<unknown>): Promise<void> {\n  await sql\`\`.execute(db);\n}\n`,
);
console.log(`created migrations/${file}.ts; add it at the end of migrations/index.ts as "${file}"`);
