/** Stresses and design strengths of a member in compression and bending, Pa. */
export interface TimberCompressionBending {
  /** σ_c,0,d, design compressive stress parallel to grain (≥ 0), Pa. */
  compressionPa: number;
  /** f_c,0,d, Pa (> 0). */
  compressionStrengthPa: number;
  /** k_c,y and k_c,z, instability factors about each axis (0 < k_c ≤ 1). */
  kcY: number;
  kcZ: number;
  /** σ_m,y,d and σ_m,z,d, design bending stresses about each axis (≥ 0), Pa. */
  bendingYPa: number;
  bendingZPa: number;
  /** f_m,y,d and f_m,z,d, Pa (> 0). */
  bendingStrengthYPa: number;
  bendingStrengthZPa: number;
  /** k_m, 0.7 for rectangular timber sections, 1.0 for others (EN 1995-1-1 §6.1.6(2)); default 0.7. */
  km?: number;
}

/**
 * Utilisation of a timber member in compression with bending where it may buckle, EN 1995-1-1
 * §6.3.2(3) eqs 6.23 and 6.24, the larger of
 * σ_c,0,d/(k_c,y f_c,0,d) + σ_m,y,d/f_m,y,d + k_m σ_m,z,d/f_m,z,d and
 * σ_c,0,d/(k_c,z f_c,0,d) + k_m σ_m,y,d/f_m,y,d + σ_m,z,d/f_m,z,d (≤ 1 passes).
 * @throws RangeError naming the argument out of range
 * @example timberCompressionBendingUtilisation({ compressionPa: 8e6, compressionStrengthPa: 16e6, kcY: 0.8, kcZ: 0.5, bendingYPa: 4e6, bendingZPa: 0, bendingStrengthYPa: 16e6, bendingStrengthZPa: 16e6 }) // 1.175
 */
export function timberCompressionBendingUtilisation(m: TimberCompressionBending): number {
  const km = m.km ?? 0.7;
  // checked one by one, not by loops over new arrays: the section search calls this some hundred thousand times a search
  inRange("compressionPa", m.compressionPa, m.compressionPa >= 0, "Pa (expected ≥ 0)");
  inRange("bendingYPa", m.bendingYPa, m.bendingYPa >= 0, "Pa (expected ≥ 0)");
  inRange("bendingZPa", m.bendingZPa, m.bendingZPa >= 0, "Pa (expected ≥ 0)");
  inRange("compressionStrengthPa", m.compressionStrengthPa, m.compressionStrengthPa > 0, "Pa (expected > 0)");
  inRange("bendingStrengthYPa", m.bendingStrengthYPa, m.bendingStrengthYPa > 0, "Pa (expected > 0)");
  inRange("bendingStrengthZPa", m.bendingStrengthZPa, m.bendingStrengthZPa > 0, "Pa (expected > 0)");
  inRange("kcY", m.kcY, m.kcY > 0 && m.kcY <= 1, "(expected 0 < k_c ≤ 1)");
  inRange("kcZ", m.kcZ, m.kcZ > 0 && m.kcZ <= 1, "(expected 0 < k_c ≤ 1)");
  if (!(km > 0 && km <= 1)) throw new RangeError(`invalid km: ${km} (expected 0 < k_m ≤ 1)`);
  const my = m.bendingYPa / m.bendingStrengthYPa;
  const mz = m.bendingZPa / m.bendingStrengthZPa;
  const eq623 = m.compressionPa / (m.kcY * m.compressionStrengthPa) + my + km * mz;
  const eq624 = m.compressionPa / (m.kcZ * m.compressionStrengthPa) + km * my + mz;
  return Math.max(eq623, eq624);
}

function inRange(name: string, value: number, ok: boolean, expected: string): void {
  if (!ok) throw new RangeError(`invalid ${name}: ${value} ${expected}`);
}
