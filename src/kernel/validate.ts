import * as v from "valibot";

/**
 * Shared valibot building blocks so every field's message says the value and what is allowed,
 * e.g. `-3 (expected a number from 0.5 to 250 m)`. The field path is added by formatIssues.
 */

function show(value: unknown): string {
  if (typeof value === "string") return JSON.stringify(value);
  if (typeof value === "number" || typeof value === "boolean" || value === null) return String(value);
  if (value === undefined) return "nothing";
  return Array.isArray(value) ? "a list" : typeof value === "object" ? "an object" : String(value);
}

/** A finite number in [min, max] with its unit in the message. */
export function numberIn(min: number, max: number, unit = "") {
  const range = max === Infinity ? `of at least ${min}` : `from ${min} to ${max}`;
  const allowed = `expected a number ${range}${unit ? ` ${unit}` : ""}`;
  return v.pipe(
    v.number((issue) => `${show(issue.input)} (${allowed})`),
    v.check((x) => Number.isFinite(x), (issue) => `${show(issue.input)} (${allowed})`),
    v.minValue(min, (issue) => `${show(issue.input)} (${allowed})`),
    v.maxValue(max, (issue) => `${show(issue.input)} (${allowed})`),
  );
}

/** A whole number in [min, max]. */
export function integerIn(min: number, max: number, unit = "") {
  const allowed = `expected a whole number from ${min} to ${max}${unit ? ` ${unit}` : ""}`;
  return v.pipe(
    v.number((issue) => `${show(issue.input)} (${allowed})`),
    v.integer((issue) => `${show(issue.input)} (${allowed})`),
    v.minValue(min, (issue) => `${show(issue.input)} (${allowed})`),
    v.maxValue(max, (issue) => `${show(issue.input)} (${allowed})`),
  );
}

/** One of a fixed list of strings. */
export function oneOf<const T extends readonly [string, ...string[]]>(choices: T) {
  return v.picklist(choices, (issue) => `${show(issue.input)} (expected one of ${choices.join(", ")})`);
}

/** Any string (labels, sources, notes), with a length cap. */
export function textUpTo(maxLength: number) {
  return v.pipe(
    v.string((issue) => `${show(issue.input)} (expected text)`),
    v.maxLength(maxLength, (issue) => `text of ${String(issue.input).length} characters (expected at most ${maxLength})`),
  );
}

/** Text of 1 to maxLength characters (ids, labels, sources). */
export function requiredText(maxLength: number) {
  return v.pipe(
    textUpTo(maxLength),
    v.minLength(1, () => `empty (a value is required)`),
  );
}

/** A finite number of at least `min` (no upper limit) with its unit in the message. */
export function numberAtLeast(min: number, unit = "") {
  return numberIn(min, Infinity, unit);
}

/** A boolean. */
export function flag() {
  return v.boolean((issue) => `${show(issue.input)} (expected true or false)`);
}

/** One problem found by validation: where, what was there, what is allowed. */
export interface FieldProblem {
  /** Dotted path, e.g. "brief.riseM" or "carbon.factors[3].a1a3KgCO2ePerKg". */
  path: string;
  message: string;
}

/** Turns valibot issues into field problems with dotted paths. */
export function formatIssues(issues: readonly v.BaseIssue<unknown>[]): FieldProblem[] {
  return issues.map((issue) => {
    let path = "";
    for (const item of issue.path ?? []) {
      const key = (item as { key: unknown }).key;
      path += typeof key === "number" ? `[${key}]` : path === "" ? String(key) : `.${String(key)}`;
    }
    return { path: path === "" ? "(study)" : path, message: issue.message };
  });
}

/** Validates input against a schema; returns the typed value or every problem found. */
export function validateWith<S extends v.GenericSchema>(
  schema: S,
  input: unknown,
): { ok: true; value: v.InferOutput<S> } | { ok: false; problems: FieldProblem[] } {
  const result = v.safeParse(schema, input);
  return result.success ? { ok: true, value: result.output } : { ok: false, problems: formatIssues(result.issues) };
}

const validated = new WeakMap<v.GenericSchema, WeakMap<object, ReturnType<typeof validateWith>>>();

/**
 * validateWith, remembered per schema and object: the study's tables are never mutated (every
 * edit makes a new object), so a table checked once need not be checked again on each of the
 * thousands of assessments a span study or a risk run makes. Non-objects are always checked.
 */
export function validateOnce<S extends v.GenericSchema>(schema: S, input: unknown): ReturnType<typeof validateWith<S>> {
  if (typeof input !== "object" || input === null) return validateWith(schema, input);
  let bySchema = validated.get(schema);
  if (!bySchema) {
    bySchema = new WeakMap();
    validated.set(schema, bySchema);
  }
  const known = bySchema.get(input);
  if (known) return known as ReturnType<typeof validateWith<S>>;
  const result = validateWith(schema, input);
  bySchema.set(input, result);
  return result;
}
