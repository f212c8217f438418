import type { GeodesicCap } from "../../mechanics/geodesic";

/** Lattice members of one band of meridional angle, crown to edge (the edge ring is steel and left out). */
export interface MemberBand {
  index: number;
  /** Band limits as meridional angle from the crown, rad. */
  fromRad: number;
  toRad: number;
  count: number;
  totalLengthM: number;
  meanLengthM: number;
  maxLengthM: number;
}

/**
 * Sorts the timber members of a geodesic cap (every edge not on the boundary ring) into bands of
 * equal meridional angle by the angle of their midpoint, crown to edge; empty bands are dropped.
 */
export function memberBands(cap: GeodesicCap, bandCount: number): MemberBand[] {
  const width = cap.capAngleRad / bandCount;
  const bands: MemberBand[] = Array.from({ length: bandCount }, (_, index) => ({
    index,
    fromRad: index * width,
    toRad: (index + 1) * width,
    count: 0,
    totalLengthM: 0,
    meanLengthM: 0,
    maxLengthM: 0,
  }));
  cap.edges.forEach(([p, q], e) => {
    if (cap.edgeOnRing[e]) return;
    const [a, b] = [cap.nodes[p]!, cap.nodes[q]!];
    const angle = Math.atan2(Math.hypot(a[0] + b[0], a[1] + b[1]), a[2] + b[2]);
    const band = bands[Math.min(bandCount - 1, Math.floor(angle / width))]!;
    const lengthM = cap.edgeLengthsM[e]!;
    band.count += 1;
    band.totalLengthM += lengthM;
    band.maxLengthM = Math.max(band.maxLengthM, lengthM);
  });
  return bands.filter((b) => b.count > 0).map((b) => ({ ...b, meanLengthM: b.totalLengthM / b.count }));
}
