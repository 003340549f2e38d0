// Section detection by headings, and the reference list cut.
import type { Section } from "./contract";

const NUM = String.raw`(?:(?:\d+(?:\.\d+)*\.?|[IVX]+\.|[A-H]\.)\s+)?`;
const SECTION_WORDS: [Section, RegExp][] = [
  [
    "methods",
    /^(?:materials and )?(?:methods?|methodology|research (?:design|method(?:s|ology)?)|measures?|measurement(?: model| quality)?|instruments?|participants(?: and (?:setting|procedure))?|procedures?|data(?: collection| analysis| and methods?| and method)?|(?:statistical |data )?analys[ie]s|analytic(?:al)? strategy|sample(?: and procedure)?|study design|design(?: and participants)?|estimation strategy|materials and methods|assessment of the .*|item selection|confirmatory factor analysis|reliability|validity checks|coding procedure|common method (?:bias|variance)|endogeneity|survey|power|questionnaire|factor structure|test.retest|fidelity observations|reading outcomes|structural model|sample and procedure|design and participants|participants and setting|instrument)$/i,
  ],
  ["results", /^(?:results?|findings|results and discussion)$/i],
  ["discussion", /^(?:discussion|conclusions?|general discussion|concluding remarks|limitations)$/i],
  ["introduction", /^(?:introduction|background|literature review|theoretical background|theory|related work)$/i],
];
const REFERENCE_HEADING = new RegExp(
  String.raw`^\s*${NUM}(references|bibliography|works cited|literature cited|reference list)\s*$`,
  "i",
);

// Built once: parseHeading runs on every line of every page.
const HEADING_RE = new RegExp(String.raw`^(${NUM})(\p{Lu}[^.!?]*)$`, "u");

export type Heading = { level: number; section: Section | null; text: string };

/** A line is a heading when it is short, has no final full stop and starts with a capital or a number. */
export function parseHeading(line: string): Heading | null {
  const t = line.trim();
  if (!t || t.length > 70 || (/[.,;:]$/.test(t) && !/^\d+\.$/.test(t))) return null;
  const m = HEADING_RE.exec(t);
  if (!m) return null;
  const words = m[2].split(/\s+/);
  if (words.length > 8) return null;
  const numbering = m[1].trim();
  const level = numbering ? numbering.replace(/\.$/, "").split(".").length : 1;
  const name = m[2].trim();
  for (const [section, re] of SECTION_WORDS) if (re.test(name)) return { level, section, text: name };
  // Unknown headings count only when numbered, or Title Case with few words (otherwise prose lines).
  if (
    numbering ||
    (words.length <= 5 && words.every((w) => /^(\p{Lu}|and|of|the|in|for|to|a|an|on|with|–|-|&)/u.test(w)))
  ) {
    return { level, section: null, text: name };
  }
  return null;
}

export function isReferenceHeading(line: string): boolean {
  return REFERENCE_HEADING.test(line);
}
