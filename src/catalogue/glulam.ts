import type { GlulamClass } from "./types";
import { parseCsvTable, num, text, CsvError } from "./csv-table";

/**
 * Parses `data/glulam.csv` (EN 14080:2013 Table 5 strength classes; MPa and kg/m³ in the file,
 * Pa and kg/m³ out), in file order. Every bad cell is reported with its line and column.
 * @throws CsvError listing each bad cell, or a duplicated strength class
 */
export function parseGlulamCatalogue(csvText: string): GlulamClass[] {
  const mpa = (name: string, max: number) => ({ name, kind: "number" as const, min: 0.1, max });
  const rows = parseCsvTable(
    csvText,
    [
      { name: "strength_class", kind: "text" },
      mpa("f_m_k_mpa", 100),
      mpa("f_t_0_k_mpa", 100),
      mpa("f_c_0_k_mpa", 100),
      mpa("f_v_k_mpa", 20),
      { name: "e_0_mean_mpa", kind: "number", min: 1000, max: 30000 },
      { name: "e_0_05_mpa", kind: "number", min: 1000, max: 30000 },
      { name: "rho_k_kg_per_m3", kind: "number", min: 200, max: 1000 },
      { name: "rho_mean_kg_per_m3", kind: "number", min: 200, max: 1000 },
      { name: "source", kind: "text" },
    ],
    "glulam.csv",
  );
  const seen = new Set<string>();
  return rows.map((r, i) => {
    const id = text(r, "strength_class");
    if (seen.has(id)) throw new CsvError("glulam.csv", [{ line: i + 2, column: "strength_class", message: `"${id}" appears twice (expected each class once)` }]);
    seen.add(id);
    return {
      strengthClass: id,
      bendingPa: num(r, "f_m_k_mpa") * 1e6,
      tensionPa: num(r, "f_t_0_k_mpa") * 1e6,
      compressionPa: num(r, "f_c_0_k_mpa") * 1e6,
      shearPa: num(r, "f_v_k_mpa") * 1e6,
      modulusMeanPa: num(r, "e_0_mean_mpa") * 1e6,
      modulus5PctPa: num(r, "e_0_05_mpa") * 1e6,
      densityCharacteristicKgPerM3: num(r, "rho_k_kg_per_m3"),
      densityMeanKgPerM3: num(r, "rho_mean_kg_per_m3"),
      source: text(r, "source"),
    };
  });
}
