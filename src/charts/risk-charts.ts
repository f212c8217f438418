// Risk charts: range bars, probability of being lowest, tornado and rank correlations (data → Plot options).
export { riskRangeChart, riskRangeData, riskMetricAxisLabel, type RiskChartCommon } from "./risk-range-chart";
export { riskLowestChart, riskLowestData } from "./risk-lowest-chart";
export { riskTornadoChart, tornadoData } from "./risk-tornado-chart";
export { riskRankChart, rankCorrelationData } from "./risk-rank-chart";
