import { STUDY_SCHEMA_VERSION } from "./study";
import { migrateRiskInputsV1 } from "../risk/migrate-risk-inputs";
import { migrateEnvelopeV2 } from "./migrate-envelope";

/** A step that turns a study of version n into version n + 1. */
export type Migration = (study: Record<string, unknown>) => Record<string, unknown>;

/**
 * Migration steps by the version they start from. A format change adds `n: (old) => new` here and
 * bumps STUDY_SCHEMA_VERSION.
 * 1 → 2: risk inputs address table rows by material or item id instead of position, and store
 * their ranges as factors on (or offsets from) the study's value instead of absolute low/mode/high.
 * 2 → 3: the brief gains its envelope (height limit, rise rule "common" for a study saved before,
 * the search objective) and each scheme the pins of the options its user changed.
 */
export const MIGRATIONS: Readonly<Record<number, Migration>> = {
  1: migrateRiskInputsV1,
  2: migrateEnvelopeV2,
};

/**
 * Brings a parsed study file up to the current schema version, step by step. A file without a
 * version is refused (it is not a study); a newer version than this code knows is refused too.
 * @throws Error naming schemaVersion and what is allowed
 */
export function migrateStudy(input: unknown, migrations: Readonly<Record<number, Migration>> = MIGRATIONS, current = STUDY_SCHEMA_VERSION): unknown {
  if (typeof input !== "object" || input === null || Array.isArray(input)) throw new Error("not a study: expected a JSON object");
  let study = input as Record<string, unknown>;
  let version = study.schemaVersion;
  if (typeof version !== "number" || !Number.isInteger(version) || version < 1) {
    throw new Error(`invalid schemaVersion: ${JSON.stringify(version)} (expected a whole number from 1 to ${current})`);
  }
  if (version > current) throw new Error(`invalid schemaVersion: ${version} (this version of spanbook reads up to ${current}; the file was saved by a newer one)`);
  while (version < current) {
    const step = migrations[version];
    if (!step) throw new Error(`no migration from schemaVersion ${version} (expected a whole number from 1 to ${current})`);
    study = { ...step(study), schemaVersion: version + 1 };
    version += 1;
  }
  return study;
}
