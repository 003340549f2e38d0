// The sentence splitter applies natural's SentenceTokenizer rule in one linear pass (lib/mining/sentences.ts
// says why). The reference here is natural 8.1.1's own tokenizer, run on the same masked text: the two
// must give the same sentences, on the gold excerpts, on long invented demo articles and on the
// delimiter, quote, bracket, URI and e-mail cases its patterns treat specially.
import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import SentenceTokenizer from "natural/lib/natural/tokenizers/sentence_tokenizer.js";
import { describe, expect, it } from "vitest";
import { generateCorpus } from "@/lib/demo/corpus";
import { mineText } from "@/lib/mining";
import { mask, splitSentences, tokenizeLikeNatural } from "@/lib/mining/sentences";

const natural = new SentenceTokenizer([], true);
const prepared = (t: string) => mask(t.replace(/\s+/g, " ").trim());

const goldDir = path.resolve(import.meta.dirname, "../../fixtures/gold");
const gold = readdirSync(goldDir)
  .filter((f) => f.endsWith(".txt"))
  .sort()
  .map((f) => readFileSync(path.join(goldDir, f), "utf8"));

const demoText = (count: number, pagesPerArticle: number) =>
  generateCorpus({ count, pagesPerArticle, seed: 11 })
    .articles.slice(0, count)
    .map((a) =>
      a.blocks
        .map((b) => [b.heading ?? "", ...b.paragraphs.map((p) => p.map((s) => s.text).join(" "))].join("\n"))
        .join("\n"),
    );

describe("tokenizeLikeNatural equals natural's SentenceTokenizer (natural 8.1.1, reference)", () => {
  it("on every gold excerpt", () => {
    expect(gold.length).toBeGreaterThanOrEqual(15);
    for (const g of gold) expect(tokenizeLikeNatural(prepared(g))).toEqual(natural.tokenize(prepared(g)));
  });

  it("on invented demo articles, and on a 12-page one as a single input", () => {
    for (const t of [...demoText(6, 4), ...demoText(1, 12)]) {
      const m = prepared(t);
      expect(tokenizeLikeNatural(m)).toEqual(natural.tokenize(m));
    }
  });

  it("on the cases natural's patterns treat specially", () => {
    const cases = [
      "Is it enough?! Most say so... Others disagree … see below.",
      'They wrote "reliability was fine." Then they stopped. (As noted.) [Also.] Done',
      "Mail k.okafor@uni.example.org. Thanks.",
      "Write to k.okafor@uni-lindqvist.example.org. or see www.scales.example.org/alpha.html. Thanks.",
      "Data: https://data.example.org/x.y?z=1. ftp://old.example.org/a.b. file:///tmp/a.b. End.",
      "Spaced . . . dots . ! and {{DELIM_0}} braces. 1,234.5 units. 12. Thirteen.",
      "   . Leading delimiter. Trailing text without one",
      "\uE000 private use char first. Then www.a.example.org. Then done.",
      "",
    ];
    // The claim holds for masked text (what splitSentences passes on), where "1.5"-like dots are gone.
    for (const c of cases) expect(tokenizeLikeNatural(prepared(c))).toEqual(natural.tokenize(prepared(c)));
  });
});

describe("splitting and mining scale with the text", () => {
  it("a long section is split like its paragraphs one by one", () => {
    // The whole gold set as one section (~40 kB, ~450 sentences). natural on this input is the slow,
    // quadratic path the miner no longer takes; its result is the reference.
    const joined = gold.join("\n");
    const viaNatural = natural.tokenize(prepared(joined)).filter((s: string) => s);
    const ours = splitSentences(joined);
    expect(ours.length).toBeGreaterThan(400);
    // splitSentences re-attaches lower-case continuations; compare on the raw token level too.
    expect(tokenizeLikeNatural(prepared(joined)).filter((s) => s)).toEqual(viaNatural);
    expect(ours.join(" ").replace(/\s+/g, "")).toBe(joined.replace(/\s+/g, ""));
  });

  it("mining a text repeated k times gives k times the statements and citations", () => {
    // A document-sized check that nothing depends on position in a long text (page lookup, cursors).
    // The body only: after a "References" heading everything is read as the reference list.
    const body = gold[0].split(/^\s*References\s*$/im)[0];
    const one = mineText(body);
    const many = mineText(Array.from({ length: 40 }, () => body).join("\n\n"));
    expect(one.statements.length).toBeGreaterThan(3);
    expect(many.statements.length).toBe(40 * one.statements.length);
    expect(many.citations.length).toBe(40 * one.citations.length);
  });
});
