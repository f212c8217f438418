import * as Plot from "@observablehq/plot";
import type { Tornado } from "../risk/tornado";
import type { RiskChartCommon } from "./risk-range-chart";
import { riskMetricAxisLabel } from "./risk-range-chart";

/** The bars of a tornado chart: the largest `top` swings, each as a low-end and a high-end bar from the base. */
export function tornadoData(tornado: Tornado, top = 12) {
  const bars = tornado.bars.filter((b) => Number.isFinite(b.swing) && b.swing > 0).slice(0, top);
  return bars.flatMap((b) => [
    { input: b.label, end: "input at its low end", x1: tornado.base, x2: b.atLow, swing: b.swing },
    { input: b.label, end: "input at its high end", x1: tornado.base, x2: b.atHigh, swing: b.swing },
  ]);
}

/**
 * Tornado chart of one scheme and metric: for the inputs with the largest swings, the output with
 * the input at its low and at its high end, the others at the study's values, as bars from the
 * base value (one-at-a-time sensitivity; sorted largest first).
 */
export function riskTornadoChart(tornado: Tornado, currency: string, common: RiskChartCommon & { top?: number }): Plot.PlotOptions {
  const data = tornadoData(tornado, common.top ?? 12);
  const order = [...new Set(data.map((d) => d.input))];
  return {
    title: common.title,
    caption: common.caption,
    width: common.width ?? 780,
    height: 90 + 24 * Math.max(1, order.length),
    marginLeft: 360,
    x: { label: riskMetricAxisLabel(tornado.metric, currency), grid: true },
    y: { label: null, domain: order },
    color: { legend: true, domain: ["input at its low end", "input at its high end"], range: ["#56B4E9", "#D55E00"] },
    marks: [
      Plot.barX(data, { x1: "x1", x2: "x2", y: "input", fill: "end", fillOpacity: 0.85, tip: true }),
      Plot.ruleX([tornado.base], { stroke: "#1b1f24" }),
    ],
  };
}
