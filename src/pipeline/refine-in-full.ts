import type { Design, SchemeModel, SchemeOptions } from "../schemes/types";
import { gridOf, nearestIndex, PROPORTION_TIE_FRACTION, RISE_KEY, type RiseSetting } from "./proportions";
import { fittedLeast, trendChoice } from "./rise-trend";

/** A design with the full options at some proportions, and its objective (+∞ when infeasible). */
export interface FullDesign {
  options: SchemeOptions;
  riseM: number;
  design: Design;
  objective: number;
}

/** One refined proportion: where it was sampled and what was chosen. */
export interface Refinement {
  key: string;
  value: number;
  samples: { value: number; objective: number }[];
}

type Refined = NonNullable<SchemeModel["refinedInFull"]>[number];

/** The grid a refined proportion moves on, its samples (indices) and its reference (an index). */
interface Axis {
  values: number[];
  samples: number[];
  reference: number;
}

/** The axis of a refined proportion (a count's around its value in `current`); null when it is not searched here. */
function axisOf(model: SchemeModel, refined: Refined, rise: RiseSetting, spanM: number, pinned: readonly string[], current: { options: SchemeOptions; riseM: number }): Axis | null {
  const { key } = refined;
  if ("neighbours" in refined) {
    const spec = model.options.find((o) => o.key === key);
    if (spec?.kind !== "number" || pinned.includes(key)) return null;
    const values = gridOf(spec.min, spec.max, spec.step, spec.integer === true);
    const at = nearestIndex(values, (current.options[key] ?? model.defaults[key]) as number);
    const near = Array.from({ length: 2 * refined.neighbours + 1 }, (_, i) => at - refined.neighbours + i);
    const far = (refined.ratios ?? []).map((r) => nearestIndex(values, r * (values[at] as number)));
    const samples = [...new Set([...near, ...far])].filter((i) => i >= 0 && i < values.length).sort((a, b) => a - b);
    return { values, samples, reference: at };
  }
  const { samples, reference } = refined;
  if (key === RISE_KEY) {
    if (rise.kind !== "search") return null;
    const values = gridOf(rise.minM, rise.maxM, rise.stepM, false);
    return { values, samples: [...new Set(samples.map((r) => nearestIndex(values, r * spanM)))], reference: nearestIndex(values, reference === undefined ? rise.startM : reference * spanM) };
  }
  const spec = model.options.find((o) => o.key === key);
  if (spec?.kind !== "number" || pinned.includes(key)) return null;
  const values = gridOf(spec.min, spec.max, spec.step, spec.integer === true);
  return { values, samples: [...new Set(samples.map((v) => nearestIndex(values, v)))], reference: nearestIndex(values, reference ?? spec.searchReference ?? (model.defaults[key] as number)) };
}

/**
 * From the grid index `start`, one grid step at a time towards `toward` (the best sample), while the
 * next value's full design is better than the current one's by more than PROPORTION_TIE_FRACTION; the
 * index it ends at. One full design a step: it stops at the first step that does not pay, and at `toward`.
 */
export function descended(start: number, toward: number, objectiveAt: (index: number) => number): number {
  const step = Math.sign(toward - start);
  let index = start;
  while (index !== toward && objectiveAt(index + step) < objectiveAt(index) * (1 - PROPORTION_TIE_FRACTION)) index += step;
  return index;
}

/**
 * Where the descent from the trend's choice heads: the outermost feasible sample on the side of the
 * fitted least (fittedLeast), or the best sample when the fitted least is the choice itself or there
 * is no fit. Heading for the best sample instead sent the descent the wrong way where two samples on
 * either side of the choice differed by a fraction of a per cent (the demo study's cable net at 120 m:
 * samples 130.33 / 130.02 / 150.05 kgCO2e/m² of floor at 0.1 / 0.15 / 0.2 × span, 0.15 kept where
 * 0.13 was 7 % better; measured). Designing both neighbours and heading for the better one found
 * 2 % more at two of the demo's 37 spans and cost 33 % more Newton iterations in its span study. The
 * descent stays a local step: it can stop short of a better value beyond a neighbour (280 m: 0.15
 * kept where 0.14 is 3.4 % better).
 */
function descentEnd(trend: number, values: readonly number[], sampled: readonly { index: number; value: number }[], best: number): number {
  const feasible = sampled.filter((s) => Number.isFinite(s.value)).map((s) => s.index);
  const least = fittedLeast(values, sampled);
  if (least === null || least === trend) return best;
  return least < trend ? Math.min(...feasible) : Math.max(...feasible);
}

/**
 * A sampled proportion's choice on the trend through its samples (trendChoice), stepped on with
 * `descend` (descentEnd, descended); `best` is the best feasible sample. With `beyond`, a choice at the
 * outermost sample steps on outwards instead (descended towards the grid's end): one more full design
 * where the first step does not pay.
 */
function chosenOnTrend(refined: { descend?: boolean; beyond?: boolean }, axis: Axis, sampled: readonly { index: number; value: number }[], best: number, objectiveAt: (index: number) => number): number {
  const trend = trendChoice(axis.values, sampled, axis.reference, PROPORTION_TIE_FRACTION);
  if (refined.beyond) {
    const indices = sampled.map((s) => s.index);
    const outward = trend === Math.min(...indices) ? 0 : trend === Math.max(...indices) ? axis.values.length - 1 : trend;
    if (outward !== trend) return descended(trend, outward, objectiveAt);
  }
  return refined.descend ? descended(trend, descentEnd(trend, axis.values, sampled, best), objectiveAt) : trend;
}

/**
 * A count's choice: from the best of its samples on to whichever neighbour is better by more than the
 * tie band, while one is (a plateau between the screened count and a better sample does not stop it:
 * the demo's net at 270 m, 9 masts 149.7, 8 150.5, 7 140.2, 6 133.1 kgCO2e/m² of floor, measured);
 * then the least of every count designed (the fewer of two equal). Where two counts are within 1–2 %
 * the choice flips between them from span to span whatever the rule; on the demo study's span study
 * (5 m steps) the least flipped twice, the screened count kept unless a sample was better by 2 % three
 * times, the fewest within 3 % of the least 16 times, the quadratic trend's choice 6 (measured).
 */
function chosenCount(axis: Axis, sampled: readonly { index: number; value: number }[], bestSample: number, objectiveAt: (index: number) => number): number {
  const designed = new Set(sampled.map((s) => s.index));
  const value = (index: number) => {
    designed.add(index);
    return objectiveAt(index);
  };
  let best = bestSample;
  for (;;) {
    const next = [best - 1, best + 1].filter((i) => i >= 0 && i < axis.values.length).sort((a, b) => value(a) - value(b))[0];
    if (next === undefined || !(value(next) < value(best) * (1 - PROPORTION_TIE_FRACTION))) break;
    best = next;
  }
  return [...designed].reduce((a, b) => (value(b) < value(a) || (value(b) === value(a) && b < a) ? b : a));
}

/**
 * The scheme's `refinedInFull` proportions chosen again, one after the other, on designs with the
 * full options (the screened search chose them on cheaper ones), from the screened choice `start`:
 * the objective at each declared sample (the same values at every span), a least-squares quadratic
 * through the finite ones, and of the grid values between the samples whose fitted objective is
 * within PROPORTION_TIE_FRACTION of the fitted least, the nearest the reference (the declared one,
 * else an option's search reference or default, the preferred rise) — the rise's trend rule (./rise-trend.ts). Where the
 * value so chosen is infeasible, the best feasible sample; where no sample is feasible, the
 * proportion stays. With `descend` the choice then steps towards the fitted least (descentEnd) while each step's
 * full design is better by more than the tie band (descended); with `beyond`, a choice at the outermost sample
 * steps on past it while each step is so better; with `carries`, each value is designed with that proportion
 * moved along (carried); where a later proportion moved the design, those declared with `descend` step again
 * towards their better neighbour. A count with `neighbours` is designed at its
 * screened value and its neighbours (chosenCount). Returns the final design (designed once, samples reused), the
 * least of the other feasible full designs (its runner-up, null when there is none), what was refined and how many full designs it took.
 */
export function refineInFull(
  model: SchemeModel,
  start: { options: SchemeOptions; riseM: number },
  setting: { rise: RiseSetting; spanM: number; pinned: readonly string[] },
  design: (options: SchemeOptions, riseM: number) => Design,
  assess: (design: Design) => number,
): { full: FullDesign; runnerUp: FullDesign | null; refinements: Refinement[]; evaluations: number } {
  const designed = new Map<string, FullDesign>();
  const at = (options: SchemeOptions, riseM: number): FullDesign => {
    const key = JSON.stringify([options, riseM]);
    const known = designed.get(key);
    if (known) return known;
    const d = design(options, riseM);
    const full = { options, riseM, design: d, objective: d.status === "infeasible" ? Number.POSITIVE_INFINITY : assess(d) };
    designed.set(key, full);
    return full;
  };
  let current = { ...start };
  // the design at grid index `index` of `key`'s axis, the other proportions as in `base`
  const movedFrom = (base: { options: SchemeOptions; riseM: number }, key: string, axis: Axis, carries?: string) => (index: number) => {
    if (key === RISE_KEY) return { options: base.options, riseM: axis.values[index] as number };
    const value = axis.values[index] as number;
    return { options: { ...base.options, [key]: value, ...carried(model, setting.pinned, base.options, key, value, carries) }, riseM: base.riseM };
  };
  const valueOf = (key: string) => (key === RISE_KEY ? current.riseM : (current.options[key] as number));
  const refinements: Refinement[] = [];
  let afterDescent: typeof current | null = null;
  for (const refined of model.refinedInFull ?? []) {
    const { key } = refined;
    const axis = axisOf(model, refined, setting.rise, setting.spanM, setting.pinned, current);
    if (!axis) continue;
    const moved = movedFrom(current, key, axis, "carries" in refined ? refined.carries : undefined);
    const sampled = axis.samples.map((index) => ({ index, value: at(moved(index).options, moved(index).riseM).objective }));
    const feasible = sampled.filter((s) => Number.isFinite(s.value)).sort((a, b) => a.value - b.value);
    if (feasible.length === 0) continue;
    const objectiveAt = (index: number) => at(moved(index).options, moved(index).riseM).objective;
    const best = feasible[0]!.index;
    const index = "neighbours" in refined ? chosenCount(axis, sampled, best, objectiveAt) : chosenOnTrend(refined, axis, sampled, best, objectiveAt);
    const chosen = moved(index);
    const kept = Number.isFinite(at(chosen.options, chosen.riseM).objective);
    current = kept ? chosen : moved(best);
    if (kept && !("neighbours" in refined) && refined.descend) afterDescent = current;
    refinements.push({ key, value: valueOf(key), samples: sampled.map((s) => ({ value: axis.values[s.index] as number, objective: s.value })) });
  }
  // A later proportion moved the design (stepped beyond its samples, or chose another sample and
  // carried a proportion along) to where those refined before it were not sampled: each declared with
  // `descend` steps again, from the better of where it was carried and where it was chosen, towards its
  // better neighbour, while each step is better by more than the tie band (descended). Starting from
  // the carried value alone, the demo's net at 40 and 60 m kept a mast height carried up to 0.19 where
  // 0.15–0.16 was 4–6 % lower, each step towards it paying less than the band (measured 5 Dec).
  if (afterDescent !== null && JSON.stringify(afterDescent) !== JSON.stringify(current)) {
    for (const refined of model.refinedInFull ?? []) {
      if ("neighbours" in refined || !refined.descend) continue;
      const axis = axisOf(model, refined, setting.rise, setting.spanM, setting.pinned, current);
      if (!axis) continue;
      const moved = movedFrom(current, refined.key, axis);
      const objectiveAt = (index: number) => at(moved(index).options, moved(index).riseM).objective;
      // from where it was carried to or where it was chosen, whichever is better at the proportions now
      const carriedTo = nearestIndex(axis.values, valueOf(refined.key));
      const chosenAt = nearestIndex(axis.values, refined.key === RISE_KEY ? afterDescent.riseM : (afterDescent.options[refined.key] as number));
      const here = objectiveAt(chosenAt) < objectiveAt(carriedTo) ? chosenAt : carriedTo;
      const next = [here - 1, here + 1].filter((i) => i >= 0 && i < axis.values.length).sort((a, b) => objectiveAt(a) - objectiveAt(b))[0];
      const index = next === undefined ? here : descended(here, next < here ? 0 : axis.values.length - 1, objectiveAt);
      if (index !== carriedTo) current = moved(index);
    }
  }
  // a proportion carried by a later one, or stepped again, is reported where it ended
  for (const entry of refinements) entry.value = valueOf(entry.key);
  const full = at(current.options, current.riseM);
  const others = [...designed.values()].filter((d) => d !== full && Number.isFinite(d.objective));
  const runnerUp = others.reduce<FullDesign | null>((a, b) => (a === null || b.objective < a.objective ? b : a), null);
  return { full, runnerUp, refinements, evaluations: designed.size };
}

/**
 * The proportion `carries` moved with `key` to `value`: scaled by (1 − value) ÷ (1 − its value in
 * `options`), on its grid (the net's mast height with its mast ring: the outer radial cables keep
 * their slope); nothing when it is pinned or not a number option.
 */
function carried(model: SchemeModel, pinned: readonly string[], options: SchemeOptions, key: string, value: number, carries: string | undefined): SchemeOptions {
  if (carries === undefined || pinned.includes(carries)) return {};
  const spec = model.options.find((o) => o.key === carries);
  const from = options[key] as number;
  if (spec?.kind !== "number" || typeof options[carries] !== "number" || from === value) return {};
  const values = gridOf(spec.min, spec.max, spec.step, spec.integer === true);
  return { [carries]: values[nearestIndex(values, ((options[carries] as number) * (1 - value)) / (1 - from))] as number };
}
