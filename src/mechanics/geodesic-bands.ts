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

/** Scratch arrays marked by generation, so that a cut need not clear them. */
interface Scratch {
  generation: number;
  /** Per slot (six per node): the generation it was filled in, its edge's far node and local index. */
  edgeSeen: Int32Array;
  edgeHi: Int32Array;
  edgeIndex: Int32Array;
  /** Per node: the generation in which it was found on the ring. */
  ringSeen: Int32Array;
}
const scratch: Scratch = { generation: 0, edgeSeen: new Int32Array(0), edgeHi: new Int32Array(0), edgeIndex: new Int32Array(0), ringSeen: new Int32Array(0) };

function nextGeneration(nodeCount: number): number {
  if (scratch.ringSeen.length < nodeCount) {
    scratch.ringSeen = new Int32Array(nodeCount);
    scratch.edgeSeen = new Int32Array(nodeCount * 6);
    scratch.edgeHi = new Int32Array(nodeCount * 6);
    scratch.edgeIndex = new Int32Array(nodeCount * 6);
    scratch.generation = 0;
  }
  return ++scratch.generation;
}

/** The edges of the kept triangles in the order geodesicCap numbers them (first use, face by face), each with how many kept faces use it. */
function cutEdges(s: GeodesicSphere, zCut: number, capAngleRad: number, generation: number): { p: number[]; q: number[]; faceUse: number[] } {
  const { unit, faces } = s;
  const p: number[] = [];
  const q: number[] = [];
  const faceUse: number[] = [];
  const kept = (n: number) => unit[3 * n + 2]! >= zCut - CUT_TOLERANCE;
  // an edge is found in its lower node's six slots of the sphere, as edgesOf does
  const add = (a: number, b: number): void => {
    const lo = a < b ? a : b;
    const hi = a < b ? b : a;
    for (let slot = lo * 6; slot < lo * 6 + 6; slot++) {
      if (scratch.edgeSeen[slot] !== generation) {
        scratch.edgeSeen[slot] = generation;
        scratch.edgeHi[slot] = hi;
        scratch.edgeIndex[slot] = p.length;
        p.push(a);
        q.push(b);
        faceUse.push(1);
        return;
      }
      if (scratch.edgeHi[slot] === hi) {
        const e = scratch.edgeIndex[slot]!;
        faceUse[e] = faceUse[e]! + 1;
        return;
      }
    }
    throw new Error(`geodesic node ${lo} has more than six neighbours`);
  };
  for (let f = 0; f < 20; f++) {
    if (capAngleRad < s.reachRad[f]!) continue;
    for (let t = s.faceStart[f]!; t < s.faceStart[f + 1]!; t++) {
      const [a, b, c] = [faces[3 * t]!, faces[3 * t + 1]!, faces[3 * t + 2]!];
      if (!(kept(a) && kept(b) && kept(c))) continue;
      add(a, b);
      add(b, c);
      add(c, a);
    }
  }
  return { p, q, faceUse };
}

/**
 * latticeBands(geodesicCap(frequency, radiusM, capAngleRad), bandCount) without building the cap:
 * the cap is cut from the unit sphere of that frequency (remembered per frequency), its edges are
 * numbered as geodesicCap numbers them, the ring nodes are moved onto the cut circle as there, and
 * only the bands' counts, lengths and edge indices are made. The same bands to the last digits or
 * so (a node shared by two icosahedron faces takes its coordinates from the first face of the whole
 * sphere, not of the cap); tested against latticeBands on built caps.
 * @throws CapTooSmallError when not one triangle fits within the cap, as geodesicCap does
 */
export function geodesicCapBands(frequency: number, radiusM: number, capAngleRad: number, bandCount: number): LatticeBand[] {
  if (!(radiusM > 0)) throw new RangeError(`invalid sphere radius: ${radiusM} m (expected > 0)`);
  if (!(capAngleRad > 0 && capAngleRad <= Math.PI)) throw new RangeError(`invalid cap angle: ${capAngleRad} rad (expected 0 < φ0 ≤ π)`);
  const s = sphereOf(frequency, capAngleRad);
  const { unit } = s;
  const zCut = Math.cos(capAngleRad);
  const generation = nextGeneration(unit.length / 3);
  const { p, q, faceUse } = cutEdges(s, zCut, capAngleRad, generation);
  if (p.length === 0) throw new CapTooSmallError(`invalid cap: no whole triangle of frequency ${frequency} fits within φ0 = ${capAngleRad.toFixed(4)} rad (expected a larger cap or a higher frequency)`);
  for (let e = 0; e < p.length; e++) if (faceUse[e] === 1) scratch.ringSeen[p[e]!] = scratch.ringSeen[q[e]!] = generation;
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
  for (let e = 0; e < p.length; e++) {
    if (faceUse[e] === 1) continue;
    place(p[e]!, 0);
    place(q[e]!, 3);
    const [ax, ay, az, bx, by, bz] = moved as unknown as [number, number, number, number, number, number];
    let at = bandCount;
    if (!(onRing(p[e]!) || onRing(q[e]!))) {
      // the midpoint's angle from the crown, on the nodes in metres as latticeBands reads them
      const angle = Math.atan2(Math.hypot(ax * radiusM + bx * radiusM, ay * radiusM + by * radiusM), az * radiusM + bz * radiusM);
      at = Math.min(bandCount - 1, Math.floor((angle / capAngleRad) * bandCount));
    }
    const [dx, dy, dz] = [ax - bx, ay - by, az - bz];
    addToBand(bands[at]!, e, Math.sqrt(dx * dx + dy * dy + dz * dz) * radiusM);
  }
  return finishedBands(bands);
}
