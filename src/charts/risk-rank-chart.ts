import * as Plot from "@observablehq/plot";
import type { RankCorrelation, RiskMetric } from "../risk/risk-result";
import type { SchemeId } from "../schemes/types";
import type { UncertainInput } from "../risk/risk-settings";
import { SCHEME_COLOURS } from "./palette";
import type { RiskChartCommon } from "./risk-range-chart";

/** The largest |ρ| rank correlations of one scheme and metric, labelled by input. */
export function rankCorrelationData(correlations: readonly RankCorrelation[], inputs: readonly UncertainInput[], scheme: SchemeId, metric: RiskMetric, top = 12) {
  const label = new Map(inputs.map((i) => [i.id, i.label]));
  return correlations
    .filter((c) => c.scheme === scheme && c.metric === metric && c.rho !== null)
    .map((c) => ({ input: label.get(c.inputId) ?? c.inputId, rho: c.rho as number }))
    .sort((a, b) => Math.abs(b.rho) - Math.abs(a.rho) || a.input.localeCompare(b.input))
    .slice(0, top);
}

/**
 * Bars of Spearman's rank correlation between each uncertain input and one scheme's output over
 * the Monte Carlo samples (largest |ρ| first): how strongly the output moves with the input when
 * all inputs vary together.
 */
export function riskRankChart(correlations: readonly RankCorrelation[], inputs: readonly UncertainInput[], scheme: SchemeId, metric: RiskMetric, common: RiskChartCommon & { top?: number }): Plot.PlotOptions {
  const data = rankCorrelationData(correlations, inputs, scheme, metric, common.top ?? 12);
  return {
    title: common.title,
    caption: common.caption,
    width: common.width ?? 780,
    height: 90 + 24 * Math.max(1, data.length),
    marginLeft: 360,
    x: { label: "Spearman rank correlation ρ with the output (–1 to 1)", domain: [-1, 1], grid: true },
    y: { label: null, domain: data.map((d) => d.input) },
    marks: [Plot.barX(data, { x: "rho", y: "input", fill: SCHEME_COLOURS[scheme], tip: true }), Plot.ruleX([0])],
  };
}
