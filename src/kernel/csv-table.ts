import { csvFormat, csvParseRows } from "d3";

/**
 * CSV text as one record per data row keyed by the header's names (a missing cell is ""), with the
 * header's names in `columns`: what d3's csvParse gives, without the code it compiles with
 * Function() (the site's Content-Security-Policy allows no eval, in pages or workers).
 */
export function csvObjects(text: string): Record<string, string>[] & { columns: string[] } {
  const [header = [], ...body] = csvParseRows(text);
  const rows = body.map((cells) => Object.fromEntries(header.map((name, i) => [name, cells[i] || ""])) as Record<string, string>);
  return Object.assign(rows, { columns: [...new Set(header)] });
}

/** A problem found in one cell of a CSV file. Line numbers count the header as line 1. */
export interface CsvProblem {
  line: number;
  column: string;
  message: string;
}

/** How many problems a message lists before "… and N more" (a large bad file stays readable). */
export const MAX_LISTED_PROBLEMS = 20;

/** The problems as lines `line L, column C: message`, at most `max` of them and then "… and N more". */
export function listProblems(problems: readonly CsvProblem[], max = MAX_LISTED_PROBLEMS): string[] {
  const lines = problems.slice(0, max).map((p) => `line ${p.line}, column ${p.column}: ${p.message}`);
  if (problems.length > max) lines.push(`… and ${problems.length - max} more`);
  return lines;
}

/** Raised when a CSV file has problems; carries every problem, and lists the first few in its message. */
export class CsvError extends Error {
  constructor(
    readonly fileLabel: string,
    readonly problems: CsvProblem[],
  ) {
    super(`${fileLabel}: ${listProblems(problems).join("; ")}`);
    this.name = "CsvError";
  }
}

const DECIMAL = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

/**
 * A decimal number written as text (digits, an optional point and exponent), or null. Refuses what
 * JavaScript's Number() would also take but a person did not mean as a decimal: hexadecimal
 * (0x10), binary, octal, "Infinity" and the empty text.
 * @example parseDecimal("-0.34") // -0.34; parseDecimal("0x10") // null
 */
export function parseDecimal(text: string): number | null {
  const trimmed = text.trim();
  if (!DECIMAL.test(trimmed)) return null;
  const value = Number(trimmed);
  return Number.isFinite(value) ? value : null;
}

/** Units a person may type after a number in a field that gives its unit beside it. */
const TYPED_UNITS = /^(%|mm|cm|m|km|m[²2]|m[³3]|N|kN|MN|Pa|kPa|MPa|GPa|m\/s|kg|t|kg\/m[²³23]|kgCO2e\/(kg|m[²³23]|t)|EUR|€|min|years?)$/;

/**
 * What a person most likely meant by a number written another way, as the end of a message ("" when
 * nothing fits): a decimal comma (12,5), thousands apart (7,850: either), a unit or % typed after it (5%).
 * @example numberHint("12,5") // ": write the decimal with a point (12.5)"
 */
export function numberHint(raw: string): string {
  const t = raw.trim();
  // only for text that is no number at all (1e2 and 0x10 are read, or refused, for what they are)
  if (t === "" || !Number.isNaN(Number(t))) return "";
  if (/^[+-]?\d{1,3}(,\d{3})+(\.\d+)?$/.test(t)) {
    const decimal = /^[+-]?\d{1,3},\d{3}$/.test(t) ? `, or a decimal with a point (${t.replace(",", ".")})` : "";
    return `: write it without the thousands separator (${t.replace(/,/g, "")})${decimal}`;
  }
  if (/^[+-]?\d+,\d+$/.test(t)) return `: write the decimal with a point (${t.replace(",", ".")})`;
  // a unit written after the number (a stray letter is more likely a typo: "16o" is not "16")
  const suffixed = /^([+-]?(?:\d+\.?\d*|\.\d+))\s*(\S+)$/.exec(t);
  if (suffixed && TYPED_UNITS.test(suffixed[2]!)) return `: write the number alone (${suffixed[1]}), without "${suffixed[2]}"`;
  return "";
}

/** The message for text that parseDecimal refused: `"five" is not a number` (with a hint where one fits, numberHint), or for 0x10, 1e999 and the like what is expected. */
export function notDecimal(raw: string): string {
  return Number.isNaN(Number(raw.trim())) ? `"${shown(raw)}" is not a number${numberHint(raw)}` : `"${shown(raw)}" is not a decimal number (expected digits with an optional point and exponent, e.g. 16 or 1.5e3)`;
}

/** Text shown back in a message, shortened so a huge cell cannot make a huge message. */
export function shown(raw: string, max = 40): string {
  return raw.length > max ? `${raw.slice(0, max)}…` : raw;
}

const FORMULA_START = /^[=+\-@\t\r]/;

/**
 * One cell for a CSV file a spreadsheet may open: a text cell that begins with =, +, -, @, a tab
 * or a carriage return is prefixed with a single quote so a spreadsheet shows it as text instead
 * of running it as a formula (the OWASP advice on CSV injection). Numbers, and text that is a
 * plain decimal number such as "-0.34", are left as they are so they stay numbers. Text already
 * beginning with a quote before such a character gets one more quote, so readCsvText gives back
 * exactly what was written.
 */
export function csvCell(value: unknown): string {
  if (value === null || value === undefined) return "";
  if (typeof value === "number" || typeof value === "boolean") return String(value);
  const text = String(value);
  if (parseDecimal(text) !== null) return text;
  if (FORMULA_START.test(text) || (text.startsWith("'") && FORMULA_START.test(text.slice(1).replace(/^'+/, "")))) return `'${text}`;
  return text;
}

/** A text cell as read back: the quote csvCell added is removed. */
export function readCsvText(raw: string): string {
  return raw.startsWith("'") && FORMULA_START.test(raw.slice(1).replace(/^'+/, "")) ? raw.slice(1) : raw;
}

/** d3's csvFormat with every cell passed through csvCell: the CSV writer of the site and the command line. */
export function formatCsv(rows: readonly Record<string, unknown>[], columns: readonly string[]): string {
  return csvFormat(rows.map((row) => Object.fromEntries(columns.map((c) => [c, csvCell(row[c])]))), [...columns]);
}
