import * as Plot from "@observablehq/plot";
import type { CostAssessment } from "../cost/assess-cost";
import { PART_COLOURS } from "./part-colours";

/** One scheme's cost, as the charts take it. */
export type SchemeCost = { id: string; label: string; cost: CostAssessment };

/** One stacked segment of a cost bar: a scheme, a part (element or on-cost) and its amount. */
export type CostBarDatum = { scheme: string; part: string; value: number };

/** On-costs are stacked as one segment after the elements. */
export const ON_COSTS_PART = "On-costs (prelims, OH&P, fees, risk, inflation)";

/**
 * Stacked-bar data of cost per scheme by element (works) with the on-costs as one further
 * segment, in currency or currency per m² of usable floor (schemes with no floor left out).
 */
export function costByElementData(schemes: readonly SchemeCost[], perM2Floor: boolean): CostBarDatum[] {
  const out: CostBarDatum[] = [];
  for (const s of schemes) {
    const floor = s.cost.areas.usableFloorM2;
    if (perM2Floor && !(floor > 0)) continue;
    const k = perM2Floor ? 1 / floor : 1;
    for (const g of s.cost.byElement) out.push({ scheme: s.label, part: g.key, value: g.cost * k });
    out.push({ scheme: s.label, part: ON_COSTS_PART, value: (s.cost.totals.total - s.cost.totals.works) * k });
  }
  return out;
}

export type CostChartInput = {
  schemes: readonly SchemeCost[];
  perM2Floor: boolean;
  title: string;
  caption: string;
  width?: number;
};

/**
 * Plot options for stacked bars of cost per scheme by element plus on-costs, with the low–high
 * range of the rates as a whisker, in currency or per m² of usable floor. Pure: no DOM.
 */
export function costChartOptions(input: CostChartInput): Plot.PlotOptions {
  const data = costByElementData(input.schemes, input.perM2Floor);
  const currency = input.schemes[0]?.cost.currency ?? "";
  const ranges = input.schemes
    .map((s) => {
      const floor = s.cost.areas.usableFloorM2;
      const k = input.perM2Floor ? (floor > 0 ? 1 / floor : null) : 1;
      return k === null ? null : { scheme: s.label, low: s.cost.totals.totalLow * k, high: s.cost.totals.totalHigh * k };
    })
    .filter((r): r is { scheme: string; low: number; high: number } => r !== null);
  const unit = input.perM2Floor ? `${currency}/m² of usable floor` : currency;
  return {
    title: input.title,
    caption: input.caption,
    width: input.width ?? 760,
    height: 380,
    marginLeft: 70,
    marginBottom: 50,
    x: { label: "Scheme", domain: input.schemes.map((s) => s.label), tickRotate: input.schemes.length > 3 ? -15 : 0 },
    y: { label: `Cost (${unit})`, grid: true, tickFormat: "~s" },
    color: { legend: true, range: [...PART_COLOURS] },
    marks: [
      Plot.barY(data, { x: "scheme", y: "value", fill: "part", title: (d: { part: string; value: number }) => `${d.part}: ${Math.round(d.value).toLocaleString("en-US")}` }),
      Plot.ruleX(ranges, { x: "scheme", y1: "low", y2: "high", stroke: "#1b1f24", strokeWidth: 1.5 }),
      Plot.tickY(ranges, { x: "scheme", y: "low", stroke: "#1b1f24" }),
      Plot.tickY(ranges, { x: "scheme", y: "high", stroke: "#1b1f24" }),
      Plot.ruleY([0]),
    ],
  };
}
