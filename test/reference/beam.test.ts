import { describe, it, expect } from "vitest";
import { simplySupportedMomentNm, simplySupportedUdl } from "../../src/mechanics";
import { expectRelClose } from "../helpers/close";

describe("simplySupportedUdl (elementary beam theory; e.g. Roark, Table 8.1 case 2e, from memory)", () => {
  // w = 10 kN/m, L = 8 m, EI = 1e8 N·m²: M = wL²/8 = 80 kN·m; V = wL/2 = 40 kN;
  // δ = 5wL⁴/(384EI) = 5 × 10e3 × 4096 / 3.84e10 = 5.333 mm.
  const r = simplySupportedUdl(10e3, 8, 1e8);
  it("M = wL²/8", () => expectRelClose(r.momentNm, (10e3 * 8 ** 2) / 8, 1e-12));
  it("M = 80 kN·m", () => expectRelClose(r.momentNm, 80e3, 1e-12));
  it("V = wL/2 = 40 kN", () => expectRelClose(r.shearN, 40e3, 1e-12));
  it("δ = 5wL⁴/(384EI) = 5.333 mm", () => expectRelClose(r.deflectionM, (5 * 10e3 * 8 ** 4) / (384 * 1e8), 1e-12));
  it("δ = 5.333 mm by hand", () => expectRelClose(r.deflectionM, 0.0053333, 1e-4));
  it("rejects a zero span", () => expect(() => simplySupportedUdl(1, 0, 1)).toThrow(/invalid span: 0 m/));
});

describe("simplySupportedMomentNm (the moment of simplySupportedUdl alone)", () => {
  it("M = 80 kN·m for w = 10 kN/m over 8 m (as above)", () => expectRelClose(simplySupportedMomentNm(10e3, 8), 80e3, 1e-12));
  it("is simplySupportedUdl's moment to the last bit, whatever the stiffness", () => {
    for (const [w, L, ei] of [[10e3, 8, 1e8], [-3.7e3, 13.3, 2.2e7], [1234.5678, 0.77, 1], [9.81e5, 47.25, 3e11]] as const) expect(simplySupportedMomentNm(w, L)).toBe(simplySupportedUdl(w, L, ei).momentNm);
  });
  it("rejects a zero span and a load that is not finite", () => {
    expect(() => simplySupportedMomentNm(1, 0)).toThrow(/invalid span: 0 m/);
    expect(() => simplySupportedMomentNm(Number.NaN, 1)).toThrow(/invalid load: NaN N\/m/);
  });
});
