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
  DEFAULT_RATE_SET_NAME,
} from "./rate-table";
export { type OnCosts, OnCostsSchema, DEFAULT_ON_COSTS } from "./on-costs";

// Method
export { applyOnCosts, ON_COST_ORDER, type OnCostLine } from "./apply-on-costs";
export { rebaseRate } from "./rebase-rate";
export { rebaseRateRows, RebaseRangeError } from "./rebase-rate-rows";
export { CONCEPT_SCREENING, type EstimateClass } from "./estimate-class";
export { assessCost, type CostAssessment, type CostLine, type CostGroup, type CostTotals } from "./assess-cost";
