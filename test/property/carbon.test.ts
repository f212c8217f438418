import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { assessCarbon, countedCarbonPerM2UsableFloor, DEFAULT_CARBON_SETTINGS, defaultFactorRows, type CarbonTotals, type FactorRow } from "../../src/carbon";
import { MATERIALS, type MaterialId } from "../../src/materials";
import type { TakeoffRow } from "../../src/takeoff/takeoff-row";
import { expectRelClose, expectAbsClose } from "../helpers/close";

// Invariants of the carbon method (STYLE.md habit 12): carbon is linear in each factor and in
// mass, additive over rows, and module D never enters the counted total.

const AREAS = { usableFloorM2: 4000, planAreaM2: 6000, roofSurfaceM2: 7000 };
const materialArb = fc.constantFrom(...MATERIALS.map((m) => m.id as MaterialId));
const rowArb: fc.Arbitrary<TakeoffRow> = fc.record({
  element: fc.constantFrom("ring", "cables", "membrane", "shell"),
  material: fc.option(materialArb, { nil: null, freq: 6 }),
  costItem: fc.constant("steel-ring" as const),
  quantity: fc.constant(1),
  unit: fc.constant("nr" as const),
  // Zero or a real mass from 1 g to 10,000 t (subnormal doubles lose relative precision and mean nothing here).
  massKg: fc.oneof(fc.constant(0), fc.double({ min: 1e-3, max: 1e7, noNaN: true })),
});
const rowsArb = fc.array(rowArb, { minLength: 1, maxLength: 12 });
const settingsArb = fc.record({
  countA4: fc.boolean(),
  countA5: fc.boolean(),
  countC: fc.boolean(),
  quantityAllowancePct: fc.double({ min: 0, max: 50, noNaN: true }),
});
const MODULES: (keyof CarbonTotals)[] = ["a1a3", "a4", "a5", "c", "counted", "moduleD", "biogenic"];

function closeTotals(actual: CarbonTotals, expected: CarbonTotals): void {
  for (const key of MODULES) {
    // Sums of up to 12 products in double precision: a relative 1e-9 is far above rounding.
    if (Math.abs(expected[key]) < 1e-9) expectAbsClose(actual[key], expected[key], 1e-9);
    else expectRelClose(actual[key], expected[key], 1e-9);
  }
}

describe("assessCarbon invariants", () => {
  const factors = defaultFactorRows();

  it("doubling every A1–A3 factor doubles A1–A3", () => {
    fc.assert(
      fc.property(rowsArb, settingsArb, (rows, s) => {
        const settings = { ...DEFAULT_CARBON_SETTINGS, ...s };
        const doubled: FactorRow[] = factors.map((f) => ({ ...f, a1a3KgCO2ePerKg: 2 * f.a1a3KgCO2ePerKg }));
        const base = assessCarbon(rows, factors, settings, AREAS).totals.a1a3;
        const twice = assessCarbon(rows, doubled, settings, AREAS).totals.a1a3;
        if (base === 0) expectAbsClose(twice, 0, 0);
        else expectRelClose(twice, 2 * base, 1e-12);
      }),
    );
  });

  it("carbon is additive over rows", () => {
    fc.assert(
      fc.property(rowsArb, rowsArb, settingsArb, (a, b, s) => {
        const settings = { ...DEFAULT_CARBON_SETTINGS, ...s };
        const ta = assessCarbon(a, factors, settings, AREAS).totals;
        const tb = assessCarbon(b, factors, settings, AREAS).totals;
        const both = assessCarbon([...a, ...b], factors, settings, AREAS).totals;
        const sum = Object.fromEntries(MODULES.map((k) => [k, ta[k] + tb[k]])) as CarbonTotals;
        closeTotals(both, sum);
      }),
    );
  });

  it("zero mass gives zero carbon in every module", () => {
    fc.assert(
      fc.property(rowsArb, settingsArb, (rows, s) => {
        const zero = rows.map((r) => ({ ...r, massKg: 0 }));
        const t = assessCarbon(zero, factors, { ...DEFAULT_CARBON_SETTINGS, ...s }, AREAS).totals;
        for (const key of MODULES) expectAbsClose(t[key], 0, 0);
      }),
    );
  });

  it("a unit change (mass × 1000, every per-kg factor and t·km factor ÷ 1000) leaves every module unchanged", () => {
    // kg ↔ t: the same take-off with masses in the smaller unit and factors per that unit.
    fc.assert(
      fc.property(rowsArb, settingsArb, (rows, s) => {
        const settings = { ...DEFAULT_CARBON_SETTINGS, ...s };
        const scaledRows = rows.map((r) => ({ ...r, massKg: r.massKg * 1000 }));
        const scaledFactors = factors.map((f) => ({
          ...f,
          a1a3KgCO2ePerKg: f.a1a3KgCO2ePerKg / 1000,
          endOfLifeKgCO2ePerKg: f.endOfLifeKgCO2ePerKg / 1000,
          moduleDKgCO2ePerKg: f.moduleDKgCO2ePerKg / 1000,
          biogenicKgCO2ePerKg: f.biogenicKgCO2ePerKg / 1000,
        }));
        const scaledModes = settings.transportModes.map((m) => ({ ...m, kgCO2ePerTonneKm: m.kgCO2ePerTonneKm / 1000 }));
        const base = assessCarbon(rows, factors, settings, AREAS).totals;
        const scaled = assessCarbon(scaledRows, scaledFactors, { ...settings, transportModes: scaledModes }, AREAS).totals;
        closeTotals(scaled, base);
      }),
    );
  });

  it("a row's quantity and unit do not change its carbon (carbon reads massKg)", () => {
    fc.assert(
      fc.property(rowsArb, settingsArb, (rows, s) => {
        const settings = { ...DEFAULT_CARBON_SETTINGS, ...s };
        const inTonnes = rows.map((r) => ({ ...r, unit: "t" as const, quantity: r.massKg / 1000 }));
        closeTotals(assessCarbon(inTonnes, factors, settings, AREAS).totals, assessCarbon(rows, factors, settings, AREAS).totals);
      }),
    );
  });

  it("module D never changes the counted total", () => {
    fc.assert(
      fc.property(rowsArb, settingsArb, fc.array(fc.double({ min: -20, max: 20, noNaN: true }), { minLength: factors.length, maxLength: factors.length }), (rows, s, ds) => {
        const settings = { ...DEFAULT_CARBON_SETTINGS, ...s };
        const changed = factors.map((f, i) => ({ ...f, moduleDKgCO2ePerKg: ds[i] ?? 0 }));
        const base = assessCarbon(rows, factors, settings, AREAS).totals.counted;
        const withD = assessCarbon(rows, changed, settings, AREAS).totals.counted;
        expectAbsClose(withD, base, 0);
      }),
    );
  });
});

describe("countedCarbonPerM2UsableFloor (the proportion search's objective)", () => {
  const factors = defaultFactorRows();
  it("is assessCarbon's counted carbon per m² of usable floor to the last bit, and null where that is", () => {
    fc.assert(
      fc.property(rowsArb, settingsArb, fc.oneof(fc.constant(0), fc.double({ min: 1, max: 1e5, noNaN: true })), (rows, s, floor) => {
        const settings = { ...DEFAULT_CARBON_SETTINGS, ...s };
        const areas = { ...AREAS, usableFloorM2: floor };
        const full = assessCarbon(rows, factors, settings, areas).perM2UsableFloor.perM2?.counted ?? null;
        return Object.is(countedCarbonPerM2UsableFloor(rows, factors, settings, areas), full);
      }),
      { numRuns: 300 },
    );
  });
  it("refuses what assessCarbon refuses (a material with no factor)", () => {
    const row: TakeoffRow = { element: "ring", material: "steel-plate", costItem: "steel-ring", quantity: 1, unit: "nr", massKg: 10 };
    const without = factors.filter((f) => f.material !== "steel-plate");
    expect(() => countedCarbonPerM2UsableFloor([row], without, DEFAULT_CARBON_SETTINGS, AREAS)).toThrow(/no carbon factor for material "steel-plate"/);
  });
});
