import * as v from "valibot";
import type { Cladding, Fabric, Strand } from "./types";
import { isMaterialId, type MaterialId } from "../materials";
import { numberAtLeast, numberIn, requiredText } from "../kernel/validate";
import { csvRowSpec, parseSchemaCsv } from "../kernel/schema-csv";

const text = (maxLength: number) => ({ kind: "text", schema: requiredText(maxLength) }) as const;
const number = (schema: v.GenericSchema<unknown, number>) => ({ kind: "number", schema }) as const;
const material = {
  kind: "text",
  schema: v.pipe(
    requiredText(60),
    v.check(isMaterialId, (issue) => `unknown material ${JSON.stringify(issue.input)}`),
    v.transform((id) => id as MaterialId),
  ),
} as const;

const STRAND_FILE = csvRowSpec({
  designation: text(60),
  diameter_mm: number(numberIn(1, 500, "mm")),
  metallic_area_mm2: number(numberAtLeast(1, "mm²")),
  min_breaking_force_kn: number(numberAtLeast(1, "kN")),
  mass_kg_per_m: number(numberAtLeast(0.001, "kg/m")),
  modulus_gpa: number(numberIn(50, 250, "GPa")),
  source: text(300),
});

/** Parses `data/strands.csv`; sorted by metallic area. */
export function parseStrandCatalogue(csvText: string): Strand[] {
  return parseSchemaCsv(csvText, STRAND_FILE.columns, STRAND_FILE.schema, "strands.csv")
    .map((r) => ({
      designation: r.designation,
      diameterM: r.diameter_mm / 1000,
      metallicAreaM2: r.metallic_area_mm2 * 1e-6,
      minBreakingForceN: r.min_breaking_force_kn * 1000,
      massKgPerM: r.mass_kg_per_m,
      modulusPa: r.modulus_gpa * 1e9,
      source: r.source,
    }))
    .sort((a, b) => a.metallicAreaM2 - b.metallicAreaM2);
}

const FABRIC_FILE = csvRowSpec({
  id: text(60),
  label: text(120),
  material,
  mass_kg_per_m2: number(numberIn(0.01, 20, "kg/m²")),
  tensile_warp_kn_per_m: number(numberAtLeast(0.1, "kN/m")),
  tensile_weft_kn_per_m: number(numberAtLeast(0.1, "kN/m")),
  source: text(300),
});

/** Parses `data/fabrics.csv`. */
export function parseFabricCatalogue(csvText: string): Fabric[] {
  return parseSchemaCsv(csvText, FABRIC_FILE.columns, FABRIC_FILE.schema, "fabrics.csv").map((r) => ({
    id: r.id,
    label: r.label,
    material: r.material,
    massKgPerM2: r.mass_kg_per_m2,
    tensileWarpNPerM: r.tensile_warp_kn_per_m * 1000,
    tensileWeftNPerM: r.tensile_weft_kn_per_m * 1000,
    source: r.source,
  }));
}

const CLADDING_FILE = csvRowSpec({
  id: text(60),
  label: text(120),
  material,
  mass_kg_per_m2: number(numberIn(0.01, 500, "kg/m²")),
  source: text(300),
});

/** Parses `data/claddings.csv`. */
export function parseCladdingCatalogue(csvText: string): Cladding[] {
  return parseSchemaCsv(csvText, CLADDING_FILE.columns, CLADDING_FILE.schema, "claddings.csv").map((r) => ({
    id: r.id,
    label: r.label,
    material: r.material,
    massKgPerM2: r.mass_kg_per_m2,
    source: r.source,
  }));
}
