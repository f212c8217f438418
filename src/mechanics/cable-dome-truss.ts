/**
 * Axisymmetric statics of one radial truss of a cable dome (ridge cables, posts, diagonals, hoops
 * between a central tension ring and a perimeter compression ring).
 *
 * Geometry, in one radial plane (r outwards from the centre, z up):
 * - post heads T_0…T_n at (r_i, top_i) and post feet B_0…B_n at (r_i, bottom_i); i = 0 is the
 *   central tension ring (a drum: an upper and a lower ring joined by post P_0);
 * - the compression ring node C at (ringRadius, ringHeight);
 * - ridge cable R_i from T_(i−1) to T_i (T_(n+1) = C), diagonal D_i from B_(i−1) to T_i, post P_i
 *   from T_i to B_i, hoop H_i (circumferential) through B_i.
 *
 * Each node has two equations (radial, vertical). A circumferential ring or hoop of tension F through
 * the N nodes of a level pulls each node towards the axis with 2F sin(π/N) (equilibrium of a regular
 * polygon, elementary statics). Marching from the centre outwards, each node has exactly two
 * unknowns: T_0 (P_0, R_1) given the central upper-ring force, B_0 (lower ring, D_1), then T_i
 * (P_i, R_(i+1)) and B_i (H_i, D_(i+1)). The structure has one self-stress state (4n + 5 forces,
 * 4n + 4 equations); it is fixed by the central upper-ring force. Any load state is found with that
 * force set to zero; total forces are load state + α·(self-stress state), linear superposition
 * (first-order, small displacements: the usual idealisation for preliminary sizing of a prestressed
 * cable truss; derived here from node equilibrium, not taken from a published solution).
 * Signs: + tension, − compression. Loads: vertical, + downwards, N per truss at each node.
 */

export type CableDomeTrussGeometry = {
  /** Number of radial trusses N (≥ 3). */
  trusses: number;
  /** Radii of the central ring (index 0) and of the posts, increasing, m. */
  radiiM: readonly number[];
  /** Height of the post heads (index 0: central upper ring), m. */
  topM: readonly number[];
  /** Height of the post feet (index 0: central lower ring), m; below topM. */
  bottomM: readonly number[];
  /** Radius of the compression ring, m (> last radius). */
  ringRadiusM: number;
  /** Height of the compression ring, m. */
  ringHeightM: number;
};

/** Vertical loads per truss, + downwards, N: at the post heads and at the post feet (same lengths as radiiM). */
export type CableDomeTrussLoads = {
  topN: readonly number[];
  bottomN: readonly number[];
};

/** Member forces of one radial truss, N (+ tension). */
export interface CableDomeTrussForces {
  /** R_1…R_(n+1): ridge cables, centre outwards (the last meets the compression ring). */
  ridgeN: number[];
  /** D_1…D_(n+1): diagonals, from the foot of one post to the head of the next (the last to the ring). */
  diagonalN: number[];
  /** P_0…P_n: posts (P_0 is the strut of the central drum). */
  postN: number[];
  /** H_1…H_n: hoop forces (circumferential). */
  hoopN: number[];
  /** Central upper ring force (circumferential). */
  centralTopRingN: number;
  /** Central lower ring force (circumferential). */
  centralBottomRingN: number;
  /** Compression ring force (circumferential; negative is compression). */
  compressionRingN: number;
  /** Horizontal pull of one truss on the compression ring, inwards, N. */
  ringPullN: number;
  /** Upward support reaction at the ring per truss, N. */
  ringReactionN: number;
}

type Vec = readonly [number, number];

function unit(from: Vec, to: Vec): Vec {
  const dr = to[0] - from[0];
  const dz = to[1] - from[1];
  const length = Math.hypot(dr, dz);
  return [dr / length, dz / length];
}

/** Solves a·u + b·v = rhs for (a, b) by Cramer's rule; throws when u ∥ v. */
function solve2(u: Vec, v: Vec, rhs: Vec, where: string): [number, number] {
  const det = u[0] * v[1] - u[1] * v[0];
  if (!(Math.abs(det) > 1e-12)) throw new RangeError(`cable dome geometry is singular at ${where} (two members are parallel)`);
  return [(rhs[0] * v[1] - rhs[1] * v[0]) / det, (u[0] * rhs[1] - u[1] * rhs[0]) / det];
}

/** Checks a geometry; throws naming the field and the value. */
export function validateCableDomeTrussGeometry(g: CableDomeTrussGeometry): void {
  if (!(Number.isInteger(g.trusses) && g.trusses >= 3)) throw new RangeError(`invalid trusses: ${g.trusses} (expected a whole number ≥ 3)`);
  const n = g.radiiM.length;
  if (n < 1) throw new RangeError(`invalid radiiM: empty (expected the central ring radius and any post radii)`);
  if (g.topM.length !== n || g.bottomM.length !== n) throw new RangeError(`invalid geometry: radiiM, topM and bottomM have lengths ${n}, ${g.topM.length}, ${g.bottomM.length} (expected equal)`);
  for (let i = 0; i < n; i++) {
    const r = g.radiiM[i] as number;
    if (!(r > 0) || (i > 0 && !(r > (g.radiiM[i - 1] as number)))) throw new RangeError(`invalid radiiM[${i}]: ${r} m (expected > 0 and increasing)`);
    if (!((g.topM[i] as number) > (g.bottomM[i] as number))) throw new RangeError(`invalid post ${i}: head ${g.topM[i]} m, foot ${g.bottomM[i]} m (expected head above foot)`);
  }
  if (!(g.ringRadiusM > (g.radiiM[n - 1] as number))) throw new RangeError(`invalid ringRadiusM: ${g.ringRadiusM} m (expected > last post radius ${g.radiiM[n - 1]} m)`);
  if (!Number.isFinite(g.ringHeightM)) throw new RangeError(`invalid ringHeightM: ${g.ringHeightM} (expected a number)`);
}

function solveTruss(g: CableDomeTrussGeometry, loads: CableDomeTrussLoads, centralTopRingN: number): CableDomeTrussForces {
  validateCableDomeTrussGeometry(g);
  const n = g.radiiM.length - 1; // number of hoops
  if (loads.topN.length !== n + 1 || loads.bottomN.length !== n + 1) throw new RangeError(`invalid loads: ${loads.topN.length} head and ${loads.bottomN.length} foot loads (expected ${n + 1} each)`);
  const k = 2 * Math.sin(Math.PI / g.trusses);
  const top = (i: number): Vec => (i > n ? [g.ringRadiusM, g.ringHeightM] : [g.radiiM[i] as number, g.topM[i] as number]);
  const bottom = (i: number): Vec => [g.radiiM[i] as number, g.bottomM[i] as number];
  const ridgeN: number[] = [];
  const diagonalN: number[] = [];
  const postN: number[] = [];
  const hoopN: number[] = [];
  // T_0: top ring (−kF, 0), post (0, −P_0), ridge R_1 along T_0→T_1, load (0, −W).
  const r1 = unit(top(0), top(1));
  const [p0, ridge1] = solve2([0, -1], r1, [k * centralTopRingN, loads.topN[0] as number], "the central upper ring");
  postN.push(p0);
  ridgeN.push(ridge1);
  // B_0: post (0, +P_0), lower ring (−kF_b, 0), diagonal D_1 along B_0→T_1, load (0, −W).
  const d1 = unit(bottom(0), top(1));
  const [fb, diag1] = solve2([-k, 0], d1, [0, -p0 + (loads.bottomN[0] as number)], "the central lower ring");
  diagonalN.push(diag1);
  for (let i = 1; i <= n; i++) {
    // T_i: known ridge R_i (towards T_(i−1)) and diagonal D_i (towards B_(i−1)); unknown post P_i, ridge R_(i+1).
    const towardsInnerTop = unit(top(i), top(i - 1));
    const towardsInnerFoot = unit(top(i), bottom(i - 1));
    const ri = ridgeN[i - 1] as number;
    const di = diagonalN[i - 1] as number;
    const known: Vec = [ri * towardsInnerTop[0] + di * towardsInnerFoot[0], ri * towardsInnerTop[1] + di * towardsInnerFoot[1] - (loads.topN[i] as number)];
    const [pi, rNext] = solve2([0, -1], unit(top(i), top(i + 1)), [-known[0], -known[1]], `post head ${i}`);
    postN.push(pi);
    ridgeN.push(rNext);
    // B_i: known post (0, +P_i) and load; unknown hoop (−k, 0) and diagonal D_(i+1) towards T_(i+1).
    const [hoop, dNext] = solve2([-k, 0], unit(bottom(i), top(i + 1)), [0, -pi + (loads.bottomN[i] as number)], `post foot ${i}`);
    hoopN.push(hoop);
    diagonalN.push(dNext);
  }
  // Ring node C: the last ridge and diagonal pull it towards T_n and B_n.
  const c = top(n + 1);
  const toTop = unit(c, top(n));
  const toFoot = unit(c, bottom(n));
  const rLast = ridgeN[n] as number;
  const dLast = diagonalN[n] as number;
  const radial = rLast * toTop[0] + dLast * toFoot[0];
  const vertical = rLast * toTop[1] + dLast * toFoot[1];
  return {
    ridgeN,
    diagonalN,
    postN,
    hoopN,
    centralTopRingN,
    centralBottomRingN: fb,
    // the ring pushes the node outwards with −k·N_ring: radial + (−k N) = 0
    compressionRingN: radial / k,
    ringPullN: -radial,
    ringReactionN: -vertical,
  };
}

/**
 * The self-stress state for a central upper-ring force (1 N by default): the forces in equilibrium
 * with no load. All cables should come out in tension and the posts in compression for a usable
 * geometry (convex ridge line, diagonals rising outwards); callers check.
 * @throws RangeError on an invalid or singular geometry
 */
export function cableDomeSelfStress(geometry: CableDomeTrussGeometry, centralTopRingN = 1): CableDomeTrussForces {
  const zeros = geometry.radiiM.map(() => 0);
  return solveTruss(geometry, { topN: zeros, bottomN: zeros }, centralTopRingN);
}

/** The load state: forces in equilibrium with the nodal loads, with the central upper-ring force zero. */
export function cableDomeLoadState(geometry: CableDomeTrussGeometry, loads: CableDomeTrussLoads): CableDomeTrussForces {
  return solveTruss(geometry, loads, 0);
}

/** Superposition a·A + b·B of two force states of the same geometry (linear, first-order). */
export function combineCableDomeStates(a: number, stateA: CableDomeTrussForces, b: number, stateB: CableDomeTrussForces): CableDomeTrussForces {
  const mix = (x: readonly number[], y: readonly number[]) => x.map((v, i) => a * v + b * (y[i] as number));
  return {
    ridgeN: mix(stateA.ridgeN, stateB.ridgeN),
    diagonalN: mix(stateA.diagonalN, stateB.diagonalN),
    postN: mix(stateA.postN, stateB.postN),
    hoopN: mix(stateA.hoopN, stateB.hoopN),
    centralTopRingN: a * stateA.centralTopRingN + b * stateB.centralTopRingN,
    centralBottomRingN: a * stateA.centralBottomRingN + b * stateB.centralBottomRingN,
    compressionRingN: a * stateA.compressionRingN + b * stateB.compressionRingN,
    ringPullN: a * stateA.ringPullN + b * stateB.ringPullN,
    ringReactionN: a * stateA.ringReactionN + b * stateB.ringReactionN,
  };
}

/**
 * Out-of-balance force at every free node (post heads 0…n, then post feet 0…n), N, assembled member
 * by member independently of the solver — for checking equilibrium. Each entry is [radial, vertical].
 */
export function cableDomeNodeResiduals(g: CableDomeTrussGeometry, f: CableDomeTrussForces, loads: CableDomeTrussLoads): [number, number][] {
  const n = g.radiiM.length - 1;
  const k = 2 * Math.sin(Math.PI / g.trusses);
  const pos = (node: number): Vec => {
    if (node <= n) return [g.radiiM[node] as number, g.topM[node] as number];
    if (node <= 2 * n + 1) return [g.radiiM[node - n - 1] as number, g.bottomM[node - n - 1] as number];
    return [g.ringRadiusM, g.ringHeightM];
  };
  const T = (i: number) => (i > n ? 2 * n + 2 : i);
  const B = (i: number) => n + 1 + i;
  const members: [number, number, number][] = [];
  for (let i = 1; i <= n + 1; i++) {
    members.push([T(i - 1), T(i), f.ridgeN[i - 1] as number]);
    members.push([B(i - 1), T(i), f.diagonalN[i - 1] as number]);
  }
  for (let i = 0; i <= n; i++) members.push([T(i), B(i), f.postN[i] as number]);
  const residual: [number, number][] = Array.from({ length: 2 * n + 2 }, () => [0, 0]);
  const add = (node: number, dr: number, dz: number) => {
    const entry = residual[node];
    if (entry) {
      entry[0] += dr;
      entry[1] += dz;
    }
  };
  for (const [a, b, force] of members) {
    const pa = pos(a);
    const pb = pos(b);
    const length = Math.hypot(pb[0] - pa[0], pb[1] - pa[1]);
    const er = (pb[0] - pa[0]) / length;
    const ez = (pb[1] - pa[1]) / length;
    add(a, force * er, force * ez); // tension pulls each end towards the other
    add(b, -force * er, -force * ez);
  }
  add(T(0), -k * f.centralTopRingN, 0);
  add(B(0), -k * f.centralBottomRingN, 0);
  for (let i = 1; i <= n; i++) add(B(i), -k * (f.hoopN[i - 1] as number), 0);
  for (let i = 0; i <= n; i++) {
    add(T(i), 0, -(loads.topN[i] as number));
    add(B(i), 0, -(loads.bottomN[i] as number));
  }
  return residual;
}
