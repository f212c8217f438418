import { logBeta } from "./log-gamma";

const EPSILON = 1e-15;
const TINY = 1e-300;
const MAX_TERMS = 500;

/** The continued fraction for I_x(a, b) by the modified Lentz method (Numerical Recipes, 3rd ed., §6.4, betacf). */
function betaContinuedFraction(x: number, a: number, b: number): number {
  const qab = a + b;
  const qap = a + 1;
  const qam = a - 1;
  let c = 1;
  let d = 1 - (qab * x) / qap;
  if (Math.abs(d) < TINY) d = TINY;
  d = 1 / d;
  let h = d;
  for (let m = 1; m <= MAX_TERMS; m++) {
    const m2 = 2 * m;
    let aa = (m * (b - m) * x) / ((qam + m2) * (a + m2));
    d = 1 + aa * d;
    if (Math.abs(d) < TINY) d = TINY;
    c = 1 + aa / c;
    if (Math.abs(c) < TINY) c = TINY;
    d = 1 / d;
    h *= d * c;
    aa = (-(a + m) * (qab + m) * x) / ((a + m2) * (qap + m2));
    d = 1 + aa * d;
    if (Math.abs(d) < TINY) d = TINY;
    c = 1 + aa / c;
    if (Math.abs(c) < TINY) c = TINY;
    d = 1 / d;
    const del = d * c;
    h *= del;
    if (Math.abs(del - 1) < EPSILON) return h;
  }
  throw new Error(`incomplete beta did not converge for x = ${x}, a = ${a}, b = ${b} (after ${MAX_TERMS} terms)`);
}

/**
 * The regularized incomplete beta function I_x(a, b) = B(x; a, b) / B(a, b), the CDF of the
 * beta(a, b) distribution at x, by its continued fraction (Numerical Recipes, 3rd ed., §6.4,
 * eq. 6.4.5, using the symmetry I_x(a, b) = 1 − I_{1−x}(b, a) where the fraction converges faster).
 * Valid for a, b > 0 and 0 ≤ x ≤ 1.
 * @param lnBeta ln B(a, b) if already known (saves three log-gamma evaluations per call)
 * @throws Error for a, b ≤ 0, or x outside [0, 1]
 * @example regularizedIncompleteBeta(0.5, 2, 2) // 0.5
 */
export function regularizedIncompleteBeta(x: number, a: number, b: number, lnBeta = Number.NaN): number {
  if (!(a > 0 && b > 0)) throw new Error(`invalid beta shape: a = ${a}, b = ${b} (expected both > 0)`);
  if (!(x >= 0 && x <= 1)) throw new Error(`invalid x for the incomplete beta: ${x} (expected 0 ≤ x ≤ 1)`);
  if (x === 0) return 0;
  if (x === 1) return 1;
  const lb = Number.isNaN(lnBeta) ? logBeta(a, b) : lnBeta;
  const front = Math.exp(a * Math.log(x) + b * Math.log1p(-x) - lb);
  if (x < (a + 1) / (a + b + 2)) return (front * betaContinuedFraction(x, a, b)) / a;
  return 1 - (front * betaContinuedFraction(1 - x, b, a)) / b;
}

/**
 * The inverse of the regularized incomplete beta function: the x in [0, 1] with I_x(a, b) = p,
 * i.e. the beta(a, b) quantile. Newton's method on I_x − p with the beta density as derivative,
 * kept inside a shrinking bracket (a bisection step whenever Newton would leave it), started from
 * `guess`; converged after a Newton step below 1e-10 (the error left is then of order 1e-20: Newton's
 * quadratic convergence) or when the bracket is below 4e-16. Valid for a, b ≥ 1
 * (a bounded density, so the bracket always contains the root); other shapes also work but converge
 * by bisection near the ends.
 * @throws Error for a, b ≤ 0, p outside [0, 1], or no convergence in 200 steps
 * @example inverseRegularizedIncompleteBeta(0.5, 2, 2) // 0.5
 */
export function inverseRegularizedIncompleteBeta(p: number, a: number, b: number, guess = Number.NaN, lnBeta = Number.NaN): number {
  if (!(a > 0 && b > 0)) throw new Error(`invalid beta shape: a = ${a}, b = ${b} (expected both > 0)`);
  if (!(p >= 0 && p <= 1)) throw new Error(`invalid probability for the beta quantile: ${p} (expected 0 ≤ p ≤ 1)`);
  if (p === 0) return 0;
  if (p === 1) return 1;
  const lb = Number.isNaN(lnBeta) ? logBeta(a, b) : lnBeta;
  let lo = 0;
  let hi = 1;
  let x = guess > 0 && guess < 1 ? guess : a / (a + b);
  for (let step = 0; step < 200; step++) {
    const f = regularizedIncompleteBeta(x, a, b, lb) - p;
    if (f === 0) return x;
    if (f < 0) lo = x;
    else hi = x;
    const density = Math.exp((a - 1) * Math.log(x) + (b - 1) * Math.log1p(-x) - lb);
    let next = density > 0 && Number.isFinite(density) ? x - f / density : Number.NaN;
    const newton = next > lo && next < hi;
    if (!newton) next = 0.5 * (lo + hi);
    // Newton converges quadratically: after a step below 1e-10 the error left is of order 1e-20.
    if ((newton && Math.abs(next - x) < 1e-10) || hi - lo < 4e-16) return next;
    x = next;
  }
  throw new Error(`beta quantile did not converge for p = ${p}, a = ${a}, b = ${b}`);
}
