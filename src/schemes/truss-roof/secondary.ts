import type { ChsSection } from "../../catalogue/types";
import type { ChsChoice } from "../../catalogue/pick-chs";
import type { BucklingCurve } from "../../mechanics/flexural-buckling";
import { STEEL_E_PA } from "../../mechanics/flexural-buckling";
import { STEEL_DENSITY_KG_PER_M3 } from "../../catalogue/chs";
import { simplySupportedUdl } from "../../mechanics/beam";
import { pickChs } from "../kit";

/** Yield strength of cold-formed purlin steel S350GD (EN 10346), Pa. */
export const PURLIN_YIELD_PA = 350e6;
/** Reduction for effective section and lateral-torsional buckling of a cold-formed purlin (common practice 0.6–0.8, no source). */
export const PURLIN_REDUCTION = 0.7;
/** Purlin depth as span / 35 (common practice, no source). */
export const PURLIN_SPAN_DEPTH = 35;

export interface PurlinResult {
  /** Mass per m of purlin, kg/m. */
  massKgPerM: number;
  /** Required elastic modulus, m³. */
  modulusM3: number;
  depthM: number;
  momentNm: number;
  /** Moment resistance of the section chosen, 0.7 f_y W, N·m. */
  momentResistanceNm: number;
  /** What set W: the bending strength, or the deflection limit (then bending is below its resistance). */
  governedBy: "bending" | "deflection";
  deflectionM: number;
}

/**
 * A cold-formed Z or C purlin, simply supported over the truss spacing: M = wL²/8, required
 * W = M/(0.7 f_y) and, for the deflection limit L/200 under SLS variable load, I ≥ 5wL⁴/(384E·L/200).
 * Section from W: depth h = L/35 and area A = 3W/h (a thin-walled section with a quarter of its area
 * in each flange: W ≈ A h/3, elementary section geometry) and I = W h/2.
 */
export function sizePurlin(spanM: number, ulsNPerM: number, slsNPerM: number): PurlinResult {
  const depthM = spanM / PURLIN_SPAN_DEPTH;
  const { momentNm } = simplySupportedUdl(ulsNPerM, spanM, 1);
  const strengthW = momentNm / (PURLIN_REDUCTION * PURLIN_YIELD_PA);
  const neededI = (5 * slsNPerM * spanM ** 4) / (384 * STEEL_E_PA * (spanM / 200));
  const modulusM3 = Math.max(strengthW, (2 * neededI) / depthM);
  const areaM2 = (3 * modulusM3) / depthM;
  const deflectionM = (5 * slsNPerM * spanM ** 4) / (384 * STEEL_E_PA * ((modulusM3 * depthM) / 2));
  return { massKgPerM: areaM2 * STEEL_DENSITY_KG_PER_M3, modulusM3, depthM, momentNm, momentResistanceNm: PURLIN_REDUCTION * PURLIN_YIELD_PA * modulusM3, governedBy: modulusM3 > strengthW ? "deflection" : "bending", deflectionM };
}

/** The lightest CHS whose plastic moment resistance W_pl f_y/γ_M0 (EN 1993-1-1 eq. 6.13, class 1–2) carries M. */
export function pickChsForMoment(sections: readonly ChsSection[], momentNm: number, yieldPa: number): ChsSection | null {
  return sections.find((s) => s.plasticModulusM3 * yieldPa >= momentNm) ?? null;
}

/** A CHS column or strut for axial load only, pinned at both ends. */
export function pickColumn(sections: readonly ChsSection[], forceN: number, lengthM: number, steel: { yieldPa: number; curve: BucklingCurve }): ChsChoice | null {
  return pickChs(sections, [{ forceN: -Math.abs(forceN), effectiveLengthM: lengthM }], steel);
}

/**
 * Design load on a roof bracing system from the members it restrains, EN 1993-1-1 §5.3.3(2):
 * q_d = Σ N_Ed · 8(e0 + δq)/L², e0 = α_m L/500, α_m = √(0.5(1 + 1/m)); δq taken as 0 (first order).
 * @param compressionN N_Ed, the largest chord compression of one restrained member, N
 * @param members m, the number of members restrained
 */
export function bracingRestraintLoadNPerM(compressionN: number, spanM: number, members: number): number {
  const alphaM = Math.sqrt(0.5 * (1 + 1 / members));
  const e0 = (alphaM * spanM) / 500;
  return (members * Math.abs(compressionN) * 8 * e0) / (spanM * spanM);
}
