// The pipeline: study → designs → take-off → carbon and cost → each scheme's figures.
export { evaluateStudy, designScheme, briefAtSpan, designAtBestProportions, designWithChoice, objectiveValue, screensDifferently, screenedOptions, type Depth, type Evaluation, type EvaluateOptions, type SearchedDesign } from "./evaluate";
export { assessDesign, schemeResult, type SchemeResult } from "./scheme-result";
export { searchProportions, riseSettingFor, commonRiseM, RISE_KEY, usesRise, OBJECTIVES, MAX_EVALUATIONS, PROPORTION_TIE_FRACTION, type Objective, type ProportionChoice, type RunnerUp, type RiseSetting, type ScreenedChoice } from "./proportions";
export { schemeFigures, massByKind, type SchemeFigures, type AssessedDesign } from "./figures";
export { tableGaps, describeGap, describeGaps, type TableGap, type NamedDesign } from "./gaps";
export type { StudyInputs, SchemeSetting } from "./study-inputs";
export { studyInputsEntries, validateStudyInputs } from "./inputs-schema";
