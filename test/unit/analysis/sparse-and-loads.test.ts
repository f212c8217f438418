import { describe, it, expect } from "vitest";
import { EnvelopeMatrix, factorLDL, numberEquations, reverseCuthillMcKee } from "../../../src/analysis/sparse";
import { planLoads, pressureLoads } from "../../../src/analysis/surface-loads";
import { checkCableModel } from "../../../src/analysis/model";
import { solveCableModel } from "../../../src/analysis/cable-solver";
import { formFind } from "../../../src/analysis/force-density";
import { expectRelClose } from "../../helpers/close";

/** A deterministic pseudo-random number stream in [0, 1). */
function stream(seed: number) {
  return () => (seed = (seed * 1103515245 + 12345) % 2147483648) / 2147483648;
}

describe("envelope LDLᵀ", () => {
  it("solves a random symmetric system (indefinite too) and counts its negative pivots", () => {
    const rand = stream(7);
    const n = 40;
    const edges: [number, number][] = [];
    for (let i = 0; i < n; i++) for (let j = i + 1; j < n; j++) if (rand() < 0.1) edges.push([i, j]);
    const { equationOf, matrix } = numberEquations(n, 1, edges, () => false);
    const A = matrix();
    const dense = Array.from({ length: n }, () => new Float64Array(n));
    const put = (i: number, j: number, v: number) => {
      A.add(equationOf[i]!, equationOf[j]!, v);
      dense[i]![j]! += v;
      if (i !== j) dense[j]![i]! += v;
    };
    for (const [i, j] of edges) put(i, j, rand() - 0.5);
    for (let i = 0; i < n; i++) put(i, i, i < 5 ? -3 : 3); // five negative pivots by construction? (checked below)
    const b = Float64Array.from({ length: n }, () => rand());
    const f = factorLDL(A);
    expect(f.ok).toBe(true);
    if (!f.ok) return;
    const permuted = new Float64Array(n);
    for (let i = 0; i < n; i++) permuted[equationOf[i]!] = b[i]!;
    const x = f.solve(permuted);
    for (let i = 0; i < n; i++) {
      let sum = 0;
      for (let j = 0; j < n; j++) sum += dense[i]![j]! * x[equationOf[j]!]!;
      expect(Math.abs(sum - b[i]!)).toBeLessThan(1e-10);
    }
    // Inertia: as many negative pivots as the matrix has negative eigenvalues (diagonally dominant here: 5).
    expect(f.negativePivots).toBe(5);
  });
  it("reports the equation where a singular matrix loses its pivot", () => {
    const A = new EnvelopeMatrix(Int32Array.from([0, 0, 1]));
    A.add(0, 0, 1);
    A.add(1, 0, 1);
    A.add(1, 1, 1);
    A.add(2, 2, 1);
    const f = factorLDL(A);
    expect(f).toEqual({ ok: false, equation: 1 });
  });
  it("reverse Cuthill–McKee narrows the envelope of a scrambled grid", () => {
    const m = 20;
    const label = Array.from({ length: m * m }, (_, k) => (k * 37) % (m * m)); // a scrambled numbering
    const edges: [number, number][] = [];
    for (let i = 0; i < m; i++) for (let j = 0; j < m; j++) {
      if (i + 1 < m) edges.push([label[i * m + j]!, label[(i + 1) * m + j]!]);
      if (j + 1 < m) edges.push([label[i * m + j]!, label[i * m + j + 1]!]);
    }
    const order = reverseCuthillMcKee(m * m, edges);
    expect([...order].sort((a, b) => a - b)).toEqual([...Array(m * m).keys()]);
    const position = new Int32Array(m * m);
    order.forEach((node, k) => (position[node] = k));
    const bandwidth = (pos: (k: number) => number) => Math.max(...edges.map(([p, q]) => Math.abs(pos(p) - pos(q))));
    expect(bandwidth((k) => position[k]!)).toBeLessThanOrEqual(2 * m);
    expect(bandwidth((k) => k)).toBeGreaterThan(10 * m);
  });
});

describe("surface loads", () => {
  const square = Float64Array.from([0, 0, 0, 2, 0, 0, 2, 2, 1, 0, 2, 1]); // a 2 × 2 plan, tilted
  const faces = [[0, 1, 2], [0, 2, 3]] as const;
  it("snow over the plan: the resultant is s × plan area whatever the slope", () => {
    const f = planLoads(square, faces, () => 500);
    const total = f.reduce((s, x) => s + x, 0);
    expectRelClose(total, -500 * 4, 1e-12);
  });
  it("pressure: −p × the true area along the normal; uniform pressure on a closed surface sums to 0", () => {
    const f = pressureLoads(square, faces, () => 100);
    const z = f.filter((_, k) => k % 3 === 2).reduce((s, x) => s + x, 0);
    const y = f.filter((_, k) => k % 3 === 1).reduce((s, x) => s + x, 0);
    // Area vector of the tilted square: (0, −2, 4) (plan 4, rise 1 over 2 in y).
    expectRelClose(z, -100 * 4, 1e-12);
    expectRelClose(y, 100 * 2, 1e-12);
    const tetra = Float64Array.from([0, 0, 0, 1, 0, 0, 0, 1, 0, 0, 0, 1]);
    const closed = pressureLoads(tetra, [[0, 2, 1], [0, 1, 3], [0, 3, 2], [1, 2, 3]], () => 7);
    for (let d = 0; d < 3; d++) expect(Math.abs(closed.filter((_, k) => k % 3 === d).reduce((s, x) => s + x, 0))).toBeLessThan(1e-12);
  });
});

describe("bad input and honest failure", () => {
  const base = { nodes: [[0, 0, 0], [1, 0, 0]] as const, supports: [{ node: 0, fixed: [true, true, true] as const }], loads: [] };
  it("names the field", () => {
    expect(() => checkCableModel({ ...base, members: [{ i: 0, j: 2, eaN: 1, kind: "cable" }] })).toThrow(/model\.members\[0\]\.j: 2 \(expected a node index 0–1\)/);
    expect(() => checkCableModel({ ...base, members: [{ i: 0, j: 1, eaN: -1, kind: "cable" }] })).toThrow(/model\.members\[0\]\.eaN/);
    const bar = [{ i: 0, j: 1, eaN: 1, kind: "cable" as const }];
    expect(() => checkCableModel({ ...base, nodes: [[0, 0, 0], [0, 0, 0]], members: bar })).toThrow(/model\.members\[0\]: nodes 0 and 1 coincide/);
    expect(() => checkCableModel({ ...base, nodes: [[0, 0, 0], [1, Number.NaN, 0]], members: bar })).toThrow(/model\.nodes\[1\]: \[1,null,0\] \(expected three finite coordinates\)/);
    expect(() => checkCableModel({ ...base, members: bar, supports: [{ node: 1.5, fixed: [true, true, true] }] })).toThrow(/model\.supports\[0\]\.node: 1\.5 \(expected a node index 0–1\)/);
    expect(() => checkCableModel({ ...base, members: bar, loads: [{ node: 1, forceN: [0, Infinity, 0] }] })).toThrow(/model\.loads\[0\]\.forceN \(expected three finite numbers\)/);
    expect(() => checkCableModel({ ...base, members: bar, loads: [{ node: -1, forceN: [0, 0, 0] }] })).toThrow(/model\.loads\[0\]\.node: -1/);
    expect(checkCableModel({ ...base, members: bar })).toEqual({ ...base, members: bar });
    expect(() => formFind({ nodes: base.nodes, branches: [[0, 1]], forceDensityNPerM: 0, fixed: [0] })).toThrow(/forceDensityNPerM\[0\]/);
  });
  it("a mechanism is reported, not returned as a result", () => {
    // A single cable with no prestress, loaded across: no stiffness across it.
    const r = solveCableModel({ nodes: [[0, 0, 0], [1, 0, 0], [2, 0, 0]], members: [{ i: 0, j: 1, eaN: 1e6, kind: "cable" }, { i: 1, j: 2, eaN: 1e6, kind: "cable" }], supports: [{ node: 0, fixed: [true, true, true] }, { node: 2, fixed: [true, true, true] }], loads: [{ node: 1, forceN: [0, 0, -10] }] });
    expect(r.converged).toBe(false);
    expect(r.reason).toMatch(/singular at node 1|no equilibrium/);
  });
});
