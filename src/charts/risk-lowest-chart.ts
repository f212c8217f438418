import * as Plot from "@observablehq/plot";
import type { RiskResult } from "../risk/risk-result";
import { SCHEME_COLOURS } from "./palette";
import type { RiskChartCommon } from "./risk-range-chart";

/** Rows for the probability-of-being-lowest chart. */
export function riskLowestData(result: RiskResult) {
  return result.schemes.flatMap((s) => [
    { id: s.id, scheme: s.label, what: "Lowest carbon", p: s.pLowestCarbon, se: s.seLowestCarbon },
    { id: s.id, scheme: s.label, what: "Cheapest", p: s.pLowestCost, se: s.seLowestCost },
  ]);
}

/**
 * Bars of each scheme's probability of having the lowest carbon and the lowest cost among the
 * schemes feasible in a sample (each set sums to 1), with ±1 standard error whiskers.
 */
export function riskLowestChart(result: RiskResult, common: RiskChartCommon): Plot.PlotOptions {
  const data = riskLowestData(result);
  const labels = result.schemes.map((s) => s.label);
  return {
    title: common.title,
    caption: common.caption,
    width: common.width ?? 640,
    height: 110 + 34 * Math.max(1, labels.length) * 2,
    marginLeft: 150,
    marginRight: 110,
    x: { label: "Probability of being lowest (% of draws)", domain: [0, 100], grid: true },
    y: { label: null, domain: labels },
    fy: { label: null, domain: ["Lowest carbon", "Cheapest"] },
    color: { domain: labels, range: result.schemes.map((s) => SCHEME_COLOURS[s.id]) },
    marks: [
      Plot.barX(data, { x: (d: (typeof data)[number]) => 100 * d.p, y: "scheme", fy: "what", fill: "scheme", tip: true }),
      Plot.ruleY(data, { x1: (d: (typeof data)[number]) => 100 * Math.max(0, d.p - d.se), x2: (d: (typeof data)[number]) => 100 * Math.min(1, d.p + d.se), y: "scheme", fy: "what", stroke: "#1b1f24" }),
      Plot.text(data, { x: (d: (typeof data)[number]) => 100 * d.p, y: "scheme", fy: "what", text: (d: (typeof data)[number]) => `${Math.round(100 * d.p)} %`, dx: 6, textAnchor: "start", fontSize: 10 }),
      Plot.ruleX([0]),
    ],
  };
}
