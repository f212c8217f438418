import type { CarbonAssessment, CarbonTotals } from "../carbon/assess-carbon";
import { materialInfo } from "../materials";
import { MODULE_PALETTE, type ModuleCode } from "./palette";

/** What the carbon charts divide by: the whole roof (tonnes) or a m² of usable floor or of plan. */
export type CarbonMetric = "total-t" | "per-m2-floor" | "per-m2-plan";

export const CARBON_METRICS: readonly { value: CarbonMetric; label: string; axis: string }[] = [
  { value: "total-t", label: "Total, tCO2e", axis: "Embodied carbon (tCO2e)" },
  { value: "per-m2-floor", label: "Per m² of usable floor, kgCO2e/m²", axis: "Embodied carbon per m² of usable floor (kgCO2e/m²)" },
  { value: "per-m2-plan", label: "Per m² of covered plan, kgCO2e/m²", axis: "Embodied carbon per m² of covered plan (kgCO2e/m²)" },
];

/** One scheme's carbon, as the charts take it. */
export type SchemeCarbon = { id: string; label: string; carbon: CarbonAssessment };

/** One stacked segment: a scheme, a part (module, material or element) and its value in the metric's unit; `key` is the material id or module code behind the part, where there is one. */
export type CarbonBarDatum = { scheme: string; part: string; value: number; key?: string };

const label = (code: ModuleCode) => MODULE_PALETTE.find((m) => m.code === code)?.label ?? code;

/** The counted modules, in stacking order, with their key on CarbonTotals; labels and colours from the one module palette. */
export const COUNTED_MODULES: readonly { id: ModuleCode; key: keyof CarbonTotals; label: string }[] = [
  { id: "A1–A3", key: "a1a3", label: label("A1–A3") },
  { id: "A4", key: "a4", label: label("A4") },
  { id: "A5", key: "a5", label: label("A5") },
  { id: "C1–C4", key: "c", label: label("C1–C4") },
];

/** The quantities reported apart from the counted total: module D and biogenic CO2 stored. */
export const APART_MODULES: readonly { id: ModuleCode; key: "moduleD" | "biogenic"; label: string; unit: string }[] = [
  { id: "D", key: "moduleD", label: label("D"), unit: "CO2e" },
  { id: "biogenic", key: "biogenic", label: label("biogenic"), unit: "CO2" },
];

export function carbonScale(carbon: CarbonAssessment, metric: CarbonMetric): number | null {
  if (metric === "total-t") return 1 / 1000;
  const area = metric === "per-m2-floor" ? carbon.perM2UsableFloor.areaM2 : carbon.perM2Plan.areaM2;
  return area > 0 ? 1 / area : null;
}

/**
 * Stacked-bar data of counted carbon by module (A1–A3, A4, A5, C; only the modules counted)
 * per scheme, in tCO2e or kgCO2e/m². Schemes with no area for a per-m² metric are left out.
 * Module D and biogenic storage are not in the stack: they are reported apart.
 */
export function carbonByModuleData(schemes: readonly SchemeCarbon[], metric: CarbonMetric): CarbonBarDatum[] {
  const out: CarbonBarDatum[] = [];
  for (const s of schemes) {
    const k = carbonScale(s.carbon, metric);
    if (k === null) continue;
    for (const m of COUNTED_MODULES) {
      if (!s.carbon.modulesCounted.includes(m.id)) continue;
      out.push({ scheme: s.label, part: m.label, value: s.carbon.totals[m.key] * k });
    }
  }
  return out;
}

/** Stacked-bar data of counted carbon by material per scheme, in tCO2e or kgCO2e/m². */
export function carbonByMaterialData(schemes: readonly SchemeCarbon[], metric: CarbonMetric): CarbonBarDatum[] {
  const out: CarbonBarDatum[] = [];
  for (const s of schemes) {
    const k = carbonScale(s.carbon, metric);
    if (k === null) continue;
    for (const g of s.carbon.byMaterial) {
      out.push({ scheme: s.label, part: materialInfo(g.key)?.label ?? g.key, value: g.totals.counted * k, key: g.key });
    }
  }
  return out;
}

/** Stacked-bar data of counted carbon by structural element (the take-off's elements) per scheme, in tCO2e or kgCO2e/m². */
export function carbonByElementData(schemes: readonly SchemeCarbon[], metric: CarbonMetric): CarbonBarDatum[] {
  const out: CarbonBarDatum[] = [];
  for (const s of schemes) {
    const k = carbonScale(s.carbon, metric);
    if (k === null) continue;
    for (const g of s.carbon.byElement) out.push({ scheme: s.label, part: g.key, value: g.totals.counted * k });
  }
  return out;
}

/** Module D and biogenic CO2 stored per scheme (reported apart, never netted), in t or kg per m². */
export function carbonApartData(schemes: readonly SchemeCarbon[], metric: CarbonMetric): CarbonBarDatum[] {
  const out: CarbonBarDatum[] = [];
  for (const s of schemes) {
    const k = carbonScale(s.carbon, metric);
    if (k === null) continue;
    for (const m of APART_MODULES) out.push({ scheme: s.label, part: m.label, value: s.carbon.totals[m.key] * k, key: m.id });
  }
  return out;
}
