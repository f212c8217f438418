// The study: the brief, the schemes' options, the carbon and cost tables, the seed; schema,
// defaults, loading, saving, links.
export type { Brief, PartialFactors, TerrainCategory, UlsExpression } from "../brief";
export { DEFAULT_BRIEF, DEFAULT_FACTORS, BRIEF_LIMITS, TERRAIN_CATEGORIES, BriefSchema } from "../brief";
export type { Study, StudyMeta, SchemeSetting } from "./study";
export { STUDY_SCHEMA_VERSION } from "./study";
export { studySchema, validateStudy, studyProblems, StudyMetaSchema, metaFieldProblem } from "./study-schema";
export { defaultStudy } from "./defaults";
export { migrateStudy, MIGRATIONS, type Migration } from "./migrate";
export { studyFromJson, studyFromObject, studyToJson, describeProblems, type LoadResult } from "./load-study";
export { encodeStudyLink, decodeStudyLink, compressStudyLink, inflateStudyLink } from "./link";
export { readStoredStudy, writeStoredStudy, backupUnreadable, STORAGE_KEY, UNREADABLE_KEY, BEFORE_LINK_KEY, type KeyValueStore, type StoredStudy } from "./storage";
export { setIn, getIn, diff, mergeDiff, sameValue } from "../kernel/patch";
export type { FieldProblem } from "../kernel/validate";
export { assumptionsRecord, studyFileText, type Assumption } from "./assumptions";
export { onDemandAnalysesOn, withoutOnDemandAnalyses } from "./on-demand";
