import type { OptionSpec, UncertaintyKind } from "../types";

/** A number option: unit, range, step, default, where they come from, and what kind of uncertainty it is (if any). */
export interface NumberOption {
  kind: "number";
  label: string;
  /** "" for a ratio or a count. */
  unit: string;
  min: number;
  max: number;
  step: number;
  /** Whole numbers only (counts). */
  integer?: boolean;
  default: number;
  source: string;
  uncertainty?: UncertaintyKind;
  /** A free proportion the pipeline may search within [min, max] unless the user pins it. */
  free?: boolean;
  /** Free only while another option has this value (see OptionSpec). */
  freeWhen?: { key: string; value: string | boolean };
  /** The search's reference for a free option, per metre of span (see OptionSpec). */
  referencePerSpanM?: number;
  /** The search's reference where it is not the default (see OptionSpec). */
  searchReference?: number;
  /** The least value the search tries (see OptionSpec). */
  searchMin?: number;
}

/** A choice among named values. */
export interface SelectOption {
  kind: "select";
  label: string;
  choices: readonly { value: string; label: string }[];
  default: string;
  source: string;
  /** A free proportion: the pipeline may search its choices unless the user pins it. */
  free?: boolean;
}

/** A yes/no option. */
export interface ToggleOption {
  kind: "toggle";
  label: string;
  default: boolean;
  source: string;
  /** A free proportion: the pipeline may try both unless the user pins it. */
  free?: boolean;
}

export type OptionDeclaration = NumberOption | SelectOption | ToggleOption;

/** The options object a designer receives, derived from the declarations. */
export type OptionValues<T extends Record<string, OptionDeclaration>> = {
  [K in keyof T]: T[K] extends NumberOption ? number : T[K] extends ToggleOption ? boolean : string;
};

/** A scheme's options, declared once: the specs the controls, the study schema and the risk defaults read, and the defaults. */
export interface DeclaredOptions<O> {
  specs: readonly OptionSpec[];
  defaults: O;
}

function specOf(key: string, d: OptionDeclaration): OptionSpec {
  switch (d.kind) {
    case "number": {
      const { default: _default, ...rest } = d;
      return { key, ...rest };
    }
    case "select":
      return { key, label: d.label, kind: "select", unit: "", choices: d.choices, source: d.source, ...(d.free ? { free: true } : {}) };
    case "toggle":
      return { key, label: d.label, kind: "toggle", unit: "", source: d.source, ...(d.free ? { free: true } : {}) };
  }
}

/**
 * Declares a scheme's options, each once, in the order the page lists them: the option type, the
 * defaults and the specs (from which the study schema, the controls, the assumptions record and the
 * risk defaults are built) all come from this one table.
 */
export function defineOptions<T extends Record<string, OptionDeclaration>>(declarations: T): DeclaredOptions<OptionValues<T>> {
  const entries = Object.entries(declarations);
  return {
    specs: entries.map(([key, d]) => specOf(key, d)),
    defaults: Object.fromEntries(entries.map(([key, d]) => [key, d.default])) as OptionValues<T>,
  };
}
