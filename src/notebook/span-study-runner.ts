import { signal, effect, type ReadonlySignal } from "@preact/signals-core";
import type { Study } from "../study/study";
import { spansOf, type SpanPoint, type SpanRange } from "../comparison/span-study";
import type { SpanReply, SpanRequest } from "../comparison/span-worker";
import { messageOf } from "../kernel/errors";

export type SpanStudyState = { status: "running"; points: SpanPoint[] | null } | { status: "done"; points: SpanPoint[]; ms: number; workers: number } | { status: "failed"; error: string };

/** How many workers: one per core the browser reports, between 1 and 4 (the page itself waits while they run). */
function workerCount(): number {
  const cores = typeof navigator !== "undefined" && navigator.hardwareConcurrency ? navigator.hardwareConcurrency : 2;
  return Math.max(1, Math.min(4, cores));
}

/**
 * Runs the span study in Web Workers whenever the study or the range changes, the spans dealt
 * out in turn so that each worker gets short and long spans alike. Only the newest request's
 * answers are kept; while one runs the previous points stay on screen.
 */
export function spanStudyRunner(study: ReadonlySignal<Study>, range: ReadonlySignal<SpanRange>): ReadonlySignal<SpanStudyState> {
  const state = signal<SpanStudyState>({ status: "running", points: null });
  const workers = Array.from({ length: workerCount() }, () => new Worker(new URL("../comparison/span-worker.ts", import.meta.url), { type: "module" }));
  let latest = 0;
  let pending: { parts: SpanPoint[][]; left: number; started: number } | null = null;
  for (const worker of workers) {
    worker.onmessage = (event: MessageEvent<SpanReply>) => {
      const reply = event.data;
      if (reply.id !== latest || !pending) return;
      if (!reply.ok) {
        state.value = { status: "failed", error: reply.error };
        pending = null;
        return;
      }
      pending.parts.push(reply.points);
      pending.left -= 1;
      if (pending.left === 0) {
        const points = pending.parts.flat().sort((a, b) => a.spanM - b.spanM);
        state.value = { status: "done", points, ms: performance.now() - pending.started, workers: workers.length };
        pending = null;
      }
    };
    worker.onerror = (event) => {
      state.value = { status: "failed", error: event.message || "the span study worker failed" };
    };
  }
  effect(() => {
    const id = ++latest;
    let spans: number[];
    try {
      spans = spansOf(range.value);
    } catch (error) {
      state.value = { status: "failed", error: messageOf(error) };
      return;
    }
    const chunks = workers.map((_, w) => spans.filter((_, i) => i % workers.length === w)).filter((c) => c.length > 0);
    const previous = state.peek();
    state.value = { status: "running", points: previous.status === "failed" ? null : previous.points };
    pending = { parts: [], left: chunks.length, started: performance.now() };
    const current = study.value;
    chunks.forEach((chunk, w) => workers[w]?.postMessage({ id, study: current, spans: chunk } satisfies SpanRequest));
  });
  return state;
}
