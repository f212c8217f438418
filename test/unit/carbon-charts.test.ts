import { describe, it, expect } from "vitest";
import { assessCarbon, DEFAULT_CARBON_SETTINGS, defaultFactorRows, checkRowEdit, FactorRowSchema } from "../../src/carbon";
import { assessCost, defaultRateRows, DEFAULT_ON_COSTS, RateRowSchema } from "../../src/cost";
import { carbonByModuleData, carbonByMaterialData, carbonChartOptions, costByElementData, ON_COSTS_PART } from "../../src/charts";
import type { TakeoffRow } from "../../src/takeoff/takeoff-row";
import { expectRelClose } from "../helpers/close";

const rows: TakeoffRow[] = [
  { element: "ring", material: "steel-plate", costItem: "steel-ring", quantity: 50, unit: "t", massKg: 50_000 },
  { element: "cables", material: "steel-strand", costItem: "cable", quantity: 20, unit: "t", massKg: 20_000 },
  { element: "membrane", material: "fabric-ptfe-glass", costItem: "fabric-ptfe-glass", quantity: 10_000, unit: "m2", massKg: 11_500 },
];
const areas = { usableFloorM2: 8000, planAreaM2: 10_000, roofSurfaceM2: 11_000 };
const sum = (xs: { value: number }[]) => xs.reduce((s, d) => s + d.value, 0);

describe("carbon chart data", () => {
  const carbon = assessCarbon(rows, defaultFactorRows(), DEFAULT_CARBON_SETTINGS, areas);
  const schemes = [{ id: "cable-dome", label: "Cable dome", carbon }];
  it("the module stack adds up to the counted total, in t and per m²", () => {
    expectRelClose(sum(carbonByModuleData(schemes, "total-t")), carbon.totals.counted / 1000, 1e-12);
    expectRelClose(sum(carbonByModuleData(schemes, "per-m2-floor")), carbon.totals.counted / 8000, 1e-12);
    expectRelClose(sum(carbonByModuleData(schemes, "per-m2-plan")), carbon.totals.counted / 10_000, 1e-12);
  });
  it("the material stack adds up to the same total", () => {
    expectRelClose(sum(carbonByMaterialData(schemes, "total-t")), carbon.totals.counted / 1000, 1e-12);
    expect(carbonByMaterialData(schemes, "total-t")).toHaveLength(3);
  });
  it("modules not counted are not stacked", () => {
    const only = assessCarbon(rows, defaultFactorRows(), { ...DEFAULT_CARBON_SETTINGS, countA4: false, countC: false }, areas);
    expect(carbonByModuleData([{ id: "x", label: "X", carbon: only }], "total-t").map((d) => d.part)).toEqual(["A1–A3 product", "A5 site wastage"]);
  });
  it("a scheme with no usable floor is left out of a per-m² chart", () => {
    const none = assessCarbon(rows, defaultFactorRows(), DEFAULT_CARBON_SETTINGS, { ...areas, usableFloorM2: 0 });
    expect(carbonByModuleData([{ id: "x", label: "X", carbon: none }], "per-m2-floor")).toEqual([]);
  });
  it("draws a benchmark band only on the per-m² chart of the band's basis", () => {
    const band = { label: "Target", fromKgCO2ePerM2: 0, toKgCO2ePerM2: 250, basis: "usable-floor" as const };
    const base = { schemes, by: "module" as const, bands: [band], title: "t", caption: "c" };
    const none = carbonChartOptions({ ...base, bands: [], metric: "per-m2-floor" }).marks?.length ?? 0;
    expect(carbonChartOptions({ ...base, metric: "per-m2-floor" }).marks?.length).toBeGreaterThan(none);
    expect(carbonChartOptions({ ...base, metric: "per-m2-plan" }).marks).toHaveLength(none);
    expect(carbonChartOptions({ ...base, metric: "total-t" }).marks).toHaveLength(none);
  });
});

describe("cost chart data", () => {
  const cost = assessCost(rows, defaultRateRows(), DEFAULT_ON_COSTS, areas);
  it("elements plus on-costs add up to the total, whole and per m² of usable floor", () => {
    const data = costByElementData([{ id: "x", label: "X", cost }], false);
    expectRelClose(sum(data), cost.totals.total, 1e-12);
    expect(data.at(-1)?.part).toBe(ON_COSTS_PART);
    expectRelClose(sum(costByElementData([{ id: "x", label: "X", cost }], true)), cost.totals.total / 8000, 1e-12);
  });
});

describe("checkRowEdit", () => {
  const plate = defaultFactorRows().find((r) => r.material === "steel-plate")!;
  it("applies a valid number", () => {
    const r = checkRowEdit(FactorRowSchema, plate, "a1a3KgCO2ePerKg", "2.0", "number");
    expect(r).toEqual({ ok: true, row: { ...plate, a1a3KgCO2ePerKg: 2 } });
  });
  it("refuses an out-of-range value with what is allowed", () => {
    expect(checkRowEdit(FactorRowSchema, plate, "wasteRatePct", "70", "number")).toEqual({ ok: false, message: "70 (expected a number from 0 to 50 %)" });
  });
  it("refuses an empty or non-numeric number cell", () => {
    expect(checkRowEdit(FactorRowSchema, plate, "wasteRatePct", " ", "number").ok).toBe(false);
    expect(checkRowEdit(FactorRowSchema, plate, "wasteRatePct", "five", "number")).toEqual({ ok: false, message: '"five" is not a number' });
  });
  it("refuses an edit that breaks a cross-field rule, naming the rule", () => {
    const cable = defaultRateRows().find((r) => r.item === "cable")!;
    const r = checkRowEdit(RateRowSchema, cable, "rate", String(cable.high + 1), "number");
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toMatch(/expected low ≤ rate ≤ high/);
  });
});
