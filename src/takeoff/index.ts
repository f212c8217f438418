// Take-off: quantity rows, cost items, the envelope (floor, volume, air) every scheme shares.
export type { TakeoffRow, QuantityUnit, CostItemId } from "./takeoff-row";
export { COST_ITEMS } from "./takeoff-row";
export { envelope, roofProfile, type Envelope } from "./envelope";
export { type AssessmentAreas, type AreaBasis, AREA_BASES, checkAreas, areaForBasis } from "./assessment-areas";
export { MissingRowsError, missingMaterials, missingItems, type MissingKey } from "./missing-rows";
