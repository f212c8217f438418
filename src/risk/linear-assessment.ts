import type { Design } from "../schemes/types";
import type { RiskStudy } from "./risk-study";
import { materialCarbon } from "../carbon";
import { applyOnCosts } from "../cost";

/** A design's take-off reduced to what carbon and cost read: mass per material, quantity per rate item. */
export type DesignQuantities = {
  massKgByMaterial: [material: string, massKg: number][];
  quantityByItem: [item: string, quantity: number][];
  usableFloorM2: number;
};

/** Sums a design's take-off rows by material (mass, kg) and by cost item (quantity in the item's unit). */
export function designQuantities(design: Design): DesignQuantities {
  const mass = new Map<string, number>();
  const quantity = new Map<string, number>();
  for (const row of design.takeoff) {
    if (row.material !== null) mass.set(row.material, (mass.get(row.material) ?? 0) + row.massKg);
    quantity.set(row.costItem, (quantity.get(row.costItem) ?? 0) + row.quantity);
  }
  return { massKgByMaterial: [...mass], quantityByItem: [...quantity], usableFloorM2: design.usableFloorM2 };
}

/** Counted carbon per kg of take-off mass, kgCO2e/kg, and all-in cost per unit, currency/unit (NaN: no factor or rate). */
export type Intensities = { carbonPerKg: Map<string, number>; costPerUnit: Map<string, number> };

/**
 * The carbon and cost of one unit of each material and cost item under a study's tables, by the
 * pipeline's own per-material and on-cost functions (materialCarbon, applyOnCosts). Both
 * assessments are linear in the take-off (assessCarbon: each row's carbon is materialCarbon of its
 * mass × (1 + allowance), A1–A3 plus the counted modules, summed; assessCost: Σ quantity × rate ×
 * location factor, then on-costs that compound by percentages), so a design's carbon and cost are
 * Σ quantity × intensity. test/unit/risk/linear-assessment.test.ts checks this against assessDesign.
 * The tables are not validated here: checkRiskInputs validates the study at the ends of every range.
 */
export function assessmentIntensities(study: RiskStudy, materials: Iterable<string>, items: Iterable<string>): Intensities {
  const settings = study.carbon.settings;
  const allowance = 1 + settings.quantityAllowancePct / 100;
  const wastage = { includeA4: settings.countA4, includeC: settings.countC };
  const factorByMaterial = new Map(study.carbon.factors.map((f) => [f.material, f]));
  const carbonPerKg = new Map<string, number>();
  for (const material of materials) {
    const factor = factorByMaterial.get(material);
    if (!factor) {
      carbonPerKg.set(material, Number.NaN);
      continue;
    }
    const m = materialCarbon(allowance, factor, settings.transportModes, wastage);
    carbonPerKg.set(material, m.a1a3KgCO2e + (settings.countA4 ? m.a4KgCO2e : 0) + (settings.countA5 ? m.a5KgCO2e : 0) + (settings.countC ? m.cKgCO2e : 0));
  }
  const multiplier = applyOnCosts(1, study.cost.onCosts).total;
  const rateByItem = new Map(study.cost.rates.map((r) => [r.item, r.rate]));
  const costPerUnit = new Map<string, number>();
  for (const item of items) {
    const rate = rateByItem.get(item);
    costPerUnit.set(item, rate === undefined ? Number.NaN : rate * study.cost.onCosts.locationFactor * multiplier);
  }
  return { carbonPerKg, costPerUnit };
}

/** Carbon (kgCO2e) and cost (currency) per m² of usable floor of a design from unit intensities; NaN without floor. */
export function linearAssessment(q: DesignQuantities, intensities: Intensities): { carbonPerM2Floor: number; costPerM2Floor: number } {
  if (!(q.usableFloorM2 > 0)) return { carbonPerM2Floor: Number.NaN, costPerM2Floor: Number.NaN };
  let carbon = 0;
  for (const [material, mass] of q.massKgByMaterial) carbon += mass * (intensities.carbonPerKg.get(material) ?? Number.NaN);
  let cost = 0;
  for (const [item, quantity] of q.quantityByItem) cost += quantity * (intensities.costPerUnit.get(item) ?? Number.NaN);
  return { carbonPerM2Floor: carbon / q.usableFloorM2, costPerM2Floor: cost / q.usableFloorM2 };
}
