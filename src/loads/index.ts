// Loads: EN 1990 combinations and the EN 1991 roof actions every scheme starts from.
export { eq610, eq610a, eq610b, ulsGravity, ulsUplift, type UlsResult } from "./combinations";
export { snowShapeMu1, snowShapeMu3 } from "./snow";
export { peakVelocityPressure, domeWindReference, TERRAIN, type PeakVelocityPressure } from "./wind";
export { roofActions, designPressures, type RoofActions, type DesignPressures } from "./roof-actions";
// The design basis shared by every scheme: named load cases as distributions over the plan, and
// the EN 1990 combinations that can govern.
export type { Action, LoadCaseId, LoadCase, PressureCase, TemperatureCase, UniformEquivalent } from "./load-case";
export { planPointOf, angleFromCrownAt, radiusAtSlope, withinRadius, caseAtSurfaceKPa } from "./dome-coordinates";
export { gaussLegendre, integrate1d } from "./gauss-legendre";
export { integrateOverPlan, caseResultants, type PlanRegion, type CaseResultants } from "./plan-integral";
export { uniformSnowCase, driftedSnowCase, MU1_CURVED_ROOF, SNOW_MAX_SLOPE_RAD } from "./snow-cases";
export { DOME_CPE_FROM_MEMORY, domeCpe, domeCpeAt, windCase, INTERNAL_PRESSURE_COEFFICIENTS, type DomeCpe, type InternalPressure } from "./dome-wind";
export { temperatureCase, TEMPERATURE_DEFAULTS, type TemperatureOptions } from "./temperature-case";
export { designCombinations, PSI0_TABLE_A1_1, type Combination, type CombinationTerm, type VariableCaseId } from "./design-combinations";
export { designBasis, type DesignBasis } from "./design-basis";
export { combinationAtPlanKPa, summariseCase, summariseCombination, type LoadSummary } from "./combination-summary";
