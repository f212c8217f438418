import type { Brief } from "../brief";
import type { SchemeId, SchemeOptions } from "../schemes/types";
import type { FactorRow, CarbonSettings } from "../carbon";
import type { RateRow, OnCosts } from "../cost";

export interface SchemeSetting {
  enabled: boolean;
  /** The scheme's options; a free one that is not pinned is only the proportion search's starting point. */
  options: SchemeOptions;
  /** Free proportions the user fixed: the search leaves them at their value in `options`. */
  pinned?: string[];
  /** A rise the user fixed for this scheme under the "own" rise rule, m (the search then leaves it). */
  riseM?: number;
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
