// Per-scheme designs computed in workers for the compare page (issue 14, "a slider that keeps
// up"): the page keeps drawing while designs run; each scheme's design is asked for only when its
// brief or options change, and only the newest answer is kept. Carbon and cost are assessed on the
// page (they take a millisecond or two). `results` moves only when every enabled scheme's design
// is for the current brief, so the table never mixes two spans; `busy` says a newer one is coming.
import { signal, computed, effect, batch, type ReadonlySignal } from "@preact/signals-core";
import type { StudyStore } from "./study-store";
import { SCHEMES, type Design, type SchemeModel } from "../schemes";
import { schemeResult, type SchemeResult } from "../pipeline";
import { workerApi, latestOnly } from "../kernel/worker-call";
import type { DesignWorkerApi } from "../comparison/design-worker";
import { messageOf } from "../kernel/errors";
import type { Brief } from "../brief";
import type { SchemeOptions } from "../schemes/types";

export interface AsyncSchemeSignals {
  model: SchemeModel;
  enabled: ReadonlySignal<boolean>;
  /** The newest design (null until the first arrives). */
  design: ReadonlySignal<Design | null>;
  result: ReadonlySignal<SchemeResult | null>;
  /** Whether the design shown is for the current brief and options. */
  current: ReadonlySignal<boolean>;
}

export interface AsyncStudySignals {
  schemes: AsyncSchemeSignals[];
  /** Results of the enabled schemes, in registry order, all for the same brief. */
  results: ReadonlySignal<SchemeResult[] | null>;
  /** The span the results are for, m (it moves with them, not with the slider). */
  resultsSpanM: ReadonlySignal<number>;
  /** A design is being computed for a newer brief or option. */
  busy: ReadonlySignal<boolean>;
  /** A worker failed (the message), or "". */
  failure: ReadonlySignal<string>;
}

type Request = { brief: Brief; options: SchemeOptions | undefined; key: string };

function workers(): ReturnType<typeof workerApi<DesignWorkerApi>>[] {
  const cores = typeof navigator !== "undefined" && navigator.hardwareConcurrency ? navigator.hardwareConcurrency : 2;
  return Array.from({ length: Math.max(1, Math.min(2, cores)) }, () => workerApi<DesignWorkerApi>(new Worker(new URL("../comparison/design-worker.ts", import.meta.url), { type: "module" })));
}

/** The compare page's per-scheme designs from workers, assessed on the page with the study's tables. */
export function workerStudySignals(store: StudyStore): AsyncStudySignals {
  const pool = workers();
  const brief = computed(() => store.study.value.brief);
  const carbon = computed(() => store.study.value.carbon);
  const cost = computed(() => store.study.value.cost);
  const failure = signal("");
  const schemes = SCHEMES.map((model, index): AsyncSchemeSignals => {
    const setting = computed(() => store.study.value.schemes[model.id]);
    const enabled = computed(() => setting.value?.enabled !== false);
    const options = computed(() => setting.value?.options);
    const wanted = computed(() => JSON.stringify([brief.value, options.value]));
    const answer = signal<{ design: Design; key: string } | null>(null);
    const worker = pool[index % pool.length];
    const ask = latestOnly<Request, Design>(
      (r) => (worker ? worker.api.design(model.id, r.brief, r.options) : Promise.reject(new Error("no design worker"))),
      (design, r) => {
        answer.value = { design, key: r.key };
      },
      (error) => {
        failure.value = `${model.label}: ${messageOf(error)}`;
      },
    );
    effect(() => {
      if (!enabled.value) return;
      const key = wanted.value;
      if (answer.peek()?.key !== key) ask({ brief: brief.peek(), options: options.peek(), key });
    });
    const design = computed(() => answer.value?.design ?? null);
    const result = computed((): SchemeResult | null => {
      const d = design.value;
      return d === null ? null : schemeResult(model.id, model.label, d, { carbon: carbon.value, cost: cost.value });
    });
    const current = computed(() => answer.value?.key === wanted.value);
    return { model, enabled, design, result, current };
  });
  const busy = computed(() => schemes.some((s) => s.enabled.value && !s.current.value));
  const results = signal<SchemeResult[] | null>(null);
  const resultsSpanM = signal(brief.peek().spanM);
  effect(() => {
    const on = schemes.filter((s) => s.enabled.value);
    if (on.some((s) => !s.current.value)) return;
    const list = on.map((s) => s.result.value).filter((r): r is SchemeResult => r !== null);
    // Every enabled design is current, so the brief now is the one they were designed for.
    const spanM = brief.value.spanM;
    batch(() => {
      results.value = list;
      resultsSpanM.value = spanM;
    });
  });
  return { schemes, results, resultsSpanM, busy, failure };
}
