import type { Brief } from "../../brief";
import type { Catalogue } from "../../catalogue/types";
import type { Design, DrawingLine, SchemeId, SchemeModel, SchemeOptions } from "../types";
import type { DesignParts } from "./assemble";
import type { DeclaredOptions } from "./define-options";
import { checkSchemeOptions } from "./check-options";
import { assembleDesign, infeasibleDesign } from "./assemble";
import { failWith, SchemeError } from "./errors";
import { iterateSelfWeight, type Converged } from "./converge";

/** What a scheme module declares: who it is, its options, and its design steps. */
export interface SchemeDefinition<O extends SchemeOptions, Id extends string> {
  id: Id;
  label: string;
  /** Colour on every chart and export (colour-blind-safe Okabe–Ito set). */
  colour: string;
  /** One plain paragraph on the structural system. */
  description: string;
  /** Span range in which the method is valid, m. */
  validSpanM: { min: number; max: number };
  /** The rise ÷ span the scheme may take when each scheme chooses its own rise. */
  riseSpanRatio?: { min: number; max: number; preferred: number };
  options: DeclaredOptions<O>;
  /** Cheaper options for the proportion search's candidates (SchemeModel.screeningOptions). */
  screeningOptions?: Partial<O>;
  /**
   * The scheme's own steps: geometry → loads → self-weight iterated around sizing
   * (`convergeSelfWeight`) → checks, returning the design's parts, which the template assembles
   * (a scheme that compares variants of itself may return finished designs instead). Throws a
   * SchemeError (with the scheme's reason) when the scheme cannot be built; the template turns it
   * into an infeasible design.
   */
  design(brief: Brief, options: O, catalogue: Catalogue): DesignParts | Design;
}

/**
 * Runs a design step; a SchemeError becomes an infeasible design with its reason, drawing and
 * warnings. Any other error (a TypeError, a bug) propagates: it is not a reason to show a user.
 */
export function infeasibleOnFailure(id: SchemeId, brief: Brief, run: () => Design): Design {
  try {
    return run();
  } catch (error) {
    if (!(error instanceof SchemeError)) throw error;
    return infeasibleDesign(id, brief, error.message, error.warnings, error.section);
  }
}

/**
 * The design template every scheme shares: the options are checked against their declarations
 * first (a RangeError naming the option), then the scheme's own steps run and their parts are
 * assembled (totals, self-weight, governing check, feasibility); a SchemeError from any step gives
 * an infeasible design with the scheme's reason.
 */
export function defineScheme<O extends SchemeOptions, const Id extends SchemeId>(def: SchemeDefinition<O, Id>): SchemeModel<O, Id> {
  const { options, design, ...identity } = def;
  return {
    ...identity,
    options: options.specs,
    defaults: options.defaults,
    design(brief, opts, catalogue) {
      checkSchemeOptions(options.specs, opts);
      return infeasibleOnFailure(def.id, brief, () => {
        const result = design(brief, opts, catalogue);
        return "schemeId" in result ? result : assembleDesign(identity, brief, result);
      });
    },
  };
}

/**
 * Iterates a sizing on its own self-weight (iterateSelfWeight); when it cannot be completed (the
 * weight diverges or does not settle, or no section is found) the failure carries the scheme's
 * reason and its drawing, with the original error as `cause`.
 * @param size sizes for an assumed self-weight, kPa, and returns the sizing and its own self-weight, kPa
 */
export function convergeSelfWeight<T>(
  size: (selfWeightKPa: number) => { value: T; selfWeightKPa: number },
  initialKPa: number,
  failure: { section: DrawingLine[]; reason?: (message: string) => string },
): Converged<T> {
  try {
    return iterateSelfWeight(size, initialKPa);
  } catch (error) {
    return failWith(error, failure.reason ?? ((m) => m), { section: failure.section });
  }
}
