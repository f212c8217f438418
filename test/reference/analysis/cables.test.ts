// Closed-form checks of the nonlinear cable-and-strut solver (src/analysis/cable-solver.ts).
// Conventions in every test here (as ../shared/reference/analysis-benchmarks.md asks): engineering
// strain on the unstressed length, N = EA(l − L_u)/L_u with L_u = L0/(1 + T0/EA); dead loads.
import { describe, it, expect } from "vitest";
import { solveCableModel, type CableSolution } from "../../../src/analysis/cable-solver";
import type { CableModel, Member, Vec3 } from "../../../src/analysis/model";
import { expectRelClose } from "../../helpers/close";

const pinned = (node: number) => ({ node, fixed: [true, true, true] as const });

/** Statics of a straight pretensioned elastic cable of half-span a pulled sideways by w at its middle. */
function cableForce(halfSpan: number, pretension: number, ea: number, w: number): { force: number; length: number } {
  const rest = halfSpan / (1 + pretension / ea);
  const length = Math.hypot(halfSpan, w);
  return { force: (ea * (length - rest)) / rest, length };
}

/** A cable along x through node 0 at the origin, n segments each side, fixed at ±a. */
function straightCable(a: number, t0: number, ea: number, segments: number, pN: number): CableModel {
  const nodes: Vec3[] = [];
  for (let k = -segments; k <= segments; k++) nodes.push([(a * k) / segments, 0, 0]);
  const members: Member[] = [];
  for (let k = 0; k < 2 * segments; k++) members.push({ i: k, j: k + 1, eaN: ea, kind: "cable", initialForceN: t0 });
  return { nodes, members, supports: [pinned(0), pinned(2 * segments)], loads: [{ node: segments, forceN: [0, 0, -pN] }] };
}

describe("pretensioned elastic cable under a central point load (exact nonlinear statics)", () => {
  // Closed form, derived here from equilibrium of the loaded node: P = 2·N·w/l with
  // l = √(a² + w²), N = EA(l − L_u)/L_u, L_u = a/(1 + T0/EA) (each half stays straight).
  // The same problem: Irvine, Cable Structures (1981), ch. 1 (point load on a taut string) — from memory.
  it.each([
    [10, 1e3, 1e6, 0.05, 1],
    [10, 1e3, 1e6, 0.8, 4],
    [25, 5e4, 2e7, 1.5, 3],
  ])("a = %s m, T0 = %s N, EA = %s N, w = %s m, %s segments a side", (a, t0, ea, w, segments) => {
    const { force, length } = cableForce(a, t0, ea, w);
    const p = (2 * force * w) / length;
    const r = solveCableModel(straightCable(a, t0, ea, segments, p), { steps: 2, tolerance: 1e-11 });
    expect(r.converged, r.reason).toBe(true);
    expectRelClose(-r.displacementsM[3 * segments + 2]!, w, 1e-7);
    expectRelClose(r.forcesN[0]!, force, 1e-7);
    expect(r.residualN).toBeLessThanOrEqual(1e-11 * r.appliedN);
  });
});

describe("prestressed cable cross under a lateral load (exact nonlinear statics)", () => {
  // Two straight cables crossing at a node, half-spans a1, a2, pretensions T1, T2; a load P normal to
  // their plane moves the node by w: P = 2N1·w/l1 + 2N2·w/l2 (equilibrium of the node, each half
  // straight; derived here). Unequal cables so that the two share the load unequally.
  it("a1 = 30 m, a2 = 20 m, T1 = 200 kN, T2 = 120 kN, w = 0.9 m", () => {
    const [a1, a2, t1, t2, ea1, ea2, w] = [30, 20, 2e5, 1.2e5, 3e8, 1.5e8, 0.9];
    const c1 = cableForce(a1, t1, ea1, w);
    const c2 = cableForce(a2, t2, ea2, w);
    const p = (2 * c1.force * w) / c1.length + (2 * c2.force * w) / c2.length;
    const nodes: Vec3[] = [[0, 0, 0], [-a1, 0, 0], [a1, 0, 0], [0, -a2, 0], [0, a2, 0]];
    const members: Member[] = [
      { i: 0, j: 1, eaN: ea1, kind: "cable", initialForceN: t1 },
      { i: 0, j: 2, eaN: ea1, kind: "cable", initialForceN: t1 },
      { i: 0, j: 3, eaN: ea2, kind: "cable", initialForceN: t2 },
      { i: 0, j: 4, eaN: ea2, kind: "cable", initialForceN: t2 },
    ];
    const r = solveCableModel({ nodes, members, supports: [1, 2, 3, 4].map(pinned), loads: [{ node: 0, forceN: [0, 0, -p] }] }, { steps: 1, tolerance: 1e-11 });
    expect(r.converged, r.reason).toBe(true);
    expectRelClose(-r.displacementsM[2]!, w, 1e-7);
    expectRelClose(r.forcesN[0]!, c1.force, 1e-7);
    expectRelClose(r.forcesN[2]!, c2.force, 1e-7);
  });
});

/** An n-bar star: apex at height h over the centre, n pinned supports on a circle of radius a. */
function star(n: number, a: number, h: number, ea: number, apexDropM: number): CableModel {
  const nodes: Vec3[] = [[0, 0, h]];
  for (let k = 0; k < n; k++) nodes.push([a * Math.cos((2 * Math.PI * k) / n), a * Math.sin((2 * Math.PI * k) / n), 0]);
  const members: Member[] = nodes.slice(1).map((_, k) => ({ i: 0, j: k + 1, eaN: ea, kind: "strut" }));
  // The apex is driven down by a prescribed displacement (displacement control passes the limit
  // point); for two bars (in the x–z plane) the out-of-plane freedom y is restrained.
  const apex = { node: 0, fixed: [false, n === 2, true] as const, displacementM: [0, 0, -apexDropM] as const };
  const supports = [...nodes.slice(1).map((_, k) => pinned(k + 1)), apex];
  return { nodes, members, supports, loads: [] };
}

const apexLoad = (r: CableSolution) => -r.reactionsN[2]!;

/** The largest apex load along the path, by golden-section search on the solver's P(w). */
function limitByGoldenSection(load: (w: number) => number, lo: number, hi: number): { w: number; p: number } {
  const g = (Math.sqrt(5) - 1) / 2;
  let [a, b] = [lo, hi];
  for (let k = 0; k < 60; k++) {
    const c = b - g * (b - a);
    const d = a + g * (b - a);
    if (load(c) > load(d)) b = d;
    else a = c;
  }
  return { w: (a + b) / 2, p: load((a + b) / 2) };
}

describe("von Mises two-bar truss and the n-bar star (analysis-benchmarks.md §1, closed forms)", () => {
  // Engineering strain: P(y) = n·EA·y·(1/l − 1/L0) (benchmark file §1), with y = h − w the apex
  // height and l = √(a² + y²) — here with L_u = L0 (no prestress).
  const path = (n: number, a: number, h: number, ea: number, w: number) => {
    const y = h - w;
    return n * ea * y * (1 / Math.hypot(a, y) - 1 / Math.hypot(a, h));
  };
  it("n = 2, a = 1, h = 0.1, EA = 1: the path P(y) at prescribed apex drops, exactly", () => {
    for (const w of [0.01, 0.042361, 0.09, 0.15]) {
      const r = solveCableModel(star(2, 1, 0.1, 1, w), { steps: 4 });
      expect(r.converged, r.reason).toBe(true);
      expectRelClose(apexLoad(r), path(2, 1, 0.1, 1, w), 1e-7);
    }
  });
  it("n = 2: limit P/EA = 3.810872e-4 at w = 0.042361 (engineering strain)", () => {
    const limit = limitByGoldenSection((w) => apexLoad(solveCableModel(star(2, 1, 0.1, 1, w), { steps: 2 })), 0.02, 0.07);
    expectRelClose(limit.p, 3.810872e-4, 1e-6); // benchmark file §1, unit case (7 digits given)
    expectRelClose(limit.w, 0.042361, 1e-4); // the peak is flat: w is found to about 1e-5
  });
  it("eight-member star (Hrinda, AIAA 2010-2611): limit 348.412 N at w = 430.036 mm (engineering)", () => {
    // Units N and mm: A = 6451.6 mm², E = 68.9476 N/mm², a = 12,700 mm, h = 1016 mm.
    const ea = 6451.6 * 68.9476;
    const limit = limitByGoldenSection((w) => apexLoad(solveCableModel(star(8, 12700, 1016, ea, w), { steps: 2 })), 300, 600);
    expectRelClose(limit.p, 348.412, 2e-6);
    expectRelClose(limit.w, 430.036, 1e-4);
  });
});
