// What a page shows while its designs run in the workers: the result cells are marked busy
// (aria-busy) until every enabled scheme's design is for the current inputs, and a worker's
// failure is told in the page's notice.
import { computed, effect, type ReadonlySignal } from "@preact/signals-core";
import type { Study } from "../study";
import type { StudyStore } from "./study-store";
import type { AsyncStudySignals } from "./worker-scheme-signals";

/** Marks the cells `cell-<id>` busy while newer designs are coming, and shows a design failure. */
export function designStateMarks(store: StudyStore, designed: Pick<AsyncStudySignals, "busy" | "results" | "failure">, cellIds: readonly string[]): void {
  effect(() => {
    const waiting = designed.busy.value || designed.results.value === null;
    for (const id of cellIds) document.getElementById(`cell-${id}`)?.setAttribute("aria-busy", String(waiting));
  });
  effect(() => {
    if (designed.failure.value) store.notice.value = `A design could not be made: ${designed.failure.value}`;
  });
}

/**
 * The study as the shown results were made: its brief and tables as they were designed and assessed
 * with, the rest as it is now — for captions and notes that must describe the figures beside them
 * while newer designs are on their way.
 */
export function resultsStudy(store: StudyStore, designed: Pick<AsyncStudySignals, "resultsBrief" | "resultsTables">): ReadonlySignal<Study> {
  return computed(() => {
    const { carbon, cost } = designed.resultsTables.value;
    return { ...store.study.value, brief: designed.resultsBrief.value, carbon, cost };
  });
}
