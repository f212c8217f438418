// Charts: pure functions from results to Plot options. No DOM access here.
export { SCHEME_COLOURS, MATERIAL_COLOURS, MATERIAL_KIND_COLOURS, MODULE_PALETTE, materialColour, moduleColour, type ModuleCode } from "./palette";
export { contrastRatio } from "./contrast";
export { drawnRoles, sectionChartOptions, type SectionChartInput } from "./section-chart";
export { sectionOutline, type SectionOutline, type OutlineMark } from "./section-outline";
export { chartCaption } from "./caption";
export { massByMaterialChart, carbonByModuleChart, costPerM2Chart, carbonVsCostChart, type ComparisonChartCommon, type DescribedChart } from "./comparison-charts";
export { carbonChartOptions, carbonApartChartOptions, carbonByElementChartOptions, type CarbonChartInput } from "./carbon-chart";
export { carbonByModuleData, carbonByMaterialData, carbonByElementData, carbonApartData, CARBON_METRICS, COUNTED_MODULES, APART_MODULES, type CarbonMetric, type SchemeCarbon, type CarbonBarDatum } from "./carbon-chart-data";
export { costChartOptions, costByElementData, ON_COSTS_PART, type SchemeCost, type CostBarDatum, type CostChartInput } from "./cost-chart";
export { planChartOptions, type PlanChartInput } from "./plan-chart";
export { spanMetricChart, spanValidityChart, relativeToBest, needsLogScale, type SpanMetric, type SpanChartCommon } from "./span-charts";
export * from "./risk-charts";
export { model3dChartOptions, model3dMagnification, type Model3dChartInput, type ModelProjection } from "./model-3d-chart";
