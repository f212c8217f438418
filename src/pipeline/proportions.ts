import type { Brief, SearchObjective } from "../brief";
import type { Design, OptionSpec, OptionValue, RiseTrend, SchemeModel, SchemeOptions } from "../schemes/types";
import { trendChoice } from "./rise-trend";

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
  runnerUp: RunnerUp | null;
  /**
   * When the candidates were designed with the scheme's screening options (the tension roofs by the
   * closed form) and the chosen proportions then with the full ones: the options that differ, each
   * way (`runnerUp` above is a screening one, against the screening choice), the proportions chosen
   * again on full designs, how many full designs that took, what the screening search chose (`first`)
   * and the best other full design against the chosen one (null when no other was feasible).
   */
  full?: { screening: Record<string, OptionValue>; options: Record<string, OptionValue>; refined: string[]; evaluations: number; first: { proportions: Record<string, OptionValue>; riseM: number }; runnerUp: RunnerUp | null };
}

/** Another candidate's proportions, its objective and how much worse it is, % of the chosen value (negative: lower). */
export interface RunnerUp {
  proportions: Record<string, OptionValue>;
  riseM: number;
  value: number;
  differencePct: number;
}

/** Whether the chosen design has a rise: a scheme that uses none (the flat truss) carries no rise among its proportions. */
export function usesRise(choice: Pick<ProportionChoice, "proportions">): boolean {
  return RISE_KEY in choice.proportions;
}

/** What a screening search chose: the candidate's options and rise, and the choice as reported. Plain data (it crosses to and from the span study's workers). */
export interface ScreenedChoice {
  options: SchemeOptions;
  riseM: number;
  choice: ProportionChoice;
}

/** One searchable dimension: its values in order, and the index to start from. */
interface Dimension {
  key: string;
  values: readonly OptionValue[];
  start: number;
  /** A form of the scheme (a choice, a toggle or a count): every value is tried; else ordered numbers searched by descent. */
  form: boolean;
  /** A wide count scanned at every `stride`-th value first, then the values next to the best. */
  stride?: number;
  /** Searched (and reported) only while another option has this value. */
  when?: { key: string; value: OptionValue };
  /** The rise of a scheme that asks for it chosen on the trend of the objective, sampled as its declaration says (see ./rise-trend.ts). */
  trend?: RiseTrend;
}

/** Values of a number option on its step grid within [min, max]. */
export function gridOf(min: number, max: number, step: number, integer: boolean): number[] {
  const s = integer ? Math.max(1, Math.round(step)) : step;
  const count = Math.floor((max - min) / s + 1e-9) + 1;
  return Array.from({ length: count }, (_, i) => Number((min + i * s).toFixed(9)));
}

export function nearestIndex(values: readonly OptionValue[], value: OptionValue): number {
  let best = 0;
  values.forEach((v, i) => {
    if (typeof v === "number" && typeof value === "number" ? Math.abs(v - value) < Math.abs((values[best] as number) - value) : v === value) best = i;
  });
  return best;
}

function optionDimension(spec: OptionSpec, set: OptionValue, spanM: number | undefined): Dimension {
  if (spec.kind === "number") {
    const values = gridOf(Math.max(spec.min, spec.searchMin ?? spec.min), spec.max, spec.step, spec.integer === true);
    const start = spec.referencePerSpanM !== undefined && spanM !== undefined ? spec.referencePerSpanM * spanM : (spec.searchReference ?? set);
    return { key: spec.key, values, start: nearestIndex(values, start), form: spec.integer === true, ...(spec.freeWhen ? { when: spec.freeWhen } : {}) };
  }
  const values = spec.kind === "select" ? spec.choices.map((c) => c.value) : [false, true];
  return { key: spec.key, values, start: Math.max(0, values.indexOf(set as never)), form: true };
}

/** The searchable dimensions of a scheme at a span: its free, unpinned options, and its rise when the search owns it. */
export function dimensionsOf(model: SchemeModel, options: SchemeOptions, pinned: readonly string[], rise: RiseSetting, spanM?: number): Dimension[] {
  const dims = model.options.filter((spec) => spec.free === true && !pinned.includes(spec.key)).map((spec) => optionDimension(spec, options[spec.key] ?? model.defaults[spec.key] ?? 0, spanM));
  if (rise.kind === "search") {
    const values = gridOf(rise.minM, rise.maxM, rise.stepM, false);
    dims.push({ key: RISE_KEY, values, start: nearestIndex(values, rise.startM), form: false, ...(model.riseSpanRatio?.byTrend ? { trend: model.riseSpanRatio.byTrend } : {}) });
  }
  return coarsenForms(dims);
}

/**
 * Most forms (combinations of the form dimensions' values) one search scans; a count with more values
 * than fit (the cable net's 46 mast counts) is scanned at every k-th value and then at the values
 * between the scanned ones next to the best (coarse then fine: 16 + 2 × (k − 1) designs, where trying
 * all 46 made the demo's span study 2.8 times the net's designs and the page missed its minute).
 */
export const MAX_FORMS = 16;

function formCount(dims: readonly Dimension[]): number {
  return dims.reduce((n, d) => (d.form ? n * Math.ceil(d.values.length / (d.stride ?? 1)) : n), 1);
}

/** While the forms are too many, the count of most values is scanned at every k-th value (k as small as fits); a descent when even that cannot fit. */
function coarsenForms(dims: Dimension[]): Dimension[] {
  while (formCount(dims) > MAX_FORMS) {
    const widest = dims.filter((d) => d.form && !d.stride && typeof d.values[0] === "number").sort((a, b) => b.values.length - a.values.length)[0];
    if (!widest) break;
    const others = formCount(dims.filter((d) => d !== widest));
    const stride = Math.ceil(widest.values.length / Math.max(1, Math.floor(MAX_FORMS / others)));
    if (stride * 2 > widest.values.length) widest.form = false;
    else widest.stride = stride;
  }
  return dims;
}

/** How the rise is set for one scheme: searched within a range, or fixed (pinned by the user, or the common rise). */
export type RiseSetting = { kind: "search"; minM: number; maxM: number; stepM: number; startM: number } | { kind: "fixed"; riseM: number; source: "pinned" | "common" };

/** Designs the descent from the set values may assess before the forms are tried. */
const WARM_BUDGET = 24;
/** The forms best at the warm proportions whose proportions are searched again, and the designs each such descent may assess. */
const BRANCHES = 2;
const BRANCH_BUDGET = 12;
/** Designs of a coarsely scanned count between the scanned values (next to the best and to the preferred). */
const FINE_BUDGET = 8;
/** Designs each proportion's pull toward its reference may assess (a bisection), and all the pulls together. */
const PULL_STEPS = 3;
const PULL_BUDGET = 9;
/** Most designs one search assesses (the search is deterministic: no clock decides it). */
export const MAX_EVALUATIONS = WARM_BUDGET + MAX_FORMS + FINE_BUDGET + BRANCHES * BRANCH_BUDGET + PULL_BUDGET;
/**
 * Forms whose best is within this fraction of the least objective count as equal, and the simplest
 * of them (the first in declaration order: the smaller count, the first choice) is chosen, so that
 * neighbouring spans do not flip between two forms of the same merit. 3 %: the cable net's objective
 * moves by 1–2 % from one mast count to the next (catalogue steps; 95–100 m: 3 masts 39.1/40.3, 5
 * masts 40.0/39.9 kgCO2e/m²); at 1 % it flipped 3 → 4 → 3 masts at 135–145 m and 155–165 m, at 3 %
 * it keeps 3 masts to 165 m. A feasibility estimate does not tell forms 3 % apart.
 */
export const FORM_TIE_FRACTION = 0.03;
/**
 * Within the chosen form, proportions whose objective is within this fraction of the least count as
 * equal, and those nearest the references (the set values; the rise's preferred rise ÷ span; a
 * count's reference per metre of span) are chosen: on a flat objective (the cable net's mast ring and
 * height, the cable dome's ring height, a plateau of member lengths that give the same mesh) the
 * choice then stays at the same proportions from span to span instead of following the 1–2 % steps of
 * the catalogue sections. 2 %: the search no longer finds the exact least of a smooth bowl but the
 * point of the band nearest the reference (0 % was the rule before; the cable net's ring and height
 * wandered over 0.6–0.65 and 0.15–0.3 between neighbouring spans).
 */
export const PROPORTION_TIE_FRACTION = 0.02;

/** The objective at an index, each design assessed once, within a budget the phases of the search set. */
interface Evaluator {
  value: (at: readonly number[]) => number;
  allow: (designs: number) => void;
  count: () => number;
  /** Every index assessed, with its value. */
  assessed: () => { at: number[]; value: number }[];
}

function evaluator(assess: (index: readonly number[]) => number): Evaluator {
  const seen = new Map<string, number>();
  let limit = 0;
  return {
    value: (at) => {
      const key = at.join(",");
      const known = seen.get(key);
      if (known !== undefined) return known;
      if (seen.size >= limit) return Number.POSITIVE_INFINITY;
      const v = assess(at);
      seen.set(key, v);
      return v;
    },
    allow: (designs) => (limit = seen.size + designs),
    count: () => seen.size,
    assessed: () => [...seen.entries()].map(([key, value]) => ({ at: key.split(",").map(Number), value })),
  };
}

/**
 * Coordinate descent over the `moving` dimensions from `from`: an ordered one by a line search whose
 * stride starts at a quarter of its range (a grid step after the first pass) and halves when neither
 * neighbour improves; a choice tried in full (a five-point scan across each range first was tried:
 * it found other basins at neighbouring spans and made the cable dome jump more, not less). Passes repeat until one moves nothing (or the budget ends).
 */
function descend(dims: readonly Dimension[], moving: readonly number[], from: readonly number[], ev: Evaluator): number[] {
  let index = [...from];
  let best = ev.value(index);
  const tryAt = (k: number, at: number): boolean => {
    if (at < 0 || at >= (dims[k]?.values.length ?? 0) || at === index[k]) return false;
    const next = index.map((x, j) => (j === k ? at : x));
    const v = ev.value(next);
    if (!(v < best)) return false;
    [best, index] = [v, next];
    return true;
  };
  for (let pass = 0, moved = true; moved && pass < 4; pass++) {
    moved = false;
    for (const k of moving) {
      const dim = dims[k] as Dimension;
      if (typeof dim.values[0] !== "number") {
        dim.values.forEach((_, i) => (moved = tryAt(k, i) || moved));
        continue;
      }
      for (let stride = pass === 0 ? Math.max(1, Math.floor((dim.values.length - 1) / 4)) : 1; stride >= 1; ) {
        const here = index[k] ?? 0;
        if (tryAt(k, here + stride) || tryAt(k, here - stride)) moved = true;
        else stride = Math.floor(stride / 2);
      }
    }
  }
  return index;
}

/** Every combination of the form dimensions' values laid over `base`, simplest first (declaration order, values in order). */
function formsOver(dims: readonly Dimension[], base: readonly number[]): number[][] {
  let out: number[][] = [[...base]];
  dims.forEach((d, k) => {
    if (d.form) out = out.flatMap((at) => d.values.flatMap((_, i) => (i % (d.stride ?? 1) === 0 ? [at.map((x, j) => (j === k ? i : x))] : [])));
  });
  return out;
}

/** Whether a dimension is searched at an index: unconditional, or its condition met there (or by the fixed options). */
function activeAt(dims: readonly Dimension[], d: Dimension, at: readonly number[], options: SchemeOptions): boolean {
  if (!d.when) return true;
  const k = dims.findIndex((x) => x.key === d.when?.key);
  const value = k >= 0 ? dims[k]?.values[at[k] ?? 0] : options[d.when.key];
  return value === d.when.value;
}

/**
 * Where a form sits in the order of preference among forms of equal merit: declaration order, a
 * choice's first value first, a count's set value first, then the nearest to it (the fewer of two
 * as near). The set value of a count is its reference (the cable net's 12 masts: where the objective
 * is flat across counts, as it is from about 150 m, the choice stays there instead of following the
 * 1–2 % steps of the catalogue sections from count to count).
 */
function formOrder(dims: readonly Dimension[], at: readonly number[]): number {
  return dims.reduce((n, d, k) => {
    if (!d.form) return n;
    const i = at[k] ?? 0;
    const rank = typeof d.values[0] === "number" ? 2 * Math.abs(i - d.start) - (i < d.start ? 1 : 0) : i;
    return n * 2 * d.values.length + rank;
  }, 0);
}

type Scanned = { at: number[]; order: number; value: number };

/**
 * The forms designed at the warm proportions, best first (the preferred first among equals: see
 * formOrder); for a coarsely scanned count, the values between the scanned ones next to the best
 * and next to the preferred within the tie band are designed too.
 */
function scanForms(dims: readonly Dimension[], forms: readonly number[][], ev: Evaluator): Scanned[] {
  const assess = (list: readonly number[][]) => {
    ev.allow(list.length);
    return list.map((at) => ({ at, order: formOrder(dims, at), value: ev.value(at) }));
  };
  const byValue = (list: Scanned[]) => list.sort((a, b) => a.value - b.value || a.order - b.order);
  const coarse = byValue(assess(forms));
  const least = coarse[0]?.value ?? Number.POSITIVE_INFINITY;
  const preferred = coarse.filter((f) => f.value - least <= FORM_TIE_FRACTION * Math.abs(least)).sort((a, b) => a.order - b.order)[0];
  const around = (f: Scanned | undefined) =>
    f ? dims.flatMap((d, k) => (d.stride ? Array.from({ length: 2 * (d.stride - 1) }, (_, i) => f.at.map((x, j) => (j === k ? x + (i < d.stride! - 1 ? i + 1 : -(i - d.stride! + 2)) : x))) : [])) : [];
  const fine = [...around(coarse[0]), ...around(preferred)]
    .filter((at, i, all) => at.every((x, k) => x >= 0 && x < (dims[k]?.values.length ?? 0)) && !coarse.some((c) => c.at.join() === at.join()) && all.findIndex((o) => o.join() === at.join()) === i)
    .slice(0, FINE_BUDGET);
  return byValue([...coarse, ...assess(fine)]);
}

/**
 * Whether two scanned forms differ in more than a coarsely scanned count: the best form's proportions
 * are searched again beside the preferred one's only then. Counts scanned coarse then fine (the cable
 * net's masts) have had the values next to both designed already, and their forms within the tie band
 * differ by 1–2 % (catalogue steps): the second descent changed no result of the net over 40–400 m and
 * cost 12 of its ~73 designs. A choice (the shell's smooth or ribbed form) keeps both descents: with the
 * preferred one alone the shell stayed smooth at 120–125 m, 2–7 % above the ribbed form.
 */
function differInWholeForm(dims: readonly Dimension[], a: Scanned | undefined, b: Scanned | undefined): boolean {
  return a !== undefined && b !== undefined && dims.some((d, k) => d.form && !d.stride && a.at[k] !== b.at[k]);
}

/**
 * The search: a descent over the proportions from the set values (warm start); then every form
 * (every value of each count, choice and toggle, up to MAX_FORMS) designed at those proportions; the BRANCHES forms
 * best there searched again by descent; the chosen one is the simplest form whose best is within
 * FORM_TIE_FRACTION of the least. Deterministic: the same inputs give the same choice, whatever asked.
 */
function searchIndex(dims: readonly Dimension[], options: SchemeOptions, ev: Evaluator): number[] {
  const moving = (at: readonly number[]) => dims.flatMap((d, k) => (!d.form && activeAt(dims, d, at, options) ? [k] : []));
  const start = dims.map((d) => d.start);
  const r = dims.findIndex((d) => d.trend !== undefined);
  if (r >= 0 && !dims.some((d) => d.form)) return trendIndex(dims, r, (at) => moving(at).filter((k) => k !== r), ev);
  ev.allow(WARM_BUDGET);
  const warm = descend(dims, moving(start), start, ev);
  if (!dims.some((d) => d.form)) return nearestStart(dims, warm, ev, moving);
  const scanned = scanForms(dims, formsOver(dims, warm), ev);
  const within = (value: number, least: number) => value - least <= FORM_TIE_FRACTION * Math.abs(least);
  const bestScanned = scanned[0];
  const simplestScanned = scanned.filter((f) => bestScanned && within(f.value, bestScanned.value)).sort((a, b) => a.order - b.order)[0];
  const picks = [...new Set([simplestScanned, bestScanned].filter((f) => f !== undefined))].slice(0, differInWholeForm(dims, simplestScanned, bestScanned) ? BRANCHES : 1);
  const branches = picks.map(({ at, order }) => {
    ev.allow(BRANCH_BUDGET);
    const end = descend(dims, moving(at), at, ev);
    return { at: end, order, value: ev.value(end) };
  });
  const least = Math.min(...branches.map((b) => b.value));
  if (!Number.isFinite(least)) return nearestStart(dims, warm, ev, moving);
  const simplest = branches.filter((b) => within(b.value, least)).sort((a, b) => a.order - b.order)[0];
  return nearestStart(dims, simplest?.at ?? warm, ev, moving);
}

/** Designs of the trend search: the descent over the other proportions at the reference rise (when the samples are taken there), and again at the chosen rise. */
const TREND_WARM_BUDGET = 12;
const TREND_FINISH_BUDGET = 10;

/**
 * The rise on the trend (a scheme without forms whose declaration asks for it): the rise sampled at
 * the declared number of equal steps across its range, with the other proportions at their
 * references ("reference") or at the best a descent finds at the reference rise ("searched"); of the
 * rises whose fitted objective is within PROPORTION_TIE_FRACTION of the fitted least, the nearest the
 * reference; the other proportions searched again there and pulled toward their references within
 * the band (the rise stays).
 */
function trendIndex(dims: readonly Dimension[], r: number, others: (at: readonly number[]) => number[], ev: Evaluator): number[] {
  const start = dims.map((d) => d.start);
  const trend = dims[r]!.trend!;
  let warm = start;
  if (trend.sampledAt === "searched") {
    ev.allow(TREND_WARM_BUDGET);
    warm = descend(dims, others(start), start, ev);
  }
  const n = dims[r]!.values.length;
  const count = Math.max(3, Math.round(trend.samples));
  const indices = [...new Set(Array.from({ length: count }, (_, i) => Math.round((i * (n - 1)) / (count - 1))))];
  const at = (i: number) => warm.map((x, k) => (k === r ? i : x));
  ev.allow(indices.length);
  const samples = indices.map((index) => ({ index, value: ev.value(at(index)) }));
  const chosen = at(trendChoice(dims[r]!.values as number[], samples, start[r]!, PROPORTION_TIE_FRACTION));
  ev.allow(TREND_FINISH_BUDGET);
  const end = descend(dims, others(chosen), chosen, ev);
  return nearestStart(dims, end, ev, others, [r]);
}

/**
 * Of the assessed candidates of the same form as `best` whose objective is within
 * PROPORTION_TIE_FRACTION of its own, the one nearest the set values (the sum over the proportions
 * of the distance as a fraction of each range; a lower objective breaks a tie); then pulled further
 * toward the set values along the straight line to them, by bisection (PULL_STEPS designs), as far
 * as the objective stays within the band.
 */
function nearestStart(dims: readonly Dimension[], best: readonly number[], ev: Evaluator, active: (at: readonly number[]) => readonly number[], held: readonly number[] = []): number[] {
  const bestValue = ev.value(best);
  if (!Number.isFinite(bestValue)) return [...best];
  const limit = bestValue + PROPORTION_TIE_FRACTION * Math.abs(bestValue);
  const distance = (at: readonly number[]) => dims.reduce((sum, d, k) => (d.form ? sum : sum + Math.abs((at[k] ?? 0) - d.start) / Math.max(1, d.values.length - 1)), 0);
  const sameForm = (at: readonly number[]) => dims.every((d, k) => (!d.form && !held.includes(k)) || at[k] === best[k]);
  const near = ev.assessed().filter((c) => sameForm(c.at) && c.value <= limit);
  near.sort((a, b) => distance(a.at) - distance(b.at) || a.value - b.value);
  let at = near[0]?.at ?? [...best];
  ev.allow(PULL_BUDGET);
  for (const k of active(at)) at = pullDimension(dims, at, k, ev, limit);
  return at;
}

/** Dimension k moved from `from` toward its set value, by bisection, as far as the objective stays within `limit`. */
function pullDimension(dims: readonly Dimension[], from: readonly number[], k: number, ev: Evaluator, limit: number): number[] {
  const x = from[k] ?? 0;
  const target = dims[k]?.start ?? x;
  const toward = (f: number) => from.map((v, j) => (j === k ? Math.round(x + f * (target - x)) : v));
  let [lo, hi] = [0, 1];
  for (let step = 0; step < PULL_STEPS && toward(lo)[k] !== toward(hi)[k]; step++) {
    const f = step === 0 ? hi : (lo + hi) / 2;
    if (ev.value(toward(f)) <= limit) lo = f;
    else hi = f;
  }
  return toward(lo);
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
  spanM?: number,
): { chosen: Candidate; choice: ProportionChoice } {
  const dims = dimensionsOf(model, options, pinned, rise, spanM);
  const candidates = new Map<string, Candidate>();
  const candidateAt = (index: readonly number[]): Candidate => {
    const key = index.join(",");
    const known = candidates.get(key);
    if (known) return known;
    const opts: SchemeOptions = { ...options };
    let riseM = rise.kind === "fixed" ? rise.riseM : 0;
    dims.forEach((d, k) => {
      const v = d.values[index[k]!]!;
      if (d.key === RISE_KEY) riseM = v as number;
      else opts[d.key] = v;
    });
    const designed = design(opts, riseM);
    const value = dims.length === 0 ? Number.NaN : designed.status === "infeasible" ? Number.POSITIVE_INFINITY : assess(designed);
    const candidate = { options: opts, riseM, design: designed, value: dims.length === 0 || Number.isFinite(value) ? value : Number.POSITIVE_INFINITY };
    candidates.set(key, candidate);
    return candidate;
  };
  const ev = evaluator((i) => candidateAt(i).value);
  const index = lastFormWhenNoneWorks(dims, searchIndex(dims, options, ev), candidates);
  const chosen = candidateAt(index);
  return { chosen, choice: choiceOf(model, dims, { chosen, index, candidates: [...candidates.values()], evaluations: ev.count() }, { pinned, rise, objective }) };
}

/**
 * When no candidate works (every one infeasible), the one reported is of the last form tried in
 * declaration order — forms run from the simplest to the most capable (fewer hoops first, smooth
 * before ribbed) — so its reason says what lies beyond every form of this scheme, not that a form
 * which also failed should be chosen (a 300 m shell said "choose the ribbed form" while the ribbed
 * form was infeasible too).
 */
function lastFormWhenNoneWorks(dims: readonly Dimension[], index: number[], candidates: ReadonlyMap<string, Candidate>): number[] {
  if (dims.length === 0 || [...candidates.values()].some((c) => Number.isFinite(c.value))) return index;
  const tried = [...candidates.keys()].map((key) => key.split(",").map(Number));
  const formsOf = (i: readonly number[]) => dims.map((d, k) => (d.form ? (i[k] ?? 0) : 0));
  const later = (a: readonly number[], b: readonly number[]) => {
    const fa = formsOf(a);
    const fb = formsOf(b);
    const k = fa.findIndex((x, j) => x !== fb[j]);
    return k >= 0 && (fa[k] ?? 0) > (fb[k] ?? 0);
  };
  return tried.reduce((best, i) => (later(i, best) ? i : best), index);
}

/** The free options reported for a candidate: those pinned, and those searched whose condition its options meet; and the rise when the scheme has one of its own. */
function proportionsOf(model: SchemeModel, c: Candidate, pinned: readonly string[]): Record<string, OptionValue> {
  const shown = model.options.filter((s) => s.free === true && (pinned.includes(s.key) || s.kind !== "number" || !s.freeWhen || c.options[s.freeWhen.key] === s.freeWhen.value));
  return { ...Object.fromEntries(shown.map((s) => [s.key, c.options[s.key] ?? model.defaults[s.key] ?? ""])), ...(model.riseSpanRatio ? { [RISE_KEY]: c.riseM } : {}) };
}

function choiceOf(
  model: SchemeModel,
  dims: readonly Dimension[],
  found: { chosen: Candidate; index: readonly number[]; candidates: readonly Candidate[]; evaluations: number },
  asked: { pinned: readonly string[]; rise: RiseSetting; objective: Objective },
): ProportionChoice {
  const { chosen, index, evaluations } = found;
  const { pinned, rise, objective } = asked;
  const freeKeys = model.options.filter((s) => s.free === true).map((s) => s.key);
  const second = found.candidates.filter((c) => c !== chosen && Number.isFinite(c.value)).sort((a, b) => a.value - b.value)[0];
  return {
    objective,
    searched: dims.filter((d) => activeAt(dims, d, index, chosen.options)).map((d) => d.key),
    pinned: freeKeys.filter((k) => pinned.includes(k)).concat(rise.kind === "fixed" && rise.source === "pinned" ? [RISE_KEY] : []),
    proportions: proportionsOf(model, chosen, pinned),
    riseM: chosen.riseM,
    riseSource: rise.kind === "search" ? "searched" : rise.source,
    value: chosen.value,
    evaluations,
    runnerUp: second && Number.isFinite(chosen.value) ? { proportions: proportionsOf(model, second, pinned), riseM: second.riseM, value: second.value, differencePct: (100 * (second.value - chosen.value)) / chosen.value } : null,
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
