import { describe, it, expect } from "vitest";
import {
  assessCarbon,
  biogenicCo2PerKg,
  biogenicCo2StoredKg,
  DEFAULT_CARBON_SETTINGS,
  defaultFactorRows,
  materialCarbon,
  transportFactorKgCO2ePerKg,
  wasteFactor,
  type CarbonSettings,
  type FactorRow,
} from "../../src/carbon";
import type { TakeoffRow } from "../../src/takeoff/takeoff-row";
import { expectAbsClose, expectRelClose } from "../helpers/close";

const MODES = DEFAULT_CARBON_SETTINGS.transportModes;

describe("A4 transport: the default scenarios of IStructE, How to calculate embodied carbon, 2nd ed. (2022)", () => {
  // Guide's A4 default scenarios (from memory) with road 0.10749 and sea 0.01614 kgCO2e/t·km
  // (national GHG conversion factors as quoted by the guide). By hand: ECF_A4 = Σ d·TF / 1000,
  // e.g. 300 × 0.10749 / 1000 = 0.0322. The guide prints three decimals, hence abs 5e-4.
  const road = (km: number) => transportFactorKgCO2ePerKg([{ mode: "road", distanceKm: km }], MODES);
  it("locally manufactured, 50 km road → 0.005 kgCO2e/kg", () => expectAbsClose(road(50), 0.005, 5e-4));
  it("nationally manufactured, 300 km road → 0.032 kgCO2e/kg", () => expectAbsClose(road(300), 0.032, 5e-4));
  it("European manufacture, 1,500 km road → 0.161 kgCO2e/kg", () => expectAbsClose(road(1500), 0.161, 5e-4));
  it("globally manufactured, 200 km road + 10,000 km sea → 0.183 kgCO2e/kg", () => {
    // 200 × 0.10749/1000 + 10,000 × 0.01614/1000 = 0.0215 + 0.1614 = 0.1829
    const value = transportFactorKgCO2ePerKg(
      [
        { mode: "road", distanceKm: 200 },
        { mode: "sea", distanceKm: 10000 },
      ],
      MODES,
    );
    expectAbsClose(value, 0.183, 5e-4);
  });
  it("names a mode with no factor", () => {
    expect(() => transportFactorKgCO2ePerKg([{ mode: "rail", distanceKm: 10 }], MODES)).toThrow(/no transport factor for mode "rail"/);
  });
});

describe("biogenic carbon, EN 16449:2014 eq. 1", () => {
  // P_CO2 = 44/12 · cf · ρ_ω · V_ω / (1 + ω/100), cf = 0.5. Per kg at ω = 12 %:
  // 3.6667 × 0.5 / 1.12 = 1.637 kg CO2/kg (the figure the IStructE guide quotes for timber, from memory).
  it("1.637 kg CO2 per kg of timber at ω = 12 %", () => expectAbsClose(biogenicCo2PerKg(12), 1.637, 5e-4));
  it("scales with ρV: 470 kg/m³ × 2 m³ at 12 % stores 2 × 470 × 1.637 kg", () => {
    expectRelClose(biogenicCo2StoredKg(470, 2, 12), 2 * 470 * ((44 / 12) * 0.5) / 1.12, 1e-12);
  });
  it("the bundled glulam row stores the EN 16449 figure", () => {
    const glulam = defaultFactorRows().find((r) => r.material === "glulam");
    expectAbsClose(glulam?.biogenicKgCO2ePerKg ?? NaN, biogenicCo2PerKg(12), 5e-4);
  });
  it("rejects a moisture content above 100 %", () => expect(() => biogenicCo2StoredKg(470, 1, 120)).toThrow(/moisture content: 120/));
});

describe("A5 wastage, IStructE 2nd ed. (2022): WF = 1/(1 − WR) − 1", () => {
  // WR = 5 %: 1/0.95 − 1 = 0.05263 (the guide tabulates 0.053 for concrete and rebar, from memory).
  it("WR = 5 % gives WF = 0.0526", () => expectAbsClose(wasteFactor(5), 0.0526, 5e-5));
  it("WR = 0 gives WF = 0", () => expect(wasteFactor(0)).toBe(0));
  it("rejects WR = 100 %", () => expect(() => wasteFactor(100)).toThrow(/waste rate < 100/));

  const factor: FactorRow = {
    material: "concrete-c30-37",
    label: "test concrete",
    a1a3KgCO2ePerKg: 0.13,
    densityKgPerM3: 2400,
    transportKmRoad: 50,
    transportKmSea: 0,
    wasteRatePct: 5,
    endOfLifeKgCO2ePerKg: 0.01,
    moduleDKgCO2ePerKg: 0,
    biogenicKgCO2ePerKg: 0,
    source: "test input",
    notes: "",
  };
  it("the wasted mass is counted once, in A5, with its A1–A3, A4 and C", () => {
    // Installed 1000 kg, delivered 1000/0.95 kg; the wasted 52.63 kg carry (0.13 + 0.0053745 + 0.01).
    const m = materialCarbon(1000, factor, MODES);
    const perKg = 0.13 + (50 * 0.10749) / 1000 + 0.01;
    expectRelClose(m.a1a3KgCO2e, 1000 * 0.13, 1e-12); // installed mass only
    expectRelClose(m.a5KgCO2e, 1000 * (1 / 0.95 - 1) * perKg, 1e-12);
    // A1–A3 + A4 + A5 + C = the delivered mass × the whole factor: nothing counted twice.
    expectRelClose(m.a1a3KgCO2e + m.a4KgCO2e + m.a5KgCO2e + m.cKgCO2e, (1000 / 0.95) * perKg, 1e-12);
  });
});

describe("assessCarbon on a small hand-checked take-off", () => {
  // Test inputs (not published data): 100 t of open section and 20 t of glulam, 10 % allowance,
  // usable floor 5,000 m², plan 8,000 m². Expected values written as the formula.
  const steel: FactorRow = {
    material: "steel-open-section", label: "s", a1a3KgCO2ePerKg: 1.55, densityKgPerM3: 7850, transportKmRoad: 300, transportKmSea: 0,
    wasteRatePct: 1, endOfLifeKgCO2ePerKg: 0.01, moduleDKgCO2ePerKg: -0.4, biogenicKgCO2ePerKg: 0, source: "test input", notes: "",
  };
  const glulam: FactorRow = {
    material: "glulam", label: "g", a1a3KgCO2ePerKg: 0.512, densityKgPerM3: 470, transportKmRoad: 1500, transportKmSea: 0,
    wasteRatePct: 1, endOfLifeKgCO2ePerKg: 0.03, moduleDKgCO2ePerKg: -0.4, biogenicKgCO2ePerKg: 1.637, source: "test input", notes: "",
  };
  const rows: TakeoffRow[] = [
    { element: "trusses", material: "steel-open-section", costItem: "steel-truss", quantity: 100, unit: "t", massKg: 100_000 },
    { element: "purlins", material: "glulam", costItem: "steel-secondary", quantity: 20, unit: "t", massKg: 20_000 },
    { element: "formwork", material: null, costItem: "formwork", quantity: 500, unit: "m2", massKg: 0 },
  ];
  const settings: CarbonSettings = { ...DEFAULT_CARBON_SETTINGS, quantityAllowancePct: 10 };
  const result = assessCarbon(rows, [steel, glulam], settings, { usableFloorM2: 5000, planAreaM2: 8000, roofSurfaceM2: 9000 });
  const mS = 110_000;
  const mG = 22_000;
  const wf = 1 / 0.99 - 1;
  const a4S = (300 * 0.10749) / 1000;
  const a4G = (1500 * 0.10749) / 1000;

  it("A1–A3 = Σ mass × factor, allowance on the mass", () => expectRelClose(result.totals.a1a3, mS * 1.55 + mG * 0.512, 1e-12));
  it("A4 = Σ mass × distance × mode factor", () => expectRelClose(result.totals.a4, mS * a4S + mG * a4G, 1e-12));
  it("A5 = Σ mass × WF × (A1–A3 + A4 + C factors)", () => expectRelClose(result.totals.a5, mS * wf * (1.55 + a4S + 0.01) + mG * wf * (0.512 + a4G + 0.03), 1e-12));
  it("counted = A1–A3 + A4 + A5 + C; D and biogenic apart", () => {
    const t = result.totals;
    expectRelClose(t.counted, t.a1a3 + t.a4 + t.a5 + t.c, 1e-12);
    expectRelClose(t.moduleD, -0.4 * (mS + mG), 1e-12);
    expectRelClose(t.biogenic, 1.637 * mG, 1e-12);
  });
  it("per m² of usable floor and of plan, the basis carried", () => {
    expect(result.perM2.basis).toBe("usable-floor");
    expectRelClose(result.perM2UsableFloor.perM2?.counted ?? NaN, result.totals.counted / 5000, 1e-12);
    expectRelClose(result.perM2Plan.perM2?.counted ?? NaN, result.totals.counted / 8000, 1e-12);
  });
  it("a row with no material carries no carbon", () => expect(result.rows[2]?.countedKgCO2e).toBe(0));
  it("leaving out A4, A5 and C counts A1–A3 only", () => {
    const only = assessCarbon(rows, [steel, glulam], { ...settings, countA4: false, countA5: false, countC: false }, { usableFloorM2: 5000, planAreaM2: 8000, roofSurfaceM2: 9000 });
    expectRelClose(only.totals.counted, only.totals.a1a3, 1e-12);
    expect(only.modulesCounted).toEqual(["A1–A3"]);
  });
  it("names a material with no factor row", () => {
    expect(() => assessCarbon(rows, [steel], settings, { usableFloorM2: 1, planAreaM2: 1, roofSurfaceM2: 1 })).toThrow(/no carbon factor for material "glulam" \(row 2, element "purlins"\)/);
  });
  it("names an invalid area", () => {
    expect(() => assessCarbon(rows, [steel, glulam], settings, { usableFloorM2: -1, planAreaM2: 1, roofSurfaceM2: 1 })).toThrow(/invalid usableFloorM2: -1/);
  });
  it("names an invalid setting", () => {
    expect(() => assessCarbon(rows, [steel, glulam], { ...settings, quantityAllowancePct: 80 }, { usableFloorM2: 1, planAreaM2: 1, roofSurfaceM2: 1 })).toThrow(/quantityAllowancePct: 80/);
  });
});
