/**
 * In-plane elastic buckling force of a circular ring in compression, optionally on an elastic radial
 * foundation (the radial stiffness of the cables that pull on it).
 *
 * Without foundation the classical result for a ring under uniform normal pressure is
 * q_cr = 3EI/R³, i.e. a ring force N_cr = q_cr·R = 3EI/R² (Timoshenko & Gere, Theory of Elastic
 * Stability, 2nd ed. 1961, ch. 7, ring under uniform external pressure, mode n = 2; section number from memory). With a radial foundation of modulus k (N/m per m of
 * ring) the inextensional mode n gives N_cr,n = (n² − 1)EI/R² + kR²/(n² − 1) (energy method, the
 * ring counterpart of Hetényi's beam on elastic foundation; Brush & Almroth, Buckling of Bars,
 * Plates and Shells 1975, ch. 4 — recalled, from memory), minimised over n = 2…n_max. Springs at
 * discrete cable points only restrain waves longer than twice their spacing, so n_max = spokes/2
 * and, separately, the ring may buckle between spokes as a pin-ended arc of length s = 2πR/spokes:
 * N_cr = π²EI/s² (a straight-strut approximation, safe-sided for short arcs).
 * @param bendingStiffnessNm2 EI about the axis normal to the ring's plane, N·m²
 * @param radiusM R, m
 * @param foundationNPerM2 k, radial stiffness per metre of ring, N/m² (0 for a bare ring)
 * @param spokes number of cable points around the ring (≥ 4)
 * @returns the lowest critical ring force, N, and the mode (0 = between spokes)
 * @example ringBucklingForceN(1e9, 50, 0, 24).forceN // 3e9/2500 = 1.2e6 (n = 2)
 */
export function ringBucklingForceN(bendingStiffnessNm2: number, radiusM: number, foundationNPerM2: number, spokes: number): { forceN: number; mode: number } {
  if (!(bendingStiffnessNm2 > 0)) throw new RangeError(`invalid ring stiffness EI: ${bendingStiffnessNm2} N·m² (expected > 0)`);
  if (!(radiusM > 0)) throw new RangeError(`invalid ring radius: ${radiusM} m (expected > 0)`);
  if (!(foundationNPerM2 >= 0)) throw new RangeError(`invalid ring foundation modulus: ${foundationNPerM2} N/m² (expected ≥ 0)`);
  if (!(Number.isInteger(spokes) && spokes >= 4)) throw new RangeError(`invalid number of spokes: ${spokes} (expected a whole number ≥ 4)`);
  const EI = bendingStiffnessNm2;
  const R = radiusM;
  let best = { forceN: Number.POSITIVE_INFINITY, mode: 2 };
  const nMax = Math.max(2, Math.floor(spokes / 2));
  for (let n = 2; n <= nMax; n++) {
    const m = n * n - 1;
    const force = (m * EI) / (R * R) + (foundationNPerM2 * R * R) / m;
    if (force < best.forceN) best = { forceN: force, mode: n };
  }
  if (foundationNPerM2 > 0) {
    const spacing = (2 * Math.PI * R) / spokes;
    const between = (Math.PI * Math.PI * EI) / (spacing * spacing);
    if (between < best.forceN) best = { forceN: between, mode: 0 };
  }
  return best;
}

/**
 * Ring force from N equal radial pulls F on a ring (regular polygon): N_ring = F/(2 sin(π/N)),
 * → F·N/(2π) for many pulls (elementary statics). Tension for outward pulls, compression for inward.
 */
export function ringForceFromPullsN(pullN: number, pulls: number): number {
  if (!(Number.isInteger(pulls) && pulls >= 3)) throw new RangeError(`invalid number of pulls: ${pulls} (expected a whole number ≥ 3)`);
  return pullN / (2 * Math.sin(Math.PI / pulls));
}
