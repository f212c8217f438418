import type { StudyInputs } from "../pipeline/study-inputs";
import type { RiskSettings } from "./risk-settings";

/**
 * What the risk analysis reads of a study: the pipeline's inputs, the uncertain inputs and the
 * seed. The study (src/study/, at the top) adds its meta data and schema version.
 */
export interface RiskStudy extends StudyInputs {
  /** Uncertain inputs and sample counts of the risk analysis (a file without them takes defaultRiskSettings). */
  risk: RiskSettings;
  /** Seed for every random draw (risk sampling). */
  seed: number;
}
