import type { ChsSection } from "../../catalogue/types";
import type { BucklingCurve } from "../../mechanics/flexural-buckling";
import { chsResistance, type ChsChoice } from "../../catalogue/pick-chs";

/** An axial demand on a member: + tension, − compression, N; and its buckling length, m. */
export interface AxialDemand {
  forceN: number;
  effectiveLengthM: number;
}

/**
 * The one CHS picker of the schemes: the lightest section (catalogue sorted by mass) that carries
 * every axial demand (EN 1993-1-1 §6.2.3 tension, §6.3.1 flexural buckling, γ_M = 1.0, L/i ≤ 180)
 * and passes an extra test (general buckling, deflection…). Returns the governing choice, or null
 * when no section suffices.
 */
export function pickChs(
  sections: readonly ChsSection[],
  demands: readonly AxialDemand[],
  steel: { yieldPa: number; curve: BucklingCurve },
  accept: (section: ChsSection) => boolean = () => true,
  minMassKgPerM = 0,
): ChsChoice | null {
  // No resistance exceeds A f_y (γ_M = 1 here), so smaller areas can be skipped without a check.
  const areaNeededM2 = demands.reduce((m, d) => Math.max(m, Math.abs(d.forceN)), 0) / steel.yieldPa;
  for (const section of sections) {
    if (section.massKgPerM < minMassKgPerM || section.areaM2 < areaNeededM2) continue;
    let worst: ChsChoice | null = null;
    let ok = true;
    for (const d of demands) {
      const c = chsResistance(section, { forceN: d.forceN, effectiveLengthM: d.effectiveLengthM, yieldPa: steel.yieldPa, curve: steel.curve });
      if (c === null || c.utilisation > 1) {
        ok = false;
        break;
      }
      if (worst === null || c.utilisation > worst.utilisation) worst = c;
    }
    if (ok && worst !== null && accept(section)) return worst;
  }
  return null;
}
