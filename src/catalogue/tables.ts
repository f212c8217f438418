import type { Cladding, Fabric, Strand } from "./types";
import { isMaterialId, type MaterialId } from "../materials";
import { parseCsvTable, num, text, CsvError } from "./csv-table";

/** Parses `data/strands.csv`; sorted by metallic area. */
export function parseStrandCatalogue(csvText: string): Strand[] {
  const rows = parseCsvTable(
    csvText,
    [
      { name: "designation", kind: "text" },
      { name: "diameter_mm", kind: "number", min: 1, max: 500 },
      { name: "metallic_area_mm2", kind: "number", min: 1 },
      { name: "min_breaking_force_kn", kind: "number", min: 1 },
      { name: "mass_kg_per_m", kind: "number", min: 0.001 },
      { name: "modulus_gpa", kind: "number", min: 50, max: 250 },
      { name: "source", kind: "text" },
    ],
    "strands.csv",
  );
  return rows
    .map((r) => ({
      designation: text(r, "designation"),
      diameterM: num(r, "diameter_mm") / 1000,
      metallicAreaM2: num(r, "metallic_area_mm2") * 1e-6,
      minBreakingForceN: num(r, "min_breaking_force_kn") * 1000,
      massKgPerM: num(r, "mass_kg_per_m"),
      modulusPa: num(r, "modulus_gpa") * 1e9,
      source: text(r, "source"),
    }))
    .sort((a, b) => a.metallicAreaM2 - b.metallicAreaM2);
}

function material(value: string, line: number, file: string): MaterialId {
  if (!isMaterialId(value)) throw new CsvError(file, [{ line, column: "material", message: `unknown material "${value}"` }]);
  return value;
}

/** Parses `data/fabrics.csv`. */
export function parseFabricCatalogue(csvText: string): Fabric[] {
  const rows = parseCsvTable(
    csvText,
    [
      { name: "id", kind: "text" },
      { name: "label", kind: "text" },
      { name: "material", kind: "text" },
      { name: "mass_kg_per_m2", kind: "number", min: 0.01, max: 20 },
      { name: "tensile_warp_kn_per_m", kind: "number", min: 0.1 },
      { name: "tensile_weft_kn_per_m", kind: "number", min: 0.1 },
      { name: "source", kind: "text" },
    ],
    "fabrics.csv",
  );
  return rows.map((r, i) => ({
    id: text(r, "id"),
    label: text(r, "label"),
    material: material(text(r, "material"), i + 2, "fabrics.csv"),
    massKgPerM2: num(r, "mass_kg_per_m2"),
    tensileWarpNPerM: num(r, "tensile_warp_kn_per_m") * 1000,
    tensileWeftNPerM: num(r, "tensile_weft_kn_per_m") * 1000,
    source: text(r, "source"),
  }));
}

/** Parses `data/claddings.csv`. */
export function parseCladdingCatalogue(csvText: string): Cladding[] {
  const rows = parseCsvTable(
    csvText,
    [
      { name: "id", kind: "text" },
      { name: "label", kind: "text" },
      { name: "material", kind: "text" },
      { name: "mass_kg_per_m2", kind: "number", min: 0.01, max: 500 },
      { name: "source", kind: "text" },
    ],
    "claddings.csv",
  );
  return rows.map((r, i) => ({
    id: text(r, "id"),
    label: text(r, "label"),
    material: material(text(r, "material"), i + 2, "claddings.csv"),
    massKgPerM2: num(r, "mass_kg_per_m2"),
    source: text(r, "source"),
  }));
}
