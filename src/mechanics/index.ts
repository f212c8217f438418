// Mechanics: small pure published formulas. Schemes compose these; they do not re-derive them.

// geometry
export { sphericalCap, capHeightAt, type SphericalCap } from "./spherical-cap";
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

// timber members (EN 1995-1-1, EN 1995-1-2)
export { timberRelativeSlenderness, timberBucklingFactor, GLULAM_BETA_C } from "./timber-column-buckling";
export { glulamKMod, GLULAM_K_MOD, LOAD_DURATION_CLASSES, type LoadDurationClass, type ServiceClass } from "./timber-kmod";
export { timberDesignStrengthPa, TIMBER_GAMMA_M } from "./timber-gamma-m";
export { timberCompressionBendingUtilisation, type TimberCompressionBending } from "./timber-combined-compression";
export { timberTensionBendingUtilisation } from "./timber-combined-tension";
export { timberCriticalBendingStressPa, timberLateralTorsionalFactor, timberShearUtilisation, LTB_LENGTH_RATIO_UDL, SHEAR_CRACK_FACTOR } from "./timber-beam-stability";
export { creepReducedModulusPa, GLULAM_K_DEF } from "./timber-creep";
export { charringDepthM, effectiveCharDepthM, CHARRING_RATE_M_PER_MIN, ZERO_STRENGTH_LAYER_M } from "./timber-charring";

// concrete (EN 1992-1-1)
export {
  concreteProperties,
  concreteDesignStrengthPa,
  rebarDesignStrengthPa,
  CONCRETE_CLASSES,
  REINFORCED_CONCRETE_DENSITY_KG_PER_M3,
  PLAIN_CONCRETE_DENSITY_KG_PER_M3,
  minimumReinforcementRatio,
  type ConcreteClass,
  type ConcreteProperties,
} from "./concrete";

// cables and membranes
export { parabolicCable, inclinedParabolicCable, parabolaLengthM, type ParabolicCable } from "./parabolic-cable";
export { membraneStripForceNPerM } from "./membrane-strip";
export {
  cableDomeSelfStress,
  cableDomeLoadState,
  combineCableDomeStates,
  cableDomeNodeResiduals,
  validateCableDomeTrussGeometry,
  type CableDomeTrussGeometry,
  type CableDomeTrussLoads,
  type CableDomeTrussForces,
} from "./cable-dome-truss";
export { ringBucklingForceN, ringForceFromPullsN } from "./ring-buckling";

// shells, lattices and beams
export {
  sphericalMembraneSurfaceLoad,
  sphericalMembranePlanLoad,
  sphericalMembraneForces,
  hoopSignChangeAngleRad,
  edgeRingTensionN,
  type MembraneForces,
} from "./spherical-membrane";
export { zoellyCoefficient, zoellyPressurePa, zoellyThicknessM, continuumShellPressurePa } from "./shell-buckling";
export { threeWayGridStiffness, doubleLayerGridStiffness, threeWayGridBarForces, type GridStiffness, type GridBarForces } from "./three-way-grid";
export { geodesicCap, strutLengths, geodesicFrequencyFor, MEAN_CHORD_FACTOR, type GeodesicCap, type StrutLengths, type Vec3 } from "./geodesic";
export { cachedGeodesicCap } from "./geodesic-cache";
export { latticeBands, bandOfEachEdge, edgeMidpointAngleRad, type LatticeBand } from "./lattice-bands";
export { simplySupportedUdl, simplySupportedMomentNm, type BeamResponse } from "./beam";

// units
export { GRAVITY_M_PER_S2, kPaOfMass, kPaFromKgPerM2 } from "./gravity";
export { ribbedShellStiffness, ribbedPanelBucklingNPerM, type RibbedShell } from "./ribbed-shell";
