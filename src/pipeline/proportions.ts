import type { Brief, SearchObjective } from "../brief";
import type { Design, OptionSpec, OptionValue, SchemeModel, SchemeOptions } from "../schemes/types";

/** What the proportion search minimises, per m² of usable floor: total mass, counted embodied carbon, or cost. */
export type Objective = SearchObjective;
export const OBJECTIVES: readonly Objective[] = ["mass", "carbon", "cost"];

/** The key under which a scheme's rise is pinned or reported among its proportions. */
export const RISE_KEY = "riseM";

/** One candidate the search assessed. */
export interface Candidate {
  options: SchemeOptions;
  riseM: number;
  design: Design;
  /** Objective per m² of usable floor; +∞ when the design is infeasible or cannot be assessed. */
  value: number;
}

/** The proportions the search chose for one scheme, and how much the runner-up differs. */
export interface ProportionChoice {
  objective: Objective;
  /** The free proportions searched (option keys, and "riseM" when the rise was searched). */
  searched: string[];
  /** The free proportions the user pinned (not searched). */
  pinned: string[];
  /** The chosen value of every free proportion (searched or pinned), and the rise used. */
  proportions: Record<string, OptionValue>;
  riseM: number;
  /** Where the rise came from. */
  riseSource: "searched" | "pinned" | "common";
  /** Objective per m² of usable floor of the chosen design (+∞ when nothing feasible was found). */
  value: number;
  /** Designs assessed. */
  evaluations: number;
  /** The best other candidate, and how much worse it is, % of the chosen value. */
  runnerUp: { proportions: Record<string, OptionValue>; riseM: number; value: number; differencePct: number } | null;
}

/** One searchable dimension: its values in order, and the index to start from. */
interface Dimension {
  key: string;
  values: readonly OptionValue[];
  start: number;
  /** Ordered numbers (stepped by halving strides) or a small set tried in full. */
  ordered: boolean;
}

/** Values of a number option on its step grid within [min, max]. */
function gridOf(min: number, max: number, step: number, integer: boolean): number[] {
  const s = integer ? Math.max(1, Math.round(step)) : step;
  const count = Math.floor((max - min) / s + 1e-9) + 1;
  return Array.from({ length: count }, (_, i) => Number((min + i * s).toFixed(9)));
}

function nearestIndex(values: readonly OptionValue[], value: OptionValue): number {
  let best = 0;
  values.forEach((v, i) => {
    if (typeof v === "number" && typeof value === "number" ? Math.abs(v - value) < Math.abs((values[best] as number) - value) : v === value) best = i;
  });
  return best;
}

function optionDimension(spec: OptionSpec, start: OptionValue): Dimension {
  if (spec.kind === "number") {
    const values = gridOf(spec.min, spec.max, spec.step, spec.integer === true);
    return { key: spec.key, values, start: nearestIndex(values, start), ordered: true };
  }
  const values = spec.kind === "select" ? spec.choices.map((c) => c.value) : [false, true];
  return { key: spec.key, values, start: Math.max(0, values.indexOf(start as never)), ordered: false };
}

/** The searchable dimensions of a scheme: its free, unpinned options, and its rise when the search owns it. */
export function dimensionsOf(model: SchemeModel, options: SchemeOptions, pinned: readonly string[], rise: RiseSetting): Dimension[] {
  const dims = model.options.filter((spec) => spec.free === true && !pinned.includes(spec.key)).map((spec) => optionDimension(spec, options[spec.key] ?? model.defaults[spec.key] ?? 0));
  if (rise.kind === "search") {
    const values = gridOf(rise.minM, rise.maxM, rise.stepM, false);
    dims.push({ key: RISE_KEY, values, start: nearestIndex(values, rise.startM), ordered: true });
  }
  return dims;
}

/** How the rise is set for one scheme: searched within a range, or fixed (pinned by the user, or the common rise). */
export type RiseSetting = { kind: "search"; minM: number; maxM: number; stepM: number; startM: number } | { kind: "fixed"; riseM: number; source: "pinned" | "common" };

/** Most designs one search assesses (the search is deterministic: no clock decides it). */
export const MAX_EVALUATIONS = 48;

/**
 * Coordinate descent over the dimensions, from the scheme's set values (the warm start): an ordered
 * one by a line search whose stride starts at a quarter of its range (a grid step after the first
 * pass) and halves when neither neighbour improves; a choice or toggle tried in full. Passes repeat
 * until one moves nothing, or MAX_EVALUATIONS designs were assessed (no clock decides it).
 */
function descend(dims: readonly Dimension[], assess: (index: readonly number[]) => number): { index: number[]; evaluations: number } {
  const seen = new Map<string, number>();
  const value = (at: readonly number[]): number => {
    const key = at.join(",");
    const known = seen.get(key);
    if (known !== undefined) return known;
    if (seen.size >= MAX_EVALUATIONS) return Number.POSITIVE_INFINITY;
    const v = assess(at);
    seen.set(key, v);
    return v;
  };
  let index = dims.map((d) => d.start);
  let best = value(index);
  const tryAt = (k: number, at: number): boolean => {
    if (at < 0 || at >= (dims[k]?.values.length ?? 0) || at === index[k]) return false;
    const next = index.map((x, j) => (j === k ? at : x));
    const v = value(next);
    if (!(v < best)) return false;
    [best, index] = [v, next];
    return true;
  };
  for (let pass = 0, moved = true; moved && pass < 4; pass++) {
    moved = false;
    dims.forEach((dim, k) => {
      if (!dim.ordered) {
        dim.values.forEach((_, i) => (moved = tryAt(k, i) || moved));
        return;
      }
      for (let stride = pass === 0 ? Math.max(1, Math.floor((dim.values.length - 1) / 4)) : 1; stride >= 1; ) {
        const here = index[k] ?? 0;
        if (tryAt(k, here + stride) || tryAt(k, here - stride)) moved = true;
        else stride = Math.floor(stride / 2);
      }
    });
  }
  return { index, evaluations: seen.size };
}

/**
 * Searches a scheme's free proportions for the least objective. `design` designs one candidate and
 * `assess` gives its objective (the scheme knows nothing of carbon or cost: the caller assesses). A
 * candidate counts only when its design is not infeasible and its objective is finite. With nothing
 * to search, the one design is not assessed (value NaN): the objective cannot change it.
 */
export function searchProportions(
  model: SchemeModel,
  options: SchemeOptions,
  pinned: readonly string[],
  rise: RiseSetting,
  objective: Objective,
  design: (options: SchemeOptions, riseM: number) => Design,
  assess: (design: Design) => number,
): { chosen: Candidate; choice: ProportionChoice } {
  const dims = dimensionsOf(model, options, pinned, rise);
  const candidates = new Map<string, Candidate>();
  const candidateAt = (index: readonly number[]): Candidate => {
    const opts: SchemeOptions = { ...options };
    let riseM = rise.kind === "fixed" ? rise.riseM : 0;
    dims.forEach((d, k) => {
      const v = d.values[index[k]!]!;
      if (d.key === RISE_KEY) riseM = v as number;
      else opts[d.key] = v;
    });
    const key = index.join(",");
    const known = candidates.get(key);
    if (known) return known;
    const designed = design(opts, riseM);
    const value = dims.length === 0 ? Number.NaN : designed.status === "infeasible" ? Number.POSITIVE_INFINITY : assess(designed);
    const candidate = { options: opts, riseM, design: designed, value: dims.length === 0 || Number.isFinite(value) ? value : Number.POSITIVE_INFINITY };
    candidates.set(key, candidate);
    return candidate;
  };
  const { index, evaluations } = descend(dims, (i) => candidateAt(i).value);
  const chosen = candidateAt(index);
  const freeKeys = model.options.filter((s) => s.free === true).map((s) => s.key);
  const proportionsOf = (c: Candidate) => ({ ...Object.fromEntries(freeKeys.map((k) => [k, c.options[k] ?? model.defaults[k] ?? ""])), [RISE_KEY]: c.riseM });
  const others = [...candidates.values()].filter((c) => c !== chosen && Number.isFinite(c.value)).sort((a, b) => a.value - b.value);
  const second = others[0];
  return {
    chosen,
    choice: {
      objective,
      searched: dims.map((d) => d.key),
      pinned: freeKeys.filter((k) => pinned.includes(k)).concat(rise.kind === "fixed" && rise.source === "pinned" ? [RISE_KEY] : []),
      proportions: proportionsOf(chosen),
      riseM: chosen.riseM,
      riseSource: rise.kind === "search" ? "searched" : rise.source,
      value: chosen.value,
      evaluations,
      runnerUp: second && Number.isFinite(chosen.value) ? { proportions: proportionsOf(second), riseM: second.riseM, value: second.value, differencePct: (100 * (second.value - chosen.value)) / chosen.value } : null,
    },
  };
}

/** The rise every scheme shares at a span under the "common" rule: the brief's rise-to-span ratio, within the height limit. */
export function commonRiseM(brief: Brief, spanM: number): number {
  return Math.min((brief.riseM / brief.spanM) * spanM, brief.heightLimitM - brief.eavesHeightM, spanM / 2);
}

/**
 * How a scheme's rise is set at a span: the common rise under the "common" rule (or when the scheme
 * declares no rise range); a rise the user pinned; else a search over the scheme's rise ÷ span range
 * cut by the height limit (null when the limit leaves no rise in its range).
 */
export function riseSettingFor(model: SchemeModel, brief: Brief, spanM: number, pinnedRiseM: number | undefined): RiseSetting | { kind: "none"; reason: string } {
  if (brief.riseRule === "common" || !model.riseSpanRatio) return { kind: "fixed", riseM: commonRiseM(brief, spanM), source: "common" };
  if (pinnedRiseM !== undefined) return { kind: "fixed", riseM: pinnedRiseM, source: "pinned" };
  const r = model.riseSpanRatio;
  const room = brief.heightLimitM - brief.eavesHeightM;
  const minM = r.min * spanM;
  const maxM = Math.min(r.max * spanM, room, spanM / 2);
  if (maxM < minM) return { kind: "none", reason: `the height limit ${brief.heightLimitM} m leaves a rise of ${Math.max(0, room).toFixed(1)} m above the ${brief.eavesHeightM} m eaves, below the least rise of this scheme (${minM.toFixed(1)} m, rise/span ${r.min})` };
  return { kind: "search", minM, maxM, stepM: Math.max(0.5, Number((0.005 * spanM).toFixed(1))), startM: Math.min(maxM, Math.max(minM, r.preferred * spanM)) };
}
