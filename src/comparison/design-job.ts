// The compare page's design job, run in its workers: one scheme at its best proportions by the one
// rule every page and the command line use (designAtBestProportions), so the compare page, the span
// study and `npm run evaluate` give the same figures at the same span and study. Pure: no worker here.
import { designAtBestProportions, type SearchedDesign, type SchemeSetting, type StudyInputs } from "../pipeline";
import { SCHEMES } from "../schemes";
import type { Catalogue } from "../catalogue/types";
import type { Brief } from "../brief";
import type { SchemeId } from "../schemes/types";

/** One scheme designed at its best proportions for a brief, the study's setting for it and its tables. */
export function designJob(schemeId: SchemeId, brief: Brief, setting: SchemeSetting | undefined, tables: Pick<StudyInputs, "carbon" | "cost">, catalogue: Catalogue): SearchedDesign {
  const model = SCHEMES.find((m) => m.id === schemeId);
  if (!model) throw new Error(`unknown scheme: ${schemeId}`);
  return designAtBestProportions(model, brief, setting, tables, catalogue);
}
