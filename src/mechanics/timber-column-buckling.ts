/** Imperfection factor β_c for glued laminated timber and LVL, EN 1995-1-1 eq. 6.29 (solid timber 0.2). */
export const GLULAM_BETA_C = 0.1;

/**
 * Relative slenderness of a timber column, EN 1995-1-1 §6.3.2 eqs 6.21/6.22:
 * λ_rel,c = (λ/π) √(f_c,0,k / E_0,05), with λ = L_ef / i.
 * @param slenderness λ = L_ef/i, – (≥ 0)
 * @param compressionStrengthPa f_c,0,k, Pa (> 0)
 * @param modulus5PctPa E_0,05, the 5 % fractile of the modulus parallel to grain, Pa (> 0)
 * @throws RangeError naming the argument out of range
 * @example timberRelativeSlenderness(100, 24e6, 9.6e9) // 1.5915
 */
export function timberRelativeSlenderness(slenderness: number, compressionStrengthPa: number, modulus5PctPa: number): number {
  if (!(slenderness >= 0)) throw new RangeError(`invalid slenderness: ${slenderness} (expected ≥ 0)`);
  if (!(compressionStrengthPa > 0)) throw new RangeError(`invalid compression strength: ${compressionStrengthPa} Pa (expected > 0)`);
  if (!(modulus5PctPa > 0)) throw new RangeError(`invalid E_0,05: ${modulus5PctPa} Pa (expected > 0)`);
  return (slenderness / Math.PI) * Math.sqrt(compressionStrengthPa / modulus5PctPa);
}

/**
 * Instability factor k_c of a timber column, EN 1995-1-1 §6.3.2 eqs 6.25–6.28:
 * k = 0.5[1 + β_c(λ_rel − 0.3) + λ_rel²], k_c = 1/(k + √(k² − λ_rel²)); k_c = 1 for λ_rel ≤ 0.3
 * (§6.3.2(2): no buckling reduction).
 * @param relativeSlenderness λ_rel,c (≥ 0)
 * @param betaC β_c, 0.1 glulam (eq. 6.29; default), 0.2 solid timber
 * @throws RangeError for a negative slenderness or β_c outside 0 < β_c ≤ 0.5
 * @example timberBucklingFactor(1.0) // 0.7681 (glulam)
 */
export function timberBucklingFactor(relativeSlenderness: number, betaC = GLULAM_BETA_C): number {
  if (!(relativeSlenderness >= 0)) throw new RangeError(`invalid relative slenderness: ${relativeSlenderness} (expected ≥ 0)`);
  if (!(betaC > 0 && betaC <= 0.5)) throw new RangeError(`invalid beta_c: ${betaC} (expected 0 < β_c ≤ 0.5)`);
  if (relativeSlenderness <= 0.3) return 1;
  const k = 0.5 * (1 + betaC * (relativeSlenderness - 0.3) + relativeSlenderness * relativeSlenderness);
  return 1 / (k + Math.sqrt(k * k - relativeSlenderness * relativeSlenderness));
}
