/**
 * Sparse symmetric storage and an LDLᵀ factorisation that keeps only the nonzeros of the factor,
 * for the analysis layer's stiffness matrices (a few thousand equations).
 *
 * - Ordering: minimum degree on the graph of nodes (Tinney & Walker, "Direct solutions of sparse
 *   network equations by optimally ordered triangular factorization", Proc. IEEE 55, 1967, scheme 2;
 *   George & Liu, "The evolution of the minimum degree ordering algorithm", SIAM Review 31, 1989):
 *   the node of least degree in the elimination graph is eliminated next, its neighbours joined
 *   into a clique. Ordered by node, so the 3 or 6 freedoms of a node stay together.
 * - Factorisation: the up-looking ("row by row") sparse LDLᵀ with the elimination tree giving each
 *   row's pattern (Davis, "Algorithm 849: a concise sparse Cholesky factorization package",
 *   ACM TOMS 31, 2005; Davis, Direct Methods for Sparse Linear Systems, SIAM 2006, ch. 4). The
 *   symbolic part (tree, column counts) is computed once per pattern and shared by every matrix of
 *   that pattern, so Newton iterations and load combinations only redo the numbers.
 *
 * Why not the envelope solver of sparse.ts: on the 160 m cable net (1,872 equations) its profile
 * holds every entry between two rings of nodes; the factor here holds only the fill, and the tree
 * walk skips the zeros (measured in the commit that added this file). Why not a library: nothing
 * in the npm registry list at hand offers a sparse symmetric factorisation (one dense Cholesky, one
 * sparse storage without a solver).
 */

/** The fixed structure of a family of sparse symmetric matrices and of their LDLᵀ factor. */
export class SparsePattern {
  /** Order of the matrices. */
  readonly n: number;
  /** Upper triangle by columns: rows of column k (all ≤ k, sorted, the diagonal last) at colStart[k]…colStart[k+1]−1. */
  readonly colStart: Int32Array;
  readonly rowIndex: Int32Array;
  /** Elimination tree (parent of each column, −1 at a root) and the factor's column counts. */
  readonly parent: Int32Array;
  readonly factorStart: Int32Array;

  constructor(n: number, columns: readonly (readonly number[])[]) {
    this.n = n;
    this.colStart = new Int32Array(n + 1);
    for (let k = 0; k < n; k++) this.colStart[k + 1] = this.colStart[k]! + columns[k]!.length;
    this.rowIndex = new Int32Array(this.colStart[n]!);
    columns.forEach((rows, k) => this.rowIndex.set(rows, this.colStart[k]!));
    this.parent = new Int32Array(n).fill(-1);
    const count = new Int32Array(n);
    const flag = new Int32Array(n);
    for (let k = 0; k < n; k++) {
      flag[k] = k;
      for (let p = this.colStart[k]!; p < this.colStart[k + 1]!; p++) {
        for (let i = this.rowIndex[p]!; flag[i] !== k; i = this.parent[i]!) {
          if (this.parent[i] === -1) this.parent[i] = k;
          count[i]!++;
          flag[i] = k;
        }
      }
    }
    this.factorStart = new Int32Array(n + 1);
    for (let k = 0; k < n; k++) this.factorStart[k + 1] = this.factorStart[k]! + count[k]!;
  }

  /** Position of entry (i, j) in a matrix's values, −1 when it is not in the pattern. */
  slot(i: number, j: number): number {
    if (i > j) [i, j] = [j, i];
    let lo = this.colStart[j]!;
    let hi = this.colStart[j + 1]! - 1;
    while (lo <= hi) {
      const mid = (lo + hi) >> 1;
      const r = this.rowIndex[mid]!;
      if (r === i) return mid;
      if (r < i) lo = mid + 1;
      else hi = mid - 1;
    }
    return -1;
  }

  /** Off-diagonal nonzeros of the factor L. */
  get factorSize(): number {
    return this.factorStart[this.n]!;
  }
}

/** A symmetric matrix of a given pattern (the upper triangle stored by columns). */
export class SparseSymmetricMatrix {
  readonly pattern: SparsePattern;
  values: Float64Array;

  constructor(pattern: SparsePattern) {
    this.pattern = pattern;
    this.values = new Float64Array(pattern.rowIndex.length);
  }

  get n(): number {
    return this.pattern.n;
  }

  /** Adds v to entry (i, j) (and so to (j, i)); the entry must be in the pattern. */
  add(i: number, j: number, v: number): void {
    const s = this.pattern.slot(i, j);
    if (s < 0) throw new RangeError(`entry (${i}, ${j}) is outside the matrix's pattern`);
    this.values[s]! += v;
  }

  /** Entry (i, j), 0 outside the pattern. */
  get(i: number, j: number): number {
    const s = this.pattern.slot(i, j);
    return s < 0 ? 0 : this.values[s]!;
  }

  /** y = A·x. */
  multiply(x: Float64Array, y: Float64Array = new Float64Array(this.n)): Float64Array {
    y.fill(0);
    const { colStart, rowIndex } = this.pattern;
    const values = this.values;
    for (let k = 0; k < this.n; k++) {
      const xk = x[k]!;
      let sum = 0;
      for (let p = colStart[k]!; p < colStart[k + 1]!; p++) {
        const i = rowIndex[p]!;
        const a = values[p]!;
        if (i === k) sum += a * xk;
        else {
          sum += a * x[i]!;
          y[i]! += a * xk;
        }
      }
      y[k]! += sum;
    }
    return y;
  }

  copy(): SparseSymmetricMatrix {
    const c = new SparseSymmetricMatrix(this.pattern);
    c.values.set(this.values);
    return c;
  }

  /** Stored entries of the factor (its off-diagonal nonzeros plus the diagonal). */
  get size(): number {
    return this.pattern.factorSize + this.n;
  }
}

export type SparseFactorisation =
  | { ok: true; solve: (b: Float64Array) => Float64Array; negativePivots: number }
  | { ok: false; equation: number };

/**
 * A = L·D·Lᵀ by rows (up-looking), A left unchanged. A pivot smaller than relativeTolerance × |a_ii|
 * counts as zero: the matrix is singular at that equation.
 */
export function factorSparseLDL(a: SparseSymmetricMatrix, relativeTolerance = 1e-11): SparseFactorisation {
  const { n, colStart, rowIndex, parent, factorStart } = a.pattern;
  const values = a.values;
  const li = new Int32Array(factorStart[n]!);
  const lx = new Float64Array(factorStart[n]!);
  const d = new Float64Array(n);
  const y = new Float64Array(n);
  const stack = new Int32Array(n);
  const flag = new Int32Array(n);
  const filled = new Int32Array(n);
  for (let k = 0; k < n; k++) {
    // Row k's pattern: the paths in the elimination tree from each nonzero of A's column k up to k.
    let top = n;
    flag[k] = k;
    let diagonal = 0;
    for (let p = colStart[k]!; p < colStart[k + 1]!; p++) {
      let i = rowIndex[p]!;
      y[i]! += values[p]!;
      if (i === k) diagonal = values[p]!;
      let len = 0;
      for (; flag[i] !== k; i = parent[i]!) {
        stack[len++] = i;
        flag[i] = k;
      }
      while (len > 0) stack[--top] = stack[--len]!;
    }
    let pivot = y[k]!;
    y[k] = 0;
    for (; top < n; top++) {
      const i = stack[top]!;
      const yi = y[i]!;
      y[i] = 0;
      const end = factorStart[i]! + filled[i]!;
      for (let p = factorStart[i]!; p < end; p++) y[li[p]!]! -= lx[p]! * yi;
      const l = yi / d[i]!;
      pivot -= l * yi;
      li[end] = k;
      lx[end] = l;
      filled[i]!++;
    }
    if (!(Math.abs(pivot) > relativeTolerance * Math.abs(diagonal)) || !Number.isFinite(pivot)) return { ok: false, equation: k };
    d[k] = pivot;
  }
  let negativePivots = 0;
  for (let k = 0; k < n; k++) if (d[k]! < 0) negativePivots++;
  return { ok: true, negativePivots, solve: (b) => solveSparseLDL(n, factorStart, li, lx, d, b) };
}

function solveSparseLDL(n: number, start: Int32Array, li: Int32Array, lx: Float64Array, d: Float64Array, b: Float64Array): Float64Array {
  const x = Float64Array.from(b);
  for (let j = 0; j < n; j++) {
    const xj = x[j]!;
    if (xj !== 0) for (let p = start[j]!; p < start[j + 1]!; p++) x[li[p]!]! -= lx[p]! * xj;
  }
  for (let j = 0; j < n; j++) x[j]! /= d[j]!;
  for (let j = n - 1; j >= 0; j--) {
    let xj = x[j]!;
    for (let p = start[j]!; p < start[j + 1]!; p++) xj -= lx[p]! * x[li[p]!]!;
    x[j] = xj;
  }
  return x;
}

/**
 * Minimum-degree elimination order of the nodes of a graph (ties to the lower node number, so the
 * order is deterministic). The elimination graph is kept explicitly: fine for the few thousand
 * nodes of these models, where it costs a few milliseconds once per model.
 */
export function minimumDegreeOrder(nodeCount: number, edges: readonly (readonly [number, number])[]): Int32Array {
  const adjacent: Set<number>[] = Array.from({ length: nodeCount }, () => new Set<number>());
  for (const [p, q] of edges) {
    if (p === q) continue;
    adjacent[p]!.add(q);
    adjacent[q]!.add(p);
  }
  const eliminated = new Uint8Array(nodeCount);
  const order = new Int32Array(nodeCount);
  for (let k = 0; k < nodeCount; k++) {
    let best = -1;
    let bestDegree = Number.MAX_SAFE_INTEGER;
    for (let v = 0; v < nodeCount; v++) {
      if (eliminated[v]) continue;
      const degree = adjacent[v]!.size;
      if (degree < bestDegree) {
        best = v;
        bestDegree = degree;
      }
    }
    order[k] = best;
    eliminated[best] = 1;
    const neighbours = [...adjacent[best]!];
    for (const p of neighbours) {
      const set = adjacent[p]!;
      set.delete(best);
      for (const q of neighbours) if (q !== p) set.add(q);
    }
    adjacent[best]!.clear();
  }
  return order;
}
