import { checkProbability, checkRange, type Distribution } from "./distribution";

/**
 * The triangular distribution (a, m, b): mean (a + m + b)/3, variance
 * (a² + b² + m² − ab − am − bm)/18, and inverse CDF
 * a + √(u(b − a)(m − a)) for u < (m − a)/(b − a), else b − √((1 − u)(b − a)(b − m))
 * (standard results, e.g. Johnson, Kotz and Balakrishnan, Continuous Univariate Distributions
 * vol. 2, 2nd ed. 1995, ch. 26 §9; Evans, Hastings and Peacock, Statistical Distributions).
 * @throws Error unless low ≤ mode ≤ high (finite)
 * @example triangularDistribution(0, 0, 1).quantile(0.75) // 0.5
 */
export function triangularDistribution(low: number, mode: number, high: number): Distribution {
  checkRange(low, mode, high);
  const a = low;
  const m = mode;
  const b = high;
  const width = b - a;
  const split = width === 0 ? 0 : (m - a) / width;
  return {
    kind: "triangular",
    low,
    mode,
    high,
    mean: (a + m + b) / 3,
    variance: (a * a + b * b + m * m - a * b - a * m - b * m) / 18,
    quantile(u) {
      checkProbability(u);
      if (width === 0) return a;
      return u < split ? a + Math.sqrt(u * width * (m - a)) : b - Math.sqrt((1 - u) * width * (b - m));
    },
    shapeKey: width === 0 ? "point" : `triangular:${split.toPrecision(12)}`,
    standardQuantile(u) {
      checkProbability(u);
      if (width === 0) return 0;
      return u < split ? Math.sqrt(u * split) : 1 - Math.sqrt((1 - u) * (1 - split));
    },
  };
}
