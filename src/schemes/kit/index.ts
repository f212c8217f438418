// The scheme kit: what every scheme shares. A scheme folder imports from here, mechanics/, loads/
// and catalogue/ — never from another scheme.
export type { SchemeModel, SchemeDeclaration, SchemeId, SchemeOptions, Design, MemberGroup, Check, OptionSpec, OptionValue, SummaryItem, DrawingLine, UncertaintyKind, DesignStatus, MassByGroupKg, FloorEnvelope, AnalysisView, DesignAnalysis } from "../types";
export { defineScheme, infeasibleOnFailure, convergeSelfWeight, type SchemeDesign } from "./scheme";
export { declareScheme, type SchemeIdentity } from "./declare";
export { defineOptions, type DeclaredOptions, type OptionDeclaration, type OptionValues } from "./define-options";
export { checkSchemeOptions } from "./check-options";
export { SchemeError, SizingError, ConvergenceError, failWith, isDesignAnswer, type FailureContext } from "./errors";
export { iterateSelfWeight, type Converged } from "./converge";
export { assembleDesign, infeasibleDesign, check, capEnvelope, isSubstructure, takeoffGroupOf, massByGroupKg, designStatus, type DesignParts } from "./assemble";
export { usableFloorM2, usableFloorLines, soffitHeightAtM } from "./usable-floor";
export { memberOf, massOfKinds, tonnesRow, pickStrandGroup, steelTensionRing, type SizedGroup } from "./members";
export { pickChs, type AxialDemand } from "./pick-chs";
export { STEEL_GRADES, steelGrade, type SteelGrade } from "./steel";
export { findCladding, claddingCostItem } from "./cladding";
export { ANALYSIS_OPTION, FABRIC_CHOICES, FABRIC_OPTION, TENSION_COMMON_OPTIONS, CLADDING_CHOICES, STEEL_GRADE_CHOICES } from "./option-choices";
export { CABLE_ROOF_DEFLECTION_RATIO, findFabric, fabricCostItem, fabricAllowableNPerM, fabricCover, fabricPanelChecks } from "./fabric";
export { uniformCombinations, briefCombinations, characteristicVariableKPa, membraneLoadCases, heaviestCase, UNIFORM_EQUIVALENT_WARNING, type UniformCombination, type MembraneLoadCase, type VariableAction, heaviestByUniformEquivalent } from "./load-combinations";
export { capFloor } from "./cap-floor";
export { drawingWithLazyPlan, once, type Lines } from "./lazy-drawing";
export { capLatticeSection, capLatticePlan } from "./lattice-drawing";
export { analysedCombinations, unboundedCombinations, planCombinations, uniformPressurePa, type PlanCombination } from "./combination-loads";
