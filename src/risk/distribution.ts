/** The distributions an uncertain input can take. */
export type DistributionKind = "pert" | "triangular" | "uniform";
export const DISTRIBUTION_KINDS = ["pert", "triangular", "uniform"] as const;

/** How likely values between the ends are, in words (the sampling shapes keep their ids in the study). */
export const SHAPE_WORDS: Readonly<Record<(typeof DISTRIBUTION_KINDS)[number], string>> = {
  pert: "peak at study value, smooth",
  triangular: "peak at study value, straight",
  uniform: "flat: all equally likely",
};

/**
 * A continuous distribution on [low, high] with its most likely value, exact moments and exact
 * quantile (inverse CDF). Sampling is by inverse transform: quantile(u) with u uniform on [0, 1).
 */
export type Distribution = {
  kind: DistributionKind;
  low: number;
  mode: number;
  high: number;
  mean: number;
  variance: number;
  /** The value below which a fraction u of the distribution lies, for 0 ≤ u ≤ 1. */
  quantile(u: number): number;
  /**
   * Distributions with the same shape key have the same standardized quantile on [0, 1] (shape
   * parameters equal to 12 significant figures): quantile(u) = low + (high − low)·standardQuantile(u).
   * Lets a sampler reuse one evaluation for grouped inputs of the same shape (a relative difference
   * of at most about 1e-12 in the shape, so in the value).
   */
  shapeKey: string;
  standardQuantile(u: number): number;
};

/**
 * Checks a three-point range: finite numbers with low ≤ mode ≤ high.
 * @throws Error naming `what`, the values and what is allowed
 */
export function checkRange(low: number, mode: number, high: number, what = "range"): void {
  if (![low, mode, high].every(Number.isFinite)) throw new Error(`invalid ${what}: ${low}, ${mode}, ${high} (expected finite numbers low ≤ mode ≤ high)`);
  if (!(low <= mode && mode <= high)) throw new Error(`invalid ${what}: low ${low}, mode ${mode}, high ${high} (expected low ≤ mode ≤ high)`);
}

/** Checks u for a quantile. */
export function checkProbability(u: number): void {
  if (!(u >= 0 && u <= 1)) throw new Error(`invalid probability: ${u} (expected 0 ≤ u ≤ 1)`);
}
