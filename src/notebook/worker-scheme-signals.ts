// Per-scheme designs computed in workers for every page that shows results (issue 14, "a slider
// that keeps up"; issue 11: no page carries the design code): the page keeps drawing while designs run; each scheme's design is asked for only when its
// brief, its setting or the study's tables change, and only the newest answer is kept. Each design
// is the scheme at its best proportions by the pipeline's one rule (designAtBestProportions, in
// src/comparison/design-job.ts), so this page agrees with the span study and the command line.
// Carbon and cost of the chosen design are assessed on the page (a millisecond or two). `results`
// moves only when every enabled scheme's design is for the current inputs, so the table never mixes
// two spans; `busy` says a newer one is coming.
import { signal, computed, effect, batch, type ReadonlySignal } from "@preact/signals-core";
import type { StudyStore } from "./study-store";
import { SCHEME_DECLARATIONS, type SchemeDeclaration } from "../schemes/declarations";
import type { Design, SchemeId } from "../schemes/types";
import { schemeResult, type SchemeResult, type SearchedDesign, type SchemeSetting, type StudyInputs } from "../pipeline";
import { workerApi, latestOnly } from "../kernel/worker-call";
import type { DesignWorkerApi } from "../comparison/design-worker";
import { messageOf } from "../kernel/errors";
import type { Brief } from "../brief";

export interface AsyncSchemeSignals {
  model: SchemeDeclaration;
  enabled: ReadonlySignal<boolean>;
  /** The newest design (null until the first arrives). */
  design: ReadonlySignal<Design | null>;
  result: ReadonlySignal<SchemeResult | null>;
  /** Whether the design shown is for the current brief, setting and tables. */
  current: ReadonlySignal<boolean>;
}

export interface AsyncStudySignals {
  schemes: AsyncSchemeSignals[];
  /** Results of the enabled schemes, in registry order, all for the same brief. */
  results: ReadonlySignal<SchemeResult[] | null>;
  /** The span the results are for, m (it moves with them, not with the slider). */
  resultsSpanM: ReadonlySignal<number>;
  /** The brief the results were designed for (it moves with them, not with an edit). */
  resultsBrief: ReadonlySignal<Brief>;
  /** The carbon and cost tables the results were designed and assessed with (they move with them, not with an edit). */
  resultsTables: ReadonlySignal<Tables>;
  /** A design is being computed for a newer brief or option. */
  busy: ReadonlySignal<boolean>;
  /** A worker failed (the message), or "". */
  failure: ReadonlySignal<string>;
}

type Tables = Pick<StudyInputs, "carbon" | "cost">;
/** What one design is asked for; its identity marks the answer as current. */
type Request = { brief: Brief; setting: SchemeSetting | undefined; tables: Tables };

/** Designs one scheme at its best proportions (in a worker on the pages; in-process in tests). */
export type Designer = (schemeId: SchemeId, brief: Brief, setting: SchemeSetting | undefined, tables: Tables) => Promise<SearchedDesign>;

/**
 * A designer per worker: module workers running src/comparison/design-worker.ts, one core left to
 * the page — two workers on three cores or more, one on two. With two on a 2-core machine the
 * designs that follow a span drag took both cores and the page's own drawing fell behind (issue 14:
 * frames per slider step median 3, p95 6–9, against 1–2 and 4 with one worker, same load).
 */
function workerDesigners(): Designer[] {
  const cores = typeof navigator !== "undefined" && navigator.hardwareConcurrency ? navigator.hardwareConcurrency : 2;
  return Array.from({ length: Math.max(1, Math.min(2, cores - 1)) }, () => {
    const { api } = workerApi<DesignWorkerApi>(new Worker(new URL("../comparison/design-worker.ts", import.meta.url), { type: "module" }));
    return (schemeId, brief, setting, tables) => api.design(schemeId, brief, setting, tables);
  });
}

/** The parts of the study every scheme's request reads, each a new object only when that part changed. */
interface Shared {
  brief: ReadonlySignal<Brief>;
  tables: ReadonlySignal<Tables>;
}

function sharedSignals(store: StudyStore): Shared {
  const carbon = computed(() => store.study.value.carbon);
  const cost = computed(() => store.study.value.cost);
  return { brief: computed(() => store.study.value.brief), tables: computed(() => ({ carbon: carbon.value, cost: cost.value })) };
}

/** One scheme's signals: asks its worker for the newest request, keeps the newest answer, assesses it with the study's tables. */
function schemeSignals(model: SchemeDeclaration, store: StudyStore, shared: Shared, designer: Designer, failure: { value: string }): AsyncSchemeSignals {
  const setting = computed(() => store.study.value.schemes[model.id]);
  const enabled = computed(() => setting.value?.enabled !== false);
  // A new request only when the brief, this scheme's setting or a table changed (the store keeps untouched parts' identity).
  const wanted = computed((): Request => ({ brief: shared.brief.value, setting: setting.value, tables: shared.tables.value }));
  const { tables } = shared;
  const answer = signal<{ searched: SearchedDesign; request: Request } | null>(null);
  const ask = latestOnly<Request, SearchedDesign>(
    (r) => designer(model.id, r.brief, r.setting, r.tables),
    (searched, request) => {
      answer.value = { searched, request };
    },
    (error) => {
      failure.value = `${model.label}: ${messageOf(error)}`;
    },
  );
  effect(() => {
    if (!enabled.value) return;
    const request = wanted.value;
    if (answer.peek()?.request !== request) ask(request);
  });
  const design = computed(() => answer.value?.searched.design ?? null);
  const result = computed((): SchemeResult | null => {
    const a = answer.value;
    if (a === null) return null;
    const { searched } = a;
    return { ...schemeResult(model.id, model.label, searched.design, tables.value), brief: searched.brief, proportions: searched.proportions };
  });
  const current = computed(() => answer.value?.request === wanted.value);
  return { model, enabled, design, result, current };
}

/**
 * A page's per-scheme designs from workers, assessed on the page with the study's tables. `designers`
 * replaces the workers (tests design in-process); scheme i asks designer i mod n.
 */
export function workerStudySignals(store: StudyStore, designers: readonly Designer[] = workerDesigners()): AsyncStudySignals {
  const none: Designer = () => Promise.reject(new Error("no design worker"));
  const failure = signal("");
  const shared = sharedSignals(store);
  const schemes = SCHEME_DECLARATIONS.map((model, index) => schemeSignals(model, store, shared, designers[index % designers.length] ?? none, failure));
  const busy = computed(() => schemes.some((s) => s.enabled.value && !s.current.value));
  const results = signal<SchemeResult[] | null>(null);
  const resultsSpanM = signal(shared.brief.peek().spanM);
  const resultsTables = signal(shared.tables.peek());
  const resultsBrief = signal(shared.brief.peek());
  effect(() => {
    const on = schemes.filter((s) => s.enabled.value);
    if (on.some((s) => !s.current.value)) return;
    const list = on.map((s) => s.result.value).filter((r): r is SchemeResult => r !== null);
    // Every enabled design is current, so the brief now is the one they were designed for.
    const brief = shared.brief.value;
    const tables = shared.tables.value;
    batch(() => {
      results.value = list;
      resultsSpanM.value = brief.spanM;
      resultsBrief.value = brief;
      resultsTables.value = tables;
    });
  });
  return { schemes, results, resultsSpanM, resultsBrief, resultsTables, busy, failure };
}
