/** Midspan bending moment, end shear and midspan deflection of a simply supported beam. */
export interface BeamResponse {
  /** Largest bending moment M = wL²/8, N·m. */
  momentNm: number;
  /** End shear V = wL/2, N. */
  shearN: number;
  /** Midspan deflection δ = 5wL⁴/(384EI), m. */
  deflectionM: number;
}

/**
 * Simply supported beam under a uniform load: M = wL²/8, V = wL/2, δ = 5wL⁴/(384EI)
 * (elementary beam theory; e.g. Roark's Formulas for Stress and Strain, Table 8.1 case 2e;
 * from memory). Validity: linear elastic, small deflections, shear deformation ignored.
 * @param loadNPerM w, N/m; @param spanM L, m; @param bendingStiffnessNm2 EI, N·m²
 * @example simplySupportedUdl(10e3, 8, 1e8) // M = 80 kN·m, V = 40 kN, δ = 5.33 mm
 */
export function simplySupportedUdl(loadNPerM: number, spanM: number, bendingStiffnessNm2: number): BeamResponse {
  const momentNm = simplySupportedMomentNm(loadNPerM, spanM);
  if (!(bendingStiffnessNm2 > 0)) throw new RangeError(`invalid bending stiffness: ${bendingStiffnessNm2} N·m² (expected > 0)`);
  return {
    momentNm,
    shearN: (loadNPerM * spanM) / 2,
    deflectionM: (5 * loadNPerM * spanM ** 4) / (384 * bendingStiffnessNm2),
  };
}

/**
 * The midspan moment alone of a simply supported beam under a uniform load, M = wL²/8 (as
 * simplySupportedUdl, whose moment it is): for a sizing that asks for the moment many times and
 * never for the deflection.
 * @param loadNPerM w, N/m; @param spanM L, m
 * @example simplySupportedMomentNm(10e3, 8) // 80 kN·m
 */
export function simplySupportedMomentNm(loadNPerM: number, spanM: number): number {
  if (!Number.isFinite(loadNPerM)) throw new RangeError(`invalid load: ${loadNPerM} N/m (expected a finite number)`);
  if (!(spanM > 0)) throw new RangeError(`invalid span: ${spanM} m (expected > 0)`);
  return (loadNPerM * spanM * spanM) / 8;
}
