import { describe, it, expect } from "vitest";
import { defaultCatalogue, parseGlulamCatalogue, CsvError } from "../../src/catalogue";

// EN 14080:2013 Table 5, homogeneous glulam, characteristic values (from memory: the table was
// not read here; the same numbers are in data/glulam.csv, which these checks guard against typos).
describe("glulam strength classes (EN 14080:2013 Table 5, from memory)", () => {
  const byClass = new Map(defaultCatalogue().glulam.map((g) => [g.strengthClass, g]));
  it("GL24h: f_m 24, f_t,0 19.2, f_c,0 24, f_v 3.5 MPa; E_0,mean 11 500, E_0,05 9 600 MPa; ρ_k 385, ρ_mean 420 kg/m³", () => {
    const g = byClass.get("GL24h")!;
    expect([g.bendingPa, g.tensionPa, g.compressionPa, g.shearPa]).toEqual([24e6, 19.2e6, 24e6, 3.5e6]);
    expect([g.modulusMeanPa, g.modulus5PctPa]).toEqual([11.5e9, 9.6e9]);
    expect([g.densityCharacteristicKgPerM3, g.densityMeanKgPerM3]).toEqual([385, 420]);
  });
  it("GL28h: f_m 28, f_c,0 28 MPa; E_0,mean 12 600, E_0,05 10 500 MPa; ρ_k 425 kg/m³", () => {
    const g = byClass.get("GL28h")!;
    expect([g.bendingPa, g.compressionPa, g.modulusMeanPa, g.modulus5PctPa, g.densityCharacteristicKgPerM3]).toEqual([28e6, 28e6, 12.6e9, 10.5e9, 425]);
  });
  it("GL30h: f_m 30, f_c,0 30 MPa; E_0,mean 13 600, E_0,05 11 300 MPa; ρ_k 430 kg/m³", () => {
    const g = byClass.get("GL30h")!;
    expect([g.bendingPa, g.compressionPa, g.modulusMeanPa, g.modulus5PctPa, g.densityCharacteristicKgPerM3]).toEqual([30e6, 30e6, 13.6e9, 11.3e9, 430]);
  });
  it("GL32h: f_m 32, f_c,0 32 MPa; E_0,mean 14 200, E_0,05 11 800 MPa; ρ_k 440 kg/m³", () => {
    const g = byClass.get("GL32h")!;
    expect([g.bendingPa, g.compressionPa, g.modulusMeanPa, g.modulus5PctPa, g.densityCharacteristicKgPerM3]).toEqual([32e6, 32e6, 14.2e9, 11.8e9, 440]);
  });
  it("every class names its source", () => expect(defaultCatalogue().glulam.every((g) => /EN 14080/.test(g.source))).toBe(true));
});

describe("parseGlulamCatalogue", () => {
  const header = "strength_class,f_m_k_mpa,f_t_0_k_mpa,f_c_0_k_mpa,f_v_k_mpa,e_0_mean_mpa,e_0_05_mpa,rho_k_kg_per_m3,rho_mean_kg_per_m3,source";
  it("reports a bad cell by line and column", () => {
    expect(() => parseGlulamCatalogue(`${header}\nGL24h,24,19.2,x,3.5,11500,9600,385,420,s`)).toThrow(/line 2, column f_c_0_k_mpa/);
  });
  it("refuses a class given twice", () => {
    const row = "GL24h,24,19.2,24,3.5,11500,9600,385,420,s";
    expect(() => parseGlulamCatalogue(`${header}\n${row}\n${row}`)).toThrow(CsvError);
  });
});
