import type { GeodesicCap, StrutLengths } from "./geodesic";

/** Members of one band of a lattice cap, crown to edge (the ring edges are left out: the ring is sized apart). */
export interface LatticeBand {
  /** Position of the band, crown first; the edge band is numbered after the last angle band. */
  index: number;
  /** True for the band of the members that meet the ring (their lengths vary most: the ring nodes are moved onto the cut circle). */
  edge: boolean;
  /** Limits of meridional angle from the crown whose membrane forces the band is sized for, rad (the edge band takes those of the outermost angle band). */
  fromRad: number;
  toRad: number;
  count: number;
  totalLengthM: number;
  meanLengthM: number;
  minLengthM: number;
  maxLengthM: number;
  /** Indices of the cap's edges in the band. */
  edges: number[];
}

/** Meridional angle of an edge's midpoint from the crown, rad. */
export function edgeMidpointAngleRad(cap: GeodesicCap, e: number): number {
  const [p, q] = cap.edges[e]!;
  const a = cap.nodes[p]!;
  const b = cap.nodes[q]!;
  return Math.atan2(Math.hypot(a[0] + b[0], a[1] + b[1]), a[2] + b[2]);
}

/**
 * Groups the members of a geodesic cap (every edge not on the boundary ring) for sizing: `bandCount`
 * bands of equal meridional angle by the angle of the member's midpoint, crown to edge, and one
 * more band of the members that meet the ring, sized apart for the forces of the outermost band
 * (the ring nodes are moved onto the cut circle, so these lengths vary most: left in the outer band
 * they would set its buckling length and span for every member of it). Empty bands are dropped.
 */
export function latticeBands(cap: GeodesicCap, bandCount: number): LatticeBand[] {
  const phi0 = cap.capAngleRad;
  const ringNode = new Uint8Array(cap.nodes.length);
  for (const n of cap.ringNodes) ringNode[n] = 1;
  const bands = emptyBands(phi0, bandCount);
  cap.edges.forEach(([p, q], e) => {
    if (cap.edgeOnRing[e]) return;
    const at = ringNode[p] || ringNode[q] ? bandCount : Math.min(bandCount - 1, Math.floor((edgeMidpointAngleRad(cap, e) / phi0) * bandCount));
    addToBand(bands[at]!, e, cap.edgeLengthsM[e]!);
  });
  return finishedBands(bands);
}

/** `bandCount` empty bands of equal meridional angle over a cap of half-angle φ0, and the edge band after them (latticeBands). */
export function emptyBands(capAngleRad: number, bandCount: number): LatticeBand[] {
  if (!(Number.isInteger(bandCount) && bandCount >= 1)) throw new RangeError(`invalid bandCount: ${bandCount} (expected a whole number ≥ 1)`);
  return Array.from({ length: bandCount + 1 }, (_, i) => ({
    index: i,
    edge: i === bandCount,
    fromRad: (capAngleRad * Math.min(i, bandCount - 1)) / bandCount,
    toRad: (capAngleRad * Math.min(i + 1, bandCount)) / bandCount,
    count: 0,
    totalLengthM: 0,
    meanLengthM: 0,
    minLengthM: Number.POSITIVE_INFINITY,
    maxLengthM: 0,
    edges: [],
  }));
}

/** Adds edge e of the given length to a band. */
export function addToBand(band: LatticeBand, e: number, lengthM: number): void {
  band.count += 1;
  band.totalLengthM += lengthM;
  band.minLengthM = Math.min(band.minLengthM, lengthM);
  band.maxLengthM = Math.max(band.maxLengthM, lengthM);
  band.edges.push(e);
}

/** The bands with their mean lengths, empty ones dropped. */
export function finishedBands(bands: LatticeBand[]): LatticeBand[] {
  for (const b of bands) b.meanLengthM = b.count > 0 ? b.totalLengthM / b.count : 0;
  return bands.filter((b) => b.count > 0);
}

/** Length statistics of the members in the bands (each member not on the ring once), as strutLengths gives them over the cap's inner edges. */
export function bandStrutLengths(bands: readonly LatticeBand[]): StrutLengths {
  const count = bands.reduce((n, b) => n + b.count, 0);
  if (count === 0) throw new RangeError("strut lengths require at least one strut");
  const totalM = bands.reduce((sum, b) => sum + b.totalLengthM, 0);
  return { minM: Math.min(...bands.map((b) => b.minLengthM)), meanM: totalM / count, maxM: Math.max(...bands.map((b) => b.maxLengthM)), totalM, count };
}

/**
 * The position in `bands` of every edge of the cap: its band's, the ring edges with the band of the
 * members meeting the ring (the last band when there is none).
 */
export function bandOfEachEdge(cap: GeodesicCap, bands: readonly Pick<LatticeBand, "edge" | "edges">[]): number[] {
  const edgeBand = bands.findIndex((b) => b.edge);
  const of = new Array<number>(cap.edges.length).fill(edgeBand >= 0 ? edgeBand : bands.length - 1);
  bands.forEach((b, i) => {
    for (const e of b.edges) of[e] = i;
  });
  return of;
}
