import type { Brief } from "../../brief";
import type { Catalogue } from "../../catalogue/types";
import type { Design, SchemeDeclaration, SchemeId, SchemeModel, SchemeOptions } from "../types";
import type { DesignParts } from "./assemble";
import { checkSchemeOptions } from "./check-options";
import { assembleDesign, infeasibleDesign } from "./assemble";
import { failWith, SchemeError } from "./errors";
import { iterateSelfWeight, type Converged } from "./converge";
import type { Lines } from "./lazy-drawing";

/**
 * A scheme's own steps: geometry → loads → self-weight iterated around sizing
 * (`convergeSelfWeight`) → checks, returning the design's parts, which the template assembles
 * (a scheme that compares variants of itself may return finished designs instead). Throws a
 * SchemeError (with the scheme's reason) when the scheme cannot be built; the template turns it
 * into an infeasible design.
 */
export type SchemeDesign<O extends SchemeOptions> = (brief: Brief, options: O, catalogue: Catalogue) => DesignParts | Design;

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
 * The design template every scheme shares, on the scheme's declaration (declareScheme): the options
 * are checked against their declarations first (a RangeError naming the option), then the scheme's
 * own steps run and their parts are assembled (totals, self-weight, governing check, feasibility);
 * a SchemeError from any step gives an infeasible design with the scheme's reason.
 */
export function defineScheme<O extends SchemeOptions, Id extends SchemeId>(declaration: SchemeDeclaration<O, Id>, design: SchemeDesign<O>): SchemeModel<O, Id> {
  return {
    ...declaration,
    design(brief, opts, catalogue) {
      checkSchemeOptions(declaration.options, opts);
      return infeasibleOnFailure(declaration.id, brief, () => {
        const result = design(brief, opts, catalogue);
        return "schemeId" in result ? result : assembleDesign(declaration, brief, result);
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
  failure: { section: Lines; reason?: (message: string) => string },
): Converged<T> {
  try {
    return iterateSelfWeight(size, initialKPa);
  } catch (error) {
    return failWith(error, failure.reason ?? ((m) => m), { section: failure.section });
  }
}
