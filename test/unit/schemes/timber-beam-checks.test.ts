import { describe, it, expect } from "vitest";
import type { GlulamClass } from "../../../src/catalogue/types";
import { memberUtilisation, torsionalLengthM } from "../../../src/schemes/timber-dome/member-design";
import { sizePurlins } from "../../../src/schemes/timber-dome/secondary";
import { GLULAM_SECTIONS, rectangularSection } from "../../../src/schemes/timber-dome/sections";
import { timberCriticalBendingStressPa, timberDesignStrengthPa, timberLateralTorsionalFactor } from "../../../src/mechanics";
import { expectRelClose } from "../../helpers/close";

// GL24h as data/glulam.csv gives it (EN 14080:2013 Table 5)
const GL24H: GlulamClass = {
  strengthClass: "GL24h", bendingPa: 24e6, tensionPa: 19.2e6, compressionPa: 24e6, shearPa: 3.5e6, modulusMeanPa: 11.5e9, modulus5PctPa: 9.6e9,
  densityCharacteristicKgPerM3: 385, densityMeanKgPerM3: 420, source: "test",
};
const GAMMA_M = 1.25;

describe("which edge a timber beam's moment compresses, and how far it is free (torsionalLengthM)", () => {
  it("a net uplift frees the lower edge over 0.9 × the span (EN 1995-1-1 Table 6.1)", () => expect(torsionalLengthM({ surfacePa: 300, planPa: -900 }, 8, 2)).toBeCloseTo(7.2, 12));
  it("a downward load compresses the upper edge, held at the spacing of what rests on it", () => expect(torsionalLengthM({ surfacePa: 900, planPa: 300 }, 8, 2)).toBe(2));
  it("held throughout (a purlin under the deck): no length, k_crit = 1", () => expect(torsionalLengthM({ surfacePa: 900, planPa: 0 }, 8, 0)).toBeUndefined());
});

describe("a glulam beam's check takes lateral-torsional buckling and shear where the demand gives them", () => {
  // 120 × 960 mm (8:1, the deepest the catalogue keeps), 9 m span, M = 60 kN·m, short-term (k_mod 0.9)
  const section = rectangularSection(0.12, 0.96);
  const lengths = { strongM: 9, weakM: 9 };
  const demand = { forceN: 0, momentNm: 60e3, kMod: 0.9, label: "wind uplift" };
  const bendingPa = 60e3 / section.sectionModulusYM3;
  const fmd = timberDesignStrengthPa(24e6, 0.9, GAMMA_M);

  it("with its compressed edge held, bending alone (eq. 6.11)", () => {
    const c = memberUtilisation(section, GL24H, lengths, demand, GAMMA_M);
    expectRelClose(c.utilisation, bendingPa / fmd, 1e-12);
    expect(c.governing).toMatch(/^bending \(wind uplift\), EN 1995-1-1 eq\. 6\.11$/);
  });
  it("with it free over 0.9 × 9 m, σ_m,d/(k_crit f_m,d) (eq. 6.33): k_crit 0.574 here, so 1.74 × the bending check", () => {
    const kCrit = timberLateralTorsionalFactor(24e6, timberCriticalBendingStressPa(0.12, 0.96, 8.1, 9.6e9));
    expect(kCrit).toBeGreaterThan(0.5);
    expect(kCrit).toBeLessThan(0.6);
    const c = memberUtilisation(section, GL24H, lengths, { ...demand, torsionalLengthM: 8.1 }, GAMMA_M);
    expectRelClose(c.utilisation, bendingPa / (kCrit * fmd), 1e-12);
    expect(c.governing).toMatch(/^lateral-torsional buckling \(wind uplift\), EN 1995-1-1 eq\. 6\.33$/);
  });
  it("with compression, eq. 6.35: (σ_m,d/(k_crit f_m,d))² + σ_c,d/(k_c,z f_c,0,d), where it exceeds eqs 6.23/6.24", () => {
    // M = 150 kN·m: σ_m,d/(k_crit f_m,d) ≈ 0.82, squared 0.67, against eq. 6.23's 0.47 + 0.05
    const heavy = { ...demand, momentNm: 150e3, forceN: -100e3 };
    const compressed = memberUtilisation(section, GL24H, { strongM: 9, weakM: 2 }, { ...heavy, torsionalLengthM: 8.1 }, GAMMA_M);
    expect(compressed.governing).toMatch(/eq\. 6\.35$/);
    const held = memberUtilisation(section, GL24H, { strongM: 9, weakM: 2 }, heavy, GAMMA_M);
    expect(held.governing).toMatch(/eqs 6\.23\/6\.24$/);
    expect(compressed.utilisation).toBeGreaterThan(held.utilisation);
  });
  it("shear governs a short, heavily loaded beam (eq. 6.13): τ_d = 1.5 V/(0.67 b h)", () => {
    const short = memberUtilisation(section, GL24H, { strongM: 1, weakM: 1 }, { ...demand, momentNm: 50e3, shearN: 200e3 }, GAMMA_M);
    expectRelClose(short.utilisation, (1.5 * 200e3) / (0.67 * 0.12 * 0.96) / timberDesignStrengthPa(3.5e6, 0.9, GAMMA_M), 1e-12);
    expect(short.governing).toMatch(/^shear \(wind uplift\), EN 1995-1-1 eq\. 6\.13$/);
  });
});

describe("purlins carry uplift with their lower edge free (sizePurlins)", () => {
  // 9 m purlins at 2.5 m: 1.5 kPa down (snow, medium-term), 2 kPa up (wind, short-term)
  const down = { pressurePa: 1500, kMod: 0.8, label: "snow" };
  const up = { pressurePa: -2000, kMod: 0.9, label: "wind uplift" };
  const size = (cases: (typeof down)[]) => sizePurlins(GLULAM_SECTIONS, GL24H, cases, 100, 9, 2.5, 6.4e9, GAMMA_M)!; // a light service load: strength, not deflection, sizes them

  it("an uplift never needs a lighter purlin than the same load downwards, and where it is heavier, the lighter one failed by its free lower edge", () => {
    let heavier = 0;
    for (let pa = 1600; pa <= 3000; pa += 100) {
      const pressed = size([down, { ...up, pressurePa: pa }]);
      const lifted = size([down, { ...up, pressurePa: -pa }]);
      expect(lifted.section.areaM2).toBeGreaterThanOrEqual(pressed.section.areaM2);
      expect(lifted.check.utilisation).toBeLessThanOrEqual(1);
      if (lifted.section.areaM2 > pressed.section.areaM2) {
        heavier++;
        // the lighter purlin fails the uplift only by its free lower edge: it carries the same bending pressed
        const only = [pressed.section];
        expect(sizePurlins(only, GL24H, [down, { ...up, pressurePa: -pa }], 100, 9, 2.5, 6.4e9, GAMMA_M)).toBeNull();
        expect(memberUtilisation(pressed.section, GL24H, { strongM: 9, weakM: 2.5 }, { forceN: 0, momentNm: (pa * 2.5 * 81) / 8, kMod: 0.9, label: "wind uplift", torsionalLengthM: 8.1 }, GAMMA_M).governing).toMatch(/^lateral-torsional buckling/);
      }
    }
    // k_crit of these 9 m purlins is 0.85–0.95: it decides the section at some of the pressures, not all
    expect(heavier).toBeGreaterThan(0);
  });
  it("under the snow alone, the deck holds the compressed edge: the same purlin as before this check (bending or deflection)", () => {
    expect(size([down]).check.governing).toMatch(/^bending \(snow\)/);
  });
});
