/**
 * Geodesic subdivision of the icosahedron, class I (alternate breakdown), projected radially onto a
 * sphere, and cut to a spherical cap. Method: Kenner, Geodesic Math and How to Use It (1976), ch. 5
 * ("method 1": subdivide each flat face into v² triangles, push every point out to the sphere).
 * The icosahedron stands on a vertex (a vertex at the crown), so a cap is centred on a five-way node.
 */
export type Vec3 = readonly [number, number, number];

/** A geodesic cap: nodes, struts and triangular faces, on a sphere of radius R, z up from the centre. */
export interface GeodesicCap {
  /** Frequency v (subdivisions per icosahedron edge). */
  frequency: number;
  /** Sphere radius R, m. */
  radiusM: number;
  /** Half-angle of the cap φ0 from the crown, rad (π for the whole sphere). */
  capAngleRad: number;
  /** Height of the cut plane above the sphere centre, R cos φ0, m. */
  cutHeightM: number;
  /** Node coordinates, m; boundary nodes moved onto the cut circle. */
  nodes: Vec3[];
  /** Struts as pairs of node indices (every edge of the kept faces, boundary edges included). */
  edges: [number, number][];
  /** Triangles as node index triples. */
  faces: [number, number, number][];
  /** Nodes of the boundary ring in azimuth order (empty for the whole sphere). */
  ringNodes: number[];
  /** For each edge, true when it lies on the boundary ring. */
  edgeOnRing: boolean[];
  /** Chord length of each edge, m. */
  edgeLengthsM: number[];
}

const ICOSA_VERTICES: Vec3[] = (() => {
  const z = 1 / Math.sqrt(5);
  const r = 2 / Math.sqrt(5);
  const v: Vec3[] = [[0, 0, 1]];
  for (let k = 0; k < 5; k++) v.push([r * Math.cos((2 * Math.PI * k) / 5), r * Math.sin((2 * Math.PI * k) / 5), z]);
  for (let k = 0; k < 5; k++) v.push([r * Math.cos((2 * Math.PI * k) / 5 + Math.PI / 5), r * Math.sin((2 * Math.PI * k) / 5 + Math.PI / 5), -z]);
  v.push([0, 0, -1]);
  return v;
})();

/** The 20 faces: 5 round the crown, 10 in the middle belt, 5 round the foot. */
const ICOSA_FACES: [number, number, number][] = (() => {
  const f: [number, number, number][] = [];
  for (let k = 0; k < 5; k++) {
    const u = 1 + k;
    const u1 = 1 + ((k + 1) % 5);
    const l = 6 + k;
    const l1 = 6 + ((k + 1) % 5);
    f.push([0, u, u1], [u, l, u1], [l, l1, u1], [11, l1, l]);
  }
  return f;
})();

/** Radius of the sphere inscribed in the unit icosahedron (touching its face centres), ≈ 0.7947. */
const INSCRIBED_RADIUS = Math.sqrt((5 + 2 * Math.sqrt(5)) / 15);

/** Angular radius of an icosahedron face about its centroid, rad (≈ 37.38°). */
const FACE_ANGULAR_RADIUS = (() => {
  const [a, b, c] = [ICOSA_VERTICES[0]!, ICOSA_VERTICES[1]!, ICOSA_VERTICES[2]!];
  const m = normalise([(a[0] + b[0] + c[0]) / 3, (a[1] + b[1] + c[1]) / 3, (a[2] + b[2] + c[2]) / 3]);
  return Math.acos(m[0] * a[0] + m[1] * a[1] + m[2] * a[2]);
})();

/** Key of the point `steps` along icosahedron edge p–q (counted from p), the same from either face. */
function sharedEdgeKey(p: number, q: number, steps: number, v: number): number {
  return p < q ? 12 + (p * 12 + q) * (v + 1) + steps : 12 + (q * 12 + p) * (v + 1) + (v - steps);
}

function normalise(p: Vec3): Vec3 {
  const n = Math.hypot(p[0], p[1], p[2]);
  return [p[0] / n, p[1] / n, p[2] / n];
}

/** Raised when not one sub-triangle of the given frequency fits inside the cap (the mesh is too coarse). */
export class CapTooSmallError extends RangeError {
  constructor(message: string) {
    super(message);
    this.name = "CapTooSmallError";
  }
}

/**
 * A list of numbers in a typed array, doubled when full: pushing onto a plain array was most of a
 * fine sphere's build (about 100 ns a value here, against 15 ns written to a typed array).
 */
class FlatList<T extends Int32Array | Float64Array> {
  length = 0;
  constructor(
    private data: T,
    private readonly make: (size: number) => T,
  ) {}
  push(value: number): void {
    if (this.length === this.data.length) {
      const grown = this.make(2 * this.data.length);
      grown.set(this.data);
      this.data = grown;
    }
    this.data[this.length++] = value;
  }
  /** The values pushed, in an array of their own. */
  values(): T {
    return this.data.slice(0, this.length) as T;
  }
}

/** The working grid of one icosahedron face's subdivision, reused face after face, and what it builds. */
interface Grid {
  v: number;
  zCut: number;
  /** Local index of grid point (i, j) is rowStart[i] + j. */
  rowStart: number[];
  lx: Float64Array;
  ly: Float64Array;
  lz: Float64Array;
  localNode: Int32Array;
  keep: Uint8Array;
  used: Uint8Array;
  /** x, y, z of each node on the unit sphere. */
  unit: FlatList<Float64Array>;
  /** Nodes shared between icosahedron faces, by key. */
  keyToNode: Map<number, number>;
  /** Triangles as node index triples, flat (no array per triangle: a fine sphere has 10⁵ of them). */
  faces: FlatList<Int32Array>;
  /** Index (in triangles) of the first triangle of each icosahedron face (20 + 1 entries; a face skipped or with none kept starts where the next does). */
  faceStart: number[];
}

const TOLERANCE = 1e-9;

function newGrid(v: number, zCut: number): Grid {
  const localCount = ((v + 1) * (v + 2)) / 2;
  const rowStart: number[] = [];
  for (let i = 0, s = 0; i <= v; i++) {
    rowStart.push(s);
    s += v + 1 - i;
  }
  const floats = () => new Float64Array(localCount);
  const bytes = () => new Uint8Array(localCount);
  return { v, zCut, rowStart, lx: floats(), ly: floats(), lz: floats(), localNode: new Int32Array(localCount), keep: bytes(), used: bytes(), unit: new FlatList(new Float64Array(3 * localCount), (n) => new Float64Array(n)), keyToNode: new Map(), faces: new FlatList(new Int32Array(3 * v * v), (n) => new Int32Array(n)), faceStart: [] };
}

/** Grid point (i, j) = A + (B − A) i/v + (C − A) j/v, pushed out to the sphere; kept when on or above the cut. */
function projectFace(g: Grid, A: Vec3, B: Vec3, C: Vec3): void {
  const { v, zCut, rowStart, keep } = g;
  for (let i = 0; i <= v; i++) {
    const s = i / v;
    for (let j = 0; i + j <= v; j++) {
      const t = j / v;
      const x = A[0] + (B[0] - A[0]) * s + (C[0] - A[0]) * t;
      const y = A[1] + (B[1] - A[1]) * s + (C[1] - A[1]) * t;
      const z = A[2] + (B[2] - A[2]) * s + (C[2] - A[2]) * t;
      const k = rowStart[i]! + j;
      g.used[k] = 0;
      // A flat-face point lies at least the inscribed radius from the centre, so z/|p| ≤ z/r_in:
      // points that cannot reach the cut are dropped before the square root.
      if (zCut > 0 && z < INSCRIBED_RADIUS * (zCut - TOLERANCE)) {
        keep[k] = 0;
        continue;
      }
      const n = Math.sqrt(x * x + y * y + z * z);
      g.lx[k] = x / n;
      g.ly[k] = y / n;
      g.lz[k] = z / n;
      keep[k] = z / n >= zCut - TOLERANCE ? 1 : 0;
    }
  }
}

/**
 * Visits the sub-triangles with all three corners kept: "up" (i,j)(i+1,j)(i,j+1) and "down"
 * (i+1,j)(i+1,j+1)(i,j+1), as local indices; true when there was one.
 */
function keptTriangles(g: Grid, visit: (a: number, b: number, c: number) => void): boolean {
  const { v, rowStart, keep } = g;
  let any = false;
  for (let i = 0; i < v; i++) {
    const r0 = rowStart[i]!;
    const r1 = rowStart[i + 1]!;
    for (let j = 0; i + j < v; j++) {
      if (keep[r0 + j] && keep[r1 + j] && keep[r0 + j + 1]) {
        visit(r0 + j, r1 + j, r0 + j + 1);
        any = true;
      }
      if (i + j < v - 1 && keep[r1 + j] && keep[r1 + j + 1] && keep[r0 + j + 1]) {
        visit(r1 + j, r1 + j + 1, r0 + j + 1);
        any = true;
      }
    }
  }
  return any;
}

/**
 * Numbers the used points of a face; points on the face's edges and corners are shared with the
 * neighbouring face, so they are keyed by icosahedron edge and step.
 */
function numberNodes(g: Grid, ia: number, ib: number, ic: number): void {
  const { v, rowStart, unit, keyToNode } = g;
  for (let i = 0; i <= v; i++) {
    for (let j = 0; i + j <= v; j++) {
      const k = rowStart[i]! + j;
      if (!g.used[k]) continue;
      let key = -1;
      if (i === 0 && j === 0) key = ia;
      else if (i === v) key = ib;
      else if (j === v) key = ic;
      else if (j === 0) key = sharedEdgeKey(ia, ib, i, v);
      else if (i === 0) key = sharedEdgeKey(ia, ic, j, v);
      else if (i + j === v) key = sharedEdgeKey(ib, ic, j, v);
      let index = key >= 0 ? keyToNode.get(key) : undefined;
      if (index === undefined) {
        index = unit.length / 3;
        unit.push(g.lx[k]!);
        unit.push(g.ly[k]!);
        unit.push(g.lz[k]!);
        if (key >= 0) keyToNode.set(key, index);
      }
      g.localNode[k] = index;
    }
  }
}

/** Subdivides the icosahedron faces that can reach the cap and keeps the triangles inside it. */
function subdivideCap(v: number, zCut: number, capAngleRad: number): Grid {
  const g = newGrid(v, zCut);
  for (const [ia, ib, ic] of ICOSA_FACES) {
    g.faceStart.push(g.faces.length / 3);
    const A = ICOSA_VERTICES[ia]!;
    const B = ICOSA_VERTICES[ib]!;
    const C = ICOSA_VERTICES[ic]!;
    const centre = normalise([A[0] + B[0] + C[0], A[1] + B[1] + C[1], A[2] + B[2] + C[2]]);
    if (Math.acos(Math.max(-1, Math.min(1, centre[2]))) > capAngleRad + FACE_ANGULAR_RADIUS + 1e-9) continue;
    projectFace(g, A, B, C);
    const anyKept = keptTriangles(g, (a, b, c) => (g.used[a] = g.used[b] = g.used[c] = 1));
    if (!anyKept) continue;
    numberNodes(g, ia, ib, ic);
    const n = g.localNode;
    const f = g.faces;
    keptTriangles(g, (a, b, c) => {
      f.push(n[a]!);
      f.push(n[b]!);
      f.push(n[c]!);
    });
  }
  g.faceStart.push(g.faces.length / 3);
  return g;
}

/**
 * Edges of the faces, each once, with the number of faces using it. A node has at most six
 * neighbours, so each edge is found by scanning its lower node's six slots.
 */
function edgesOf(faces: readonly [number, number, number][], nodeCount: number): { edges: [number, number][]; faceUse: number[] } {
  const slots = new Int32Array(nodeCount * 6).fill(-1);
  const slotEdge = new Int32Array(nodeCount * 6);
  const edges: [number, number][] = [];
  const faceUse: number[] = [];
  const addEdge = (p: number, q: number): void => {
    const lo = p < q ? p : q;
    const hi = p < q ? q : p;
    for (let s = lo * 6; s < lo * 6 + 6; s++) {
      const other = slots[s]!;
      if (other === hi) {
        const e = slotEdge[s]!;
        faceUse[e] = faceUse[e]! + 1;
        return;
      }
      if (other === -1) {
        slots[s] = hi;
        slotEdge[s] = edges.length;
        edges.push([lo, hi]);
        faceUse.push(1);
        return;
      }
    }
    throw new Error(`geodesic node ${lo} has more than six neighbours`);
  };
  for (const [a, b, c] of faces) {
    addEdge(a, b);
    addEdge(b, c);
    addEdge(c, a);
  }
  return { edges, faceUse };
}

/** Moves the nodes of the ring edges along their meridian onto the cut circle; the ring nodes in azimuth order. */
function ringOntoCut(unit: Float64Array, edges: readonly [number, number][], edgeOnRing: readonly boolean[], zCut: number): number[] {
  const nodeCount = unit.length / 3;
  const onRing = new Uint8Array(nodeCount);
  for (let e = 0; e < edges.length; e++) {
    if (edgeOnRing[e]) {
      onRing[edges[e]![0]] = 1;
      onRing[edges[e]![1]] = 1;
    }
  }
  const ringRadius = Math.sqrt(Math.max(0, 1 - zCut * zCut));
  const ring: { node: number; azimuth: number }[] = [];
  for (let n = 0; n < nodeCount; n++) {
    if (!onRing[n]) continue;
    const r = Math.hypot(unit[3 * n]!, unit[3 * n + 1]!);
    if (r > 0) {
      unit[3 * n] = (unit[3 * n]! / r) * ringRadius;
      unit[3 * n + 1] = (unit[3 * n + 1]! / r) * ringRadius;
      unit[3 * n + 2] = zCut;
    }
    ring.push({ node: n, azimuth: Math.atan2(unit[3 * n + 1]!, unit[3 * n]!) });
  }
  return ring.sort((p, q) => p.azimuth - q.azimuth).map((r) => r.node);
}

/**
 * Class I geodesic sphere (capAngle = π) or cap of half-angle φ0: keeps the sub-triangles whose three
 * corners lie on or above the cut plane z = R cos φ0, with their edges and nodes; the nodes on the
 * boundary of the kept faces form the ring and are moved along their meridian onto the cut circle
 * (so the ring is plane and the cap has the intended rise; struts next to the ring lengthen).
 * Only icosahedron faces that can reach the cap are subdivided, so a shallow cap costs little.
 * @param frequency v ≥ 1 (integer)
 * @param radiusM sphere radius R, m
 * @param capAngleRad φ0, 0 < φ0 ≤ π
 * @throws when v is not a whole number 1–400, R ≤ 0 or φ0 outside (0, π], or when not one
 *   sub-triangle fits inside the cap (CapTooSmallError)
 */
export function geodesicCap(frequency: number, radiusM: number, capAngleRad: number): GeodesicCap {
  if (!(Number.isInteger(frequency) && frequency >= 1 && frequency <= 400)) throw new RangeError(`invalid geodesic frequency: ${frequency} (expected a whole number 1–400)`);
  if (!(radiusM > 0)) throw new RangeError(`invalid sphere radius: ${radiusM} m (expected > 0)`);
  if (!(capAngleRad > 0 && capAngleRad <= Math.PI)) throw new RangeError(`invalid cap angle: ${capAngleRad} rad (expected 0 < φ0 ≤ π)`);
  const v = frequency;
  const zCut = Math.cos(capAngleRad);
  const grid = subdivideCap(v, zCut, capAngleRad);
  const unit = grid.unit.values();
  const flat = grid.faces.values();
  if (flat.length === 0) {
    throw new CapTooSmallError(`invalid cap: no whole triangle of frequency ${v} fits within φ0 = ${capAngleRad.toFixed(4)} rad (expected a larger cap or a higher frequency)`);
  }
  const nodeCount = unit.length / 3;
  const faces = Array.from({ length: flat.length / 3 }, (_, t) => [flat[3 * t]!, flat[3 * t + 1]!, flat[3 * t + 2]!] as [number, number, number]);
  const { edges, faceUse } = edgesOf(faces, nodeCount);
  const edgeOnRing = faceUse.map((n) => n === 1);
  const ringNodes = ringOntoCut(unit, edges, edgeOnRing, zCut);
  const nodes: Vec3[] = new Array<Vec3>(nodeCount);
  for (let n = 0; n < nodeCount; n++) nodes[n] = [unit[3 * n]! * radiusM, unit[3 * n + 1]! * radiusM, unit[3 * n + 2]! * radiusM];
  const edgeLengthsM = new Array<number>(edges.length);
  for (let e = 0; e < edges.length; e++) {
    const p = 3 * edges[e]![0];
    const q = 3 * edges[e]![1];
    const dx = unit[p]! - unit[q]!;
    const dy = unit[p + 1]! - unit[q + 1]!;
    const dz = unit[p + 2]! - unit[q + 2]!;
    edgeLengthsM[e] = Math.sqrt(dx * dx + dy * dy + dz * dz) * radiusM;
  }
  return { frequency: v, radiusM, capAngleRad, cutHeightM: zCut * radiusM, nodes, edges, faces, ringNodes, edgeOnRing, edgeLengthsM };
}

/**
 * The whole class I geodesic sphere of frequency v on the unit sphere, in the order geodesicCap
 * builds a cap's parts: triangles icosahedron face by face, and for each icosahedron face the
 * largest angle from the crown at which it can still reach a cap (the cut of geodesicCap keeps
 * exactly the triangles with three corners on or above the plane, so a cap is this sphere cut).
 */
export interface GeodesicSphere {
  frequency: number;
  /** The part built: every triangle that reaches within this angle of the crown, rad (π: the whole sphere). */
  upToRad: number;
  /** x, y, z of each node on the unit sphere. */
  unit: Float64Array;
  /** Triangles as node index triples, flat. */
  faces: Int32Array;
  /** Index (in triangles) of the first triangle of each icosahedron face; 21 entries. */
  faceStart: number[];
  /** A cap of half-angle φ0 reaches icosahedron face f only when φ0 ≥ reachRad[f] (the test geodesicCap skips faces by). */
  reachRad: number[];
}

/**
 * The unit geodesic sphere of frequency v (1–400), for cutting caps from (geodesic-bands.ts): the
 * triangles with three corners within upToRad of the crown (π: the whole sphere), so every cap of
 * half-angle up to upToRad is a cut of it.
 */
export function geodesicSphere(frequency: number, upToRad = Math.PI): GeodesicSphere {
  if (!(Number.isInteger(frequency) && frequency >= 1 && frequency <= 400)) throw new RangeError(`invalid geodesic frequency: ${frequency} (expected a whole number 1–400)`);
  if (!(upToRad > 0 && upToRad <= Math.PI)) throw new RangeError(`invalid angle: ${upToRad} rad (expected 0 < angle ≤ π)`);
  const g = subdivideCap(frequency, upToRad === Math.PI ? -1 : Math.cos(upToRad), upToRad);
  const reachRad = ICOSA_FACES.map(([ia, ib, ic]) => {
    const [A, B, C] = [ICOSA_VERTICES[ia]!, ICOSA_VERTICES[ib]!, ICOSA_VERTICES[ic]!];
    const centre = normalise([A[0] + B[0] + C[0], A[1] + B[1] + C[1], A[2] + B[2] + C[2]]);
    return Math.acos(Math.max(-1, Math.min(1, centre[2]))) - FACE_ANGULAR_RADIUS - 1e-9;
  });
  return { frequency, upToRad, unit: g.unit.values(), faces: g.faces.values(), faceStart: g.faceStart, reachRad };
}

/** Tolerance of the cut: a node is kept when z ≥ cos φ0 − this. */
export const CUT_TOLERANCE = TOLERANCE;

/** Strut length statistics, m. */
export interface StrutLengths {
  minM: number;
  meanM: number;
  maxM: number;
  totalM: number;
  count: number;
}

/** Minimum, mean, maximum and total of a set of strut lengths (all struts when no filter is given). */
export function strutLengths(lengthsM: readonly number[], include?: (index: number) => boolean): StrutLengths {
  let min = Number.POSITIVE_INFINITY;
  let max = 0;
  let total = 0;
  let count = 0;
  lengthsM.forEach((length, i) => {
    if (include && !include(i)) return;
    min = Math.min(min, length);
    max = Math.max(max, length);
    total += length;
    count++;
  });
  if (count === 0) throw new RangeError("strut lengths require at least one strut");
  return { minM: min, meanM: total / count, maxM: max, totalM: total, count };
}

/**
 * Mean chord of a class I icosahedral subdivision divided by R/v. A flat equilateral net of the
 * sphere's area gives √(16π/(20√3)) = 1.2046; the projected net measures slightly less
 * (measured on the full sphere: 1.165 at v = 2, 1.193 at v = 4, 1.199–1.203 for v = 6…40; see
 * test/reference/geodesic.test.ts). On a cap, the struts next to the ring are stretched by moving
 * the ring nodes onto the cut circle, so a cap's mean runs a few per cent above the target.
 */
export const MEAN_CHORD_FACTOR = 1.2;

/**
 * The frequency whose mean strut length is nearest a target: v = round(1.2 R / L), at least 1.
 * @param radiusM sphere radius R, m; @param targetStrutLengthM L, m
 */
export function geodesicFrequencyFor(radiusM: number, targetStrutLengthM: number): number {
  if (!(radiusM > 0)) throw new RangeError(`invalid sphere radius: ${radiusM} m (expected > 0)`);
  if (!(targetStrutLengthM > 0)) throw new RangeError(`invalid target strut length: ${targetStrutLengthM} m (expected > 0)`);
  return Math.max(1, Math.round((MEAN_CHORD_FACTOR * radiusM) / targetStrutLengthM));
}
