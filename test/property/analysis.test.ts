// Properties of the nonlinear cable solver (src/analysis/cable-solver.ts) on random small nets:
// equilibrium at convergence, slack cables carry nothing, and first-order behaviour at small load.
import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { solveCableModel, solveCableModelLinear } from "../../src/analysis/cable-solver";
import { saddleNet } from "../../src/analysis/models/saddle-net";
import type { CableModel, Vec3 } from "../../src/analysis/model";

const netArb: fc.Arbitrary<NetParameters> = fc.record({
  cells: fc.integer({ min: 2, max: 6 }),
  spacingM: fc.double({ min: 0.5, max: 5, noNaN: true }),
  riseRatio: fc.double({ min: 0.02, max: 0.2, noNaN: true }),
  prestressN: fc.double({ min: 1e3, max: 1e6, noNaN: true }),
  stiffnessRatio: fc.double({ min: 50, max: 5000, noNaN: true }),
});

/** The saddle net with loads (per node, N) scaled to the prestress by `loadRatio`. */
type NetParameters = { cells: number; spacingM: number; riseRatio: number; prestressN: number; stiffnessRatio: number };
function loaded(p: NetParameters, loadRatio: number, pattern: (u: number, v: number) => Vec3): CableModel {
  const span = p.cells * p.spacingM;
  const net = saddleNet({ spanM: span, spacingM: p.spacingM, riseM: p.riseRatio * span, prestressN: p.prestressN, eaN: p.prestressN * p.stiffnessRatio });
  return { ...net.model, loads: net.free.map((node) => ({ node, forceN: pattern(net.model.nodes[node]![0], net.model.nodes[node]![1]).map((c) => c * loadRatio * p.prestressN) as unknown as Vec3 })) };
}

/** Largest free-node force imbalance, recomputed here from the member forces the solver returns. */
function imbalance(model: CableModel, coordinates: Float64Array, forces: Float64Array): { worst: number; load: number } {
  const r = new Float64Array(coordinates.length);
  for (const l of model.loads) for (let d = 0; d < 3; d++) r[3 * l.node + d]! += l.forceN[d]!;
  model.members.forEach((m, k) => {
    const e = [0, 1, 2].map((d) => coordinates[3 * m.j + d]! - coordinates[3 * m.i + d]!);
    const l = Math.hypot(e[0]!, e[1]!, e[2]!);
    for (let d = 0; d < 3; d++) {
      r[3 * m.i + d]! += (forces[k]! * e[d]!) / l;
      r[3 * m.j + d]! -= (forces[k]! * e[d]!) / l;
    }
  });
  const fixed = new Set(model.supports.map((s) => s.node));
  let worst = 0;
  let load = 0;
  for (let n = 0; n < model.nodes.length; n++) if (!fixed.has(n)) worst += r[3 * n]! ** 2 + r[3 * n + 1]! ** 2 + r[3 * n + 2]! ** 2;
  for (const l of model.loads) load += l.forceN[0]! ** 2 + l.forceN[1]! ** 2 + l.forceN[2]! ** 2;
  return { worst: Math.sqrt(worst), load: Math.sqrt(load) };
}

describe("nonlinear cable solver: properties", () => {
  it("at convergence the free nodes are in equilibrium to 1e-6 of the load, and slack cables carry 0", () => {
    fc.assert(
      fc.property(netArb, fc.double({ min: 0.01, max: 1, noNaN: true }), fc.boolean(), (p, ratio, half) => {
        const model = loaded(p, ratio, (u) => [0, 0, half && u > 0 ? 0 : -1]);
        const r = solveCableModel(model, { steps: 2 });
        if (!r.converged) {
          // Never a silent result: a reason is given.
          expect(r.reason).toMatch(/\w/);
          return;
        }
        const { worst, load } = imbalance(model, r.coordinatesM, r.forcesN);
        expect(worst).toBeLessThanOrEqual(1e-6 * Math.max(load, r.appliedN) * 1.0001);
        r.slack.forEach((s, k) => {
          if (s) expect(r.forcesN[k]).toBe(0);
          else expect(r.forcesN[k]).toBeGreaterThanOrEqual(0);
        });
      }),
      { numRuns: 40 },
    );
  });
  it("a start from another load's answer (options.starts) reaches the same equilibrium as the unloaded start, within the tolerance", () => {
    fc.assert(
      fc.property(netArb, fc.double({ min: 0.05, max: 1, noNaN: true }), fc.double({ min: 0.3, max: 3, noNaN: true }), (p, ratio, other) => {
        // the same net under a drifted-like load and, as the start, under a uniform one of another size
        const model = loaded(p, ratio, (u) => [0, 0, u > 0 ? -0.5 : -1]);
        const near = solveCableModel(loaded(p, ratio * other, () => [0, 0, -1]), { steps: 2 });
        const cold = solveCableModel(model, { steps: 2 });
        const warm = solveCableModel(model, { steps: 2, starts: [near.displacementsM] });
        expect(warm.converged).toBe(cold.converged);
        if (!cold.converged) return;
        // each within 1e-6 of the load of equilibrium: one equilibrium (convex potential), so the two answers agree to the solver's tolerance over the stiffness
        let scale = 0;
        for (const x of cold.displacementsM) scale = Math.max(scale, Math.abs(x));
        cold.displacementsM.forEach((x, k) => expect(Math.abs(warm.displacementsM[k]! - x)).toBeLessThanOrEqual(1e-3 * scale + 1e-12));
        const largest = Math.max(...cold.forcesN);
        cold.forcesN.forEach((f, k) => expect(Math.abs(warm.forcesN[k]! - f)).toBeLessThanOrEqual(1e-5 * largest));
      }),
      { numRuns: 30 },
    );
  });
  it("a start at the answer itself takes no iteration; a start worse than the unloaded state is not taken", () => {
    const model = loaded({ cells: 4, spacingM: 2, riseRatio: 0.1, prestressN: 1e4, stiffnessRatio: 200 }, 0.5, (u) => [0, 0, u > 0 ? -0.5 : -1]);
    const cold = solveCableModel(model);
    expect(cold.converged && cold.iterations).toBeGreaterThan(1);
    expect(solveCableModel(model, { starts: [cold.displacementsM] }).iterations).toBe(0);
    const away = solveCableModel(model, { starts: [cold.displacementsM.map((x) => -20 * x)] });
    expect([away.iterations, away.displacementsM]).toEqual([cold.iterations, cold.displacementsM]);
  });
  it("a start of the wrong size is refused, naming the option", () => {
    const model = loaded({ cells: 2, spacingM: 1, riseRatio: 0.1, prestressN: 1e3, stiffnessRatio: 100 }, 0.1, () => [0, 0, -1]);
    expect(() => solveCableModel(model, { starts: [new Float64Array(3)] })).toThrow(/options\.starts: 3 displacements \(expected \d+, three a node\)/);
  });
  it("at a small load the nonlinear answer is the linear one, and doubling the load doubles it", () => {
    fc.assert(
      fc.property(netArb, (p) => {
        const model = loaded(p, 1e-6, (u, v) => [0.1, -0.2, -1 + 0.01 * (u - v)]);
        const nonlinear = solveCableModel(model, { tolerance: 1e-10 });
        const linear = solveCableModelLinear(model);
        const doubled = solveCableModelLinear({ ...model, loads: model.loads.map((l) => ({ node: l.node, forceN: l.forceN.map((c) => 2 * c) as unknown as Vec3 })) });
        expect(nonlinear.converged).toBe(true);
        let scale = 0;
        for (const x of linear.displacementsM) scale = Math.max(scale, Math.abs(x));
        linear.displacementsM.forEach((x, k) => {
          expect(Math.abs(nonlinear.displacementsM[k]! - x)).toBeLessThanOrEqual(1e-4 * scale);
          // (not exact to round-off: the form-found state is in equilibrium to about 1e-13 of the prestress)
          expect(Math.abs(doubled.displacementsM[k]! - 2 * x)).toBeLessThanOrEqual(1e-6 * scale);
        });
      }),
      { numRuns: 30 },
    );
  });
});

describe("nonlinear cable solver: load cases of one model share what is prepared of it", () => {
  it("solving cases of one model in any order gives each the answer of a model made afresh, to the last bit; a solve inside another's loadAt works", () => {
    fc.assert(
      fc.property(netArb, fc.array(fc.constantFrom(0, 1, 2), { minLength: 2, maxLength: 5 }), (p, order) => {
        const patterns: ((u: number, v: number) => Vec3)[] = [() => [0, 0, -1], (u) => [0, 0, u > 0 ? 1 : -0.5], (u, v) => [0.2, 0, v > 0 ? -1 : 0.3]];
        const base = loaded(p, 0.05, patterns[0]!);
        const cases = patterns.map((f) => ({ ...base, loads: loaded(p, 0.05, f).loads }));
        // each alone, on its own copy of the model (nothing shared with the others)
        const alone = cases.map((c) => solveCableModel({ ...c, nodes: [...c.nodes], members: [...c.members], supports: [...c.supports] }));
        for (const k of order) {
          const s = solveCableModel(cases[k]!);
          expect([...s.displacementsM]).toEqual([...alone[k]!.displacementsM]);
          expect([...s.forcesN]).toEqual([...alone[k]!.forcesN]);
          expect(s.iterations).toBe(alone[k]!.iterations);
        }
        // a solve of the same model while one runs (inside its loadAt) prepares its own, and both answer as alone
        let inner: ReturnType<typeof solveCableModel> | undefined;
        const outer = solveCableModel(cases[0]!, { loadAt: (x) => ((inner ??= solveCableModel(cases[1]!)), new Float64Array(x.length)) });
        expect([...outer.displacementsM]).toEqual([...alone[0]!.displacementsM]);
        expect([...inner!.displacementsM]).toEqual([...alone[1]!.displacementsM]);
      }),
      { numRuns: 40, seed: 20261205 },
    );
  });
});
