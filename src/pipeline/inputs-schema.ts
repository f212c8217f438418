import * as v from "valibot";
import { BriefSchema } from "../brief";
import { numberIn, integerIn, oneOf, flag, validateWith, type FieldProblem } from "../kernel/validate";
import { SCHEME_DECLARATIONS } from "../schemes/declarations";
import type { OptionSpec, SchemeDeclaration, SchemeOptions } from "../schemes/types";
import { OPTION_RULES } from "../schemes/option-rules";
import { FactorRowSchema, CarbonSettingsSchema, defaultFactorRows, DEFAULT_CARBON_SETTINGS } from "../carbon";
import { RateRowSchema, OnCostsSchema, defaultRateRows, DEFAULT_ON_COSTS } from "../cost";
import type { StudyInputs } from "./study-inputs";

function optionSchema(spec: OptionSpec) {
  switch (spec.kind) {
    case "number":
      return spec.integer ? integerIn(spec.min, spec.max, spec.unit) : numberIn(spec.min, spec.max, spec.unit);
    case "select":
      return oneOf(spec.choices.map((c) => c.value) as unknown as readonly [string, ...string[]]);
    case "toggle":
      return flag();
  }
}

/** The options of one scheme: every key optional (a missing one takes the default), unknown keys refused, the scheme's OPTION_RULES applied. */
function schemeSettingSchema(model: SchemeDeclaration) {
  const entries = Object.fromEntries(model.options.map((spec) => [spec.key, v.optional(optionSchema(spec), model.defaults[spec.key])]));
  const setting = v.object({
    enabled: v.optional(flag(), true),
    options: v.optional(v.strictObject(entries, (issue) => `unknown option ${JSON.stringify((issue as { key?: unknown }).key ?? "")} (expected one of ${model.options.map((o) => o.key).join(", ")})`), {}),
    pinned: v.optional(v.array(oneOf(model.options.map((o) => o.key) as unknown as readonly [string, ...string[]]), "expected a list of option keys")),
    riseM: v.optional(numberIn(0.5, 250, "m")),
  });
  const optionsOf = (s: unknown) => ({ ...model.defaults, ...((s as { options?: SchemeOptions }).options ?? {}) });
  const rules = OPTION_RULES.filter((rule) => rule.scheme === model.id).map((rule) =>
    v.forward(
      v.check((s: v.InferOutput<typeof setting>) => rule.problem(optionsOf(s)) === null, (issue) => rule.problem(optionsOf(issue.input)) ?? ""),
      ["options", rule.option] as never,
    ),
  );
  return v.pipe(setting, ...(rules as [])) as unknown as typeof setting;
}

/** Every registered scheme optional; an unknown scheme id is refused, so a misspelt id is not silently dropped. */
function schemesSchema() {
  return v.strictObject(
    Object.fromEntries(SCHEME_DECLARATIONS.map((m) => [m.id, v.optional(schemeSettingSchema(m), { enabled: true, options: {} })])),
    (issue) => `unknown scheme ${JSON.stringify(issue.input)} (expected one of ${SCHEME_DECLARATIONS.map((m) => m.id).join(", ")})`,
  );
}

/**
 * The schema entries of what the pipeline reads (brief, schemes, carbon, cost), built on demand
 * because the scheme registry defines the option fields. The study schema adds its own around them.
 */
export function studyInputsEntries() {
  return {
    brief: BriefSchema,
    schemes: schemesSchema(),
    // A file without its own tables takes the defaults (the demo study does).
    carbon: v.optional(v.object({
      factors: v.pipe(
        v.array(FactorRowSchema, "expected a list of factor rows"),
        v.check((rows) => new Set(rows.map((r) => r.material)).size === rows.length, "the same material appears twice (expected one row per material)"),
      ),
      settings: CarbonSettingsSchema,
    }), () => ({ factors: defaultFactorRows(), settings: structuredClone(DEFAULT_CARBON_SETTINGS) })),
    cost: v.optional(v.object({
      rates: v.pipe(
        v.array(RateRowSchema, "expected a list of rate rows"),
        v.check((rows) => new Set(rows.map((r) => r.item)).size === rows.length, "the same item appears twice (expected one row per item)"),
      ),
      onCosts: OnCostsSchema,
    }), () => ({ rates: defaultRateRows(), onCosts: structuredClone(DEFAULT_ON_COSTS) }) as never),
  };
}

/** Validates the pipeline's part of a study (other keys are ignored): the inputs with defaults filled in, or every problem with its field path. */
export function validateStudyInputs(input: unknown): { ok: true; value: StudyInputs } | { ok: false; problems: FieldProblem[] } {
  const result = validateWith(v.object(studyInputsEntries()), input);
  return result.ok ? { ok: true, value: result.value as unknown as StudyInputs } : result;
}
