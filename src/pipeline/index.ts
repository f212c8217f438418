// The pipeline: study → designs → take-off → carbon and cost → each scheme's figures.
export { evaluateStudy, designScheme, assessDesign, schemeResult, briefAtSpan, type Evaluation, type SchemeResult, type EvaluateOptions } from "./evaluate";
export { schemeFigures, massByKind, type SchemeFigures, type AssessedDesign } from "./figures";
export { tableGaps, describeGap, describeGaps, type TableGap, type NamedDesign } from "./gaps";
export type { StudyInputs, SchemeSetting } from "./study-inputs";
export { studyInputsEntries, validateStudyInputs } from "./inputs-schema";
