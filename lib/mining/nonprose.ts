// Non-prose lines: code listings, console/software output, displayed formulas and table rows. On real
// PDFs (software vignettes, statistics papers) these gave nearly all false statements: a model
// parameter ω read as McDonald's omega, a console row "0.68 0.55 0.50" read as three cut-offs. The
// miner keeps such lines out of its sentences (lib/mining/index.ts), so a prose sentence before a code
// block ends there and nothing inside the block gives a statement.
//
// Signals, strongest first: the PDF layer's monospaced font (layout.ts, per line); console prompts
// ("R> ", "> x <- …", ">>> ", "$ "); R's printed output ("## …", "[1] 0.5"); code syntax (assignment
// arrows, calls with named arguments, lines ending in "{" or ";"); rows that are mostly numbers; lines
// dense in mathematical symbols with few words. Each threshold below is common practice, no source.

export type NonProseKind = "code" | "output" | "formula" | "table";

const PROMPT = /^(?:R>|>>>|In \[\d+\]:|\$ (?=[a-z./])|> (?=[\w.]+\s*(?:<-|=|\(|\[|\$|#))|\+ (?=[\w.]+\s*(?:=|\()|\)))/;
const OUTPUT = /^(?:##(?:\s|$)|#>\s|\[\d+\]\s+(?:[-−\d."']|TRUE|FALSE|NA\b))/;
const CODE_SYNTAX =
  /(?:[\w.\])]\s*<-\s*\S|\s->\s*[\w.]+\s*$|^\s*(?:library|require|import|def|function|for|while|return|print|setwd|source)\s*\(|^[{}]\s*$|[{;]\s*$|^\s*}\s*(?:else\b|$)|^\s*#(?!\d))/;
const NAMED_ARGS = /[\w.]+\([^()]*\b[\w.]+\s*=\s*[^=\s][^()]*\)/;
const MATH = /[=+×∑∏√∫⊤∂∈∉≈∼∝∞|^_{}\\′ˆ˜¯]|[\u0370-\u03ff]|[\u2200-\u22ff]|[\u{1d400}-\u{1d7ff}]|−/gu;
const STAT_REPORT = /(?:[=<>≤≥]|&lt;)\s*[-−]?(?:\d+(?:[.,·]\d+)?|[.,·]\d+)/g;
const NUMBER = /^[-−+]?[([]?(?:\d+(?:[.,·]\d+)*|[.,·]\d+)[)\]]?[*%†‡]*[,;]?$/;

/** Word-like tokens of ordinary prose: letters only (a final punctuation mark allowed), two letters or more. */
function proseWords(tokens: string[]): number {
  return tokens.filter((t) => /^[("“']?\p{L}[\p{Ll}'’-]+[)"”'.,;:?!]*$/u.test(t)).length;
}

/** What kind of non-prose a line is, or null for a prose line (or one that cannot be told). */
export function nonProseLine(line: string): NonProseKind | null {
  const t = line.trim();
  if (!t) return null;
  if (PROMPT.test(t)) return "code";
  if (OUTPUT.test(t)) return "output";
  const tokens = t.split(/\s+/);
  const words = proseWords(tokens);
  const wordShare = words / tokens.length;
  // A statistic reported in prose ("CFI = .95, RMSEA = .04") is neither a formula nor a table row: each
  // comparison with its number counts as one word.
  const reports = (t.match(STAT_REPORT) ?? []).length;
  const bare = t.replace(STAT_REPORT, " STAT ");
  const bareTokens = bare.trim().split(/\s+/);
  const proseShare = (proseWords(bareTokens) + reports) / bareTokens.length;
  if (CODE_SYNTAX.test(t) && wordShare < 0.7) return "code";
  if (NAMED_ARGS.test(t) && wordShare < 0.5) return "code";
  const numbers = bareTokens.filter((x) => NUMBER.test(x)).length;
  if (numbers >= 3 && numbers >= 0.5 * bareTokens.length) return "table";
  if (numbers >= 4 && words + reports <= 2) return "table";
  const math = (bare.match(MATH) ?? []).length;
  const equationNumber = /\(\d{1,3}[a-z]?\)$/.test(t);
  if (math >= 3 && proseShare < 0.4) return "formula";
  if ((math >= 1 && equationNumber && proseShare < 0.5) || (math >= 2 && words + reports <= 1 && tokens.length <= 12))
    return "formula";
  // Symbol soup: a line where letters are a minority of its visible characters.
  const visible = t.replace(/\s/g, "").length;
  const letters = (t.match(/\p{L}/gu) ?? []).length;
  if (visible >= 10 && tokens.length >= 3 && letters < 0.4 * visible && words <= 1)
    return numbers >= 2 ? "table" : "formula";
  return null;
}

/** Mathematical symbols of a line, not counting comparisons with a number ("= .89"). */
function mathSymbols(t: string): number {
  return (t.replace(STAT_REPORT, " STAT ").match(MATH) ?? []).length;
}

/**
 * Whether a line can carry on a prose sentence that the line before left open ("… (Okafor,\n2002).",
 * "… reached\nα = .89.", "… (CFI = .95,\nRMSEA = .05, 90% CI [.04,\n.06])."): it ends with a full
 * stop, comma or semicolon (inside brackets or quotes too) and carries at most one mathematical symbol,
 * unlike the lines of a displayed equation ("… − αi(τ)] = 0.").
 */
export function closesSentence(line: string): boolean {
  const t = line.trim();
  return /[.!?,;]["'”’)\]]*$/.test(t) && mathSymbols(t) <= 1;
}

/**
 * A sentence that reads as code, console output, a formula or a table row even though its lines were
 * not caught one by one (text glued across lines by a PDF producer, or a plain-text input).
 */
export function nonProseSentence(sentence: string): NonProseKind | null {
  const t = sentence.trim();
  if (/(?:^|\s)(?:R>|##|>>>)\s/.test(t) || /[\w.\])]\s*<-\s*\S/.test(t)) return "code";
  const reports = (t.match(STAT_REPORT) ?? []).length;
  const bare = t.replace(STAT_REPORT, " STAT ");
  const tokens = bare.split(/\s+/);
  const numbers = tokens.filter((x) => NUMBER.test(x)).length;
  const words = proseWords(tokens) + reports;
  if (numbers >= 4 && numbers >= 0.4 * tokens.length) return "table";
  const math = (bare.match(MATH) ?? []).length;
  if (math >= 4 && math >= words) return "formula";
  // Prose with inline mathematics throughout ("… by cjβˆ ± wασˆ cjV c⊤, where wα is …"): at least five
  // words carry a symbol, and they are a fifth of the sentence or more.
  const mathTokens = tokens.filter((x) => x !== "STAT" && /[+×∑∏√∫⊤∂∈≈∼^_{}\\ˆ˜¯−±]|[\u0370-\u03ff]/u.test(x)).length;
  if (mathTokens >= 5 && mathTokens >= 0.2 * tokens.length) return "formula";
  return null;
}
