// Study schema version 1 → 2 for the risk inputs: rows by id instead of by position, and ranges
// around the study's value instead of absolute low / mode / high.
import { defaultFactorRows } from "../carbon";
import { defaultRateRows } from "../cost";
import { tidy } from "./resolve-inputs";

type Json = Record<string, unknown>;

function isObject(x: unknown): x is Json {
  return typeof x === "object" && x !== null && !Array.isArray(x);
}

/** The id field of each table whose rows a version-1 path picked by index. */
const TABLES = [
  { at: ["carbon", "factors"], key: "material", defaults: defaultFactorRows },
  { at: ["cost", "rates"], key: "item", defaults: defaultRateRows },
] as const;

/** A version-1 path with a table index replaced by the row's id, read from the study's own table (or the default one a file without tables took). */
function pathById(path: unknown, study: Json): unknown {
  if (!Array.isArray(path)) return path;
  for (const table of TABLES) {
    if (path[0] !== table.at[0] || path[1] !== table.at[1] || typeof path[2] !== "number") continue;
    const holder = study[table.at[0]];
    const stored = isObject(holder) ? holder[table.at[1]] : undefined;
    const rows: unknown[] = Array.isArray(stored) ? stored : table.defaults();
    const row = rows[path[2]];
    const id = isObject(row) ? row[table.key] : undefined;
    // A path to no row stays as it was: the check then names the input and the missing row.
    return typeof id === "string" ? [path[0], path[1], { [table.key]: id }, ...path.slice(3)] : path;
  }
  return path;
}

/** A version-1 range (absolute low ≤ mode ≤ high) as factors on the mode, or offsets where the mode is not above 0. */
function rangeAroundMode(input: Json): Json {
  const { mode, low, high, ...rest } = input;
  if (typeof mode !== "number" || typeof low !== "number" || typeof high !== "number") return input;
  return mode > 0 ? { ...rest, scale: "factor", low: tidy(low / mode), high: tidy(high / mode) } : { ...rest, scale: "offset", low: tidy(low - mode), high: tidy(high - mode) };
}

/**
 * Migrates a version-1 study's risk inputs: each path into carbon.factors or cost.rates by index
 * now names the row's material or item (from the study's own table, where positions meant what
 * they said when it was saved), and each absolute range becomes factors on its mode (offsets when
 * the mode is 0 or below), so it follows the study from now on. Anything else is left for the
 * schema to judge.
 */
export function migrateRiskInputsV1(study: Json): Json {
  const risk = study.risk;
  if (!isObject(risk) || !Array.isArray(risk.inputs)) return study;
  const inputs = risk.inputs.map((input: unknown) => (isObject(input) ? rangeAroundMode({ ...input, path: pathById(input.path, study) }) : input));
  return { ...study, risk: { ...risk, inputs } };
}
