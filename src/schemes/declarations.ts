// The declarations registry: what each scheme is, without its designer (id, label, colour,
// description, valid span, rise ratios, options). The main-thread pages, the study schema and
// defaults, the palette, the assumptions and the risk defaults read this, so their bundles carry no
// design code; the design registry (./index.ts) builds each model on the same declaration and is
// read by the pipeline, the workers and the command line. Adding a scheme: its id in ./ids.ts, one
// line here and one in ./index.ts.
import type { SchemeDeclaration, SchemeOptions } from "./types";
import { SCHEME_IDS, type SchemeId } from "./ids";
import { cableDomeDeclaration } from "./cable-dome/declaration";
import { cableNetDeclaration } from "./cable-net/declaration";
import { geodesicDomeDeclaration } from "./geodesic-dome/declaration";
import { trussRoofDeclaration } from "./truss-roof/declaration";
import { concreteShellDeclaration } from "./concrete-shell/declaration";
import { timberDomeDeclaration } from "./timber-dome/declaration";

export { SCHEME_IDS } from "./ids";
export type { SchemeDeclaration, SchemeId, SchemeOptions, OptionSpec, OptionValue, UncertaintyKind } from "./types";

/**
 * One line per scheme, under its id. The compiler checks it against SCHEME_IDS (./ids.ts): every id
 * has its declaration, none is extra, and each carries the id it is filed under.
 */
const DECLARATIONS: { readonly [Id in SchemeId]: SchemeDeclaration<SchemeOptions, Id> } = {
  "cable-dome": cableDomeDeclaration,
  "cable-net": cableNetDeclaration,
  "geodesic-dome": geodesicDomeDeclaration,
  "truss-roof": trussRoofDeclaration,
  "concrete-shell": concreteShellDeclaration,
  "timber-dome": timberDomeDeclaration,
};

/** Every scheme's declaration, in the order pages list them (the order of SCHEME_IDS). */
export const SCHEME_DECLARATIONS: readonly SchemeDeclaration[] = SCHEME_IDS.map((id) => DECLARATIONS[id]);

/** The option through which a scheme offers its 3D analysis on demand (issue 13: seconds at 160 m, so not in every design): the lattice domes' toggle, set by the compare page's button and the command line's --buckling. */
export const ON_DEMAND_ANALYSIS_OPTION = "bucklingAnalysis";
