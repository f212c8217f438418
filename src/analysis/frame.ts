/**
 * The largest lattice the on-demand frame analysis takes: 2,000 nodes (12,000 degrees of freedom).
 * A 160 m geodesic dome at 5 m struts has about 1,000 nodes and took 4 s on a loaded machine (1 s
 * quiet); 4,000 nodes took 29 s. Measured here, not a published limit.
 */
export const MAX_FRAME_NODES = 2000;

/** The warning for a lattice too large for the on-demand analysis, or null when it is not. */
export function frameTooLarge(nodes: number, remedy: string): string | null {
  if (nodes <= MAX_FRAME_NODES) return null;
  return `the net has ${nodes.toLocaleString("en")} nodes, more than the ${MAX_FRAME_NODES.toLocaleString("en")} the on-demand 3D analysis takes (it would run for minutes): the continuum buckling check only; ${remedy} to analyse it`;
}

/**
 * A 3D frame of prismatic members with rigid joints: 12 freedoms per member (three translations and
 * three rotations at each end), the linear elastic stiffness of the Euler–Bernoulli beam and the
 * geometric stiffness of its axial force (cubic shape functions; the consistent matrix of
 * McGuire, Gallagher & Ziemian, Matrix Structural Analysis, 2nd ed., 2000, §9.3 — from memory —
 * keeping the axial-force terms only: the bending-moment terms of the full matrix are left out,
 * as usual for a linear buckling analysis of members loaded mainly in compression).
 * Node freedoms: ux, uy, uz, θx, θy, θz (right-hand rotations about the global axes).
 */
import type { Vec3 } from "./model";
import { type SymmetricMatrix, factorLDL, numberEquations } from "./sparse";

export interface FrameSection {
  /** E·A, N */
  eaN: number;
  /** E·I about the two principal axes, N·m² (equal for a tube). */
  eiyNm2: number;
  eizNm2: number;
  /** G·J, N·m² */
  gjNm2: number;
  /** Polar radius of gyration squared I_p/A, m² (for the torsional term of the geometric stiffness). */
  polarRadius2M2: number;
}

export interface FrameMember {
  i: number;
  j: number;
  section: FrameSection;
  /** Direction the member's local z (the axis bending about local y moves along) is turned towards; default global z. For a section that is not round, e.g. the surface normal. */
  zReference?: Vec3;
}

export interface FrameModel {
  nodes: readonly Vec3[];
  members: readonly FrameMember[];
  /** Restrained freedoms of each supported node (ux, uy, uz, θx, θy, θz). */
  supports: readonly { node: number; fixed: readonly boolean[] }[];
  /** Flat nodal loads, 6 per node (forces N, moments N·m). */
  loads: Float64Array;
}

/** Rotation from global to member axes: rows are the member's local x (along it), y and z. */
function memberAxes(p: Vec3, q: Vec3, zReference?: Vec3): { R: number[]; L: number } {
  const dx = q[0] - p[0];
  const dy = q[1] - p[1];
  const dz = q[2] - p[2];
  const L = Math.hypot(dx, dy, dz);
  const x = [dx / L, dy / L, dz / L];
  // Local y normal to x and to a reference axis (global z, or global x for a vertical member).
  const given = zReference ? Math.hypot(...zReference) : 0;
  const along = given > 0 ? (x[0]! * zReference![0] + x[1]! * zReference![1] + x[2]! * zReference![2]) / given : 1;
  const ref = given > 0 && Math.abs(along) < 0.999 ? zReference! : Math.abs(x[2]!) > 0.999 ? [1, 0, 0] : [0, 0, 1];
  let y = [ref[1]! * x[2]! - ref[2]! * x[1]!, ref[2]! * x[0]! - ref[0]! * x[2]!, ref[0]! * x[1]! - ref[1]! * x[0]!];
  const ny = Math.hypot(y[0]!, y[1]!, y[2]!);
  y = y.map((c) => c / ny);
  const z = [x[1]! * y[2]! - x[2]! * y[1]!, x[2]! * y[0]! - x[0]! * y[2]!, x[0]! * y[1]! - x[1]! * y[0]!];
  return { R: [...x, ...y, ...z], L };
}

/** 12×12 local stiffness (row-major): elastic, plus the geometric stiffness of axial force N (tension +). */
function localStiffness(s: FrameSection, L: number, axialN: number, elastic: boolean): Float64Array {
  const k = new Float64Array(144);
  const put = (dofs: number[], m: number[][]) => {
    for (let a = 0; a < dofs.length; a++) for (let b = 0; b < dofs.length; b++) k[dofs[a]! * 12 + dofs[b]!]! += m[a]![b]!;
  };
  const L2 = L * L;
  if (elastic) {
    const ea = s.eaN / L;
    const gj = s.gjNm2 / L;
    put([0, 6], [[ea, -ea], [-ea, ea]]);
    put([3, 9], [[gj, -gj], [-gj, gj]]);
    const bz = s.eizNm2 / (L2 * L);
    put([1, 5, 7, 11], [[12 * bz, 6 * L * bz, -12 * bz, 6 * L * bz], [6 * L * bz, 4 * L2 * bz, -6 * L * bz, 2 * L2 * bz], [-12 * bz, -6 * L * bz, 12 * bz, -6 * L * bz], [6 * L * bz, 2 * L2 * bz, -6 * L * bz, 4 * L2 * bz]]);
    const by = s.eiyNm2 / (L2 * L);
    put([2, 4, 8, 10], [[12 * by, -6 * L * by, -12 * by, -6 * L * by], [-6 * L * by, 4 * L2 * by, 6 * L * by, 2 * L2 * by], [-12 * by, 6 * L * by, 12 * by, 6 * L * by], [-6 * L * by, 2 * L2 * by, 6 * L * by, 4 * L2 * by]]);
  }
  if (axialN !== 0) {
    const g = axialN / L;
    const a = (6 / 5) * g;
    const b = (L / 10) * g;
    const c = ((2 * L2) / 15) * g;
    const d = (-L2 / 30) * g;
    put([1, 5, 7, 11], [[a, b, -a, b], [b, c, -b, d], [-a, -b, a, -b], [b, d, -b, c]]);
    put([2, 4, 8, 10], [[a, -b, -a, -b], [-b, c, b, d], [-a, b, a, b], [-b, d, b, c]]);
    const t = g * s.polarRadius2M2;
    put([3, 9], [[t, -t], [-t, t]]);
  }
  return k;
}

/** Tᵀ·k·T with T = diag(R, R, R, R): the member stiffness in global axes. */
function toGlobal(k: Float64Array, R: number[]): Float64Array {
  const kr = new Float64Array(144); // k·T
  for (let a = 0; a < 12; a++) {
    for (let blk = 0; blk < 4; blk++) {
      for (let c = 0; c < 3; c++) {
        let sum = 0;
        for (let r = 0; r < 3; r++) sum += k[a * 12 + blk * 3 + r]! * R[r * 3 + c]!;
        kr[a * 12 + blk * 3 + c] = sum;
      }
    }
  }
  const out = new Float64Array(144);
  for (let blk = 0; blk < 4; blk++) {
    for (let c = 0; c < 3; c++) {
      for (let b = 0; b < 12; b++) {
        let sum = 0;
        for (let r = 0; r < 3; r++) sum += R[r * 3 + c]! * kr[(blk * 3 + r) * 12 + b]!;
        out[(blk * 3 + c) * 12 + b] = sum;
      }
    }
  }
  return out;
}

/** The frame's equation numbering and its assembler. */
export function frameSystem(model: FrameModel) {
  const n = model.nodes.length;
  const fixed = new Uint8Array(6 * n);
  for (const s of model.supports) s.fixed.forEach((f, d) => f && (fixed[6 * s.node + d] = 1));
  const { equationOf, matrix, count } = numberEquations(n, 6, model.members.map((m) => [m.i, m.j]), (node, d) => fixed[6 * node + d] === 1);
  const axes = model.members.map((m) => memberAxes(model.nodes[m.i]!, model.nodes[m.j]!, m.zReference));
  /** Assembles Σ Tᵀ k T over the members (elastic, and/or geometric with the given axial forces). */
  const assemble = (elastic: boolean, axialN?: Float64Array): SymmetricMatrix => {
    const K = matrix();
    model.members.forEach((m, e) => {
      const { R, L } = axes[e]!;
      const kg = toGlobal(localStiffness(m.section, L, axialN ? axialN[e]! : 0, elastic), R);
      const eqs = [...Array(12).keys()].map((a) => equationOf[(a < 6 ? 6 * m.i : 6 * m.j) + (a % 6)]!);
      for (let a = 0; a < 12; a++) {
        if (eqs[a]! < 0) continue;
        for (let b = 0; b < 12; b++) if (eqs[b]! >= 0 && eqs[b]! <= eqs[a]!) K.add(eqs[a]!, eqs[b]!, kg[a * 12 + b]!);
      }
    });
    return K;
  };
  /** Axial force of each member (tension +) from global displacements. */
  const axialForces = (u: Float64Array): Float64Array =>
    Float64Array.from(model.members, (m, e) => {
      const { R, L } = axes[e]!;
      let stretch = 0;
      for (let d = 0; d < 3; d++) stretch += R[d]! * (u[6 * m.j + d]! - u[6 * m.i + d]!);
      return (m.section.eaN / L) * stretch;
    });
  /**
   * The larger end's bending moment of each member (the resultant of the moments about its local y
   * and z, N·m) from global displacements: the member's end forces k·T·u. Loads act at the nodes
   * only, so a member's moment is linear along it and largest at an end.
   */
  const endMomentsNm = (u: Float64Array): Float64Array => {
    const local = new Float64Array(12);
    return Float64Array.from(model.members, (m, e) => {
      const { R, L } = axes[e]!;
      for (let blk = 0; blk < 4; blk++) {
        const at = (blk < 2 ? 6 * m.i : 6 * m.j) + (blk % 2) * 3;
        for (let r = 0; r < 3; r++) local[blk * 3 + r] = R[r * 3]! * u[at]! + R[r * 3 + 1]! * u[at + 1]! + R[r * 3 + 2]! * u[at + 2]!;
      }
      const k = localStiffness(m.section, L, 0, true);
      const force = (row: number) => {
        let sum = 0;
        for (let c = 0; c < 12; c++) sum += k[row * 12 + c]! * local[c]!;
        return sum;
      };
      return Math.max(Math.hypot(force(4), force(5)), Math.hypot(force(10), force(11)));
    });
  };
  return { equationOf, count, assemble, axialForces, endMomentsNm, lengthsM: axes.map((a) => a.L) };
}

export interface FrameSolution {
  ok: boolean;
  reason?: string;
  /** Flat displacements, 6 per node (m, rad). */
  displacements: Float64Array;
  /** Axial force per member, N (tension +). */
  axialN: Float64Array;
  /** Solves with the factorised elastic stiffness (equation numbering), when it factored. */
  solve?: (b: Float64Array) => Float64Array;
}

/** Linear static solution K·u = P (the system and its elastic stiffness may be passed in, K is not modified). */
export function solveFrameLinear(model: FrameModel, system = frameSystem(model), K = system.assemble(true)): FrameSolution {
  const f = factorLDL(K.copy());
  const u = new Float64Array(6 * model.nodes.length);
  if (!f.ok) {
    const k = system.equationOf.indexOf(f.equation);
    return { ok: false, reason: `the frame's stiffness is singular at node ${Math.floor(k / 6)} (freedom ${k % 6}): a mechanism`, displacements: u, axialN: new Float64Array(model.members.length) };
  }
  const rhs = new Float64Array(system.count);
  system.equationOf.forEach((eq, k) => eq >= 0 && (rhs[eq] = model.loads[k]!));
  const x = f.solve(rhs);
  system.equationOf.forEach((eq, k) => eq >= 0 && (u[k] = x[eq]!));
  return { ok: true, displacements: u, axialN: system.axialForces(u), solve: f.solve };
}
