import { migrateStudy } from "./migrate";
import { validateStudy } from "./study-schema";
import type { FieldProblem } from "../kernel/validate";
import type { Study } from "./study";
import { messageOf } from "../kernel/errors";

export type LoadResult = { ok: true; study: Study } | { ok: false; problems: FieldProblem[] };

/** Parses, migrates and validates a study from JSON text. Never throws; nothing is applied on failure. */
export function studyFromJson(text: string): LoadResult {
  let parsed: unknown;
  try {
    parsed = JSON.parse(text);
  } catch (error) {
    return { ok: false, problems: [{ path: "(file)", message: `not valid JSON: ${messageOf(error)}` }] };
  }
  return studyFromObject(parsed);
}

/** Migrates and validates a parsed study object. Never throws. */
export function studyFromObject(parsed: unknown): LoadResult {
  let migrated: unknown;
  try {
    migrated = migrateStudy(parsed);
  } catch (error) {
    return { ok: false, problems: [{ path: "schemaVersion", message: messageOf(error) }] };
  }
  return validateStudy(migrated);
}

/** The study as pretty JSON, the format of a saved file. */
export function studyToJson(study: Study): string {
  return `${JSON.stringify(study, null, 2)}\n`;
}

/** One line per problem: `field: message`. */
export function describeProblems(problems: readonly FieldProblem[], max = 20): string {
  const lines = problems.slice(0, max).map((p) => `${p.path}: ${p.message}`);
  if (problems.length > max) lines.push(`… and ${problems.length - max} more`);
  return lines.join("\n");
}
