import { signal, effect, type ReadonlySignal } from "@preact/signals-core";
import type { Study } from "../study/study";
import { spansOf, type SpanPoint, type SpanRange } from "../comparison/span-study";
import type { SpanWorkerApi } from "../comparison/span-worker";
import { workerApi } from "../kernel/worker-call";
import { messageOf } from "../kernel/errors";

export type SpanStudyState =
  | { status: "running"; points: SpanPoint[] | null; done: number; total: number }
  | { status: "done"; points: SpanPoint[]; ms: number; workers: number }
  | { status: "failed"; error: string };

/** How many workers: one per core the browser reports, between 1 and 4 (the page itself waits while they run). */
function workerCount(): number {
  const cores = typeof navigator !== "undefined" && navigator.hardwareConcurrency ? navigator.hardwareConcurrency : 2;
  return Math.max(1, Math.min(4, cores));
}

/** Spans per call: small enough for a progress bar that moves, large enough that messages cost little. */
const SPANS_PER_CALL = 2;

/**
 * Runs the span study in Web Workers (through the one typed worker interface) whenever the study
 * or the range changes. The spans are dealt out a few at a time to whichever worker is free, so the
 * progress bar moves and a newer request stops the older one after the calls already running;
 * while one runs the previous points stay on screen.
 */
export function spanStudyRunner(study: ReadonlySignal<Study>, range: ReadonlySignal<SpanRange>): ReadonlySignal<SpanStudyState> {
  const state = signal<SpanStudyState>({ status: "running", points: null, done: 0, total: 0 });
  const pool = Array.from({ length: workerCount() }, () => workerApi<SpanWorkerApi>(new Worker(new URL("../comparison/span-worker.ts", import.meta.url), { type: "module" })));
  let latest = 0;
  effect(() => {
    const id = ++latest;
    let spans: number[];
    try {
      spans = spansOf(range.value);
    } catch (error) {
      state.value = { status: "failed", error: messageOf(error) };
      return;
    }
    const current = study.value;
    const queue = Array.from({ length: Math.ceil(spans.length / SPANS_PER_CALL) }, (_, i) => spans.slice(i * SPANS_PER_CALL, (i + 1) * SPANS_PER_CALL));
    const previous = state.peek();
    const shown = previous.status === "failed" ? null : previous.points;
    const parts: SpanPoint[][] = [];
    let done = 0;
    state.value = { status: "running", points: shown, done, total: spans.length };
    const started = performance.now();
    const work = async (worker: (typeof pool)[number]) => {
      for (let chunk = queue.shift(); chunk !== undefined && id === latest; chunk = queue.shift()) {
        parts.push(await worker.api.run(current, chunk));
        done += chunk.length;
        if (id === latest) state.value = { status: "running", points: shown, done, total: spans.length };
      }
    };
    Promise.all(pool.map(work)).then(
      () => {
        if (id !== latest) return;
        state.value = { status: "done", points: parts.flat().sort((a, b) => a.spanM - b.spanM), ms: performance.now() - started, workers: pool.length };
      },
      (error: unknown) => {
        if (id === latest) state.value = { status: "failed", error: messageOf(error) };
      },
    );
  });
  return state;
}
