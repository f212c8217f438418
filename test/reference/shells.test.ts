import { describe, it } from "vitest";
import {
  sphericalMembraneSurfaceLoad,
  sphericalMembranePlanLoad,
  hoopSignChangeAngleRad,
  zoellyCoefficient,
  zoellyPressurePa,
  continuumShellPressurePa,
  concreteProperties,
  threeWayGridBarForces,
} from "../../src/mechanics";
import { expectAbsClose, expectRelClose } from "../helpers/close";

describe("sphericalMembraneSurfaceLoad (Timoshenko & Woinowsky-Krieger, Theory of Plates and Shells, ch. 14 §129)", () => {
  // Dome under self-weight q = 2.5 kPa, R = 30 m. By hand: qR = 75 kN/m.
  // Crown φ = 0: N_φ = −qR/2 = −37.5 kN/m, N_θ = qR(1/2 − 1) = −37.5 kN/m.
  it("crown: N_φ = N_θ = −37.5 kN/m", () => {
    const f = sphericalMembraneSurfaceLoad(2500, 30, 0);
    expectRelClose(f.meridionalNPerM, -37_500, 1e-12);
    expectRelClose(f.hoopNPerM, -37_500, 1e-12);
  });
  // φ = 90°: N_φ = −qR/(1 + 0) = −75 kN/m, N_θ = qR(1 − 0) = +75 kN/m.
  it("φ = 90°: N_φ = −75 kN/m, N_θ = +75 kN/m", () => {
    const f = sphericalMembraneSurfaceLoad(2500, 30, Math.PI / 2);
    expectRelClose(f.meridionalNPerM, -75_000, 1e-12);
    expectRelClose(f.hoopNPerM, 75_000, 1e-12);
  });
  // Hoop force changes sign where cos²φ + cos φ − 1 = 0: φ = 51°50′ = 51.83° (same section).
  it("hoop force changes sign at φ = 51.83°", () => {
    const phi = hoopSignChangeAngleRad();
    expectAbsClose((phi * 180) / Math.PI, 51.83, 0.005);
    expectAbsClose(sphericalMembraneSurfaceLoad(2500, 30, phi).hoopNPerM, 0, 1e-6);
    // and it really changes sign either side
    if (!(sphericalMembraneSurfaceLoad(2500, 30, phi - 0.01).hoopNPerM < 0 && sphericalMembraneSurfaceLoad(2500, 30, phi + 0.01).hoopNPerM > 0)) {
      throw new Error("hoop force does not change sign at 51.83°");
    }
  });
});

describe("sphericalMembranePlanLoad (Timoshenko & Woinowsky-Krieger ch. 14 §129, load on the horizontal projection)", () => {
  // p = 1 kPa, R = 100 m: N_φ = −pR/2 = −50 kN/m everywhere; N_θ = −(pR/2) cos 2φ:
  // −50 kN/m at the crown, 0 at 45°, +50 kN/m at 90°.
  it("N_φ = −pR/2 and N_θ = −(pR/2) cos 2φ", () => {
    expectRelClose(sphericalMembranePlanLoad(1000, 100, 0).hoopNPerM, -50_000, 1e-12);
    expectAbsClose(sphericalMembranePlanLoad(1000, 100, Math.PI / 4).hoopNPerM, 0, 1e-9);
    expectRelClose(sphericalMembranePlanLoad(1000, 100, Math.PI / 2).hoopNPerM, 50_000, 1e-12);
    expectRelClose(sphericalMembranePlanLoad(1000, 100, 1.0).meridionalNPerM, -50_000, 1e-12);
  });
});

describe("Zoelly–van der Neut classical buckling pressure (Timoshenko & Gere, Theory of Elastic Stability, §11.9)", () => {
  // 2/√(3(1 − 0.09)) = 2/√2.73 = 2/1.65227 = 1.2105.
  it("coefficient 2/√(3(1−ν²)) = 1.2105 for ν = 0.3", () => expectAbsClose(zoellyCoefficient(0.3), 1.2105, 5e-5));
  // Steel sphere E = 210 GPa, t = 10 mm, R = 10 m: p_cl = 1.2105 × 210e9 × (0.01/10)² = 254.2 kPa.
  it("steel sphere E = 210 GPa, t = 10 mm, R = 10 m: p_cl = 254.2 kPa", () => expectAbsClose(zoellyPressurePa(210e9, 0.01, 10, 0.3) / 1000, 254.2, 0.05));
  // With the solid-shell stiffness B = Et and D = Et³/(12(1−ν²)), 4√(DB)/R² is the same formula
  // (algebra: 4√(E²t⁴/(12(1−ν²)))/R² = 2Et²/(R²√(3(1−ν²)))).
  it("4√(D·B)/R² with solid-shell stiffness equals the Zoelly pressure", () => {
    const E = 210e9;
    const t = 0.01;
    const nu = 0.3;
    const D = (E * t ** 3) / (12 * (1 - nu * nu));
    expectRelClose(continuumShellPressurePa(D, E * t, 10), zoellyPressurePa(E, t, 10, nu), 1e-12);
  });
});

describe("three-way grid under a hydrostatic membrane state (derived in src/mechanics/three-way-grid.ts)", () => {
  // N₁ = N₂ = N: every bar carries F = N·L/√3 (each bar family takes a third of the membrane force
  // over its spacing L√3/2, times 2/3 from the 60° geometry). N = −100 kN/m, L = 3 m: F = −173.2 kN.
  it("F = N·L/√3", () => expectRelClose(threeWayGridBarForces(-100e3, -100e3, 3).compressionN, (-100e3 * 3) / Math.sqrt(3), 1e-12));
});

describe("concreteProperties (EN 1992-1-1 Table 3.1)", () => {
  // Table 3.1 lists E_cm = 33 GPa for C30/37; the formula 22 (f_cm/10)^0.3 with f_cm = 38 MPa gives 32.84 GPa.
  it("E_cm of C30/37 is 33 GPa in the table (32.8 from the formula)", () => {
    const ecmGPa = concreteProperties("C30/37").ecmPa / 1e9;
    expectAbsClose(ecmGPa, 33, 0.5);
    expectAbsClose(ecmGPa, 22 * Math.pow(3.8, 0.3), 1e-9);
    expectAbsClose(ecmGPa, 32.8, 0.05);
  });
});
