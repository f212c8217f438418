import type { SchemeId } from "../schemes/types";
import type { EstimateClass } from "../cost";

/** The outputs the risk analysis reports, with their units in the names. */
export type RiskMetric = "selfWeightKgPerM2" | "carbonKgCO2ePerM2Floor" | "costPerM2Floor";
export const RISK_METRICS: readonly RiskMetric[] = ["selfWeightKgPerM2", "carbonKgCO2ePerM2Floor", "costPerM2Floor"];
export const RISK_METRIC_LABELS: Readonly<Record<RiskMetric, string>> = {
  selfWeightKgPerM2: "Self-weight (kg/m² plan)",
  carbonKgCO2ePerM2Floor: "Embodied carbon (kgCO2e/m² usable floor)",
  costPerM2Floor: "Cost (per m² usable floor)",
};

/** One metric of one scheme over the samples in which the scheme was feasible. */
export type MetricSummary = {
  /** The study's own value (the pipeline at the study's values), null when infeasible there. */
  deterministic: number | null;
  p10: number;
  p50: number;
  p90: number;
  mean: number;
  /** Monte Carlo standard errors (cluster-robust: samples sharing a design draw are correlated). */
  seMean: number;
  seP10: number;
  seP50: number;
  seP90: number;
  /** Samples the summary is over. */
  n: number;
};

export type SchemeRisk = {
  id: SchemeId;
  label: string;
  /** Fraction of samples in which the scheme was feasible (and assessed). */
  pFeasible: number;
  /** Why it was infeasible in the most samples, or "". */
  commonReason: string;
  /** Null when the scheme was never feasible (or fewer than two samples were). */
  metrics: Record<RiskMetric, MetricSummary | null>;
  /** Probability of having the lowest carbon / cost among the schemes feasible in a sample. */
  pLowestCarbon: number;
  pLowestCost: number;
  seLowestCarbon: number;
  seLowestCost: number;
};

/** P(a beats b): the fraction of samples, among those in which both are feasible, where a's value is lower (ties count half). */
export type PairwiseResult = { metric: "carbonKgCO2ePerM2Floor" | "costPerM2Floor"; a: SchemeId; b: SchemeId; pABeatsB: number; n: number };

/** Spearman rank correlation of an input with a scheme's metric over the samples (null: no spread). */
export type RankCorrelation = { scheme: SchemeId; metric: RiskMetric; inputId: string; rho: number | null };

export type RiskResult = {
  samples: number;
  seed: number;
  /** Distinct draws of the design-affecting inputs (each designed once per scheme). */
  designSamples: number;
  /** Design calls made per scheme (distinct designs after reuse). */
  designsPerScheme: Partial<Record<SchemeId, number>>;
  /** Samples with at least one feasible scheme (the base of the probabilities of being lowest). */
  samplesWithFeasible: number;
  schemes: SchemeRisk[];
  pairwise: PairwiseResult[];
  rankCorrelations: RankCorrelation[];
  /** Inputs that change designs and inputs that change only the assessment, by id. */
  designInputs: string[];
  assessmentInputs: string[];
  /** The inputs each scheme's result can depend on at the study's values (its options, its take-off's factor and rate rows, the shared inputs), by id. */
  usedInputs: Partial<Record<SchemeId, string[]>>;
  estimateClass: EstimateClass;
  /** What the ranges do and do not cover. */
  coverage: string;
  currency: string;
  warnings: string[];
};

/** The sentence every risk result carries. */
export const RISK_COVERAGE =
  "The ranges show how the listed inputs' ranges, drawn as stated (grouped inputs together, the rest independently), carry through the same simplified feasibility methods; they do not cover the methods' own error, the estimate class's accuracy, inputs held fixed (span, rise, geometry, material choices), or events outside the ranges, so the true spread is wider.";
