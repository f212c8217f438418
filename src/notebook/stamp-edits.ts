import { effect, type Signal } from "@preact/signals-core";
import type { Study } from "../study";

/**
 * Stamps meta.changedAt (now, UTC) on every edit of the study, wherever on the page it was made.
 * A study that arrives with a changedAt of its own (an opened file or link) keeps it; the study
 * the page opened with is not stamped (opening is not an edit).
 */
export function stampEdits(study: Signal<Study>, now: () => Date = () => new Date()): void {
  let previous = study.peek();
  effect(() => {
    const current = study.value;
    if (current === previous) return;
    const opened = current.meta.changedAt !== previous.meta.changedAt;
    previous = current;
    if (opened) return;
    const stamped: Study = { ...current, meta: { ...current.meta, changedAt: now().toISOString() } };
    previous = stamped;
    study.value = stamped;
  });
}
