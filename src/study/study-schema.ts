import * as v from "valibot";
import { BRIEF_LIMITS, TERRAIN_CATEGORIES } from "./brief";
import { numberIn, integerIn, oneOf, textUpTo, flag, validateWith, type FieldProblem } from "./schema-helpers";
import { SCHEMES } from "../schemes";
import type { OptionSpec, SchemeModel, SchemeOptions } from "../schemes/types";
import { FactorRowSchema, CarbonSettingsSchema, defaultFactorRows, DEFAULT_CARBON_SETTINGS } from "../carbon";
import { RateRowSchema, OnCostsSchema, defaultRateRows, DEFAULT_ON_COSTS } from "../cost";
import { STUDY_SCHEMA_VERSION, type Study } from "./study";
import { RiskSettingsSchema } from "../risk/risk-settings";
import { OPTION_RULES } from "./option-rules";
import { defaultRiskSettings } from "../risk/default-risk-settings";

const L = BRIEF_LIMITS;

const FactorsSchema = v.object({
  gammaGSup: numberIn(1, 2),
  gammaGInf: numberIn(0, 1.5),
  gammaQ: numberIn(1, 2),
  xi: numberIn(0.5, 1),
  psi0Snow: numberIn(0, 1),
  psi0Wind: numberIn(0, 1),
});

export const BriefSchema = v.pipe(
  v.object({
    spanM: numberIn(L.spanM.min, L.spanM.max, "m"),
    riseM: numberIn(L.riseM.min, L.riseM.max, "m"),
    eavesHeightM: numberIn(L.eavesHeightM.min, L.eavesHeightM.max, "m"),
    minClearHeightM: numberIn(L.minClearHeightM.min, L.minClearHeightM.max, "m"),
    snowGroundKPa: numberIn(L.snowGroundKPa.min, L.snowGroundKPa.max, "kPa"),
    windBasicMPerS: numberIn(L.windBasicMPerS.min, L.windBasicMPerS.max, "m/s"),
    terrain: oneOf(TERRAIN_CATEGORIES as unknown as readonly ["0", ...string[]]),
    airDensityKgPerM3: numberIn(L.airDensityKgPerM3.min, L.airDensityKgPerM3.max, "kg/m³"),
    upliftCoefficient: numberIn(L.upliftCoefficient.min, L.upliftCoefficient.max),
    imposedRoofKPa: numberIn(L.imposedRoofKPa.min, L.imposedRoofKPa.max, "kPa"),
    servicesKPa: numberIn(L.servicesKPa.min, L.servicesKPa.max, "kPa"),
    factors: FactorsSchema,
    ulsExpression: oneOf(["6.10", "6.10a/b"] as const),
  }),
  // Cross-field: checked whenever span and rise are themselves valid, even if another field is not.
  v.forward(
    v.partialCheck([["riseM"], ["spanM"]], (b) => b.riseM <= b.spanM / 2, (issue) => `${(issue.input as { riseM: number }).riseM} m (expected 0 < rise ≤ span/2 = ${(issue.input as { spanM: number }).spanM / 2} m)`),
    ["riseM"],
  ),
);

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
function schemeSettingSchema(model: SchemeModel) {
  const entries = Object.fromEntries(model.options.map((spec) => [spec.key, v.optional(optionSchema(spec), model.defaults[spec.key])]));
  const setting = v.object({
    enabled: v.optional(flag(), true),
    options: v.optional(v.strictObject(entries, (issue) => `unknown option ${JSON.stringify((issue as { key?: unknown }).key ?? "")} (expected one of ${model.options.map((o) => o.key).join(", ")})`), {}),
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
    Object.fromEntries(SCHEMES.map((m) => [m.id, v.optional(schemeSettingSchema(m), { enabled: true, options: {} })])),
    (issue) => `unknown scheme ${JSON.stringify(issue.input)} (expected one of ${SCHEMES.map((m) => m.id).join(", ")})`,
  );
}

const isoDate = v.pipe(
  v.string((issue) => `${String(issue.input)} (expected a date YYYY-MM-DD)`),
  v.isoDate((issue) => `${JSON.stringify(issue.input)} (expected a date YYYY-MM-DD)`),
);

const isoTimestamp = v.pipe(
  v.string((issue) => `${String(issue.input)} (expected a date and time such as 2026-12-02T20:15:00Z)`),
  v.isoTimestamp((issue) => `${JSON.stringify(issue.input)} (expected a date and time such as 2026-12-02T20:15:00Z)`),
);

/** The study's title, prepared-by, date, notes and last-changed time. */
export const StudyMetaSchema = v.object({
  title: v.pipe(textUpTo(200), v.minLength(1, "an empty title (expected 1 to 200 characters)")),
  author: textUpTo(200),
  date: isoDate,
  notes: v.optional(textUpTo(5000), ""),
  changedAt: v.optional(isoTimestamp),
});

/** The message for a value of one meta field that is not allowed (null when it is), from the study schema. */
export function metaFieldProblem(key: "title" | "author" | "date" | "notes", raw: string): string | null {
  const result = v.safeParse(StudyMetaSchema.entries[key], raw);
  return result.success ? null : (result.issues[0]?.message ?? "not allowed");
}

/** The study schema. Built on demand because the scheme registry defines the option fields. */
export function studySchema() {
  return v.pipe(v.object({
    schemaVersion: v.literal(STUDY_SCHEMA_VERSION, (issue) => `${String(issue.input)} (expected ${STUDY_SCHEMA_VERSION})`),
    meta: StudyMetaSchema,
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
    // A file without risk settings takes the defaults for its own tables (the demo study does).
    risk: v.optional(RiskSettingsSchema),
    seed: v.optional(integerIn(0, 2 ** 31 - 1), 20261202),
  }), v.transform((study) => (study.risk ? study : { ...study, risk: defaultRiskSettings(study as unknown as Omit<Study, "risk">) })));
}

/** Validates a (migrated) study object: the study with defaults filled in, or every problem with its field path. */
export function validateStudy(input: unknown): { ok: true; study: Study } | { ok: false; problems: FieldProblem[] } {
  const result = validateWith(studySchema(), input);
  return result.ok ? { ok: true, study: result.value as Study } : result;
}
