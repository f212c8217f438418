import * as v from "valibot";

/** A change to one field of several rows at once: multiply it by a factor, or set it to a value. */
export type GroupEdit = { keys: readonly string[]; field: string; op: "times" | "set"; value: number };

export type GroupEditResult<R> =
  | { ok: true; rows: R[]; changes: { key: string; from: unknown; to: number }[] }
  | { ok: false; problems: string[] };

/**
 * Applies a group edit to every row whose key is listed (for example every steel row's A1–A3 × 0.8),
 * each edited row checked by the same row schema as a cell edit and an import: any refused row
 * refuses the whole edit, every problem named by row, and nothing is applied.
 * @example groupEditRows(rows, "material", FactorRowSchema, { keys: ["steel-plate"], field: "a1a3KgCO2ePerKg", op: "times", value: 0.8 })
 */
export function groupEditRows<R extends Record<string, unknown>>(rows: readonly R[], keyField: keyof R & string, schema: v.GenericSchema<unknown, R>, edit: GroupEdit): GroupEditResult<R> {
  if (!Number.isFinite(edit.value)) return { ok: false, problems: [`${edit.op === "times" ? "factor" : "value"}: ${edit.value} is not a number`] };
  if (edit.keys.length === 0) return { ok: false, problems: ["no rows chosen (expected at least one)"] };
  const chosen = new Set(edit.keys);
  const problems: string[] = [];
  const changes: { key: string; from: unknown; to: number }[] = [];
  const next = rows.map((row) => {
    const key = String(row[keyField]);
    if (!chosen.has(key)) return row;
    const from = row[edit.field];
    if (typeof from !== "number") {
      problems.push(`${key}: ${edit.field} is not a number field`);
      return row;
    }
    // Rounded to 12 significant figures so 2.46 × 0.8 reads 1.968, not 1.9680000000000002.
    const to = Number((edit.op === "times" ? from * edit.value : edit.value).toPrecision(12));
    const result = v.safeParse(schema, { ...row, [edit.field]: to });
    if (!result.success) {
      problems.push(`${key}: ${result.issues.map((i) => i.message).join("; ")}`);
      return row;
    }
    if (!Object.is(from, to)) changes.push({ key, from, to });
    return result.output;
  });
  return problems.length > 0 ? { ok: false, problems } : { ok: true, rows: next, changes };
}
