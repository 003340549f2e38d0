import { describe, expect, it } from "vitest";
import { generateCorpus, type DemoArticle, type DemoCorpus, type DemoSentence } from "@/lib/demo/corpus";
import { compileProcedures, defaultProcedures } from "@/lib/mining/procedures";

const corpus: DemoCorpus = generateCorpus();
const sentencesOf = (a: DemoArticle, section?: string): DemoSentence[] =>
  a.blocks
    .filter((b) => b.section !== "references" && (!section || b.section === section))
    .flatMap((b) => b.paragraphs.flat());
const empirical = corpus.articles.filter((a) => !a.isMethodsArticle);
const byId = new Map(corpus.articles.map((a) => [a.id, a]));

describe("demo corpus: shape", () => {
  it("is deterministic for a seed and differs across seeds", () => {
    const a = JSON.stringify(generateCorpus({ seed: 7, count: 80 }));
    expect(JSON.stringify(generateCorpus({ seed: 7, count: 80 }))).toBe(a);
    expect(JSON.stringify(generateCorpus({ seed: 8, count: 80 }))).not.toBe(a);
  });

  it("has ≥ 300 articles over ≥ 5 venues, one a methods venue, and every year 1995–2025", () => {
    expect(corpus.articles.length).toBeGreaterThanOrEqual(300);
    const venuesUsed = new Set(corpus.articles.map((a) => a.venueKey));
    expect(venuesUsed.size).toBeGreaterThanOrEqual(5);
    expect(corpus.venues.some((v) => v.isMethodsVenue && venuesUsed.has(v.key))).toBe(true);
    const years = new Set(corpus.articles.map((a) => a.year));
    for (let y = 1995; y <= 2025; y++) expect(years.has(y), `year ${y}`).toBe(true);
  });

  it("marks every item invented and keeps DOIs under the invented prefix, unique", () => {
    for (const v of corpus.venues) expect(v.description).toMatch(/^Invented demo venue/);
    const dois = corpus.articles.map((a) => a.doi);
    expect(new Set(dois).size).toBe(dois.length);
    for (const a of corpus.articles) {
      expect(a.isDemo).toBe(true);
      expect(a.doi).toMatch(/^10\.99999\/[a-z]+\.\d{4}\.\d{3}$/);
      expect(a.abstract).toMatch(/invented/i);
      expect(a.licence).toBe("CC BY 4.0");
    }
  });

  it("rejects nonsense options with a clear error", () => {
    expect(() => generateCorpus({ count: 0 })).toThrow(/count/);
    expect(() => generateCorpus({ count: 2.5 })).toThrow(/count/);
    expect(() => generateCorpus({ pagesPerArticle: 0 })).toThrow(/pagesPerArticle/);
  });
});

// In-text citations read back from the sentence TEXT (not from the generator's own records), checked
// against the reference list by the APA 7 rules (from memory: sec. 8.17 — one author, two joined by
// "&" in parentheses and "and" in prose, "et al." from three; sec. 8.6 — for "as cited in" only the
// secondary source goes in the reference list).
const PAREN = /\(([^()]*?\d{4}[^()]*)\)/g;
const NARRATIVE = /((?:\p{Lu}[\p{L}'-]+)(?: and \p{Lu}[\p{L}'-]+| et al\.)?) \((\d{4})(?:, (?:pp?\.) [\d–]+)?\)/gu;
type Cite = { first: string; year: string; etAl: boolean; two: string | null };
function parseAuthorYear(s: string): Cite | null {
  const m = /^(\p{Lu}[\p{L}'-]+)(?: (?:&|and) (\p{Lu}[\p{L}'-]+)| (et al\.))?, (\d{4})/u.exec(s.trim());
  return m ? { first: m[1], two: m[2] ?? null, etAl: Boolean(m[3]), year: m[4] } : null;
}
function citationsInText(text: string): { cite: Cite; secondaryVia: Cite | null }[] {
  const out: { cite: Cite; secondaryVia: Cite | null }[] = [];
  for (const m of text.matchAll(PAREN)) {
    for (const part of m[1].split(";")) {
      const [orig, via] = part.split(", as cited in ");
      const c = parseAuthorYear(orig);
      if (!c) continue;
      out.push({ cite: c, secondaryVia: via ? parseAuthorYear(via) : null });
    }
  }
  for (const m of text.matchAll(NARRATIVE)) {
    const [first, rest] = m[1].split(/ and | et al\./);
    out.push({
      cite: { first, two: m[1].includes(" and ") ? rest : null, etAl: m[1].includes("et al."), year: m[2] },
      secondaryVia: null,
    });
  }
  return out;
}
function findReference(a: DemoArticle, c: Cite) {
  return a.references.filter((r) => {
    const authors = r.text.slice(0, r.text.indexOf(" ("));
    const families = authors
      .split(/, (?:& )?(?:\p{Lu}\. ?)+,? ?(?:& )?/u)
      .map((s) => s.replace(/,.*$/, "").trim())
      .filter(Boolean);
    if (families[0] !== c.first || !r.text.includes(`(${c.year})`)) return false;
    if (c.two) return families.length === 2 && families[1] === c.two;
    if (c.etAl) return families.length >= 3;
    return families.length === 1;
  });
}

describe("demo corpus: citations and references agree", () => {
  it("every in-text citation written in the text has exactly one reference entry", () => {
    let checked = 0;
    let secondary = 0;
    for (const a of corpus.articles) {
      for (const s of sentencesOf(a)) {
        for (const { cite, secondaryVia } of citationsInText(s.text)) {
          if (secondaryVia) {
            secondary++;
            expect(findReference(a, secondaryVia), `${a.id}: ${s.text}`).toHaveLength(1);
            expect(
              findReference(a, cite),
              `original of a secondary citation must not be listed (${a.id})`,
            ).toHaveLength(0);
          } else {
            expect(findReference(a, cite), `${a.id}: ${s.text}`).toHaveLength(1);
          }
          checked++;
        }
      }
    }
    expect(checked).toBeGreaterThan(3000);
    expect(secondary).toBeGreaterThan(5);
  });

  it("lists no reference that the text does not cite", () => {
    for (const a of corpus.articles) {
      const cited = new Set(sentencesOf(a).flatMap((s) => s.citations.map((c) => c.citedInKey ?? c.workKey)));
      for (const r of a.references) expect(cited.has(r.workKey), `${a.id} lists ${r.workKey}`).toBe(true);
    }
  });

  it("gives references to corpus articles the cited article's DOI, so they can be resolved", () => {
    let n = 0;
    for (const a of corpus.articles) {
      for (const r of a.references) {
        const target = byId.get(r.workKey);
        if (!target) continue;
        n++;
        expect(target.year).toBeLessThanOrEqual(a.year);
        expect(r.text).toContain(`https://doi.org/${target.doi}`);
        expect(r.text).toContain(target.title);
      }
    }
    expect(n).toBeGreaterThan(300);
  });
});

// Chains read from the corpus itself: a claim cites a work; if the work is a corpus article that
// asserts the same statistic and value, follow its claim, until a methods source or nothing.
type End = "methods_with_page" | "methods_no_page" | "misquote" | "unsourced" | "precedent_silent" | "outside";
function claimsIn(a: DemoArticle, statistic: string, value: number) {
  return sentencesOf(a).filter((s) =>
    s.statements.some((t) => t.kind === "threshold" && t.statistic === statistic && t.value === value),
  );
}
function follow(s: DemoSentence, statistic: string, value: number, depth = 0): { end: End; length: number } {
  const direct = s.citations.filter((c) => !c.secondary);
  if (!direct.length) return { end: "unsourced", length: depth };
  const c = direct[0];
  const w = corpus.works[c.workKey];
  if (w.isMethodsSource) {
    const says = w.claims.some((x) => x.statistic === statistic && x.value === value);
    if (!says) return { end: "misquote", length: depth + 1 };
    return { end: c.locator ? "methods_with_page" : "methods_no_page", length: depth + 1 };
  }
  const target = w.articleId ? byId.get(w.articleId) : undefined;
  if (!target) return { end: "outside", length: depth + 1 };
  const next = claimsIn(target, statistic, value);
  if (!next.length) return { end: "precedent_silent", length: depth + 1 };
  return follow(next[0], statistic, value, depth + 1);
}

describe("demo corpus: practices spread through citation chains", () => {
  const claims = empirical.flatMap((a) =>
    sentencesOf(a, "methods").flatMap((s) =>
      s.statements
        .filter((t) => t.kind === "threshold" && t.practice && t.statistic !== "p_value")
        .slice(0, 1)
        .map((t) => ({ a, s, t })),
    ),
  );
  const traced = claims.map((c) => ({ ...c, ...follow(c.s, c.t.statistic!, c.t.value!) }));
  const counts = traced.reduce<Record<string, number>>((m, x) => ((m[x.end] = (m[x.end] ?? 0) + 1), m), {});

  it("has every kind of chain end, in plausible proportions", () => {
    expect(counts.methods_with_page).toBeGreaterThan(100);
    expect(counts.methods_no_page).toBeGreaterThan(100);
    expect(counts.unsourced).toBeGreaterThan(50);
    expect(counts.precedent_silent).toBeGreaterThan(5);
    // "a few quote a value the source does not give"
    expect(counts.misquote).toBeGreaterThanOrEqual(5);
    expect(counts.misquote).toBeLessThan(0.05 * traced.length);
  });

  it("has chains through earlier articles of the same venue that end at a methods book with a page", () => {
    const viaPrecedent = traced.filter((x) => x.length >= 2);
    expect(viaPrecedent.length).toBeGreaterThan(80);
    const longToBook = viaPrecedent.filter(
      (x) => x.end === "methods_with_page" && corpus.works[lastWork(x.s, x.t.statistic!, x.t.value!)].kind === "book",
    );
    expect(longToBook.length).toBeGreaterThan(20);
    expect(viaPrecedent.some((x) => x.length >= 3)).toBe(true);
    const firstHopSameVenue = viaPrecedent.filter(
      (x) => byId.get(x.s.citations[0].workKey)?.venueKey === x.a.venueKey,
    ).length;
    expect(firstHopSameVenue / viaPrecedent.length).toBeGreaterThan(0.7);
    // Precedent is cited as written in the trade: narratively ("following Brandt et al. (2003)") too.
    expect(viaPrecedent.some((x) => /^(Following|In line with|As in|Consistent with) \p{Lu}/u.test(x.s.text))).toBe(
      true,
    );
  });

  it("has second-hand claims whose intermediate article cites the methods source directly", () => {
    const sec = claims.filter((c) => c.s.citations.some((x) => x.secondary));
    expect(sec.length).toBeGreaterThan(5);
    for (const c of sec) {
      const cit = c.s.citations.find((x) => x.secondary)!;
      const via = byId.get(cit.citedInKey!)!;
      const viaClaims = claimsIn(via, c.t.statistic!, c.t.value!);
      expect(viaClaims.some((v) => v.citations.some((x) => x.workKey === cit.workKey && !x.secondary))).toBe(true);
    }
  });

  it("drifts: Tarnwick's unsourced alpha rule rises, Veldmark's locators fall", () => {
    const rate = (venue: string, from: number, to: number, pick: (x: (typeof traced)[number]) => boolean | null) => {
      const xs = traced
        .filter((x) => x.a.venueKey === venue && x.a.year >= from && x.a.year <= to)
        .map(pick)
        .filter((v): v is boolean => v !== null);
      return xs.filter(Boolean).length / xs.length;
    };
    const unsourcedAlpha = (x: (typeof traced)[number]) =>
      x.t.statistic === "cronbach_alpha"
        ? !/\(\p{Lu}[^()]*\d{4}/u.test(x.s.text) && !/\(\d{4}[,)]/.test(x.s.text)
        : null;
    expect(rate("trcb", 2015, 2025, unsourcedAlpha)).toBeGreaterThan(rate("trcb", 1995, 2007, unsourcedAlpha) + 0.15);
    const locator = (x: (typeof traced)[number]) =>
      x.end === "methods_with_page" || x.end === "methods_no_page" ? /\d{4}, pp?\. \d/.test(x.s.text) : null;
    expect(rate("vjis", 2016, 2025, locator)).toBeLessThan(rate("vjis", 1995, 2010, locator));
  });
});

function lastWork(s: DemoSentence, statistic: string, value: number): string {
  const c = s.citations.find((x) => !x.secondary)!;
  const target = byId.get(c.workKey);
  if (!target || target.isMethodsArticle) return c.workKey;
  return lastWork(claimsIn(target, statistic, value)[0], statistic, value);
}

describe("demo corpus: hard cases and procedures", () => {
  const all = empirical.flatMap((a) => sentencesOf(a));
  it("contains hard negatives: sample sizes, ages, years, scale points, p as result, money", () => {
    const neg = all.filter((s) => s.hardNegative && s.statements.length === 0);
    for (const re of [
      /\(N = \d+\)/,
      /aged between \d+ and \d+ years/,
      /between \w+ and \w+ (19|20)\d\d/,
      /\d-point Likert/,
      /p < \.001|p = \.0\d/,
      /€\d+/,
    ]) {
      expect(
        neg.some((s) => re.test(s.text)),
        String(re),
      ).toBe(true);
    }
    expect(all.some((s) => /α = \.05/.test(s.text) && s.statements.every((t) => t.statistic === "p_value"))).toBe(true);
  });

  it("contains both misdescribed procedures, and the miner's own patterns recognise them", () => {
    const match = compileProcedures(defaultProcedures);
    const proc = all.filter((s) => s.statements.some((t) => t.kind === "procedure"));
    const keys = new Set(proc.map((s) => s.statements[0].procedure));
    expect(keys).toEqual(new Set(["single_factor_cmv_proof", "two_stage_residual_substitution"]));
    for (const s of proc) expect(match(s.text)?.key, s.text).toBe(s.statements[0].procedure);
    // The correct counterparts must not be flagged.
    const counterparts = all.filter((s) => s.hardNegative && /single-factor test cannot|fitted values/.test(s.text));
    expect(counterparts.length).toBeGreaterThan(3);
    for (const s of counterparts) expect(match(s.text), s.text).toBeNull();
  });
});
