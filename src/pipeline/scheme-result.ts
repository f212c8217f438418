// One scheme's design assessed with the study's tables. Apart from ./evaluate.ts (which designs,
// and so imports every scheme's design code) so that a page assessing designs a worker made (the
// compare page) does not load the designs: the bundler groups modules by the pages that reach them.
import type { Brief } from "../brief";
import type { Design, SchemeId } from "../schemes/types";
import { assessCarbon, countedCarbonPerM2UsableFloor, type CarbonAssessment } from "../carbon";
import { assessCost, type CostAssessment } from "../cost";
import { messageOf } from "../kernel/errors";
import { schemeFigures, type SchemeFigures } from "./figures";
import type { ProportionChoice, ScreenedChoice } from "./proportions";
import type { StudyInputs } from "./study-inputs";

/** One scheme's design with its carbon and cost, and the figures read from them. */
export interface SchemeResult {
  id: SchemeId;
  label: string;
  design: Design;
  /** Null when the design has no take-off or the assessment failed (see `error`). */
  carbon: CarbonAssessment | null;
  cost: CostAssessment | null;
  /** Why carbon or cost (or both) could not be assessed, or "". */
  error: string;
  /** The figures every table, chart and the command line read. */
  figures: SchemeFigures;
  /** The brief this scheme was designed for: the evaluated one with the scheme's own rise. */
  brief?: Brief;
  /** The proportions the search chose (and the rise used), with the runner-up. */
  proportions?: ProportionChoice;
  /** From a "screening" evaluation, for a scheme whose full design differs: what its search chose (a later full evaluation starts from it). */
  screened?: ScreenedChoice;
}

function attempt<T>(run: () => T): { value: T | null; error: string } {
  try {
    return { value: run(), error: "" };
  } catch (error) {
    return { value: null, error: messageOf(error) };
  }
}

function areasOf(design: Design) {
  return { usableFloorM2: design.usableFloorM2, planAreaM2: design.planAreaM2, roofSurfaceM2: design.roofSurfaceM2 };
}

/** The carbon of a design with the study's factor table; null with the reason when it cannot be assessed. */
export function designCarbon(design: Design, study: Pick<StudyInputs, "carbon">): { value: CarbonAssessment | null; error: string } {
  return attempt(() => assessCarbon(design.takeoff, study.carbon.factors, study.carbon.settings, areasOf(design)));
}

/** The counted carbon per m² of usable floor alone (the carbon assessment's figure, to the last bit); null when it cannot be assessed. */
export function designCarbonPerM2Floor(design: Design, study: Pick<StudyInputs, "carbon">): number | null {
  return attempt(() => countedCarbonPerM2UsableFloor(design.takeoff, study.carbon.factors, study.carbon.settings, areasOf(design))).value;
}

/** The cost of a design with the study's rate table; null with the reason when it cannot be assessed. */
export function designCost(design: Design, study: Pick<StudyInputs, "cost">): { value: CostAssessment | null; error: string } {
  return attempt(() => assessCost(design.takeoff, study.cost.rates, study.cost.onCosts, areasOf(design)));
}

/**
 * Carbon and cost of a design, with the study's tables, each assessed on its own: a gap in the
 * factor table blanks the carbon but not the cost, and the other way round. `error` says why
 * either is missing (both reasons, carbon first).
 */
export function assessDesign(design: Design, study: Pick<StudyInputs, "carbon" | "cost">): Pick<SchemeResult, "carbon" | "cost" | "error"> {
  if (design.takeoff.length === 0) return { carbon: null, cost: null, error: design.feasible ? "no take-off" : "" };
  const carbon = designCarbon(design, study);
  const cost = designCost(design, study);
  return { carbon: carbon.value, cost: cost.value, error: [carbon.error, cost.error].filter((e) => e !== "").join("; ") };
}

/** A scheme's design assessed with the study's tables, with its figures. */
export function schemeResult(id: SchemeId, label: string, design: Design, study: Pick<StudyInputs, "carbon" | "cost">): SchemeResult {
  const assessed = { id, label, design, ...assessDesign(design, study) };
  return { ...assessed, figures: schemeFigures(assessed) };
}
