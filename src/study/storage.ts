import { studyFromJson, studyToJson } from "./load-study";
import type { Study } from "./study";
import { messageOf } from "../kernel/errors";

/** The browser-storage key of the current study. */
export const STORAGE_KEY = "spanbook.study";
/** Where a stored study that could not be read is kept (never deleted by spanbook). */
export const UNREADABLE_KEY = "spanbook.study.unreadable";
/** Where the local study is kept when a shared link replaces it. */
export const BEFORE_LINK_KEY = "spanbook.study.before-link";

/** Minimal storage interface (window.localStorage fits), so this can be tested without a browser. */
export interface KeyValueStore {
  getItem(key: string): string | null;
  setItem(key: string, value: string): void;
  removeItem(key: string): void;
}

export type StoredStudy = {
  study: Study;
  message: string | null;
  /** The stored text when it could not be used, and the key it is now also kept under. */
  unreadable?: { text: string; backupKey: string | null };
} | null;

/**
 * Copies text that spanbook could not read to a backup key, never overwriting a different
 * backup (a second one gets a numbered key). Returns the key, or null when storage refused.
 */
export function backupUnreadable(store: KeyValueStore, text: string): string | null {
  try {
    for (let n = 1; n < 100; n++) {
      const key = n === 1 ? UNREADABLE_KEY : `${UNREADABLE_KEY}.${n}`;
      const held = store.getItem(key);
      if (held === text) return key;
      if (held === null) {
        store.setItem(key, text);
        return key;
      }
    }
  } catch {
    return null;
  }
  return null;
}

/**
 * Reads the saved study. Nothing saved → null. Corrupt or invalid storage → the fallback study
 * with a message saying why; the entry is left in place and also copied under UNREADABLE_KEY,
 * so that a later save cannot destroy it.
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
  const backupKey = backupUnreadable(store, text);
  const kept = backupKey ? `It is kept in browser storage under "${backupKey}"` : "It could not be copied, but it is left in place";
  return {
    study: fallback(),
    message: `the saved study could not be used (${first ? `${first.path}: ${first.message}` : "unknown problem"}), so the defaults are shown. ${kept}, and nothing is saved over it until you change something.`,
    unreadable: { text, backupKey },
  };
}

/** Saves the study (with its schema version, which the study carries). Returns an error message or null. */
export function writeStoredStudy(store: KeyValueStore, study: Study): string | null {
  try {
    const current = store.getItem(STORAGE_KEY);
    // Never overwrite an entry this version cannot read (a newer version's, say) without a copy.
    if (current !== null && !studyFromJson(current).ok && backupUnreadable(store, current) === null) {
      return "not saved: the study in browser storage could not be read and could not be backed up, so it is left as it is";
    }
    store.setItem(STORAGE_KEY, studyToJson(study));
    return null;
  } catch (error) {
    return `could not save to browser storage: ${messageOf(error)}`;
  }
}
