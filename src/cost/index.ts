// Cost: rate table, on-costs, elemental cost and price rebasing.

// Rate table and on-costs
export {
  type RateRow,
  RateRowSchema,
  RateTableSchema,
  RATE_COLUMNS,
  MAX_RATE,
  costItemUnit,
  parseRateCsv,
  rateRowsToCsv,
  defaultRateRows,
} from "./rate-table";
export { type OnCosts, OnCostsSchema, DEFAULT_ON_COSTS } from "./on-costs";
