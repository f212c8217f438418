/**
 * Linear (bifurcation) buckling: the smallest positive λ with (K + λ·K_G)·φ = 0, K the elastic
 * stiffness (positive definite), K_G the geometric stiffness of the reference load's member forces.
 *
 * Method: Lanczos on the operator K⁻¹·G, G = −K_G, which is self-adjoint in the K inner product
 * (so the vectors are kept K-orthonormal, with full reorthogonalisation); its eigenvalues are
 * μ = 1/λ, and the largest positive μ — the smallest positive λ — converge first. This is inverse
 * iteration accelerated (a block of Krylov vectors instead of one): Ericsson & Ruhe, "The spectral
 * transformation Lanczos method", Math. Comp. 35 (1980); Parlett, The Symmetric Eigenvalue Problem
 * (1980), ch. 13. One factorisation of K, one solve per step.
 */
import { type SymmetricMatrix, factorLDL } from "./sparse";

export interface BucklingResult {
  converged: boolean;
  reason?: string;
  /** Smallest positive buckling factors, ascending. */
  factors: number[];
  /** Their mode shapes (in equation numbering, K-normalised). */
  modes: Float64Array[];
  /** Lanczos steps taken (= solves with the factorised K). */
  steps: number;
}

const dot = (a: Float64Array, b: Float64Array) => {
  let s = 0;
  for (let i = 0; i < a.length; i++) s += a[i]! * b[i]!;
  return s;
};

/** Number of eigenvalues of the tridiagonal T (diagonal α, off-diagonal β) below x (Sturm sequence). */
function countBelow(alpha: number[], beta: number[], x: number): number {
  let count = 0;
  let d = 1;
  for (let i = 0; i < alpha.length; i++) {
    const b2 = i > 0 ? beta[i - 1]! ** 2 : 0;
    d = alpha[i]! - x - (i > 0 ? b2 / d : 0);
    if (d === 0) d = 1e-300;
    if (d < 0) count++;
  }
  return count;
}

/** Eigenvector of T for eigenvalue μ by inverse iteration (tridiagonal elimination, no pivoting). */
function tridiagonalVector(alpha: number[], beta: number[], mu: number): Float64Array {
  const m = alpha.length;
  const shift = mu + 1e-13 * Math.max(1, Math.abs(mu));
  let y = Float64Array.from({ length: m }, (_, i) => 1 + 0.1 * Math.sin(i + 1));
  for (let it = 0; it < 3; it++) {
    const c = new Float64Array(m);
    const d = new Float64Array(m);
    const x = Float64Array.from(y);
    d[0] = alpha[0]! - shift || 1e-300;
    for (let i = 1; i < m; i++) {
      c[i] = beta[i - 1]! / d[i - 1]!;
      d[i] = alpha[i]! - shift - c[i]! * beta[i - 1]! || 1e-300;
      x[i]! -= c[i]! * x[i - 1]!;
    }
    x[m - 1]! /= d[m - 1]!;
    for (let i = m - 2; i >= 0; i--) x[i] = (x[i]! - beta[i]! * x[i + 1]!) / d[i]!;
    const norm = Math.hypot(...x);
    y = x.map((v) => v / norm);
  }
  return y;
}

/**
 * Ritz pairs of the Lanczos tridiagonal: the `count` largest positive μ (by Sturm bisection), with
 * their vectors (inverse iteration) and residual estimates |β_m·y_m| (Parlett 1980, §13.2).
 */
function ritz(alpha: number[], beta: number[], count: number) {
  const m = alpha.length;
  let lo = Infinity;
  let hi = -Infinity;
  for (let i = 0; i < m; i++) {
    const r = (i > 0 ? Math.abs(beta[i - 1]!) : 0) + (i < m - 1 ? Math.abs(beta[i]!) : 0);
    lo = Math.min(lo, alpha[i]! - r);
    hi = Math.max(hi, alpha[i]! + r);
  }
  const pairs: { mu: number; y: Float64Array; error: number }[] = [];
  for (let k = 1; k <= Math.min(count, m); k++) {
    // The k-th largest eigenvalue: the x where m − k eigenvalues lie below.
    let [a, b] = [lo, hi];
    for (let it = 0; it < 100 && b - a > 1e-15 * Math.max(Math.abs(a), Math.abs(b)); it++) {
      const mid = (a + b) / 2;
      if (countBelow(alpha, beta, mid) > m - k) b = mid;
      else a = mid;
    }
    const mu = (a + b) / 2;
    if (!(mu > 0)) break;
    const y = tridiagonalVector(alpha, beta, mu);
    pairs.push({ mu, y, error: Math.abs(beta[m - 1]! * y[m - 1]!) });
  }
  return pairs;
}

/**
 * The `count` smallest positive λ of (K − λ·G)·φ = 0 (G = −K_G). K and G share one envelope;
 * K is not modified (pass `solve` when K is already factorised). Converged when each Ritz residual
 * is below `tolerance`·μ (default 1e-4: the Ritz value's error is of the order residual²/gap, so
 * about 1e-8 relative for the clustered factors of a dome; measured: 72 steps instead of 96 at 1e-6
 * on the 160 m lattice, the factors equal to 8 digits).
 */
export function lowestBucklingFactors(
  K: SymmetricMatrix,
  G: SymmetricMatrix,
  count = 3,
  options: { tolerance?: number; maxSteps?: number; solve?: (b: Float64Array) => Float64Array } = {},
): BucklingResult {
  const n = K.n;
  const tolerance = options.tolerance ?? 1e-4;
  const maxSteps = options.maxSteps ?? 300;
  const f = options.solve ? { ok: true as const, solve: options.solve } : factorLDL(K.copy());
  if (!f.ok) return { converged: false, reason: `the elastic stiffness is singular (equation ${f.equation}): a mechanism`, factors: [], modes: [], steps: 0 };
  const Q: Float64Array[] = [];
  const KQ: Float64Array[] = [];
  const alpha: number[] = [];
  const beta: number[] = [];
  // Start from a fixed pseudo-random vector (deterministic results), pushed through the operator once.
  let seed = 12345;
  let w = f.solve(G.multiply(Float64Array.from({ length: n }, () => ((seed = (seed * 1103515245 + 12345) % 2147483648) / 2147483648) - 0.5)));
  let Kw = K.multiply(w);
  let norm = Math.sqrt(dot(w, Kw));
  const limit = Math.min(maxSteps, n);
  for (let j = 0; j < limit; j++) {
    const q = w.map((x) => x / norm);
    const Kq = Kw.map((x) => x / norm);
    Q.push(q);
    KQ.push(Kq);
    const Gq = G.multiply(q);
    alpha.push(dot(q, Gq));
    w = f.solve(Gq);
    Kw = Gq; // K·w, kept up to date below instead of a product with K
    // Full reorthogonalisation in the K inner product, one modified Gram–Schmidt pass (it also
    // removes α·q_j and β·q_{j−1}, the three-term recurrence, exactly).
    for (let i = 0; i < Q.length; i++) {
      const Kqi = KQ[i]!;
      const c = dot(Kqi, w);
      const qi = Q[i]!;
      for (let k = 0; k < n; k++) {
        w[k]! -= c * qi[k]!;
        Kw[k]! -= c * Kqi[k]!;
      }
    }
    norm = Math.sqrt(Math.max(0, dot(w, Kw)));
    beta.push(norm);
    const done = norm < 1e-14 || j === limit - 1;
    if ((j + 1) % 8 === 0 || done) {
      const pairs = ritz(alpha, beta, count);
      if ((pairs.length === count && pairs.every((p) => p.error <= tolerance * p.mu)) || done) {
        const modes = pairs.map((p) => {
          const x = new Float64Array(n);
          p.y.forEach((c, i) => {
            const qi = Q[i]!;
            for (let k = 0; k < n; k++) x[k]! += c * qi[k]!;
          });
          return x;
        });
        const ok = pairs.length === count && pairs.every((p) => p.error <= tolerance * p.mu);
        return { converged: ok, ...(ok ? {} : { reason: `Lanczos stopped after ${j + 1} steps with ${pairs.length} of ${count} buckling factors converged` }), factors: pairs.map((p) => 1 / p.mu), modes, steps: j + 1 };
      }
    }
  }
  return { converged: false, reason: "no Lanczos steps (empty model)", factors: [], modes: [], steps: 0 };
}

/** Number of buckling factors below σ: the negative pivots of K − σ·G (Sylvester's law of inertia). */
export function factorsBelow(K: SymmetricMatrix, G: SymmetricMatrix, sigma: number): number {
  const A = K.copy();
  for (let k = 0; k < A.values.length; k++) A.values[k]! -= sigma * G.values[k]!;
  const f = factorLDL(A, 0);
  if (!f.ok) throw new RangeError(`σ = ${sigma} is a buckling factor (K − σG is singular)`);
  return f.negativePivots;
}
