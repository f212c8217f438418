import { csvParseRows } from "d3";

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

/** Raised when a CSV file has problems; carries every problem, not just the first. */
export class CsvError extends Error {
  constructor(
    readonly fileLabel: string,
    readonly problems: CsvProblem[],
  ) {
    super(`${fileLabel}: ${problems.map((p) => `line ${p.line}, column ${p.column}: ${p.message}`).join("; ")}`);
    this.name = "CsvError";
  }
}

export type ColumnSpec =
  | { name: string; kind: "number"; min?: number; max?: number; optional?: boolean }
  | { name: string; kind: "text"; optional?: boolean; choices?: readonly string[] };

export type CsvRecord = Record<string, string | number | null>;

/**
 * Parses CSV text against a column list: every required column must be present, every number
 * cell finite and in range. All problems are collected before anything is returned, so a caller
 * either gets every row or none.
 * @throws CsvError listing each bad cell with its line and column
 */
export function parseCsvTable(text: string, columns: readonly ColumnSpec[], fileLabel: string): CsvRecord[] {
  const rows = csvObjects(text.replace(/^\uFEFF/, ""));
  const problems: CsvProblem[] = [];
  for (const column of columns) {
    if (!column.optional && !rows.columns.includes(column.name)) {
      problems.push({ line: 1, column: column.name, message: `missing column (expected columns: ${columns.map((c) => c.name).join(", ")})` });
    }
  }
  if (problems.length > 0) throw new CsvError(fileLabel, problems);
  const out: CsvRecord[] = rows.map((row, index) => {
    const line = index + 2;
    const record: CsvRecord = {};
    for (const column of columns) {
      const raw = (row[column.name] ?? "").trim();
      if (raw === "") {
        if (!column.optional) problems.push({ line, column: column.name, message: "empty (a value is required)" });
        record[column.name] = column.kind === "number" ? null : "";
        continue;
      }
      if (column.kind === "text") {
        if (column.choices && !column.choices.includes(raw)) {
          problems.push({ line, column: column.name, message: `"${raw}" is not allowed (expected one of ${column.choices.join(", ")})` });
        }
        record[column.name] = raw;
        continue;
      }
      const value = Number(raw);
      if (!Number.isFinite(value)) {
        problems.push({ line, column: column.name, message: `"${raw}" is not a number` });
      } else if ((column.min !== undefined && value < column.min) || (column.max !== undefined && value > column.max)) {
        problems.push({ line, column: column.name, message: `${value} is out of range (expected ${column.min ?? "−∞"} to ${column.max ?? "∞"})` });
      }
      record[column.name] = value;
    }
    return record;
  });
  if (problems.length > 0) throw new CsvError(fileLabel, problems);
  return out;
}

/** The number in a record parsed by parseCsvTable (required columns only). */
export function num(record: CsvRecord, name: string): number {
  const value = record[name];
  if (typeof value !== "number") throw new TypeError(`column ${name} is not a number`);
  return value;
}

/** The text in a record parsed by parseCsvTable. */
export function text(record: CsvRecord, name: string): string {
  const value = record[name];
  return typeof value === "string" ? value : "";
}
