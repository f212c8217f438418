import { describe, it, expect } from "vitest";
import { EnvelopeMatrix, factorLDL, numberEquations, reverseCuthillMcKee } from "../../../src/analysis/sparse";
import { SparsePattern, SparseSymmetricMatrix, factorSparseLDL, minimumDegreeOrder } from "../../../src/analysis/sparse-ldl";
import { SecantUpdates } from "../../../src/analysis/secant";

/** A deterministic pseudo-random number stream in [0, 1). */
function stream(seed: number) {
  return () => (seed = (seed * 1103515245 + 12345) % 2147483648) / 2147483648;
}

/** The edges of an m × m grid with diagonals (a triangulated plate), nodes scrambled. */
function grid(m: number): [number, number][] {
  const label = (i: number, j: number) => ((i * m + j) * 37) % (m * m);
  const edges: [number, number][] = [];
  for (let i = 0; i < m; i++) for (let j = 0; j < m; j++) {
    if (i + 1 < m) edges.push([label(i, j), label(i + 1, j)]);
    if (j + 1 < m) edges.push([label(i, j), label(i, j + 1)]);
    if (i + 1 < m && j + 1 < m) edges.push([label(i, j), label(i + 1, j + 1)]);
  }
  return edges;
}

describe("sparse LDLᵀ with a minimum-degree ordering", () => {
  it("matches the envelope solver on a 3-freedom grid and keeps fewer entries than the RCM envelope", () => {
    const m = 24;
    const edges = grid(m);
    const n = m * m;
    const rand = stream(3);
    const restrained = (node: number) => node < 3;
    const sparse = numberEquations(n, 3, edges, (node) => restrained(node));
    const A = sparse.matrix();
    // The same matrix in an envelope, numbered by reverse Cuthill–McKee.
    const order = reverseCuthillMcKee(n, edges);
    const rcm = new Int32Array(3 * n).fill(-1);
    let count = 0;
    for (const node of order) for (let d = 0; d < 3; d++) if (!restrained(node)) rcm[3 * node + d] = count++;
    const first = Int32Array.from({ length: count }, (_, k) => k);
    const couple = (p: number, q: number, f: (i: number, j: number) => void) => {
      for (let a = 0; a < 3; a++) for (let b = 0; b < 3; b++) if (rcm[3 * p + a]! >= 0 && rcm[3 * q + b]! >= 0) f(3 * p + a, 3 * q + b);
    };
    for (const [p, q] of edges) couple(p, q, (i, j) => {
      const [hi, lo] = [Math.max(rcm[i]!, rcm[j]!), Math.min(rcm[i]!, rcm[j]!)];
      first[hi] = Math.min(first[hi]!, lo);
    });
    for (let node = 0; node < n; node++) couple(node, node, (i, j) => {
      const [hi, lo] = [Math.max(rcm[i]!, rcm[j]!), Math.min(rcm[i]!, rcm[j]!)];
      first[hi] = Math.min(first[hi]!, lo);
    });
    const E = new EnvelopeMatrix(first);
    const put = (i: number, j: number, v: number) => {
      A.add(sparse.equationOf[i]!, sparse.equationOf[j]!, v);
      E.add(rcm[i]!, rcm[j]!, v);
    };
    for (const [p, q] of edges) couple(p, q, (i, j) => put(i, j, -rand()));
    for (let node = 0; node < n; node++) for (let a = 0; a < 3; a++) if (!restrained(node)) put(3 * node + a, 3 * node + a, 30);
    const b = Float64Array.from({ length: 3 * n }, () => rand() - 0.5);
    const fs = factorLDL(A);
    const fe = factorLDL(E.copy());
    expect(fs.ok && fe.ok).toBe(true);
    if (!fs.ok || !fe.ok) return;
    const xs = fs.solve(Float64Array.from({ length: count }, (_, e) => b[sparse.equationOf.indexOf(e)]!));
    const xe = fe.solve(Float64Array.from({ length: count }, (_, e) => b[rcm.indexOf(e)]!));
    for (let k = 0; k < 3 * n; k++) if (rcm[k]! >= 0) expect(Math.abs(xs[sparse.equationOf[k]!]! - xe[rcm[k]!]!)).toBeLessThan(1e-12);
    expect(fs.negativePivots).toBe(fe.negativePivots);
    // Fill: the factor's nonzeros against the envelope's profile (measured 74,565 vs 87,705 at m = 24:
    // on a plain grid the gain is in the work skipped, not the storage; on the radial nets it is both).
    expect(A.size).toBeLessThan(E.size);
    // A is left as it was: y = A·x reproduces b.
    const y = A.multiply(xs);
    for (let e = 0; e < count; e++) expect(Math.abs(y[e]! - b[sparse.equationOf.indexOf(e)]!)).toBeLessThan(1e-10);
  });
  it("reports the equation whose pivot vanishes and refuses entries outside its pattern", () => {
    const pattern = new SparsePattern(3, [[0], [0, 1], [2]]);
    const A = new SparseSymmetricMatrix(pattern);
    A.add(0, 0, 1);
    A.add(1, 0, 1);
    A.add(1, 1, 1);
    A.add(2, 2, 1);
    expect(factorSparseLDL(A)).toEqual({ ok: false, equation: 1 });
    expect(() => A.add(2, 0, 1)).toThrow(/outside the matrix's pattern/);
  });
  it("a node's three rows eliminated together report the row whose pivot vanishes (here the node's second)", () => {
    // two nodes of three freedoms, fully coupled; row and column 4 are copies of row and column 3,
    // so the pivot of equation 4 vanishes (to rounding) once row 3 is eliminated
    const { matrix, count } = numberEquations(2, 3, [[0, 1]], () => false);
    expect(count).toBe(6);
    const A = matrix();
    expect(A.pattern.rowPlan.triple[A.pattern.supernodes.of[3]!]).toBe(1);
    const M = Array.from({ length: 6 }, (_, i) => Array.from({ length: 6 }, (_, j) => (i === j ? 20 : 1 + ((i + j) % 4))));
    for (let j = 0; j < 6; j++) M[4]![j] = M[j]![4] = M[3]![j === 4 ? 3 : j]!;
    for (let j = 0; j < 6; j++) for (let i = 0; i <= j; i++) A.add(i, j, M[i]![j]!);
    expect(factorSparseLDL(A)).toEqual({ ok: false, equation: 4 });
    // and with row 4 made independent, the factor solves
    A.add(4, 4, 1);
    const f = factorSparseLDL(A);
    expect(f.ok).toBe(true);
  });
  it("a released factor's arrays serve the next factorisation of the pattern: its answers are those of a fresh one, the released one refuses to solve", () => {
    const m = 12;
    const edges = grid(m);
    const n = m * m;
    const { matrix, count } = numberEquations(n, 3, edges, (node) => node < 3);
    const filled = (seed: number) => {
      const rand = stream(seed);
      const A = matrix();
      const { colStart, rowIndex } = A.pattern;
      for (let k = 0; k < count; k++) for (let p = colStart[k]!; p < colStart[k + 1]!; p++) A.values[p] = rowIndex[p] === k ? 30 : -rand();
      return A;
    };
    const b = Float64Array.from({ length: count }, (_, k) => Math.sin(k));
    const A = filled(1);
    const B = filled(2);
    const fresh = factorSparseLDL(B);
    if (!fresh.ok) throw new Error("B is positive definite");
    const expected = fresh.solve(b);
    fresh.release();
    const first = factorSparseLDL(A);
    if (!first.ok) throw new Error("A is positive definite");
    first.release();
    expect(() => first.solve(b)).toThrow(/released/);
    // B again, in the arrays A's factor gave back: the same numbers to the last bit
    const again = factorSparseLDL(B);
    if (!again.ok) throw new Error("B is positive definite");
    expect([...again.solve(b)]).toEqual([...expected]);
    // and solving in place overwrites its argument with the same answer
    const x = Float64Array.from(b);
    expect(again.solveInPlace(x)).toBe(x);
    expect([...x]).toEqual([...expected]);
  });
  it("minimum degree takes a leaf of a star before its hub", () => {
    const order = minimumDegreeOrder(5, [[0, 1], [0, 2], [0, 3], [0, 4]]);
    expect([...order].sort()).toEqual([0, 1, 2, 3, 4]);
    expect(order[order.length - 1] === 0 || order[order.length - 2] === 0).toBe(true);
  });
});

describe("BFGS updates (secant.ts)", () => {
  it("the updated inverse satisfies the secant equation H·y = s for the last pair", () => {
    const rand = stream(11);
    const n = 6;
    const diag = Float64Array.from({ length: n }, (_, k) => 1 + k);
    const A = (x: Float64Array) => Float64Array.from(x, (v, k) => diag[k]! * v + 0.3 * (x[(k + 1) % n]! + x[(k + n - 1) % n]!));
    const updates = new SecantUpdates();
    let s = new Float64Array(n);
    for (let pair = 0; pair < 3; pair++) {
      s = Float64Array.from({ length: n }, () => rand() - 0.5);
      updates.push(s, A(s));
    }
    const y = A(s);
    const h = updates.direction(y, (b) => Float64Array.from(b)); // H0 = identity
    for (let k = 0; k < n; k++) expect(Math.abs(h[k]! - s[k]!)).toBeLessThan(1e-12);
    // A pair of negative curvature is skipped.
    updates.push(s, Float64Array.from(s, (v) => -v));
    expect(updates.size).toBe(3);
  });
});
