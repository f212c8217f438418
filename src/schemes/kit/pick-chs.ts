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
 * every axial demand (EN 1993-1-1 §6.2.3 tension, §6.3.1 flexural buckling, γ_M = 1.0, L/i ≤ 180),
 * has at least `minAreaM2` (a stiffness floor: the truss chords' deflection) and passes an extra
 * test (general buckling…). Returns the governing choice, or null when no section suffices.
 */
export function pickChs(
  sections: readonly ChsSection[],
  demands: readonly AxialDemand[],
  steel: { yieldPa: number; curve: BucklingCurve },
  accept: (section: ChsSection) => boolean = () => true,
  minAreaM2 = 0,
): ChsChoice | null {
  // No resistance exceeds A f_y (γ_M = 1 here), so smaller areas can be skipped without a check.
  const areaNeededM2 = demands.reduce((m, d) => Math.max(m, Math.abs(d.forceN)), 0) / steel.yieldPa;
  for (let i = firstWithArea(sections, Math.max(areaNeededM2, minAreaM2)); i < sections.length; i++) {
    const section = sections[i]!;
    if (section.areaM2 < minAreaM2 || section.areaM2 < areaNeededM2) continue;
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

/** Whether each list of sections the picker was given runs in order of area (the catalogue does: it is sorted by mass, which is area × density). */
const inAreaOrder = new WeakMap<readonly ChsSection[], boolean>();

/**
 * The index of the first section with at least this area, by bisection where the list runs in
 * order of area, else 0 (the picker's own check then skips the smaller ones). A picker's call
 * skipped some 65 of the catalogue's 94 sections one by one on average (the truss roof's span
 * study's first pass: 46 million skips).
 */
function firstWithArea(sections: readonly ChsSection[], areaM2: number): number {
  let ordered = inAreaOrder.get(sections);
  if (ordered === undefined) {
    ordered = sections.every((s, i) => i === 0 || sections[i - 1]!.areaM2 <= s.areaM2);
    inAreaOrder.set(sections, ordered);
  }
  if (!ordered) return 0;
  let lo = 0;
  let hi = sections.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (sections[mid]!.areaM2 < areaM2) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}
