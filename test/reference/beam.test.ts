import { describe, it, expect } from "vitest";
import { simplySupportedUdl } from "../../src/mechanics";
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
