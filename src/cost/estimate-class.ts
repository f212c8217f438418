/**
 * The class of estimate every cost result is labelled with: a concept screening estimate made
 * from a handful of quantities and unit rates, expected accuracy roughly −50 % to +100 % of the
 * outturn (common practice for the least-defined class of estimate, no source cited).
 */
export type EstimateClass = {
  name: string;
  /** Expected accuracy, low end, % of the estimate (negative). */
  accuracyLowPct: number;
  /** Expected accuracy, high end, % of the estimate. */
  accuracyHighPct: number;
  /** The label pages show beside every cost. */
  label: string;
  source: string;
};

export const CONCEPT_SCREENING: EstimateClass = {
  name: "concept screening",
  accuracyLowPct: -50,
  accuracyHighPct: 100,
  label: "concept screening: roughly −50 % to +100 %",
  source: "common practice, no source",
};
