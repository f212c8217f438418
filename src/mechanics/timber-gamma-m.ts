/**
 * Partial factors γ_M for material properties and resistances of timber, EN 1995-1-1 Table 2.3
 * (recommended values; a national annex may change them): fundamental combinations — solid timber
 * 1.3, glued laminated timber 1.25, LVL, plywood and OSB 1.2, connections 1.3; accidental
 * combinations (fire is in EN 1995-1-2: γ_M,fi = 1.0) 1.0.
 */
export const TIMBER_GAMMA_M = {
  solidTimber: 1.3,
  glulam: 1.25,
  lvl: 1.2,
  connections: 1.3,
  accidental: 1.0,
} as const;

/**
 * Design value of a strength property, EN 1995-1-1 eq. 2.14: X_d = k_mod · X_k / γ_M.
 * @param characteristicPa X_k, Pa (> 0); @param kMod k_mod (0 < k_mod ≤ 1.1); @param gammaM γ_M (≥ 1)
 * @throws RangeError naming the argument out of range
 * @example timberDesignStrengthPa(24e6, 0.9, 1.25) // 17.28e6
 */
export function timberDesignStrengthPa(characteristicPa: number, kMod: number, gammaM: number): number {
  if (!(characteristicPa > 0)) throw new RangeError(`invalid characteristic strength: ${characteristicPa} Pa (expected > 0)`);
  if (!(kMod > 0 && kMod <= 1.1)) throw new RangeError(`invalid k_mod: ${kMod} (expected 0 < k_mod ≤ 1.1)`);
  if (!(gammaM >= 1)) throw new RangeError(`invalid gamma_M: ${gammaM} (expected ≥ 1)`);
  return (kMod * characteristicPa) / gammaM;
}
