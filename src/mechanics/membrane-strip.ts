/**
 * Membrane force in a strip of fabric spanning s between parallel supports (cables) with sag f
 * under a uniform pressure p: n = p s²/(8f), per unit width — the parabolic cable formula applied to
 * a unit strip (Irvine, Cable Structures 1981, ch. 1; used for fabric panels in preliminary design).
 * Valid for shallow panels, f/s ≤ 1/8; the curvature across the strip is ignored (safe-sided).
 * @param pressurePa p, Pa (≥ 0; give the magnitude for uplift)
 * @param spanM s, clear span between the supporting cables, m (> 0)
 * @param sagM f, sag of the strip, m (0 < f ≤ s/2)
 * @returns membrane force, N/m
 * @example membraneStripForceNPerM(1000, 10, 1) // 12500
 */
export function membraneStripForceNPerM(pressurePa: number, spanM: number, sagM: number): number {
  if (!(pressurePa >= 0 && Number.isFinite(pressurePa))) throw new RangeError(`invalid membrane pressure: ${pressurePa} Pa (expected ≥ 0)`);
  if (!(spanM > 0 && Number.isFinite(spanM))) throw new RangeError(`invalid membrane span: ${spanM} m (expected > 0)`);
  if (!(sagM > 0 && sagM <= spanM / 2)) throw new RangeError(`invalid membrane sag: ${sagM} m (expected 0 < sag ≤ span/2 = ${spanM / 2})`);
  return (pressurePa * spanM * spanM) / (8 * sagM);
}
