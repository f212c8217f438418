/** Concrete strength classes of EN 1992-1-1 Table 3.1 offered here (f_ck cylinder, MPa). */
export const CONCRETE_CLASSES = {
  "C25/30": 25,
  "C30/37": 30,
  "C35/45": 35,
  "C40/50": 40,
  "C45/55": 45,
  "C50/60": 50,
} as const;
export type ConcreteClass = keyof typeof CONCRETE_CLASSES;

/** Density of normal-weight reinforced concrete, kg/m³ (EN 1991-1-1 Table A.1: 25 kN/m³). */
export const REINFORCED_CONCRETE_DENSITY_KG_PER_M3 = 2500;
/** Density of normal-weight plain concrete, kg/m³ (EN 1991-1-1 Table A.1: 24 kN/m³): take-off masses where the reinforcement is counted apart, and dead-weight anchors. */
export const PLAIN_CONCRETE_DENSITY_KG_PER_M3 = 2400;

export interface ConcreteProperties {
  /** Characteristic cylinder strength f_ck, Pa. */
  fckPa: number;
  /** Mean compressive strength f_cm = f_ck + 8 MPa, Pa. */
  fcmPa: number;
  /** Mean axial tensile strength f_ctm = 0.30 f_ck^(2/3) (≤ C50/60), Pa. */
  fctmPa: number;
  /** Secant modulus E_cm = 22 (f_cm/10)^0.3 GPa, Pa. */
  ecmPa: number;
}

/**
 * Concrete properties from EN 1992-1-1 Table 3.1 formulas (classes up to C50/60).
 * @example concreteProperties("C30/37").ecmPa // 32.84e9 (Table 3.1 lists 33 GPa)
 */
export function concreteProperties(strengthClass: ConcreteClass): ConcreteProperties {
  const fck = CONCRETE_CLASSES[strengthClass];
  if (fck === undefined) throw new RangeError(`invalid concrete class: ${String(strengthClass)} (expected one of ${Object.keys(CONCRETE_CLASSES).join(", ")})`);
  const fcm = fck + 8;
  return {
    fckPa: fck * 1e6,
    fcmPa: fcm * 1e6,
    fctmPa: 0.3 * Math.pow(fck, 2 / 3) * 1e6,
    ecmPa: 22 * Math.pow(fcm / 10, 0.3) * 1e9,
  };
}

/**
 * Design compressive strength f_cd = α_cc f_ck / γ_C, EN 1992-1-1 eq. 3.15
 * (recommended α_cc = 1.0, γ_C = 1.5 from §2.4.2.4).
 */
export function concreteDesignStrengthPa(fckPa: number, alphaCc = 1.0, gammaC = 1.5): number {
  return (alphaCc * fckPa) / gammaC;
}

/** Design yield strength of reinforcement f_yd = f_yk / γ_S, EN 1992-1-1 §3.2.7 (γ_S = 1.15). */
export function rebarDesignStrengthPa(fykPa = 500e6, gammaS = 1.15): number {
  return fykPa / gammaS;
}

/**
 * Minimum longitudinal reinforcement ratio A_s,min/(b_t d) of EN 1992-1-1 eq. 9.1N:
 * max(0.26 f_ctm/f_yk, 0.0013).
 * @example minimumReinforcementRatio(2.9e6) // 0.001508 (C30/37, f_yk 500 MPa)
 */
export function minimumReinforcementRatio(fctmPa: number, fykPa = 500e6): number {
  return Math.max((0.26 * fctmPa) / fykPa, 0.0013);
}
