// Module worker: runs the risk analysis off the page's main thread, through the one typed worker
// interface (src/kernel/worker-call.ts). Progress comes back through a callback the page passes;
// the page cancels by terminating the worker (a running synchronous loop cannot read messages).
import { exposeWorker } from "../kernel/worker-call";
import type { RiskStudy } from "./risk-study";
import type { RiskResult } from "./risk-result";
import { defaultCatalogue } from "../catalogue/default-catalogue";
import { runRisk, type RiskProgress } from "./run-risk";
import { riskTornado, type Tornado } from "./tornado";

/** What a run answers. Timings are for display only. */
export type RiskRun = { result: RiskResult; tornado: Tornado[]; samplingMs: number; totalMs: number; progressMessages: number };

export const riskWorkerApi = {
  /** The seeded Monte Carlo run of the study and its one-at-a-time swings; `onProgress` hears each step. */
  run(study: RiskStudy, samples: number, seed: number, onProgress: (progress: RiskProgress) => void): RiskRun {
    const started = performance.now();
    const catalogue = defaultCatalogue();
    let progressMessages = 0;
    const result = runRisk(study, catalogue, {
      samples,
      seed,
      onProgress: (progress) => {
        progressMessages += 1;
        onProgress(progress);
      },
    });
    const samplingMs = performance.now() - started;
    const tornado = riskTornado(study, catalogue);
    return { result, tornado, samplingMs, totalMs: performance.now() - started, progressMessages };
  },
};
export type RiskWorkerApi = typeof riskWorkerApi;

exposeWorker(riskWorkerApi);
