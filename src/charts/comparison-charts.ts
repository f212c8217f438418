import * as Plot from "@observablehq/plot";
import type { SchemeResult } from "../pipeline";
import { materialInfo, type MaterialKind } from "../materials";
import { paretoFront } from "../comparison/pareto";
import { SCHEME_COLOURS, MATERIAL_KIND_COLOURS } from "./palette";
import { carbonChartOptions } from "./carbon-chart";
import { isSubstructure } from "../schemes/kit";

const KIND_ORDER: readonly MaterialKind[] = ["steel", "cable", "fabric", "cladding", "concrete", "rebar", "timber"];
const KIND_COLOURS = KIND_ORDER.map((kind) => MATERIAL_KIND_COLOURS[kind]);

interface Common {
  title: string;
  caption: string;
  width?: number;
}

function schemeColour(results: readonly SchemeResult[]) {
  return { domain: results.map((r) => r.label), range: results.map((r) => SCHEME_COLOURS[r.id]) };
}

/** Stacked bars: roof self-weight per m² of plan by material kind, one bar per scheme (substructure such as ground anchors left out, as in the self-weight). */
export function massByMaterialChart(results: readonly SchemeResult[], common: Common): Plot.PlotOptions {
  const data = results.flatMap((r) => {
    const byKind = new Map<MaterialKind, number>();
    for (const row of r.design.takeoff) {
      if (isSubstructure(row)) continue;
      const kind = row.material === null ? undefined : materialInfo(row.material)?.kind;
      if (kind) byKind.set(kind, (byKind.get(kind) ?? 0) + row.massKg);
    }
    return [...byKind.entries()].map(([kind, massKg]) => ({ scheme: r.label, kind, kgPerM2: massKg / r.design.planAreaM2 }));
  });
  return {
    ...common,
    width: common.width ?? 580,
    marginLeft: 150,
    height: 70 + 34 * results.length,
    x: { label: "Self-weight (kg/m² of plan)", grid: true },
    y: { label: null, domain: results.map((r) => r.label) },
    color: { legend: true, domain: KIND_ORDER as unknown as string[], range: KIND_COLOURS },
    marks: [Plot.barX(data, { x: "kgPerM2", y: "scheme", fill: "kind", order: KIND_ORDER as unknown as string[], tip: true }), Plot.ruleX([0])],
  };
}

/**
 * Stacked bars: counted carbon per m² of usable floor by life-cycle module, module D drawn apart as
 * a dashed tick; the carbon page's one builder (`carbonChartOptions`), with its labels and colours.
 */
export function carbonByModuleChart(results: readonly SchemeResult[], common: Common): Plot.PlotOptions {
  const schemes = results.flatMap((r) => (r.carbon && r.design.feasible ? [{ id: r.id, label: r.label, carbon: r.carbon }] : []));
  return carbonChartOptions({ schemes, by: "module", metric: "per-m2-floor", target: null, targetBasis: "usable-floor", moduleD: true, ...common, width: common.width ?? 580 });
}

/** Bars: cost per m² of usable floor, with the low–high range of the rates as a rule. */
export function costPerM2Chart(results: readonly SchemeResult[], common: Common): Plot.PlotOptions {
  const data = results.flatMap((r) => {
    const cost = r.cost;
    if (!cost || !r.design.feasible || r.design.usableFloorM2 <= 0) return [];
    return [{ scheme: r.label, value: cost.totals.total / r.design.usableFloorM2, low: cost.totals.totalLow / r.design.usableFloorM2, high: cost.totals.totalHigh / r.design.usableFloorM2 }];
  });
  const currency = results.find((r) => r.cost)?.cost?.currency ?? "";
  return {
    ...common,
    width: common.width ?? 580,
    marginLeft: 150,
    height: 70 + 34 * results.length,
    x: { label: `Cost (${currency}/m² of usable floor)`, grid: true },
    y: { label: null, domain: data.map((d) => d.scheme) },
    color: schemeColour(results),
    marks: [
      Plot.barX(data, { x: "value", y: "scheme", fill: "scheme", tip: true }),
      Plot.ruleY(data, { x1: "low", x2: "high", y: "scheme", stroke: "#222", strokeWidth: 1.5 }),
      Plot.ruleX([0]),
    ],
  };
}

/** Scatter: carbon against cost per m² of floor; schemes no other beats on both are ringed and named. */
export function carbonVsCostChart(results: readonly SchemeResult[], common: Common): Plot.PlotOptions {
  const data = results.flatMap((r) => {
    const f = r.figures;
    if (!f.feasible || f.carbonKgCO2ePerM2Floor === null || f.costPerM2Floor === null) return [];
    return [{ id: r.id, scheme: r.label, carbon: f.carbonKgCO2ePerM2Floor, cost: f.costPerM2Floor }];
  });
  const front = new Set(paretoFront(data.map((d) => ({ id: d.id, x: d.cost, y: d.carbon }))));
  const best = data.filter((d) => front.has(d.id));
  const currency = results.find((r) => r.cost)?.cost?.currency ?? "";
  return {
    ...common,
    width: common.width ?? 580,
    height: 380,
    inset: 40,
    marginLeft: 100,
    marginRight: 100,
    x: { label: `Cost (${currency}/m² of usable floor)`, grid: true },
    y: { label: "Embodied carbon (kgCO2e/m² of usable floor)", grid: true },
    color: { ...schemeColour(results), legend: true },
    marks: [
      Plot.dot(best, { x: "cost", y: "carbon", r: 11, stroke: "#111", strokeWidth: 1.5 }),
      Plot.dot(data, { x: "cost", y: "carbon", fill: "scheme", r: 6, tip: true }),
      Plot.text(data, { x: "cost", y: "carbon", text: (d: { scheme: string; id: string }) => (front.has(d.id) ? `${d.scheme} (not beaten on both)` : d.scheme), dy: -16, fontSize: 11, textAnchor: "middle", clip: false }),
    ],
  };
}
