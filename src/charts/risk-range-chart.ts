import * as Plot from "@observablehq/plot";
import type { RiskMetric, RiskResult } from "../risk/risk-result";
import { SCHEME_COLOURS } from "./palette";

export type RiskChartCommon = { title: string; caption: string; width?: number };

/** Axis labels with quantity and unit, per risk metric (cost in the study's currency). */
export function riskMetricAxisLabel(metric: RiskMetric, currency: string): string {
  switch (metric) {
    case "selfWeightKgPerM2":
      return "Self-weight (kg/m² of plan)";
    case "carbonKgCO2ePerM2Floor":
      return "Embodied carbon (kgCO2e/m² of usable floor)";
    case "costPerM2Floor":
      return `Cost (${currency}/m² of usable floor)`;
  }
}

/** The rows a range bar chart draws: one per scheme with a summary. */
export function riskRangeData(result: RiskResult, metric: RiskMetric) {
  return result.schemes.flatMap((s) => {
    const m = s.metrics[metric];
    return m ? [{ id: s.id, scheme: s.label, p10: m.p10, p50: m.p50, p90: m.p90, deterministic: m.deterministic }] : [];
  });
}

/**
 * Range bars of one metric: per scheme the P10–P90 band of the Monte Carlo samples, a tick at P50
 * and a ring at the deterministic value (the study's own inputs). Pure: data → Plot options.
 */
export function riskRangeChart(result: RiskResult, metric: RiskMetric, common: RiskChartCommon): Plot.PlotOptions {
  const data = riskRangeData(result, metric);
  const det = data.filter((d) => d.deterministic !== null);
  return {
    title: common.title,
    caption: `Bar: the likely range, 1 in 10 to 9 in 10 (P10–P90); tick: the middle (P50); ring: the study's own value. ${common.caption}`,
    width: common.width ?? 640,
    height: 70 + 40 * Math.max(1, data.length),
    marginLeft: 150,
    x: { label: riskMetricAxisLabel(metric, result.currency), grid: true, zero: metric !== "selfWeightKgPerM2" ? true : false },
    y: { label: null, domain: data.map((d) => d.scheme) },
    color: { domain: data.map((d) => d.scheme), range: data.map((d) => SCHEME_COLOURS[d.id]) },
    marks: [
      Plot.barX(data, { x1: "p10", x2: "p90", y: "scheme", fill: "scheme", fillOpacity: 0.55, insetTop: 8, insetBottom: 8, tip: true, title: (d: (typeof data)[number]) => `${d.scheme}\n1 in 10 below ${d.p10.toPrecision(3)} · middle ${d.p50.toPrecision(3)} · 9 in 10 below ${d.p90.toPrecision(3)}` }),
      Plot.tickX(data, { x: "p50", y: "scheme", stroke: "#1b1f24", strokeWidth: 2, insetTop: 4, insetBottom: 4 }),
      Plot.dot(det, { x: "deterministic", y: "scheme", r: 5, stroke: "#1b1f24", fill: "white", strokeWidth: 1.5 }),
    ],
  };
}
