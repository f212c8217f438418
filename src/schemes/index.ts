// The design registry: one folder per structural system, each a SchemeModel built on the kit (./kit)
// and on its declaration (./<id>/declaration.ts). The pipeline, the workers and the command line
// read it; main-thread pages read the declarations registry (./declarations.ts), which carries no
// design code. Adding a scheme is one folder, its id in ./ids.ts and one line here and there.
import type { SchemeModel, SchemeOptions } from "./types";
import { SCHEME_IDS, type SchemeId } from "./ids";
import { cableDome } from "./cable-dome";
import { cableNet } from "./cable-net";
import { geodesicDome } from "./geodesic-dome";
import { trussRoof } from "./truss-roof";
import { concreteShell } from "./concrete-shell";
import { timberDome } from "./timber-dome";

export { SCHEME_IDS } from "./ids";
export type { SchemeModel, SchemeDeclaration, SchemeId, SchemeOptions, Design, MemberGroup, Check, OptionSpec, OptionValue, SummaryItem, DrawingLine, UncertaintyKind } from "./types";
export { assembleDesign, infeasibleDesign, check, isSubstructure, isDesignAnswer, SchemeError, type DesignParts } from "./kit";
export { iterateSelfWeight, ConvergenceError, type Converged } from "./kit";
export { checkSchemeOptions } from "./kit";

/**
 * The registry: one line per scheme, under its id. The compiler checks it against SCHEME_IDS
 * (./ids.ts): every id has its model, no model is extra, and each model carries the id it is filed under.
 */
const REGISTRY: { readonly [Id in SchemeId]: SchemeModel<SchemeOptions, Id> } = {
  "cable-dome": cableDome,
  "cable-net": cableNet,
  "geodesic-dome": geodesicDome,
  "truss-roof": trussRoof,
  "concrete-shell": concreteShell,
  "timber-dome": timberDome,
};

/** Every scheme, in the order pages list them (the order of SCHEME_IDS: tension schemes first). */
export const SCHEMES: readonly SchemeModel<SchemeOptions>[] = SCHEME_IDS.map((id) => REGISTRY[id]);
