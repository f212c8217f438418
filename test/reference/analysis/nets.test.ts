// Published and cross-check values for cable nets, force density and shallow trusses
// (../shared/reference/analysis-benchmarks.md §2–§5). Conventions: engineering strain on the
// unstressed length, L_u = L/(1 + T/EA); dead loads.
import { describe, it, expect } from "vitest";
import { solveCableModel, solveCableModelLinear } from "../../../src/analysis/cable-solver";
import { formFind } from "../../../src/analysis/force-density";
import type { CableModel, Member, Vec3 } from "../../../src/analysis/model";
import { expectAbsClose, expectRelClose } from "../../helpers/close";

const pinned = (node: number) => ({ node, fixed: [true, true, true] as const });

describe("Irvine's elastic cable under an added uniform load (Irvine, Cable Structures, 1981, ch. 2)", () => {
  // h* from Irvine's cubic h*³ + (2 + λ²/24)·h*² + (1 + λ²/12)·h* − (λ²/12)·p*·(1 + p*/2) = 0, by Newton.
  const cubic = (lambda2: number, pStar: number) => {
    let h = 0.5;
    for (let k = 0; k < 60; k++) {
      const f = h ** 3 + (2 + lambda2 / 24) * h ** 2 + (1 + lambda2 / 12) * h - (lambda2 / 12) * pStar * (1 + pStar / 2);
      h -= f / (3 * h ** 2 + 2 * (2 + lambda2 / 24) * h + 1 + lambda2 / 12);
    }
    return h;
  };
  // Table in analysis-benchmarks.md §2: L, d, mg, EA, p* → λ², h* (cubic), h* (computed, 200 segments).
  it.each([
    [100, 5, 1, 2e5, 0.5, 125.4902, 0.440542, 0.439947],
    [100, 5, 1, 2e5, 1.0, 125.4902, 0.854257, 0.852746],
    [100, 2, 1, 2e5, 0.5, 8.1659, 0.195446, 0.195098],
    [100, 5, 1, 2e4, 0.5, 12.549, 0.241012, 0.239007],
  ])("L = %s, d = %s, mg = %s, EA = %s, p* = %s", (L, d, mg, ea, pStar, lambda2, hCubic, hComputed) => {
    const H = (mg * L * L) / (8 * d);
    const Le = L * (1 + 8 * (d / L) ** 2);
    expectRelClose(((mg * L) / H) ** 2 * (L / ((H * Le) / ea)), lambda2, 1e-5); // λ² as defined in §2 (given to 5–7 digits)
    expectRelClose(cubic(lambda2, pStar), hCubic, 5e-6); // six digits given
    // A 200-segment cable on the parabola z = −4d·x(L − x)/L² under mg·Δx per node: in equilibrium
    // at H = mgL²/(8d) exactly (equal loads on a discrete parabola), so T0 = H·l/Δx per segment.
    const segments = 200;
    const dx = L / segments;
    const nodes: Vec3[] = Array.from({ length: segments + 1 }, (_, k) => [k * dx, 0, (-4 * d * (k * dx) * (L - k * dx)) / (L * L)]);
    const members: Member[] = Array.from({ length: segments }, (_, k) => {
      const l = Math.hypot(dx, nodes[k + 1]![2] - nodes[k]![2]);
      return { i: k, j: k + 1, eaN: ea, kind: "cable", initialForceN: (H * l) / dx };
    });
    const dead = nodes.slice(1, -1).map((_, k) => ({ node: k + 1, forceN: [0, 0, -mg * dx] as Vec3 }));
    const added = dead.map((l) => ({ node: l.node, forceN: [0, 0, -pStar * mg * dx] as Vec3 }));
    const planar = nodes.slice(1, -1).map((_, k) => ({ node: k + 1, fixed: [false, true, false] as const }));
    const model: CableModel = { nodes, members, supports: [pinned(0), pinned(segments), ...planar], loads: [...dead, ...added] };
    const r = solveCableModel(model, { steps: 2 });
    expect(r.converged, r.reason).toBe(true);
    const c = r.coordinatesM;
    const horizontal = (r.forcesN[0]! * (c[3]! - c[0]!)) / Math.hypot(c[3]! - c[0]!, c[5]! - c[2]!);
    const hStar = (horizontal - H) / H;
    expectRelClose(hStar, hComputed, 2e-4); // computed cross-check (an independent solver, same model)
    expectRelClose(hStar, hCubic, 1.2e-2); // Irvine's cubic assumes a shallow parabola: ~1 % at d/L = 1/20
  });
});

/** A square grid of (m+1)² nodes at spacing 1 on [0, m]², branches between neighbours. */
function grid(m: number) {
  const id = (i: number, j: number) => i * (m + 1) + j;
  const nodes: Vec3[] = [];
  for (let i = 0; i <= m; i++) for (let j = 0; j <= m; j++) nodes.push([i, j, 0]);
  const branches: [number, number][] = [];
  for (let i = 0; i <= m; i++) for (let j = 0; j <= m; j++) {
    if (i < m) branches.push([id(i, j), id(i + 1, j)]);
    if (j < m) branches.push([id(i, j), id(i, j + 1)]);
  }
  const fixed = nodes.map((_, k) => k).filter((k) => [0, m].includes(Math.floor(k / (m + 1))) || [0, m].includes(k % (m + 1)));
  return { id, nodes, branches, fixed };
}

describe("force density method: exact grids (analysis-benchmarks.md §3; Schek 1974)", () => {
  it("3 × 3 free nodes in a 5 × 5 grid, q = 1, p = 1: z = 11/16, 7/8, 9/8", () => {
    // The discrete Poisson problem 4z_c − Σ z_neighbours = p/q, solved by hand in the benchmark file.
    const g = grid(4);
    const loads = g.nodes.map(() => [0, 0, 1] as Vec3);
    const r = formFind({ nodes: g.nodes, branches: g.branches, forceDensityNPerM: 1, fixed: g.fixed, loadsN: loads });
    expectRelClose(r.nodes[g.id(1, 1)]![2], 11 / 16, 1e-12);
    expectRelClose(r.nodes[g.id(1, 2)]![2], 7 / 8, 1e-12);
    expectRelClose(r.nodes[g.id(2, 2)]![2], 9 / 8, 1e-12);
    expectRelClose(r.nodes[g.id(3, 3)]![2], 11 / 16, 1e-12);
    expectAbsClose(r.nodes[g.id(1, 1)]![0], 1, 1e-12); // x, y stay on the grid (no in-plane load)
  });
  it("uniform q with the boundary on z = c·x·y reproduces z = c·x·y inside", () => {
    // x·y is discrete-harmonic on a square grid, so the force density equations hold it exactly.
    const g = grid(8);
    const c = 0.07;
    const nodes = g.nodes.map(([x, y]) => [x, y, c * (x - 4) * (y - 4)] as Vec3);
    const r = formFind({ nodes: nodes.map((p, k) => (g.fixed.includes(k) ? p : ([0, 0, 0] as Vec3))), branches: g.branches, forceDensityNPerM: 3.5, fixed: g.fixed });
    r.nodes.forEach((p, k) => expectAbsClose(p[2], nodes[k]![2], 1e-12));
  });
});

/** The saddle net of §3: 9 × 9 nodes on u, v ∈ [−6, 6] at 1.5 m, z = (u² − v²)/18, kN and m. */
function saddleNet() {
  const n = 9;
  const id = (i: number, j: number) => i * n + j;
  const at = (k: number) => -6 + 1.5 * k;
  const nodes: Vec3[] = [];
  for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) nodes.push([at(i), at(j), (at(i) ** 2 - at(j) ** 2) / 18]);
  const edge = (k: number) => k === 0 || k === n - 1;
  const fixed = nodes.map((_, k) => k).filter((k) => edge(Math.floor(k / n)) || edge(k % n));
  const branches: [number, number][] = [];
  for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) {
    if (i < n - 1 && !edge(j)) branches.push([id(i, j), id(i + 1, j)]); // boundary edges are not cables
    if (j < n - 1 && !edge(i)) branches.push([id(i, j), id(i, j + 1)]);
  }
  return { id, nodes, fixed, branches };
}

describe("saddle net (analysis-benchmarks.md §3, computed cross-check)", () => {
  const net = saddleNet();
  const found = formFind({ nodes: net.nodes, branches: net.branches, forceDensityNPerM: 20, fixed: net.fixed });
  const model = (load: (u: number) => number): CableModel => ({
    nodes: found.nodes,
    members: net.branches.map(([i, j], k) => ({ i, j, eaN: 1e5, kind: "cable", initialForceN: found.forcesN[k]! })),
    supports: net.fixed.map(pinned),
    // Loads placed by the grid's own u (the form-found centre line has x = ±1e-16, not exactly 0).
    loads: net.nodes.map((p, node) => ({ node, forceN: [0, 0, -load(p[0])] as Vec3 })).filter((l, node) => !net.fixed.includes(node) && l.forceN[2] !== 0),
  });
  const centre = net.id(4, 4);
  it("has 112 cables, and uniform q = 20 kN/m reproduces the surface", () => {
    expect(net.branches).toHaveLength(112);
    found.nodes.forEach((p, k) => expectAbsClose(p[2], net.nodes[k]![2], 1e-12));
  });
  it("5 kN at each free node: centre −1.857 mm", () => {
    const r = solveCableModel(model(() => 5));
    expect(r.converged, r.reason).toBe(true);
    expectAbsClose(r.displacementsM[3 * centre + 2]! * 1000, -1.857, 0.0005);
    expect(r.slack.filter(Boolean)).toHaveLength(0);
  });
  it("20 kN at each free node: centre −15.347 mm, 14 hogging cables slack", () => {
    const r = solveCableModel(model(() => 20), { steps: 2 });
    expect(r.converged, r.reason).toBe(true);
    expectAbsClose(r.displacementsM[3 * centre + 2]! * 1000, -15.347, 0.0005);
    expect(r.slack.filter(Boolean)).toHaveLength(14);
    r.slack.forEach((s, k) => s && expect(r.forcesN[k]).toBe(0));
  });
  it("5 kN on the half u < 0 only: centre moves (−1.105, 0, +0.972) mm", () => {
    const r = solveCableModel(model((u) => (u < 0 ? 5 : 0)));
    expect(r.converged, r.reason).toBe(true);
    const move = [0, 1, 2].map((d) => r.displacementsM[3 * centre + d]! * 1000);
    expectAbsClose(move[0]!, -1.105, 0.0005);
    expectAbsClose(move[1]!, 0, 1e-9);
    expectAbsClose(move[2]!, 0.972, 0.0005);
  });
});

describe("the 24-member star dome (Levy & Spillers, Analysis of Geometrically Nonlinear Structures, 2nd ed., 2003, §2.4.2)", () => {
  it("linear crown deflection −0.20641184 in under 220.46 lb (in, lb, psi)", () => {
    const nodes: Vec3[] = [[0, 0, 3.2346]];
    const inner: [number, number][] = [[4.92125, 8.5239], [-4.92125, 8.5239], [-9.8425, 0], [-4.92125, -8.5239], [4.92125, -8.5239], [9.8425, 0]];
    const outer: [number, number][] = [[0, 19.685], [-17.0472, 9.8425], [-17.0472, -9.8425], [0, -19.685], [17.0472, -9.8425], [17.0472, 9.8425]];
    inner.forEach(([x, y]) => nodes.push([x, y, 2.4472]));
    outer.forEach(([x, y]) => nodes.push([x, y, 0]));
    const pairs = [[1, 2], [1, 3], [1, 4], [1, 5], [1, 6], [1, 7], [6, 12], [7, 12], [7, 13], [2, 13], [2, 8], [3, 8], [3, 9], [4, 9], [4, 10], [5, 10], [5, 11], [6, 11], [2, 3], [3, 4], [4, 5], [5, 6], [6, 7], [7, 2]];
    const members: Member[] = pairs.map(([i, j]) => ({ i: i! - 1, j: j! - 1, eaN: 30e6 * 0.0155, kind: "strut" }));
    const model: CableModel = { nodes, members, supports: [7, 8, 9, 10, 11, 12].map(pinned), loads: [{ node: 0, forceN: [0, 0, -220.46] }] };
    const r = solveCableModelLinear(model);
    expect(r.converged, r.reason).toBe(true);
    expectRelClose(r.displacementsM[2]!, -0.20641184, 2e-6); // coordinates given to 5 digits
    // "The limit point lies considerably below this load" (the same source): Newton fails at it.
    const nonlinear = solveCableModel(model, { steps: 1, maxStepHalvings: 3 });
    expect(nonlinear.converged).toBe(false);
    expect(nonlinear.reason).toMatch(/load factor/);
  });
});

describe("16-member shallow truss (Hrinda, AIAA 2010-2611; analysis-benchmarks.md §5)", () => {
  // Nodes 2–5 at (±127, ±127) and 6–9 on the axes, numbered round the crown so that each ring node
  // sits between the two supports the member list ties it to (node 3 between 6 and 7, …).
  const nodes: Vec3[] = [[0, 0, 101.6], [127, -127, 50.8], [127, 127, 50.8], [-127, 127, 50.8], [-127, -127, 50.8], [254, 0, 0], [0, 254, 0], [-254, 0, 0], [0, -254, 0]];
  const pairs = [[6, 3], [7, 3], [7, 4], [4, 8], [8, 5], [5, 9], [9, 2], [2, 6], [2, 3], [3, 4], [4, 5], [5, 2], [1, 2], [1, 3], [1, 4], [1, 5]];
  const members: Member[] = pairs.map(([i, j]) => ({ i: i! - 1, j: j! - 1, eaN: 645.16 * 68947.6, kind: "strut" }));
  it("linear crown flexibility 3.016477e-5 mm/N (computed cross-check; N, mm)", () => {
    const r = solveCableModelLinear({ nodes, members, supports: [5, 6, 7, 8].map(pinned), loads: [{ node: 0, forceN: [0, 0, -1000] }] });
    expect(r.converged, r.reason).toBe(true);
    expectRelClose(-r.displacementsM[2]! / 1000, 3.016477e-5, 1e-6);
  });
  it("limit 425,682 N at w = 24.892 mm along the symmetric path (computed cross-check, engineering strain)", () => {
    const load = (w: number) => {
      const r = solveCableModel({ nodes, members, supports: [...[5, 6, 7, 8].map(pinned), { node: 0, fixed: [true, true, true], displacementM: [0, 0, -w] }], loads: [] }, { steps: 2 });
      return -r.reactionsN[2]!;
    };
    let best = { w: 0, p: 0 };
    for (let w = 20; w <= 30; w += 0.01) if (load(w) > best.p) best = { w, p: load(w) };
    expectRelClose(best.p, 425682, 2e-6);
    expectAbsClose(best.w, 24.892, 0.01);
  });
});
