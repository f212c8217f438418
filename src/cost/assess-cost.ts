import type { TakeoffRow } from "../takeoff/takeoff-row";
import { validateOnce } from "../kernel/validate";
import { checkAreas, type AssessmentAreas } from "../takeoff/assessment-areas";
import { MissingRowsError, missingItems } from "../takeoff/missing-rows";
import { RateTableSchema, type RateRow } from "./rate-table";
import type { OnCosts } from "./on-costs";
import { applyOnCosts, type OnCostLine } from "./apply-on-costs";
import { CONCEPT_SCREENING, type EstimateClass } from "./estimate-class";

/** One priced take-off row, currency at the price base, location factor applied. */
export type CostLine = {
  element: string;
  item: string;
  quantity: number;
  unit: string;
  /** Rate × location factor, currency per unit. */
  rate: number;
  /** quantity × rate. */
  cost: number;
  /** quantity × low rate × location factor. */
  low: number;
  /** quantity × high rate × location factor. */
  high: number;
};

export type CostGroup = { key: string; cost: number; low: number; high: number };

export type CostTotals = {
  /** Sum of the cost lines (works), currency. */
  works: number;
  /** Works plus every on-cost, currency. */
  total: number;
  /** Total with every rate at its low end (same on-costs). */
  totalLow: number;
  /** Total with every rate at its high end (same on-costs). */
  totalHigh: number;
};

export type CostAssessment = {
  lines: CostLine[];
  byElement: CostGroup[];
  onCostLines: OnCostLine[];
  totals: CostTotals;
  /** Per m² of usable floor, currency/m²; null when there is no usable floor. */
  perM2UsableFloor: { works: number; total: number } | null;
  perM2Plan: { works: number; total: number } | null;
  /** The areas the per-m² figures were divided by. */
  areas: AssessmentAreas;
  currency: string;
  priceBase: string;
  estimateClass: EstimateClass;
};

/**
 * Elemental order-of-cost estimate of a take-off: each row costs quantity × rate × location factor,
 * its unit checked against the rate row; the on-costs compound in the order works → preliminaries
 * → overheads and profit → design fees → risk → inflation (RICS NRM 1 order, from memory). Results
 * carry their estimate class (concept screening: roughly −50 % to +100 %). Knows items and
 * quantities, not schemes.
 * @throws MissingRowsError naming every item with no rate; Error naming the row and units for a unit mismatch, and
 * the field for invalid rates, on-costs, areas or quantities
 */
export function assessCost(rows: readonly TakeoffRow[], rates: readonly RateRow[], onCosts: OnCosts, areas: AssessmentAreas): CostAssessment {
  const checked = validateOnce(RateTableSchema, rates);
  if (!checked.ok) throw new Error(`invalid rates: ${checked.problems.map((p) => `rates${p.path === "(study)" ? "" : p.path}: ${p.message}`).join("; ")}`);
  checkAreas(areas);
  const byItem = new Map(rates.map((r) => [r.item, r]));
  const missing = missingItems(rows, rates);
  if (missing.length > 0) throw new MissingRowsError("rates", missing.map((m) => m.key), `no rate for ${missing.map((m) => `item "${m.key}" (${m.where})`).join(", ")}; add ${missing.length === 1 ? "a row for it" : "rows for them"} to the rate table`);
  rows.forEach((row, index) => {
    const where = `row ${index + 1}, element "${row.element}"`;
    if (!(Number.isFinite(row.quantity) && row.quantity >= 0)) throw new Error(`invalid quantity (${where}): ${row.quantity} ${row.unit} (expected a finite quantity ≥ 0)`);
    const rate = byItem.get(row.costItem) as RateRow;
    if (rate.unit !== row.unit) throw new Error(`unit mismatch (${where}, item ${row.costItem}): ${row.unit} (expected ${rate.unit}, the unit of the rate)`);
  });

  const factor = onCosts.locationFactor;
  const lines: CostLine[] = rows.map((row) => {
    const rate = byItem.get(row.costItem) as RateRow;
    return {
      element: row.element,
      item: row.costItem,
      quantity: row.quantity,
      unit: row.unit,
      rate: rate.rate * factor,
      cost: row.quantity * rate.rate * factor,
      low: row.quantity * rate.low * factor,
      high: row.quantity * rate.high * factor,
    };
  });

  const groups = new Map<string, CostGroup>();
  for (const line of lines) {
    const g = groups.get(line.element) ?? { key: line.element, cost: 0, low: 0, high: 0 };
    groups.set(line.element, { key: line.element, cost: g.cost + line.cost, low: g.low + line.low, high: g.high + line.high });
  }

  const works = lines.reduce((sum, l) => sum + l.cost, 0);
  const main = applyOnCosts(works, onCosts);
  const low = applyOnCosts(lines.reduce((sum, l) => sum + l.low, 0), onCosts);
  const high = applyOnCosts(lines.reduce((sum, l) => sum + l.high, 0), onCosts);
  const per = (area: number) => (area > 0 ? { works: works / area, total: main.total / area } : null);

  return {
    lines,
    byElement: [...groups.values()],
    onCostLines: main.lines,
    totals: { works, total: main.total, totalLow: low.total, totalHigh: high.total },
    perM2UsableFloor: per(areas.usableFloorM2),
    perM2Plan: per(areas.planAreaM2),
    areas: { ...areas },
    currency: onCosts.currency,
    priceBase: onCosts.priceBase,
    estimateClass: CONCEPT_SCREENING,
  };
}
