import type { RiskStudy } from "../risk/risk-study";
import type { SchemeSetting } from "../pipeline/study-inputs";

export type { SchemeSetting };

/** The version of the study file this code writes. Older files are migrated on load. */
export const STUDY_SCHEMA_VERSION = 3;

export interface StudyMeta {
  title: string;
  author: string;
  /** ISO date, YYYY-MM-DD. */
  date: string;
  notes: string;
  /** The project lead's recommendation for the client view (issue 14); "" when none is written. Optional in files saved before it. */
  recommendation?: string;
  /**
   * When the study was last changed: ISO 8601 date and time in UTC, stamped by the pages on every
   * edit. Absent in files saved before spanbook recorded it.
   */
  changedAt?: string;
}

/**
 * One study: everything needed to reproduce every number on every page. Plain data, saved as
 * JSON, encoded in links. The price base and currency are kept with the on-costs.
 */
export interface Study extends RiskStudy {
  schemaVersion: number;
  meta: StudyMeta;
}
