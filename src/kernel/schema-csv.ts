import * as v from "valibot";
import { numberIn, oneOf, requiredText } from "./validate";
import { CsvError, csvObjects, formatCsv, parseDecimal, readCsvText, shown, type CsvProblem } from "./csv-table";

/**
 * Reading and writing a CSV table whose rows are checked by a valibot schema, so the ranges a
 * cell editor shows and the ranges an import enforces are one definition. Line numbers count the
 * header as line 1. Shared by the carbon factor table and the cost rate table.
 */

/** How one CSV column maps to one field of a row object. */
export type CsvColumn = { column: string; field: string; kind: "number" | "text" };

function cellValue(raw: string, kind: CsvColumn["kind"]): unknown {
  const trimmed = raw.trim();
  if (kind === "text") return readCsvText(trimmed);
  if (trimmed === "") return undefined;
  // Keep the raw text (shortened) when it is not a decimal number so the message can show what was there.
  return parseDecimal(trimmed) ?? shown(trimmed);
}

/**
 * Parses CSV text into rows checked by `schema`; every bad cell is collected (line and column)
 * and nothing is returned unless the whole file is valid. The header must hold exactly the
 * listed columns (order free). `rowKey` names the field that must be unique (e.g. material id).
 * @throws CsvError listing every bad cell, missing or unexpected column and duplicate key
 */
export function parseSchemaCsv<S extends v.GenericSchema>(
  text: string,
  columns: readonly CsvColumn[],
  schema: S,
  fileLabel: string,
  rowKey?: string,
): v.InferOutput<S>[] {
  const parsed = csvObjects(text.replace(/^\uFEFF/, ""));
  const problems: CsvProblem[] = [];
  const expected = columns.map((c) => c.column);
  for (const name of expected) {
    if (!parsed.columns.includes(name)) problems.push({ line: 1, column: name, message: `missing column (expected columns: ${expected.join(", ")})` });
  }
  for (const name of parsed.columns) {
    if (!expected.includes(name)) problems.push({ line: 1, column: name, message: `unexpected column (expected columns: ${expected.join(", ")})` });
  }
  if (problems.length > 0) throw new CsvError(fileLabel, problems);
  if (parsed.length === 0) throw new CsvError(fileLabel, [{ line: 2, column: expected[0] ?? "", message: "no rows (expected at least one)" }]);

  const columnOfField = new Map(columns.map((c) => [c.field, c.column]));
  const seen = new Map<unknown, number>();
  const out: v.InferOutput<S>[] = [];
  parsed.forEach((record, index) => {
    const line = index + 2;
    const row: Record<string, unknown> = {};
    for (const c of columns) {
      const raw = record[c.column] ?? "";
      const value = cellValue(raw, c.kind);
      if (c.kind === "number" && value === undefined) {
        problems.push({ line, column: c.column, message: "empty (a value is required)" });
      }
      row[c.field] = value;
    }
    const result = v.safeParse(schema, row);
    if (result.success) {
      out.push(result.output);
    } else {
      const reported = new Set<string>();
      for (const issue of result.issues) {
        const key = issue.path?.[0] ? String((issue.path[0] as { key: unknown }).key) : "";
        const column = columnOfField.get(key) ?? (key || "(row)");
        // An empty number cell is already reported once above.
        if (row[key] === undefined && columns.some((c) => c.field === key && c.kind === "number")) continue;
        const text = `${column}:${issue.message}`;
        if (reported.has(text)) continue;
        reported.add(text);
        problems.push({ line, column, message: issue.message.length > 200 ? `${issue.message.slice(0, 200)}…` : issue.message });
      }
    }
    if (rowKey !== undefined) {
      const key = row[rowKey];
      const first = seen.get(key);
      if (first !== undefined) {
        problems.push({ line, column: columnOfField.get(rowKey) ?? rowKey, message: `duplicate ${String(key)} (first on line ${first}; expected each once)` });
      } else {
        seen.set(key, line);
      }
    }
  });
  if (problems.length > 0) throw new CsvError(fileLabel, problems);
  return out;
}

/**
 * Writes rows as CSV with the listed columns, in order; numbers as their shortest exact decimal,
 * text that a spreadsheet would run as a formula neutralised (csvCell), read back unchanged.
 */
export function rowsToCsv(rows: readonly Record<string, unknown>[], columns: readonly CsvColumn[]): string {
  const records = rows.map((row) => Object.fromEntries(columns.map((c) => [c.column, row[c.field]])));
  return `${formatCsv(records, columns.map((c) => c.column))}\n`;
}

/** One column of a file whose headers are the row's own keys: the kind of cell and its schema. */
export type CsvCell = { kind: CsvColumn["kind"]; schema: v.GenericSchema };

/**
 * The columns and row schema of a CSV file whose header names are the row's keys (the catalogue
 * files), from one declaration per column, in file order.
 */
export function csvRowSpec<E extends Record<string, CsvCell>>(cells: E) {
  const columns: CsvColumn[] = Object.entries(cells).map(([column, cell]) => ({ column, field: column, kind: cell.kind }));
  const entries = Object.fromEntries(Object.entries(cells).map(([key, cell]) => [key, cell.schema])) as { [K in keyof E]: E[K]["schema"] };
  return { columns, schema: v.object(entries) };
}

/** A column by name and kind, with a range for numbers or a list of choices for text. */
export type ColumnSpec = { name: string; kind: "number"; min?: number; max?: number } | { name: string; kind: "text"; choices?: readonly string[] };

function specSchema(spec: ColumnSpec): v.GenericSchema {
  if (spec.kind === "text") return spec.choices ? oneOf(spec.choices as unknown as readonly [string, ...string[]]) : requiredText(10_000);
  return numberIn(spec.min ?? -Infinity, spec.max ?? Infinity);
}

/**
 * Parses CSV text against a plain column list, by the same reader as every other table
 * (parseSchemaCsv): each bad cell with its line and column, a capped list in the message.
 * @throws CsvError listing each bad cell
 */
export function parseCsvTable(text: string, columns: readonly ColumnSpec[], fileLabel: string): Record<string, string | number>[] {
  const spec = csvRowSpec(Object.fromEntries(columns.map((c) => [c.name, { kind: c.kind, schema: specSchema(c) }])));
  return parseSchemaCsv(text, spec.columns, spec.schema, fileLabel) as Record<string, string | number>[];
}
