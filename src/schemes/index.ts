// Schemes: one module per structural system, all with the same SchemeModel interface.
import type { SchemeModel, SchemeOptions } from "./types";
import { cableDome } from "./cable-dome";
import { cableNet } from "./cable-net";
import { geodesicDome } from "./geodesic-dome";
import { trussRoof } from "./truss-roof";
import { concreteShell } from "./concrete-shell";

export type { SchemeModel, SchemeId, SchemeOptions, Design, MemberGroup, Check, OptionSpec, OptionValue, SummaryItem, DrawingLine } from "./types";
export { assembleDesign, infeasibleDesign, check, type DesignParts } from "./assemble-design";
export { iterateSelfWeight, ConvergenceError, type Converged } from "./converge";
export { checkSchemeOptions } from "./check-options";

/** Every scheme, in the order pages list them. Each scheme module adds itself here. */
export const SCHEMES: readonly SchemeModel<SchemeOptions>[] = [
  // tension schemes (cable dome, cable net) go first
  cableDome,
  cableNet,
  geodesicDome,
  trussRoof,
  concreteShell,
];
