import * as Plot from "@observablehq/plot";
import { regimeChanges, type SpanPoint } from "../comparison/span-study";
import type { SchemeId } from "../schemes/types";
import { SCHEME_COLOURS } from "./palette";

export type SpanMetric = "selfWeightKgPerM2" | "carbonKgCO2ePerM2Floor" | "costPerM2Floor" | "massToAir";

interface Common {
  title: string;
  caption: string;
  width?: number;
}

export interface SpanChartCommon extends Common {
  /** The study's own span, marked on the chart, m. */
  studySpanM?: number;
  /** Each scheme against the best feasible, in-range scheme at that span (1 = the best). */
  relative?: boolean;
  /** Bring spans outside a method's valid range into the scale (default: drawn dashed, off the scale). */
  includeExcluded?: boolean;
}

function colours(points: readonly SpanPoint[]) {
  const seen = new Map<string, SchemeId>();
  for (const p of points) seen.set(p.label, p.id);
  return { domain: [...seen.keys()], range: [...seen.values()].map((id) => SCHEME_COLOURS[id]), legend: true };
}

const ranked = (p: SpanPoint) => p.feasible && p.inValidRange;

/** Each point's value divided by the lowest feasible, in-range value at its span (NaN where there is none). */
export function relativeToBest(points: readonly SpanPoint[], metric: SpanMetric): Map<SpanPoint, number> {
  const best = new Map<number, number>();
  for (const p of points) {
    if (!ranked(p) || !Number.isFinite(p[metric])) continue;
    best.set(p.spanM, Math.min(best.get(p.spanM) ?? Number.POSITIVE_INFINITY, p[metric]));
  }
  return new Map(points.map((p) => [p, p[metric] / (best.get(p.spanM) ?? Number.NaN)]));
}

/** Whether the values drawn on the scale differ by more than ten times (then a log scale reads better). */
export function needsLogScale(values: readonly number[]): boolean {
  const positive = values.filter((v) => Number.isFinite(v) && v > 0);
  return positive.length > 1 && Math.max(...positive) / Math.min(...positive) > 10;
}

/** Spans in a row a form must hold, from where it starts, for its name to be written on the chart (or hold to the end of the range). */
const NAMED_FORM_SPANS = 3;

/** Whether the scheme keeps the form `regime` from `spanM` for NAMED_FORM_SPANS spans, or to the end of the range. */
function formHolds(points: readonly SpanPoint[], id: SpanPoint["id"], spanM: number, regime: string): boolean {
  const ahead = points.filter((p) => p.id === id && p.spanM >= spanM).sort((a, b) => a.spanM - b.spanM);
  const held = ahead.findIndex((p) => p.regime !== regime);
  return held === -1 || held >= NAMED_FORM_SPANS;
}

/**
 * Where a scheme's named form changes (regimeChanges), at the first span of the new form as drawn:
 * a small diamond, and the new form's name where that form holds (a count that flips from span to
 * span, as the net's masts can, would write its names over one another).
 */
function regimeMarks(points: readonly SpanPoint[], drawn: readonly (SpanPoint & { value: number })[]) {
  const at = regimeChanges(points).flatMap((c) => {
    const p = drawn.find((q) => q.id === c.id && q.spanM === c.toSpanM && Number.isFinite(q.value));
    return p ? [{ spanM: p.spanM, value: p.value, label: p.label, text: c.to, named: formHolds(points, c.id, c.toSpanM, c.to) }] : [];
  });
  if (at.length === 0) return [];
  return [
    Plot.dot(at, { x: "spanM", y: "value", stroke: "label", fill: "white", symbol: "diamond", r: 4, clip: true }),
    Plot.text(at.filter((m) => m.named), { x: "spanM", y: "value", text: "text", fill: "label", dy: -9, fontSize: 9, clip: true }),
  ];
}

/**
 * Lines of one metric against span, one per scheme: solid where the scheme is feasible and inside
 * its method's valid range, dashed (and off the scale unless `includeExcluded`) outside it, broken
 * where infeasible. Optionally relative to the best at each span; a log scale when the values on
 * the scale differ by more than ten times; the study's own span marked; where a scheme's named form
 * changes (single to double layer, 3 to 4 masts), a diamond and the new form's name. Pure.
 */
export function spanMetricChart(points: readonly SpanPoint[], metric: SpanMetric, yLabel: string, common: SpanChartCommon): Plot.PlotOptions & { ariaDescription: string } {
  const relative = common.relative ? relativeToBest(points, metric) : null;
  const valueOf = (p: SpanPoint) => (relative ? (relative.get(p) ?? Number.NaN) : p[metric]);
  const inside = points.map((p) => ({ ...p, value: ranked(p) ? valueOf(p) : Number.NaN }));
  const outside = points.map((p) => ({ ...p, value: p.feasible && !p.inValidRange ? valueOf(p) : Number.NaN }));
  const scaled = [...inside, ...(common.includeExcluded ? outside : [])].map((p) => p.value).filter(Number.isFinite);
  const log = !relative && needsLogScale(scaled);
  const lo = scaled.length > 0 ? Math.min(...scaled) : 0;
  const hi = scaled.length > 0 ? Math.max(...scaled) : 1;
  const domain: [number, number] = log ? [lo / 1.2, hi * 1.2] : relative ? [1, Math.max(1.05, hi * 1.05)] : [0, hi * 1.05];
  const label = `${relative ? `${yLabel.replace(/ \(.*\)$/, "")} ÷ the best at that span (–)` : yLabel}${log ? ", log scale" : ""}`;
  const spanMark = common.studySpanM === undefined ? [] : [Plot.ruleX([common.studySpanM], { stroke: "#1d4e89", strokeDasharray: "2 3" }), Plot.text([common.studySpanM], { x: (d: number) => d, frameAnchor: "top", text: () => `this study, ${common.studySpanM} m`, dy: 4, dx: 4, textAnchor: "start", fill: "#1d4e89", fontSize: 10 })];
  return {
    title: common.title,
    caption: common.caption,
    ariaLabel: common.title,
    ariaDescription: spanDescription(points, metric, common, log),
    width: common.width ?? 580,
    height: 320,
    marginLeft: 60,
    x: { label: "Clear span (m)", grid: true },
    // a log axis labelled in plain numbers: d3's default for base 10 is SI prefixes, which wrote a
    // ratio of 0.4 as "400m" (read as 400 metres) and 1,000 kg/m² as "1k"
    y: { label, grid: true, type: log ? "log" : "linear", domain, ...(log ? { tickFormat: ",~g" } : {}) },
    color: colours(points),
    marks: [
      ...(relative ? [Plot.ruleY([1], { stroke: "#888" })] : []),
      Plot.line(outside, { x: "spanM", y: "value", stroke: "label", strokeDasharray: "4 3", strokeOpacity: 0.6, clip: true }),
      Plot.line(inside, { x: "spanM", y: "value", stroke: "label", strokeWidth: 2, clip: true }),
      Plot.dot(inside.filter((p) => Number.isFinite(p.value)), { x: "spanM", y: "value", fill: "label", r: 2, clip: true, tip: { format: { x: true, y: true, fill: true } } }),
      ...regimeMarks(points, [...inside, ...(common.includeExcluded ? outside : [])]),
      ...spanMark,
    ],
  };
}

/** The chart in words: the range, the basis, which scale, the study's span. */
function spanDescription(points: readonly SpanPoint[], metric: SpanMetric, common: SpanChartCommon, log: boolean): string {
  const spans = points.map((p) => p.spanM);
  const schemes = [...new Set(points.map((p) => p.label))];
  return [
    `${common.title}, ${Math.min(...spans)} to ${Math.max(...spans)} m, for ${schemes.join(", ")}.`,
    common.relative ? "Each scheme divided by the best feasible scheme in range at that span, so the best is 1." : log ? "Log scale: the values differ by more than ten times." : "",
    common.includeExcluded ? "Spans outside a method's valid range are in the scale, drawn dashed." : "Spans outside a method's valid range are drawn dashed and left out of the scale.",
    common.studySpanM === undefined ? "" : `The study's own span, ${common.studySpanM} m, is marked.`,
    regimeChanges(points).length === 0 ? "" : "A diamond marks where a scheme changes its form, with the new form's name where that form holds for three spans or more.",
    `Metric: ${metric}.`,
  ].filter((s) => s !== "").join(" ");
}

/**
 * Where each scheme applies: its method's valid span range shaded, the spans at which it is
 * infeasible marked with a cross (reason in the tooltip). Pure.
 */
export function spanValidityChart(points: readonly SpanPoint[], validRanges: readonly { label: string; id: SchemeId; min: number; max: number }[], common: Common & { studySpanM?: number }): Plot.PlotOptions & { ariaDescription: string } {
  const spans = points.map((p) => p.spanM);
  const lo = Math.min(...spans);
  const hi = Math.max(...spans);
  const ranges = validRanges.map((r) => ({ ...r, x1: Math.max(lo, r.min), x2: Math.min(hi, r.max) })).filter((r) => r.x2 >= r.x1);
  const infeasible = points.filter((p) => !p.feasible);
  const feasible = points.filter((p) => p.feasible);
  return {
    ...common,
    ariaLabel: common.title,
    ariaDescription: `${common.title}. ${validRanges.map((r) => `${r.label}: valid ${r.min}–${r.max} m, not feasible at ${infeasible.filter((p) => p.id === r.id).length} of ${points.filter((p) => p.id === r.id).length} spans`).join("; ")}.`,
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
      ...(common.studySpanM === undefined ? [] : [Plot.ruleX([common.studySpanM], { stroke: "#1d4e89", strokeDasharray: "2 3" })]),
    ],
  };
}
