// The held-out scorer itself, on two invented items whose right tallies were counted by hand.
import { describe, expect, it } from "vitest";
import type { MinedDocument } from "@/lib/mining/index";
import { firstSurname, newHeldoutTally, prf, scoreItem, type HeldoutItem } from "./heldout-score";

const item: HeldoutItem = {
  id: "t1",
  style: "apa",
  text: "Alpha should be at least .70 (Varga & Oduya, 2004, p. 18). The sample held 212 nurses.",
  sentences: [
    {
      text: "Alpha should be at least .70 (Varga & Oduya, 2004, p. 18).",
      statements: [{ kind: "threshold", statistic: "cronbach_alpha", comparator: ">=", value: 0.7, framing: "fixed" }],
      citations: [{ first_author: "Varga", year: "2004", locator: "p. 18", secondary: false }],
    },
    { text: "The sample held 212 nurses.", statements: [] },
  ],
};

const doc = (over: Partial<MinedDocument>): MinedDocument => ({
  pages: 1,
  statements: [],
  citations: [],
  references: [],
  ...over,
});

describe("held-out scorer", () => {
  it("counts a right statement and citation as hits", () => {
    const t = newHeldoutTally();
    const sentence = item.sentences[0].text;
    scoreItem(
      t,
      item,
      doc({
        statements: [
          {
            page: 1,
            section: "unknown",
            sentence,
            kind: "threshold",
            statistic: "cronbach_alpha",
            comparator: ">",
            value: 0.7,
            framing: "fixed",
            citations: [],
          },
        ],
        citations: [{ page: 1, sentence, authors: "Varga & Oduya", year: "2004", locator: "p. 18", secondary: false }],
      }),
    );
    expect(prf(t, "threshold")).toEqual({ precision: 1, recall: 1, f1: 1 });
    expect([t.comparatorOk, t.framingOk, t.locatorOk, t.firstAuthorOk, t.negativesWithStatement]).toEqual([
      0, 1, 1, 1, 0,
    ]);
  });

  it("counts a statement on a no-statement sentence as a false positive and a miss as a false negative", () => {
    const t = newHeldoutTally();
    scoreItem(
      t,
      item,
      doc({
        statements: [
          {
            page: 1,
            section: "unknown",
            sentence: "The sample held 212 nurses.",
            kind: "reported",
            statistic: "other",
            comparator: "=",
            value: 212,
            framing: null,
            citations: [],
          },
        ],
      }),
    );
    expect(t.fn.threshold).toBe(1);
    expect(t.fp.reported).toBe(1);
    expect(t.negativesWithStatement).toBe(1);
    expect(t.foundCitations).toBe(0);
  });

  it("reads the first surname however the authors are joined", () => {
    expect(firstSurname("Varga & Oduya")).toBe("varga");
    expect(firstSurname("Ñúñez-Paz et al.")).toBe("nunezpaz");
    expect(firstSurname("Kowal, Brandt, and Ito")).toBe("kowal");
    expect(firstSurname("Abara Jr.")).toBe("abara");
  });
});
