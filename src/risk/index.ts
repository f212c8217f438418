// Risk: seeded Monte Carlo over the study's uncertain inputs, by the pipeline itself, and sensitivity.

// Random numbers and distributions
export { createPrng, xoshiro128ssFromState, splitMix64, type Prng } from "./prng";
export { type Distribution, type DistributionKind, DISTRIBUTION_KINDS, SHAPE_WORDS, checkRange } from "./distribution";
export { uniformDistribution } from "./uniform-distribution";
export { triangularDistribution } from "./triangular-distribution";
export { pertDistribution, pertShapes } from "./pert-distribution";
export { makeDistribution } from "./make-distribution";
export { logGamma, logBeta } from "./log-gamma";
export { regularizedIncompleteBeta, inverseRegularizedIncompleteBeta } from "./incomplete-beta";

// Sample statistics
export { quantile, quantileSorted, sortedFinite } from "./sample-quantile";
export { quantileStandardError } from "./quantile-standard-error";
export { standardErrorOfMean, standardErrorOfProportion, clusteredStandardErrorOfMean } from "./standard-error";
export { ranks, pearsonCorrelation, spearmanCorrelation } from "./rank-correlation";

// Uncertain inputs in the study
export { type UncertainInput, type RiskSettings, type PathStep, type RowSelector, type RangeScale, RANGE_SCALES, SCALE_RULES, UncertainInputSchema, RiskSettingsSchema, RISK_LIMITS } from "./risk-settings";
export { resolvePath, resolveInput, resolveRiskInputs, fieldLimits, type ResolvedInput, type IndexPath } from "./resolve-inputs";
export { defaultRiskSettings, DEFAULT_SPREADS } from "./default-risk-settings";
export { checkRiskInputs, formatPath, type RiskInputCheck, type RiskInputProblem } from "./check-risk-inputs";
export { applyValues, compilePaths, type CompiledPaths } from "./apply-values";

// The engine and sensitivity
export { designQuantities, assessmentIntensities, linearAssessment, type DesignQuantities, type Intensities } from "./linear-assessment";
export { runRisk, affectsDesign, RiskCancelledError, type RunRiskOptions, type RiskProgress } from "./run-risk";
export {
  RISK_METRICS,
  RISK_METRIC_LABELS,
  RISK_COVERAGE,
  type RiskMetric,
  type RiskResult,
  type SchemeRisk,
  type MetricSummary,
  type PairwiseResult,
  type RankCorrelation,
} from "./risk-result";
export { riskTornado, type Tornado, type TornadoBar } from "./tornado";
export { inputUsedBy } from "./input-used-by";
