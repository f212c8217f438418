import { signal, effect, type ReadonlySignal } from "@preact/signals-core";
import type { Study } from "../study/study";
import type { SpanPoint, SpanRange } from "../comparison/span-study";
import type { SpanReply, SpanRequest } from "../comparison/span-worker";

export type SpanStudyState = { status: "running"; points: SpanPoint[] | null } | { status: "done"; points: SpanPoint[]; ms: number } | { status: "failed"; error: string };

/**
 * Runs the span study in a Web Worker whenever the study or the range changes. Only the newest
 * request's answer is kept; while one runs the previous points stay on screen.
 */
export function spanStudyRunner(study: ReadonlySignal<Study>, range: ReadonlySignal<SpanRange>): ReadonlySignal<SpanStudyState> {
  const state = signal<SpanStudyState>({ status: "running", points: null });
  const worker = new Worker(new URL("../comparison/span-worker.ts", import.meta.url), { type: "module" });
  let latest = 0;
  worker.onmessage = (event: MessageEvent<SpanReply>) => {
    const reply = event.data;
    if (reply.id !== latest) return;
    state.value = reply.ok ? { status: "done", points: reply.points, ms: reply.ms } : { status: "failed", error: reply.error };
  };
  worker.onerror = (event) => {
    state.value = { status: "failed", error: event.message || "the span study worker failed" };
  };
  effect(() => {
    const request: SpanRequest = { id: ++latest, study: study.value, range: range.value };
    const previous = state.peek();
    state.value = { status: "running", points: previous.status === "failed" ? null : previous.points };
    worker.postMessage(request);
  });
  return state;
}
