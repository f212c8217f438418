import { headline, type Headline, type SchemeResult } from "../pipeline";

/** Columns of the side-by-side table: key in the headline, heading with unit, digits. */
export const COMPARISON_COLUMNS = [
  { key: "label", heading: "Scheme", digits: null },
  { key: "usable_floor_m2", heading: "Usable floor (m²)", digits: 0 },
  { key: "self_weight_kg_per_m2", heading: "Self-weight (kg/m² plan)", digits: 1 },
  { key: "steel_t", heading: "Steel (t)", digits: 0 },
  { key: "cable_t", heading: "Cable (t)", digits: 0 },
  { key: "fabric_t", heading: "Fabric (t)", digits: 1 },
  { key: "concrete_t", heading: "Concrete (t)", digits: 0 },
  { key: "carbon_t", heading: "Carbon (tCO2e)", digits: 0 },
  { key: "carbon_kgco2e_per_m2_floor", heading: "Carbon (kgCO2e/m² floor)", digits: 0 },
  { key: "cost_m", heading: "Cost (million)", digits: 1 },
  { key: "cost_per_m2_floor", heading: "Cost (per m² floor)", digits: 0 },
  { key: "governing", heading: "Governing check", digits: null },
  { key: "verdict", heading: "Feasible", digits: null },
  { key: "warning_count", heading: "Warnings", digits: 0 },
] as const;

/** Concrete mass from the take-off, t (the headline gives m³). */
function concreteTonnes(result: SchemeResult): number {
  return result.design.takeoff.filter((r) => r.unit === "m3" && r.material !== null && r.material.startsWith("concrete")).reduce((s, r) => s + r.massKg, 0) / 1000;
}

/** One row of the side-by-side comparison: the columns of COMPARISON_COLUMNS, plus `id`. */
export type ComparisonRow = Record<(typeof COMPARISON_COLUMNS)[number]["key"] | "id", string | number | null>;

/**
 * The side-by-side comparison, one row per scheme, with the columns of COMPARISON_COLUMNS (plus
 * `id`). Plain objects: five rows and two derived columns need no table library.
 */
export function comparisonTable(results: readonly SchemeResult[]): ComparisonRow[] {
  return results.map((r) => {
    const h: Headline = headline(r);
    return {
      id: h.id,
      label: h.label,
      usable_floor_m2: h.usable_floor_m2,
      self_weight_kg_per_m2: h.self_weight_kg_per_m2,
      steel_t: h.steel_t,
      cable_t: h.cable_t,
      fabric_t: h.fabric_t,
      concrete_t: concreteTonnes(r),
      carbon_t: h.carbon_total_kgco2e === null ? null : h.carbon_total_kgco2e / 1000,
      carbon_kgco2e_per_m2_floor: h.carbon_kgco2e_per_m2_floor,
      cost_m: h.cost_total === null ? null : h.cost_total / 1e6,
      cost_per_m2_floor: h.cost_per_m2_floor,
      governing: h.feasible ? `${h.governing} (${h.max_utilisation.toFixed(2)})` : "",
      verdict: h.feasible ? "yes" : `no: ${h.reason}`,
      warning_count: h.warnings.length,
    };
  });
}

/** The table as header + text rows for display and CSV, formatted with each column's digits. */
export function comparisonRows(objects: readonly ComparisonRow[]): { header: string[]; rows: string[][] } {
  return {
    header: COMPARISON_COLUMNS.map((c) => c.heading),
    rows: objects.map((o) =>
      COMPARISON_COLUMNS.map((c) => {
        const value = o[c.key];
        if (c.digits === null) return String(value ?? "");
        return typeof value === "number" && Number.isFinite(value) ? value.toLocaleString("en-GB", { maximumFractionDigits: c.digits, minimumFractionDigits: c.digits }) : "–";
      }),
    ),
  };
}
