import type { Brief } from "../brief";
import type { Catalogue } from "../catalogue/types";
import type { Design, OptionValue, SchemeId, SchemeModel, SchemeOptions } from "../schemes/types";
import { SCHEMES, infeasibleDesign, isDesignAnswer } from "../schemes";
import { messageOf } from "../kernel/errors";
import { designCarbonPerM2Floor, designCost, schemeResult, type SchemeResult } from "./scheme-result";
import { commonRiseM, dimensionsOf, riseSettingFor, searchProportions, RISE_KEY, type Objective, type ProportionChoice, type ScreenedChoice } from "./proportions";
import type { SchemeSetting, StudyInputs } from "./study-inputs";
import { refineInFull } from "./refine-in-full";

export interface Evaluation {
  brief: Brief;
  results: SchemeResult[];
}

export interface EvaluateOptions {
  /** Evaluate at this span instead of the brief's (the rise keeps the brief's rise/span ratio). */
  spanM?: number;
  /** Only these schemes (default: the study's enabled schemes). */
  schemeIds?: readonly SchemeId[];
  /**
   * "full" (default): each scheme designed with its full options at the proportions its search chose
   * (the tension roofs by the 3D analysis); "screening": the search's own design, with the scheme's
   * screening options (the tension roofs by the closed form) — the span study's fast first pass.
   */
  depth?: Depth;
  /**
   * With depth "full": the screening choices an earlier "screening" evaluation of the same study at
   * the same span returned (`SchemeResult.screened`), by scheme; those schemes skip their search and
   * are designed in full from it (the span study's second pass).
   */
  screened?: Partial<Record<SchemeId, ScreenedChoice>>;
}

/** How far a scheme is designed: with its full options, or only as the proportion search screens it. */
export type Depth = "full" | "screening";

/** The brief at another span: the common rise there (the rise-to-span ratio kept, within the height limit). */
export function briefAtSpan(brief: Brief, spanM: number): Brief {
  return { ...brief, spanM, riseM: commonRiseM(brief, spanM) };
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

/**
 * The whole pipeline for a study: each scheme designed, taken off, and assessed for carbon and
 * cost. Deterministic: the same study gives the same numbers.
 */
export function evaluateStudy(study: StudyInputs, catalogue: Catalogue, options: EvaluateOptions = {}): Evaluation {
  const brief = options.spanM === undefined ? study.brief : briefAtSpan(study.brief, options.spanM);
  const chosen = options.schemeIds ? SCHEMES.filter((m) => options.schemeIds?.includes(m.id)) : SCHEMES.filter((m) => study.schemes[m.id]?.enabled !== false);
  const results = chosen.map((model) => {
    const searched = designAtBestProportions(model, brief, study.schemes[model.id], study, catalogue, options.depth, options.screened?.[model.id]);
    return { ...schemeResult(model.id, model.label, searched.design, study), brief: searched.brief, proportions: searched.proportions, ...(searched.screened ? { screened: searched.screened } : {}) };
  });
  return { brief, results };
}

/**
 * The objective of a design per m² of its usable floor: total mass (substructure included), counted
 * embodied carbon, or cost, assessed with the study's tables; +∞ when there is no usable floor or
 * the figure cannot be assessed. The schemes know nothing of it: the search calls it on each candidate.
 */
export function objectiveValue(design: Design, study: Pick<StudyInputs, "carbon" | "cost">, objective: Objective): number {
  if (!(design.usableFloorM2 > 0)) return Number.POSITIVE_INFINITY;
  if (objective === "mass") return design.totalMassKg / design.usableFloorM2;
  if (design.takeoff.length === 0) return Number.POSITIVE_INFINITY;
  // only the table the objective reads: the search assesses every candidate, and the other half was thrown away
  const value = objective === "carbon" ? designCarbonPerM2Floor(design, study) : designCost(design, study).value?.perM2UsableFloor?.total;
  return value ?? Number.POSITIVE_INFINITY;
}

/** One scheme designed at its best proportions for a brief (already at its span): the design, the brief it was designed for, and the choice. */
export interface SearchedDesign {
  design: Design;
  /** The brief this scheme was designed for: the evaluated brief with the scheme's own rise. */
  brief: Brief;
  proportions: ProportionChoice;
  /** At depth "screening", for a scheme whose full design differs: the search's choice, from which `designAtBestProportions` can design it in full later without searching again. */
  screened?: ScreenedChoice;
}

/** The options a search candidate is designed with: the scheme's screening options, except those the user pinned. */
function screened(model: SchemeModel, options: SchemeOptions, pinned: readonly string[]): SchemeOptions {
  // only the screening options that change something: when none does, the chosen candidate is already the full design
  const screening = Object.entries(model.screeningOptions ?? {}).filter((entry): entry is [string, OptionValue] => entry[1] !== undefined && !pinned.includes(entry[0]) && options[entry[0]] !== entry[1]);
  return screening.length === 0 ? options : { ...options, ...Object.fromEntries(screening) };
}

/**
 * The one rule every page and the command line use: a scheme's free proportions (and its rise under
 * the "own" rule) searched for the brief's objective, pinned ones left as the study sets them; the
 * rise within the scheme's rise ÷ span range and the height limit. The brief is at its span, its
 * rise the common rise there (briefAtSpan). Candidates are designed with the scheme's screening
 * options when it declares any; the chosen proportions are then designed with the full options and
 * that design's value reported (the runner-up's difference stays the screening one). Given
 * `screenedBefore` (the `screened` a "screening" call for the same brief and setting returned), a
 * full design starts from it without searching again.
 */
export function designAtBestProportions(
  model: SchemeModel,
  brief: Brief,
  setting: SchemeSetting | undefined,
  study: Pick<StudyInputs, "carbon" | "cost">,
  catalogue: Catalogue,
  depth: Depth = "full",
  screenedBefore?: ScreenedChoice,
): SearchedDesign {
  const objective = brief.objective;
  const options = { ...model.defaults, ...(setting?.options ?? {}) };
  const pinned = setting?.pinned ?? [];
  const rise = riseSettingFor(model, brief, brief.spanM, setting?.riseM);
  if (rise.kind === "none") {
    const design = infeasibleDesign(model.id, brief, rise.reason);
    return { design, brief, proportions: { objective, searched: [], pinned: [...pinned], proportions: { [RISE_KEY]: brief.riseM }, riseM: brief.riseM, riseSource: "searched", value: Number.POSITIVE_INFINITY, evaluations: 0, runnerUp: null } };
  }
  // with nothing to search the full options are designed at once, unless only the screening design is asked for
  const screening = depth === "screening" || dimensionsOf(model, options, pinned, rise).length > 0 ? screened(model, options, pinned) : options;
  const designAt = (opts: SchemeOptions, riseM: number) => designScheme(model, { ...brief, riseM }, opts, catalogue);
  const assess = (design: Design) => objectiveValue(design, study, objective);
  const search = () => searchProportions(model, screening, pinned, rise, objective, designAt, assess, brief.spanM);
  if (screening === options || depth === "screening") {
    const { chosen, choice } = search();
    const kept = screening === options ? {} : { screened: { options: chosen.options, riseM: chosen.riseM, choice } };
    return { design: chosen.design, brief: { ...brief, riseM: chosen.riseM }, proportions: choice, ...kept };
  }
  const { options: chosenOptions, riseM: chosenRiseM, choice } = screenedBefore ?? screenedChoiceOf(search());
  const start = { options: { ...chosenOptions, ...pick(options, Object.keys(model.screeningOptions ?? {})) }, riseM: chosenRiseM };
  const { full, runnerUp, refinements, evaluations } = refineInFull(model, start, { rise, spanM: brief.spanM, pinned }, designAt, assess);
  const keys = refinements.map((r) => r.key);
  const refinedIn = (d: { options: SchemeOptions; riseM: number }) => Object.fromEntries(keys.map((k) => [k, k === RISE_KEY ? d.riseM : (d.options[k] as OptionValue)]));
  const proportions = { ...choice.proportions, ...refinedIn(full) };
  const differing = Object.keys(model.screeningOptions ?? {}).filter((k) => screening[k] !== options[k]);
  const fullChoice = {
    screening: pick(screening, differing),
    options: pick(options, differing),
    refined: keys,
    evaluations,
    first: { proportions: choice.proportions, riseM: choice.riseM },
    runnerUp: runnerUp && Number.isFinite(full.objective) ? { proportions: { ...proportions, ...refinedIn(runnerUp) }, riseM: runnerUp.riseM, value: runnerUp.objective, differencePct: (100 * (runnerUp.objective - full.objective)) / full.objective } : null,
  };
  return { design: full.design, brief: { ...brief, riseM: full.riseM }, proportions: { ...choice, proportions, riseM: full.riseM, value: full.objective, full: fullChoice } };
}

function screenedChoiceOf({ chosen, choice }: ReturnType<typeof searchProportions>): ScreenedChoice {
  return { options: chosen.options, riseM: chosen.riseM, choice };
}

/**
 * Whether a scheme's full design differs from its screening one for this setting (it declares
 * screening options the study neither sets to the same values nor pins): the tension roofs with the
 * 3D analysis. The span study designs these again after its fast pass.
 */
export function screensDifferently(model: SchemeModel, setting: SchemeSetting | undefined): boolean {
  const options = { ...model.defaults, ...(setting?.options ?? {}) };
  return screened(model, options, setting?.pinned ?? []) !== options;
}

/** A setting's options as the proportion search designs its candidates: with the scheme's screening options (the tension roofs by the closed form), except those pinned. */
export function screenedOptions(model: SchemeModel, setting: SchemeSetting | undefined): SchemeOptions {
  return screened(model, { ...model.defaults, ...(setting?.options ?? {}) }, setting?.pinned ?? []);
}

function pick(options: SchemeOptions, keys: readonly string[]): SchemeOptions {
  return Object.fromEntries(keys.filter((k) => k in options).map((k) => [k, options[k] as OptionValue]));
}

/**
 * A scheme designed again at proportions the search already chose (for the same study at its own
 * values) under changed inputs — the risk analysis's draws: the searched options keep their chosen
 * values, a searched rise keeps its rise ÷ span, everything else (pinned options, the common rise,
 * the loads) comes from the changed study. Without a choice, the options as given.
 */
export function designWithChoice(model: SchemeModel, brief: Brief, options: SchemeOptions | undefined, choice: { proportions: ProportionChoice; spanM: number } | undefined, catalogue: Catalogue): Design {
  if (!choice) return designScheme(model, brief, options, catalogue);
  const { proportions } = choice;
  const fixed: SchemeOptions = { ...(options ?? {}) };
  for (const key of proportions.searched) if (key !== RISE_KEY && proportions.proportions[key] !== undefined) fixed[key] = proportions.proportions[key] as OptionValue;
  const riseM = proportions.riseSource === "common" ? brief.riseM : proportions.riseSource === "pinned" ? proportions.riseM : (proportions.riseM * brief.spanM) / choice.spanM;
  return designScheme(model, { ...brief, riseM }, fixed, catalogue);
}
