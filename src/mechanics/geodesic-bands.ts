import { CapTooSmallError, CUT_TOLERANCE, geodesicSphere, type GeodesicSphere } from "./geodesic";
import { addToBand, emptyBands, finishedBands, type LatticeBand } from "./lattice-bands";

/** Frequencies remembered: a timber search at 300 m cuts caps of about 40 frequencies (22–83). */
const SPHERE_CACHE_SIZE = 64;
/** A sphere is built to the next multiple of this angle above the cap asked for (π/8: at most eight sizes; strictly above, so a cap on a multiple is within it). */
const SPHERE_ANGLE_STEP_RAD = Math.PI / 8;
const spheres = new Map<number, GeodesicSphere>();

/**
 * The unit sphere of frequency v, remembered for the last frequencies used (shared: read only): built
 * to the next multiple of π/8 above the cap angle, and again larger when a larger cap is asked for
 * (a shallow cap of a fine mesh would otherwise pay for a hemisphere).
 */
function sphereOf(frequency: number, capAngleRad: number): GeodesicSphere {
  let sphere = spheres.get(frequency);
  if (!sphere || sphere.upToRad < capAngleRad) sphere = geodesicSphere(frequency, Math.min(Math.PI, (Math.floor(capAngleRad / SPHERE_ANGLE_STEP_RAD) + 1) * SPHERE_ANGLE_STEP_RAD));
  spheres.delete(frequency); // last used last
  if (spheres.size >= SPHERE_CACHE_SIZE) spheres.delete(spheres.keys().next().value as number);
  spheres.set(frequency, sphere);
  return sphere;
}

/**
 * What every cut of a sphere reads, worked out once per sphere: each triangle's lowest corner and its
 * three edges (numbered over the whole sphere), and each edge's two nodes, length on the unit sphere
 * and midpoint angle from the crown. A cut is then a pass over the triangles that reach the cap, and
 * a band is found for each edge without a square root or an arctangent (those were two thirds of a
 * cut: a timber search at 160 m cuts about 60 caps).
 */
interface EdgeTable {
  /** Per triangle: z of its lowest corner; its edges (a, b), (b, c), (c, a) as sphere edge ids. */
  lowestZ: Float64Array;
  triangleEdges: Int32Array;
  /** Per sphere edge: its nodes (as first met), unit length, midpoint angle from the crown (rad). */
  p: Int32Array;
  q: Int32Array;
  unitLength: Float64Array;
  midAngleRad: Float64Array;
}
const tables = new WeakMap<GeodesicSphere, EdgeTable>();

/** The sphere edges numbered in first use, each found in its lower node's six slots (as edgesOf finds them). */
interface EdgeNumbering {
  slotHi: Int32Array;
  slotEdge: Int32Array;
  p: Int32Array;
  q: Int32Array;
  count: number;
}

/** The id of edge (a, b), numbered now when first met. */
function edgeId(n: EdgeNumbering, a: number, b: number): number {
  const lo = a < b ? a : b;
  const hi = a < b ? b : a;
  for (let slot = lo * 6; slot < lo * 6 + 6; slot++) {
    if (n.slotHi[slot] === hi) return n.slotEdge[slot]!;
    if (n.slotHi[slot] === -1) {
      n.slotHi[slot] = hi;
      n.slotEdge[slot] = n.count;
      n.p[n.count] = a;
      n.q[n.count] = b;
      return n.count++;
    }
  }
  throw new Error(`geodesic node ${lo} has more than six neighbours`);
}

function edgeTableOf(s: GeodesicSphere): EdgeTable {
  const known = tables.get(s);
  if (known) return known;
  const { unit, faces } = s;
  const triangles = faces.length / 3;
  const nodes = unit.length / 3;
  const lowestZ = new Float64Array(triangles);
  const triangleEdges = new Int32Array(faces.length);
  // at most one new edge per corner of a triangle
  const numbering: EdgeNumbering = { slotHi: new Int32Array(nodes * 6).fill(-1), slotEdge: new Int32Array(nodes * 6), p: new Int32Array(faces.length), q: new Int32Array(faces.length), count: 0 };
  for (let t = 0; t < triangles; t++) {
    const a = faces[3 * t]!;
    const b = faces[3 * t + 1]!;
    const c = faces[3 * t + 2]!;
    lowestZ[t] = Math.min(unit[3 * a + 2]!, unit[3 * b + 2]!, unit[3 * c + 2]!);
    triangleEdges[3 * t] = edgeId(numbering, a, b);
    triangleEdges[3 * t + 1] = edgeId(numbering, b, c);
    triangleEdges[3 * t + 2] = edgeId(numbering, c, a);
  }
  const p = numbering.p.slice(0, numbering.count);
  const q = numbering.q.slice(0, numbering.count);
  const unitLength = new Float64Array(p.length);
  const midAngleRad = new Float64Array(p.length);
  for (let e = 0; e < p.length; e++) {
    const i = 3 * p[e]!;
    const j = 3 * q[e]!;
    const dx = unit[i]! - unit[j]!;
    const dy = unit[i + 1]! - unit[j + 1]!;
    const dz = unit[i + 2]! - unit[j + 2]!;
    unitLength[e] = Math.sqrt(dx * dx + dy * dy + dz * dz);
    const sx = unit[i]! + unit[j]!;
    const sy = unit[i + 1]! + unit[j + 1]!;
    midAngleRad[e] = Math.atan2(Math.hypot(sx, sy), unit[i + 2]! + unit[j + 2]!);
  }
  const table = { lowestZ, triangleEdges, p, q, unitLength, midAngleRad };
  tables.set(s, table);
  return table;
}

/** Scratch arrays marked by generation, so that a cut need not clear them. */
interface Scratch {
  generation: number;
  /** Per sphere edge: the generation it was met in, and how many kept triangles use it. */
  edgeSeen: Int32Array;
  faceUse: Int32Array;
  /** Per node: the generation in which it was found in the cap, and on the ring. */
  nodeSeen: Int32Array;
  ringSeen: Int32Array;
  /** The cut's edges in the order geodesicCap numbers them (reused: no array grown per cut). */
  order: Int32Array;
}
const scratch: Scratch = { generation: 0, edgeSeen: new Int32Array(0), faceUse: new Int32Array(0), nodeSeen: new Int32Array(0), ringSeen: new Int32Array(0), order: new Int32Array(0) };

function nextGeneration(nodeCount: number, edgeCount: number): number {
  if (scratch.ringSeen.length < nodeCount || scratch.edgeSeen.length < edgeCount) {
    scratch.ringSeen = new Int32Array(Math.max(nodeCount, scratch.ringSeen.length));
    scratch.nodeSeen = new Int32Array(scratch.ringSeen.length);
    scratch.edgeSeen = new Int32Array(Math.max(edgeCount, scratch.edgeSeen.length));
    scratch.faceUse = new Int32Array(scratch.edgeSeen.length);
    scratch.order = new Int32Array(scratch.edgeSeen.length);
    scratch.generation = 0;
  }
  return ++scratch.generation;
}

/**
 * The sphere edges of the kept triangles in the order geodesicCap numbers them (first use, face by
 * face) into scratch.order, and how many edges and triangles were kept; scratch.faceUse holds how
 * many kept faces use each edge.
 */
function cutEdges(s: GeodesicSphere, table: EdgeTable, zCut: number, capAngleRad: number, generation: number): { edgeCount: number; faceCount: number } {
  let edgeCount = 0;
  let faceCount = 0;
  const lowest = zCut - CUT_TOLERANCE;
  for (let f = 0; f < 20; f++) {
    if (capAngleRad < s.reachRad[f]!) continue;
    for (let t = s.faceStart[f]!; t < s.faceStart[f + 1]!; t++) {
      if (!(table.lowestZ[t]! >= lowest)) continue;
      faceCount++;
      for (let k = 3 * t; k < 3 * t + 3; k++) {
        const e = table.triangleEdges[k]!;
        if (scratch.edgeSeen[e] !== generation) {
          scratch.edgeSeen[e] = generation;
          scratch.faceUse[e] = 1;
          scratch.order[edgeCount++] = e;
        } else scratch.faceUse[e] = scratch.faceUse[e]! + 1;
      }
    }
  }
  return { edgeCount, faceCount };
}

/** Marks the nodes of the cap and those on its ring (the ends of edges used by one kept face); how many nodes the cap has. */
function markNodes(table: EdgeTable, edgeCount: number, generation: number): number {
  let nodeCount = 0;
  const mark = (n: number): void => {
    if (scratch.nodeSeen[n] === generation) return;
    scratch.nodeSeen[n] = generation;
    nodeCount++;
  };
  for (let i = 0; i < edgeCount; i++) {
    const e = scratch.order[i]!;
    mark(table.p[e]!);
    mark(table.q[e]!);
    if (scratch.faceUse[e] === 1) scratch.ringSeen[table.p[e]!] = scratch.ringSeen[table.q[e]!] = generation;
  }
  return nodeCount;
}

/** What geodesicCapCut gives: the bands, and the counts of the cap that the bands leave out. */
export interface GeodesicCapCut {
  /** latticeBands of the cap. */
  bands: LatticeBand[];
  /** The cap's nodes and triangular faces. */
  nodeCount: number;
  faceCount: number;
  /** The edges on the boundary ring (in no band), and their total length, m. */
  ringEdgeCount: number;
  ringLengthM: number;
}

/**
 * latticeBands(geodesicCap(frequency, radiusM, capAngleRad), bandCount) without building the cap,
 * with the cap's node and face counts and its ring edges: the cap is cut from the unit sphere of
 * that frequency (remembered per frequency), its edges are numbered as geodesicCap numbers them, the
 * ring nodes are moved onto the cut circle as there, and only the bands' counts, lengths and edge
 * indices are made. The same bands to the last digits or so (a node shared by two icosahedron faces
 * takes its coordinates from the first face of the whole sphere, not of the cap); tested against
 * latticeBands and the counts on built caps.
 * @throws CapTooSmallError when not one triangle fits within the cap, as geodesicCap does
 */
export function geodesicCapCut(frequency: number, radiusM: number, capAngleRad: number, bandCount: number): GeodesicCapCut {
  if (!(radiusM > 0)) throw new RangeError(`invalid sphere radius: ${radiusM} m (expected > 0)`);
  if (!(capAngleRad > 0 && capAngleRad <= Math.PI)) throw new RangeError(`invalid cap angle: ${capAngleRad} rad (expected 0 < φ0 ≤ π)`);
  const s = sphereOf(frequency, capAngleRad);
  const { unit } = s;
  const table = edgeTableOf(s);
  const zCut = Math.cos(capAngleRad);
  const generation = nextGeneration(unit.length / 3, table.p.length);
  const { edgeCount, faceCount } = cutEdges(s, table, zCut, capAngleRad, generation);
  if (edgeCount === 0) throw new CapTooSmallError(`invalid cap: no whole triangle of frequency ${frequency} fits within φ0 = ${capAngleRad.toFixed(4)} rad (expected a larger cap or a higher frequency)`);
  const nodeCount = markNodes(table, edgeCount, generation);
  const onRing = (n: number) => scratch.ringSeen[n] === generation;
  const ringRadius = Math.sqrt(Math.max(0, 1 - zCut * zCut));
  // a node on the unit sphere, ring nodes moved along their meridian onto the cut circle (ringOntoCut)
  const moved = new Float64Array(6);
  const place = (n: number, slot: number): void => {
    const x = unit[3 * n]!;
    const y = unit[3 * n + 1]!;
    const r = onRing(n) ? Math.hypot(x, y) : 0;
    moved[slot] = r > 0 ? (x / r) * ringRadius : x;
    moved[slot + 1] = r > 0 ? (y / r) * ringRadius : y;
    moved[slot + 2] = r > 0 ? zCut : unit[3 * n + 2]!;
  };
  const bands = emptyBands(capAngleRad, bandCount);
  let ringEdgeCount = 0;
  let ringLengthM = 0;
  for (let index = 0; index < edgeCount; index++) {
    const e = scratch.order[index]!;
    const a = table.p[e]!;
    const b = table.q[e]!;
    if (!(onRing(a) || onRing(b))) {
      // the midpoint's angle from the crown: the same on the unit sphere as on the nodes in metres
      addToBand(bands[Math.min(bandCount - 1, Math.floor((table.midAngleRad[e]! / capAngleRad) * bandCount))]!, index, table.unitLength[e]! * radiusM);
      continue;
    }
    place(a, 0);
    place(b, 3);
    const [dx, dy, dz] = [moved[0]! - moved[3]!, moved[1]! - moved[4]!, moved[2]! - moved[5]!];
    const lengthM = Math.sqrt(dx * dx + dy * dy + dz * dz) * radiusM;
    if (scratch.faceUse[e] !== 1) addToBand(bands[bandCount]!, index, lengthM);
    else {
      ringEdgeCount++;
      ringLengthM += lengthM;
    }
  }
  return { bands: finishedBands(bands), nodeCount, faceCount, ringEdgeCount, ringLengthM };
}

/** The bands of geodesicCapCut alone: latticeBands of the cap without building it. */
export function geodesicCapBands(frequency: number, radiusM: number, capAngleRad: number, bandCount: number): LatticeBand[] {
  return geodesicCapCut(frequency, radiusM, capAngleRad, bandCount).bands;
}
