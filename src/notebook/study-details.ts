import { effect } from "@preact/signals-core";
import { metaFieldProblem, type Study } from "../study";
import { textControl, controlGroup } from "./controls";
import type { StudyStore } from "./study-store";
import { setText } from "./patch";

/** When the study was last changed, for people: "2 Dec 2026, 20:15 UTC", or that it was not recorded. */
export function describeChangedAt(study: Study): string {
  const at = study.meta.changedAt;
  if (!at) return "not recorded (saved before spanbook recorded it, or never edited)";
  return CHANGED_AT_FORMAT.format(new Date(at));
}

// One formatter for the page: toLocaleString with options builds a new one per call (~15 ms on a
// loaded machine), and the "Last changed" line is redrawn on every step of a drag (issue 14).
const CHANGED_AT_FORMAT = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", hour: "2-digit", minute: "2-digit", hourCycle: "h23", timeZone: "UTC", timeZoneName: "short" });

/** The study's own lines, in the order a cover sheet gives them. */
export function studyDetailItems(study: Study): [string, string][] {
  const m = study.meta;
  return [
    ["Title", m.title],
    ["Prepared by", m.author || "—"],
    ["Date", m.date],
    ["Last changed", describeChangedAt(study)],
    ["Notes", m.notes || "—"],
  ];
}

const FIELDS = [
  { key: "title", label: "Title", size: 48, hint: "Shown on every page, in captions, the client view and its export." },
  { key: "author", label: "Prepared by", size: 32, hint: "Name or practice; may be left empty." },
  { key: "date", label: "Date", size: 12, hint: "The study's date, YYYY-MM-DD." },
  { key: "notes", label: "Notes", size: 72, hint: "Shown to the client (up to 5000 characters)." },
  { key: "recommendation", label: "Recommendation to the client", size: 72, hint: "The project lead's recommendation, shown on the client page beside the computed facts (up to 5000 characters)." },
] as const;

/**
 * The study's title, prepared-by, date and notes as text fields bound through the store, each
 * checked by the study schema (a value not allowed is named and not applied), and when the study
 * was last changed.
 */
export function studyDetailsEditor(store: StudyStore): HTMLElement {
  const controls = FIELDS.map((f) =>
    textControl(store.bind<string>(["meta", f.key]), { id: `meta-${f.key}`, label: f.label, size: f.size, hint: f.hint, check: (raw) => metaFieldProblem(f.key, raw) }),
  );
  const changed = document.createElement("p");
  changed.className = "control-hint";
  changed.id = "meta-changed-at";
  effect(() => {
    // the same minute on most edits: written only when it differs (issue 14: every slider step ran this)
    setText(changed, `Last changed: ${describeChangedAt(store.study.value)}.`);
  });
  return controlGroup("Study details", [...controls, changed]);
}
