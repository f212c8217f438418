import { checkProbability, checkRange, type Distribution } from "./distribution";

/**
 * The uniform distribution on [low, high]: mean (a + b)/2, variance (b − a)²/12, quantile
 * a + u(b − a) (standard results, e.g. Johnson, Kotz and Balakrishnan, Continuous Univariate
 * Distributions vol. 2, 2nd ed. 1995, ch. 26). The mode is kept for display only.
 * @throws Error unless low ≤ mode ≤ high (finite)
 * @example uniformDistribution(0, 5, 10).quantile(0.25) // 2.5
 */
export function uniformDistribution(low: number, mode: number, high: number): Distribution {
  checkRange(low, mode, high);
  const width = high - low;
  return {
    kind: "uniform",
    low,
    mode,
    high,
    mean: (low + high) / 2,
    variance: (width * width) / 12,
    quantile(u) {
      checkProbability(u);
      return width === 0 ? low : low + u * width;
    },
    shapeKey: "uniform",
    standardQuantile: (u) => (checkProbability(u), u),
  };
}
