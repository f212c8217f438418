import { describe, it } from "vitest";
import { threeWayGridBarForces, threeWayGridStiffness, doubleLayerGridStiffness, continuumShellPressurePa } from "../../../src/mechanics";
import { expectRelClose } from "../../helpers/close";

// Derivation checks (no published value): the bar forces must be in equilibrium with the membrane
// force, N = (1/h) Σ F_k n_k⊗n_k with h = L√3/2, for bars at 0°, 60°, 120° to the x axis.
describe("threeWayGridBarForces", () => {
  const L = 4;
  const h = (L * Math.sqrt(3)) / 2;
  it("uniaxial N along a bar: that bar carries hN, the others none (equilibrium by hand)", () => {
    const f = threeWayGridBarForces(50e3, 0, L);
    expectRelClose(f.tensionN, h * 50e3, 1e-12);
    // grid turned 90°: the bar across the force takes −hN/3, the two at ±30° take 2hN/3 each;
    // N_xx = (2 · 2hN/3 · cos²30°)/h = N, N_yy = (−hN/3 + 2 · 2hN/3 · sin²30°)/h = 0.
    expectRelClose(f.compressionN, (-h * 50e3) / 3, 1e-12);
    expectRelClose((2 * ((2 * h * 50e3) / 3) * Math.cos(Math.PI / 6) ** 2) / h, 50e3, 1e-12);
  });
  it("pure shear N₁ = −N₂: bars along the principal axes take ±(4/3)hN", () => {
    const f = threeWayGridBarForces(30e3, -30e3, L);
    expectRelClose(f.tensionN, (4 / 3) * h * 30e3, 1e-12);
    expectRelClose(f.compressionN, (-4 / 3) * h * 30e3, 1e-12);
  });
});

describe("threeWayGridStiffness", () => {
  // A solid plate of the same in-plane stiffness: Et = 2EA/(√3 L); D = (3√3/4) EI/L.
  it("B = 2EA/(√3 L) and D = (3√3/4) EI/L", () => {
    const g = threeWayGridStiffness(1e9, 2e6, 5);
    expectRelClose(g.membraneNPerM, (2 * 1e9) / (Math.sqrt(3) * 5), 1e-12);
    expectRelClose(g.bendingNm, ((3 * Math.sqrt(3)) / 4) * (2e6 / 5), 1e-12);
  });
  it("a double layer buckles at a far higher pressure than a single one", () => {
    const single = threeWayGridStiffness(1e9, 2e6, 5);
    const double = doubleLayerGridStiffness(single, 3);
    const ratio = continuumShellPressurePa(double.bendingNm, double.membraneNPerM, 100) / continuumShellPressurePa(single.bendingNm, single.membraneNPerM, 100);
    // √(D₂B₂/(D₁B₁)) with B₂ = 2B₁, D₂ = 2D₁ + 9B₁d²/16
    expectRelClose(ratio, Math.sqrt((2 * (2 * single.bendingNm + (9 / 16) * single.membraneNPerM * 9)) / single.bendingNm), 1e-12);
  });
});
