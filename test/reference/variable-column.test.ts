import { describe, it, expect } from "vitest";
import { variableColumnCriticalForceN } from "../../src/mechanics/variable-column";
import { expectRelClose } from "../helpers/close";

/** Bisection for a root of f on [a, b] where f changes sign. */
function root(f: (x: number) => number, a: number, b: number): number {
  let lo = a;
  let hi = b;
  for (let k = 0; k < 200; k++) {
    const mid = (lo + hi) / 2;
    if (Math.sign(f(mid)) === Math.sign(f(lo))) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}

describe("critical force of a column of variable section (Euler's equation, Timoshenko & Gere 1961 §2.13)", () => {
  it("a uniform column gives Euler's force π²EI/L² (to the difference scheme's π²/(12 n²))", () => {
    const ei = 3.2e9;
    const L = 24;
    const euler = (Math.PI ** 2 * ei) / L ** 2;
    expectRelClose(variableColumnCriticalForceN(L, () => ei, 200), euler, 5e-5);
    expectRelClose(variableColumnCriticalForceN(L, () => ei, 800), euler, 5e-6);
  });

  it("a symmetric stepped column: EI₁ over a at each end, EI₂ between; exact N from tan(k₁a)·tan(k₂c) = k₁/k₂, c = L/2 − a", () => {
    // Derived from the equation on the half column (v(0) = 0, v′(L/2) = 0): v = A sin k₁x on the end
    // part, B cos k₂(L/2 − x) on the middle; continuity of v and v′ at x = a gives the condition
    // (the stepped bar of Timoshenko & Gere §2.13). Exact to the bisection.
    const L = 30;
    const a = 6;
    const ei1 = 1e9;
    const ei2 = 4e9;
    const c = L / 2 - a;
    const condition = (N: number) => {
      const k1 = Math.sqrt(N / ei1);
      const k2 = Math.sqrt(N / ei2);
      return Math.tan(k1 * a) * Math.tan(k2 * c) - k1 / k2;
    };
    const eulerWeak = (Math.PI ** 2 * ei1) / L ** 2;
    const eulerStrong = (Math.PI ** 2 * ei2) / L ** 2;
    // the least root lies between the weak and the strong uniform columns' forces
    const exact = root(condition, eulerWeak * 1.0001, Math.min(eulerStrong, (Math.PI / (2 * a)) ** 2 * ei1 * 0.9999));
    expect(exact).toBeGreaterThan(eulerWeak);
    expect(exact).toBeLessThan(eulerStrong);
    // The step sits on a grid point (a/L = 1/5); that point stands for half a cell of each part, so it
    // takes the mean of their flexibilities (1/EI) and the scheme keeps its 1/n² convergence.
    const step = 2 / (1 / ei1 + 1 / ei2);
    const rigidity = (x: number) => (Math.abs(x - a) < 1e-9 || Math.abs(x - (L - a)) < 1e-9 ? step : x < a || x > L - a ? ei1 : ei2);
    expectRelClose(variableColumnCriticalForceN(L, rigidity, 400), exact, 1e-4);
  });

  it("names a bad input", () => {
    expect(() => variableColumnCriticalForceN(0, () => 1)).toThrow(/lengthM/);
    expect(() => variableColumnCriticalForceN(10, () => -1)).toThrow(/flexural rigidity at x/);
  });
});
