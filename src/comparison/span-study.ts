import type { Study } from "../study/study";
import type { Catalogue } from "../catalogue/types";
import type { SchemeId } from "../schemes/types";
import { SCHEMES } from "../schemes";
import { evaluateStudy, headline } from "../pipeline";

/** One scheme at one span: the figures the span-study charts draw. */
export interface SpanPoint {
  spanM: number;
  id: SchemeId;
  label: string;
  feasible: boolean;
  /** Span inside the method's valid range. */
  inValidRange: boolean;
  reason: string;
  selfWeightKgPerM2: number;
  carbonKgCO2ePerM2Floor: number;
  costPerM2Floor: number;
  massToAir: number;
}

export interface SpanRange {
  fromM: number;
  toM: number;
  stepM: number;
}

/** The spans of a range, inclusive of both ends where the step lands on them. */
export function spansOf(range: SpanRange): number[] {
  const { fromM, toM, stepM } = range;
  if (!(stepM > 0) || !(toM >= fromM)) throw new RangeError(`invalid span range: ${fromM}–${toM} m in steps of ${stepM} m (expected from ≤ to and step > 0)`);
  const count = Math.floor((toM - fromM) / stepM + 1e-9) + 1;
  if (count > 500) throw new RangeError(`invalid span range: ${count} spans (expected at most 500)`);
  return Array.from({ length: count }, (_, i) => Number((fromM + i * stepM).toFixed(6)));
}

/**
 * Evaluates the study's enabled schemes at each span of a range or list (rise kept in proportion). Infeasible
 * points keep NaN metrics so charts break their lines there.
 */
export function runSpanStudy(study: Study, catalogue: Catalogue, range: SpanRange | readonly number[]): SpanPoint[] {
  const points: SpanPoint[] = [];
  for (const spanM of Array.isArray(range) ? range : spansOf(range as SpanRange)) {
    for (const result of evaluateStudy(study, catalogue, { spanM }).results) {
      const h = headline(result);
      const model = SCHEMES.find((m) => m.id === result.id);
      const ok = h.feasible;
      points.push({
        spanM,
        id: result.id,
        label: result.label,
        feasible: ok,
        inValidRange: model ? spanM >= model.validSpanM.min && spanM <= model.validSpanM.max : false,
        reason: h.reason,
        selfWeightKgPerM2: ok ? h.self_weight_kg_per_m2 : Number.NaN,
        carbonKgCO2ePerM2Floor: ok && h.carbon_kgco2e_per_m2_floor !== null ? h.carbon_kgco2e_per_m2_floor : Number.NaN,
        costPerM2Floor: ok && h.cost_per_m2_floor !== null ? h.cost_per_m2_floor : Number.NaN,
        massToAir: ok ? h.mass_to_air : Number.NaN,
      });
    }
  }
  return points;
}

/** The points of one metric grouped by span, for the crossover analysis. */
export function valuesBySpan(points: readonly SpanPoint[], metric: "selfWeightKgPerM2" | "carbonKgCO2ePerM2Floor" | "costPerM2Floor"): { spanM: number; values: Record<string, number> }[] {
  const bySpan = new Map<number, Record<string, number>>();
  for (const p of points) {
    const row = bySpan.get(p.spanM) ?? {};
    row[p.id] = p[metric];
    bySpan.set(p.spanM, row);
  }
  return [...bySpan.entries()].map(([spanM, values]) => ({ spanM, values }));
}
