// Mechanics: small pure published formulas. Schemes compose these; they do not re-derive them.

// geometry
export { sphericalCap, capHeightAt, capAngleAt, type SphericalCap } from "./spherical-cap";
export { usableFloorAreaM2, capUsableRadiusM } from "./usable-floor";
export { airDensityKgPerM3, enclosedAirMassKg } from "./air";

// steel members (EN 1993-1-1)
export {
  bucklingReduction,
  nonDimensionalSlenderness,
  bucklingResistanceN,
  tensionResistanceN,
  IMPERFECTION_FACTOR,
  STEEL_E_PA,
  type BucklingCurve,
} from "./flexural-buckling";

// concrete (EN 1992-1-1)
export {
  concreteProperties,
  concreteDesignStrengthPa,
  rebarDesignStrengthPa,
  CONCRETE_CLASSES,
  REINFORCED_CONCRETE_DENSITY_KG_PER_M3,
  type ConcreteClass,
  type ConcreteProperties,
} from "./concrete";
