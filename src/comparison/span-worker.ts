// Module worker: runs span-study points off the main thread (its calls through the one typed worker interface).
import { exposeWorker } from "../kernel/worker-call";
import { runSpanStudy, type SpanPoint } from "./span-study";
import { defaultCatalogue } from "../catalogue/default-catalogue";
import type { Study } from "../study/study";

const catalogue = defaultCatalogue();

export const spanWorkerApi = {
  /** The study's enabled schemes at each of these spans. */
  run(study: Study, spans: number[]): SpanPoint[] {
    return runSpanStudy(study, catalogue, spans);
  },
};
export type SpanWorkerApi = typeof spanWorkerApi;

exposeWorker(spanWorkerApi);
