/**
 * Form finding by the force density method (Schek, "The force density method for form finding and
 * computation of general networks", Comput. Methods Appl. Mech. Eng. 3, 1974). With the branch–node
 * matrix C (split into free and fixed columns C_f, C_x) and the force densities q = T/l of the
 * branches, equilibrium of the free nodes is linear in each coordinate:
 *   D·x_f = p_x − C_fᵀ Q C_x x_x,   D = C_fᵀ Q C_f,   (and the same for y and z),
 * D symmetric, positive definite when every q > 0 and every free node connects to a fixed one.
 */
import { factorLDL, numberEquations } from "./sparse";
import type { Vec3 } from "./model";

export interface ForceDensityInput {
  /** Node coordinates, m; only those of the fixed nodes are used. */
  nodes: readonly Vec3[];
  /** Branches as node index pairs. */
  branches: readonly (readonly [number, number])[];
  /** Force density of each branch, N/m (a single number for all). */
  forceDensityNPerM: number | readonly number[];
  /** Indices of the fixed nodes. */
  fixed: readonly number[];
  /** Load on each node, N (only free nodes' count); default none. */
  loadsN?: readonly Vec3[];
}

export interface ForceDensityResult {
  nodes: Vec3[];
  /** Branch lengths l, m, and forces T = q·l, N. */
  lengthsM: number[];
  forcesN: number[];
}

/** Solves the force density equations; throws naming the field when the input is unusable. */
export function formFind(input: ForceDensityInput): ForceDensityResult {
  const n = input.nodes.length;
  const q = typeof input.forceDensityNPerM === "number" ? input.branches.map(() => input.forceDensityNPerM as number) : input.forceDensityNPerM;
  if (q.length !== input.branches.length) throw new RangeError(`invalid forceDensityNPerM: ${q.length} values for ${input.branches.length} branches (expected one per branch)`);
  q.forEach((v, k) => {
    if (!Number.isFinite(v) || v === 0) throw new RangeError(`invalid forceDensityNPerM[${k}]: ${v} (expected a finite nonzero number)`);
  });
  const isFixed = new Uint8Array(n);
  for (const k of input.fixed) {
    if (!(Number.isInteger(k) && k >= 0 && k < n)) throw new RangeError(`invalid fixed node: ${k} (expected 0–${n - 1})`);
    isFixed[k] = 1;
  }
  input.branches.forEach(([a, b], k) => {
    if (!(a >= 0 && a < n && b >= 0 && b < n && a !== b)) throw new RangeError(`invalid branches[${k}]: [${a}, ${b}] (expected two different node indices 0–${n - 1})`);
  });
  const { equationOf, matrix } = numberEquations(n, 1, input.branches, (node) => isFixed[node] === 1);
  const d = matrix();
  const rhs = [0, 1, 2].map(() => new Float64Array(d.n));
  input.loadsN?.forEach((p, node) => {
    const e = equationOf[node]!;
    if (e >= 0) for (let c = 0; c < 3; c++) rhs[c]![e]! += p[c]!;
  });
  input.branches.forEach(([a, b], k) => {
    const qk = q[k]!;
    const ea = equationOf[a]!;
    const eb = equationOf[b]!;
    if (ea >= 0) d.add(ea, ea, qk);
    if (eb >= 0) d.add(eb, eb, qk);
    if (ea >= 0 && eb >= 0) d.add(ea, eb, -qk);
    else if (ea >= 0) for (let c = 0; c < 3; c++) rhs[c]![ea]! += qk * input.nodes[b]![c]!;
    else if (eb >= 0) for (let c = 0; c < 3; c++) rhs[c]![eb]! += qk * input.nodes[a]![c]!;
  });
  const f = factorLDL(d);
  if (!f.ok) throw new RangeError(`invalid force density network: singular at a free node (expected every free node connected, through branches of nonzero q, to a fixed node)`);
  const xyz = rhs.map((r) => f.solve(r));
  const nodes: Vec3[] = input.nodes.map((p, k) => {
    const e = equationOf[k]!;
    return e >= 0 ? [xyz[0]![e]!, xyz[1]![e]!, xyz[2]![e]!] : [p[0], p[1], p[2]];
  });
  const lengthsM = input.branches.map(([a, b]) => Math.hypot(nodes[b]![0] - nodes[a]![0], nodes[b]![1] - nodes[a]![1], nodes[b]![2] - nodes[a]![2]));
  return { nodes, lengthsM, forcesN: lengthsM.map((l, k) => q[k]! * l) };
}
