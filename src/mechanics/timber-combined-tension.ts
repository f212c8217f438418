/**
 * Utilisation of a timber member in tension with bending, EN 1995-1-1 §6.2.3 eqs 6.17/6.18, the
 * larger of σ_t,0,d/f_t,0,d + σ_m,y,d/f_m,y,d + k_m σ_m,z,d/f_m,z,d and
 * σ_t,0,d/f_t,0,d + k_m σ_m,y,d/f_m,y,d + σ_m,z,d/f_m,z,d (≤ 1 passes). With no axial force it is
 * the bending check of §6.1.6 (eqs 6.11/6.12).
 * @param tensionPa σ_t,0,d (≥ 0), Pa; @param tensionStrengthPa f_t,0,d (> 0), Pa
 * @param bendingYPa σ_m,y,d (≥ 0), Pa; @param bendingStrengthPa f_m,d (> 0), Pa, both axes
 * @param bendingZPa σ_m,z,d (≥ 0, default 0), Pa; @param km k_m (0.7 rectangular sections, §6.1.6(2))
 * @throws RangeError naming the argument out of range
 * @example timberTensionBendingUtilisation(6e6, 12e6, 4e6, 16e6) // 0.75
 */
export function timberTensionBendingUtilisation(tensionPa: number, tensionStrengthPa: number, bendingYPa: number, bendingStrengthPa: number, bendingZPa = 0, km = 0.7): number {
  // checked one by one, not by a loop over a new array: the section search calls this some hundred thousand times a search
  nonNegativeStress("tension", tensionPa);
  nonNegativeStress("bending y", bendingYPa);
  nonNegativeStress("bending z", bendingZPa);
  if (!(tensionStrengthPa > 0)) throw new RangeError(`invalid tension strength: ${tensionStrengthPa} Pa (expected > 0)`);
  if (!(bendingStrengthPa > 0)) throw new RangeError(`invalid bending strength: ${bendingStrengthPa} Pa (expected > 0)`);
  if (!(km > 0 && km <= 1)) throw new RangeError(`invalid km: ${km} (expected 0 < k_m ≤ 1)`);
  const t = tensionPa / tensionStrengthPa;
  const my = bendingYPa / bendingStrengthPa;
  const mz = bendingZPa / bendingStrengthPa;
  return Math.max(t + my + km * mz, t + km * my + mz);
}

function nonNegativeStress(name: string, value: number): void {
  if (!(value >= 0)) throw new RangeError(`invalid ${name} stress: ${value} Pa (expected ≥ 0)`);
}
