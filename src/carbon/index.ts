// Embodied carbon: factor table, settings, life-cycle modules and per-m² metrics.

// Factor table and settings
export {
  type FactorRow,
  FactorRowSchema,
  FactorTableSchema,
  MaterialIdSchema,
  FACTOR_LIMITS,
  FACTOR_COLUMNS,
  parseFactorCsv,
  factorRowsToCsv,
  defaultFactorRows,
  DEFAULT_FACTOR_SET_NAME,
} from "./factor-table";
export {
  type TransportMode,
  type AreaBasis,
  type CarbonSettings,
  AREA_BASES,
  TransportModeSchema,
  CarbonSettingsSchema,
  DEFAULT_CARBON_SETTINGS,
} from "./carbon-settings";

// CSV with schema-checked rows (shared with cost)
export { parseSchemaCsv, rowsToCsv, type CsvColumn } from "./schema-csv";
