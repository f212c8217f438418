// What a scheme's declaration.ts may import: declareScheme, defineOptions and the option
// fragments the schemes share. Nothing here designs, so the main-thread pages that read
// declarations (the declarations registry, ../declarations.ts) carry no design code.
import type { SchemeDeclaration, SchemeId, SchemeOptions } from "../types";
import type { DeclaredOptions } from "./define-options";

export { defineOptions, type DeclaredOptions, type OptionDeclaration, type OptionValues } from "./define-options";
export { ANALYSIS_OPTION, FABRIC_CHOICES, FABRIC_OPTION, TENSION_COMMON_OPTIONS, CLADDING_CHOICES, STEEL_GRADE_CHOICES } from "./option-choices";

/** A scheme's declaration as written in its folder: who it is, its valid range and its options declared once (defineOptions). */
export interface SchemeIdentity<O extends SchemeOptions, Id extends string> {
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
}

/** A scheme's declaration: its identity with the options' specs and defaults (from the one table of defineOptions). */
export function declareScheme<O extends SchemeOptions, const Id extends SchemeId>(identity: SchemeIdentity<O, Id>): SchemeDeclaration<O, Id> {
  const { options, ...rest } = identity;
  return { ...rest, options: options.specs, defaults: options.defaults };
}
