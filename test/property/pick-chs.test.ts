// The schemes' CHS picker (src/schemes/kit/pick-chs.ts) starts its search by bisection on area
// where the list of sections runs in order of area. It must pick exactly what a plain scan from the
// lightest section picks: the first section, in the list's order, that carries every demand (EN
// 1993-1-1 via chsResistance), has at least the area floor and passes the extra test.
import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { pickChs, type AxialDemand } from "../../src/schemes/kit/pick-chs";
import { chsResistance } from "../../src/catalogue/pick-chs";
import { defaultCatalogue } from "../../src/catalogue/default-catalogue";
import type { ChsSection } from "../../src/catalogue/types";
import type { BucklingCurve } from "../../src/mechanics/flexural-buckling";

const catalogue = defaultCatalogue().chs;

/** The reference: every section in order, each checked in full. */
function scanned(sections: readonly ChsSection[], demands: readonly AxialDemand[], steel: { yieldPa: number; curve: BucklingCurve }, accept: (s: ChsSection) => boolean, minAreaM2: number) {
  for (const section of sections) {
    if (section.areaM2 < minAreaM2) continue;
    const checks = demands.map((d) => chsResistance(section, { ...d, yieldPa: steel.yieldPa, curve: steel.curve }));
    if (checks.some((c) => c === null || c.utilisation > 1) || !accept(section)) continue;
    return checks.reduce((w, c) => (c!.utilisation > w!.utilisation ? c : w));
  }
  return null;
}

const demandArb = fc.record({
  forceN: fc.double({ min: -2e7, max: 2e7, noNaN: true }),
  effectiveLengthM: fc.double({ min: 0.5, max: 30, noNaN: true }),
});

describe("pickChs", () => {
  it("picks what a plain scan picks, in area order or not, with an area floor and an extra test", () => {
    fc.assert(
      fc.property(
        fc.array(demandArb, { minLength: 1, maxLength: 3 }),
        fc.constantFrom({ yieldPa: 355e6, curve: "a" as const }, { yieldPa: 460e6, curve: "a0" as const }),
        fc.double({ min: 0, max: 0.1, noNaN: true }),
        fc.double({ min: 0, max: 2e-3, noNaN: true }),
        fc.boolean(),
        (demands, steel, minAreaM2, leastSecondMomentM4, shuffled) => {
          // a list out of area order (reversed halves) must still be searched from its start
          const sections = shuffled ? [...catalogue.slice(47).reverse(), ...catalogue.slice(0, 47)] : catalogue;
          const accept = (s: ChsSection) => s.secondMomentM4 >= leastSecondMomentM4;
          const got = pickChs(sections, demands, steel, accept, minAreaM2);
          const want = scanned(sections, demands, steel, accept, minAreaM2);
          expect(got?.section.designation ?? null).toBe(want?.section.designation ?? null);
          expect(got?.utilisation ?? null).toBe(want?.utilisation ?? null);
        },
      ),
      { numRuns: 400 },
    );
  });

  it("holds to the area floor even where a smaller section carries the force", () => {
    const steel = { yieldPa: 355e6, curve: "a" as const };
    const demand = [{ forceN: 1e5, effectiveLengthM: 3 }];
    const free = pickChs(catalogue, demand, steel)!;
    const floored = pickChs(catalogue, demand, steel, undefined, 3 * free.section.areaM2)!;
    expect(floored.section.areaM2).toBeGreaterThanOrEqual(3 * free.section.areaM2);
    expect(catalogue.filter((s) => s.areaM2 >= 3 * free.section.areaM2)[0]).toBe(floored.section);
    // a floor equal to a section's own area admits that section
    expect(pickChs(catalogue, demand, steel, undefined, free.section.areaM2)!.section).toBe(free.section);
  });
});
