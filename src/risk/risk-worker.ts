// Module Web Worker that runs the risk analysis off the page's main thread and posts progress.
// The page starts it with new Worker(new URL("../src/risk/risk-worker.ts", import.meta.url), { type: "module" })
// and cancels by terminating it (a running synchronous loop cannot read messages).
import type { RiskStudy } from "./risk-study";
import { defaultCatalogue } from "../catalogue/default-catalogue";
import { runRisk, type RiskProgress } from "./run-risk";
import { riskTornado } from "./tornado";
import type { RiskWorkerReply, RiskWorkerRequest } from "./risk-worker-messages";
import { messageOf } from "../kernel/errors";

const scope = self as unknown as { onmessage: ((event: MessageEvent<RiskWorkerRequest>) => void) | null; postMessage(message: RiskWorkerReply): void };

scope.onmessage = (event) => {
  const request = event.data;
  if (request.type !== "run") return;
  const started = performance.now();
  try {
    const study: RiskStudy = request.study;
    const catalogue = defaultCatalogue();
    let posted = 0;
    const result = runRisk(study, catalogue, {
      samples: request.samples,
      seed: request.seed,
      onProgress: (progress: RiskProgress) => {
        posted += 1;
        scope.postMessage({ type: "progress", ...progress });
      },
    });
    const samplingMs = performance.now() - started;
    const tornado = riskTornado(study, catalogue);
    scope.postMessage({ type: "result", result, tornado, samplingMs, totalMs: performance.now() - started, progressMessages: posted });
  } catch (error) {
    scope.postMessage({ type: "error", message: messageOf(error) });
  }
};
