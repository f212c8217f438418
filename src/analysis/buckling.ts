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
import { type EnvelopeMatrix, factorLDL } from "./sparse";

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

/** Eigenvalues and vectors of a small dense symmetric matrix (cyclic Jacobi); vectors as columns, row-major. */
export function symmetricEigen(a: Float64Array, n: number): { values: Float64Array; vectors: Float64Array } {
  const m = Float64Array.from(a);
  const v = new Float64Array(n * n);
  for (let i = 0; i < n; i++) v[i * n + i] = 1;
  for (let sweep = 0; sweep < 60; sweep++) {
    let off = 0;
    for (let p = 0; p < n; p++) for (let q = p + 1; q < n; q++) off += m[p * n + q]! ** 2;
    if (off < 1e-30) break;
    for (let p = 0; p < n; p++) {
      for (let q = p + 1; q < n; q++) {
        const apq = m[p * n + q]!;
        if (Math.abs(apq) < 1e-300) continue;
        const theta = (m[q * n + q]! - m[p * n + p]!) / (2 * apq);
        const t = Math.sign(theta || 1) / (Math.abs(theta) + Math.sqrt(theta * theta + 1));
        const c = 1 / Math.sqrt(t * t + 1);
        const s = t * c;
        for (let k = 0; k < n; k++) {
          const mkp = m[k * n + p]!;
          const mkq = m[k * n + q]!;
          m[k * n + p] = c * mkp - s * mkq;
          m[k * n + q] = s * mkp + c * mkq;
        }
        for (let k = 0; k < n; k++) {
          const mpk = m[p * n + k]!;
          const mqk = m[q * n + k]!;
          m[p * n + k] = c * mpk - s * mqk;
          m[q * n + k] = s * mpk + c * mqk;
        }
        for (let k = 0; k < n; k++) {
          const vkp = v[k * n + p]!;
          const vkq = v[k * n + q]!;
          v[k * n + p] = c * vkp - s * vkq;
          v[k * n + q] = s * vkp + c * vkq;
        }
      }
    }
  }
  return { values: Float64Array.from({ length: n }, (_, i) => m[i * n + i]!), vectors: v };
}

const dot = (a: Float64Array, b: Float64Array) => {
  let s = 0;
  for (let i = 0; i < a.length; i++) s += a[i]! * b[i]!;
  return s;
};

/** Ritz pairs of the Lanczos tridiagonal: the `count` largest positive μ, with residual estimates. */
function ritz(alpha: number[], beta: number[], count: number) {
  const m = alpha.length;
  const t = new Float64Array(m * m);
  for (let i = 0; i < m; i++) {
    t[i * m + i] = alpha[i]!;
    if (i + 1 < m) t[i * m + i + 1] = t[(i + 1) * m + i] = beta[i]!;
  }
  const { values, vectors } = symmetricEigen(t, m);
  const order = [...values.keys()].filter((k) => values[k]! > 0).sort((p, q) => values[q]! - values[p]!).slice(0, count);
  return order.map((k) => ({ mu: values[k]!, y: Float64Array.from({ length: m }, (_, i) => vectors[i * m + k]!), error: Math.abs(beta[m - 1]! * vectors[(m - 1) * m + k]!) }));
}

/**
 * The `count` smallest positive λ of (K − λ·G)·φ = 0 (G = −K_G). K and G share one envelope;
 * K is not modified (pass `solve` when K is already factorised). Converged when each Ritz residual
 * is below `tolerance`·μ.
 */
export function lowestBucklingFactors(
  K: EnvelopeMatrix,
  G: EnvelopeMatrix,
  count = 3,
  options: { tolerance?: number; maxSteps?: number; solve?: (b: Float64Array) => Float64Array } = {},
): BucklingResult {
  const n = K.n;
  const tolerance = options.tolerance ?? 1e-6;
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
    // Full reorthogonalisation in the K inner product, one modified Gram–Schmidt pass (it also
    // removes α·q_j and β·q_{j−1}, the three-term recurrence, exactly).
    for (let i = 0; i < Q.length; i++) {
      const c = dot(KQ[i]!, w);
      const qi = Q[i]!;
      for (let k = 0; k < n; k++) w[k]! -= c * qi[k]!;
    }
    Kw = K.multiply(w);
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
export function factorsBelow(K: EnvelopeMatrix, G: EnvelopeMatrix, sigma: number): number {
  const A = K.copy();
  for (let k = 0; k < A.values.length; k++) A.values[k]! -= sigma * G.values[k]!;
  const f = factorLDL(A, 0);
  if (!f.ok) throw new RangeError(`σ = ${sigma} is a buckling factor (K − σG is singular)`);
  return f.negativePivots;
}
