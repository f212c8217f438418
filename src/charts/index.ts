// Charts: pure functions from results to Plot options. No DOM access here.
export { SCHEME_COLOURS } from "./palette";
export { sectionChartOptions, type SectionChartInput } from "./section-chart";
export { chartCaption } from "./caption";
export { massByMaterialChart, carbonByModuleChart, costPerM2Chart, carbonVsCostChart } from "./comparison-charts";
export { carbonChartOptions, targetApplies, type CarbonChartInput } from "./carbon-chart";
export { carbonByModuleData, carbonByMaterialData, CARBON_METRICS, COUNTED_MODULES, type CarbonMetric, type SchemeCarbon, type CarbonBarDatum } from "./carbon-chart-data";
export { costChartOptions, costByElementData, ON_COSTS_PART, type SchemeCost, type CostBarDatum, type CostChartInput } from "./cost-chart";
export { planChartOptions, type PlanChartInput } from "./plan-chart";
export { spanMetricChart, spanValidityChart, type SpanMetric } from "./span-charts";
export * from "./risk-charts";
