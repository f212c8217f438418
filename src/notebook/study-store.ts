import { signal, effect, computed, type Signal, type ReadonlySignal } from "@preact/signals-core";
import {
  defaultStudy,
  decodeStudyLink,
  encodeStudyLink,
  readStoredStudy,
  writeStoredStudy,
  studyFromObject,
  describeProblems,
  getIn,
  setIn,
  type Study,
} from "../study";
import type { Binding } from "./controls";

export interface StudyStore {
  study: Signal<Study>;
  /** Messages for the user about loading and saving (empty when all is well). */
  notice: Signal<string>;
  /** A binding to one field of the study, by path. */
  bind<T>(path: readonly (string | number)[]): Binding<T>;
  /** Replaces the whole study (after validation by the caller). */
  replace(study: Study): void;
  /** The link that reopens the current study. */
  link: ReadonlySignal<string>;
}

export interface StoreOptions {
  /** The study to open when neither the link nor browser storage has one (the demo study). */
  initial: unknown;
  /** Save to browser storage and keep the URL in step (off for the read-only client view). */
  persist: boolean;
}

/**
 * The page's study, opened from (in order) the link's fragment, browser storage, or the demo
 * study; saved back to storage and to the link on every change. An invalid link or corrupt storage
 * changes nothing and sets a notice.
 */
export function createStudyStore(options: StoreOptions): StudyStore {
  const defaults = defaultStudy();
  const notices: string[] = [];
  let initial: Study | undefined;

  const fragment = location.hash.startsWith("#s=") ? location.hash.slice(3) : "";
  if (fragment) {
    const result = decodeStudyLink(fragment, defaults);
    if (result.ok) initial = result.study;
    else notices.push(`The link's study could not be opened:\n${describeProblems(result.problems)}`);
  }
  if (!initial && options.persist) {
    const stored = readStoredStudy(localStorage, () => defaults);
    if (stored) {
      initial = stored.study;
      if (stored.message) notices.push(stored.message);
    }
  }
  if (!initial) {
    const demo = studyFromObject(options.initial);
    if (demo.ok) initial = demo.study;
    else {
      notices.push(`The demo study is invalid, so the defaults are shown:\n${describeProblems(demo.problems)}`);
      initial = defaults;
    }
  }

  const study = signal(initial);
  const notice = signal(notices.join("\n"));
  const link = computed(() => `#s=${encodeStudyLink(study.value, defaults)}`);

  if (options.persist) {
    effect(() => {
      const current = study.value;
      const error = writeStoredStudy(localStorage, current);
      if (error) notice.value = error;
      history.replaceState(null, "", link.value);
    });
  }

  return {
    study,
    notice,
    link,
    replace(next) {
      study.value = next;
    },
    bind<T>(path: readonly (string | number)[]): Binding<T> {
      return {
        value: computed(() => getIn(study.value, path) as T),
        set(next: T) {
          study.value = setIn(study.value, path, next);
        },
      };
    },
  };
}
