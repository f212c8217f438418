// Comparison: the side-by-side table, the Pareto front, the span study and its crossovers.
export { comparisonTable, comparisonRows, COMPARISON_COLUMNS } from "./comparison-table";
export { paretoFront, type ParetoPoint } from "./pareto";
export { crossovers, describeCrossovers, bestAt, steadyBest, type Crossover, type SpanValues } from "./crossovers";
export { runSpanStudy, schemesDesignedAgain, screeningGroups, spansOf, valuesBySpan, regimeChanges, MAX_SPANS, type SpanPoint, type SpanRange, type SpanStudyOptions } from "./span-study";
export { verdict, statusOf, metricValue, rankMetric, exclusionReason, carbonDriver, VERDICT_METRICS, type Verdict, type VerdictMetric, type DesignStatus, type MetricRanking } from "./verdict";
export { compareStudies, HEADLINE_METRICS, type StudyComparison, type InputChange, type SchemeDelta, type MetricKey } from "./compare-studies";
