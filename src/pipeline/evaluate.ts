import type { StudyInputs } from "./study-inputs";
import type { Brief } from "../brief";
import type { Catalogue } from "../catalogue/types";
import type { Design, SchemeId, SchemeModel, SchemeOptions } from "../schemes/types";
import { SCHEMES, infeasibleDesign, isDesignAnswer } from "../schemes";
import { assessCarbon, type CarbonAssessment } from "../carbon";
import { assessCost, type CostAssessment } from "../cost";
import { messageOf } from "../kernel/errors";
import { schemeFigures, type SchemeFigures } from "./figures";

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
}

export interface Evaluation {
  brief: Brief;
  results: SchemeResult[];
}

export interface EvaluateOptions {
  /** Evaluate at this span instead of the brief's (the rise keeps the brief's rise/span ratio). */
  spanM?: number;
  /** Only these schemes (default: the study's enabled schemes). */
  schemeIds?: readonly SchemeId[];
}

/** The brief at another span, keeping the rise-to-span ratio. */
export function briefAtSpan(brief: Brief, spanM: number): Brief {
  return { ...brief, spanM, riseM: (brief.riseM / brief.spanM) * spanM };
}

/**
 * Designs one scheme for a brief with the given options (defaults fill the rest). An input the
 * scheme refuses (a RangeError) or a step it cannot complete becomes an infeasible answer with the
 * reason; any other error (a TypeError, a bug) propagates as an internal error.
 */
export function designScheme(model: SchemeModel, brief: Brief, options: SchemeOptions | undefined, catalogue: Catalogue): Design {
  try {
    return model.design(brief, { ...model.defaults, ...(options ?? {}) }, catalogue);
  } catch (error) {
    if (!isDesignAnswer(error)) throw error;
    return infeasibleDesign(model.id, brief, `could not be computed: ${messageOf(error)}`);
  }
}

function attempt<T>(run: () => T): { value: T | null; error: string } {
  try {
    return { value: run(), error: "" };
  } catch (error) {
    return { value: null, error: messageOf(error) };
  }
}

/**
 * Carbon and cost of a design, with the study's tables, each assessed on its own: a gap in the
 * factor table blanks the carbon but not the cost, and the other way round. `error` says why
 * either is missing (both reasons, carbon first).
 */
export function assessDesign(design: Design, study: Pick<StudyInputs, "carbon" | "cost">): Pick<SchemeResult, "carbon" | "cost" | "error"> {
  if (design.takeoff.length === 0) return { carbon: null, cost: null, error: design.feasible ? "no take-off" : "" };
  const areas = { usableFloorM2: design.usableFloorM2, planAreaM2: design.planAreaM2, roofSurfaceM2: design.roofSurfaceM2 };
  const carbon = attempt(() => assessCarbon(design.takeoff, study.carbon.factors, study.carbon.settings, areas));
  const cost = attempt(() => assessCost(design.takeoff, study.cost.rates, study.cost.onCosts, areas));
  return { carbon: carbon.value, cost: cost.value, error: [carbon.error, cost.error].filter((e) => e !== "").join("; ") };
}

/** A scheme's design assessed with the study's tables, with its figures. */
export function schemeResult(id: SchemeId, label: string, design: Design, study: Pick<StudyInputs, "carbon" | "cost">): SchemeResult {
  const assessed = { id, label, design, ...assessDesign(design, study) };
  return { ...assessed, figures: schemeFigures(assessed) };
}

/**
 * The whole pipeline for a study: each scheme designed, taken off, and assessed for carbon and
 * cost. Deterministic: the same study gives the same numbers.
 */
export function evaluateStudy(study: StudyInputs, catalogue: Catalogue, options: EvaluateOptions = {}): Evaluation {
  const brief = options.spanM === undefined ? study.brief : briefAtSpan(study.brief, options.spanM);
  const chosen = options.schemeIds ? SCHEMES.filter((m) => options.schemeIds?.includes(m.id)) : SCHEMES.filter((m) => study.schemes[m.id]?.enabled !== false);
  const results = chosen.map((model) => schemeResult(model.id, model.label, designScheme(model, brief, study.schemes[model.id]?.options, catalogue), study));
  return { brief, results };
}
