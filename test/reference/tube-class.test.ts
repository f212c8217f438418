// Tube classes and the tube pickers' use of them (src/catalogue/pick-chs.ts): EN 1993-1-1 Table 5.2,
// tubular sections in compression or bending — d/t ≤ 50ε² class 1, ≤ 70ε² class 2, ≤ 90ε² class 3,
// ε² = 235/f_y (limits from memory); class 4 needs EN 1993-1-6 and is not used in compression.
import { describe, it, expect } from "vitest";
import { chsResistance, tubeBendingModulusM3, tubeClass } from "../../src/catalogue/pick-chs";
import { defaultCatalogue } from "../../src/catalogue/default-catalogue";

const sections = defaultCatalogue().chs;
const tube = (designation: string) => {
  const s = sections.find((x) => x.designation === designation);
  if (!s) throw new Error(`no ${designation} in the catalogue`);
  return s;
};

describe("tube class by d/t and the steel grade (EN 1993-1-1 Table 5.2)", () => {
  it("the limits at S235 (ε = 1): 50, 70 and 90 bound classes 1, 2 and 3", () => {
    for (const s of sections) {
      const dt = s.diameterM / s.thicknessM;
      expect(tubeClass(s, 235e6)).toBe(dt <= 50 ? 1 : dt <= 70 ? 2 : dt <= 90 ? 3 : 4);
    }
  });
  it("a thin tube of d/t ≈ 51 is class 2 in S235, class 3 in S355 and class 4 in S460", () => {
    const thin = [...sections].sort((a, b) => b.diameterM / b.thicknessM - a.diameterM / a.thicknessM)[0]!;
    const dt = thin.diameterM / thin.thicknessM;
    expect(dt).toBeGreaterThan(46); // 90 × 235/460
    expect(dt).toBeLessThan(59.6); // 90 × 235/355
    expect(tubeClass(thin, 235e6)).toBe(2);
    expect(tubeClass(thin, 355e6)).toBe(3);
    expect(tubeClass(thin, 460e6)).toBe(4);
    // bending modulus by class: plastic, elastic, none
    expect(tubeBendingModulusM3(thin, 235e6)).toBe(thin.plasticModulusM3);
    expect(tubeBendingModulusM3(thin, 355e6)).toBe(thin.elasticModulusM3);
    expect(tubeBendingModulusM3(thin, 460e6)).toBeNull();
    // a class 4 tube carries tension but is not used in compression
    expect(chsResistance(thin, { forceN: 1e5, effectiveLengthM: 1, yieldPa: 460e6 })).not.toBeNull();
    expect(chsResistance(thin, { forceN: -1e5, effectiveLengthM: 1, yieldPa: 460e6 })).toBeNull();
    expect(chsResistance(thin, { forceN: -1e5, effectiveLengthM: 1, yieldPa: 355e6 })).not.toBeNull();
  });
  it("a stocky tube (CHS 48.3×4.0, d/t 12) is class 1 in every grade", () => {
    for (const fy of [275e6, 355e6, 460e6]) expect(tubeClass(tube("CHS 48.3x4.0"), fy)).toBe(1);
  });
});
