// One typed call interface for the pages' workers (issue 11 item 5, issue 14): a worker exposes an
// object of functions with `exposeWorker`; the page calls them as async functions through
// `workerApi` (comlink carries the calls). `latestOnly` keeps a page from queueing stale work: while
// a call runs, newer arguments replace any that wait, and an answer for old arguments is dropped.
import { wrap, expose, proxy, type Remote } from "comlink";

/** In a worker module: answers the page's calls with these functions. */
export function exposeWorker<T extends object>(api: T): void {
  expose(api);
}

/** On the page: the worker's functions as typed async calls, and a way to stop the worker. */
export function workerApi<T extends object>(worker: Worker): { api: Remote<T>; terminate(): void } {
  return { api: wrap<T>(worker), terminate: () => worker.terminate() };
}

/** A function the page passes to a worker call (progress, say): the worker calls it back on the page. */
export function callback<F extends (...args: never[]) => unknown>(fn: F): F {
  return proxy(fn);
}

/**
 * Wraps an async call so that at most one runs and at most one waits: `request(args)` while a call
 * runs or is about to start replaces the waiting arguments; `onResult` gets only the answer to the
 * newest arguments sent. An idle call starts in a task of its own (a zero timeout), not in the
 * caller's: the compare page's first span step, which sent the six schemes' designs itself, made
 * a main-thread task of 51–63 ms in many drags (issue 13: 50 ms budget; measured).
 */
export function latestOnly<A, R>(call: (args: A) => Promise<R>, onResult: (result: R, args: A) => void, onError: (error: unknown, args: A) => void): (args: A) => void {
  let running = false;
  let waiting: { args: A } | null = null;
  let newest = 0;
  const next = () => {
    const taken = waiting;
    waiting = null;
    if (taken) run(taken.args);
    else running = false;
  };
  const run = (args: A) => {
    const id = ++newest;
    call(args).then(
      (result) => {
        if (id === newest && waiting === null) onResult(result, args);
      },
      (error: unknown) => {
        if (id === newest && waiting === null) onError(error, args);
      },
    ).finally(next);
  };
  return (args: A) => {
    waiting = { args };
    if (running) return;
    running = true;
    setTimeout(next, 0);
  };
}
