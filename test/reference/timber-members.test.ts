import { describe, it, expect } from "vitest";
import {
  timberRelativeSlenderness,
  timberBucklingFactor,
  glulamKMod,
  TIMBER_GAMMA_M,
  timberDesignStrengthPa,
  timberCompressionBendingUtilisation,
  timberTensionBendingUtilisation,
  creepReducedModulusPa,
  GLULAM_K_DEF,
  timberCriticalBendingStressPa,
  timberLateralTorsionalFactor,
  timberShearUtilisation,
  LTB_LENGTH_RATIO_UDL,
  SHEAR_CRACK_FACTOR,
  GLULAM_BETA_C,
} from "../../src/mechanics";
import { expectAbsClose, expectRelClose } from "../helpers/close";

describe("k_c of a glulam column (EN 1995-1-1 §6.3.2, eqs 6.25–6.29, β_c = 0.1)", () => {
  // By hand from eqs 6.27/6.25: k = 0.5[1 + β_c(λ_rel − 0.3) + λ_rel²], k_c = 1/(k + √(k² − λ_rel²)).
  it("β_c = 0.1 for glulam (eq. 6.29)", () => expect(GLULAM_BETA_C).toBe(0.1));
  it("λ_rel = 0.5 → k = 0.635, √(0.403225 − 0.25) = 0.391440, k_c = 1/1.026440 = 0.97424", () =>
    expectAbsClose(timberBucklingFactor(0.5), 0.97424, 1e-5));
  it("λ_rel = 1.0 → k = 1.035, √(1.071225 − 1) = 0.266880, k_c = 1/1.301880 = 0.76812", () =>
    expectAbsClose(timberBucklingFactor(1.0), 0.76812, 1e-5));
  it("λ_rel = 2.0 → k = 2.585, √(6.682225 − 4) = 1.637750, k_c = 1/4.222750 = 0.23681", () =>
    expectAbsClose(timberBucklingFactor(2.0), 0.23681, 1e-5));
  it("k_c = 1 at and below λ_rel = 0.3 (§6.3.2(2))", () => {
    expect(timberBucklingFactor(0.3)).toBe(1);
    expect(timberBucklingFactor(0)).toBe(1);
  });
  it("solid timber (β_c = 0.2) buckles earlier than glulam at the same λ_rel", () =>
    expect(timberBucklingFactor(1.0, 0.2)).toBeLessThan(timberBucklingFactor(1.0)));
  it("λ_rel,c = (λ/π)√(f_c,0,k/E_0,05) (eq. 6.21): GL24h, λ = 100 → (100/π)·√(24/9600) = 31.831 × 0.05 = 1.59155", () =>
    expectAbsClose(timberRelativeSlenderness(100, 24e6, 9.6e9), 1.59155, 1e-5));
  it("refuses a negative slenderness, naming it", () => expect(() => timberBucklingFactor(-1)).toThrow(/relative slenderness/));
});

describe("k_mod, γ_M and design strength (EN 1995-1-1 Tables 3.1 and 2.3, eq. 2.14)", () => {
  // Table 3.1, glued laminated timber (EN 14080) rows, service classes 1 and 2 equal.
  const sc12 = { permanent: 0.6, "long-term": 0.7, "medium-term": 0.8, "short-term": 0.9, instantaneous: 1.1 } as const;
  const sc3 = { permanent: 0.5, "long-term": 0.55, "medium-term": 0.65, "short-term": 0.7, instantaneous: 0.9 } as const;
  for (const [duration, value] of Object.entries(sc12)) {
    it(`k_mod(${duration}, SC1) = k_mod(${duration}, SC2) = ${value}`, () => {
      expect(glulamKMod(duration as keyof typeof sc12, 1)).toBe(value);
      expect(glulamKMod(duration as keyof typeof sc12, 2)).toBe(value);
    });
  }
  for (const [duration, value] of Object.entries(sc3)) {
    it(`k_mod(${duration}, SC3) = ${value}`, () => expect(glulamKMod(duration as keyof typeof sc3, 3)).toBe(value));
  }
  it("γ_M = 1.25 for glued laminated timber, 1.3 solid timber and connections (Table 2.3)", () => {
    expect(TIMBER_GAMMA_M.glulam).toBe(1.25);
    expect(TIMBER_GAMMA_M.solidTimber).toBe(1.3);
    expect(TIMBER_GAMMA_M.connections).toBe(1.3);
  });
  it("f_c,0,d of GL24h, short-term, SC2: 0.9 × 24 / 1.25 = 17.28 MPa (eq. 2.14)", () =>
    expectRelClose(timberDesignStrengthPa(24e6, glulamKMod("short-term", 2), TIMBER_GAMMA_M.glulam), 17.28e6, 1e-12));
  it("names an unknown service class", () => expect(() => glulamKMod("permanent", 4 as 1)).toThrow(/service class/));
});

describe("combined compression and bending with buckling (EN 1995-1-1 eqs 6.23/6.24)", () => {
  // By hand: σc = 8, fc = 16, kc,y = 0.8, kc,z = 0.5, σm,y = 4, fm = 16 MPa, km = 0.7 (rectangular, §6.1.6(2)).
  // eq. 6.23: 8/(0.8·16) + 4/16 = 0.625 + 0.25 = 0.875; eq. 6.24: 8/(0.5·16) + 0.7·4/16 = 1 + 0.175 = 1.175.
  const member = { compressionPa: 8e6, compressionStrengthPa: 16e6, kcY: 0.8, kcZ: 0.5, bendingYPa: 4e6, bendingZPa: 0, bendingStrengthYPa: 16e6, bendingStrengthZPa: 16e6 };
  it("takes the larger of eqs 6.23 and 6.24: 1.175", () => expectAbsClose(timberCompressionBendingUtilisation(member), 1.175, 1e-12));
  it("eq. 6.23 governs when k_c,y is the smaller: 8/(0.5·16) + 4/16 = 1.25", () =>
    expectAbsClose(timberCompressionBendingUtilisation({ ...member, kcY: 0.5, kcZ: 0.8 }), 1.25, 1e-12));
  it("names a k_c out of range", () => expect(() => timberCompressionBendingUtilisation({ ...member, kcZ: 1.2 })).toThrow(/kcZ/));
});

describe("k_def and the creep-reduced stiffness (EN 1995-1-1 Table 3.2, §2.3.2.2 eq. 2.7)", () => {
  it("k_def of glulam: SC1 0.6, SC2 0.8, SC3 2.0 (Table 3.2)", () => expect(GLULAM_K_DEF).toEqual({ 1: 0.6, 2: 0.8, 3: 2.0 }));
  it("GL24h E_0,mean 11.5 GPa in SC2, ψ2 = 1: 11.5/(1 + 0.8) = 6.389 GPa", () =>
    expectRelClose(creepReducedModulusPa(11.5e9, GLULAM_K_DEF[2]), 11.5e9 / 1.8, 1e-12));
  it("ψ2 = 0.3 (from memory: eq. 2.7 weights k_def by ψ2): 11.5/(1 + 0.24) = 9.274 GPa", () =>
    expectRelClose(creepReducedModulusPa(11.5e9, 0.8, 0.3), 11.5e9 / 1.24, 1e-12));
});

describe("combined tension and bending (EN 1995-1-1 §6.2.3 eqs 6.17/6.18)", () => {
  // By hand: σt = 6, ft = 12, σm,y = 4, fm = 16 MPa: 6/12 + 4/16 = 0.75; with σm,z = 2: max(0.75 + 0.7·0.125, 0.5 + 0.7·0.25 + 0.125) = 0.8375.
  it("σt/ft + σm/fm = 0.5 + 0.25 = 0.75", () => expectAbsClose(timberTensionBendingUtilisation(6e6, 12e6, 4e6, 16e6), 0.75, 1e-12));
  it("with bending about both axes: 0.8375 (eq. 6.17 governs)", () => expectAbsClose(timberTensionBendingUtilisation(6e6, 12e6, 4e6, 16e6, 2e6), 0.8375, 1e-12));
});

describe("lateral-torsional buckling of a glulam beam (EN 1995-1-1 §6.3.3, eqs 6.30–6.34, Table 6.1)", () => {
  it("ℓ_ef = 0.9 ℓ for a simply supported beam under a uniform load (Table 6.1)", () => expect(LTB_LENGTH_RATIO_UDL).toBe(0.9));
  // By hand from eq. 6.32: GL24h (E_0,05 = 9.6 GPa, EN 14080 Table 5), 140 × 600 mm, ℓ_ef = 9 m:
  // 0.78 · 0.14² · 9.6e9 / (0.6 · 9) = 0.78 · 0.0196 · 9.6e9 / 5.4 = 27.179 MPa.
  it("σ_m,crit = 0.78 b² E_0,05/(h ℓ_ef) = 27.179 MPa (eq. 6.32)", () => expectRelClose(timberCriticalBendingStressPa(0.14, 0.6, 9, 9.6e9), 27.1787e6, 1e-5));
  // eq. 6.30: λ_rel,m = √(24/27.179) = 0.93970; eq. 6.34: 1.56 − 0.75 · 0.93970 = 0.85522.
  it("λ_rel,m = √(f_m,k/σ_m,crit) = 0.9397 → k_crit = 1.56 − 0.75 λ_rel,m = 0.8552 (eqs 6.30, 6.34)", () =>
    expectAbsClose(timberLateralTorsionalFactor(24e6, 27.1787e6), 0.85522, 1e-5));
  it("k_crit = 1 up to λ_rel,m = 0.75 and 1/λ_rel,m² beyond 1.4 (eq. 6.34)", () => {
    expect(timberLateralTorsionalFactor(24e6, 24e6 / 0.75 ** 2)).toBe(1);
    expect(timberLateralTorsionalFactor(24e6, 100e6)).toBe(1);
    // λ_rel,m = 2: σ_m,crit = 24/4 = 6 MPa, k_crit = 1/4
    expectAbsClose(timberLateralTorsionalFactor(24e6, 6e6), 0.25, 1e-12);
  });
  it("eq. 6.34 is continuous at both breakpoints (0.75: 1.56 − 0.5625 = 0.9975; 1.4: 1.56 − 1.05 = 0.51 against 1/1.96 = 0.5102)", () => {
    const at = (lambda: number) => timberLateralTorsionalFactor(24e6, 24e6 / lambda ** 2);
    expectAbsClose(at(0.75 + 1e-9), 0.9975, 1e-6);
    expectAbsClose(at(1.4), 0.51, 1e-9);
    expectAbsClose(at(1.4 + 1e-9), 1 / 1.96, 1e-6);
  });
  it("names an argument out of range", () => {
    expect(() => timberCriticalBendingStressPa(0.14, 0.6, 0, 9.6e9)).toThrow(/effective length/);
    expect(() => timberLateralTorsionalFactor(24e6, -1)).toThrow(/critical bending stress/);
  });
});

describe("shear of a glulam beam (EN 1995-1-1:2004+A1:2008 §6.1.7, eqs 6.13/6.13a)", () => {
  it("k_cr = 0.67 for glulam (§6.1.7(2))", () => expect(SHEAR_CRACK_FACTOR).toBe(0.67));
  // By hand: V_d = 60 kN on 140 × 600 mm: τ_d = 1.5 · 60e3/(0.67 · 0.14 · 0.6) = 1.59915 MPa;
  // f_v,d of GL24h (f_v,k = 3.5 MPa), short-term, SC2: 0.9 · 3.5/1.25 = 2.52 MPa; 1.59915/2.52 = 0.63458.
  it("τ_d = 1.5 V_d/(k_cr b h) against f_v,d: 1.599 MPa of 2.52 MPa = 0.6346", () =>
    expectAbsClose(timberShearUtilisation(60e3, 0.14, 0.6, timberDesignStrengthPa(3.5e6, glulamKMod("short-term", 2), TIMBER_GAMMA_M.glulam)), 0.63458, 1e-5));
  it("refuses a negative shear force, naming it", () => expect(() => timberShearUtilisation(-1, 0.14, 0.6, 2.52e6)).toThrow(/shear force/));
});
