import type { ChsSection } from "./types";
import { numberIn, requiredText } from "../kernel/validate";
import { csvRowSpec, parseSchemaCsv } from "../kernel/schema-csv";

/** Density of steel for mass per metre, kg/m³ (EN 1991-1-1 Table A.4: 77–78.5 kN/m³; EN 10210-2 uses 7850). */
export const STEEL_DENSITY_KG_PER_M3 = 7850;

/**
 * Properties of a circular hollow section from its outside diameter D and wall thickness t
 * (elementary section geometry, as EN 10210-2 computes them): A = π(D² − d²)/4,
 * I = π(D⁴ − d⁴)/64, W_el = 2I/D, W_pl = (D³ − d³)/6, i = √(I/A), d = D − 2t.
 * @throws when t ≤ 0 or 2t ≥ D
 */
export function chsFromDimensions(diameterM: number, thicknessM: number, designation?: string): ChsSection {
  if (!(diameterM > 0 && thicknessM > 0 && 2 * thicknessM < diameterM)) {
    throw new RangeError(`invalid hollow section: D = ${diameterM} m, t = ${thicknessM} m (expected 0 < 2t < D)`);
  }
  const D = diameterM;
  const d = D - 2 * thicknessM;
  const area = (Math.PI * (D * D - d * d)) / 4;
  const second = (Math.PI * (D ** 4 - d ** 4)) / 64;
  return {
    designation: designation ?? `CHS ${(D * 1000).toFixed(1)}×${(thicknessM * 1000).toFixed(1)}`,
    diameterM: D,
    thicknessM,
    areaM2: area,
    secondMomentM4: second,
    radiusOfGyrationM: Math.sqrt(second / area),
    elasticModulusM3: (2 * second) / D,
    plasticModulusM3: (D ** 3 - d ** 3) / 6,
    massKgPerM: area * STEEL_DENSITY_KG_PER_M3,
  };
}

const CHS_FILE = csvRowSpec({
  designation: { kind: "text", schema: requiredText(60) },
  d_mm: { kind: "number", schema: numberIn(10, 3000, "mm") },
  t_mm: { kind: "number", schema: numberIn(1, 120, "mm") },
  source: { kind: "text", schema: requiredText(300) },
});

/** Parses `data/chs-sections.csv` (columns designation, d_mm, t_mm, source); sorted by mass. */
export function parseChsCatalogue(csvText: string): ChsSection[] {
  return parseSchemaCsv(csvText, CHS_FILE.columns, CHS_FILE.schema, "chs-sections.csv")
    .map((r) => chsFromDimensions(r.d_mm / 1000, r.t_mm / 1000, r.designation))
    .sort((a, b) => a.massKgPerM - b.massKgPerM);
}
