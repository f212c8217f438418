// What a scheme's declaration.ts may import: declareScheme, defineOptions and the option
// fragments the schemes share. Nothing here designs, so the main-thread pages that read
// declarations (the declarations registry, ../declarations.ts) carry no design code.
import type { SchemeDeclaration, SchemeId, SchemeOptions } from "../types";
import type { DeclaredOptions } from "./define-options";

export { defineOptions, type DeclaredOptions, type OptionDeclaration, type OptionValues } from "./define-options";
export { ANALYSIS_OPTION, FABRIC_CHOICES, FABRIC_OPTION, TENSION_COMMON_OPTIONS, CLADDING_CHOICES, STEEL_GRADE_CHOICES } from "./option-choices";

/** A scheme's declaration as written in its folder: who it is, its valid range (SchemeDeclaration's own fields) and its options declared once (defineOptions). */
export type SchemeIdentity<O extends SchemeOptions, Id extends string> = Omit<SchemeDeclaration<O, Id>, "options" | "defaults"> & {
  options: DeclaredOptions<O>;
};

/** A scheme's declaration: its identity with the options' specs and defaults (from the one table of defineOptions). */
export function declareScheme<O extends SchemeOptions, const Id extends SchemeId>(identity: SchemeIdentity<O, Id>): SchemeDeclaration<O, Id> {
  const { options, ...rest } = identity;
  return { ...rest, options: options.specs, defaults: options.defaults };
}
