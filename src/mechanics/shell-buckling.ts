/**
 * Coefficient of the classical buckling pressure of a complete sphere, 2/√(3(1 − ν²)):
 * 1.2105 for ν = 0.3 (Zoelly 1915, van der Neut 1932; Timoshenko & Gere, Theory of Elastic
 * Stability, §11.9).
 * @throws when ν is not in [0, 0.5)
 */
export function zoellyCoefficient(poissonRatio: number): number {
  if (!(poissonRatio >= 0 && poissonRatio < 0.5)) throw new RangeError(`invalid poisson ratio: ${poissonRatio} (expected 0 ≤ ν < 0.5)`);
  return 2 / Math.sqrt(3 * (1 - poissonRatio * poissonRatio));
}

/**
 * Classical (linear, perfect) buckling pressure of a thin spherical shell under uniform external
 * pressure, p_cl = 2E t² / (R² √(3(1 − ν²))) (Zoelly–van der Neut; Timoshenko & Gere §11.9).
 * Validity: thin shell (R/t ≳ 20), elastic; the real shell buckles at a fraction of this
 * (imperfection sensitivity), so a design takes k·p_cl with a knock-down factor k.
 * @param modulusPa E, Pa; @param thicknessM t, m; @param radiusM R, m
 * @example zoellyPressurePa(210e9, 0.01, 10, 0.3) // 254.2e3
 */
export function zoellyPressurePa(modulusPa: number, thicknessM: number, radiusM: number, poissonRatio: number): number {
  if (!(modulusPa > 0)) throw new RangeError(`invalid elastic modulus: ${modulusPa} Pa (expected > 0)`);
  if (!(thicknessM > 0)) throw new RangeError(`invalid shell thickness: ${thicknessM} m (expected > 0)`);
  if (!(radiusM > thicknessM)) throw new RangeError(`invalid sphere radius: ${radiusM} m (expected > thickness ${thicknessM} m)`);
  return (zoellyCoefficient(poissonRatio) * modulusPa * thicknessM * thicknessM) / (radiusM * radiusM);
}

/**
 * Classical buckling pressure of a shell described by its membrane stiffness B (= E·t for a
 * solid shell, N/m) and flexural rigidity D (= E t³/(12(1 − ν²)), N·m): p_cl = 4√(D·B)/R².
 * With the solid-shell B and D it is exactly the Zoelly formula; with the equivalent stiffness of
 * a bar grid (threeWayGridStiffness) it is the equivalent-continuum estimate for lattice shells
 * (the approach of Wright 1965 and Kollár & Dulácska, Buckling of Shells for Engineers; from memory).
 * Validity: bar length small against the buckle wavelength (many bars per buckle).
 */
export function continuumShellPressurePa(bendingStiffnessNm: number, membraneStiffnessNPerM: number, radiusM: number): number {
  if (!(bendingStiffnessNm > 0 && membraneStiffnessNPerM > 0)) {
    throw new RangeError(`invalid shell stiffness: D = ${bendingStiffnessNm} N·m, B = ${membraneStiffnessNPerM} N/m (expected both > 0)`);
  }
  if (!(radiusM > 0)) throw new RangeError(`invalid sphere radius: ${radiusM} m (expected > 0)`);
  return (4 * Math.sqrt(bendingStiffnessNm * membraneStiffnessNPerM)) / (radiusM * radiusM);
}

/**
 * The thickness at which a spherical shell's knocked-down classical buckling pressure k·p_cl equals
 * a design pressure: the Zoelly formula p = k·2E t²/(R² √(3(1 − ν²))) solved for t,
 * t = R √(p / (k · 2/√(3(1 − ν²)) · E)) (Zoelly–van der Neut; Timoshenko & Gere §11.9).
 * @param pressurePa design pressure p, Pa (≥ 0)
 * @param knockDown k, the fraction of p_cl the real shell reaches (0 < k ≤ 1)
 * @example zoellyThicknessM(254.2e3, 210e9, 10, 0.3) // ≈ 0.01 (the inverse of the zoellyPressurePa example)
 */
export function zoellyThicknessM(pressurePa: number, modulusPa: number, radiusM: number, poissonRatio: number, knockDown = 1): number {
  if (!(pressurePa >= 0)) throw new RangeError(`invalid pressure: ${pressurePa} Pa (expected ≥ 0)`);
  if (!(modulusPa > 0)) throw new RangeError(`invalid elastic modulus: ${modulusPa} Pa (expected > 0)`);
  if (!(knockDown > 0 && knockDown <= 1)) throw new RangeError(`invalid knock-down: ${knockDown} (expected 0 < k ≤ 1)`);
  return radiusM * Math.sqrt(pressurePa / (knockDown * zoellyCoefficient(poissonRatio) * modulusPa));
}
