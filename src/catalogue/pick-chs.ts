import type { ChsSection } from "./types";
import { bucklingResistanceN, tensionResistanceN, type BucklingCurve } from "../mechanics/flexural-buckling";

export interface ChsDemand {
  /** Design axial force, N: + tension, − compression. */
  forceN: number;
  /** Buckling length, m. */
  effectiveLengthM: number;
  /** Yield strength f_y, Pa. */
  yieldPa: number;
  /** Buckling curve (hot-finished CHS: "a", EN 1993-1-1 Table 6.2). */
  curve?: BucklingCurve;
  gammaM0?: number;
  gammaM1?: number;
  /** Largest allowed L/i for compression members (common practice 180, no source). */
  maxSlenderness?: number;
  /** Smallest section index to consider (for upsizing loops). */
  minMassKgPerM?: number;
}

export interface ChsChoice {
  section: ChsSection;
  resistanceN: number;
  utilisation: number;
  governing: string;
}

/**
 * The lightest circular hollow section (catalogue sorted by mass) whose resistance carries the
 * force: tension by EN 1993-1-1 eq. 6.6, compression by flexural buckling, eqs 6.47–6.50.
 * Returns null when no section in the catalogue suffices.
 */
export function pickLightestChs(sections: readonly ChsSection[], demand: ChsDemand): ChsChoice | null {
  const { forceN, effectiveLengthM, yieldPa, curve = "a", gammaM0 = 1.0, gammaM1 = 1.0, maxSlenderness = 180, minMassKgPerM = 0 } = demand;
  // No resistance exceeds A f_y / γ_M, so sections below that area need no check.
  const areaNeededM2 = (Math.abs(forceN) * Math.min(gammaM0, gammaM1)) / yieldPa;
  for (const section of sections) {
    if (section.massKgPerM < minMassKgPerM || section.areaM2 < areaNeededM2) continue;
    const choice = chsResistance(section, { forceN, effectiveLengthM, yieldPa, curve, gammaM0, gammaM1, maxSlenderness });
    if (choice !== null && choice.utilisation <= 1) return choice;
  }
  return null;
}

/**
 * Class of a tube in compression or bending, EN 1993-1-1 Table 5.2 (tubular sections): d/t ≤ 50ε²
 * class 1, ≤ 70ε² class 2, ≤ 90ε² class 3, else class 4, with ε² = 235 MPa / f_y (limits from
 * memory). The catalogue's d/t ≤ 51 are class 3 or better up to S355 (90ε² = 59.6) and partly
 * class 4 in S460 (46.0).
 */
export function tubeClass(section: ChsSection, yieldPa: number): 1 | 2 | 3 | 4 {
  const ratio = (section.diameterM / section.thicknessM) * (yieldPa / 235e6);
  return ratio <= 50 ? 1 : ratio <= 70 ? 2 : ratio <= 90 ? 3 : 4;
}

/** The section modulus a tube's bending resistance takes: plastic for classes 1–2, elastic for class 3 (EN 1993-1-1 eqs 6.13–6.14); null for class 4 (EN 1993-1-6, not in this method). */
export function tubeBendingModulusM3(section: ChsSection, yieldPa: number): number | null {
  const c = tubeClass(section, yieldPa);
  return c <= 2 ? section.plasticModulusM3 : c === 3 ? section.elasticModulusM3 : null;
}

/** Resistance and utilisation of one section for the demand; null when too slender, or class 4 in compression (its resistance needs EN 1993-1-6's shell buckling, not in this method). */
export function chsResistance(section: ChsSection, demand: ChsDemand): ChsChoice | null {
  const { forceN, effectiveLengthM, yieldPa, curve = "a", gammaM0 = 1.0, gammaM1 = 1.0, maxSlenderness = 180 } = demand;
  if (forceN >= 0) {
    const resistanceN = tensionResistanceN(section.areaM2, yieldPa, gammaM0);
    return { section, resistanceN, utilisation: forceN / resistanceN, governing: "tension, EN 1993-1-1 §6.2.3" };
  }
  if (effectiveLengthM / section.radiusOfGyrationM > maxSlenderness || tubeClass(section, yieldPa) === 4) return null;
  const resistanceN = bucklingResistanceN(section.areaM2, section.radiusOfGyrationM, effectiveLengthM, yieldPa, curve, gammaM1);
  return { section, resistanceN, utilisation: -forceN / resistanceN, governing: "flexural buckling, EN 1993-1-1 §6.3.1" };
}
