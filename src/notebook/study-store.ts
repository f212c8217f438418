import "./link-prelude";
import { signal, effect, computed, type Signal, type ReadonlySignal } from "@preact/signals-core";
import {
  defaultStudy,
  decodeStudyLink,
  encodeStudyLink,
  compressStudyLink,
  readStoredStudy,
  writeStoredStudy,
  backupUnreadable,
  studyFromObject,
  studyFromJson,
  studyToJson,
  validateStudy,
  studyProblems,
  describeProblems,
  getIn,
  setIn,
  sameValue,
  STORAGE_KEY,
  BEFORE_LINK_KEY,
  type Study,
  type FieldProblem,
} from "../study";
import type { Binding } from "./controls";
import { downloadText } from "./download";
import { stampEdits } from "./stamp-edits";
import { whenQuiet, type Deferred } from "./settle";

/**
 * Quiet time before an edit is saved and the address relinked, ms. Saving the study (a full
 * check and a 57 kB write) and compressing its link on every step of a drag kept the slider from
 * keeping up (issue 14); the page flushes at once when it is hidden or left, so nothing waits then.
 */
export const SAVE_QUIET_MS = 300;

/** A message on the page about the study's safety, with what the user can do about it. */
export interface Banner {
  id: string;
  text: string;
  actions: { label: string; run: () => void }[];
}

export interface StudyStore {
  /** The working study. Prefer `replace` or `bind` to change it: they check the candidate against the schema. */
  study: Signal<Study>;
  /** Messages for the user about loading and saving (empty when all is well). */
  notice: Signal<string>;
  /** Messages with actions: an unreadable stored study kept, a study replaced by a link or by another tab. */
  banners: ReadonlySignal<readonly Banner[]>;
  /**
   * A binding to one field of the study, by path. Its `check` tests the candidate study (the
   * study with the edit) against the schema and gives the message of a refusal; `set` applies
   * only a candidate that passes.
   */
  bind<T>(path: readonly (string | number)[]): Binding<T>;
  /** Replaces the whole study if it validates; else changes nothing and returns the problems as text. */
  replace(study: Study): string | null;
  /** The link that reopens the current study (always the current one, computed when read). */
  link: ReadonlySignal<string>;
  /**
   * Saves a waiting edit to browser storage and puts the study's link in the address now. Edits
   * are saved once the hand stops (SAVE_QUIET_MS); the store flushes by itself when the page is
   * hidden or left and before an in-page link is followed. Call it before anything reads the stored study.
   */
  flush(): void;
  /** Where the shown study came from: "link", "storage" (the working study saved in this browser), "defaults" (storage unreadable), "demo", or "file NAME". */
  origin: Signal<string>;
}

export interface StoreOptions {
  /** The study to open when neither the link nor browser storage has one (the demo study). */
  initial: unknown;
  /**
   * Save to browser storage, keep the URL in step and stamp meta.changedAt on every edit (off for
   * the read-only client view, which still opens the working study from storage and never writes it).
   */
  persist: boolean;
}

const dotted = (path: readonly (string | number)[]): string => path.map((p, i) => (typeof p === "number" ? `[${p}]` : i === 0 ? p : `.${p}`)).join("");

/** The message for a refused edit at `path`: the problem at that field alone, else the other field named. */
function refusal(problems: readonly FieldProblem[], path: readonly (string | number)[]): string {
  const here = problems.find((p) => p.path === dotted(path));
  if (here) return here.message;
  const first = problems[0];
  return first ? `it would leave ${first.path} at ${first.message}` : "refused by the study schema";
}

function slug(study: Study): string {
  return study.meta.title.toLowerCase().replace(/[^a-z0-9]+/g, "-").replace(/^-|-$/g, "") || "study";
}

function readText(key: string): string | null {
  try {
    return localStorage.getItem(key);
  } catch {
    return null;
  }
}

interface Opened {
  study: Study;
  notices: string[];
  banners: Banner[];
  /** Write the opened study to storage at once (a link the user opened), else only after a change. */
  writeNow: boolean;
  /** Where the study came from (see StudyStore.origin). */
  origin: string;
}

/** Opens the study from (in order) the link's fragment, browser storage, or the demo study. */
function openStudy(options: StoreOptions, defaults: Study, restore: (key: string) => void): Opened {
  const out: Opened = { study: defaults, notices: [], banners: [], writeNow: false, origin: "demo" };
  const stored = readStoredStudy(localStorage, () => defaults);
  if (stored?.unreadable) {
    const { text } = stored.unreadable;
    out.banners.push({
      id: "unreadable",
      text: (stored.message ?? "").replace(/^the saved study/, "The study saved in this browser"),
      actions: [{ label: "Download the unreadable study", run: () => downloadText("unreadable-study.spanbook.json", text, "application/json") }],
    });
  } else if (stored?.message) out.notices.push(stored.message);

  const fragment = location.hash.startsWith("#s=") ? location.hash.slice(3) : "";
  if (fragment) {
    const result = decodeStudyLink(fragment, defaults);
    if (result.ok) {
      out.study = result.study;
      out.origin = "link";
      if (result.otherDefaults) out.notices.push("This link was made when spanbook's defaults (factors, rates, brief, scheme options) were different. A link records only what its sender changed, so everything else now takes today's defaults and its figures can differ from those the sender saw: for the exact study, ask for the study file.");
      // Saved at once so every page shows it, unless the stored entry is unreadable: then only
      // after a change, like any page opened over an unreadable entry (item 4).
      out.writeNow = options.persist && !stored?.unreadable;
      const local = stored && !stored.unreadable ? stored.study : null;
      if (options.persist && local && !sameValue(local, result.study)) {
        try {
          localStorage.setItem(BEFORE_LINK_KEY, studyToJson(local));
          out.banners.push({
            id: "link",
            text: `This page opened the study in the link (“${result.study.meta.title}”). The study you had in this browser (“${local.meta.title}”) is kept: restore it or download it.`,
            actions: [
              { label: "Restore previous study", run: () => restore(BEFORE_LINK_KEY) },
              { label: "Download previous study", run: () => downloadText(`${slug(local)}.spanbook.json`, studyToJson(local), "application/json") },
            ],
          });
        } catch {
          // The local study cannot be kept: show the link's study without saving it.
          out.writeNow = false;
          out.notices.push("The link's study is shown but not saved: the study in this browser could not be backed up, so it is left as it is.");
        }
      }
      return out;
    }
    out.notices.push(`The link's study could not be opened:\n${describeProblems(result.problems)}`);
  }
  if (stored) {
    out.study = stored.study;
    out.origin = stored.unreadable || stored.message ? "defaults" : "storage";
    return out;
  }
  const demo = studyFromObject(options.initial);
  if (demo.ok) out.study = demo.study;
  else out.notices.push(`The demo study is invalid, so the defaults are shown:\n${describeProblems(demo.problems)}`);
  return out;
}

/**
 * The page's study, opened from (in order) the link's fragment, browser storage, or the demo
 * study. Every change through `bind` or `replace` is checked against the study schema first.
 * Browser storage is written only after a change (or when a link is opened, after keeping the
 * local study under BEFORE_LINK_KEY); an unreadable stored study is kept under a backup key.
 * Another tab's save is taken over at once, with a banner offering this tab's version back.
 */
export function createStudyStore(options: StoreOptions): StudyStore {
  const defaults = defaultStudy();
  const banners = signal<readonly Banner[]>([]);
  const show = (banner: Banner) => {
    banners.value = [...banners.value.filter((b) => b.id !== banner.id), banner];
  };
  const replace = (next: Study): string | null => {
    const checked = validateStudy(next);
    if (!checked.ok) return describeProblems(checked.problems);
    study.value = next;
    return null;
  };
  const restore = (key: string) => {
    const text = readText(key);
    const result = text === null ? null : studyFromJson(text);
    if (!result?.ok) {
      notice.value = `The previous study could not be restored: ${result ? describeProblems(result.problems) : "it is no longer in browser storage"}`;
      return;
    }
    const current = study.value;
    try {
      localStorage.setItem(key, studyToJson(current)); // swap, so the link's study is kept in turn
    } catch {
      notice.value = "The previous study was not restored: the current one could not be kept in browser storage.";
      return;
    }
    replace(result.study);
    flush(); // a click, not a drag: saved at once
    show({
      id: "link",
      text: `The previous study (“${result.study.meta.title}”) is restored. The link's study (“${current.meta.title}”) is kept in its place.`,
      actions: [{ label: "Switch back to the link's study", run: () => restore(key) }],
    });
  };

  const opened = openStudy(options, defaults, restore);
  const study = signal(opened.study);
  const notice = signal(opened.notices.join("\n"));
  banners.value = opened.banners;
  const packed = signal<Packed | null>(null);
  const link = computed(() => linkOf(study.value, packed.value, defaults));
  let saving: Deferred | null = null;
  const flush = () => saving?.flush();
  if (options.persist) saving = startSaving(study, { notice, opened, relink: (atOnce) => relink(study, defaults, packed, atOnce) }, (fromOtherTab) => followOtherTabs(study, fromOtherTab, show, replace, flush));

  return {
    study,
    notice,
    banners,
    link,
    flush,
    origin: signal(opened.origin),
    replace,
    bind<T>(path: readonly (string | number)[]): Binding<T> {
      let passed: { base: Study; next: T } | null = null; // the last edit check() let through
      const problem = (next: T): { candidate: Study; message: string | null } => {
        const candidate = setIn(study.value, path, next);
        if (candidate === study.value || (passed?.base === study.value && Object.is(passed.next, next))) return { candidate, message: null };
        // part by part: only the edited part is checked again (issue 14: one check per slider step)
        const problems = studyProblems(candidate);
        return { candidate, message: problems.length === 0 ? null : refusal(problems, path) };
      };
      return {
        value: computed(() => getIn(study.value, path) as T),
        check(next: T): string | null {
          const { message } = problem(next);
          passed = message === null ? { base: study.value, next } : null;
          return message;
        },
        set(next: T): void {
          const { candidate, message } = problem(next);
          passed = null;
          if (message === null) study.value = candidate;
          else notice.value = `${dotted(path)}: ${message}`;
        },
      };
    },
  };
}

/** A compressed link and the study it was made from. */
interface Packed {
  of: Study;
  text: string;
}

/** The link that reopens `study`: the compressed one when it was made from this very study, else the plain one. */
function linkOf(study: Study, packed: Packed | null, defaults: Study): string {
  return packed?.of === study ? `#s=${packed.text}` : `#s=${encodeStudyLink(study, defaults)}`;
}

/** Puts `fragment` ("" for none) in the address without a new history entry. */
function toAddress(fragment: string): void {
  try {
    history.replaceState(null, "", `${location.pathname}${location.search}${fragment}`);
  } catch {
    // an address that cannot be changed (the page is going away): storage holds the study
  }
}

/**
 * Puts the study's compressed link in the address when it is ready (if the study has not changed
 * meanwhile), so the address and "Copy link" stay short. The plain link goes in at once too where
 * the page opens or is being left (`atOnce`: nothing may wait), and where the browser cannot
 * compress or compressing fails. Writing the address twice after each settled edit (plain, then
 * compressed) took a task of 51–67 ms of the compare page's thread with its workers busy
 * (long-animation-frame timing, two drags in five).
 */
function relink(study: ReadonlySignal<Study>, defaults: Study, packed: Signal<Packed | null>, atOnce: boolean): void {
  const current = study.peek();
  const plain = encodeStudyLink(current, defaults);
  const compressing = typeof CompressionStream !== "undefined";
  if (atOnce || !compressing) toAddress(`#s=${plain}`);
  if (!compressing) return;
  compressStudyLink(plain).then(
    (text) => {
      if (study.peek() !== current) return;
      packed.value = { of: current, text };
      toAddress(`#s=${text}`);
    },
    () => {
      if (study.peek() === current) toAddress(`#s=${plain}`);
    },
  );
}

interface PersistParts {
  notice: Signal<string>;
  opened: Opened;
  /** Puts the study's link in the address (the plain one at once too when `atOnce`: the page opens or is being left). */
  relink: (atOnce: boolean) => void;
}

/** Stamps and saves the page's edits, flushes as the page goes, and follows other tabs (`follow`). */
function startSaving(study: Signal<Study>, parts: PersistParts, follow: (fromOtherTab: { current: Study | null }) => void): Deferred {
  stampEdits(study);
  const fromOtherTab: { current: Study | null } = { current: null };
  const saving = persist(study, parts, fromOtherTab);
  flushWhenLeaving(() => saving.flush());
  follow(fromOtherTab);
  return saving;
}

/**
 * Saves the study to storage and its link to the address once an edit has settled (see
 * SAVE_QUIET_MS), not on opening (unless a link was opened) and not for a study taken over from
 * another tab. While an edit waits the address carries no study, so a reload opens the saved one
 * (flushed as the page goes) rather than an older link. A study that fails the schema (written
 * around `replace`) is not saved, and the notice says why.
 */
function persist(study: Signal<Study>, parts: PersistParts, fromOtherTab: { current: Study | null }): Deferred {
  const { notice, opened } = parts;
  const save = (atOnce: boolean) => {
    const current = study.peek();
    if (current !== fromOtherTab.current) {
      const problems = studyProblems(current);
      if (problems.length > 0) notice.value = `This change was not saved (the study would not open again):\n${describeProblems(problems)}`;
      else {
        const error = writeStoredStudy(localStorage, current);
        if (error) notice.value = error;
      }
    }
    // The address in a task of its own after a drag has settled: the save and the address together
    // took 53–55 ms of the compare page's thread with its workers busy (long-animation-frame timing;
    // 22 ms profiled without load: the address's replaceState 8 ms, storage 5 ms, the link's
    // compression 5 ms). An edit made meanwhile leaves the address empty until its own save.
    if (atOnce) parts.relink(true);
    else
      setTimeout(() => {
        if (!saving.pending) parts.relink(false);
      }, 0);
  };
  const saving = whenQuiet(save, SAVE_QUIET_MS);
  if (opened.writeNow) save(true);
  else parts.relink(true);
  let first = true;
  effect(() => {
    void study.value; // every change, the page's own or another tab's
    if (first) {
      first = false;
      return;
    }
    if (!saving.pending) toAddress("");
    saving.schedule();
  });
  return saving;
}

/** Saves a waiting edit as the page is hidden or left, and before an in-page link is followed. */
function flushWhenLeaving(flush: () => void): void {
  window.addEventListener("pagehide", flush);
  document.addEventListener("visibilitychange", () => {
    if (document.visibilityState === "hidden") flush();
  });
  document.addEventListener("click", (event) => {
    if (event.target instanceof Element && event.target.closest("a[href]")) flush();
  }, { capture: true });
}

/** Takes over the study another tab saves (the `storage` event), with a banner to keep this tab's version instead. */
function followOtherTabs(study: Signal<Study>, fromOtherTab: { current: Study | null }, show: (b: Banner) => void, replace: (s: Study) => string | null, flush: () => void): void {
  window.addEventListener("storage", (event) => {
    if (event.key !== STORAGE_KEY || event.newValue === null) return;
    const result = studyFromJson(event.newValue);
    if (!result.ok) {
      backupUnreadable(localStorage, event.newValue);
      show({ id: "other-tab", text: `Another tab saved a study this page cannot read (${describeProblems(result.problems, 1)}). This page keeps its own study; the other one is kept in browser storage and is backed up before anything is saved over it.`, actions: [] });
      return;
    }
    const mine = study.value;
    if (sameValue(result.study, mine)) return;
    fromOtherTab.current = result.study;
    study.value = result.study;
    show({
      id: "other-tab",
      text: `Another tab changed the study (“${result.study.meta.title}”); this page now shows that version, so both tabs agree.`,
      actions: [{ label: "Keep this tab's version instead", run: () => {
        replace(mine);
        flush(); // a click: saved at once, so the other tab follows now
      } }],
    });
  });
}
