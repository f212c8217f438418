// From the stored inputs (rows by id, ranges around the study's value) to what a run samples:
// index paths into this study, and absolute low / mode / high with the mode the study's value.
import type { RiskStudy } from "./risk-study";
import { BRIEF_LIMITS } from "../brief";
import { SCHEME_DECLARATIONS } from "../schemes/declarations";
import { FACTOR_LIMITS } from "../carbon";
import { MAX_RATE } from "../cost";
import type { DistributionKind } from "./distribution";
import type { PathStep, RiskSettings, RowSelector, UncertainInput } from "./risk-settings";

/** A path with every row picked by its index in this study: what getIn, setIn and applyValues take. */
export type IndexPath = (string | number)[];

/** An input as a run samples it: an index path and absolute low ≤ mode ≤ high, mode = the study's value. */
export type ResolvedInput = {
  id: string;
  label: string;
  path: IndexPath;
  low: number;
  mode: number;
  high: number;
  distribution: DistributionKind;
  group: string | null;
};

/** A problem with one uncertain input (or with the settings as a whole: inputId null). */
export type RiskInputProblem = { inputId: string | null; message: string };

function isSelector(step: PathStep): step is RowSelector {
  return typeof step === "object" && step !== null;
}

/** A path as messages write it: brief.snowGroundKPa, cost.rates[item=steel-truss].rate, cost.rates[3].rate. */
export function formatPath(path: readonly PathStep[]): string {
  let out = "";
  for (const step of path) {
    if (typeof step === "number") out += `[${step}]`;
    else if (isSelector(step)) out += `[${Object.entries(step).map(([k, id]) => `${k}=${id}`).join(",")}]`;
    else out += out === "" ? step : `.${step}`;
  }
  return out;
}

/** The path with each row selector replaced by the index of the row with that id, or why it cannot be. */
export function resolvePath(study: unknown, path: readonly PathStep[]): { path: IndexPath } | { error: string } {
  const out: IndexPath = [];
  let node: unknown = study;
  for (const step of path) {
    if (isSelector(step)) {
      const [key, id] = Object.entries(step)[0] ?? ["", ""];
      const where = formatPath(out);
      if (!Array.isArray(node)) return { error: `${where} is not a table (expected rows to pick ${key} ${id} from)` };
      const index = node.findIndex((row) => typeof row === "object" && row !== null && (row as Record<string, unknown>)[key] === id);
      if (index < 0) return { error: `${where} has no row with ${key} "${id}"` };
      out.push(index);
      node = node[index];
    } else {
      out.push(step);
      node = node !== null && typeof node === "object" ? (node as Record<string | number, unknown>)[step] : undefined;
    }
  }
  return { path: out };
}

/**
 * The allowed range of the field at an index path, where the code knows it: brief fields, scheme
 * options, carbon factor fields, and a cost rate's own row low–high. Null elsewhere (the check
 * against the study's schema still applies).
 */
export function fieldLimits(study: RiskStudy, path: IndexPath): { min: number; max: number } | null {
  const [head, a, b, c] = path;
  if (head === "brief" && typeof a === "string") return (BRIEF_LIMITS as Record<string, { min: number; max: number }>)[a] ?? null;
  if (head === "schemes" && b === "options") {
    const spec = SCHEME_DECLARATIONS.find((m) => m.id === a)?.options.find((o) => o.key === c);
    return spec && spec.kind === "number" ? { min: spec.min, max: spec.max } : null;
  }
  if (head === "carbon" && a === "factors" && typeof c === "string") return (FACTOR_LIMITS as Record<string, { min: number; max: number }>)[c] ?? null;
  if (head === "cost" && a === "rates" && typeof b === "number" && c === "rate") {
    const row = study.cost.rates[b];
    return row ? { min: row.low, max: Math.min(row.high, MAX_RATE) } : null;
  }
  return null;
}

/** Rounds away binary noise (0.16000000000000003 → 0.16): 12 significant figures. */
export function tidy(x: number): number {
  return x === 0 ? 0 : Number(x.toPrecision(12));
}

/**
 * One input made absolute: rows found by id; low and high applied to the study's value (times a
 * factor, or plus an offset) and clamped to the field's allowed range where it is known, so the
 * ends stay valid as the study moves; the mode is the study's value.
 */
export function resolveInput(study: RiskStudy, input: UncertainInput): ResolvedInput | { error: string } {
  const found = resolvePath(study, input.path);
  if ("error" in found) return { error: `input "${input.id}": path ${formatPath(input.path)}: ${found.error}` };
  let node: unknown = study;
  for (const step of found.path) node = node !== null && typeof node === "object" ? (node as Record<string | number, unknown>)[step] : undefined;
  if (typeof node !== "number" || !Number.isFinite(node)) {
    return { error: `input "${input.id}": path ${formatPath(input.path)} does not lead to a number in the study (found ${node === undefined ? "nothing" : JSON.stringify(node)})` };
  }
  const value = node;
  const ends = input.scale === "factor" ? [value * input.low, value * input.high] : [value + input.low, value + input.high];
  const limits = fieldLimits(study, found.path);
  const clamp = (x: number) => (limits ? Math.min(Math.max(x, Math.min(limits.min, value)), Math.max(limits.max, value)) : x);
  const low = Math.min(value, clamp(tidy(Math.min(...ends))));
  const high = Math.max(value, clamp(tidy(Math.max(...ends))));
  return { id: input.id, label: input.label, path: found.path, low, mode: value, high, distribution: input.distribution, group: input.group };
}

/** Every input resolved against the study, with a problem for each that cannot be. */
export function resolveRiskInputs(study: RiskStudy, settings: RiskSettings = study.risk): { inputs: ResolvedInput[]; problems: RiskInputProblem[] } {
  const inputs: ResolvedInput[] = [];
  const problems: RiskInputProblem[] = [];
  for (const input of settings.inputs) {
    const r = resolveInput(study, input);
    if ("error" in r) problems.push({ inputId: input.id, message: r.error });
    else inputs.push(r);
  }
  return { inputs, problems };
}
