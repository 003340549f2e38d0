// Reading order from item positions (lib/mining/layout.ts) on invented pages. The order a reader
// expects (title, left column top to bottom, right column, footer) is the definition checked here;
// the comparison with Debian's pdftotext on real PDF files is in pdf-text.test.ts.
import { describe, expect, it } from "vitest";
import { type PositionedItem, pageTextInReadingOrder } from "@/lib/mining/layout";

/** An item as pdf.js gives it: baseline origin (x, y) in PDF space (y upwards), width ≈ 0.5 em per character. */
const item = (str: string, x: number, y: number, size = 10): PositionedItem => ({
  str,
  transform: [size, 0, 0, size, x, y],
  width: str.length * size * 0.5,
  height: size,
});

const left = Array.from({ length: 12 }, (_, i) => `left ${i + 1} of the Okafor sample`);
const right = Array.from({ length: 12 }, (_, i) => `right ${i + 1} of the Lindqvist sample`);

function twoColumnPage(): PositionedItem[] {
  // Drawn the way many journal PDFs are: footer first, then line by line across both columns.
  const items: PositionedItem[] = [
    item("Invented Journal of Ward Studies 4", 40, 30, 7),
    item("Survey of ward climate on twelve invented wards", 40, 780, 14),
  ];
  for (let i = 0; i < 12; i++) {
    items.push(item(left[i], 40, 740 - i * 13), item(right[i], 300, 740 - i * 13));
  }
  return items;
}

describe("pageTextInReadingOrder", () => {
  it("reads a page drawn across the columns column by column, title first, footer last", () => {
    const lines = pageTextInReadingOrder(twoColumnPage()).split("\n");
    expect(lines).toEqual([
      "Survey of ward climate on twelve invented wards",
      ...left,
      ...right,
      "Invented Journal of Ward Studies 4",
    ]);
  });

  it("gives the same text whatever order the items were drawn in", () => {
    const items = twoColumnPage();
    const shuffled = [...items].reverse();
    expect(pageTextInReadingOrder(shuffled)).toBe(pageTextInReadingOrder(items));
  });

  it("keeps a single column in line order and does not invent a gutter from ragged lines", () => {
    const items: PositionedItem[] = [];
    for (let i = 0; i < 15; i++) {
      const words = `line ${i + 1} runs across the whole text block of the page here`.split(" ");
      let x = 40;
      for (const w of words) {
        items.push(item(w, x, 700 - i * 14));
        x += w.length * 5 + 3; // 0.3 em word spaces
      }
    }
    const lines = pageTextInReadingOrder(items.reverse()).split("\n");
    expect(lines).toHaveLength(15);
    expect(lines[0]).toBe("line 1 runs across the whole text block of the page here");
    expect(lines[14]).toBe("line 15 runs across the whole text block of the page here");
  });

  it("keeps a raised citation number on its line and puts rotated margin text after the body", () => {
    const items = [
      item("Alpha was .81", 40, 700),
      item("12", 106, 704, 6),
      item("and omega .84.", 118, 700),
      item("Preprint, not peer reviewed", 10, 300),
    ];
    items[3] = { ...items[3], transform: [0, 10, -10, 0, 10, 300] };
    expect(pageTextInReadingOrder(items)).toBe("Alpha was .81 12 and omega .84.\nPreprint, not peer reviewed");
  });

  it("returns an empty string for a page without text items", () => {
    expect(pageTextInReadingOrder([{ str: " ", transform: [1, 0, 0, 1, 0, 0], width: 1, height: 0 }])).toBe("");
  });
});
