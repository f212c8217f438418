/**
 * Distributed loads on a triangulated surface, lumped to its nodes (a third of each triangle's
 * resultant to each corner — the consistent lumping for a load constant over the triangle).
 */
export type Face = readonly [number, number, number];

/**
 * Nodal forces of a pressure p(x, y, z) (Pa, positive pushing against the face normal, i.e. the
 * normal (b − a) × (c − a) of each face a, b, c points to the side the pressure comes from), over the
 * geometry given (the current, deformed one when called inside an analysis). The pressure is taken
 * at each face's centroid; the force is −p·area·n̂.
 * @param coordinates flat x, y, z per node, m
 * @returns flat nodal forces, N
 */
export function pressureLoads(coordinates: Float64Array, faces: readonly Face[], pressurePa: (x: number, y: number, z: number) => number): Float64Array {
  const f = new Float64Array(coordinates.length);
  for (const face of faces) {
    const [a, b, c] = face.map((k) => 3 * k) as [number, number, number];
    const e1 = [coordinates[b]! - coordinates[a]!, coordinates[b + 1]! - coordinates[a + 1]!, coordinates[b + 2]! - coordinates[a + 2]!];
    const e2 = [coordinates[c]! - coordinates[a]!, coordinates[c + 1]! - coordinates[a + 1]!, coordinates[c + 2]! - coordinates[a + 2]!];
    // Half the cross product: the area vector (area × unit normal).
    const ax = 0.5 * (e1[1]! * e2[2]! - e1[2]! * e2[1]!);
    const ay = 0.5 * (e1[2]! * e2[0]! - e1[0]! * e2[2]!);
    const az = 0.5 * (e1[0]! * e2[1]! - e1[1]! * e2[0]!);
    const cx = (coordinates[a]! + coordinates[b]! + coordinates[c]!) / 3;
    const cy = (coordinates[a + 1]! + coordinates[b + 1]! + coordinates[c + 1]!) / 3;
    const cz = (coordinates[a + 2]! + coordinates[b + 2]! + coordinates[c + 2]!) / 3;
    const share = -pressurePa(cx, cy, cz) / 3;
    for (const k of [a, b, c]) {
      f[k]! += share * ax;
      f[k + 1]! += share * ay;
      f[k + 2]! += share * az;
    }
  }
  return f;
}

/**
 * Nodal forces of a vertical load s(x, y) per unit plan area (Pa, positive downwards — snow), over
 * each face's projected (plan) area, whichever way the face is numbered.
 */
export function planLoads(coordinates: Float64Array, faces: readonly Face[], loadPa: (x: number, y: number) => number): Float64Array {
  const f = new Float64Array(coordinates.length);
  for (const [p, q, r] of faces) {
    const a = 3 * p;
    const b = 3 * q;
    const c = 3 * r;
    const planArea = 0.5 * Math.abs((coordinates[b]! - coordinates[a]!) * (coordinates[c + 1]! - coordinates[a + 1]!) - (coordinates[b + 1]! - coordinates[a + 1]!) * (coordinates[c]! - coordinates[a]!));
    const cx = (coordinates[a]! + coordinates[b]! + coordinates[c]!) / 3;
    const cy = (coordinates[a + 1]! + coordinates[b + 1]! + coordinates[c + 1]!) / 3;
    const share = (loadPa(cx, cy) * planArea) / 3;
    for (const k of [a, b, c]) f[k + 2]! -= share;
  }
  return f;
}
