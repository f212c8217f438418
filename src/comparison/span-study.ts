import type { Catalogue } from "../catalogue/types";
import type { DesignStatus, SchemeId } from "../schemes/types";
import { SCHEMES } from "../schemes";
import { evaluateStudy, screensDifferently, type Depth, type SchemeResult, type ScreenedChoice, type StudyInputs } from "../pipeline";

/** One scheme at one span: the figures the span-study charts draw. */
export interface SpanPoint {
  spanM: number;
  id: SchemeId;
  label: string;
  feasible: boolean;
  /** Span inside the method's valid range. */
  inValidRange: boolean;
  reason: string;
  /** feasible, out-of-range or infeasible: only "feasible" is ranked and used in crossovers. */
  status: DesignStatus;
  /** The rise this scheme was designed with there, m. */
  riseM: number;
  /** The scheme's named regime there (e.g. single or double layer), "" when it names none; a change between spans is marked. */
  regime: string;
  selfWeightKgPerM2: number;
  carbonKgCO2ePerM2Floor: number;
  costPerM2Floor: number;
  massToAir: number;
  /** From a "screening" pass, for a scheme designed again: what its search chose (the second pass starts from it). */
  screened?: ScreenedChoice;
}

export interface SpanRange {
  fromM: number;
  toM: number;
  stepM: number;
}

/** The most spans a span study evaluates unless told otherwise. */
export const MAX_SPANS = 500;

/** The spans of a range, inclusive of both ends where the step lands on them (at most `maxSpans`). */
export function spansOf(range: SpanRange, maxSpans = MAX_SPANS): number[] {
  const { fromM, toM, stepM } = range;
  if (!(stepM > 0) || !(toM >= fromM)) throw new RangeError(`invalid span range: ${fromM}–${toM} m in steps of ${stepM} m (expected from ≤ to and step > 0)`);
  const count = Math.floor((toM - fromM) / stepM + 1e-9) + 1;
  if (count > maxSpans) throw new RangeError(`invalid span range: ${count} spans (expected at most ${maxSpans})`);
  return Array.from({ length: count }, (_, i) => Number((fromM + i * stepM).toFixed(6)));
}

export interface SpanStudyOptions {
  /** Only these schemes (default: the study's enabled schemes). */
  schemeIds?: readonly SchemeId[];
  /** The most spans a range may give (default MAX_SPANS). */
  maxSpans?: number;
  /** Sees every scheme's whole result at each span (the command line prints and checks them). */
  onResult?: (spanM: number, result: SchemeResult) => void;
  /** "full" (default: every scheme as the compare page designs it) or "screening" (the tension roofs by their closed form: the page's fast first pass). */
  depth?: Depth;
  /** With depth "full": the screening pass's points of the same study; the schemes that have `screened` there are designed in full from it without searching again. */
  screenedPoints?: readonly SpanPoint[];
}

/**
 * The enabled schemes (or `schemeIds`) whose full design differs from the one their proportion
 * search screens with (the tension roofs with the 3D analysis): after a "screening" pass only these
 * need designing again.
 */
export function schemesDesignedAgain(study: StudyInputs, schemeIds?: readonly SchemeId[]): SchemeId[] {
  return SCHEMES.filter((m) => (schemeIds ? schemeIds.includes(m.id) : study.schemes[m.id]?.enabled !== false) && screensDifferently(m, study.schemes[m.id])).map((m) => m.id);
}

/**
 * The study's enabled schemes in the groups that workers may take apart in the first pass: those
 * naming the same mesh cache together (the timber and geodesic domes cut the same spheres), the
 * others in one more group. A worker that takes one group builds only its own spheres and compiles
 * only its schemes' code: on two workers the first pass of the demo study took 5.4–6.4 s against
 * 6.0–7.9 s when each worker took every scheme of its spans (headless Chromium, six alternated pairs
 * of runs on a noisy machine; in each pair the grouped pass was 0.5–1.5 s faster).
 */
export function screeningGroups(study: StudyInputs): SchemeId[][] {
  const groups = new Map<string, SchemeId[]>();
  for (const m of SCHEMES.filter((m) => study.schemes[m.id]?.enabled !== false)) {
    const key = m.meshCache ?? "";
    groups.set(key, [...(groups.get(key) ?? []), m.id]);
  }
  return [...groups.values()];
}

/** One scheme's result at one span as the charts draw it: infeasible points keep NaN metrics. */
function spanPoint(spanM: number, result: SchemeResult): SpanPoint {
  const f = result.figures;
  const model = SCHEMES.find((m) => m.id === result.id);
  const ok = f.feasible;
  return {
    spanM,
    id: result.id,
    label: result.label,
    feasible: ok,
    inValidRange: model ? spanM >= model.validSpanM.min && spanM <= model.validSpanM.max : false,
    reason: f.reason,
    status: f.status,
    riseM: result.brief?.riseM ?? Number.NaN,
    regime: result.design.regime ?? "",
    selfWeightKgPerM2: ok ? f.selfWeightKgPerM2 : Number.NaN,
    carbonKgCO2ePerM2Floor: ok && f.carbonKgCO2ePerM2Floor !== null ? f.carbonKgCO2ePerM2Floor : Number.NaN,
    costPerM2Floor: ok && f.costPerM2Floor !== null ? f.costPerM2Floor : Number.NaN,
    massToAir: ok ? f.massToAir : Number.NaN,
    ...(result.screened ? { screened: result.screened } : {}),
  };
}

/**
 * Evaluates the study's enabled schemes (or `options.schemeIds`) at each span of a range or list
 * (rise kept in proportion). Infeasible points keep NaN metrics so charts break their lines there.
 * The page (in its workers) and the command line's sweep both run this.
 */
export function runSpanStudy(study: StudyInputs, catalogue: Catalogue, range: SpanRange | readonly number[], options: SpanStudyOptions = {}): SpanPoint[] {
  const points: SpanPoint[] = [];
  const spans = Array.isArray(range) ? range : spansOf(range as SpanRange, options.maxSpans);
  for (const spanM of spans) {
    const screened = Object.fromEntries((options.screenedPoints ?? []).filter((p) => p.spanM === spanM && p.screened).map((p) => [p.id, p.screened]));
    const evaluation = evaluateStudy(study, catalogue, { spanM, screened, ...(options.schemeIds ? { schemeIds: options.schemeIds } : {}), ...(options.depth ? { depth: options.depth } : {}) });
    for (const result of evaluation.results) {
      options.onResult?.(spanM, result);
      points.push(spanPoint(spanM, result));
    }
  }
  return points;
}

/** The points of one metric grouped by span, with each scheme's status, for the crossover analysis (only feasible ones are best). */
export function valuesBySpan(points: readonly SpanPoint[], metric: "selfWeightKgPerM2" | "carbonKgCO2ePerM2Floor" | "costPerM2Floor"): { spanM: number; values: Record<string, number>; status: Record<string, DesignStatus> }[] {
  const bySpan = new Map<number, { values: Record<string, number>; status: Record<string, DesignStatus> }>();
  for (const p of points) {
    const row = bySpan.get(p.spanM) ?? { values: {}, status: {} };
    row.values[p.id] = p[metric];
    row.status[p.id] = p.status;
    bySpan.set(p.spanM, row);
  }
  return [...bySpan.entries()].map(([spanM, row]) => ({ spanM, ...row }));
}

/** Where a scheme's named regime changes between neighbouring spans: the span study marks them (a jump there is explained). */
export function regimeChanges(points: readonly SpanPoint[]): { id: SchemeId; fromSpanM: number; toSpanM: number; from: string; to: string }[] {
  const out: { id: SchemeId; fromSpanM: number; toSpanM: number; from: string; to: string }[] = [];
  const byScheme = new Map<SchemeId, SpanPoint[]>();
  for (const p of points) byScheme.set(p.id, [...(byScheme.get(p.id) ?? []), p]);
  for (const [id, list] of byScheme) {
    const sorted = [...list].sort((a, b) => a.spanM - b.spanM);
    sorted.forEach((p, i) => {
      const q = sorted[i - 1];
      if (q && q.regime !== "" && p.regime !== "" && q.regime !== p.regime) out.push({ id, fromSpanM: q.spanM, toSpanM: p.spanM, from: q.regime, to: p.regime });
    });
  }
  return out;
}
