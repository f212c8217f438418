/**
 * A generic cable net for tests and benchmarks: an orthogonal net over a square plan of side
 * `spanM`, meshed at `spacingM`, its edge nodes fixed on the saddle z = f·(u² − v²)/(span/2)²
 * (cables along u sag, cables along v hog), form-found by the force density method with one force
 * density q = T0/spacing for every cable, so that the net's inner shape is the discrete-harmonic
 * surface through its edge (for this edge, the saddle itself). Edge-to-edge cables along the
 * boundary are left out (the edge is a stiff boundary).
 */
import { formFind } from "../force-density";
import type { CableModel, Vec3 } from "../model";
import type { Face } from "../surface-loads";

export interface SaddleNetInput {
  spanM: number;
  spacingM: number;
  /** Rise of the edge above (and sag below) its centre, f, m. */
  riseM: number;
  /** Cable prestress at the spacing, N, and axial stiffness EA, N. */
  prestressN: number;
  eaN: number;
}

export interface NetModel {
  model: CableModel;
  /** The roof surface triangulated over the net's nodes (normals upwards), for surface loads. */
  faces: Face[];
  /** Indices of the free (loaded) nodes. */
  free: number[];
}

export function saddleNet(input: SaddleNetInput): NetModel {
  const { spanM, spacingM, riseM, prestressN, eaN } = input;
  const n = Math.round(spanM / spacingM) + 1;
  if (!(n >= 3 && Math.abs((n - 1) * spacingM - spanM) < 1e-9 * spanM)) throw new RangeError(`invalid spacingM: ${spacingM} (expected a whole fraction of the span ${spanM} m, at most half of it)`);
  if (!(prestressN > 0 && eaN > 0)) throw new RangeError(`invalid prestressN or eaN: ${prestressN}, ${eaN} (expected both > 0)`);
  const half = spanM / 2;
  const id = (i: number, j: number) => i * n + j;
  const edge = (k: number) => k === 0 || k === n - 1;
  const nodes: Vec3[] = [];
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      const [u, v] = [-half + i * spacingM, -half + j * spacingM];
      nodes.push([u, v, (riseM * (u * u - v * v)) / (half * half)]);
    }
  }
  const fixed = nodes.map((_, k) => k).filter((k) => edge(Math.floor(k / n)) || edge(k % n));
  const branches: [number, number][] = [];
  const faces: Face[] = [];
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      if (i < n - 1 && !edge(j)) branches.push([id(i, j), id(i + 1, j)]);
      if (j < n - 1 && !edge(i)) branches.push([id(i, j), id(i, j + 1)]);
      if (i < n - 1 && j < n - 1) faces.push([id(i, j), id(i + 1, j), id(i + 1, j + 1)], [id(i, j), id(i + 1, j + 1), id(i, j + 1)]);
    }
  }
  const found = formFind({ nodes, branches, forceDensityNPerM: prestressN / spacingM, fixed });
  const isFixed = new Set(fixed);
  return {
    model: {
      nodes: found.nodes,
      members: branches.map(([i, j], k) => ({ i, j, eaN, kind: "cable", initialForceN: found.forcesN[k]! })),
      supports: fixed.map((node) => ({ node, fixed: [true, true, true] })),
      loads: [],
    },
    faces,
    free: nodes.map((_, k) => k).filter((k) => !isFixed.has(k)),
  };
}
