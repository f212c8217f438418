// The brief: what the client asks the roof to do — its type and defaults, its fields described
// once (label, unit, range, step, source) and the schema made from them.
export type { Brief, PartialFactors, TerrainCategory, UlsExpression, RiseRule, SearchObjective } from "./brief";
export { DEFAULT_BRIEF, DEFAULT_FACTORS, TERRAIN_CATEGORIES, RISE_RULES, SEARCH_OBJECTIVES } from "./brief";
export { BRIEF_FIELDS, BRIEF_LIMITS, messageUnit, type BriefField, type NumberField, type ChoiceField } from "./fields";
export { BriefSchema } from "./brief-schema";
