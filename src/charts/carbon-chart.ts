import * as Plot from "@observablehq/plot";
import type { AreaBasis, BenchmarkBand } from "../carbon/carbon-settings";
import { materialColour, moduleColour, SCHEME_COLOURS } from "./palette";
import type { SchemeId } from "../schemes/types";
import { APART_MODULES, CARBON_METRICS, carbonApartData, carbonByElementData, carbonByMaterialData, carbonByModuleData, carbonScale, COUNTED_MODULES, type CarbonBarDatum, type CarbonMetric, type SchemeCarbon } from "./carbon-chart-data";

export type CarbonChartInput = {
  schemes: readonly SchemeCarbon[];
  /** Stack by life-cycle module or by material. */
  by: "module" | "material";
  metric: CarbonMetric;
  /** Benchmark bands (each drawn when the metric is per m² of its basis). */
  bands?: readonly BenchmarkBand[];
  /** Draw module D (reported apart) as a dashed tick beside each bar. */
  moduleD?: boolean;
  title: string;
  caption: string;
  width?: number;
};

/** Whether a figure per m² of `basis` can be drawn on a chart of `metric`. */
export function basisApplies(metric: CarbonMetric, basis: AreaBasis): boolean {
  return (metric === "per-m2-floor" && basis === "usable-floor") || (metric === "per-m2-plan" && basis === "covered-plan");
}

function stackData(input: CarbonChartInput): CarbonBarDatum[] {
  return input.by === "module" ? carbonByModuleData(input.schemes, input.metric) : carbonByMaterialData(input.schemes, input.metric);
}

/** The colour scale of a stack: modules and materials keep their fixed colours on every page. */
function stackColour(by: CarbonChartInput["by"], data: readonly CarbonBarDatum[]): Plot.ScaleOptions {
  if (by === "module") return { legend: true, domain: COUNTED_MODULES.map((m) => m.label), range: COUNTED_MODULES.map((m) => moduleColour(m.id)) };
  const parts = [...new Map(data.map((d) => [d.part, d.key ?? d.part])).entries()];
  return { legend: true, domain: parts.map(([part]) => part), range: parts.map(([, key]) => materialColour(key)) };
}

function bandMarks(input: CarbonChartInput): Plot.Markish[] {
  const bands = (input.bands ?? []).filter((b) => basisApplies(input.metric, b.basis));
  if (bands.length === 0) return [];
  return [
    Plot.rectY(bands, { y1: "fromKgCO2ePerM2", y2: "toKgCO2ePerM2", fill: "#5f5f5f", fillOpacity: 0.08, stroke: "#5f5f5f", strokeOpacity: 0.5, strokeDasharray: "2 3" }),
    Plot.text(bands, { y: "toKgCO2ePerM2", text: "label", frameAnchor: "left", textAnchor: "start", dy: 8, dx: 4, fill: "#3f3f3f", fontSize: 10 }),
  ];
}

function moduleDMarks(input: CarbonChartInput): Plot.Markish[] {
  if (!input.moduleD) return [];
  const ticks = input.schemes.flatMap((s) => {
    const k = carbonScale(s.carbon, input.metric);
    return k === null ? [] : [{ scheme: s.label, value: s.carbon.totals.moduleD * k }];
  });
  return [Plot.tickY(ticks, { x: "scheme", y: "value", stroke: moduleColour("D"), strokeWidth: 2, strokeDasharray: "3 2" })];
}

/**
 * Plot options for stacked bars of counted embodied carbon per scheme, by module, material or
 * structural element, in tCO2e or kgCO2e per m² of usable floor or of plan, with the
 * benchmark bands of its basis and module D ticks. The one builder of "carbon by module" on every
 * page. Pure: no DOM.
 */
export function carbonChartOptions(input: CarbonChartInput): Plot.PlotOptions {
  const data = stackData(input);
  const axis = CARBON_METRICS.find((m) => m.value === input.metric)?.axis ?? "";
  return {
    title: input.title,
    caption: input.caption,
    width: input.width ?? 760,
    height: 380,
    marginLeft: 60,
    marginBottom: 50,
    x: { label: "Scheme", domain: input.schemes.map((s) => s.label), tickRotate: input.schemes.length > 3 ? -15 : 0 },
    y: { label: axis, grid: true },
    color: stackColour(input.by, data),
    marks: [
      ...bandMarks(input),
      Plot.barY(data, { x: "scheme", y: "value", fill: "part", title: (d: { part: string; value: number }) => `${d.part}: ${d.value.toFixed(1)}`, order: null }),
      Plot.ruleY([0]),
      ...moduleDMarks(input),
    ],
  };
}

/**
 * Plot options for module D and biogenic CO2 stored, per scheme, drawn apart from the counted
 * total (never netted): one row of bars per quantity, in the metric's unit. Pure: no DOM.
 */
export function carbonApartChartOptions(input: Pick<CarbonChartInput, "schemes" | "metric" | "title" | "caption" | "width">): Plot.PlotOptions {
  const data = carbonApartData(input.schemes, input.metric);
  const axis = (CARBON_METRICS.find((m) => m.value === input.metric)?.axis ?? "").replace("Embodied carbon", "Reported apart");
  return {
    title: input.title,
    caption: input.caption,
    width: input.width ?? 760,
    height: 110 + 46 * input.schemes.length,
    marginLeft: 170,
    x: { label: axis, grid: true },
    y: { label: null, domain: input.schemes.map((s) => s.label) },
    // The colour legend names the two panels; facet labels at the right would be cut off.
    fy: { label: null, axis: null, domain: APART_MODULES.map((m) => m.label) },
    color: { legend: true, domain: APART_MODULES.map((m) => m.label), range: APART_MODULES.map((m) => moduleColour(m.id)) },
    marks: [
      Plot.barX(data, { x: "value", y: "scheme", fy: "part", fill: "part", title: (d: CarbonBarDatum) => `${d.scheme}, ${d.part}: ${d.value.toFixed(1)}` }),
      Plot.ruleX([0]),
    ],
  };
}

/**
 * Plot options for counted carbon per structural element: one panel per scheme, one bar per
 * element (the take-off's elements), in the scheme's colour, in the metric's unit. Pure: no DOM.
 */
export function carbonByElementChartOptions(input: Pick<CarbonChartInput, "schemes" | "metric" | "title" | "caption" | "width">): Plot.PlotOptions {
  // One bar per (scheme, element), grouped by scheme: element names differ between schemes, so a shared element axis would leave gaps.
  const data = carbonByElementData(input.schemes, input.metric).map((d) => ({ ...d, bar: `${d.scheme} · ${d.part}` }));
  const axis = CARBON_METRICS.find((m) => m.value === input.metric)?.axis ?? "";
  const colourOf = new Map(input.schemes.map((s) => [s.label, SCHEME_COLOURS[s.id as SchemeId] ?? "#4d4d4d"]));
  return {
    title: input.title,
    caption: input.caption,
    width: input.width ?? 760,
    height: 70 + 17 * data.length,
    marginLeft: 300,
    x: { label: axis, grid: true },
    y: { label: null, domain: data.map((d) => d.bar) },
    color: { legend: true, domain: [...colourOf.keys()], range: [...colourOf.values()] },
    marks: [
      Plot.barX(data, { x: "value", y: "bar", fill: "scheme", title: (d: CarbonBarDatum) => `${d.scheme}, ${d.part}: ${d.value.toFixed(1)}` }),
      Plot.ruleX([0]),
    ],
  };
}
