import { generateCorpus } from "@/lib/demo/corpus";
import { renderArticlePdf } from "@/lib/demo/render";
import { writeFileSync, mkdirSync, rmSync } from "node:fs";
const c = generateCorpus({ pagesPerArticle: Number(process.argv[2] ?? 3) });
rmSync("/tmp/demo-out", { recursive: true, force: true });
mkdirSync("/tmp/demo-out", { recursive: true });
let t0 = performance.now();
let total = 0;
for (const a of c.articles.slice(0, Number(process.argv[3] ?? 300))) {
  const b = await renderArticlePdf(a);
  total += b.length;
  writeFileSync(`/tmp/demo-out/${a.id}.pdf`, b);
}
console.log("pdfs ms", (performance.now() - t0).toFixed(0), "bytes", total);
