import * as Plot from "@observablehq/plot";
import type { AreaBasis } from "../carbon/carbon-settings";
import { PART_COLOURS } from "./part-colours";
import { CARBON_METRICS, carbonByMaterialData, carbonByModuleData, COUNTED_MODULES, type CarbonMetric, type SchemeCarbon } from "./carbon-chart-data";

export type CarbonChartInput = {
  schemes: readonly SchemeCarbon[];
  /** Stack by life-cycle module or by material. */
  by: "module" | "material";
  metric: CarbonMetric;
  /** Target on the settings' area basis, kgCO2e/m² (drawn when the metric is per m² of that basis). */
  target: number | null;
  targetBasis: AreaBasis;
  title: string;
  caption: string;
  width?: number;
};

/** Whether a target on `basis` can be drawn on a chart of `metric`. */
export function targetApplies(metric: CarbonMetric, basis: AreaBasis): boolean {
  return (metric === "per-m2-floor" && basis === "usable-floor") || (metric === "per-m2-plan" && basis === "covered-plan");
}

/**
 * Plot options for stacked bars of counted embodied carbon per scheme, by module or by material,
 * in tCO2e or kgCO2e per m² of usable floor or of plan, with an optional target line. Pure: no DOM.
 */
export function carbonChartOptions(input: CarbonChartInput): Plot.PlotOptions {
  const data = input.by === "module" ? carbonByModuleData(input.schemes, input.metric) : carbonByMaterialData(input.schemes, input.metric);
  const axis = CARBON_METRICS.find((m) => m.value === input.metric)?.axis ?? "";
  const showTarget = input.target !== null && targetApplies(input.metric, input.targetBasis);
  const colour =
    input.by === "module"
      ? { legend: true, domain: COUNTED_MODULES.map((m) => m.label), range: ["#1d4e89", "#5b8fc9", "#a9c6e8", "#8a4b00"] }
      : { legend: true, range: [...PART_COLOURS] };
  return {
    title: input.title,
    caption: input.caption,
    width: input.width ?? 760,
    height: 380,
    marginLeft: 60,
    marginBottom: 50,
    x: { label: "Scheme", domain: input.schemes.map((s) => s.label), tickRotate: input.schemes.length > 3 ? -15 : 0 },
    y: { label: axis, grid: true },
    color: colour,
    marks: [
      Plot.barY(data, { x: "scheme", y: "value", fill: "part", title: (d: { part: string; value: number }) => `${d.part}: ${d.value.toFixed(1)}`, order: null }),
      Plot.ruleY([0]),
      ...(showTarget && input.target !== null
        ? [
            Plot.ruleY([input.target], { stroke: "#a11d1d", strokeDasharray: "6 4", strokeWidth: 1.5 }),
            Plot.text([input.target], { y: (d: number) => d, frameAnchor: "right", textAnchor: "end", text: () => `target ${input.target} kgCO2e/m²`, dy: -7, fill: "#a11d1d", stroke: "white", strokeWidth: 3, paintOrder: "stroke" }),
          ]
        : []),
    ],
  };
}
