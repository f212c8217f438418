import type { Brief } from "./brief";
import type { SchemeId, SchemeOptions } from "../schemes/types";
import type { FactorRow, CarbonSettings } from "../carbon";
import type { RateRow, OnCosts } from "../cost";
import type { RiskSettings } from "../risk/risk-settings";

/** The version of the study file this code writes. Older files are migrated on load. */
export const STUDY_SCHEMA_VERSION = 2;

export interface StudyMeta {
  title: string;
  author: string;
  /** ISO date, YYYY-MM-DD. */
  date: string;
  notes: string;
  /**
   * When the study was last changed: ISO 8601 date and time in UTC, stamped by the pages on every
   * edit. Absent in files saved before spanbook recorded it.
   */
  changedAt?: string;
}

export interface SchemeSetting {
  enabled: boolean;
  options: SchemeOptions;
}

/**
 * One study: everything needed to reproduce every number on every page. Plain data, saved as
 * JSON, encoded in links. The price base and currency are kept with the on-costs.
 */
export interface Study {
  schemaVersion: number;
  meta: StudyMeta;
  brief: Brief;
  schemes: Record<SchemeId, SchemeSetting>;
  carbon: { factors: FactorRow[]; settings: CarbonSettings };
  cost: { rates: RateRow[]; onCosts: OnCosts };
  /** Uncertain inputs and sample counts of the risk analysis (a file without them takes defaultRiskSettings). */
  risk: RiskSettings;
  /** Seed for every random draw (risk sampling). */
  seed: number;
}
