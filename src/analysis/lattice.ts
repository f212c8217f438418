/**
 * Single-layer geodesic lattice domes as rigid-jointed 3D frames (a pin-jointed single layer is a
 * mechanism), built on the geodesic cap of src/mechanics/geodesic.ts, with the base band restrained;
 * the linear static solution under a load case and the lowest elastic buckling factors.
 */
import type { GeodesicCap } from "../mechanics/geodesic";
import { lowestBucklingFactors, type BucklingResult } from "./buckling";
import { type FrameModel, type FrameSection, frameSystem, solveFrameLinear } from "./frame";
import { planLoads, type Face } from "./surface-loads";

/** A circular hollow section of steel-like material: E, ν, outside diameter and wall. */
export function tubeSection(modulusPa: number, poissonRatio: number, diameterM: number, wallM: number): FrameSection {
  if (!(modulusPa > 0)) throw new RangeError(`invalid modulus: ${modulusPa} Pa (expected > 0)`);
  if (!(poissonRatio > -1 && poissonRatio < 0.5)) throw new RangeError(`invalid Poisson's ratio: ${poissonRatio} (expected −1 < ν < 0.5)`);
  if (!(diameterM > 0 && wallM > 0 && 2 * wallM <= diameterM)) throw new RangeError(`invalid tube: D = ${diameterM} m, t = ${wallM} m (expected D > 0, 0 < t ≤ D/2)`);
  const ro = diameterM / 2;
  const ri = ro - wallM;
  const area = Math.PI * (ro * ro - ri * ri);
  const inertia = (Math.PI / 4) * (ro ** 4 - ri ** 4);
  const shear = modulusPa / (2 * (1 + poissonRatio));
  return { eaN: modulusPa * area, eiyNm2: modulusPa * inertia, eizNm2: modulusPa * inertia, gjNm2: shear * 2 * inertia, polarRadius2M2: (2 * inertia) / area };
}

export interface LatticeOptions {
  /** How many rings of nodes up from the base are restrained (1 = the base ring only). */
  restrainedRings?: number;
  /** Restrain the rotations of the restrained nodes too (clamped) or only their translations (pinned). */
  base?: "pinned" | "clamped";
}

/** Faces of the cap numbered so that (b − a) × (c − a) points away from the sphere's centre. */
export function outwardFaces(cap: GeodesicCap): Face[] {
  return cap.faces.map(([a, b, c]) => {
    const [pa, pb, pc] = [cap.nodes[a]!, cap.nodes[b]!, cap.nodes[c]!];
    const e1 = [pb[0] - pa[0], pb[1] - pa[1], pb[2] - pa[2]];
    const e2 = [pc[0] - pa[0], pc[1] - pa[1], pc[2] - pa[2]];
    const n = [e1[1]! * e2[2]! - e1[2]! * e2[1]!, e1[2]! * e2[0]! - e1[0]! * e2[2]!, e1[0]! * e2[1]! - e1[1]! * e2[0]!];
    const outward = n[0]! * (pa[0] + pb[0] + pc[0]) + n[1]! * (pa[1] + pb[1] + pc[1]) + n[2]! * (pa[2] + pb[2] + pc[2]);
    return outward >= 0 ? ([a, b, c] as const) : ([a, c, b] as const);
  });
}

/** Nodes in the first `rings` graph rings from the base ring (ring 1 = the base ring itself). */
function baseBand(cap: GeodesicCap, rings: number): Set<number> {
  const band = new Set(cap.ringNodes);
  let front = [...cap.ringNodes];
  const neighbours: number[][] = cap.nodes.map(() => []);
  for (const [p, q] of cap.edges) {
    neighbours[p]!.push(q);
    neighbours[q]!.push(p);
  }
  for (let r = 1; r < rings; r++) {
    const next: number[] = [];
    for (const p of front) {
      for (const q of neighbours[p]!) {
        if (band.has(q)) continue;
        band.add(q);
        next.push(q);
      }
    }
    front = next;
  }
  return band;
}

/** A frame model of the cap: every strut one member of the given section, base band restrained, no loads. */
export function latticeFrame(cap: GeodesicCap, section: FrameSection, options: LatticeOptions = {}): FrameModel {
  const rings = options.restrainedRings ?? 1;
  if (!(Number.isInteger(rings) && rings >= 1)) throw new RangeError(`invalid restrainedRings: ${rings} (expected a whole number ≥ 1)`);
  const clamped = (options.base ?? "clamped") === "clamped";
  const band = baseBand(cap, rings);
  return {
    nodes: cap.nodes,
    members: cap.edges.map(([i, j]) => ({ i, j, section })),
    supports: [...band].map((node) => ({ node, fixed: [true, true, true, clamped, clamped, clamped] })),
    loads: new Float64Array(6 * cap.nodes.length),
  };
}

/** Flat 6-per-node loads of a uniform external (radial, inward) pressure on the cap, Pa → N. */
export function radialPressureLoads(cap: GeodesicCap, pressurePa: number): Float64Array {
  const loads = new Float64Array(6 * cap.nodes.length);
  for (const [a, b, c] of outwardFaces(cap)) {
    const [pa, pb, pc] = [cap.nodes[a]!, cap.nodes[b]!, cap.nodes[c]!];
    const e1 = [pb[0] - pa[0], pb[1] - pa[1], pb[2] - pa[2]];
    const e2 = [pc[0] - pa[0], pc[1] - pa[1], pc[2] - pa[2]];
    const area = [e1[1]! * e2[2]! - e1[2]! * e2[1]!, e1[2]! * e2[0]! - e1[0]! * e2[2]!, e1[0]! * e2[1]! - e1[1]! * e2[0]!].map((x) => x / 2);
    for (const k of [a, b, c]) for (let d = 0; d < 3; d++) loads[6 * k + d]! -= (pressurePa * area[d]!) / 3;
  }
  return loads;
}

/** Flat 6-per-node loads of a vertical load per unit plan area s(x, y) (snow, Pa, downwards). */
export function latticePlanLoads(cap: GeodesicCap, loadPa: (x: number, y: number) => number): Float64Array {
  const coordinates = new Float64Array(cap.nodes.length * 3);
  cap.nodes.forEach((p, k) => coordinates.set(p, 3 * k));
  const f3 = planLoads(coordinates, cap.faces, loadPa);
  const loads = new Float64Array(6 * cap.nodes.length);
  for (let k = 0; k < cap.nodes.length; k++) for (let d = 0; d < 3; d++) loads[6 * k + d] = f3[3 * k + d]!;
  return loads;
}

export interface LatticeBuckling {
  /** Model size. */
  nodes: number;
  members: number;
  dofs: number;
  /** Linear static solution under the load case: displacements (6 per node) and axial forces, N. */
  displacements: Float64Array;
  axialN: Float64Array;
  buckling: BucklingResult;
}

/** Linear statics under `loads` (6 per node), then the lowest `count` buckling factors of that load. */
export function latticeBuckling(frame: FrameModel, loads: Float64Array, count = 3): LatticeBuckling {
  const model = { ...frame, loads };
  const system = frameSystem(model);
  const K = system.assemble(true);
  const statics = solveFrameLinear(model, system, K);
  const size = { nodes: frame.nodes.length, members: frame.members.length, dofs: system.count };
  if (!statics.ok || !statics.solve) return { ...size, displacements: statics.displacements, axialN: statics.axialN, buckling: { converged: false, reason: statics.reason!, factors: [], modes: [], steps: 0 } };
  const G = system.assemble(false, statics.axialN.map((n) => -n)); // G = −K_G(N)
  return { ...size, displacements: statics.displacements, axialN: statics.axialN, buckling: lowestBucklingFactors(K, G, count, { solve: statics.solve }) };
}
