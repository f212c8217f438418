import type { TakeoffRow } from "../takeoff/takeoff-row";
import { validateOnce } from "../kernel/validate";
import { FactorTableSchema, type FactorRow } from "./factor-table";
import { CarbonSettingsSchema, type AreaBasis, type CarbonSettings } from "./carbon-settings";
import { areaForBasis, checkAreas, type AssessmentAreas } from "../takeoff/assessment-areas";
import { materialCarbon, type ModuleCarbon } from "./material-carbon";
import { MissingRowsError, missingMaterials } from "../takeoff/missing-rows";

/** One take-off row's carbon, kgCO2e, with the mass it was computed from (allowance included). */
export type CarbonRowResult = ModuleCarbon & {
  element: string;
  material: string | null;
  /** Take-off mass × (1 + allowance), kg. */
  massKg: number;
  /** A1–A3 plus the modules the settings count, kgCO2e. */
  countedKgCO2e: number;
};

/** Totals by module, kgCO2e (biogenic: kg CO2 stored). `counted` = A1–A3 + the counted modules. */
export type CarbonTotals = {
  a1a3: number;
  a4: number;
  a5: number;
  c: number;
  counted: number;
  moduleD: number;
  biogenic: number;
};

/** Totals divided by an area, kgCO2e/m²; null when the area is 0. */
export type CarbonPerM2 = { basis: AreaBasis; areaM2: number; perM2: CarbonTotals | null };

/** A group's mass and totals (by material or by element). */
export type CarbonGroup = { key: string; massKg: number; totals: CarbonTotals };

export type CarbonAssessment = {
  rows: CarbonRowResult[];
  totals: CarbonTotals;
  byMaterial: CarbonGroup[];
  byElement: CarbonGroup[];
  /** Per m² on the settings' area basis. */
  perM2: CarbonPerM2;
  perM2UsableFloor: CarbonPerM2;
  perM2Plan: CarbonPerM2;
  /** Which modules were counted, for captions. */
  modulesCounted: string[];
  factorSetName: string;
  quantityAllowancePct: number;
  warnings: string[];
};

const ZERO: CarbonTotals = { a1a3: 0, a4: 0, a5: 0, c: 0, counted: 0, moduleD: 0, biogenic: 0 };

function add(a: CarbonTotals, row: CarbonRowResult): CarbonTotals {
  return {
    a1a3: a.a1a3 + row.a1a3KgCO2e,
    a4: a.a4 + row.a4KgCO2e,
    a5: a.a5 + row.a5KgCO2e,
    c: a.c + row.cKgCO2e,
    counted: a.counted + row.countedKgCO2e,
    moduleD: a.moduleD + row.moduleDKgCO2e,
    biogenic: a.biogenic + row.biogenicKgCO2,
  };
}

function divide(totals: CarbonTotals, basis: AreaBasis, areaM2: number): CarbonPerM2 {
  if (areaM2 === 0) return { basis, areaM2, perM2: null };
  const per = Object.fromEntries(Object.entries(totals).map(([k, value]) => [k, value / areaM2])) as CarbonTotals;
  return { basis, areaM2, perM2: per };
}

function group(rows: readonly CarbonRowResult[], keyOf: (row: CarbonRowResult) => string | null): CarbonGroup[] {
  const groups = new Map<string, CarbonGroup>();
  for (const row of rows) {
    const key = keyOf(row);
    if (key === null) continue;
    const current = groups.get(key) ?? { key, massKg: 0, totals: ZERO };
    groups.set(key, { key, massKg: current.massKg + row.massKg, totals: add(current.totals, row) });
  }
  return [...groups.values()];
}

function fail(what: string, problems: { path: string; message: string }[]): never {
  throw new Error(`invalid ${what}: ${problems.map((p) => `${p.path}: ${p.message}`).join("; ")}`);
}

/** The inputs checked and each row's carbon by module (assessCarbon's rows), with the rows' warnings. @throws as assessCarbon */
function carbonOfRows(rows: readonly TakeoffRow[], factors: readonly FactorRow[], settings: CarbonSettings, areas: AssessmentAreas): { results: CarbonRowResult[]; warnings: string[] } {
  const checkedFactors = validateOnce(FactorTableSchema, factors);
  if (!checkedFactors.ok) fail("carbon factors", checkedFactors.problems.map((p) => ({ ...p, path: `factors${p.path === "(study)" ? "" : p.path}` })));
  const checkedSettings = validateOnce(CarbonSettingsSchema, settings);
  if (!checkedSettings.ok) fail("carbon settings", checkedSettings.problems);
  checkAreas(areas);

  const byId = new Map(factors.map((f) => [f.material, f]));
  const warnings: string[] = [];
  const missing = missingMaterials(rows, factors);
  if (missing.length > 0) throw new MissingRowsError("factors", missing.map((m) => m.key), `no carbon factor for ${missing.map((m) => `material "${m.key}" (${m.where})`).join(", ")}; add ${missing.length === 1 ? "a row for it" : "rows for them"} to the factor table`);
  rows.forEach((row, index) => {
    const where = `row ${index + 1}, element "${row.element}"`;
    if (!(Number.isFinite(row.massKg) && row.massKg >= 0)) throw new Error(`invalid massKg (${where}): ${row.massKg} kg (expected a finite mass ≥ 0)`);
    if (row.unit === "t" && Math.abs(row.quantity * 1000 - row.massKg) > 1e-6 * Math.max(1, row.massKg)) {
      warnings.push(`${where}: quantity ${row.quantity} t does not match massKg ${row.massKg} kg; carbon uses massKg`);
    }
  });

  const allowance = 1 + settings.quantityAllowancePct / 100;
  const wastage = { includeA4: settings.countA4, includeC: settings.countC };
  const results: CarbonRowResult[] = rows.map((row) => {
    const massKg = row.massKg * allowance;
    const factor = row.material === null ? undefined : byId.get(row.material);
    if (factor === undefined) {
      return { element: row.element, material: null, massKg, a1a3KgCO2e: 0, a4KgCO2e: 0, a5KgCO2e: 0, cKgCO2e: 0, moduleDKgCO2e: 0, biogenicKgCO2: 0, countedKgCO2e: 0 };
    }
    const m = materialCarbon(massKg, factor, settings.transportModes, wastage);
    const counted = m.a1a3KgCO2e + (settings.countA4 ? m.a4KgCO2e : 0) + (settings.countA5 ? m.a5KgCO2e : 0) + (settings.countC ? m.cKgCO2e : 0);
    return { element: row.element, material: factor.material, massKg, ...m, countedKgCO2e: counted };
  });

  return { results, warnings };
}

/**
 * The counted carbon per m² of usable floor alone, kgCO2e/m² — assessCarbon's
 * perM2UsableFloor.perM2.counted to the last bit (the same rows summed in the same order), without
 * the groupings and the other bases: the proportion search asks it of every candidate and reads
 * nothing else. Null when the usable floor is 0.
 * @throws as assessCarbon
 */
export function countedCarbonPerM2UsableFloor(rows: readonly TakeoffRow[], factors: readonly FactorRow[], settings: CarbonSettings, areas: AssessmentAreas): number | null {
  const { results } = carbonOfRows(rows, factors, settings, areas);
  const counted = results.reduce((sum, r) => sum + r.countedKgCO2e, ZERO.counted);
  return areas.usableFloorM2 === 0 ? null : counted / areas.usableFloorM2;
}

/**
 * Embodied carbon of a take-off by EN 15978 module, per row, per material, per element and per m²,
 * following IStructE, How to calculate embodied carbon, 2nd ed. (2022) (from memory). A1–A3 are
 * always counted; A4, A5 and C as the settings say; module D and biogenic storage are reported
 * apart and never netted. The design-stage quantity allowance multiplies every mass, never a
 * factor. The A5 wastage term carries the wasted mass's A4 and C only when those modules are
 * counted. Rows with no material carry no carbon. Knows materials and masses, not schemes.
 * @throws Error naming the field for invalid factors, settings, areas or row masses;
 * MissingRowsError naming every material that has no factor row (with its first take-off row)
 */
export function assessCarbon(
  rows: readonly TakeoffRow[],
  factors: readonly FactorRow[],
  settings: CarbonSettings,
  areas: AssessmentAreas,
): CarbonAssessment {
  const { results, warnings } = carbonOfRows(rows, factors, settings, areas);
  const totals = results.reduce(add, ZERO);
  const basisArea = areaForBasis(areas, settings.areaBasis);
  const perM2 = divide(totals, settings.areaBasis, basisArea);
  if (basisArea === 0) warnings.push(`${settings.areaBasis} area is 0 m²: no per-m² figure`);
  const modulesCounted = ["A1–A3", ...(settings.countA4 ? ["A4"] : []), ...(settings.countA5 ? ["A5"] : []), ...(settings.countC ? ["C1–C4"] : [])];

  return {
    rows: results,
    totals,
    byMaterial: group(results, (r) => r.material),
    byElement: group(results, (r) => r.element),
    perM2,
    perM2UsableFloor: divide(totals, "usable-floor", areas.usableFloorM2),
    perM2Plan: divide(totals, "covered-plan", areas.planAreaM2),
    modulesCounted,
    factorSetName: settings.factorSetName,
    quantityAllowancePct: settings.quantityAllowancePct,
    warnings,
  };
}
