// Schemes: one folder per structural system, each a SchemeModel built on the kit (./kit). Adding a
// scheme is one folder and one line here.
import type { SchemeModel, SchemeOptions } from "./types";
import { cableDome } from "./cable-dome";
import { cableNet } from "./cable-net";
import { geodesicDome } from "./geodesic-dome";
import { trussRoof } from "./truss-roof";
import { concreteShell } from "./concrete-shell";
import { timberDome } from "./timber-dome";

export type { SchemeModel, SchemeId, SchemeOptions, Design, MemberGroup, Check, OptionSpec, OptionValue, SummaryItem, DrawingLine, UncertaintyKind } from "./types";
export { assembleDesign, infeasibleDesign, check, isSubstructure, isDesignAnswer, SchemeError, type DesignParts } from "./kit";
export { iterateSelfWeight, ConvergenceError, type Converged } from "./kit";
export { checkSchemeOptions } from "./kit";

/** Every scheme, in the order pages list them. */
export const SCHEMES: readonly SchemeModel<SchemeOptions>[] = [
  // tension schemes (cable dome, cable net) go first
  cableDome,
  cableNet,
  geodesicDome,
  trussRoof,
  concreteShell,
  timberDome,
];
