import { describe, it, expect } from "vitest";
import { eq610, eq610a, eq610b, peakVelocityPressure, snowShapeMu3, snowShapeMu1 } from "../../src/loads";
import { DEFAULT_FACTORS } from "../../src/brief";
import { expectAbsClose, expectRelClose } from "../helpers/close";

describe("EN 1990 combinations (Table A1.2(B), recommended factors)", () => {
  // EN 1990 Table A1.2(B) with G = 0.5, S = 0.8 (leading), W = 0.4 kPa, ψ0 snow 0.5, ψ0 wind 0.6.
  // By hand: 6.10 = 1.35·0.5 + 1.5·0.8 + 1.5·0.6·0.4 = 2.235.
  it("eq. 6.10 gives 2.235 kPa", () => expectAbsClose(eq610(0.5, 0.8, 0.4, DEFAULT_FACTORS), 2.235, 1e-3));
  // 6.10a = 1.35·0.5 + 1.5·0.5·0.8 + 1.5·0.6·0.4 = 1.635
  it("eq. 6.10a gives 1.635 kPa", () => expectAbsClose(eq610a(0.5, 0.8, 0.4, DEFAULT_FACTORS), 1.635, 1e-3));
  // 6.10b = 0.85·1.35·0.5 + 1.5·0.8 + 1.5·0.6·0.4 = 2.13375
  it("eq. 6.10b gives 2.134 kPa", () => expectAbsClose(eq610b(0.5, 0.8, 0.4, DEFAULT_FACTORS), 2.134, 1e-3));
});

describe("EN 1991-1-4 peak velocity pressure, eqs 4.4–4.10", () => {
  // v_b = 26 m/s, ρ = 1.25 kg/m³, terrain II (z0 = 0.05 m), z = 10 m: q_p = 993.8 Pa, c_e = 2.352.
  const q = peakVelocityPressure(26, "II", 10, 1.25);
  it("q_p(10 m) = 993.8 Pa", () => expectAbsClose(q.peakPa, 993.8, 0.1));
  it("c_e = 2.352", () => expectAbsClose(q.exposureFactor, 2.352, 1e-3));
  it("uses z_min below it (Table 4.1, terrain IV z_min = 10 m)", () => {
    expect(peakVelocityPressure(26, "IV", 3).peakPa).toBe(peakVelocityPressure(26, "IV", 10).peakPa);
  });
  it("rejects a height above z_max = 200 m", () => expect(() => peakVelocityPressure(26, "II", 250)).toThrow(/height/));
});

describe("EN 1991-1-3 snow shape coefficients", () => {
  // §5.3.5 eq. 5.5: μ3 = 0.2 + 10 h/b; h/b = 0.125 → 1.45; h/b = 0.25 → 2.45, capped at 2.0.
  it("μ3 = 1.45 for h/b = 0.125", () => expectRelClose(snowShapeMu3(12.5, 100), 1.45, 1e-12));
  it("μ3 is capped at 2.0 for h/b = 0.25", () => expect(snowShapeMu3(25, 100)).toBe(2.0));
  // Table 5.2: μ1 = 0.8 up to 30°, 0.8(60 − α)/30 between 30° and 60°, 0 beyond.
  it("μ1 = 0.8 at 30°, 0.4 at 45°, 0 at 60°", () => {
    expect(snowShapeMu1(30)).toBe(0.8);
    expectRelClose(snowShapeMu1(45), 0.4, 1e-12);
    expect(snowShapeMu1(60)).toBe(0);
  });
});
