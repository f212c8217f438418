import type { GlulamClass } from "./types";
import { numberIn, requiredText } from "../kernel/validate";
import { csvRowSpec, parseSchemaCsv } from "../kernel/schema-csv";

const mpa = (max: number) => ({ kind: "number", schema: numberIn(0.1, max, "MPa") }) as const;
const inRange = (min: number, max: number, unit: string) => ({ kind: "number", schema: numberIn(min, max, unit) }) as const;

const GLULAM_FILE = csvRowSpec({
  strength_class: { kind: "text", schema: requiredText(20) },
  f_m_k_mpa: mpa(100),
  f_t_0_k_mpa: mpa(100),
  f_c_0_k_mpa: mpa(100),
  f_v_k_mpa: mpa(20),
  e_0_mean_mpa: inRange(1000, 30000, "MPa"),
  e_0_05_mpa: inRange(1000, 30000, "MPa"),
  rho_k_kg_per_m3: inRange(200, 1000, "kg/m³"),
  rho_mean_kg_per_m3: inRange(200, 1000, "kg/m³"),
  source: { kind: "text", schema: requiredText(300) },
});

/**
 * Parses `data/glulam.csv` (EN 14080:2013 Table 5 strength classes; MPa and kg/m³ in the file,
 * Pa and kg/m³ out), in file order. Every bad cell is reported with its line and column.
 * @throws CsvError listing each bad cell and each duplicated strength class
 */
export function parseGlulamCatalogue(csvText: string): GlulamClass[] {
  return parseSchemaCsv(csvText, GLULAM_FILE.columns, GLULAM_FILE.schema, "glulam.csv", "strength_class").map((r) => ({
    strengthClass: r.strength_class,
    bendingPa: r.f_m_k_mpa * 1e6,
    tensionPa: r.f_t_0_k_mpa * 1e6,
    compressionPa: r.f_c_0_k_mpa * 1e6,
    shearPa: r.f_v_k_mpa * 1e6,
    modulusMeanPa: r.e_0_mean_mpa * 1e6,
    modulus5PctPa: r.e_0_05_mpa * 1e6,
    densityCharacteristicKgPerM3: r.rho_k_kg_per_m3,
    densityMeanKgPerM3: r.rho_mean_kg_per_m3,
    source: r.source,
  }));
}
