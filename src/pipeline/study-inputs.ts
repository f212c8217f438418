import type { Brief } from "../brief";
import type { SchemeId, SchemeOptions } from "../schemes/types";
import type { FactorRow, CarbonSettings } from "../carbon";
import type { RateRow, OnCosts } from "../cost";

export interface SchemeSetting {
  enabled: boolean;
  options: SchemeOptions;
}

/**
 * What the pipeline reads of a study: the brief, each scheme's setting, the carbon and cost
 * tables. The study (src/study/, at the top) adds its meta data, risk settings and seed.
 */
export interface StudyInputs {
  brief: Brief;
  schemes: Record<SchemeId, SchemeSetting>;
  carbon: { factors: FactorRow[]; settings: CarbonSettings };
  cost: { rates: RateRow[]; onCosts: OnCosts };
}
