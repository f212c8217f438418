// Work that may wait for the hand to stop (issues 13/14: the main thread is never blocked for more
// than 50 ms while a slider moves). `settled` follows a signal only once it has stayed unchanged
// for a moment; `inTurns` does a list of jobs one per animation frame, so several charts drawn
// after an edit are several short tasks instead of one long one; `whenQuiet` puts work off (saving
// the study, rebuilding its link) until the hand stops, and can do it at once when the page is left;
// `perFrame` lets a cell draw at most once a frame, the newest value only.
import { signal, effect, type ReadonlySignal } from "@preact/signals-core";

/** Quiet time before a settled signal follows its source, ms: longer than the gap between two slider steps. */
export const SETTLE_MS = 150;

/** The next animation frame where there is one (a page), else the next macrotask (node). */
export function nextFrame(run: () => void): void {
  if (typeof requestAnimationFrame === "function") requestAnimationFrame(() => setTimeout(run, 0));
  else setTimeout(run, 0);
}

/**
 * A signal equal to `source` once the hand has stopped: once `source` has not changed for
 * `quietMs`, or — given `still`, the inputs the source follows — once those have not changed for
 * `quietMs`. With the inputs as the measure, a source that changes after a single edit is taken in
 * the next frame (the edit is already older than the quiet time when its results arrive), while
 * through a drag it waits until the inputs rest. The new value is taken in the next frame after the
 * quiet time. It starts equal to `source`. `dispose` stops following.
 */
export function settled<T>(source: ReadonlySignal<T>, quietMs = SETTLE_MS, still?: ReadonlySignal<unknown>): ReadonlySignal<T> & { dispose: () => void } {
  const out = signal(source.peek());
  let timer: ReturnType<typeof setTimeout> | undefined;
  let lastChange = Date.now();
  const take = () => {
    timer = undefined;
    nextFrame(() => {
      out.value = source.peek();
    });
  };
  const arm = () => {
    if (timer !== undefined) clearTimeout(timer);
    timer = undefined;
    if (Object.is(source.peek(), out.peek())) return;
    const wait = lastChange + quietMs - Date.now();
    if (wait <= 0) take();
    else timer = setTimeout(take, wait);
  };
  const stops = [
    effect(() => {
      void source.value;
      if (!still) lastChange = Date.now();
      arm();
    }),
    ...(still
      ? [
          effect(() => {
            void still.value;
            lastChange = Date.now();
            arm();
          }),
        ]
      : []),
  ];
  return Object.assign(out, { dispose: () => {
    if (timer !== undefined) clearTimeout(timer);
    stops.forEach((stop) => stop());
  } });
}

/** Every page's turns in one line, one job a frame: two sets started together (two cells' charts) take turns rather than share frames. A job returns false when it is stale (its set was overtaken) and takes no frame. */
const line: (() => boolean)[] = [];
let pumping = false;

function pump(): void {
  try {
    for (let task = line.shift(); task !== undefined; task = line.shift()) if (task()) break;
  } finally {
    // a job that throws still leaves the line moving
    if (line.length > 0) nextFrame(pump);
    else pumping = false;
  }
}

/**
 * Runs `jobs` one per frame, in order, in turn with any other set running (of this page's: one
 * line for all). Starting a newer run on the same `turns` object drops the jobs not yet run; `done`
 * runs after the last job.
 */
export function inTurns(turns: { generation: number }, jobs: readonly (() => void)[], done?: () => void): void {
  turns.generation += 1;
  const mine = turns.generation;
  const live = () => turns.generation === mine;
  jobs.forEach((job, k) =>
    line.push(() => {
      if (!live()) return false;
      job();
      if (k === jobs.length - 1) done?.();
      return true;
    }),
  );
  if (jobs.length === 0) line.push(() => {
    if (live()) done?.();
    return false;
  });
  if (!pumping) {
    pumping = true;
    nextFrame(pump);
  }
}

/** Work put off until the hand stops, that can also be done at once (see `whenQuiet`). */
export interface Deferred {
  /** (Re)starts the quiet time: the work runs once nothing has asked for it for `quietMs`. */
  schedule(): void;
  /** Runs the work now if it is waiting (and only then), synchronously. */
  flush(): void;
  /** Drops the waiting work. */
  cancel(): void;
  /** Whether the work is waiting. */
  readonly pending: boolean;
}

/**
 * Runs `work` once `schedule` has not been called for `quietMs` (a drag's many steps make one run,
 * after the last), or at once on `flush` (the page is about to be left: nothing may wait). `work`
 * is told which: `atOnce` is true on `flush`, so it may put part of itself off only when false.
 */
export function whenQuiet(work: (atOnce: boolean) => void, quietMs: number): Deferred {
  let timer: ReturnType<typeof setTimeout> | undefined;
  const cancel = () => {
    if (timer !== undefined) clearTimeout(timer);
    timer = undefined;
  };
  const run = (atOnce: boolean) => {
    if (timer === undefined) return;
    cancel();
    work(atOnce);
  };
  const flush = () => run(true);
  return {
    schedule() {
      cancel();
      timer = setTimeout(() => run(false), quietMs);
    },
    flush,
    cancel,
    get pending() {
      return timer !== undefined;
    },
  };
}

/**
 * A signal that follows `source` at most once per animation frame, taking its newest value then:
 * several values arriving within one frame are drawn once (only the last). `dispose` stops following.
 */
export function perFrame<T>(source: ReadonlySignal<T>): ReadonlySignal<T> & { dispose: () => void } {
  const out = signal(source.peek());
  const frame = typeof requestAnimationFrame === "function" ? requestAnimationFrame : (run: () => void) => setTimeout(run, 0);
  let queued = false;
  let live = true;
  const dispose = effect(() => {
    void source.value; // subscribe
    if (queued || Object.is(source.peek(), out.peek())) return;
    queued = true;
    frame(() => {
      queued = false;
      if (live) out.value = source.peek();
    });
  });
  return Object.assign(out, { dispose: () => {
    live = false;
    dispose();
  } });
}
