import { studyFromJson, studyToJson } from "./load-study";
import type { Study } from "./study";

/** The browser-storage key of the current study. */
export const STORAGE_KEY = "spanbook.study";

/** Minimal storage interface (window.localStorage fits), so this can be tested without a browser. */
export interface KeyValueStore {
  getItem(key: string): string | null;
  setItem(key: string, value: string): void;
  removeItem(key: string): void;
}

export type StoredStudy = { study: Study; message: string | null } | null;

/**
 * Reads the saved study. Nothing saved → null. Corrupt or invalid storage → the fallback study
 * with a message saying why (the broken entry is left in place for inspection, not applied).
 */
export function readStoredStudy(store: KeyValueStore, fallback: () => Study): StoredStudy {
  let text: string | null;
  try {
    text = store.getItem(STORAGE_KEY);
  } catch {
    return { study: fallback(), message: "browser storage could not be read; started from the defaults" };
  }
  if (text === null) return null;
  const result = studyFromJson(text);
  if (result.ok) return { study: result.study, message: null };
  const first = result.problems[0];
  return { study: fallback(), message: `the saved study could not be used (${first ? `${first.path}: ${first.message}` : "unknown problem"}); started from the defaults` };
}

/** Saves the study (with its schema version, which the study carries). Returns an error message or null. */
export function writeStoredStudy(store: KeyValueStore, study: Study): string | null {
  try {
    store.setItem(STORAGE_KEY, studyToJson(study));
    return null;
  } catch (error) {
    return `could not save to browser storage: ${error instanceof Error ? error.message : String(error)}`;
  }
}
