import * as Plot from "@observablehq/plot";
import type { SpanPoint } from "../comparison/span-study";
import type { SchemeId } from "../schemes/types";
import { SCHEME_COLOURS } from "./palette";

export type SpanMetric = "selfWeightKgPerM2" | "carbonKgCO2ePerM2Floor" | "costPerM2Floor" | "massToAir";

interface Common {
  title: string;
  caption: string;
  width?: number;
}

function colours(points: readonly SpanPoint[]) {
  const seen = new Map<string, SchemeId>();
  for (const p of points) seen.set(p.label, p.id);
  return { domain: [...seen.keys()], range: [...seen.values()].map((id) => SCHEME_COLOURS[id]), legend: true };
}

/**
 * Lines of one metric against span, one per scheme, drawn only where the scheme is feasible
 * (NaN breaks the line): solid inside the method's valid range, dashed outside it. Pure.
 */
export function spanMetricChart(points: readonly SpanPoint[], metric: SpanMetric, yLabel: string, common: Common): Plot.PlotOptions {
  const feasible = points.filter((p) => p.feasible && Number.isFinite(p[metric]));
  // Values inside and outside the valid range as two series so each can have its own dash.
  const inside = points.map((p) => ({ ...p, value: p.inValidRange && p.feasible ? p[metric] : Number.NaN }));
  const outside = points.map((p) => ({ ...p, value: !p.inValidRange && p.feasible ? p[metric] : Number.NaN }));
  return {
    ...common,
    width: common.width ?? 580,
    height: 320,
    marginLeft: 60,
    x: { label: "Clear span (m)", grid: true },
    y: { label: yLabel, grid: true, zero: true },
    color: colours(points),
    marks: [
      Plot.line(outside, { x: "spanM", y: "value", stroke: "label", strokeDasharray: "4 3", strokeOpacity: 0.8 }),
      Plot.line(inside, { x: "spanM", y: "value", stroke: "label", strokeWidth: 2 }),
      Plot.dot(feasible, { x: "spanM", y: metric, fill: "label", r: 2, tip: { format: { x: true, y: true, fill: true } } }),
    ],
  };
}

/**
 * Where each scheme applies: its method's valid span range shaded, the spans at which it is
 * infeasible marked with a cross (reason in the tooltip). Pure.
 */
export function spanValidityChart(points: readonly SpanPoint[], validRanges: readonly { label: string; id: SchemeId; min: number; max: number }[], common: Common): Plot.PlotOptions {
  const spans = points.map((p) => p.spanM);
  const lo = Math.min(...spans);
  const hi = Math.max(...spans);
  const ranges = validRanges.map((r) => ({ ...r, x1: Math.max(lo, r.min), x2: Math.min(hi, r.max) })).filter((r) => r.x2 >= r.x1);
  const infeasible = points.filter((p) => !p.feasible);
  const feasible = points.filter((p) => p.feasible);
  return {
    ...common,
    width: common.width ?? 1160,
    height: 60 + 32 * validRanges.length,
    marginLeft: 160,
    x: { label: "Clear span (m)", domain: [lo, hi], grid: true },
    y: { label: null, domain: validRanges.map((r) => r.label) },
    color: colours(points),
    marks: [
      Plot.barX(ranges, { x1: "x1", x2: "x2", y: "label", fill: "label", fillOpacity: 0.22 }),
      Plot.dot(feasible, { x: "spanM", y: "label", fill: "label", r: 2.5 }),
      Plot.dot(infeasible, { x: "spanM", y: "label", symbol: "times", stroke: "#a11d1d", r: 4, tip: true, title: (p: SpanPoint) => `${p.label} at ${p.spanM} m: ${p.reason}` }),
    ],
  };
}
