// Reading numbers as authors write them in methods sections: ".70", "0·7" (middle dot), "0. 70" (a
// decimal broken after the point by a line end), "80%" / "80 percent", "1,000", number words
// ("five", "ten"), ratios ("10:1", "ten to one"), ranges ("0.60 to 0.70", "between .15 and .5",
// ".60–.70") and the things that look like numbers but are not values: list markers "(2)", labels
// ("Test 1", "Table 3", "Key Concept 12.5"), citation numbers glued to a value ("0.8.21–25",
// "0.80 [21–25]", "0.80^21") and counts ("12 predictors").

export type NumberRole =
  /** a value a statistic may take */
  | "value"
  /** "Table 3", "Study 2", "Key Concept 12.5", "H1" */
  | "label"
  /** "(2)" at the head of a list item */
  | "list_marker"
  /** a citation number: "[21–25]", the "21–25" of "0.8.21–25" */
  | "reference"
  /** a count of things: "12 predictors", "five items" */
  | "count";

export type ReadNumber = {
  start: number;
  end: number;
  value: number;
  raw: string;
  /** written with % or "percent": `value` is the number as written (80), `proportion` is 0.80 */
  percent: boolean;
  proportion: number;
  /** written as a word ("five", "ten") */
  word: boolean;
  role: NumberRole;
};

export type ReadRange = {
  start: number;
  end: number;
  low: ReadNumber;
  high: ReadNumber;
  /** how the range was written */
  form: "between" | "from_to" | "to" | "dash";
};

export type ReadRatio = { start: number; end: number; value: number; raw: string };

const UNITS: Record<string, number> = {
  zero: 0,
  one: 1,
  two: 2,
  three: 3,
  four: 4,
  five: 5,
  six: 6,
  seven: 7,
  eight: 8,
  nine: 9,
  ten: 10,
  eleven: 11,
  twelve: 12,
  thirteen: 13,
  fourteen: 14,
  fifteen: 15,
  sixteen: 16,
  seventeen: 17,
  eighteen: 18,
  nineteen: 19,
  twenty: 20,
  thirty: 30,
  forty: 40,
  fifty: 50,
  sixty: 60,
  seventy: 70,
  eighty: 80,
  ninety: 90,
  hundred: 100,
};
const TENS = new Set(["twenty", "thirty", "forty", "fifty", "sixty", "seventy", "eighty", "ninety"]);
const WORD_RE = new RegExp(
  `\\b(?:(${[...TENS].join("|")})[-\\s](one|two|three|four|five|six|seven|eight|nine)|(?:a |one )?(hundred)|(${Object.keys(
    UNITS,
  ).join("|")}))\\b`,
  "gi",
);

/** The value of a number word or compound ("five" → 5, "twenty-five" → 25, "a hundred" → 100); null if none. */
export function wordValue(word: string): number | null {
  const w = word.toLowerCase().trim();
  const m = /^(\w+)[-\s](\w+)$/.exec(w);
  if (m && TENS.has(m[1]) && UNITS[m[2]] !== undefined && UNITS[m[2]] < 10) return UNITS[m[1]] + UNITS[m[2]];
  const plain = w.replace(/^(?:a|one) (?=hundred$)/, "");
  return UNITS[plain] ?? null;
}

// Words right before a number that make it a label: "Table 3", "Study 2", "Key Concept 12.5", "item 4".
const LABEL_BEFORE =
  /\b(?:tables?|fig(?:ure)?s?\.?|studies|study|tests?|experiments?|samples?|models?|steps?|stages?|phases?|waves?|hypothes[ie]s|research questions?|sections?|chapters?|chap\.|ch\.|appendix|eq(?:uation)?s?\.?|concepts?|boxes?|exhibits?|panels?|conditions?|versions?|items?|grades?|blocks?|rounds?|trials?|sessions?|days?|weeks?|months?|times?|no\.|vol\.|volume|issue|pp?\.|pages?|parts?|factors?|dimensions?|components?|clusters?|groups?|classes|series|cases?|examples?|scenarios?|notes?|questions?|§)\s*$/i;
// Nouns after a number that make it a count: "12 predictors", "five items", "3 factors".
const COUNT_AFTER =
  /^\s*(?:[-–]\s*)?(?:[a-z]+\s+)?(?:(?:additional|more|new|separate|latent|independent|observed|manifest|reflective|formative|first-order|second-order|control|distinct|different|Likert-type|response|trained)\s+)*(?:predictors?|items?|participants?|respondents?|subjects?|cases?|people|persons?|patients?|students?|teachers?|children|schools?|classes|firms?|companies|employees|nurses|families|households|observations?|factors?|constructs?|variables?|indicators?|dimensions?|subscales?|scales?|categories|options?|points?|years?|months?|weeks?|days?|hours?|minutes?|seconds?|waves?|groups?|conditions?|studies|articles?|papers?|coders?|raters?|judges?|experts?|sessions?|trials?|questions?|statements?|domains?|components?|clusters?|models?|paths?|parameters?|hypothes[ie]s|times|levels?|rounds?|segments?|interviews?|sites?|countries|regions?|units?|classrooms?|wards?|hospitals?|dollars|euros|pounds|cm|kg|mm|ms|km)\b/i;

/**
 * Every number in `s`, left to right, with its role. `value` is the number as written ("80%" → 80);
 * `proportion` is its 0–1 reading (0.80) for a percentage, else the value again.
 */
export function readNumbers(s: string): ReadNumber[] {
  const out: ReadNumber[] = [];
  // Digits: optional sign, integer part with optional thousands commas, optional decimal part after
  // "." or "·" (middle dot), or a leading-point decimal (".70", "·70"); "0. 70" is joined below.
  const re =
    /(?<![\w.·,\/^])([-−])?(?:(\d{1,3}(?:,\d{3})+(?!\d)|\d+)(?:([.·])(\d+))?|([.·])(\d+))(?:\s*(%|percent\b|per cent\b))?(?![\w])/g;
  for (let m = re.exec(s); m; m = re.exec(s)) {
    let start = m.index;
    let end = start + m[0].length;
    const intPart = m[2] ?? "0";
    let frac = m[4] ?? m[6] ?? "";
    let pct = m[7];
    // "0. 70": a decimal broken after its point. Only a leading zero is joined: "Study 2. 70 people" stays apart.
    if (m[2] === "0" && !frac && !pct) {
      const broken = /^[.·] (\d{1,4})(?![\w.·])(\s*(?:%|percent\b|per cent\b))?/.exec(s.slice(end));
      if (broken) {
        frac = broken[1];
        pct = broken[2]?.trim();
        end += broken[0].length;
        re.lastIndex = end;
      }
    }
    // A minus sign counts only when it stands apart: "1–5" is a range, "x-2" a label.
    let sign = m[1] ? -1 : 1;
    if (sign < 0) {
      const prev = s[start - 1];
      if (prev !== undefined && !/[\s(=\[:≥≤<>]/.test(prev)) {
        sign = 1;
        start += 1;
      }
    }
    const value = sign * Number(`${intPart.replace(/,/g, "")}${frac ? `.${frac}` : ""}`);
    if (!Number.isFinite(value)) continue;
    const percent = Boolean(pct);
    out.push({
      start,
      end,
      value,
      raw: s.slice(start, end),
      percent,
      proportion: percent ? value / 100 : value,
      word: false,
      role: "value",
    });
    // Citation numbers glued to a decimal: "0.8.21–25", "0.80.3": the tail is references.
    if (frac && !pct) {
      const ref = /^\.(\d+(?:\s*[-–,]\s*\d+)*)(?![\d.])/.exec(s.slice(end));
      if (ref) {
        const first = Number(ref[1].split(/[-–,]/)[0]);
        out.push({
          start: end + 1,
          end: end + ref[0].length,
          value: first,
          raw: ref[1],
          percent: false,
          proportion: first,
          word: false,
          role: "reference",
        });
        re.lastIndex = end + ref[0].length;
      }
    }
  }
  WORD_RE.lastIndex = 0;
  for (let m = WORD_RE.exec(s); m; m = WORD_RE.exec(s)) {
    const v = wordValue(m[0]);
    if (v === null) continue;
    // "one" as a pronoun ("one of the items", "no one") is not a number.
    if (/^one$/i.test(m[0])) {
      if (/^\s+(?:of|another|must|should|can|may|might|would|could|needs?)\b/i.test(s.slice(m.index + 3))) continue;
      if (/\b(?:no|any|every|some|each|the)\s*$/i.test(s.slice(0, m.index))) continue;
    }
    out.push({
      start: m.index,
      end: m.index + m[0].length,
      value: v,
      raw: m[0],
      percent: false,
      proportion: v,
      word: true,
      role: "value",
    });
  }
  out.sort((a, b) => a.start - b.start);
  for (const n of out) {
    if (n.role !== "value") continue;
    const before = s.slice(Math.max(0, n.start - 30), n.start);
    const after = s.slice(n.end, n.end + 40);
    const integer = Number.isInteger(n.value) && !/[.·]/.test(n.raw) && !n.percent;
    // "(2)" heading a list item, "(21)" or "[21]" as a reference number; "t(45)" and "ICC(2)" are neither.
    if (integer && !n.word && /(?:^|[^\w\s])\s*[(\[]$|\s[(\[]$/.test(before) && /^[)\]]/.test(after)) {
      n.role = /\[$/.test(before) || /^[)\]]\s*(?:[.,;:]|$)/.test(after) ? "reference" : "list_marker";
      continue;
    }
    // citation brackets: "[21–25]", "[3, 7]"
    if (!n.word && /\[[\d\s,–-]*$/.test(before) && /^[\d\s,–-]*\]/.test(after)) {
      n.role = "reference";
      continue;
    }
    // a superscript written with a caret: "0.80^21"
    if (/\^\s*$/.test(before)) {
      n.role = "reference";
      continue;
    }
    if (!n.word && LABEL_BEFORE.test(before)) {
      n.role = "label";
      continue;
    }
    // counts, and compound modifiers ("7-point", "two-tailed", "12-item") that are not values either
    if (integer && (COUNT_AFTER.test(after) || /^[-‐][a-z]/i.test(after))) n.role = "count";
  }
  return out;
}

/** The values only: numbers whose role is "value". */
export function readValues(s: string): ReadNumber[] {
  return readNumbers(s).filter((n) => n.role === "value");
}

/** Parse one number as written (".70", "0·7", "0. 70", "80%", "five"); null when `text` is not one number. */
export function parseNumber(text: string): number | null {
  const t = text.trim();
  const nums = readNumbers(t);
  if (nums.length !== 1 || nums[0].start !== 0 || nums[0].end !== t.length) return null;
  return nums[0].percent ? nums[0].proportion : nums[0].value;
}

/**
 * Ranges: "between .15 and .5", "from 0.60 to 0.70", "0.60 to 0.70", ".60–.70", "0.60-0.70".
 * A range needs both ends to be values; a dash between two integers ("1–5") counts too, and
 * the caller decides what it means.
 */
export function readRanges(s: string, nums: ReadNumber[] = readNumbers(s)): ReadRange[] {
  const out: ReadRange[] = [];
  const vals = nums.filter((n) => n.role === "value" || n.role === "count");
  for (let i = 0; i + 1 < vals.length; i++) {
    const a = vals[i];
    const b = vals[i + 1];
    const gap = s.slice(a.end, b.start);
    const before = s.slice(Math.max(0, a.start - 14), a.start);
    let form: ReadRange["form"] | null = null;
    if (/^\s*and\s*$/i.test(gap) && /\bbetween\s*$/i.test(before)) form = "between";
    else if (/^\s*(?:to|and)\s*$/i.test(gap) && /\bfrom\s*$/i.test(before)) form = "from_to";
    else if (/^\s*to\s*$/i.test(gap)) form = "to";
    else if (/^\s*[-–—]\s*$/.test(gap) || (gap === "" && s[a.end] === "-")) form = "dash";
    if (!form) continue;
    if (a.word !== b.word) continue;
    // "two to one" is a ratio, not a range
    if (form === "to" && /^\s*one\b/i.test(s.slice(b.start)) && a.word) continue;
    if (a.value > b.value && !(a.value < 0 || b.value < 0)) continue;
    out.push({
      start:
        form === "between" || form === "from_to"
          ? s.lastIndexOf(form === "between" ? "etween" : "rom", a.start) - 1
          : a.start,
      end: b.end,
      low: a,
      high: b,
      form,
    });
    i++;
  }
  return out;
}

/** Ratios: "10:1", "10 : 1", "ten to one", "5-to-1" (value = the first term over the second). */
export function readRatios(s: string): ReadRatio[] {
  const out: ReadRatio[] = [];
  const word = Object.keys(UNITS).join("|");
  const re = new RegExp(
    `\\b(\\d+(?:\\.\\d+)?|${word})\\s*(?::|[-\\s]to[-\\s])\\s*(\\d+(?:\\.\\d+)?|${word})\\b(?!\\s*(?:\\.\\d|%))`,
    "gi",
  );
  for (let m = re.exec(s); m; m = re.exec(s)) {
    const a = /\d/.test(m[1]) ? Number(m[1]) : wordValue(m[1]);
    const b = /\d/.test(m[2]) ? Number(m[2]) : wordValue(m[2]);
    if (a === null || b === null || b === 0) continue;
    // "X to Y" with numerals is a range unless the second term is 1 ("10 to 1")
    if (!m[0].includes(":") && b !== 1) continue;
    out.push({ start: m.index, end: m.index + m[0].length, value: a / b, raw: m[0] });
  }
  return out;
}
