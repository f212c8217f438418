/** EN 1993-1-1 Table 6.1 imperfection factors α for buckling curves a0, a, b, c, d. */
export const IMPERFECTION_FACTOR = { a0: 0.13, a: 0.21, b: 0.34, c: 0.49, d: 0.76 } as const;
export type BucklingCurve = keyof typeof IMPERFECTION_FACTOR;

/** Steel elastic modulus E, Pa (EN 1993-1-1 §3.2.6). */
export const STEEL_E_PA = 210e9;

/**
 * Reduction factor χ for flexural buckling, EN 1993-1-1 eq. 6.49:
 * Φ = 0.5[1 + α(λ̄ − 0.2) + λ̄²], χ = 1 / (Φ + √(Φ² − λ̄²)) ≤ 1.
 * @param slenderness non-dimensional slenderness λ̄ ≥ 0
 * @example bucklingReduction(1.0, "b") // 0.5970
 */
export function bucklingReduction(slenderness: number, curve: BucklingCurve): number {
  if (!(slenderness >= 0)) throw new RangeError(`invalid slenderness: ${slenderness} (expected ≥ 0)`);
  const alpha = IMPERFECTION_FACTOR[curve];
  const phi = 0.5 * (1 + alpha * (slenderness - 0.2) + slenderness * slenderness);
  return Math.min(1, 1 / (phi + Math.sqrt(phi * phi - slenderness * slenderness)));
}

/**
 * Non-dimensional slenderness for class 1–3 sections, EN 1993-1-1 eq. 6.50:
 * λ̄ = (L_cr / i) / λ1, λ1 = π √(E / f_y).
 */
export function nonDimensionalSlenderness(effectiveLengthM: number, radiusOfGyrationM: number, yieldPa: number, modulusPa = STEEL_E_PA): number {
  const lambda1 = Math.PI * Math.sqrt(modulusPa / yieldPa);
  return effectiveLengthM / radiusOfGyrationM / lambda1;
}

/**
 * Design buckling resistance N_b,Rd = χ A f_y / γ_M1, EN 1993-1-1 eq. 6.47, N.
 * Hot-finished CHS: curve a for S235–S420 (EN 1993-1-1 Table 6.2), a0 for S460.
 */
export function bucklingResistanceN(
  areaM2: number,
  radiusOfGyrationM: number,
  effectiveLengthM: number,
  yieldPa: number,
  curve: BucklingCurve,
  gammaM1 = 1.0,
): number {
  const chi = bucklingReduction(nonDimensionalSlenderness(effectiveLengthM, radiusOfGyrationM, yieldPa), curve);
  return (chi * areaM2 * yieldPa) / gammaM1;
}

/** Design plastic tension resistance N_pl,Rd = A f_y / γ_M0, EN 1993-1-1 eq. 6.6, N. */
export function tensionResistanceN(areaM2: number, yieldPa: number, gammaM0 = 1.0): number {
  return (areaM2 * yieldPa) / gammaM0;
}
