import type { CarbonAssessment, CarbonTotals } from "../carbon/assess-carbon";
import { materialInfo } from "../materials";

/** What the carbon charts divide by: the whole roof (tonnes) or a m² of usable floor or of plan. */
export type CarbonMetric = "total-t" | "per-m2-floor" | "per-m2-plan";

export const CARBON_METRICS: readonly { value: CarbonMetric; label: string; axis: string }[] = [
  { value: "total-t", label: "Total, tCO2e", axis: "Embodied carbon (tCO2e)" },
  { value: "per-m2-floor", label: "Per m² of usable floor, kgCO2e/m²", axis: "Embodied carbon per m² of usable floor (kgCO2e/m²)" },
  { value: "per-m2-plan", label: "Per m² of covered plan, kgCO2e/m²", axis: "Embodied carbon per m² of covered plan (kgCO2e/m²)" },
];

/** One scheme's carbon, as the charts take it. */
export type SchemeCarbon = { id: string; label: string; carbon: CarbonAssessment };

/** One stacked segment: a scheme, a part (module or material) and its value in the metric's unit. */
export type CarbonBarDatum = { scheme: string; part: string; value: number };

/** The counted modules, in stacking order, with their key on CarbonTotals. */
export const COUNTED_MODULES: readonly { id: string; key: keyof CarbonTotals; label: string }[] = [
  { id: "A1–A3", key: "a1a3", label: "A1–A3 product" },
  { id: "A4", key: "a4", label: "A4 transport" },
  { id: "A5", key: "a5", label: "A5 site wastage" },
  { id: "C1–C4", key: "c", label: "C1–C4 end of life" },
];

function scale(carbon: CarbonAssessment, metric: CarbonMetric): number | null {
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
    const k = scale(s.carbon, metric);
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
    const k = scale(s.carbon, metric);
    if (k === null) continue;
    for (const g of s.carbon.byMaterial) {
      out.push({ scheme: s.label, part: materialInfo(g.key)?.label ?? g.key, value: g.totals.counted * k });
    }
  }
  return out;
}
