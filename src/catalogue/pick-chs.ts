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

/** Resistance and utilisation of one section for the demand; null when too slender. */
export function chsResistance(section: ChsSection, demand: ChsDemand): ChsChoice | null {
  const { forceN, effectiveLengthM, yieldPa, curve = "a", gammaM0 = 1.0, gammaM1 = 1.0, maxSlenderness = 180 } = demand;
  if (forceN >= 0) {
    const resistanceN = tensionResistanceN(section.areaM2, yieldPa, gammaM0);
    return { section, resistanceN, utilisation: forceN / resistanceN, governing: "tension, EN 1993-1-1 §6.2.3" };
  }
  if (effectiveLengthM / section.radiusOfGyrationM > maxSlenderness) return null;
  const resistanceN = bucklingResistanceN(section.areaM2, section.radiusOfGyrationM, effectiveLengthM, yieldPa, curve, gammaM1);
  return { section, resistanceN, utilisation: -forceN / resistanceN, governing: "flexural buckling, EN 1993-1-1 §6.3.1" };
}
