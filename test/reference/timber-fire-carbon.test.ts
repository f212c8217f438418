import { describe, it, expect } from "vitest";
import { charringDepthM, effectiveCharDepthM, CHARRING_RATE_M_PER_MIN, ZERO_STRENGTH_LAYER_M } from "../../src/mechanics";
import { biogenicCo2StoredKg } from "../../src/carbon";
import { expectAbsClose, expectRelClose } from "../helpers/close";

describe("charring of glulam (EN 1995-1-2 §3.4 Table 3.1, §4.2.2 eq. 4.1)", () => {
  const { oneDimensional, notional } = CHARRING_RATE_M_PER_MIN.glulamSoftwood;
  it("glued laminated softwood: β0 = 0.65 mm/min, β_n = 0.7 mm/min (Table 3.1)", () => {
    expect(oneDimensional).toBeCloseTo(0.65e-3, 12);
    expect(notional).toBeCloseTo(0.7e-3, 12);
  });
  it("d0 = 7 mm (§4.2.2(1))", () => expect(ZERO_STRENGTH_LAYER_M).toBe(0.007));
  it("R60: d_char,n = 0.7 × 60 = 42 mm; d_ef = 42 + 1 × 7 = 49 mm", () => {
    expectAbsClose(charringDepthM(60, notional), 0.042, 1e-12);
    expectAbsClose(effectiveCharDepthM(60), 0.049, 1e-12);
  });
  it("R90: d_char,n = 0.7 × 90 = 63 mm; d_ef = 63 + 7 = 70 mm", () => {
    expectAbsClose(charringDepthM(90, notional), 0.063, 1e-12);
    expectAbsClose(effectiveCharDepthM(90), 0.07, 1e-12);
  });
  it("R60 one-dimensional: d_char,0 = 0.65 × 60 = 39 mm (eq. 3.1)", () => expectAbsClose(charringDepthM(60, oneDimensional), 0.039, 1e-12));
  it("k0 = t/20 below 20 min (Table 4.1): t = 10 → 7 + 0.5 × 7 = 10.5 mm", () => expectAbsClose(effectiveCharDepthM(10), 0.0105, 1e-12));
  it("names a fire exposure out of range", () => expect(() => charringDepthM(-5, notional)).toThrow(/fire exposure/));
});

describe("biogenic carbon of 1 m³ of glulam (EN 16449:2014 eq. 1, from memory)", () => {
  // P_CO2 = (44/12) · cf · ρ_ω · V_ω / (1 + ω/100), cf = 0.5 (oven-dry density ρ0 = ρ_ω/(1 + ω)).
  // GL24h at its EN 14080 mean density 420 kg/m³ (from memory) and ω = 12 %:
  // ρ0 = 420/1.12 = 375 kg/m³; C = 0.5 × 375 = 187.5 kg; CO2 = 44/12 × 187.5 = 687.5 kg.
  it("GL24h, ρ = 420 kg/m³ at ω = 12 %: 687.5 kg CO2 per m³", () => expectRelClose(biogenicCo2StoredKg(420, 1, 12), 687.5, 1e-12));
  // The same wood weighed dry: ω = 0 → 44/12 × 0.5 × 375 = 687.5 kg (the carbon does not depend on the water).
  it("the same wood oven-dry (375 kg/m³, ω = 0) stores the same 687.5 kg", () => expectRelClose(biogenicCo2StoredKg(375, 1, 0), 687.5, 1e-12));
  // 470 kg/m³ at 12 %: 44/12 × 0.5 × 470/1.12 = 769.35 kg (the factor table's glulam density).
  it("ρ = 470 kg/m³ at ω = 12 %: 769.35 kg CO2 per m³", () => expectAbsClose(biogenicCo2StoredKg(470, 1, 12), 769.345, 1e-3));
});
