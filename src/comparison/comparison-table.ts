import type { SchemeResult } from "../pipeline";
import { MATERIAL_KINDS, type MaterialKind } from "../materials";

type TonnesKey = `${MaterialKind}Tonnes`;

/** One tonnage column per material kind, in the kinds' order. */
const TONNAGE_COLUMNS = MATERIAL_KINDS.map((k) => ({ key: `${k.kind}Tonnes` as TonnesKey, heading: `${k.label} (t)`, digits: k.digits as number | null }));

/** Columns of the side-by-side table: key in the row, heading with unit, digits. */
export const COMPARISON_COLUMNS: readonly { key: ComparisonKey; heading: string; digits: number | null }[] = [
  { key: "label", heading: "Scheme", digits: null },
  { key: "usableFloorM2", heading: "Usable floor (m²)", digits: 0 },
  { key: "selfWeightKgPerM2", heading: "Self-weight (kg/m² plan)", digits: 1 },
  ...TONNAGE_COLUMNS,
  { key: "carbonTonnes", heading: "Carbon (tCO2e)", digits: 0 },
  { key: "carbonKgCO2ePerM2Floor", heading: "Carbon (kgCO2e/m² floor)", digits: 0 },
  { key: "costMillion", heading: "Cost (million)", digits: 1 },
  { key: "costPerM2Floor", heading: "Cost (per m² floor)", digits: 0 },
  { key: "governing", heading: "Governing check", digits: null },
  { key: "verdict", heading: "Feasible", digits: null },
  { key: "warningCount", heading: "Warnings", digits: 0 },
];

type ComparisonKey = "id" | "currency" | "label" | "usableFloorM2" | "selfWeightKgPerM2" | TonnesKey | "carbonTonnes" | "carbonKgCO2ePerM2Floor" | "costMillion" | "costPerM2Floor" | "governing" | "verdict" | "warningCount";

/** One row of the side-by-side comparison: the columns of COMPARISON_COLUMNS, plus `id` and the rates' `currency` (null without costs). */
export type ComparisonRow = Record<ComparisonKey, string | number | null>;

/**
 * The side-by-side comparison, one row per scheme, with the columns of COMPARISON_COLUMNS (plus
 * `id` and `currency`), read from each scheme's figures.
 */
export function comparisonTable(results: readonly SchemeResult[]): ComparisonRow[] {
  return results.map(({ figures: f }) => {
    const tonnes = Object.fromEntries(MATERIAL_KINDS.map((k) => [`${k.kind}Tonnes`, f.massByKindKg[k.kind] / 1000])) as Record<TonnesKey, number>;
    return {
      id: f.id,
      currency: f.currency,
      label: f.label,
      usableFloorM2: f.usableFloorM2,
      selfWeightKgPerM2: f.selfWeightKgPerM2,
      ...tonnes,
      carbonTonnes: f.carbonTotalKgCO2e === null ? null : f.carbonTotalKgCO2e / 1000,
      carbonKgCO2ePerM2Floor: f.carbonKgCO2ePerM2Floor,
      costMillion: f.costTotal === null ? null : f.costTotal / 1e6,
      costPerM2Floor: f.costPerM2Floor,
      governing: f.feasible ? `${f.governing} (${f.maxUtilisation.toFixed(2)})` : "",
      // Out of the method's valid range is never "yes" (issue 12 item 7).
      verdict: f.status === "feasible" ? "yes" : f.status === "out-of-range" ? "out of range: outside the method's valid span" : `no: ${f.reason}`,
      warningCount: f.warnings.length,
    };
  });
}

/** A column's heading, the cost columns' with the rates' currency where there is one ("Cost (million EUR)"). */
function headingOf(column: (typeof COMPARISON_COLUMNS)[number], currency: string | undefined): string {
  if (!currency) return column.heading;
  if (column.key === "costMillion") return `Cost (million ${currency})`;
  if (column.key === "costPerM2Floor") return `Cost (${currency}/m² floor)`;
  return column.heading;
}

/**
 * The table as header + text rows for display and CSV, formatted with each column's digits; "–" for
 * no value and for none of a material; the cost columns headed with the rates' currency.
 */
export function comparisonRows(objects: readonly ComparisonRow[]): { header: string[]; rows: string[][] } {
  const currency = objects.find((o) => typeof o.currency === "string")?.currency as string | undefined;
  return {
    header: COMPARISON_COLUMNS.map((c) => headingOf(c, currency)),
    rows: objects.map((o) =>
      COMPARISON_COLUMNS.map((c) => {
        const value = o[c.key];
        if (c.digits === null) return String(value ?? "");
        // none of a material reads as a dash, as the compare page's table writes it (a "0.0" of fabric read as a rounded amount)
        if (value === 0 && c.key.endsWith("Tonnes")) return "–";
        return typeof value === "number" && Number.isFinite(value) ? value.toLocaleString("en-GB", { maximumFractionDigits: c.digits, minimumFractionDigits: c.digits }) : "–";
      }),
    ),
  };
}
