// The sparse LDLᵀ factorisation (src/analysis/sparse-ldl.ts) against a dense one on random
// node-blocked matrices: graphs of 2–40 nodes with 3 or 6 freedoms each, some of them restrained
// (so supernodes of one, two, three columns and runs that straddle two nodes all occur), positive
// definite or indefinite. The reference is the envelope solver of sparse.ts with a full profile
// (plain dense LDLᵀ, the same equations in the same order, so the same pivots).
import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { EnvelopeMatrix, factorLDL, numberEquations } from "../../src/analysis/sparse";
import { factorSparseLDL } from "../../src/analysis/sparse-ldl";

interface Case {
  nodes: number;
  dof: 3 | 6;
  edges: [number, number][];
  restrained: boolean[];
  values: number[];
  definite: boolean;
}

const caseArb: fc.Arbitrary<Case> = fc
  .record({ nodes: fc.integer({ min: 2, max: 40 }), dof: fc.constantFrom<3 | 6>(3, 6), definite: fc.boolean(), seed: fc.integer({ min: 1, max: 1e9 }) })
  .chain(({ nodes, dof, definite, seed }) =>
    fc.record({
      nodes: fc.constant(nodes),
      dof: fc.constant(dof),
      definite: fc.constant(definite),
      edges: fc.array(fc.tuple(fc.integer({ min: 0, max: nodes - 1 }), fc.integer({ min: 0, max: nodes - 1 })), { minLength: nodes - 1, maxLength: 3 * nodes }),
      restrained: fc.array(fc.double({ min: 0, max: 1, noNaN: true }).map((u) => u < 0.15), { minLength: nodes * dof, maxLength: nodes * dof }),
      values: fc.constant(Array.from({ length: 4096 }, (_, k) => Math.sin(seed + 12.9898 * k) * 0.5)),
    }),
  );

describe("sparse LDLᵀ: properties", () => {
  it("solves as dense LDLᵀ does, with the same count of negative pivots, on random node-blocked matrices", () => {
    fc.assert(
      fc.property(caseArb, (c) => {
        // a chain through every node keeps the graph connected; the random edges add fill
        const edges = [...Array.from({ length: c.nodes - 1 }, (_, k): [number, number] => [k, k + 1]), ...c.edges.filter(([p, q]) => p !== q)];
        const numbering = numberEquations(c.nodes, c.dof, edges, (node, d) => c.restrained[node * c.dof + d]!);
        const n = numbering.count;
        if (n === 0) return;
        const A = numbering.matrix();
        const dense = new EnvelopeMatrix(new Int32Array(n));
        let v = 0;
        const next = () => c.values[v++ % c.values.length]!;
        const { colStart, rowIndex } = A.pattern;
        for (let k = 0; k < n; k++)
          for (let p = colStart[k]!; p < colStart[k + 1]!; p++) {
            const i = rowIndex[p]!;
            // diagonal: dominant when definite; otherwise of either sign and of the off-diagonal's size
            const a = i === k ? (c.definite ? 4 * c.dof * (1 + edges.length / c.nodes) : 2 * next()) : next();
            A.values[p] = a;
            dense.add(i, k, a);
          }
        const fs = factorSparseLDL(A);
        const fd = factorLDL(dense);
        expect(fs.ok).toBe(fd.ok);
        if (!fs.ok || !fd.ok) {
          if (!fs.ok && !fd.ok) expect(fs.equation).toBe(fd.equation);
          return;
        }
        expect(fs.negativePivots).toBe(fd.negativePivots);
        const b = Float64Array.from({ length: n }, (_, k) => Math.cos(k));
        const xs = fs.solve(b);
        const xd = fd.solve(b);
        const scale = Math.max(...xd.map(Math.abs));
        // the same arithmetic up to the order of the sums, on matrices that may be ill-conditioned
        for (let k = 0; k < n; k++) expect(Math.abs(xs[k]! - xd[k]!)).toBeLessThanOrEqual(1e-7 * scale);
        if (c.definite) {
          // well conditioned: A·x reproduces b closely
          const y = A.multiply(xs);
          for (let k = 0; k < n; k++) expect(Math.abs(y[k]! - b[k]!)).toBeLessThan(1e-9);
        }
      }),
      { numRuns: 300, seed: 20261205 },
    );
  });
});
