// Work that may wait for the hand to stop (issues 13/14: the main thread is never blocked for more
// than 50 ms while a slider moves). `settled` follows a signal only once it has stayed unchanged
// for a moment; `inTurns` does a list of jobs one per animation frame, so several charts drawn
// after an edit are several short tasks instead of one long one.
import { signal, effect, type ReadonlySignal } from "@preact/signals-core";

/** Quiet time before a settled signal follows its source, ms: longer than the gap between two slider steps. */
export const SETTLE_MS = 150;

/** The next animation frame where there is one (a page), else the next macrotask (node). */
export function nextFrame(run: () => void): void {
  if (typeof requestAnimationFrame === "function") requestAnimationFrame(() => setTimeout(run, 0));
  else setTimeout(run, 0);
}

/**
 * A signal equal to `source` once `source` has not changed for `quietMs`; the new value is taken
 * in the next frame after the quiet time. It starts equal to `source`. `dispose` stops following.
 */
export function settled<T>(source: ReadonlySignal<T>, quietMs = SETTLE_MS): ReadonlySignal<T> & { dispose: () => void } {
  const out = signal(source.peek());
  let timer: ReturnType<typeof setTimeout> | undefined;
  const dispose = effect(() => {
    const value = source.value;
    if (timer !== undefined) clearTimeout(timer);
    if (Object.is(value, out.peek())) return;
    timer = setTimeout(() => {
      timer = undefined;
      nextFrame(() => {
        out.value = source.peek();
      });
    }, quietMs);
  });
  return Object.assign(out, { dispose: () => {
    if (timer !== undefined) clearTimeout(timer);
    dispose();
  } });
}

/**
 * Runs `jobs` one per frame, in order. Calling the returned `cancel` (or starting a newer run on
 * the same `turns` object) drops the jobs not yet run; `done` runs after the last job.
 */
export function inTurns(turns: { generation: number }, jobs: readonly (() => void)[], done?: () => void): void {
  turns.generation += 1;
  const mine = turns.generation;
  const step = (k: number) => {
    if (turns.generation !== mine) return;
    const job = jobs[k];
    if (job === undefined) {
      done?.();
      return;
    }
    job();
    nextFrame(() => step(k + 1));
  };
  nextFrame(() => step(0));
}
