import * as Plot from "@observablehq/plot";
import type { SchemeResult } from "../pipeline";
import { materialInfo, type MaterialKind } from "../materials";
import { paretoFront } from "../comparison/pareto";
import { statusOf, metricValue } from "../comparison/verdict";
import { SCHEME_COLOURS, MATERIAL_KIND_COLOURS, moduleColour } from "./palette";
import { carbonByModuleData, carbonScale, COUNTED_MODULES } from "./carbon-chart-data";
import { isSubstructure } from "../schemes/kit";

// The compare page's option charts (issue 14, "charts that read"): every per-m² figure on one
// basis, the usable floor; schemes outside their method's valid range drawn apart (faded, below a
// rule, named so) and left out of the scale unless `includeExcluded`; schemes that are not
// feasible have nothing to draw and are named in the description.

const KIND_ORDER: readonly MaterialKind[] = ["steel", "cable", "fabric", "cladding", "concrete", "rebar", "timber"];
const KIND_COLOURS = KIND_ORDER.map((kind) => MATERIAL_KIND_COLOURS[kind]);
const APART_OPACITY = 0.35;

export interface ComparisonChartCommon {
  title: string;
  caption: string;
  width?: number;
  /** Bring schemes outside their valid range into the scale (default: drawn apart, off the scale). */
  includeExcluded?: boolean;
}

/** A chart's Plot options and a sentence describing it for assistive technology. */
export type DescribedChart = Plot.PlotOptions & { ariaDescription: string };

/** Ranked (feasible, in range) results, results drawn apart (outside the valid range, still designed), and results with nothing to draw. */
function partition(results: readonly SchemeResult[]) {
  const ranked = results.filter((r) => statusOf(r.design) === "feasible");
  const apart = results.filter((r) => statusOf(r.design) === "out-of-range" && r.design.usableFloorM2 > 0);
  const missing = results.filter((r) => !ranked.includes(r) && !apart.includes(r));
  return { ranked, apart, missing };
}

/** The row label of a result: its name, and for one drawn apart the reason. */
function rowLabel(r: SchemeResult): string {
  return statusOf(r.design) === "feasible" ? r.label : `${r.label} (outside valid range)`;
}

function schemeColour(results: readonly SchemeResult[]) {
  return { domain: results.map(rowLabel), range: results.map((r) => SCHEME_COLOURS[r.id]) };
}

/** The upper end of a value axis: the largest ranked total, or every total when the apart rows are brought in. */
function axisMax(totals: ReadonlyMap<SchemeResult, number>, ranked: readonly SchemeResult[], include: boolean): number | undefined {
  const values = [...totals.entries()].filter(([r]) => include || ranked.includes(r)).map(([, v]) => v);
  return values.length > 0 ? Math.max(...values) * 1.05 : undefined;
}

/** Marks for rows drawn apart whose value runs off the scale: the value written at the axis end. */
function offScale(totals: ReadonlyMap<SchemeResult, number>, apart: readonly SchemeResult[], max: number | undefined, unit: string): Plot.Markish[] {
  if (max === undefined) return [];
  const off = apart.filter((r) => (totals.get(r) ?? 0) > max).map((r) => ({ scheme: rowLabel(r), x: max, text: `${Math.round(totals.get(r) ?? 0).toLocaleString("en-GB")} ${unit} → off scale` }));
  return [Plot.text(off, { x: "x", y: "scheme", text: "text", textAnchor: "end", dx: -4, fill: "#5a6270", fontSize: 10 })];
}

function describe(title: string, results: readonly SchemeResult[], value: (r: SchemeResult) => number | null, unit: string): string {
  const { ranked, apart, missing } = partition(results);
  const list = (rs: readonly SchemeResult[]) => rs.map((r) => `${r.label} ${Math.round(value(r) ?? Number.NaN).toLocaleString("en-GB")} ${unit}`).join("; ");
  return [
    `${title}.`,
    ranked.length > 0 ? `Feasible schemes in range: ${list(ranked)}.` : "No scheme is feasible and in range.",
    apart.length > 0 ? `Drawn apart, outside their method's valid range: ${list(apart)}.` : "",
    missing.length > 0 ? `Not drawn (not feasible or not assessed): ${missing.map((r) => r.label).join(", ")}.` : "",
  ].filter((s) => s !== "").join(" ");
}

function barLayout(common: ComparisonChartCommon, rows: number) {
  return { title: common.title, caption: common.caption, width: common.width ?? 580, marginLeft: 210, height: 70 + 34 * rows };
}

/** Stacked bars: roof mass per m² of usable floor by material kind (substructure such as ground anchors left out). */
export function massByMaterialChart(results: readonly SchemeResult[], common: ComparisonChartCommon): DescribedChart {
  const { ranked, apart } = partition(results);
  const shown = [...ranked, ...apart];
  const data = shown.flatMap((r) => {
    const byKind = new Map<MaterialKind, number>();
    for (const row of r.design.takeoff) {
      if (isSubstructure(row)) continue;
      const kind = row.material === null ? undefined : materialInfo(row.material)?.kind;
      if (kind) byKind.set(kind, (byKind.get(kind) ?? 0) + row.massKg);
    }
    return [...byKind.entries()].map(([kind, massKg]) => ({ scheme: rowLabel(r), kind, kgPerM2: massKg / r.design.usableFloorM2, apart: apart.includes(r) }));
  });
  const totals = new Map(shown.map((r) => [r, metricValue(r, "weight") ?? 0]));
  const max = axisMax(totals, ranked, common.includeExcluded ?? false);
  return {
    ...barLayout(common, shown.length),
    ariaLabel: common.title,
    ariaDescription: describe(common.title, results, (r) => metricValue(r, "weight"), "kg/m²"),
    x: { label: "Roof mass (kg/m² of usable floor)", grid: true, ...(max === undefined ? {} : { domain: [0, max] }) },
    y: { label: null, domain: shown.map(rowLabel) },
    color: { legend: true, domain: KIND_ORDER as unknown as string[], range: KIND_COLOURS },
    marks: [
      Plot.barX(data, { x: "kgPerM2", y: "scheme", fill: "kind", fillOpacity: (d: { apart: boolean }) => (d.apart ? APART_OPACITY : 1), order: KIND_ORDER as unknown as string[], clip: true, tip: true }),
      ...offScale(totals, apart, max, "kg/m²"),
      Plot.ruleX([0]),
    ],
  };
}

/** What the dashed ticks of the carbon-by-module bars are, in the chart's title (every page's copy: the client's had no word for them). */
const MODULE_D_KEY = "(dashed: module D, the credit for reuse and recycling after the building's life, reported apart and not subtracted)";

/**
 * Stacked bars: counted carbon per m² of usable floor by life-cycle module (the carbon page's data,
 * `carbonByModuleData`, with the one module palette); module D drawn apart as a dashed tick.
 */
export function carbonByModuleChart(results: readonly SchemeResult[], common: ComparisonChartCommon): DescribedChart {
  const { ranked, apart } = partition(results);
  const shown = [...ranked, ...apart].filter((r) => r.carbon && carbonScale(r.carbon, "per-m2-floor") !== null);
  const schemes = shown.flatMap((r) => (r.carbon ? [{ id: r.id, label: rowLabel(r), carbon: r.carbon }] : []));
  const apartLabels = new Set(apart.map(rowLabel));
  const data = carbonByModuleData(schemes, "per-m2-floor").map((d) => ({ ...d, apart: apartLabels.has(d.scheme) }));
  const moduleD = schemes.map((s) => ({ scheme: s.label, value: s.carbon.totals.moduleD * (carbonScale(s.carbon, "per-m2-floor") ?? 0) }));
  const totals = new Map(shown.map((r) => [r, metricValue(r, "carbon") ?? 0]));
  const max = axisMax(totals, ranked, common.includeExcluded ?? false);
  return {
    ...barLayout({ ...common, title: `${common.title} ${MODULE_D_KEY}` }, shown.length),
    ariaLabel: common.title,
    ariaDescription: describe(common.title, results, (r) => metricValue(r, "carbon"), "kgCO2e/m²"),
    x: { label: "Embodied carbon (kgCO2e/m² of usable floor)", grid: true, ...(max === undefined ? {} : { domain: [Math.min(0, ...moduleD.map((d) => d.value)), max] }) },
    y: { label: null, domain: shown.map(rowLabel) },
    color: { legend: true, domain: COUNTED_MODULES.map((m) => m.label), range: COUNTED_MODULES.map((m) => moduleColour(m.id)) },
    marks: [
      Plot.barX(data, { x: "value", y: "scheme", fill: "part", fillOpacity: (d: { apart: boolean }) => (d.apart ? APART_OPACITY : 1), order: null, clip: true, tip: true }),
      Plot.tickX(moduleD, { x: "value", y: "scheme", stroke: moduleColour("D"), strokeWidth: 2, strokeDasharray: "3 2", clip: true }),
      ...offScale(totals, apart, max, "kgCO2e/m²"),
      Plot.ruleX([0]),
    ],
  };
}

/** What the cost bars' lines are, in the chart's title. */
const COST_RANGE_KEY = "(bar: estimate; line: low–high rates)";

/** Bars: cost per m² of usable floor, with the low–high range of the rates as a rule. */
export function costPerM2Chart(results: readonly SchemeResult[], common: ComparisonChartCommon): DescribedChart {
  const { ranked, apart } = partition(results);
  const shown = [...ranked, ...apart].filter((r) => r.cost);
  const data = shown.flatMap((r) => {
    const cost = r.cost;
    if (!cost) return [];
    const floor = r.design.usableFloorM2;
    return [{ scheme: rowLabel(r), value: cost.totals.total / floor, low: cost.totals.totalLow / floor, high: cost.totals.totalHigh / floor, apart: apart.includes(r) }];
  });
  const currency = results.find((r) => r.cost)?.cost?.currency ?? "";
  const totals = new Map(shown.map((r) => [r, (r.cost?.totals.totalHigh ?? 0) / r.design.usableFloorM2]));
  const max = axisMax(totals, ranked, common.includeExcluded ?? false);
  return {
    ...barLayout({ ...common, title: `${common.title} ${COST_RANGE_KEY}` }, shown.length),
    ariaLabel: common.title,
    ariaDescription: describe(common.title, results, (r) => metricValue(r, "cost"), `${currency}/m²`),
    x: { label: `Cost (${currency}/m² of usable floor)`, grid: true, ...(max === undefined ? {} : { domain: [0, max] }) },
    y: { label: null, domain: shown.map(rowLabel) },
    color: schemeColour(shown),
    marks: [
      Plot.barX(data, { x: "value", y: "scheme", fill: "scheme", fillOpacity: (d: { apart: boolean }) => (d.apart ? APART_OPACITY : 1), clip: true, tip: true }),
      Plot.ruleY(data, { x1: "low", x2: "high", y: "scheme", stroke: "#222", strokeWidth: 1.5, clip: true }),
      ...offScale(new Map(shown.map((r) => [r, metricValue(r, "cost") ?? 0])), apart, max, currency),
      Plot.ruleX([0]),
    ],
  };
}

/** What the scatter's rings are, in its title: on each point's name as well, the names ran into each other and the axis where two schemes cost nearly the same. */
const FRONT_KEY = "(ringed: no other scheme is both cheaper and lower in carbon)";

/** Scatter: carbon against cost per m² of usable floor, every point named; schemes no other beats on both are ringed (FRONT_KEY in the title). Schemes outside their range are hollow and only drawn when brought in. */
export function carbonVsCostChart(results: readonly SchemeResult[], common: ComparisonChartCommon): DescribedChart {
  const { ranked, apart } = partition(results);
  const point = (r: SchemeResult) => {
    const carbon = metricValue(r, "carbon");
    const cost = metricValue(r, "cost");
    return carbon === null || cost === null ? [] : [{ id: r.id, scheme: rowLabel(r), carbon, cost }];
  };
  const data = ranked.flatMap(point);
  const outside = common.includeExcluded ? apart.flatMap(point) : [];
  const front = new Set(paretoFront(data.map((d) => ({ id: d.id, x: d.cost, y: d.carbon }))));
  const best = data.filter((d) => front.has(d.id));
  const currency = results.find((r) => r.cost)?.cost?.currency ?? "";
  const described = describe(common.title, results, (r) => metricValue(r, "carbon"), "kgCO2e/m²");
  return {
    title: `${common.title} ${FRONT_KEY}`,
    caption: common.caption,
    ariaLabel: common.title,
    ariaDescription: `${described} Not beaten on both cost and carbon: ${best.map((d) => d.scheme).join(", ") || "none"}.`,
    width: common.width ?? 580,
    height: 380,
    inset: 40,
    marginLeft: 100,
    marginRight: 100,
    x: { label: `Cost (${currency}/m² of usable floor)`, grid: true },
    y: { label: "Embodied carbon (kgCO2e/m² of usable floor)", grid: true },
    color: { ...schemeColour([...ranked, ...(common.includeExcluded ? apart : [])]), legend: true },
    marks: [
      Plot.dot(best, { x: "cost", y: "carbon", r: 11, stroke: "#111", strokeWidth: 1.5 }),
      Plot.dot(data, { x: "cost", y: "carbon", fill: "scheme", r: 6, tip: true }),
      Plot.dot(outside, { x: "cost", y: "carbon", stroke: "scheme", r: 6, strokeWidth: 2, strokeDasharray: "2 2", tip: true }),
      Plot.text([...data, ...outside], { x: "cost", y: "carbon", text: "scheme", dy: -16, fontSize: 11, textAnchor: "middle", clip: false }),
    ],
  };
}
