import { SCHEME_DECLARATIONS, ON_DEMAND_ANALYSIS_OPTION } from "../schemes/declarations";
import type { Study } from "./study";

/** The schemes (by id) whose on-demand 3D analysis the study switches on. */
export function onDemandAnalysesOn(study: Study): string[] {
  return SCHEME_DECLARATIONS.filter((d) => d.options.some((o) => o.key === ON_DEMAND_ANALYSIS_OPTION) && study.schemes[d.id]?.options?.[ON_DEMAND_ANALYSIS_OPTION] === true).map((d) => d.id);
}

/**
 * The study with every on-demand 3D analysis switched off (issue 13: seconds a design, so it runs
 * where asked — a scheme's details, the command line's --buckling — and not in every span-study
 * point or risk draw); the same object when none is on.
 */
export function withoutOnDemandAnalyses(study: Study): Study {
  const on = onDemandAnalysesOn(study);
  if (on.length === 0) return study;
  const schemes = { ...study.schemes };
  for (const id of on) {
    const setting = schemes[id as keyof typeof schemes]!;
    schemes[id as keyof typeof schemes] = { ...setting, options: { ...setting.options, [ON_DEMAND_ANALYSIS_OPTION]: false } };
  }
  return { ...study, schemes };
}
