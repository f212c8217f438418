// Embodied carbon: factor table, settings, life-cycle modules and per-m² metrics.

// Factor table and settings
export {
  type FactorRow,
  FactorRowSchema,
  FactorTableSchema,
  MaterialIdSchema,
  FACTOR_LIMITS,
  FACTOR_COLUMNS,
  FACTOR_IMPORT_COLUMNS,
  readFactorFile,
  parseFactorCsv,
  factorRowsToCsv,
  defaultFactorRows,
  DEFAULT_FACTOR_SET_NAME,
} from "./factor-table";
export {
  type TransportMode,
  type AreaBasis,
  type CarbonSettings,
  type BenchmarkBand,
  BenchmarkBandSchema,
  MAX_BENCHMARK_BANDS,
  AREA_BASES,
  TransportModeSchema,
  CarbonSettingsSchema,
  DEFAULT_CARBON_SETTINGS,
} from "./carbon-settings";

// CSV with schema-checked rows (shared with cost)
export { parseSchemaCsv, rowsToCsv, type CsvColumn } from "../kernel/schema-csv";

// Life-cycle modules (EN 15978 as in IStructE, How to calculate embodied carbon, 2nd ed. 2022)
export { wasteFactor } from "./waste-factor";
export { transportFactorKgCO2ePerKg, type TransportLeg } from "./transport-factor";
export { biogenicCo2StoredKg, biogenicCo2PerKg, CO2_PER_C, WOOD_CARBON_FRACTION } from "./biogenic-carbon";
export { materialCarbon, type ModuleCarbon, type WastageScope } from "./material-carbon";

// Assessment of a take-off
export { type AssessmentAreas, checkAreas, areaForBasis } from "../takeoff/assessment-areas";
export {
  assessCarbon,
  countedCarbonPerM2UsableFloor,
  type CarbonAssessment,
  type CarbonRowResult,
  type CarbonTotals,
  type CarbonPerM2,
  type CarbonGroup,
} from "./assess-carbon";

// Rows a take-off needs that a table lacks (shared with cost)

// Table editing (pages' cell editors)
export { checkRowEdit, type RowEditResult } from "./check-row-edit";
export { mergeRows, importedSetName, type RowMerge, type FieldChange } from "./merge-rows";
export { readTableForgiving, detectDelimiter, normaliseHeader, type ForgivingColumns, type ForgivingRead } from "./forgiving-csv";
export { groupEditRows, type GroupEdit, type GroupEditResult } from "./group-edit";

// Provenance of the bundled factors (cited values)
export { FACTOR_PROVENANCE, provenanceOf, type FactorProvenance, type ProvenanceVerdict } from "./provenance";
