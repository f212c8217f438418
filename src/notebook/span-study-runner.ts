import { signal, effect, type ReadonlySignal } from "@preact/signals-core";
import type { Study } from "../study/study";
import { spansOf, type SpanPoint, type SpanRange } from "../comparison/span-study";
import type { SpanWorkerApi } from "../comparison/span-worker";
import { workerApi } from "../kernel/worker-call";
import { messageOf } from "../kernel/errors";

export type SpanStudyState =
  | {
      status: "running";
      points: SpanPoint[] | null;
      done: number;
      total: number;
      /** "screening": every scheme's fast pass; "again": the schemes designed again in full (`again`), the points shown have their screening design until the pass ends. */
      pass: "screening" | "again";
      again: string[];
      /** Time of the screening pass, ms, once it is done. */
      screeningMs?: number;
    }
  | { status: "done"; points: SpanPoint[]; ms: number; workers: number; again: string[]; screeningMs: number }
  | { status: "failed"; error: string };

/** How many workers: one per core the browser reports, between 1 and 4 (the page itself waits while they run). */
function workerCount(): number {
  const cores = typeof navigator !== "undefined" && navigator.hardwareConcurrency ? navigator.hardwareConcurrency : 2;
  return Math.max(1, Math.min(4, cores));
}

/** Spans per call: small enough for a progress bar that moves, large enough that messages cost little (a design in full takes longer: one span a call). */
const SPANS_PER_CALL = { screening: 2, again: 1 } as const;

function chunks(spans: readonly number[], size: number): number[][] {
  return Array.from({ length: Math.ceil(spans.length / size) }, (_, i) => spans.slice(i * size, (i + 1) * size));
}

/** Each scheme's point at each span from `later` where it has one, else from `earlier`. */
function replaced(earlier: readonly SpanPoint[], later: readonly SpanPoint[]): SpanPoint[] {
  const key = (p: SpanPoint) => `${p.id}@${p.spanM}`;
  const again = new Map(later.map((p) => [key(p), p]));
  return earlier.map((p) => again.get(key(p)) ?? p).sort((a, b) => a.spanM - b.spanM);
}

/**
 * Runs the span study in Web Workers (through the one typed worker interface) whenever the study
 * or the range changes, in two passes: every scheme as its proportion search screens it (the
 * tension roofs by their closed form: the whole picture within seconds), then the schemes whose
 * full design differs (the tension roofs by the 3D analysis, as on the compare page), whose points
 * replace their screening ones when that pass ends. The spans are dealt out a few at a time, largest
 * first, to whichever worker is free, so the progress bar moves and a newer request stops the older one after
 * the calls already running; while one runs the previous points stay on screen.
 */
export function spanStudyRunner(study: ReadonlySignal<Study>, range: ReadonlySignal<SpanRange>): ReadonlySignal<SpanStudyState> {
  const state = signal<SpanStudyState>({ status: "running", points: null, done: 0, total: 0, pass: "screening", again: [] });
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
    const previous = state.peek();
    const started = performance.now();
    /** One pass: its chunks dealt to the free workers; the points, or null when a newer request took over. */
    const pass = async (name: "screening" | "again", shown: SpanPoint[] | null, again: string[], screeningMs?: number): Promise<SpanPoint[] | null> => {
      // the largest spans first: they take longest, so the workers finish together rather than one waiting on the last large chunk
      const queue = chunks([...spans].reverse(), SPANS_PER_CALL[name]);
      const parts: SpanPoint[][] = [];
      let done = 0;
      const report = () => {
        state.value = { status: "running", points: shown, done, total: spans.length, pass: name, again, ...(screeningMs === undefined ? {} : { screeningMs }) };
      };
      report();
      await Promise.all(pool.map(async (worker) => {
        for (let chunk = queue.shift(); chunk !== undefined && id === latest; chunk = queue.shift()) {
          // the second pass sends each span's screening points of the schemes it designs again: their searches are not repeated
          parts.push(await worker.api.run(current, chunk, name, name === "again" ? (shown ?? []).filter((p) => p.screened && chunk.includes(p.spanM)) : []));
          done += chunk.length;
          if (id === latest) report();
        }
      }));
      return id === latest ? parts.flat().sort((a, b) => a.spanM - b.spanM) : null;
    };
    const run = async () => {
      const again = await (pool[0] as (typeof pool)[number]).api.designedAgain(current);
      if (id !== latest) return;
      const screened = await pass("screening", previous.status === "failed" ? null : previous.points, again);
      if (screened === null) return;
      const screeningMs = performance.now() - started;
      const full = again.length === 0 ? [] : await pass("again", screened, again, screeningMs);
      if (full === null) return;
      state.value = { status: "done", points: replaced(screened, full), ms: performance.now() - started, workers: pool.length, again, screeningMs };
    };
    run().catch((error: unknown) => {
      if (id === latest) state.value = { status: "failed", error: messageOf(error) };
    });
  });
  return state;
}
