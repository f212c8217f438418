import * as v from "valibot";
import { integerIn, textUpTo, validateWith, validateOnce, type FieldProblem } from "../kernel/validate";
import { studyInputsEntries } from "../pipeline/inputs-schema";
import type { StudyInputs } from "../pipeline/study-inputs";
import { STUDY_SCHEMA_VERSION, type Study } from "./study";
import { RiskSettingsSchema } from "../risk/risk-settings";
import { defaultRiskSettings } from "../risk/default-risk-settings";

const isoDate = v.pipe(
  v.string((issue) => `${String(issue.input)} (expected a date YYYY-MM-DD)`),
  v.isoDate((issue) => `${JSON.stringify(issue.input)} (expected a date YYYY-MM-DD)`),
);

const isoTimestamp = v.pipe(
  v.string((issue) => `${String(issue.input)} (expected a date and time such as 2026-12-02T20:15:00Z)`),
  v.isoTimestamp((issue) => `${JSON.stringify(issue.input)} (expected a date and time such as 2026-12-02T20:15:00Z)`),
);

/** The study's title, prepared-by, date, notes, the lead's recommendation and last-changed time. */
export const StudyMetaSchema = v.object({
  title: v.pipe(textUpTo(200), v.minLength(1, "an empty title (expected 1 to 200 characters)")),
  author: textUpTo(200),
  date: isoDate,
  notes: v.optional(textUpTo(5000), ""),
  /** The project lead's recommendation shown to the client (issue 14); files saved before it open with "". */
  recommendation: v.optional(textUpTo(5000), ""),
  changedAt: v.optional(isoTimestamp),
});

/** The message for a value of one meta field that is not allowed (null when it is), from the study schema. */
export function metaFieldProblem(key: "title" | "author" | "date" | "notes" | "recommendation", raw: string): string | null {
  const result = v.safeParse(StudyMetaSchema.entries[key], raw);
  return result.success ? null : (result.issues[0]?.message ?? "not allowed");
}

/**
 * The study schema. Built on first use because the scheme registry defines the option fields, then
 * kept: a schema built afresh for each check made validating the study 16 ms instead of 2 ms, and
 * a control checks the candidate study on every step of a slider (issue 14).
 */
export function studySchema() {
  built ??= buildStudySchema();
  return built;
}
let built: ReturnType<typeof buildStudySchema> | undefined;

function buildStudySchema() {
  return v.pipe(v.object({
    schemaVersion: v.literal(STUDY_SCHEMA_VERSION, (issue) => `${String(issue.input)} (expected ${STUDY_SCHEMA_VERSION})`),
    meta: StudyMetaSchema,
    ...studyInputsEntries(),
    // A file without risk settings takes the defaults for its own tables (the demo study does).
    risk: v.optional(RiskSettingsSchema),
    seed: v.optional(integerIn(0, 2 ** 31 - 1), 20261202),
  }), v.transform((study) => (study.risk ? study : { ...study, risk: defaultRiskSettings(study as unknown as StudyInputs) })));
}

/** Validates a (migrated) study object: the study with defaults filled in, or every problem with its field path. */
export function validateStudy(input: unknown): { ok: true; study: Study } | { ok: false; problems: FieldProblem[] } {
  const result = validateWith(studySchema(), input);
  return result.ok ? { ok: true, study: result.value as Study } : result;
}

/**
 * The problems validateStudy finds in `input` ([] when none), checking each part of the study
 * (brief, schemes, carbon, …) on its own first and remembering the answer for each part object.
 * An edit makes new objects only along its path, so on a slider step only the edited part is
 * checked again: checking the whole study took ~16 % of a step's script (issue 14). The parts of
 * the study's object schema see only their own value, so when every part passes the study does;
 * when one fails the whole study is checked, for exactly validateStudy's problems and wording.
 */
export function studyProblems(input: unknown): FieldProblem[] {
  const parts = typeof input === "object" && input !== null && !Array.isArray(input) ? (input as Record<string, unknown>) : null;
  if (parts && Object.entries(studySchema().pipe[0].entries).every(([key, schema]) => validateOnce(schema, parts[key]).ok)) return [];
  const whole = validateStudy(input);
  return whole.ok ? [] : whole.problems;
}
