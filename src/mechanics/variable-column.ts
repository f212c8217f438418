/**
 * The elastic critical force of a pin-ended column whose flexural rigidity varies along it: the
 * least N for which EI(x)·v″ + N·v = 0, v(0) = v(L) = 0, has a solution other than v = 0 (Euler's
 * equation for bars of variable cross-section; Timoshenko & Gere, Theory of Elastic Stability,
 * 2nd ed. 1961, §2.13). Solved by central differences on n equal intervals: with
 * K = −D₂/Δ² (symmetric, positive definite) and M = diag(1/EI(xᵢ)), N is the least eigenvalue of
 * K·v = N·M·v, found by inverse iteration on the tridiagonal K (Thomas algorithm) and the
 * Rayleigh quotient. The error of the difference scheme falls as 1/n²: for a uniform column it is
 * π²/(12·n²) of Euler's force (2 × 10⁻⁵ at n = 200).
 */

/** Least elastic critical force, N, of a pin-ended column of length `lengthM` whose EI (N·m²) at x is `rigidityAt(x)`. */
export function variableColumnCriticalForceN(lengthM: number, rigidityAt: (xM: number) => number, intervals = 200): number {
  if (!(lengthM > 0 && Number.isFinite(lengthM))) throw new RangeError(`invalid lengthM: ${lengthM} (expected a finite number > 0)`);
  if (!(Number.isInteger(intervals) && intervals >= 8)) throw new RangeError(`invalid intervals: ${intervals} (expected a whole number ≥ 8)`);
  const n = intervals - 1; // interior points
  const h = lengthM / intervals;
  const mass = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const ei = rigidityAt((i + 1) * h);
    if (!(ei > 0 && Number.isFinite(ei))) throw new RangeError(`invalid flexural rigidity at x = ${((i + 1) * h).toFixed(3)} m: ${ei} (expected a finite number > 0)`);
    mass[i] = 1 / ei;
  }
  // K = tridiag(−1, 2, −1)/h²; solve K·y = M·v by the Thomas algorithm (K is the same every iteration).
  const diag = 2 / (h * h);
  const off = -1 / (h * h);
  const c = new Float64Array(n);
  const dPrime = new Float64Array(n);
  dPrime[0] = diag;
  for (let i = 1; i < n; i++) {
    c[i] = off / (dPrime[i - 1] ?? 1);
    dPrime[i] = diag - (c[i] ?? 0) * off;
  }
  const solve = (rhs: Float64Array): Float64Array => {
    const y = new Float64Array(n);
    y[0] = rhs[0] ?? 0;
    for (let i = 1; i < n; i++) y[i] = (rhs[i] ?? 0) - (c[i] ?? 0) * (y[i - 1] ?? 0);
    const x = new Float64Array(n);
    x[n - 1] = (y[n - 1] ?? 0) / (dPrime[n - 1] ?? 1);
    for (let i = n - 2; i >= 0; i--) x[i] = ((y[i] ?? 0) - off * (x[i + 1] ?? 0)) / (dPrime[i] ?? 1);
    return x;
  };
  const rayleigh = (v: Float64Array): number => {
    let kv = 0;
    let mv = 0;
    for (let i = 0; i < n; i++) {
      const vi = v[i] ?? 0;
      kv += vi * (diag * vi + off * ((v[i - 1] ?? 0) + (v[i + 1] ?? 0)));
      mv += (mass[i] ?? 0) * vi * vi;
    }
    return kv / mv;
  };
  // Start from the uniform column's mode (a half sine): the least mode of any positive EI has one sign.
  let v: Float64Array = Float64Array.from({ length: n }, (_, i) => Math.sin((Math.PI * (i + 1)) / intervals));
  let force = rayleigh(v);
  for (let iteration = 0; iteration < 200; iteration++) {
    const next = solve(v.map((vi, i) => (mass[i] ?? 0) * vi));
    let norm = 0;
    for (const x of next) norm = Math.max(norm, Math.abs(x));
    v = next.map((x) => x / norm);
    const updated = rayleigh(v);
    const settled = Math.abs(updated - force) <= 1e-12 * updated;
    force = updated;
    if (settled) break;
  }
  return force;
}
