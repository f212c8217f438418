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
 *   ACM TOMS 31, 2005; Davis, Direct Methods for Sparse Linear Systems, SIAM 2006, ch. 4), taken
 *   a supernode (a node's freedoms) at a time, so a row's update reads each row index of L once for
 *   the node's three columns; and the three rows of a node together (rowsOfNode), so each row
 *   index and entry of L is read once for the node's three rows too. The symbolic part (tree,
 *   column counts, supernodes and their rows) is computed once per pattern and shared by every
 *   matrix of that pattern, so Newton iterations and load combinations only redo the numbers.
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

  private blocks?: Supernodes;

  /** The factor's supernodes (computed on first use, then shared by every factorisation of the pattern). */
  get supernodes(): Supernodes {
    return (this.blocks ??= supernodesOf(this));
  }

  private plan?: RowPlan;

  /** The supernodes each row of the factor meets (computed on first use, then shared by every factorisation of the pattern). */
  get rowPlan(): RowPlan {
    return (this.plan ??= rowPlanOf(this, this.supernodes));
  }

  private work?: { y: Float64Array; y3: Float64Array; falls: Float64Array; diagonal: Float64Array; filled: Int32Array };

  /**
   * A factorisation's working arrays (a row being eliminated, a node's three rows interleaved, rows
   * filled per supernode), shared by every factorisation of the pattern: each clears them first and
   * none calls another (fresh typed arrays are dear in a browser's worker: DEVELOPERS.md, "Where
   * the work runs").
   */
  get scratch(): { y: Float64Array; y3: Float64Array; falls: Float64Array; diagonal: Float64Array; filled: Int32Array } {
    return (this.work ??= { y: new Float64Array(this.n), y3: new Float64Array(3 * this.n), falls: new Float64Array(3), diagonal: new Float64Array(3), filled: new Int32Array(this.supernodes.count) });
  }

  /** A released factorisation's arrays, taken by the next factorisation of the pattern (see `release`). */
  spare?: FactorArrays;

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
  | {
      ok: true;
      solve: (b: Float64Array) => Float64Array;
      /** solve, overwriting b with the answer (and returning it): no new array. */
      solveInPlace: (b: Float64Array) => Float64Array;
      negativePivots: number;
      /** Gives the factor's arrays to the pattern's next factorisation; `solve` may not be called after it. */
      release: () => void;
    }
  | { ok: false; equation: number };

/** The numbers of a factor: L inside and below the supernodes, and D. */
interface FactorArrays {
  inner: Float64Array;
  block: Float64Array;
  d: Float64Array;
}

/**
 * The factor's supernodes: runs of consecutive columns c, c+1, … (up to SUPERNODE_COLUMNS) where
 * each is the only child of the next in the elimination tree and has one entry more (so the columns
 * share the rows below the run, and a row of L meets all of a run's columns or none; Liu, Ng & Peyton,
 * "On finding supernodes for sparse matrix computations", SIAM J. Matrix Anal. Appl. 14, 1993, from memory). L is stored by supernode: the strict lower
 * triangle inside the run, and the rows below it (shared) with the run's columns interleaved, so a
 * row's update reads each shared row index once for all the run's columns (the 3 freedoms of a node
 * at least).
 */
export interface Supernodes {
  count: number;
  /** Columns of supernode J: first[J] … first[J+1]−1; the supernode of each column. */
  first: Int32Array;
  of: Int32Array;
  /** Parent supernode in the elimination tree (−1 at a root). */
  parent: Int32Array;
  /** Rows below supernode J: rows[rowStart[J] … rowStart[J+1]−1], ascending. */
  rowStart: Int32Array;
  rows: Int32Array;
  /** Offsets of each supernode's inner triangle and of its rows × columns block in the value arrays. */
  innerStart: Int32Array;
  blockStart: Int32Array;
}

/**
 * Most columns a supernode takes: a node's three freedoms. Measured on the 160 m cable net's tangent
 * (1,728 equations, 38,367 entries in L; median of 200, node): 2.4–2.9 ms a factorisation by
 * single columns, 1.3–1.4 ms in runs of up to 3, 1.6–2.5 ms in runs of any length (the long runs of
 * the dense tail go through the run's own triangle, which costs more than it saves here).
 */
const SUPERNODE_COLUMNS = 3;

function supernodesOf(pattern: SparsePattern): Supernodes {
  const { n, parent, factorStart, colStart, rowIndex } = pattern;
  const count = (j: number) => factorStart[j + 1]! - factorStart[j]!;
  const children = new Int32Array(n);
  for (let j = 0; j < n; j++) if (parent[j]! >= 0) children[parent[j]!]!++;
  const of = new Int32Array(n);
  const firsts: number[] = [];
  for (let j = 0; j < n; j++) {
    const joins = j > 0 && parent[j - 1] === j && children[j] === 1 && count(j - 1) === count(j) + 1 && j - firsts[firsts.length - 1]! < SUPERNODE_COLUMNS;
    if (!joins) firsts.push(j);
    of[j] = firsts.length - 1;
  }
  const m = firsts.length;
  const first = Int32Array.from([...firsts, n]);
  const sParent = new Int32Array(m);
  const rowStart = new Int32Array(m + 1);
  const innerStart = new Int32Array(m + 1);
  const blockStart = new Int32Array(m + 1);
  for (let J = 0; J < m; J++) {
    const last = first[J + 1]! - 1;
    const size = first[J + 1]! - first[J]!;
    sParent[J] = parent[last]! >= 0 ? of[parent[last]!]! : -1;
    rowStart[J + 1] = rowStart[J]! + count(last);
    innerStart[J + 1] = innerStart[J]! + (size * (size - 1)) / 2;
    blockStart[J + 1] = blockStart[J]! + size * count(last);
  }
  // the rows below each supernode: row k is below every supernode on the tree paths from the entries of A's column k
  const rows = new Int32Array(rowStart[m]!);
  const filled = new Int32Array(m);
  const flag = new Int32Array(m).fill(-1);
  for (let k = 0; k < n; k++) {
    const K = of[k]!;
    flag[K] = k;
    for (let p = colStart[k]!; p < colStart[k + 1]!; p++) {
      for (let J = of[rowIndex[p]!]!; flag[J] !== k; J = sParent[J]!) {
        flag[J] = k;
        rows[rowStart[J]! + filled[J]!++] = k;
      }
    }
  }
  return { count: m, first, of, parent: sParent, rowStart, rows, innerStart, blockStart };
}

/**
 * For each row k of the factor, the supernodes below which it lies (other than its own), in the
 * order the up-looking factorisation must apply them (topological: each before its ancestors):
 * supernodes[start[k] … start[k+1]−1]. The tree paths from the entries of A's column k, as each
 * factorisation walked them until the walk was kept once per pattern (the symbolic part of every
 * factorisation: 9.5 % of the 160 m cable net's solves, profiled).
 */
export interface RowPlan {
  start: Int32Array;
  supernodes: Int32Array;
  /**
   * Per supernode, 1 where it has three columns whose rows meet the same supernodes (a node's three
   * freedoms coupled to the same nodes, nearly every supernode of these models): its three rows are
   * eliminated together (see rowsOfNode).
   */
  triple: Uint8Array;
}

function rowPlanOf(pattern: SparsePattern, sn: Supernodes): RowPlan {
  const { n, colStart, rowIndex } = pattern;
  const start = new Int32Array(n + 1);
  const list: number[] = [];
  const stack = new Int32Array(sn.count);
  const path = new Int32Array(sn.count);
  const flag = new Int32Array(sn.count).fill(-1);
  for (let k = 0; k < n; k++) {
    let top = sn.count;
    flag[sn.of[k]!] = k;
    for (let p = colStart[k]!; p < colStart[k + 1]!; p++) {
      let len = 0;
      for (let J = sn.of[rowIndex[p]!]!; flag[J] !== k; J = sn.parent[J]!) {
        path[len++] = J;
        flag[J] = k;
      }
      while (len > 0) stack[--top] = path[--len]!;
    }
    for (; top < sn.count; top++) list.push(stack[top]!);
    start[k + 1] = list.length;
  }
  const supernodes = Int32Array.from(list);
  const triple = new Uint8Array(sn.count);
  const seen = new Int32Array(sn.count).fill(-1);
  for (let K = 0; K < sn.count; K++) {
    const k = sn.first[K]!;
    if (sn.first[K + 1]! - k !== 3) continue;
    const length = start[k + 1]! - start[k]!;
    if (start[k + 2]! - start[k + 1]! !== length || start[k + 3]! - start[k + 2]! !== length) continue;
    for (let t = start[k]!; t < start[k + 1]!; t++) seen[supernodes[t]!] = K;
    let same = true;
    for (let t = start[k + 1]!; t < start[k + 3]! && same; t++) same = seen[supernodes[t]!] === K;
    triple[K] = same ? 1 : 0;
  }
  return { start, supernodes, triple };
}

/**
 * A = L·D·Lᵀ by rows (up-looking, by supernode), A left unchanged. A pivot smaller than
 * relativeTolerance × |a_ii| counts as zero: the matrix is singular at that equation.
 */
export function factorSparseLDL(a: SparseSymmetricMatrix, relativeTolerance = 1e-11): SparseFactorisation {
  const { n, colStart, rowIndex } = a.pattern;
  const sn = a.pattern.supernodes;
  const values = a.values;
  // every entry of these is written before it is read, so a released factor's arrays serve as they are
  const arrays = a.pattern.spare ?? { inner: new Float64Array(sn.innerStart[sn.count]!), block: new Float64Array(sn.blockStart[sn.count]!), d: new Float64Array(n) };
  a.pattern.spare = undefined;
  const { inner, block, d } = arrays;
  const { y, y3, filled } = a.pattern.scratch;
  y.fill(0);
  y3.fill(0);
  filled.fill(0);
  const { start, supernodes: meets, triple } = a.pattern.rowPlan;
  for (let k = 0; k < n; k++) {
    const K = sn.of[k]!;
    if (triple[K] === 1) {
      const failed = rowsOfNode(a, K, relativeTolerance, inner, block, d, y3, filled);
      if (failed >= 0) {
        a.pattern.spare = arrays;
        return { ok: false, equation: failed };
      }
      k += 2;
      continue;
    }
    let diagonal = 0;
    for (let p = colStart[k]!; p < colStart[k + 1]!; p++) {
      const i = rowIndex[p]!;
      y[i]! += values[p]!;
      if (i === k) diagonal = values[p]!;
    }
    let pivot = y[k]!;
    y[k] = 0;
    for (let t = start[k]!; t < start[k + 1]!; t++) {
      const J = meets[t]!;
      pivot -= rowOfSupernode(sn, J, filled[J]!++, inner, block, d, y);
    }
    pivot -= rowInsideSupernode(sn, K, k, inner, d, y);
    if (!(Math.abs(pivot) > relativeTolerance * Math.abs(diagonal)) || !Number.isFinite(pivot)) {
      a.pattern.spare = arrays;
      return { ok: false, equation: k };
    }
    d[k] = pivot;
  }
  let negativePivots = 0;
  for (let k = 0; k < n; k++) if (d[k]! < 0) negativePivots++;
  let released = false;
  return {
    ok: true,
    negativePivots,
    solve: (b) => {
      if (released) throw new Error("a released factorisation was used to solve");
      return solveSupernodal(sn, inner, block, d, Float64Array.from(b));
    },
    solveInPlace: (b) => {
      if (released) throw new Error("a released factorisation was used to solve");
      return solveSupernodal(sn, inner, block, d, b);
    },
    release: () => {
      if (released) return;
      released = true;
      a.pattern.spare ??= arrays;
    },
  };
}

/**
 * Row k's entries in the columns of supernode J (below it, at its `at`-th row): the run's
 * triangle applied to y, the rows above k updated, L(k, ·) stored. Returns Σ l·y (the pivot's fall).
 */
function rowOfSupernode(sn: Supernodes, J: number, at: number, inner: Float64Array, block: Float64Array, d: Float64Array, y: Float64Array): number {
  const c0 = sn.first[J]!;
  const size = sn.first[J + 1]! - c0;
  if (size === 3) return rowOfNodeSupernode(sn, J, at, inner, block, d, y);
  const w = sn.innerStart[J]!;
  for (let t = 0; t < size; t++) {
    const yt = y[c0 + t]!;
    for (let t2 = t + 1; t2 < size; t2++) y[c0 + t2]! -= inner[w + (t2 * (t2 - 1)) / 2 + t]! * yt;
  }
  const r0 = sn.rowStart[J]!;
  const b0 = sn.blockStart[J]!;
  const rows = sn.rows;
  if (size === 3) {
    const y0 = y[c0]!;
    const y1 = y[c0 + 1]!;
    const y2 = y[c0 + 2]!;
    for (let p = r0, q = b0, end = r0 + at; p < end; p++, q += 3) y[rows[p]!]! -= block[q]! * y0 + block[q + 1]! * y1 + block[q + 2]! * y2;
  } else {
    for (let p = 0, q = b0; p < at; p++, q += size) {
      let sum = 0;
      for (let t = 0; t < size; t++) sum += block[q + t]! * y[c0 + t]!;
      y[sn.rows[r0 + p]!]! -= sum;
    }
  }
  let fall = 0;
  const q = b0 + at * size;
  for (let t = 0; t < size; t++) {
    const yt = y[c0 + t]!;
    const l = yt / d[c0 + t]!;
    fall += l * yt;
    block[q + t] = l;
    y[c0 + t] = 0;
  }
  return fall;
}

/**
 * rowOfSupernode for a supernode of three columns (a node's freedoms, most of them), written out:
 * the same operations in the same order, without the loops over the run's size (a call does about
 * as much bookkeeping as arithmetic: a dozen rows above k on the 160 m net).
 */
function rowOfNodeSupernode(sn: Supernodes, J: number, at: number, inner: Float64Array, block: Float64Array, d: Float64Array, y: Float64Array): number {
  const c0 = sn.first[J]!;
  const w = sn.innerStart[J]!;
  // the run's triangle: inner[w] = L(c0+1, c0), inner[w+1] = L(c0+2, c0), inner[w+2] = L(c0+2, c0+1)
  const y0 = y[c0]!;
  const y1 = y[c0 + 1]! - inner[w]! * y0;
  const y2 = y[c0 + 2]! - inner[w + 1]! * y0 - inner[w + 2]! * y1;
  const r0 = sn.rowStart[J]!;
  const rows = sn.rows;
  let q = sn.blockStart[J]!;
  for (let p = r0, end = r0 + at; p < end; p++, q += 3) y[rows[p]!]! -= block[q]! * y0 + block[q + 1]! * y1 + block[q + 2]! * y2;
  const l0 = y0 / d[c0]!;
  const l1 = y1 / d[c0 + 1]!;
  const l2 = y2 / d[c0 + 2]!;
  block[q] = l0;
  block[q + 1] = l1;
  block[q + 2] = l2;
  y[c0] = 0;
  y[c0 + 1] = 0;
  y[c0 + 2] = 0;
  return l0 * y0 + l1 * y1 + l2 * y2;
}

/**
 * Rows k, k+1, k+2 of a node's supernode K (triple[K]) eliminated together: the same operations as
 * three calls of the row-by-row loop, but each row index and entry of L below a supernode is read
 * once for the three rows (y3 holds the three rows interleaved: y3[3i + r] is row k+r's entry in
 * column i). The row-by-row kernel read as many numbers as it multiplied; this reads about a third.
 * Returns the equation whose pivot vanished, or −1.
 */
function rowsOfNode(a: SparseSymmetricMatrix, K: number, relativeTolerance: number, inner: Float64Array, block: Float64Array, d: Float64Array, y3: Float64Array, filled: Int32Array): number {
  const { colStart, rowIndex } = a.pattern;
  const { start, supernodes: meets } = a.pattern.rowPlan;
  const sn = a.pattern.supernodes;
  const values = a.values;
  const k = sn.first[K]!;
  const { diagonal, falls } = a.pattern.scratch;
  diagonal[0] = diagonal[1] = diagonal[2] = 0;
  falls[0] = falls[1] = falls[2] = 0;
  for (let r = 0; r < 3; r++) {
    for (let p = colStart[k + r]!; p < colStart[k + r + 1]!; p++) {
      const i = rowIndex[p]!;
      y3[3 * i + r]! += values[p]!;
      if (i === k + r) diagonal[r] = values[p]!;
    }
  }
  for (let t = start[k]!; t < start[k + 1]!; t++) {
    const J = meets[t]!;
    const at = filled[J]!;
    filled[J] = at + 3;
    if (sn.first[J + 1]! - sn.first[J]! === 3) threeRowsOfNodeSupernode(sn, J, at, k, inner, block, d, y3, falls);
    else threeRowsOfSupernode(sn, J, at, k, inner, block, d, y3, falls);
  }
  // the node's own triangle: inner[wK] = L(k+1, k), inner[wK+1] = L(k+2, k), inner[wK+2] = L(k+2, k+1)
  const wK = sn.innerStart[K]!;
  const e = 3 * k;
  const pivotA = y3[e]! - falls[0]!;
  if (vanished(pivotA, diagonal[0]!, relativeTolerance)) return k;
  d[k] = pivotA;
  const bk = y3[e + 1]!;
  const l10 = bk / pivotA;
  inner[wK] = l10;
  const pivotB = y3[e + 4]! - falls[1]! - l10 * bk;
  if (vanished(pivotB, diagonal[1]!, relativeTolerance)) return k + 1;
  d[k + 1] = pivotB;
  const gk = y3[e + 2]!;
  const gk1 = y3[e + 5]! - l10 * gk;
  const l20 = gk / pivotA;
  const l21 = gk1 / pivotB;
  inner[wK + 1] = l20;
  inner[wK + 2] = l21;
  const pivotC = y3[e + 8]! - falls[2]! - l20 * gk - l21 * gk1;
  if (vanished(pivotC, diagonal[2]!, relativeTolerance)) return k + 2;
  d[k + 2] = pivotC;
  for (let t = e; t < e + 9; t++) y3[t] = 0;
  return -1;
}

/** A pivot that counts as zero: below relativeTolerance × its diagonal before factoring, or not finite. */
function vanished(pivot: number, diagonal: number, relativeTolerance: number): boolean {
  return !(Math.abs(pivot) > relativeTolerance * Math.abs(diagonal)) || !Number.isFinite(pivot);
}

/**
 * rowsOfNode's three rows in the columns of a three-column supernode J below them (at its `at`-th
 * row), written out: the run's triangle applied to each row, the rows above k updated, then row k's
 * entries stored, row k+1 updated by them and its entries stored, and so row k+2. Adds Σ l·y per row to `falls`.
 */
function threeRowsOfNodeSupernode(sn: Supernodes, J: number, at: number, k: number, inner: Float64Array, block: Float64Array, d: Float64Array, y3: Float64Array, falls: Float64Array): void {
  const c0 = sn.first[J]!;
  const w = sn.innerStart[J]!;
  const e = 3 * c0;
  const i10 = inner[w]!;
  const i20 = inner[w + 1]!;
  const i21 = inner[w + 2]!;
  const a0 = y3[e]!;
  const b0 = y3[e + 1]!;
  const g0 = y3[e + 2]!;
  const a1 = y3[e + 3]! - i10 * a0;
  const b1 = y3[e + 4]! - i10 * b0;
  const g1 = y3[e + 5]! - i10 * g0;
  const a2 = y3[e + 6]! - i20 * a0 - i21 * a1;
  const b2 = y3[e + 7]! - i20 * b0 - i21 * b1;
  const g2 = y3[e + 8]! - i20 * g0 - i21 * g1;
  const rows = sn.rows;
  const r0 = sn.rowStart[J]!;
  let q = sn.blockStart[J]!;
  for (let p = r0, end = r0 + at; p < end; p++, q += 3) {
    const m0 = block[q]!;
    const m1 = block[q + 1]!;
    const m2 = block[q + 2]!;
    const f = 3 * rows[p]!;
    y3[f]! -= m0 * a0 + m1 * a1 + m2 * a2;
    y3[f + 1]! -= m0 * b0 + m1 * b1 + m2 * b2;
    y3[f + 2]! -= m0 * g0 + m1 * g1 + m2 * g2;
  }
  const d0 = d[c0]!;
  const d1 = d[c0 + 1]!;
  const d2 = d[c0 + 2]!;
  const la0 = a0 / d0;
  const la1 = a1 / d1;
  const la2 = a2 / d2;
  falls[0]! += la0 * a0 + la1 * a1 + la2 * a2;
  y3[3 * k + 1]! -= la0 * b0 + la1 * b1 + la2 * b2;
  y3[3 * k + 2]! -= la0 * g0 + la1 * g1 + la2 * g2;
  const lb0 = b0 / d0;
  const lb1 = b1 / d1;
  const lb2 = b2 / d2;
  falls[1]! += lb0 * b0 + lb1 * b1 + lb2 * b2;
  y3[3 * k + 5]! -= lb0 * g0 + lb1 * g1 + lb2 * g2;
  const lg0 = g0 / d0;
  const lg1 = g1 / d1;
  const lg2 = g2 / d2;
  falls[2]! += lg0 * g0 + lg1 * g1 + lg2 * g2;
  block[q] = la0;
  block[q + 1] = la1;
  block[q + 2] = la2;
  block[q + 3] = lb0;
  block[q + 4] = lb1;
  block[q + 5] = lb2;
  block[q + 6] = lg0;
  block[q + 7] = lg1;
  block[q + 8] = lg2;
  // a loop, not fill: nine entries, and fill's call costs more than the stores (profiled)
  for (let t = e; t < e + 9; t++) y3[t] = 0;
}

/** threeRowsOfNodeSupernode for a supernode of one or two columns (a node with restrained freedoms), by loops. */
function threeRowsOfSupernode(sn: Supernodes, J: number, at: number, k: number, inner: Float64Array, block: Float64Array, d: Float64Array, y3: Float64Array, falls: Float64Array): void {
  const c0 = sn.first[J]!;
  const size = sn.first[J + 1]! - c0;
  const w = sn.innerStart[J]!;
  for (let r = 0; r < 3; r++) {
    for (let u = 0; u < size; u++) {
      const yu = y3[3 * (c0 + u) + r]!;
      for (let u2 = u + 1; u2 < size; u2++) y3[3 * (c0 + u2) + r]! -= inner[w + (u2 * (u2 - 1)) / 2 + u]! * yu;
    }
  }
  const r0 = sn.rowStart[J]!;
  const b0 = sn.blockStart[J]!;
  for (let p = 0; p < at; p++) {
    const f = 3 * sn.rows[r0 + p]!;
    for (let r = 0; r < 3; r++) {
      let sum = 0;
      for (let u = 0; u < size; u++) sum += block[b0 + p * size + u]! * y3[3 * (c0 + u) + r]!;
      y3[f + r]! -= sum;
    }
  }
  for (let r = 0; r < 3; r++) {
    const q = b0 + (at + r) * size;
    for (let u = 0; u < size; u++) {
      const yu = y3[3 * (c0 + u) + r]!;
      const l = yu / d[c0 + u]!;
      falls[r]! += l * yu;
      block[q + u] = l;
    }
    // the later rows' entries in row k+r's column
    for (let r2 = r + 1; r2 < 3; r2++) {
      let sum = 0;
      for (let u = 0; u < size; u++) sum += block[q + u]! * y3[3 * (c0 + u) + r2]!;
      y3[3 * (k + r) + r2]! -= sum;
    }
  }
  for (let t = 3 * c0; t < 3 * (c0 + size); t++) y3[t] = 0;
}

/** Row k's entries in the columns of its own supernode before k (the run's triangle). Returns Σ l·y. */
function rowInsideSupernode(sn: Supernodes, K: number, k: number, inner: Float64Array, d: Float64Array, y: Float64Array): number {
  const c0 = sn.first[K]!;
  const w = sn.innerStart[K]!;
  let fall = 0;
  for (let c = c0; c < k; c++) {
    const yc = y[c]!;
    for (let c2 = c + 1; c2 < k; c2++) y[c2]! -= inner[w + ((c2 - c0) * (c2 - c0 - 1)) / 2 + (c - c0)]! * yc;
    const l = yc / d[c]!;
    fall += l * yc;
    inner[w + ((k - c0) * (k - c0 - 1)) / 2 + (c - c0)] = l;
    y[c] = 0;
  }
  return fall;
}

/** Solves L·D·Lᵀ x = b in place: b becomes x (and is returned). */
function solveSupernodal(sn: Supernodes, inner: Float64Array, block: Float64Array, d: Float64Array, x: Float64Array): Float64Array {
  const rows = sn.rows;
  for (let J = 0; J < sn.count; J++) {
    const c0 = sn.first[J]!;
    const size = sn.first[J + 1]! - c0;
    const w = sn.innerStart[J]!;
    for (let t = 0; t < size; t++) for (let t2 = t + 1; t2 < size; t2++) x[c0 + t2]! -= inner[w + (t2 * (t2 - 1)) / 2 + t]! * x[c0 + t]!;
    const end = sn.rowStart[J + 1]!;
    if (size === 3) {
      const x0 = x[c0]!;
      const x1 = x[c0 + 1]!;
      const x2 = x[c0 + 2]!;
      for (let p = sn.rowStart[J]!, q = sn.blockStart[J]!; p < end; p++, q += 3) x[rows[p]!]! -= block[q]! * x0 + block[q + 1]! * x1 + block[q + 2]! * x2;
      continue;
    }
    for (let p = sn.rowStart[J]!, q = sn.blockStart[J]!; p < end; p++, q += size) {
      let sum = 0;
      for (let t = 0; t < size; t++) sum += block[q + t]! * x[c0 + t]!;
      x[rows[p]!]! -= sum;
    }
  }
  for (let j = 0; j < x.length; j++) x[j]! /= d[j]!;
  for (let J = sn.count - 1; J >= 0; J--) {
    const c0 = sn.first[J]!;
    const size = sn.first[J + 1]! - c0;
    const w = sn.innerStart[J]!;
    const end = sn.rowStart[J + 1]!;
    if (size === 3) {
      let x0 = 0;
      let x1 = 0;
      let x2 = 0;
      for (let p = sn.rowStart[J]!, q = sn.blockStart[J]!; p < end; p++, q += 3) {
        const xr = x[rows[p]!]!;
        x0 += block[q]! * xr;
        x1 += block[q + 1]! * xr;
        x2 += block[q + 2]! * xr;
      }
      x[c0]! -= x0;
      x[c0 + 1]! -= x1;
      x[c0 + 2]! -= x2;
    } else {
      for (let p = sn.rowStart[J]!, q = sn.blockStart[J]!; p < end; p++, q += size) {
        const xr = x[rows[p]!]!;
        for (let t = 0; t < size; t++) x[c0 + t]! -= block[q + t]! * xr;
      }
    }
    for (let t = size - 1; t >= 0; t--) for (let t2 = t + 1; t2 < size; t2++) x[c0 + t]! -= inner[w + (t2 * (t2 - 1)) / 2 + t]! * x[c0 + t2]!;
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
