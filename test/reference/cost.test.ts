import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { applyOnCosts, assessCost, CONCEPT_SCREENING, DEFAULT_ON_COSTS, defaultRateRows, ON_COST_ORDER, rebaseRate, rebaseRateRows, type OnCosts, type RateRow } from "../../src/cost";
import type { TakeoffRow } from "../../src/takeoff/takeoff-row";
import { expectRelClose } from "../helpers/close";

// Check values are hand calculations of the documented method (elemental order-of-cost on-costs
// compounding works → preliminaries → overheads and profit → design fees → risk → inflation,
// RICS NRM 1 order, from memory); the inputs are test inputs, not market data.

const ON_COSTS: OnCosts = { preliminariesPct: 10, overheadsProfitPct: 5, designFeesPct: 10, riskPct: 20, inflationPct: 3, locationFactor: 1, priceBase: "2026-01", currency: "EUR" };

describe("applyOnCosts", () => {
  const { lines, total } = applyOnCosts(1000, ON_COSTS);
  it("compounds in the documented order", () => {
    expect(lines.map((l) => l.key)).toEqual(["preliminaries", "overheadsProfit", "designFees", "risk", "inflation"]);
    expect(ON_COST_ORDER.map((o) => o.key)).toEqual(lines.map((l) => l.key));
  });
  it("each line is its percentage of the subtotal before it", () => {
    // By hand: 1000 → 1100 → 1155 → 1270.5 → 1524.6 → 1570.338
    const subtotals = [1100, 1155, 1270.5, 1524.6, 1570.338];
    lines.forEach((line, i) => {
      expectRelClose(line.subtotal, subtotals[i] ?? NaN, 1e-12);
      expectRelClose(line.base, i === 0 ? 1000 : (subtotals[i - 1] ?? NaN), 1e-12);
    });
    expectRelClose(total, 1000 * 1.1 * 1.05 * 1.1 * 1.2 * 1.03, 1e-12);
  });
  it("the order shows in the lines: preliminaries on works only, risk on works + prelims + OH&P + fees", () => {
    // The total is a product, so the order shows in each line's base, not in the total.
    expectRelClose(lines[0]?.amount ?? NaN, 100, 1e-12);
    expectRelClose(lines[3]?.amount ?? NaN, 0.2 * 1270.5, 1e-12);
  });
  it("names an invalid on-cost", () => {
    expect(() => applyOnCosts(1, { ...ON_COSTS, riskPct: -5 })).toThrow(/riskPct: -5 \(expected a number from 0 to 100 %\)/);
    expect(() => applyOnCosts(1, { ...ON_COSTS, priceBase: "2026-13" })).toThrow(/priceBase/);
  });
});

describe("assessCost: a hand-checked small estimate", () => {
  const rates: RateRow[] = [
    { item: "steel-truss", label: "t", unit: "t", rate: 5000, low: 4000, high: 7000, basis: "", source: "test input", notes: "" },
    { item: "metal-deck", label: "d", unit: "m2", rate: 150, low: 100, high: 200, basis: "", source: "test input", notes: "" },
  ];
  const rows: TakeoffRow[] = [
    { element: "trusses", material: "steel-open-section", costItem: "steel-truss", quantity: 10, unit: "t", massKg: 10_000 },
    { element: "roof deck", material: "insulated-metal-deck", costItem: "metal-deck", quantity: 2000, unit: "m2", massKg: 56_000 },
  ];
  const onCosts = { ...ON_COSTS, locationFactor: 1.1 };
  const result = assessCost(rows, rates, onCosts, { usableFloorM2: 1000, planAreaM2: 1250, roofSurfaceM2: 2000 });
  // Works: (10 × 5000 + 2000 × 150) × 1.1 = 350,000 × 1.1 = 385,000.
  it("works = Σ quantity × rate × location factor", () => expectRelClose(result.totals.works, 385_000, 1e-12));
  it("cost per element", () => {
    expectRelClose(result.byElement.find((g) => g.key === "trusses")?.cost ?? NaN, 55_000, 1e-12);
    expectRelClose(result.byElement.find((g) => g.key === "roof deck")?.cost ?? NaN, 330_000, 1e-12);
  });
  it("total = works × 1.1 × 1.05 × 1.1 × 1.2 × 1.03, per m² of usable floor ÷ 1000", () => {
    const total = 385_000 * 1.1 * 1.05 * 1.1 * 1.2 * 1.03;
    expectRelClose(result.totals.total, total, 1e-12);
    expectRelClose(result.perM2UsableFloor?.total ?? NaN, total / 1000, 1e-12);
    expectRelClose(result.perM2Plan?.works ?? NaN, 385_000 / 1250, 1e-12);
  });
  it("low and high totals from the low and high rates", () => {
    expectRelClose(result.totals.totalLow, (10 * 4000 + 2000 * 100) * 1.1 * 1.1 * 1.05 * 1.1 * 1.2 * 1.03, 1e-12);
    expectRelClose(result.totals.totalHigh, (10 * 7000 + 2000 * 200) * 1.1 * 1.1 * 1.05 * 1.1 * 1.2 * 1.03, 1e-12);
  });
  it("is labelled with its estimate class", () => {
    expect(result.estimateClass).toBe(CONCEPT_SCREENING);
    expect(result.estimateClass.label).toBe("concept screening: roughly −50 % to +100 %");
    expect(result.currency).toBe("EUR");
  });
  it("checks the row's unit against the rate", () => {
    const wrong: TakeoffRow[] = [{ ...rows[0]!, unit: "m" }];
    expect(() => assessCost(wrong, rates, onCosts, { usableFloorM2: 1, planAreaM2: 1, roofSurfaceM2: 1 })).toThrow(/unit mismatch \(row 1, element "trusses", item steel-truss\): m \(expected t/);
  });
  it("names an item with no rate", () => {
    const cable: TakeoffRow[] = [{ element: "cables", material: "steel-strand", costItem: "cable", quantity: 1, unit: "t", massKg: 1000 }];
    expect(() => assessCost(cable, rates, onCosts, { usableFloorM2: 1, planAreaM2: 1, roofSurfaceM2: 1 })).toThrow(/no rate for item "cable"/);
  });
  it("no usable floor gives no per-m² figure", () => {
    expect(assessCost(rows, rates, onCosts, { usableFloorM2: 0, planAreaM2: 1, roofSurfaceM2: 1 }).perM2UsableFloor).toBeNull();
  });
});

describe("rebaseRate", () => {
  // Index rebasing: rate × to / from (common practice, no source). 100 at index 250 → 110 at 275.
  it("rebases 100 from index 250 to 275 as 110", () => expectRelClose(rebaseRate(100, 250, 275), 110, 1e-12));
  it("round trip is the identity", () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-6, max: 1e7, noNaN: true }), fc.double({ min: 1, max: 1000, noNaN: true }), fc.double({ min: 1, max: 1000, noNaN: true }), (rate, a, b) => {
        const back = rebaseRate(rebaseRate(rate, a, b), b, a);
        expectRelClose(back, rate, 1e-14);
      }),
    );
  });
  it("names a non-positive index", () => expect(() => rebaseRate(1, 0, 1)).toThrow(/invalid fromIndex: 0/));
});

describe("DEFAULT_ON_COSTS", () => {
  it("passes its own schema", () => expect(() => applyOnCosts(1, DEFAULT_ON_COSTS)).not.toThrow());
});

describe("rebaseRateRows", () => {
  const rows = defaultRateRows();
  it("moves rate, low and high by the index ratio (100 → 110 for 250 → 275)", () => {
    const moved = rebaseRateRows(rows, 250, 275);
    moved.forEach((row, i) => {
      expectRelClose(row.rate, (rows[i]?.rate ?? NaN) * 1.1, 1e-12);
      expectRelClose(row.low, (rows[i]?.low ?? NaN) * 1.1, 1e-12);
      expectRelClose(row.high, (rows[i]?.high ?? NaN) * 1.1, 1e-12);
    });
  });
  it("there and back gives the table back", () => {
    rebaseRateRows(rebaseRateRows(rows, 250, 275), 275, 250).forEach((row, i) => expectRelClose(row.rate, rows[i]?.rate ?? NaN, 1e-14));
  });
});
