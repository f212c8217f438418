// Charts: pure functions from results to Plot options. No DOM access here.
export { SCHEME_COLOURS, schemeColourScale } from "./palette";
export { sectionChartOptions, type SectionChartInput } from "./section-chart";
export { chartCaption } from "./caption";
export { massByMaterialChart, carbonByModuleChart, costPerM2Chart, carbonVsCostChart } from "./comparison-charts";
