/**
 * BFGS updates of a factorised stiffness for Newton-type iterations (Matthies & Strang, "The
 * solution of nonlinear finite element equations", Int. J. Numer. Meth. Eng. 14, 1979), applied in
 * the two-loop form of Nocedal ("Updating quasi-Newton matrices with limited storage", Math. Comp.
 * 35, 1980): the inverse of the factorised matrix K0 is corrected by the last few pairs
 * (s = step, y = change of the out-of-balance force), so the iteration converges superlinearly
 * without refactorising. A pair whose curvature yᵀs is not positive (a cable going slack or taut
 * in between) is skipped: the update would not stay positive definite.
 */
export class SecantUpdates {
  private readonly steps: Float64Array[] = [];
  private readonly changes: Float64Array[] = [];
  private readonly rho: number[] = [];
  /** Arrays of pairs dropped or cleared, handed out again by `vector` (fresh typed arrays are dear in a browser's worker). */
  private readonly free: Float64Array[] = [];

  constructor(private readonly capacity = 24) {}

  /** Records a step s and the fall of the residual over it, y = R_before − R_after (= K·s for a linear system); takes both arrays over. */
  push(s: Float64Array, y: Float64Array): void {
    let ys = 0;
    let yy = 0;
    for (let k = 0; k < s.length; k++) {
      ys += y[k]! * s[k]!;
      yy += y[k]! * y[k]!;
    }
    if (!(ys > 1e-12 * Math.sqrt(yy) * norm(s))) {
      this.free.push(s, y);
      return;
    }
    if (this.steps.length >= this.capacity) {
      this.free.push(this.steps.shift()!, this.changes.shift()!);
      this.rho.shift();
    }
    this.steps.push(s);
    this.changes.push(y);
    this.rho.push(1 / ys);
  }

  /** Forgets every pair (for a new K0), keeping their arrays for `vector`. */
  clear(): void {
    this.free.push(...this.steps.splice(0), ...this.changes.splice(0));
    this.rho.length = 0;
  }

  /** Takes back an array the caller no longer reads (a direction once stepped along), for `vector`. */
  recycle(v: Float64Array): void {
    this.free.push(v);
  }

  /** An array of n entries to fill and push: one the updates no longer hold, else a new one (its contents are not cleared). */
  vector(n: number): Float64Array {
    const v = this.free.pop();
    return v?.length === n ? v : new Float64Array(n);
  }

  get size(): number {
    return this.steps.length;
  }

  /** The corrected Newton step for residual R: H·R with H the updated inverse of K0 (solve0 = K0⁻¹, which may overwrite its argument: it is given a copy). */
  direction(residual: Float64Array, solve0: (b: Float64Array) => Float64Array): Float64Array {
    const q = this.vector(residual.length);
    q.set(residual);
    const m = this.steps.length;
    const alpha = new Float64Array(m);
    for (let i = m - 1; i >= 0; i--) {
      const s = this.steps[i]!;
      const y = this.changes[i]!;
      const a = this.rho[i]! * dot(s, q);
      alpha[i] = a;
      for (let k = 0; k < q.length; k++) q[k]! -= a * y[k]!;
    }
    const r = solve0(q);
    for (let i = 0; i < m; i++) {
      const s = this.steps[i]!;
      const b = this.rho[i]! * dot(this.changes[i]!, r);
      const c = alpha[i]! - b;
      for (let k = 0; k < r.length; k++) r[k]! += c * s[k]!;
    }
    return r;
  }
}

function dot(a: Float64Array, b: Float64Array): number {
  let sum = 0;
  for (let k = 0; k < a.length; k++) sum += a[k]! * b[k]!;
  return sum;
}

function norm(a: Float64Array): number {
  return Math.sqrt(dot(a, a));
}
