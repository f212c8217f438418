import * as v from "valibot";
import { parseDecimal, notDecimal } from "../kernel/csv-table";

/** The result of checking one edited cell: the updated row, or a message saying what is allowed. */
export type RowEditResult<R> = { ok: true; row: R } | { ok: false; message: string };

/**
 * Checks an edit of one cell of a table row against the row's schema (the schema the CSV import
 * uses, so a cell editor and an import accept exactly the same values). A number cell is read
 * from its typed text; an empty or non-numeric text is refused. Cross-field rules of the schema
 * (e.g. low ≤ rate ≤ high) are reported on the field they are forwarded to.
 * @param kind "number" for number cells (typed text converted), "text" for text cells
 * @returns the row with the edit applied, or the first message for that field
 */
export function checkRowEdit<R extends Record<string, unknown>>(
  schema: v.GenericSchema<unknown, R>,
  row: R,
  field: keyof R & string,
  raw: string,
  kind: "number" | "text",
): RowEditResult<R> {
  let value: unknown = raw;
  if (kind === "number") {
    const trimmed = raw.trim();
    if (trimmed === "") return { ok: false, message: "empty (a value is required)" };
    const n = parseDecimal(trimmed);
    if (n === null) return { ok: false, message: notDecimal(trimmed) };
    value = n;
  }
  const candidate = { ...row, [field]: value };
  const result = v.safeParse(schema, candidate);
  if (result.success) return { ok: true, row: result.output };
  // Problems the row already had elsewhere do not block this edit; new ones do (a cross-field
  // rule broken by this edit may be reported on the other field, so it is named).
  const before = v.safeParse(schema, row);
  const existing = new Set(before.success ? [] : before.issues.map(issueText));
  const fresh = result.issues.filter((issue) => issueKey(issue) === field || !existing.has(issueText(issue)));
  const first = fresh.find((issue) => issueKey(issue) === field) ?? fresh[0];
  if (!first) return { ok: true, row: candidate as R };
  const key = issueKey(first);
  return { ok: false, message: key === field || key === "" || first.message.startsWith(key) ? first.message : `${key}: ${first.message}` };
}

function issueKey(issue: v.BaseIssue<unknown>): string {
  const item = issue.path?.[0] as { key: unknown } | undefined;
  return item ? String(item.key) : "";
}

function issueText(issue: v.BaseIssue<unknown>): string {
  return `${issueKey(issue)}:${issue.message}`;
}
