import { checkProbability, checkRange, type Distribution } from "./distribution";
import { inverseRegularizedIncompleteBeta, regularizedIncompleteBeta } from "./incomplete-beta";
import { logBeta } from "./log-gamma";

/** Nodes of the starting-guess table for the PERT quantile (a speed device only; Newton finishes). */
const TABLE_NODES = 256;

/**
 * A starting guess for the beta(α, β) quantile: the CDF tabulated at x = k/256, inverted by cubic
 * Hermite interpolation with slopes dx/dF = 1/density (linear where the density is 0). Close enough
 * that one Newton step usually meets inverseRegularizedIncompleteBeta's tolerance.
 */
function quantileGuesser(alpha: number, beta: number, lnBeta: number): (u: number) => number {
  const cdf = new Float64Array(TABLE_NODES + 1);
  const slope = new Float64Array(TABLE_NODES + 1);
  for (let k = 0; k <= TABLE_NODES; k++) {
    const x = k / TABLE_NODES;
    cdf[k] = regularizedIncompleteBeta(x, alpha, beta, lnBeta);
    const density = x === 0 || x === 1 ? (x === 0 ? (alpha === 1 ? Math.exp(-lnBeta) : 0) : beta === 1 ? Math.exp(-lnBeta) : 0) : Math.exp((alpha - 1) * Math.log(x) + (beta - 1) * Math.log1p(-x) - lnBeta);
    slope[k] = density > 0 ? 1 / density : Number.POSITIVE_INFINITY;
  }
  return (u) => {
    let lo = 0;
    let hi = TABLE_NODES;
    while (hi - lo > 1) {
      const mid = (lo + hi) >>> 1;
      if ((cdf[mid] as number) <= u) lo = mid;
      else hi = mid;
    }
    const f0 = cdf[lo] as number;
    const f1 = cdf[hi] as number;
    const h = f1 - f0;
    const x0 = lo / TABLE_NODES;
    const x1 = hi / TABLE_NODES;
    if (!(h > 0)) return x0;
    const t = (u - f0) / h;
    const m0 = slope[lo] as number;
    const m1 = slope[hi] as number;
    if (!Number.isFinite(m0) || !Number.isFinite(m1)) return x0 + t * (x1 - x0);
    const t2 = t * t;
    const t3 = t2 * t;
    return (2 * t3 - 3 * t2 + 1) * x0 + (t3 - 2 * t2 + t) * h * m0 + (-2 * t3 + 3 * t2) * x1 + (t3 - t2) * h * m1;
  };
}

/**
 * The Beta-PERT distribution (a, m, b): a beta distribution on [a, b] with shapes
 * α = 1 + 4(m − a)/(b − a) and β = 1 + 4(b − m)/(b − a), mean (a + 4m + b)/6 and variance
 * (μ − a)(b − μ)/7 (D. G. Malcolm, J. H. Roseboom, C. E. Clark and W. Fazar, "Application of a
 * technique for research and development program evaluation", Operations Research 7(5), 1959; the
 * shapes as in Vose, Risk Analysis, 3rd ed. 2008, §III.7). The quantile is exact:
 * a + (b − a)·I⁻¹_u(α, β), the inverse regularized incomplete beta function.
 * @throws Error unless low ≤ mode ≤ high (finite)
 * @example pertDistribution(0, 5, 10).quantile(0.5) // 5 (symmetric)
 */
export function pertDistribution(low: number, mode: number, high: number): Distribution {
  checkRange(low, mode, high);
  const a = low;
  const b = high;
  const width = b - a;
  const mean = (a + 4 * mode + b) / 6;
  if (width === 0) {
    return { kind: "pert", low, mode, high, mean: a, variance: 0, quantile: (u) => (checkProbability(u), a), shapeKey: "point", standardQuantile: (u) => (checkProbability(u), 0) };
  }
  const alpha = 1 + (4 * (mode - a)) / width;
  const beta = 1 + (4 * (b - mode)) / width;
  const lnBeta = logBeta(alpha, beta);
  let guess: ((u: number) => number) | undefined;
  const standardQuantile = (u: number): number => {
    guess ??= quantileGuesser(alpha, beta, lnBeta);
    return inverseRegularizedIncompleteBeta(u, alpha, beta, guess(u), lnBeta);
  };
  return {
    kind: "pert",
    low,
    mode,
    high,
    mean,
    variance: ((mean - a) * (b - mean)) / 7,
    quantile(u) {
      checkProbability(u);
      return a + width * standardQuantile(u);
    },
    shapeKey: `pert:${alpha.toPrecision(12)}:${beta.toPrecision(12)}`,
    standardQuantile(u) {
      checkProbability(u);
      return standardQuantile(u);
    },
  };
}

/** The beta shapes α, β of a PERT range (Malcolm et al. 1959), for display and tests. */
export function pertShapes(low: number, mode: number, high: number): { alpha: number; beta: number } {
  checkRange(low, mode, high);
  const width = high - low;
  if (width === 0) throw new Error(`invalid PERT range: low ${low} = high ${high} (expected low < high for the shapes)`);
  return { alpha: 1 + (4 * (mode - low)) / width, beta: 1 + (4 * (high - mode)) / width };
}
