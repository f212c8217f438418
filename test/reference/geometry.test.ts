import { describe, it } from "vitest";
import { sphericalCap, airDensityKgPerM3 } from "../../src/mechanics";
import { expectAbsClose, expectRelClose } from "../helpers/close";

describe("sphericalCap (elementary geometry)", () => {
  // Base radius 50 m, rise 12.5 m: R = (50² + 12.5²)/(2·12.5) = 106.25 m; φ0 = asin(50/106.25) = 28.07°;
  // surface 2πRh = 8344.9 m²; volume πh²(3R − h)/3 = 50,110 m³.
  const cap = sphericalCap(100, 12.5);
  it("R = 106.25 m", () => expectRelClose(cap.radiusM, 106.25, 1e-12));
  it("edge angle 28.07°", () => expectAbsClose((cap.edgeAngleRad * 180) / Math.PI, 28.07, 0.005));
  it("surface 8344.9 m²", () => expectAbsClose(cap.surfaceM2, 8344.9, 0.05));
  it("volume 50,110 m³", () => expectAbsClose(cap.volumeM3, 50110, 1));
});

describe("airDensityKgPerM3 (ISO 2533 ISA sea level)", () => {
  // 101,325 Pa / (287.05 J/(kg·K) × 288.15 K) = 1.2250 kg/m³
  it("is 1.2250 kg/m³", () => expectAbsClose(airDensityKgPerM3(), 1.225, 5e-5));
});
