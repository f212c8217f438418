// Module worker: runs the span study off the main thread so the page stays responsive.
import { runSpanStudy, type SpanPoint } from "./span-study";
import { defaultCatalogue } from "../catalogue/default-catalogue";
import type { Study } from "../study/study";
import { messageOf } from "../kernel/errors";

export interface SpanRequest {
  id: number;
  study: Study;
  /** The spans this worker evaluates. */
  spans: number[];
}

export type SpanReply = { id: number; ok: true; points: SpanPoint[]; ms: number } | { id: number; ok: false; error: string };

self.onmessage = (event: MessageEvent<SpanRequest>) => {
  const { id, study, spans } = event.data;
  const start = performance.now();
  try {
    const points = runSpanStudy(study, defaultCatalogue(), spans);
    self.postMessage({ id, ok: true, points, ms: performance.now() - start } satisfies SpanReply);
  } catch (error) {
    self.postMessage({ id, ok: false, error: messageOf(error) } satisfies SpanReply);
  }
};
