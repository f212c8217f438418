import * as v from "valibot";
import { dataFileText } from "#data-files";
import { numberIn, textUpTo, requiredText } from "../kernel/validate";
import { parseSchemaCsv, rowsToCsv, type CsvColumn } from "../kernel/schema-csv";
import { readTableForgiving, type ForgivingColumns, type ForgivingRead } from "./forgiving-csv";

/**
 * One material's embodied-carbon factors, per kg of material as delivered. The modules follow
 * EN 15978 as applied in IStructE, How to calculate embodied carbon, 2nd ed. (2022): A1–A3 product
 * stage, A4 by distance and mode, A5 wastage by waste rate, C1–C4 end of life, module D and
 * biogenic carbon reported apart (never netted).
 */
export type FactorRow = {
  /** Material id (the ids of src/materials.ts; a page may add others). */
  material: string;
  label: string;
  /** A1–A3 (cradle to gate, fossil carbon, biogenic excluded), kgCO2e per kg. */
  a1a3KgCO2ePerKg: number;
  /** Density, kg/m³ (used for the biogenic carbon of timber, EN 16449, and volume views). */
  densityKgPerM3: number;
  /** A4 transport distance by road, factory gate to site, km. */
  transportKmRoad: number;
  /** A4 transport distance by sea, km. */
  transportKmSea: number;
  /** Site waste rate WR, % of the material delivered that is wasted (A5). */
  wasteRatePct: number;
  /** C1–C4 (demolition, transport away, processing, disposal; fossil only), kgCO2e per kg. */
  endOfLifeKgCO2ePerKg: number;
  /** Module D (benefits beyond the system boundary), kgCO2e per kg; negative is a benefit. */
  moduleDKgCO2ePerKg: number;
  /** Biogenic CO2 stored in the material (EN 16449), kg CO2 per kg; reported apart, never netted. */
  biogenicKgCO2ePerKg: number;
  /** Published inventory or EPD and year the A1–A3 figure comes from, or "from memory". */
  source: string;
  notes: string;
};

/** Limits on each factor; the page's cell editors and the CSV import use the same ones. */
export const FACTOR_LIMITS = {
  a1a3KgCO2ePerKg: { min: 0, max: 100, unit: "kgCO2e/kg" },
  densityKgPerM3: { min: 1, max: 25000, unit: "kg/m³" },
  transportKmRoad: { min: 0, max: 20000, unit: "km" },
  transportKmSea: { min: 0, max: 40000, unit: "km" },
  wasteRatePct: { min: 0, max: 50, unit: "%" },
  endOfLifeKgCO2ePerKg: { min: 0, max: 20, unit: "kgCO2e/kg" },
  moduleDKgCO2ePerKg: { min: -20, max: 20, unit: "kgCO2e/kg" },
  biogenicKgCO2ePerKg: { min: 0, max: 2, unit: "kgCO2/kg" },
} as const;

const limit = (key: keyof typeof FACTOR_LIMITS) => numberIn(FACTOR_LIMITS[key].min, FACTOR_LIMITS[key].max, FACTOR_LIMITS[key].unit);

/** A material id: lower-case letters, digits and hyphens, 1–60 characters. */
export const MaterialIdSchema = v.pipe(
  requiredText(60),
  v.regex(/^[a-z0-9][a-z0-9-]*$/, (issue) => `${JSON.stringify(issue.input)} (expected lower-case letters, digits and hyphens, e.g. steel-plate)`),
);

/** Checks one factor row; messages name the value and what is allowed. */
export const FactorRowSchema = v.object({
  material: MaterialIdSchema,
  label: requiredText(120),
  a1a3KgCO2ePerKg: limit("a1a3KgCO2ePerKg"),
  densityKgPerM3: limit("densityKgPerM3"),
  transportKmRoad: limit("transportKmRoad"),
  transportKmSea: limit("transportKmSea"),
  wasteRatePct: limit("wasteRatePct"),
  endOfLifeKgCO2ePerKg: limit("endOfLifeKgCO2ePerKg"),
  moduleDKgCO2ePerKg: limit("moduleDKgCO2ePerKg"),
  biogenicKgCO2ePerKg: limit("biogenicKgCO2ePerKg"),
  source: requiredText(300),
  notes: textUpTo(500),
});

/** The factor table: rows with unique material ids. */
export const FactorTableSchema = v.pipe(
  v.array(FactorRowSchema, () => `expected a list of factor rows`),
  v.check((rows) => new Set(rows.map((r) => r.material)).size === rows.length, (issue) => {
    const ids = (issue.input as FactorRow[]).map((r) => r.material);
    const dup = ids.find((id, i) => ids.indexOf(id) !== i);
    return `duplicate material ${JSON.stringify(dup)} (expected each material once)`;
  }),
);

/** The CSV columns of the factor table, in order, with the field each fills. */
export const FACTOR_COLUMNS: readonly CsvColumn[] = [
  { column: "material", field: "material", kind: "text" },
  { column: "label", field: "label", kind: "text" },
  { column: "a1a3_kgco2e_per_kg", field: "a1a3KgCO2ePerKg", kind: "number" },
  { column: "density_kg_per_m3", field: "densityKgPerM3", kind: "number" },
  { column: "transport_km_road", field: "transportKmRoad", kind: "number" },
  { column: "transport_km_sea", field: "transportKmSea", kind: "number" },
  { column: "waste_rate_pct", field: "wasteRatePct", kind: "number" },
  { column: "end_of_life_kgco2e_per_kg", field: "endOfLifeKgCO2ePerKg", kind: "number" },
  { column: "module_d_kgco2e_per_kg", field: "moduleDKgCO2ePerKg", kind: "number" },
  { column: "biogenic_kgco2e_per_kg", field: "biogenicKgCO2ePerKg", kind: "number" },
  { column: "source", field: "source", kind: "text" },
  { column: "notes", field: "notes", kind: "text" },
];

/** Header variants an import accepts for each factor column (compared after normaliseHeader: case, units in brackets, dashes and underscores ignored). */
const FACTOR_HEADER_ALIASES: Readonly<Record<string, readonly string[]>> = {
  material: ["material id", "id", "key", "material key", "material code"],
  label: ["name", "material name", "description"],
  a1a3KgCO2ePerKg: ["a1a3", "a1 a3", "a1 to a3", "a1 3", "product stage", "gwp a1 a3", "embodied carbon", "carbon factor", "ecf"],
  densityKgPerM3: ["density", "rho", "density kg m3"],
  transportKmRoad: ["road", "road km", "road distance", "distance by road", "transport road", "a4 road km"],
  transportKmSea: ["sea", "sea km", "sea distance", "distance by sea", "transport sea", "ship km", "a4 sea km"],
  wasteRatePct: ["waste", "waste rate", "waste rate pct", "wastage", "wastage rate", "site waste", "wr"],
  endOfLifeKgCO2ePerKg: ["c1 c4", "c1c4", "end of life", "eol", "module c"],
  moduleDKgCO2ePerKg: ["d", "module d", "beyond the system boundary", "benefits beyond the system boundary"],
  biogenicKgCO2ePerKg: ["biogenic", "biogenic carbon", "biogenic co2", "biogenic stored", "carbon storage", "sequestered carbon"],
  source: ["reference", "data source", "epd", "dataset"],
  notes: ["note", "comment", "comments", "remarks"],
};

/** The factor columns with the header variants an import maps to them. */
export const FACTOR_IMPORT_COLUMNS: ForgivingColumns = FACTOR_COLUMNS.map((c) => ({ ...c, aliases: FACTOR_HEADER_ALIASES[c.field] ?? [] }));

/**
 * Reads a factor file forgivingly (delimiter, decimal comma, header variants, partial columns) as
 * an update of `current`.
 * @throws CsvError naming every problem by line and column
 */
export function readFactorFile(text: string, current: readonly FactorRow[], fileLabel: string): ForgivingRead<FactorRow> {
  return readTableForgiving(text, FACTOR_IMPORT_COLUMNS, FactorRowSchema as v.GenericSchema<unknown, FactorRow>, "material", current, fileLabel);
}

/**
 * Parses a factor table from CSV (the columns of FACTOR_COLUMNS, exactly).
 * @throws CsvError with every bad cell (line, column, message) and every duplicate material; nothing is returned unless the whole file is valid
 */
export function parseFactorCsv(text: string, fileLabel = "carbon factors CSV"): FactorRow[] {
  return parseSchemaCsv(text, FACTOR_COLUMNS, FactorRowSchema, fileLabel, "material");
}

/** Writes a factor table as CSV that parseFactorCsv reads back unchanged. */
export function factorRowsToCsv(rows: readonly FactorRow[]): string {
  return rowsToCsv(rows, FACTOR_COLUMNS);
}

let cached: FactorRow[] | undefined;

/** The default factor table from data/carbon-factors.csv (a fresh copy each call). */
export function defaultFactorRows(): FactorRow[] {
  cached ??= parseFactorCsv(dataFileText("carbon-factors.csv"), "data/carbon-factors.csv");
  return cached.map((row) => ({ ...row }));
}

/** The name of the bundled factor set, for captions. */
export const DEFAULT_FACTOR_SET_NAME = "spanbook defaults (data/carbon-factors.csv)";
