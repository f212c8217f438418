import * as v from "valibot";
import { dsvFormat } from "d3";
import { CsvError, parseDecimal, readCsvText, shown, notDecimal, type CsvProblem } from "../kernel/csv-table";
import type { CsvColumn } from "../kernel/schema-csv";

/**
 * A forgiving reader of a table file (the factor and rate tables): it finds the delimiter (comma,
 * semicolon or tab) and a decimal comma, maps common header variants to the table's columns (and
 * says which it mapped), ignores columns it does not know (and says so), and reads a file with only
 * some columns as a partial update of the rows it names. Every problem is still named by line
 * (the header is line 1) and by the column as the file spells it; nothing is returned unless the
 * whole file is usable.
 */

/** A table's columns with the header variants each accepts (compared after `normaliseHeader`). */
export type ForgivingColumns = readonly (CsvColumn & { aliases?: readonly string[] })[];

export type ForgivingRead<R> = {
  /** The file's rows, complete: a partial file's rows carry the current values of the columns it lacks. */
  rows: R[];
  /** True when the file lacks some columns: it can only update rows the table has. */
  partial: boolean;
  /** Fields the file gives. */
  fields: string[];
  /** What the reader did that a person should know: delimiter, decimal comma, mapped and ignored headers. */
  notes: string[];
};

const DELIMITERS = [",", ";", "\t"] as const;
const DELIMITER_NAMES: Record<string, string> = { ",": "comma", ";": "semicolon", "\t": "tab" };

/** The delimiter of a file: the one of comma, semicolon and tab met most often in its header line outside quotes (comma on a tie). */
export function detectDelimiter(text: string): string {
  const header = text.split(/\r?\n/, 1)[0] ?? "";
  const unquoted = header.replace(/"[^"]*"/g, "");
  let best: string = ",";
  let most = 0;
  for (const d of DELIMITERS) {
    const n = unquoted.split(d).length - 1;
    if (n > most) [best, most] = [d, n];
  }
  return best;
}

/** A header as compared: lower case, units in brackets dropped, dashes, underscores and slashes as spaces, "a1 a3" for A1–A3. */
export function normaliseHeader(raw: string): string {
  return raw
    .replace(/^\uFEFF/, "")
    .toLowerCase()
    .replace(/\([^)]*\)|\[[^\]]*\]/g, " ")
    .replace(/[–—_\-/]+/g, " ")
    .replace(/%/g, " pct ")
    .replace(/[^a-z0-9 ]+/g, " ")
    .replace(/\s+/g, " ")
    .trim();
}

/** A decimal written with a comma (1,55 or -0,4), for files whose delimiter is not a comma. */
const DECIMAL_COMMA = /^[+-]?(\d+,\d*|,\d+)([eE][+-]?\d+)?$/;

type Mapping = { byIndex: (ForgivingColumns[number] | null)[]; notes: string[]; problems: CsvProblem[] };

function mapHeaders(header: readonly string[], columns: ForgivingColumns): Mapping {
  const byIndex: (ForgivingColumns[number] | null)[] = [];
  const notes: string[] = [];
  const problems: CsvProblem[] = [];
  const taken = new Map<string, string>();
  const ignored: string[] = [];
  for (const raw of header) {
    const name = normaliseHeader(raw);
    const column = columns.find((c) => normaliseHeader(c.column) === name || (c.aliases ?? []).some((a) => normaliseHeader(a) === name)) ?? null;
    byIndex.push(column);
    if (!column) {
      if (raw.trim() !== "") ignored.push(JSON.stringify(raw));
      continue;
    }
    const first = taken.get(column.field);
    if (first !== undefined) problems.push({ line: 1, column: raw, message: `a second column for ${column.column} (the first is ${JSON.stringify(first)}; expected each once)` });
    taken.set(column.field, raw);
    if (raw !== column.column) notes.push(`column ${JSON.stringify(raw)} read as ${column.column}`);
  }
  if (ignored.length > 0) notes.push(`column${ignored.length === 1 ? "" : "s"} ${ignored.join(", ")} not in the table: ignored`);
  return { byIndex, notes, problems };
}

function readCell(raw: string, column: CsvColumn, decimalComma: boolean): { value: unknown; usedComma: boolean } {
  const trimmed = raw.trim();
  if (column.kind === "text") return { value: readCsvText(trimmed), usedComma: false };
  if (trimmed === "") return { value: undefined, usedComma: false };
  if (decimalComma && DECIMAL_COMMA.test(trimmed)) return { value: parseDecimal(trimmed.replace(",", ".")), usedComma: true };
  return { value: parseDecimal(trimmed) ?? shown(trimmed), usedComma: false };
}

/** Problems of one checked row, each on the column as the file names it. */
function rowProblems(issues: readonly v.BaseIssue<unknown>[], line: number, headerOf: (field: string) => string): CsvProblem[] {
  const seen = new Set<string>();
  const out: CsvProblem[] = [];
  for (const issue of issues) {
    const field = issue.path?.[0] ? String((issue.path[0] as { key: unknown }).key) : "";
    const column = headerOf(field);
    const text = `${column}:${issue.message}`;
    if (seen.has(text)) continue;
    seen.add(text);
    out.push({ line, column, message: issue.message.length > 200 ? `${issue.message.slice(0, 200)}…` : issue.message });
  }
  return out;
}

/**
 * Reads a table file forgivingly (see the module comment). `current` is the table the file updates:
 * a partial file's rows are matched to it by `keyField`, and take its values for missing columns
 * and empty cells.
 * @throws CsvError naming every problem by line and column; nothing is returned unless the whole file is usable
 */
export function readTableForgiving<R extends Record<string, unknown>>(
  text: string,
  columns: ForgivingColumns,
  schema: v.GenericSchema<unknown, R>,
  keyField: keyof R & string,
  current: readonly R[],
  fileLabel: string,
): ForgivingRead<R> {
  const body = text.replace(/^\uFEFF/, "");
  const delimiter = detectDelimiter(body);
  const [header = [], ...records] = dsvFormat(delimiter).parseRows(body).filter((r) => r.some((cell) => cell.trim() !== ""));
  const mapping = mapHeaders(header, columns);
  const notes = delimiter === "," ? [] : [`${DELIMITER_NAMES[delimiter]}-separated file`];
  notes.push(...mapping.notes);
  const problems = [...mapping.problems];
  const keyColumn = columns.find((c) => c.field === keyField);
  const keyIndex = mapping.byIndex.findIndex((c) => c?.field === keyField);
  if (keyIndex < 0) problems.push({ line: 1, column: keyColumn?.column ?? keyField, message: `missing column: each row needs its ${keyColumn?.column ?? keyField} to be matched (accepted headers: ${[keyColumn?.column, ...(keyColumn?.aliases ?? [])].join(", ")})` });
  if (records.length === 0) problems.push({ line: 2, column: keyColumn?.column ?? keyField, message: "no rows (expected at least one)" });
  if (problems.length > 0) throw new CsvError(fileLabel, problems);

  const fields = mapping.byIndex.flatMap((c) => (c ? [c.field] : []));
  const partial = columns.some((c) => !fields.includes(c.field));
  const missing = columns.filter((c) => !fields.includes(c.field)).map((c) => c.column);
  if (partial) notes.push(`partial update: columns ${missing.join(", ")} are not in the file and keep their current values`);
  const headerOf = (field: string) => header[mapping.byIndex.findIndex((c) => c?.field === field)] ?? columns.find((c) => c.field === field)?.column ?? (field || "(row)");
  const byKey = new Map(current.map((r) => [String(r[keyField]), r]));
  const seen = new Map<string, number>();
  const rows: R[] = [];
  let usedComma = false;
  records.forEach((cells, index) => {
    const line = index + 2;
    const key = (cells[keyIndex] ?? "").trim();
    const base = byKey.get(key);
    const first = seen.get(key);
    if (first !== undefined) problems.push({ line, column: header[keyIndex] ?? keyField, message: `duplicate ${key} (first on line ${first}; expected each once)` });
    seen.set(key, line);
    if (partial && !base) {
      problems.push({ line, column: header[keyIndex] ?? keyField, message: `${JSON.stringify(key)} is not in the table, and a new row needs every column (missing: ${missing.join(", ")})` });
      return;
    }
    const row: Record<string, unknown> = { ...(base ?? {}) };
    mapping.byIndex.forEach((column, i) => {
      if (!column) return;
      const cell = readCell(cells[i] ?? "", column, delimiter !== ",");
      usedComma ||= cell.usedComma;
      if (cell.value === undefined) {
        if (base === undefined) problems.push({ line, column: header[i] ?? column.column, message: "empty (a value is required)" });
        return;
      }
      if (column.kind === "number" && typeof cell.value === "string") {
        problems.push({ line, column: header[i] ?? column.column, message: notDecimal(cell.value) });
        return;
      }
      row[column.field] = cell.value;
    });
    const result = v.safeParse(schema, row);
    if (result.success) rows.push(result.output);
    else problems.push(...rowProblems(result.issues, line, headerOf).filter((p) => !problems.some((q) => q.line === p.line && q.column === p.column)));
  });
  if (problems.length > 0) throw new CsvError(fileLabel, problems);
  if (usedComma) notes.push("decimal commas read as decimal points");
  return { rows, partial, fields, notes };
}
