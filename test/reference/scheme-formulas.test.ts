import { describe, it, expect } from "vitest";
import { zoellyPressurePa, zoellyThicknessM, edgeRingTensionN, sphericalMembraneSurfaceLoad, minimumReinforcementRatio, inclinedParabolicCable, PLAIN_CONCRETE_DENSITY_KG_PER_M3, REINFORCED_CONCRETE_DENSITY_KG_PER_M3 } from "../../src/mechanics";
import { ulsFactors } from "../../src/loads/uls-factors";
import { DEFAULT_FACTORS } from "../../src/brief";
import { expectAbsClose, expectRelClose } from "../helpers/close";

// The published formulas the schemes call (rather than re-deriving them inline).

describe("zoellyThicknessM (Zoelly–van der Neut; Timoshenko & Gere, Theory of Elastic Stability §11.9, solved for t)", () => {
  // Steel sphere E = 210 GPa, ν = 0.3, R = 10 m: p_cl = 254.2 kPa at t = 10 mm (by hand, the
  // zoellyPressurePa check). Inverting: t = R √(p / (1.2105 E)) = 10 √(254.2e3 / 2.542e11) = 10 mm.
  it("p = 254.2 kPa on the steel sphere needs t = 10 mm", () => expectAbsClose(zoellyThicknessM(254.2e3, 210e9, 10, 0.3) * 1000, 10, 0.001));
  // With a knock-down k the thickness is the one whose k·p_cl equals p (implementation check: the formula is its own inverse).
  it("k·p_cl at the returned thickness equals the pressure", () => {
    const t = zoellyThicknessM(50e3, 20e9, 60, 0.2, 0.2);
    expectRelClose(0.2 * zoellyPressurePa(20e9, t, 60, 0.2), 50e3, 1e-12);
  });
  it("refuses a knock-down outside (0, 1]", () => expect(() => zoellyThicknessM(1e3, 1e9, 10, 0.2, 0)).toThrow(/invalid knock-down/));
});

describe("edgeRingTensionN (Timoshenko & Woinowsky-Krieger ch. 14 §129: H = |N_φ| cos φ0, T = H·a)", () => {
  // Dome under self-weight q = 2.5 kPa, R = 30 m, edge at φ0 = 60°: N_φ = −qR/(1 + cos φ0) = −50 kN/m,
  // H = 50 × 0.5 = 25 kN/m, a = R sin φ0 = 25.98 m, T = 25 × 25.98 = 649.5 kN (by hand).
  it("T = 649.5 kN for the 30 m dome cut at 60°", () => {
    const phi0 = Math.PI / 3;
    const n = sphericalMembraneSurfaceLoad(2500, 30, phi0).meridionalNPerM;
    expectAbsClose(edgeRingTensionN(n, phi0, 30 * Math.sin(phi0)) / 1000, 649.5, 0.05);
  });
});

describe("minimumReinforcementRatio (EN 1992-1-1 eq. 9.1N: max(0.26 f_ctm/f_yk, 0.0013))", () => {
  // C30/37: f_ctm = 2.9 MPa (EN 1992-1-1 Table 3.1), f_yk = 500 MPa: 0.26 × 2.9/500 = 0.001508.
  it("C30/37 with B500: 0.001508", () => expectRelClose(minimumReinforcementRatio(2.9e6), 0.001508, 1e-9));
  // C20/25: f_ctm = 2.2 MPa: 0.26 × 2.2/500 = 0.001144 < 0.0013, so the floor governs.
  it("C20/25 with B500: the floor 0.0013 governs", () => expect(minimumReinforcementRatio(2.2e6)).toBe(0.0013));
});

describe("concrete densities (EN 1991-1-1 Table A.1)", () => {
  // Normal-weight concrete 24 kN/m³, reinforced 25 kN/m³ (Table A.1), as masses per m³.
  it("plain 2400 kg/m³, reinforced 2500 kg/m³", () => {
    expect(PLAIN_CONCRETE_DENSITY_KG_PER_M3).toBe(2400);
    expect(REINFORCED_CONCRETE_DENSITY_KG_PER_M3).toBe(2500);
  });
});

describe("inclinedParabolicCable as the cable net calls it (Irvine 1981 ch. 1)", () => {
  // w = 2 kN/m, L = 100 m, f = 10 m, upper support 20 m higher: H = wL²/8f = 250 kN (as level),
  // V_upper = wL/2 + HΔz/L = 100 + 50 = 150 kN, V_lower = 100 − 50 = 50 kN (by hand).
  it("H = 250 kN, V = 150 kN up, 50 kN down", () => {
    const c = inclinedParabolicCable(2000, 100, 10, 20);
    expectRelClose(c.horizontalN, 250e3, 1e-12);
    expectRelClose(c.verticalN, 150e3, 1e-12);
    expectRelClose(c.lowerVerticalN, 50e3, 1e-12);
  });
});

describe("ulsFactors (EN 1990 Table A1.2(B), eqs 6.10, 6.10a, 6.10b, recommended factors)", () => {
  const brief = { factors: DEFAULT_FACTORS, ulsExpression: "6.10a/b" as const };
  // G = 0.5, Q = 0.8 kPa: 6.10a = 1.35·0.5 + 1.5·0.5·0.8 = 1.275; 6.10b = 0.85·1.35·0.5 + 1.5·0.8 = 1.774:
  // 6.10b governs, factors ξγ_G = 1.1475 and γ_Q = 1.5 (by hand).
  it("light roof: 6.10b, permanent 1.1475, variable 1.5", () => {
    const f = ulsFactors(brief, 0.5, 0.8);
    expect(f.expression).toBe("6.10b");
    expectRelClose(f.permanent, 1.1475, 1e-12);
    expectRelClose(f.variable, 1.5, 1e-12);
  });
  // G = 5, Q = 0.1 kPa: 6.10a = 6.75 + 0.075 = 6.825; 6.10b = 5.7375 + 0.15 = 5.8875: 6.10a governs,
  // factors γ_G = 1.35 and γ_Q ψ0 = 0.75.
  it("heavy roof: 6.10a, permanent 1.35, variable 0.75", () => {
    const f = ulsFactors(brief, 5, 0.1);
    expect(f.expression).toBe("6.10a");
    expectRelClose(f.permanent, 1.35, 1e-12);
    expectRelClose(f.variable, 0.75, 1e-12);
  });
  it("eq. 6.10 alone: 1.35 and 1.5", () => {
    const f = ulsFactors({ factors: DEFAULT_FACTORS, ulsExpression: "6.10" }, 0.5, 0.8);
    expect([f.expression, f.permanent, f.variable]).toEqual(["6.10", 1.35, 1.5]);
  });
});
