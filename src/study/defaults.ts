import { DEFAULT_BRIEF } from "../brief";
import { SCHEME_DECLARATIONS } from "../schemes/declarations";
import { defaultFactorRows, DEFAULT_CARBON_SETTINGS } from "../carbon";
import { defaultRateRows, DEFAULT_ON_COSTS } from "../cost";
import { STUDY_SCHEMA_VERSION, type Study } from "./study";
import type { SchemeId } from "../schemes/types";
import type { SchemeSetting } from "./study";
import { defaultRiskSettings } from "../risk/default-risk-settings";

/** A study with every default: the tool's own starting point (the demo study is a separate file). */
export function defaultStudy(): Study {
  const schemes = Object.fromEntries(SCHEME_DECLARATIONS.map((m) => [m.id, { enabled: true, options: { ...m.defaults } }])) as Record<SchemeId, SchemeSetting>;
  const study: Omit<Study, "risk"> = {
    schemaVersion: STUDY_SCHEMA_VERSION,
    meta: { title: "Untitled study", author: "", date: "2026-01-01", notes: "", recommendation: "" },
    brief: structuredClone(DEFAULT_BRIEF),
    schemes,
    carbon: { factors: defaultFactorRows(), settings: structuredClone(DEFAULT_CARBON_SETTINGS) },
    cost: { rates: defaultRateRows(), onCosts: structuredClone(DEFAULT_ON_COSTS) },
    seed: 20261202,
  };
  return { ...study, risk: defaultRiskSettings(study) };
}
