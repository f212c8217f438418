// The pipeline: study → designs → take-off → carbon and cost → headline numbers.
export { evaluateStudy, designScheme, assessDesign, briefAtSpan, type Evaluation, type SchemeResult, type EvaluateOptions } from "./evaluate";
export { headline, type Headline } from "./headline";
export { tableGaps, describeGap, describeGaps, type TableGap, type NamedDesign } from "./gaps";
export type { StudyInputs, SchemeSetting } from "./study-inputs";
export { studyInputsEntries, validateStudyInputs } from "./inputs-schema";
