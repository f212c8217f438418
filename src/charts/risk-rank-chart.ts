import * as Plot from "@observablehq/plot";
import type { RankCorrelation, RiskMetric } from "../risk/risk-result";
import type { SchemeId } from "../schemes/types";
import type { UncertainInput } from "../risk/risk-settings";
import { SCHEME_COLOURS } from "./palette";
import type { RiskChartCommon } from "./risk-range-chart";

/** The largest |ρ| rank correlations of one scheme and metric among the inputs in `only` (all when absent), labelled by input. */
export function rankCorrelationData(correlations: readonly RankCorrelation[], inputs: readonly UncertainInput[], scheme: SchemeId, metric: RiskMetric, top = 12, only?: ReadonlySet<string>) {
  const label = new Map(inputs.map((i) => [i.id, i.label]));
  return correlations
    .filter((c) => c.scheme === scheme && c.metric === metric && c.rho !== null && (!only || only.has(c.inputId)))
    .map((c) => ({ input: label.get(c.inputId) ?? c.inputId, rho: c.rho as number }))
    .sort((a, b) => Math.abs(b.rho) - Math.abs(a.rho) || a.input.localeCompare(b.input))
    .slice(0, top);
}

/**
 * "How closely the result follows each input when everything varies together": Spearman's rank
 * correlation between each uncertain input and one scheme's result over the samples (largest |ρ|
 * first), drawn as a stalk from 0 to a dot on a −1 to 1 scale.
 */
export function riskRankChart(correlations: readonly RankCorrelation[], inputs: readonly UncertainInput[], scheme: SchemeId, metric: RiskMetric, common: RiskChartCommon & { top?: number; only?: ReadonlySet<string> }): Plot.PlotOptions {
  const data = rankCorrelationData(correlations, inputs, scheme, metric, common.top ?? 12, common.only);
  return {
    title: common.title,
    caption: common.caption,
    width: common.width ?? 780,
    height: 90 + 26 * Math.max(1, data.length),
    marginLeft: 330,
    x: { label: "How closely the result follows the input (rank correlation ρ, −1 to 1; 0: not at all)", domain: [-1, 1], grid: true },
    y: { label: null, domain: data.map((d) => d.input) },
    marks: [
      Plot.ruleX([0], { stroke: "#1b1f24" }),
      Plot.ruleY(data, { y: "input", x1: 0, x2: "rho", stroke: "#8a9099", strokeWidth: 2 }),
      Plot.dot(data, { x: "rho", y: "input", fill: SCHEME_COLOURS[scheme], stroke: "#1b1f24", r: 5, tip: true }),
    ],
  };
}
