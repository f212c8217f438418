import type { RiskStudy } from "./risk-study";
import type { RiskResult } from "./risk-result";
import type { Tornado } from "./tornado";
import type { RiskProgress } from "./run-risk";

/** What the page sends the risk worker. */
export type RiskWorkerRequest = { type: "run"; study: RiskStudy; samples: number; seed: number };

/** What the risk worker sends back: progress, then one result or one error. Timings are for display only. */
export type RiskWorkerReply =
  | ({ type: "progress" } & RiskProgress)
  | { type: "result"; result: RiskResult; tornado: Tornado[]; samplingMs: number; totalMs: number; progressMessages: number }
  | { type: "error"; message: string };
