import { quantileSorted } from "./sample-quantile";

/**
 * An approximate standard error of the sample p-quantile, distribution-free: half the distance
 * between the sample quantiles at p ± √(p(1 − p)/n), the ranks a one-standard-error binomial
 * interval on the count below the quantile reaches (the order-statistic confidence interval for a
 * quantile, e.g. Conover, Practical Nonparametric Statistics, 3rd ed. 1999, §3.2). Pass an
 * effective sample size below n when the samples are correlated.
 * @param sorted ascending samples
 * @param effectiveN samples' worth of information (default: the count)
 * @throws Error for fewer than two samples or p outside [0, 1]
 */
export function quantileStandardError(sorted: ArrayLike<number>, p: number, effectiveN = sorted.length): number {
  if (sorted.length < 2) throw new Error(`quantile standard error requires at least two values (got ${sorted.length})`);
  if (!(p >= 0 && p <= 1)) throw new Error(`invalid probability for a quantile: ${p} (expected 0 ≤ p ≤ 1)`);
  const half = Math.sqrt((p * (1 - p)) / Math.max(1, effectiveN));
  return (quantileSorted(sorted, Math.min(1, p + half)) - quantileSorted(sorted, Math.max(0, p - half))) / 2;
}
