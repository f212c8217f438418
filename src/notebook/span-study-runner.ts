import { signal, effect, type ReadonlySignal } from "@preact/signals-core";
import type { Study } from "../study/study";
import { spansOf, type SpanPoint, type SpanRange } from "../comparison/span-study";
import type { SpanWorkerApi } from "../comparison/span-worker";
import { SCHEME_IDS, type SchemeId } from "../schemes/ids";
import { workerApi } from "../kernel/worker-call";
import { messageOf } from "../kernel/errors";
import { canonicalJson } from "../kernel/memo";

export type SpanStudyState =
  | {
      status: "running";
      points: SpanPoint[] | null;
      done: number;
      total: number;
      /** "screening": every scheme's fast pass; "again": the schemes designed again in full (`again`), the points shown have their screening design until the pass ends. */
      pass: "screening" | "again";
      again: string[];
      /** Spans of this pass taken from earlier runs of the same study (SpanMemory). */
      reused: number;
      /** Time of the screening pass, ms, once it is done. */
      screeningMs?: number;
    }
  | { status: "done"; points: SpanPoint[]; ms: number; workers: number; again: string[]; screeningMs: number; /** Spans whose points (both passes) came from earlier runs of the same study. */ reused: number }
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
 * Each pass's points by span, for one study (what its designs read of it): a span's points depend only on the study and
 * the span, so a range that overlaps the last one (narrowed, extended, a finer step through the same
 * spans) designs only its new spans. Any change to the study starts afresh.
 */
export class SpanMemory {
  private key = "";
  private readonly passes = { screening: new Map<number, SpanPoint[]>(), again: new Map<number, SpanPoint[]>() };
  /** The study whose points are held. */
  get study(): string {
    return this.key;
  }
  /** Forgets everything unless `key` is the study the points were computed for. */
  keep(key: string): void {
    if (key === this.key) return;
    this.key = key;
    this.passes.screening.clear();
    this.passes.again.clear();
  }
  get(pass: "screening" | "again", spanM: number): SpanPoint[] | undefined {
    return this.passes[pass].get(spanM);
  }
  /** Records a call's points for its spans, when they were computed for the study kept now. */
  put(key: string, pass: "screening" | "again", spans: readonly number[], points: readonly SpanPoint[]): void {
    if (key !== this.key) return;
    for (const spanM of spans) this.passes[pass].set(spanM, points.filter((p) => p.spanM === spanM));
  }
}

/** The longest the second pass waits for the page's drawing: a hidden tab draws no frames, and the work must go on. */
const MOST_DRAW_WAIT_MS = 1000;

/** Where the page keeps its span memory between loads (session storage: its own quota, apart from the stored study's): the build and study under this key, each span's points of each pass under it + "/pass/span". */
export const SPAN_MEMORY_KEY = "spanbook.span-memory";

export type SpanStore = Pick<Storage, "getItem" | "setItem" | "removeItem" | "key" | "length">;

export interface SpanRunnerOptions {
  /**
   * Keeps the memory of computed spans here between page loads (the tab's session storage), under
   * this module's address, which changes with the design code in every build (not on the dev server):
   * a reload, or a return from another page, shows the spans of the same study at once. A store that
   * refuses (full, or off) only loses that.
   */
  store?: SpanStore;
  /**
   * Resolves once the page has drawn the points it was last given: the second pass starts only then,
   * so the first pass's charts are drawn while the workers are idle (on two cores, drawn beside two
   * busy workers, four or five of the charts' frames took 57–118 ms; measured, demo study).
   */
  drawn?: () => Promise<void>;
}

/**
 * Runs the span study in Web Workers (through the one typed worker interface) whenever the study
 * or the range changes, in two passes: every scheme as its proportion search screens it (the
 * tension roofs by their closed form: the whole picture within seconds), then the schemes whose
 * full design differs (the tension roofs by the 3D analysis, as on the compare page), whose points
 * replace their screening ones when that pass ends. The spans are dealt out a few at a time, largest
 * first, to whichever worker is free (in the first pass, once per group of schemes that share cached
 * meshes, each worker keeping to its own group while it has spans left), so the progress bar moves
 * and a newer request stops the older one after the calls already running; while one runs the
 * previous points stay on screen. Spans already computed for the same study are taken from memory
 * (SpanMemory), those of calls a newer request overtook included.
 */
export function spanStudyRunner(study: ReadonlySignal<Study>, range: ReadonlySignal<SpanRange>, options: SpanRunnerOptions = {}): ReadonlySignal<SpanStudyState> {
  const state = signal<SpanStudyState>({ status: "running", points: null, done: 0, total: 0, pass: "screening", again: [], reused: 0 });
  // the bundler needs the worker's address written out in place to bundle it (a variable made it a data URL)
  const pool = Array.from({ length: workerCount() }, () => workerApi<SpanWorkerApi>(new Worker(new URL("../comparison/span-worker.ts", import.meta.url), { type: "module" })));
  // this module's own address: in a build, its file's name carries a hash of its content, which holds the worker's hashed name;
  // the dev server's names carry none, so there (code edited between reloads) nothing is kept
  const build = import.meta.url;
  const store = import.meta.env.DEV ? undefined : options.store;
  const memory = restoredMemory(store, build);
  const remember = (pass: "screening" | "again", spans: readonly number[]) => storeSpans(store, build, memory, pass, spans);
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
    // what the designs read of the study (its title, notes and risk settings change no point), in one order
    const key = canonicalJson({ brief: current.brief, schemes: current.schemes, carbon: current.carbon, cost: current.cost });
    memory.keep(key);
    const previous = state.peek();
    const started = performance.now();
    /** One pass: its chunks dealt to the free workers; the points, or null when a newer request took over. */
    const pass = async (name: "screening" | "again", shown: SpanPoint[] | null, again: string[], screeningMs?: number): Promise<SpanPoint[] | null> => {
      const parts: SpanPoint[][] = spans.map((spanM) => memory.get(name, spanM) ?? []);
      const fresh = spans.filter((spanM) => memory.get(name, spanM) === undefined);
      const reused = spans.length - fresh.length;
      // the largest spans first: they take longest, so the workers finish together rather than one waiting on the last large chunk
      const queue = chunks([...fresh].reverse(), SPANS_PER_CALL[name]);
      let done = reused;
      const report = () => {
        state.value = { status: "running", points: shown, done, total: spans.length, pass: name, again, reused, ...(screeningMs === undefined ? {} : { screeningMs }) };
      };
      report();
      if (name === "again" && options.drawn) await Promise.race([options.drawn(), new Promise((resolve) => setTimeout(resolve, MOST_DRAW_WAIT_MS))]);
      // the first pass on several workers: each chunk once per group of schemes (screeningGroups), a worker taking its own group's
      // chunks first and another's when its own are done; a chunk's points count when every group has given them
      const split = name === "screening" && pool.length > 1 ? await (pool[0] as (typeof pool)[number]).api.screeningGroups(current) : [];
      const groups: (SchemeId[] | undefined)[] = split.length > 1 ? split : [undefined];
      const queues = groups.map((schemeIds) => queue.map((chunk) => ({ chunk, schemeIds })));
      const given = new Map<number[], SpanPoint[][]>();
      await Promise.all(pool.map(async (worker, w) => {
        const next = () => queues.map((_, k) => queues[(w + k) % queues.length]!).find((q) => q.length > 0)?.shift();
        for (let job = next(); job !== undefined && id === latest; job = next()) {
          const { chunk, schemeIds } = job;
          // the second pass sends each span's screening points of the schemes it designs again: their searches are not repeated
          const got = await worker.api.run(current, chunk, name, name === "again" ? (shown ?? []).filter((p) => p.screened && chunk.includes(p.spanM)) : [], schemeIds);
          const so = [...(given.get(chunk) ?? []), got];
          given.set(chunk, so);
          if (so.length < groups.length) continue;
          // in the schemes' own order at each span, whichever group answered first (as one call for every scheme gives them)
          const points = so.flat().sort((a, b) => a.spanM - b.spanM || SCHEME_IDS.indexOf(a.id) - SCHEME_IDS.indexOf(b.id));
          memory.put(key, name, chunk, points);
          remember(name, chunk);
          parts.push(points);
          done += chunk.length;
          if (id === latest) report();
        }
      }));
      return id === latest ? parts.flat().sort((a, b) => a.spanM - b.spanM) : null;
    };
    const run = async () => {
      const again = await (pool[0] as (typeof pool)[number]).api.designedAgain(current);
      if (id !== latest) return;
      const reusedAtStart = spans.filter((spanM) => memory.get("screening", spanM) !== undefined && (again.length === 0 || memory.get("again", spanM) !== undefined)).length;
      const screened = await pass("screening", previous.status === "failed" ? null : previous.points, again);
      if (screened === null) return;
      const screeningMs = performance.now() - started;
      const full = again.length === 0 ? [] : await pass("again", screened, again, screeningMs);
      if (full === null) return;
      state.value = { status: "done", points: replaced(screened, full), ms: performance.now() - started, workers: pool.length, again, screeningMs, reused: reusedAtStart };
    };
    run().catch((error: unknown) => {
      if (id === latest) state.value = { status: "failed", error: messageOf(error) };
    });
  });
  return state;
}

/** The keys of every span's points kept in `store`. */
function spanKeys(store: SpanStore): string[] {
  return Array.from({ length: store.length }, (_, i) => store.key(i)).filter((k): k is string => k !== null && k.startsWith(`${SPAN_MEMORY_KEY}/`));
}

function parsedOrNull(text: string | null): unknown {
  try {
    return JSON.parse(text ?? "null");
  } catch {
    return null;
  }
}

/** Where the page keeps its range for the tab's session. */
const SPAN_RANGE_KEY = "spanbook.span-range";

/** The range kept in `store`, null when there is none or it is not a valid range (spansOf). */
export function keptRange(store: Pick<Storage, "getItem"> | undefined): SpanRange | null {
  const r = parsedOrNull(store?.getItem(SPAN_RANGE_KEY) ?? null) as Partial<SpanRange> | null;
  if (!r || typeof r.fromM !== "number" || typeof r.toM !== "number" || typeof r.stepM !== "number") return null;
  const range = { fromM: r.fromM, toM: r.toM, stepM: r.stepM };
  try {
    spansOf(range);
    return range;
  } catch {
    return null;
  }
}

/** Keeps the range in `store`; a store that refuses only loses it on the next load. */
export function keepRange(store: Pick<Storage, "setItem"> | undefined, range: SpanRange): void {
  try {
    store?.setItem(SPAN_RANGE_KEY, JSON.stringify(range));
  } catch {
    // nothing kept
  }
}

/** The memory kept in `store` for this build, else an empty one (a span whose text is not a list of points is left out). */
export function restoredMemory(store: SpanStore | undefined, build: string): SpanMemory {
  const memory = new SpanMemory();
  try {
    const head = parsedOrNull(store?.getItem(SPAN_MEMORY_KEY) ?? null) as { build?: unknown; study?: unknown } | null;
    if (!store || head?.build !== build || typeof head.study !== "string") return memory;
    memory.keep(head.study);
    for (const k of spanKeys(store)) {
      const [pass, span] = k.slice(SPAN_MEMORY_KEY.length + 1).split("/");
      const points = parsedOrNull(store.getItem(k));
      if ((pass === "screening" || pass === "again") && Number.isFinite(Number(span)) && Array.isArray(points)) memory.put(head.study, pass, [Number(span)], points as SpanPoint[]);
    }
  } catch {
    return new SpanMemory();
  }
  return memory;
}

/**
 * Keeps one call's spans of a pass in `store`, each under its own key (a few kB: writing the whole
 * memory after each call took 35–72 ms of the page's thread late in a span study, measured); a new
 * study or build first clears what was kept. A store that refuses is cleared rather than left half-written.
 */
export function storeSpans(store: SpanStore | undefined, build: string, memory: SpanMemory, pass: "screening" | "again", spans: readonly number[]): void {
  if (!store) return;
  const head = JSON.stringify({ build, study: memory.study });
  try {
    if (store.getItem(SPAN_MEMORY_KEY) !== head) {
      for (const k of spanKeys(store)) store.removeItem(k);
      store.setItem(SPAN_MEMORY_KEY, head);
    }
    for (const spanM of spans) {
      const points = memory.get(pass, spanM);
      if (points) store.setItem(`${SPAN_MEMORY_KEY}/${pass}/${spanM}`, JSON.stringify(points));
    }
  } catch {
    try {
      for (const k of spanKeys(store)) store.removeItem(k);
      store.removeItem(SPAN_MEMORY_KEY);
    } catch {
      // the store is off: the memory lasts as long as the page
    }
  }
}
