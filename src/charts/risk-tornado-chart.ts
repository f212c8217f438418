import * as Plot from "@observablehq/plot";
import type { Tornado } from "../risk/tornado";
import type { RiskChartCommon } from "./risk-range-chart";
import { riskMetricAxisLabel } from "./risk-range-chart";

/** The swings drawn: the largest `top` swings among the inputs in `only` (all when absent), each with the result at the input's least and most. */
export function tornadoData(tornado: Tornado, top = 12, only?: ReadonlySet<string>) {
  const bars = tornado.bars.filter((b) => Number.isFinite(b.swing) && b.swing > 0 && (!only || only.has(b.inputId))).slice(0, top);
  return bars.flatMap((b) => [
    { input: b.label, end: "input at its least", x1: tornado.base, x2: b.atLow, swing: b.swing },
    { input: b.label, end: "input at its most", x1: tornado.base, x2: b.atHigh, swing: b.swing },
  ]);
}

/**
 * "Which inputs move the result most", one at a time: for the inputs with the largest swings, a
 * line from the result with the input at its least to the result with it at its most (the others
 * at the study's values), a dot at each end and the study's result as a vertical line; largest
 * swing first. The analysis is a one-at-a-time sensitivity; the picture is ours.
 */
export function riskTornadoChart(tornado: Tornado, currency: string, common: RiskChartCommon & { top?: number; only?: ReadonlySet<string> }): Plot.PlotOptions {
  const data = tornadoData(tornado, common.top ?? 12, common.only);
  const order = [...new Set(data.map((d) => d.input))];
  const spans = order.map((input) => {
    const ends = data.filter((d) => d.input === input).map((d) => d.x2);
    return { input, from: Math.min(...ends), to: Math.max(...ends) };
  });
  return {
    title: common.title,
    caption: common.caption,
    width: common.width ?? 780,
    height: 90 + 26 * Math.max(1, order.length),
    marginLeft: 330,
    x: { label: riskMetricAxisLabel(tornado.metric, currency), grid: true },
    y: { label: null, domain: order },
    color: { legend: true, domain: ["input at its least", "input at its most"], range: ["#1d4e89", "#9a5b00"] },
    marks: [
      Plot.ruleY(spans, { y: "input", x1: "from", x2: "to", stroke: "#8a9099", strokeWidth: 3 }),
      Plot.ruleX([tornado.base], { stroke: "#1b1f24", strokeDasharray: "4 3" }),
      Plot.dot(data, { x: "x2", y: "input", fill: "end", r: 5, tip: true }),
    ],
  };
}
