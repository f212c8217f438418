// Risk page: the study's uncertain inputs, a seeded Monte Carlo run in a Web Worker (progress,
// cancel), and the results: P10–P90 ranges, probability of being lowest, pairwise table, tornado
// and rank-correlation charts.
import "../src/notebook/style.css";
import demoStudy from "../data/demo-study.json";
import { startPage, reactiveCell, staticCell, chartFigure, numberControl, controlGroup, signal, fmt, tableElement, type Binding } from "../src/notebook";
import { riskRangeChart, riskLowestChart, riskTornadoChart, riskRankChart, chartCaption } from "../src/charts";
import { checkRiskInputs, RISK_LIMITS, RISK_METRICS, RISK_METRIC_LABELS, type RiskResult, type Tornado, type RiskMetric } from "../src/risk";
import type { RiskWorkerReply, RiskWorkerRequest } from "../src/risk/risk-worker-messages";
import type { Study } from "../src/study";
import type { SchemeId } from "../src/schemes";
import { riskInputsEditor, ensureRiskStyle } from "../src/notebook";

const { store, main } = startPage({
  id: "risk",
  demoStudy,
  intro:
    "How sure is the ranking? Give the uncertain inputs a range; the whole pipeline runs many times with seeded random draws and shows each scheme's P10–P90 range, how often it is lowest in carbon and in cost, and which inputs matter most.",
});
ensureRiskStyle();

type Run = { study: Study; result: RiskResult; tornado: Tornado[]; samplingMs: number; totalMs: number; progressMessages: number; mainThreadLongestMs: number };
const run = signal<Run | null>(null);
const status = signal<{ state: "idle" | "running" | "done" | "cancelled" | "failed"; text: string; fraction: number }>({ state: "idle", text: "Not run yet.", fraction: 0 });

staticCell(main, { id: "risk-inputs", title: "Uncertain inputs" }, riskInputsEditor(store));

// Run controls: N and seed are part of the study (risk.samples and seed).
let worker: Worker | null = null;
const samples = store.bind<number>(["risk", "samples"]);
const seed = store.bind<number>(["seed"]);
const runControls = document.createElement("div");
const runButton = document.createElement("button");
runButton.type = "button";
runButton.id = "risk-run";
runButton.textContent = "Run";
const cancelButton = document.createElement("button");
cancelButton.type = "button";
cancelButton.id = "risk-cancel";
cancelButton.textContent = "Cancel";
cancelButton.disabled = true;
const bar = document.createElement("progress");
bar.id = "risk-progress";
bar.max = 1;
bar.value = 0;
const statusText = document.createElement("span");
statusText.id = "risk-status";
statusText.setAttribute("role", "status");
const line = document.createElement("div");
line.className = "risk-progress";
line.append(runButton, cancelButton, bar, statusText);
runControls.append(
  controlGroup("Monte Carlo", [
    numberControl(samples as Binding<number>, { id: "risk-samples", label: "Samples N", unit: "", min: RISK_LIMITS.samples.min, max: RISK_LIMITS.samples.max, step: 100, integer: true, hint: "Every sample runs the whole pipeline (designs are drawn once per design sample)." }),
    numberControl(seed as Binding<number>, { id: "risk-seed", label: "Seed", unit: "", min: 0, max: 2 ** 31 - 1, step: 1, integer: true, hint: "The same study and seed give the same numbers." }),
  ]),
  line,
);
staticCell(main, { id: "risk-run", title: "Run" }, runControls);

let longest = 0;
let observer: PerformanceObserver | null = null;
function watchLongTasks(): void {
  longest = 0;
  try {
    observer = new PerformanceObserver((list) => {
      for (const entry of list.getEntries()) longest = Math.max(longest, entry.duration);
    });
    observer.observe({ type: "longtask", buffered: false });
  } catch {
    observer = null;
  }
}

function finish(): void {
  worker?.terminate();
  worker = null;
  observer?.disconnect();
  runButton.disabled = false;
  cancelButton.disabled = true;
}

runButton.addEventListener("click", () => {
  const study = store.study.value;
  const problems = checkRiskInputs(study).problems;
  if (problems.length > 0) {
    status.value = { state: "failed", text: `Not run: ${problems.slice(0, 3).map((p) => p.message).join("; ")}`, fraction: 0 };
    return;
  }
  finish();
  watchLongTasks();
  runButton.disabled = true;
  cancelButton.disabled = false;
  status.value = { state: "running", text: "Starting…", fraction: 0 };
  worker = new Worker(new URL("../src/risk/risk-worker.ts", import.meta.url), { type: "module" });
  const designShare = 0.4;
  worker.onmessage = (event: MessageEvent<RiskWorkerReply>) => {
    const reply = event.data;
    if (reply.type === "progress") {
      const fraction = reply.phase === "designs" ? (designShare * reply.done) / reply.total : designShare + ((1 - designShare) * reply.done) / reply.total;
      status.value = { state: "running", text: reply.phase === "designs" ? `Designing: ${reply.done} of ${reply.total} designs` : `Sampling: ${reply.done} of ${reply.total} samples`, fraction };
    } else if (reply.type === "result") {
      const mainThreadLongestMs = longest;
      finish();
      run.value = { study, result: reply.result, tornado: reply.tornado, samplingMs: reply.samplingMs, totalMs: reply.totalMs, progressMessages: reply.progressMessages, mainThreadLongestMs };
      status.value = { state: "done", text: `Done: ${reply.result.samples} samples in ${fmt.one(reply.samplingMs / 1000)} s (tornado included: ${fmt.one(reply.totalMs / 1000)} s), ${reply.progressMessages} progress updates; longest main-thread task ${fmt.int(mainThreadLongestMs)} ms.`, fraction: 1 };
    } else {
      finish();
      status.value = { state: "failed", text: `The run failed: ${reply.message}`, fraction: 0 };
    }
  };
  worker.onerror = (event) => {
    finish();
    status.value = { state: "failed", text: `The risk worker failed: ${event.message}`, fraction: 0 };
  };
  const request: RiskWorkerRequest = { type: "run", study, samples: study.risk.samples, seed: study.seed };
  worker.postMessage(request);
});
cancelButton.addEventListener("click", () => {
  finish();
  status.value = { state: "cancelled", text: "Cancelled; nothing changed.", fraction: 0 };
});
reactiveCell(main, { id: "risk-status-cell" }, () => {
  const s = status.value;
  statusText.textContent = s.text;
  bar.value = s.fraction;
  return null;
});

// Results.
const schemeLabel = (r: RiskResult, id: SchemeId) => r.schemes.find((s) => s.id === id)?.label ?? id;
const stale = (r: Run) => (r.study !== store.study.value ? "The study has changed since this run: run again to update. " : "");
const money = (x: number) => fmt.int(x);

reactiveCell(main, { id: "risk-results", title: "Results" }, () => {
  const r = run.value;
  if (!r) return "Run the analysis to see the ranges.";
  const res = r.result;
  const wrap = document.createElement("div");
  const note = document.createElement("p");
  if (stale(r)) note.className = "risk-stale";
  note.textContent = `${stale(r)}${res.samples} samples, seed ${res.seed}, ${res.designSamples} design draws (designs made per scheme: ${Object.values(res.designsPerScheme).join(", ")}). Cost in ${res.currency}, estimate class ${res.estimateClass.label}. ${res.coverage}`;
  const rows = res.schemes.flatMap((s) =>
    RISK_METRICS.map((metric) => {
      const m = s.metrics[metric];
      const f = metric === "costPerM2Floor" ? money : fmt.sig3;
      return [s.label, RISK_METRIC_LABELS[metric], m?.deterministic == null ? "–" : f(m.deterministic), m ? f(m.p10) : "–", m ? f(m.p50) : "–", m ? f(m.p90) : "–", m ? `${f(m.mean)} ± ${fmt.sig3(m.seMean)}` : "–", fmt.pct(s.pFeasible)];
    }),
  );
  const table = tableElement(["scheme", "metric", "study value", "P10", "P50", "P90", "mean ± s.e.", "feasible"], rows, { caption: "Per scheme: the deterministic value beside the Monte Carlo percentiles (over the samples in which the scheme is feasible)", numeric: [false, false, true, true, true, true, true, true] });
  table.id = "risk-results-table";
  const lowest = tableElement(
    ["scheme", "P(lowest carbon)", "P(cheapest)"],
    res.schemes.map((s) => [s.label, `${fmt.two(s.pLowestCarbon)} ± ${fmt.two(s.seLowestCarbon)}`, `${fmt.two(s.pLowestCost)} ± ${fmt.two(s.seLowestCost)}`]),
    { caption: `Probability of being lowest among the schemes feasible in a sample (${res.samplesWithFeasible} samples had at least one)`, numeric: [false, true, true] },
  );
  const warnings = document.createElement("ul");
  for (const w of res.warnings.slice(0, 12)) {
    const li = document.createElement("li");
    li.textContent = w;
    warnings.append(li);
  }
  wrap.append(note, table, lowest, warnings);
  return wrap;
});

reactiveCell(main, { id: "risk-ranges", title: "Ranges (P10–P90)" }, () => {
  const r = run.value;
  if (!r) return null;
  const wrap = document.createElement("div");
  for (const metric of RISK_METRICS) {
    wrap.append(chartFigure(riskRangeChart(r.result, metric, { title: `${RISK_METRIC_LABELS[metric]}: P10–P90 of ${r.result.samples} samples, P50 and the study value`, caption: chartCaption(r.study, `risk: ${r.result.samples} samples, seed ${r.result.seed}`) }), `risk-range-${metric}`));
  }
  return wrap;
});

reactiveCell(main, { id: "risk-lowest", title: "Probability of being lowest" }, () => {
  const r = run.value;
  if (!r) return null;
  return chartFigure(riskLowestChart(r.result, { title: "Probability of the lowest carbon and the lowest cost, among the feasible schemes", caption: chartCaption(r.study, `risk: ${r.result.samples} samples, seed ${r.result.seed}; whiskers ±1 standard error`) }), "risk-lowest");
});

reactiveCell(main, { id: "risk-pairwise", title: "Pairwise: P(row beats column)" }, () => {
  const r = run.value;
  if (!r) return null;
  const res = r.result;
  const wrap = document.createElement("div");
  for (const metric of ["carbonKgCO2ePerM2Floor", "costPerM2Floor"] as const) {
    const ids = res.schemes.map((s) => s.id);
    const rows = ids.map((a) => [schemeLabel(res, a), ...ids.map((b) => (a === b ? "–" : fmt.two(res.pairwise.find((p) => p.metric === metric && p.a === a && p.b === b)?.pABeatsB ?? Number.NaN)))]);
    wrap.append(tableElement(["", ...ids.map((id) => schemeLabel(res, id))], rows, { caption: `${RISK_METRIC_LABELS[metric]}: probability that the row's scheme is lower than the column's (samples where both are feasible)` }));
  }
  return wrap;
});

const sensitivityScheme = signal<SchemeId | "">("");
reactiveCell(main, { id: "risk-sensitivity", title: "Sensitivity: tornado and rank correlation" }, () => {
  const r = run.value;
  if (!r) return null;
  const ids = r.result.schemes.map((s) => s.id);
  const chosen = ids.includes(sensitivityScheme.value as SchemeId) ? (sensitivityScheme.value as SchemeId) : ids[0];
  if (!chosen) return "No scheme was evaluated.";
  const wrap = document.createElement("div");
  const label = document.createElement("label");
  label.htmlFor = "risk-scheme";
  label.textContent = "Scheme ";
  const select = document.createElement("select");
  select.id = "risk-scheme";
  for (const id of ids) {
    const option = document.createElement("option");
    option.value = id;
    option.textContent = schemeLabel(r.result, id);
    select.append(option);
  }
  select.value = chosen;
  select.addEventListener("change", () => (sensitivityScheme.value = select.value as SchemeId));
  label.append(select);
  wrap.append(label);
  const name = schemeLabel(r.result, chosen);
  const caption = (extra: string) => chartCaption(r.study, extra);
  for (const metric of ["carbonKgCO2ePerM2Floor", "costPerM2Floor"] as const) {
    const tornado = r.tornado.find((t) => t.scheme === chosen && t.metric === metric);
    if (tornado) wrap.append(chartFigure(riskTornadoChart(tornado, r.result.currency, { title: `${name}: ${RISK_METRIC_LABELS[metric]} with each input at its low and high end`, caption: caption("one input at a time, the others at the study's values") }), `risk-tornado-${chosen}-${metric}`));
  }
  for (const metric of RISK_METRICS as readonly RiskMetric[]) {
    wrap.append(chartFigure(riskRankChart(r.result.rankCorrelations, r.study.risk.inputs, chosen, metric, { title: `${name}: rank correlation of each input with ${RISK_METRIC_LABELS[metric]}`, caption: caption(`Spearman ρ over ${r.result.samples} samples, seed ${r.result.seed}; inputs of one group are drawn together, so they show the same ρ whether or not this scheme uses them`) }), `risk-rank-${chosen}-${metric}`));
  }
  return wrap;
});
