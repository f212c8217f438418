/**
 * A small sparse symmetric solver for the analysis layer: variable-band (envelope, "skyline")
 * storage of the lower triangle, a reverse Cuthill–McKee ordering of the nodes to keep the envelope
 * narrow (Cuthill & McKee 1969; George 1971), and an LDLᵀ factorisation without pivoting
 * (envelope method: George & Liu, Computer Solution of Large Sparse Positive Definite Systems,
 * 1981, ch. 4). LDLᵀ rather than Cholesky so that indefinite matrices (a tangent stiffness past a
 * limit point, K + λK_G) factor too; the count of negative pivots is the Sturm count (Sylvester's law
 * of inertia).
 *
 * Why not a library: measured on an SPD grid matrix of 3,072 unknowns (node 20), ml-matrix's dense
 * Cholesky took 21 s and mathjs's sparse LU (slu + lusolve) 216 ms (plus 0.5 s to build the matrix);
 * this envelope LDLᵀ takes a few ms on the same matrix (see the commit that added it).
 */

import { SparsePattern, SparseSymmetricMatrix, factorSparseLDL, minimumDegreeOrder } from "./sparse-ldl";

/** Symmetric matrix stored by rows of its lower triangle from the first nonzero column to the diagonal. */
export class EnvelopeMatrix {
  /** Order of the matrix. */
  readonly n: number;
  /** First stored column of each row. */
  readonly first: Int32Array;
  /** Offset of each row's first stored entry in `values`; start[n] is the total size. */
  readonly start: Int32Array;
  /** The stored entries, row by row. */
  values: Float64Array;

  constructor(first: Int32Array) {
    this.n = first.length;
    this.first = first;
    this.start = new Int32Array(this.n + 1);
    for (let i = 0; i < this.n; i++) this.start[i + 1] = this.start[i]! + (i - first[i]!) + 1;
    this.values = new Float64Array(this.start[this.n]!);
  }

  /** Adds v to entry (i, j) (and so to (j, i)); i, j must lie inside the envelope. */
  add(i: number, j: number, v: number): void {
    if (i < j) this.values[this.start[j]! + i - this.first[j]!]! += v;
    else this.values[this.start[i]! + j - this.first[i]!]! += v;
  }

  /** Entry (i, j), 0 outside the envelope. */
  get(i: number, j: number): number {
    if (i < j) [i, j] = [j, i];
    return j < this.first[i]! ? 0 : this.values[this.start[i]! + j - this.first[i]!]!;
  }

  /** y = A·x (A the symmetric matrix stored here; not valid after factor()). */
  multiply(x: Float64Array, y: Float64Array = new Float64Array(this.n)): Float64Array {
    y.fill(0);
    const { first, start, values } = this;
    for (let i = 0; i < this.n; i++) {
      const f = first[i]!;
      const s = start[i]! - f;
      let sum = 0;
      const xi = x[i]!;
      for (let j = f; j < i; j++) {
        const a = values[s + j]!;
        sum += a * x[j]!;
        y[j]! += a * xi;
      }
      y[i]! += sum + values[s + i]! * xi;
    }
    return y;
  }

  copy(): EnvelopeMatrix {
    const c = new EnvelopeMatrix(this.first);
    c.values.set(this.values);
    return c;
  }

  /** Number of stored entries (the profile). */
  get size(): number {
    return this.values.length;
  }
}

/** The matrices the analysis layer assembles: the envelope kind here or the sparse kind of sparse-ldl.ts. */
export type SymmetricMatrix = EnvelopeMatrix | SparseSymmetricMatrix;

/** The outcome of an LDLᵀ factorisation. */
export type Factorisation =
  | {
      ok: true;
      solve: (b: Float64Array) => Float64Array;
      /** solve, overwriting b with the answer (sparse matrices). */
      solveInPlace?: (b: Float64Array) => Float64Array;
      negativePivots: number;
      /** Frees the factor's arrays for the next factorisation of the same pattern (sparse matrices); `solve` may not be called after it. */
      release?: () => void;
    }
  | { ok: false; /** the equation whose pivot vanished */ equation: number };

/**
 * Factors A = L·D·Lᵀ in place (A's values are overwritten). A pivot smaller than
 * relativeTolerance × |a_ii| (the diagonal before factoring) counts as zero: the matrix is singular.
 */
export function factorLDL(a: SymmetricMatrix, relativeTolerance = 1e-11): Factorisation {
  if (a instanceof SparseSymmetricMatrix) return factorSparseLDL(a, relativeTolerance);
  const { n, first, start, values } = a;
  const d = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const fi = first[i]!;
    const si = start[i]! - fi;
    const diagonal = values[si + i]!;
    for (let j = fi; j < i; j++) {
      const fj = first[j]!;
      const sj = start[j]! - fj;
      let dot = 0;
      for (let k = fi > fj ? fi : fj; k < j; k++) dot += values[si + k]! * values[sj + k]!;
      values[si + j]! -= dot;
    }
    let pivot = diagonal;
    for (let j = fi; j < i; j++) {
      const u = values[si + j]!;
      const l = u / d[j]!;
      pivot -= u * l;
      values[si + j] = l;
    }
    if (!(Math.abs(pivot) > relativeTolerance * Math.abs(diagonal)) || !Number.isFinite(pivot)) return { ok: false, equation: i };
    d[i] = pivot;
    values[si + i] = pivot;
  }
  let negativePivots = 0;
  for (let i = 0; i < n; i++) if (d[i]! < 0) negativePivots++;
  return { ok: true, negativePivots, solve: (b) => solveLDL(a, d, b) };
}

function solveLDL(a: EnvelopeMatrix, d: Float64Array, b: Float64Array): Float64Array {
  const { n, first, start, values } = a;
  const x = Float64Array.from(b);
  for (let i = 0; i < n; i++) {
    const fi = first[i]!;
    const si = start[i]! - fi;
    let sum = x[i]!;
    for (let j = fi; j < i; j++) sum -= values[si + j]! * x[j]!;
    x[i] = sum;
  }
  for (let i = 0; i < n; i++) x[i]! /= d[i]!;
  for (let i = n - 1; i >= 0; i--) {
    const fi = first[i]!;
    const si = start[i]! - fi;
    const xi = x[i]!;
    for (let j = fi; j < i; j++) x[j]! -= values[si + j]! * xi;
  }
  return x;
}

/**
 * Reverse Cuthill–McKee order of the nodes of a graph: breadth-first from a pseudo-peripheral node
 * (found by repeated breadth-first sweeps), neighbours by increasing degree, then reversed.
 * Handles several components. Returns the nodes in their new order.
 */
export function reverseCuthillMcKee(nodeCount: number, edges: readonly (readonly [number, number])[]): Int32Array {
  const adjacency = adjacencyLists(nodeCount, edges);
  const order = new Int32Array(nodeCount);
  const placed = new Uint8Array(nodeCount);
  let count = 0;
  for (let seed = 0; seed < nodeCount; seed++) {
    if (placed[seed]) continue;
    const startNode = pseudoPeripheral(seed, adjacency);
    placed[startNode] = 1;
    order[count++] = startNode;
    for (let head = count - 1; head < count; head++) {
      const neighbours = adjacency[order[head]!]!.filter((m) => !placed[m]).sort((p, q) => adjacency[p]!.length - adjacency[q]!.length);
      for (const m of neighbours) {
        placed[m] = 1;
        order[count++] = m;
      }
    }
  }
  return order.reverse();
}

function adjacencyLists(nodeCount: number, edges: readonly (readonly [number, number])[]): number[][] {
  const adjacency: number[][] = Array.from({ length: nodeCount }, () => []);
  for (const [p, q] of edges) {
    if (p === q) continue;
    adjacency[p]!.push(q);
    adjacency[q]!.push(p);
  }
  return adjacency;
}

/** Breadth-first levels from a node: the last level's node of least degree, and the depth. */
function farthest(from: number, adjacency: number[][]): { node: number; depth: number } {
  const level = new Map<number, number>([[from, 0]]);
  const queue = [from];
  for (let head = 0; head < queue.length; head++) {
    const p = queue[head]!;
    for (const m of adjacency[p]!) {
      if (!level.has(m)) {
        level.set(m, level.get(p)! + 1);
        queue.push(m);
      }
    }
  }
  const depth = level.get(queue[queue.length - 1]!)!;
  let node = queue[queue.length - 1]!;
  for (const p of queue) if (level.get(p) === depth && adjacency[p]!.length < adjacency[node]!.length) node = p;
  return { node, depth };
}

function pseudoPeripheral(seed: number, adjacency: number[][]): number {
  let current = farthest(seed, adjacency);
  let node = seed;
  for (let sweep = 0; sweep < 8; sweep++) {
    const next = farthest(current.node, adjacency);
    if (next.depth <= current.depth && sweep > 0) break;
    node = current.node;
    current = next;
  }
  return node;
}

/**
 * Equation numbering for a model of nodes with `dofPerNode` freedoms each: nodes taken in
 * minimum-degree order (sparse-ldl.ts), restrained freedoms left out (−1). Returns the equation of
 * each freedom and a factory of sparse matrices whose pattern holds every element coupling
 * (elements given by their node lists); the pattern and its symbolic factorisation are shared by
 * every matrix the factory makes.
 */
export function numberEquations(
  nodeCount: number,
  dofPerNode: number,
  elements: readonly (readonly number[])[],
  restrained: (node: number, dof: number) => boolean,
): Numbering {
  const key = numberingKey(nodeCount, dofPerNode, elements, restrained);
  const known = numberings.find((n) => sameKey(n.key, key));
  if (known) return known.numbering;
  const numbering = numberAnew(nodeCount, dofPerNode, elements, restrained);
  if (numberings.length >= 16) numberings.shift();
  numberings.push({ key, numbering });
  return numbering;
}

export interface Numbering {
  equationOf: Int32Array;
  matrix: () => SparseSymmetricMatrix;
  count: number;
  pattern: SparsePattern;
}

/**
 * The last few numberings, by topology: a prestress search or a set of load combinations builds
 * model after model of the same members and supports, and the ordering and symbolic factorisation
 * depend only on that. (Equal keys give identical numberings: the key holds every input.)
 */
const numberings: { key: Int32Array; numbering: Numbering }[] = [];

/**
 * Every input of a numbering in one array: node count, freedoms a node, each element's length and
 * nodes, then the restrained freedoms. (A string of them was a twentieth of the span study's 3D
 * garbage.)
 */
function numberingKey(nodeCount: number, dofPerNode: number, elements: readonly (readonly number[])[], restrained: (node: number, dof: number) => boolean): Int32Array {
  let size = 3;
  for (const el of elements) size += 1 + el.length;
  const key = new Int32Array(size + nodeCount * dofPerNode);
  let at = 0;
  key[at++] = nodeCount;
  key[at++] = dofPerNode;
  key[at++] = elements.length;
  for (const el of elements) {
    key[at++] = el.length;
    for (const node of el) key[at++] = node;
  }
  for (let node = 0; node < nodeCount; node++) for (let d = 0; d < dofPerNode; d++) if (restrained(node, d)) key[at++] = node * dofPerNode + d;
  return key.subarray(0, at);
}

function sameKey(a: Int32Array, b: Int32Array): boolean {
  if (a.length !== b.length) return false;
  for (let k = 0; k < a.length; k++) if (a[k] !== b[k]) return false;
  return true;
}

function numberAnew(
  nodeCount: number,
  dofPerNode: number,
  elements: readonly (readonly number[])[],
  restrained: (node: number, dof: number) => boolean,
): Numbering {
  const pairs: [number, number][] = [];
  for (const el of elements) for (let a = 0; a < el.length; a++) for (let b = a + 1; b < el.length; b++) pairs.push([el[a]!, el[b]!]);
  // A node with every freedom restrained holds no equation: left in the ordering's graph, its
  // elimination would join its neighbours into a clique the factor never has, and mislead the
  // degrees (160 m cable net: 1.22 → 1.16 M multiply-adds a factorisation, L 38,367 → 37,800).
  const held = (node: number) => Array.from({ length: dofPerNode }, (_, d) => d).every((d) => restrained(node, d));
  const order = minimumDegreeOrder(nodeCount, pairs.filter(([p, q]) => !held(p) && !held(q)));
  const equationOf = new Int32Array(nodeCount * dofPerNode).fill(-1);
  let count = 0;
  for (const node of order) for (let d = 0; d < dofPerNode; d++) if (!restrained(node, d)) equationOf[node * dofPerNode + d] = count++;
  const columns: Set<number>[] = Array.from({ length: count }, (_, k) => new Set([k]));
  const couple = (p: number, q: number) => {
    for (let a = 0; a < dofPerNode; a++) {
      const i = equationOf[p * dofPerNode + a]!;
      if (i < 0) continue;
      for (let b = 0; b < dofPerNode; b++) {
        const j = equationOf[q * dofPerNode + b]!;
        if (j >= 0) columns[Math.max(i, j)]!.add(Math.min(i, j));
      }
    }
  };
  for (let node = 0; node < nodeCount; node++) couple(node, node);
  for (const [p, q] of pairs) couple(p, q);
  const pattern = new SparsePattern(count, columns.map((c) => [...c].sort((x, y) => x - y)));
  return { equationOf, count, pattern, matrix: () => new SparseSymmetricMatrix(pattern) };
}
