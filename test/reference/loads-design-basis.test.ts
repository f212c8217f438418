import { describe, it, expect } from "vitest";
import {
  driftedSnowCase,
  uniformSnowCase,
  domeCpe,
  domeCpeAt,
  windCase,
  INTERNAL_PRESSURE_COEFFICIENTS,
  PSI0_TABLE_A1_1,
  DOME_CPE_FROM_MEMORY,
  designCombinations,
  designBasis,
  integrateOverPlan,
  caseResultants,
  gaussLegendre,
  peakVelocityPressure,
  type PressureCase,
  type DomeCpe,
} from "../../src/loads";
import { sphericalCap } from "../../src/mechanics/spherical-cap";
import { DEFAULT_BRIEF, DEFAULT_FACTORS } from "../../src/brief";
import { expectAbsClose, expectRelClose } from "../helpers/close";

describe("drifted snow on a dome, EN 1991-1-3 §5.3.5 and Fig. 5.6 (cylindrical-roof rule applied to domes — common practice)", () => {
  // eq. 5.5: μ3 = 0.2 + 10 h/b; h/b = 12.5/100 = 0.125 → 1.45. Fig. 5.6 case (ii): μ3 on one half, 0.5 μ3 on the other.
  const cap = sphericalCap(100, 12.5);
  const drifted = driftedSnowCase(cap, 1.0);
  it("μ3 s_k = 1.45 kPa on the heavy half (s_k = 1 kPa)", () => expectRelClose(drifted.atPlanKPa(-20, 5), 1.45, 1e-12));
  it("0.5 μ3 s_k = 0.725 kPa on the other half", () => expectRelClose(drifted.atPlanKPa(20, -5), 0.725, 1e-12));
  // eq. 5.5 with the recommended upper value 2.0 (§5.3.5(1) note): h/b = 25/100 = 0.25 → 2.7, capped at 2.0.
  it("μ3 is capped at 2.0 for h/b = 0.25", () => expect(driftedSnowCase(sphericalCap(100, 25), 1).peakKPa).toBe(2.0));
  // Halves by integration against the closed form: μ3 s_k π a²/2 and 0.5 μ3 s_k π a²/2 (a = 50 m; the 30.5° cap is all below 60°).
  it("heavy half totals 1.45 π 50²/2 kN", () =>
    expectRelClose(integrateOverPlan(drifted.atPlanKPa, { radiusM: 50, fromAzimuthRad: -Math.PI / 2, toAzimuthRad: Math.PI / 2 }), (1.45 * Math.PI * 2500) / 2, 1e-10));
  it("light half totals 0.725 π 50²/2 kN", () =>
    expectRelClose(integrateOverPlan(drifted.atPlanKPa, { radiusM: 50, fromAzimuthRad: Math.PI / 2, toAzimuthRad: (3 * Math.PI) / 2 }), (0.725 * Math.PI * 2500) / 2, 1e-10));
  // §5.3.5(1): μ = 0 where the slope exceeds 60°. On a hemisphere of R = 50 m that leaves the disc r ≤ R sin 60°.
  it("no snow beyond the 60° slope: uniform case on a hemisphere totals 0.8 s_k π (R sin 60°)²", () => {
    const hemisphere = sphericalCap(100, 50);
    const uniform = uniformSnowCase(hemisphere, 1);
    expectRelClose(caseResultants(uniform, hemisphere).verticalKN, 0.8 * Math.PI * (50 * Math.sin(Math.PI / 3)) ** 2, 1e-10);
    expect(uniform.atPlanKPa(0, 49)).toBe(0);
  });
  // Fig. 5.6 case (i): μ1 = 0.8 (eq. 5.1 with C_e = C_t = 1).
  it("uniform snow is μ1 s_k = 0.8 s_k", () => expect(uniformSnowCase(cap, 1.5).atPlanKPa(10, 10)).toBe(0.8 * 1.5));
});

describe("internal pressure and combination factors", () => {
  // EN 1991-1-4 §7.2.9(6) note 2: no dominant face, c_pi the more onerous of +0.2 and −0.3.
  it("c_pi = +0.2 and −0.3", () => {
    expect(INTERNAL_PRESSURE_COEFFICIENTS.pressure).toBe(0.2);
    expect(INTERNAL_PRESSURE_COEFFICIENTS.suction).toBe(-0.3);
  });
  // EN 1990 Table A1.1: category H roofs ψ0 = 0; snow (H ≤ 1000 m a.s.l.) 0.5; wind 0.6; temperature (non-fire) 0.6.
  it("ψ0 from EN 1990 Table A1.1", () => {
    expect(PSI0_TABLE_A1_1).toEqual({ imposedRoof: 0, snow: 0.5, wind: 0.6, temperature: 0.6 });
    expect([DEFAULT_FACTORS.psi0Snow, DEFAULT_FACTORS.psi0Wind]).toEqual([PSI0_TABLE_A1_1.snow, PSI0_TABLE_A1_1.wind]);
  });
  // EN 1990 eq. 6.10b with Table A1.2(B): ξ γ_G,sup G + γ_Q S + γ_Q ψ0,w W = 0.85·1.35 G + 1.5 S + 1.5·0.6 W.
  it("drifted snow + wind (6.10b) is 1.1475 G + 1.5 S_drift + 0.9 W", () => {
    const c = designCombinations(DEFAULT_FACTORS, "6.10a/b").find((x) => x.name === "drifted snow + wind (6.10b)");
    expect(c?.formula).toBe("1.1475 G + 1.5 S_drift + 0.9 W_suction");
    expectRelClose(c!.permanentFactor, 0.85 * 1.35, 1e-12);
  });
  // EN 1990 eq. 6.10a: γ_G,sup G + γ_Q ψ0,s S + γ_Q ψ0,w W = 1.35 G + 0.75 S + 0.9 W.
  it("drifted snow + wind, all accompanying (6.10a) is 1.35 G + 0.75 S_drift + 0.9 W", () => {
    const c = designCombinations(DEFAULT_FACTORS, "6.10a/b").find((x) => x.expression === "6.10a" && x.terms.length === 2 && x.terms.some((t) => t.caseId === "snow-drifted"));
    expect(c?.formula).toBe("1.35 G + 0.75 S_drift + 0.9 W_suction");
  });
  // Table A1.2(B): permanent action favourable γ_G,inf = 1.0; wind leading γ_Q = 1.5.
  it("uplift is 1.0 G + 1.5 W with internal pressure", () => {
    const c = designCombinations(DEFAULT_FACTORS, "6.10").find((x) => x.id === "wind-uplift-6-10");
    expect(c?.formula).toBe("1 G + 1.5 W_pressure");
  });
});

describe("wind on a dome, EN 1991-1-4 §7.2.8 (the method; Fig. 7.12 values are from memory and not check values)", () => {
  const cap = sphericalCap(100, 15);
  // Arbitrary coefficients to test the interpolation rule of §7.2.8(2), not values of the figure.
  const cpe: DomeCpe = { A: 0.5, B: -1.0, C: -0.25 };
  const phiAt = (x: number) => Math.asin(Math.abs(x) / cap.radiusM);
  it("B at the crown, A at the windward base, C at the leeward base", () => {
    expect(domeCpeAt(cpe, cap, 0)).toBe(-1.0);
    expectRelClose(domeCpeAt(cpe, cap, -50), 0.5, 1e-12);
    expectRelClose(domeCpeAt(cpe, cap, 50), -0.25, 1e-12);
  });
  it("linear in the arc from B to A and from B to C", () => {
    for (const x of [-40, -17, 8, 33]) {
      const t = phiAt(x) / cap.edgeAngleRad;
      expectRelClose(domeCpeAt(cpe, cap, x), -1.0 + ((x < 0 ? 0.5 : -0.25) + 1.0) * t, 1e-12);
    }
  });
  it("constant along arcs perpendicular to the wind", () => {
    const w = windCase(cap, cpe, 1, "suction");
    expect(w.atPlanKPa(-20, 0)).toBe(w.atPlanKPa(-20, 40));
  });
  it("net pressure q_p (c_pe − c_pi)", () => {
    expectRelClose(windCase(cap, cpe, 1.2, "pressure").atPlanKPa(0, 0), 1.2 * (-1.0 - 0.2), 1e-12);
    expectRelClose(windCase(cap, cpe, 1.2, "suction").atPlanKPa(0, 0), 1.2 * (-1.0 + 0.3), 1e-12);
  });
  it("reads the table linearly in f/d along a line (h/d = 0)", () => {
    const line = DOME_CPE_FROM_MEMORY.B[0]!;
    expectRelClose(domeCpe(0.25, 0).B, (line.atFlat + line.atHemisphere) / 2, 1e-12);
  });
  it("q_p at z_e = h + f (Fig. 7.12)", () => {
    const basis = designBasis(DEFAULT_BRIEF);
    expect(basis.windReferenceHeightM).toBe(DEFAULT_BRIEF.eavesHeightM + DEFAULT_BRIEF.riseM);
    expectRelClose(basis.peakVelocityPressureKPa, peakVelocityPressure(DEFAULT_BRIEF.windBasicMPerS, DEFAULT_BRIEF.terrain, 36).peakPa / 1000, 1e-12);
  });
});

describe("resultants by numerical integration against closed forms", () => {
  const constant = (p: number, direction: PressureCase["direction"]): PressureCase => ({
    kind: "pressure",
    id: "services",
    label: "test",
    action: "permanent",
    direction,
    atPlanKPa: () => p,
    peakKPa: p,
    minKPa: p,
    radialBreaksM: [],
    uniformEquivalent: { kPa: p, rule: "" },
    source: "",
  });
  const cap = sphericalCap(160, 22);
  const a = 80;
  // Vertical resultant of a constant pressure on a cap over its plan: π a² p (n_z dA = dA_plan).
  it("constant normal pressure: vertical π a² p", () => expectRelClose(caseResultants(constant(1.3, "normal"), cap).verticalKN, Math.PI * a * a * 1.3, 1e-12));
  it("constant normal pressure: no horizontal resultant", () => expectAbsClose(caseResultants(constant(1.3, "normal"), cap).alongWindKN, 0, 1e-6));
  // Inward pressure p on the windward half only: p times the half-cap's projection on the plane x = 0, a
  // circular segment of the sphere's section, R² φ0 − a (R − f).
  it("windward half only: horizontal p (R² φ0 − a (R − f))", () => {
    const half: PressureCase = { ...constant(1, "normal"), atPlanKPa: (x) => (x < 0 ? 1 : 0) };
    const R = cap.radiusM;
    expectRelClose(caseResultants(half, cap).alongWindKN, R * R * cap.edgeAngleRad - a * (R - 22), 1e-10);
  });
  // ∫∫ x² dA over a disc of radius a = π a⁴ / 4.
  it("∫∫ x² over the disc = π a⁴/4", () => expectRelClose(integrateOverPlan((x) => x * x, { radiusM: a }), (Math.PI * a ** 4) / 4, 1e-12));
  // Gauss–Legendre, 3 points: ±√(3/5) with weight 5/9, 0 with 8/9 (Abramowitz & Stegun Table 25.4).
  it("3-point Gauss–Legendre nodes and weights", () => {
    const { nodes, weights } = gaussLegendre(3);
    expectRelClose(nodes[2]!, Math.sqrt(3 / 5), 1e-14);
    expectRelClose(weights[0]!, 5 / 9, 1e-13);
    expectRelClose(weights[1]!, 8 / 9, 1e-13);
  });
});
