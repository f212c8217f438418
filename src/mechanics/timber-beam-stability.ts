/**
 * Effective length ÷ span for lateral-torsional buckling of a simply supported beam under a
 * uniformly distributed load, EN 1995-1-1 Table 6.1 (loaded at its centre of gravity; the table's
 * note allows 0.5h less for a load at the tension edge, not taken here: the safe side).
 */
export const LTB_LENGTH_RATIO_UDL = 0.9;

/** k_cr, the crack factor on a member's width for shear, EN 1995-1-1:2004+A1:2008 §6.1.7(2) (solid timber and glulam). */
export const SHEAR_CRACK_FACTOR = 0.67;

/**
 * Critical bending stress of a solid rectangular softwood section, EN 1995-1-1 §6.3.3 eq. 6.32:
 * σ_m,crit = 0.78 b² E_0,05 / (h ℓ_ef).
 * @param widthM b (> 0), m; @param depthM h (> 0), m
 * @param effectiveLengthM ℓ_ef (> 0), m; @param modulus5PctPa E_0,05 (> 0), Pa
 * @throws RangeError naming the argument out of range
 * @example timberCriticalBendingStressPa(0.14, 0.6, 9, 9.6e9) // 27.18e6
 */
export function timberCriticalBendingStressPa(widthM: number, depthM: number, effectiveLengthM: number, modulus5PctPa: number): number {
  positive("width", widthM, "m");
  positive("depth", depthM, "m");
  positive("effective length", effectiveLengthM, "m");
  positive("E_0,05", modulus5PctPa, "Pa");
  return (0.78 * widthM * widthM * modulus5PctPa) / (depthM * effectiveLengthM);
}

/**
 * Lateral-torsional instability factor of a timber beam, EN 1995-1-1 §6.3.3 eqs 6.30 and 6.34:
 * λ_rel,m = √(f_m,k/σ_m,crit); k_crit = 1 for λ_rel,m ≤ 0.75, 1.56 − 0.75 λ_rel,m up to 1.4,
 * 1/λ_rel,m² beyond.
 * @param bendingStrengthPa f_m,k (> 0), Pa; @param criticalStressPa σ_m,crit (> 0), Pa
 * @throws RangeError naming the argument out of range
 * @example timberLateralTorsionalFactor(24e6, 27.18e6) // λ_rel,m 0.940 → 0.855
 */
export function timberLateralTorsionalFactor(bendingStrengthPa: number, criticalStressPa: number): number {
  positive("bending strength", bendingStrengthPa, "Pa");
  positive("critical bending stress", criticalStressPa, "Pa");
  const slenderness = Math.sqrt(bendingStrengthPa / criticalStressPa);
  if (slenderness <= 0.75) return 1;
  if (slenderness <= 1.4) return 1.56 - 0.75 * slenderness;
  return 1 / (slenderness * slenderness);
}

/**
 * Shear utilisation of a solid rectangular section, EN 1995-1-1 §6.1.7 eq. 6.13 with the
 * effective width k_cr·b (eq. 6.13a): τ_d = 1.5 V_d / (k_cr b h) against f_v,d.
 * @param shearN V_d (≥ 0), N; @param widthM b, m; @param depthM h, m; @param shearStrengthPa f_v,d (> 0), Pa
 * @throws RangeError naming the argument out of range
 * @example timberShearUtilisation(60e3, 0.14, 0.6, 2.52e6) // τ_d 1.60 MPa → 0.634
 */
export function timberShearUtilisation(shearN: number, widthM: number, depthM: number, shearStrengthPa: number): number {
  if (!(shearN >= 0)) throw new RangeError(`invalid shear force: ${shearN} N (expected ≥ 0)`);
  positive("width", widthM, "m");
  positive("depth", depthM, "m");
  positive("shear strength", shearStrengthPa, "Pa");
  return (1.5 * shearN) / (SHEAR_CRACK_FACTOR * widthM * depthM) / shearStrengthPa;
}

function positive(name: string, value: number, unit: string): void {
  if (!(value > 0)) throw new RangeError(`invalid ${name}: ${value} ${unit} (expected > 0)`);
}
