// Risk page: the study's uncertain inputs (grouped, filterable), a seeded Monte Carlo run in a Web
// Worker (progress, cancel; refused while an input is invalid), and the results in words first:
// one sentence, the likely ranges (1 in 10 to 9 in 10), how often each scheme is lowest, head to
// head, and which inputs move each scheme's result most (only the inputs it depends on). Results
// are marked out of date as soon as an input changes.
import "../src/notebook/style.css";
import demoStudy from "../data/demo-study.json";
import { startPage, reactiveCell, staticCell, chartFigure, numberControl, controlGroup, signal, computed, effect, fmt, tableElement, type Binding } from "../src/notebook";
import { riskRangeChart, riskLowestChart, riskTornadoChart, riskRankChart, chartCaption } from "../src/charts";
import { checkRiskInputs, RISK_LIMITS, RISK_METRICS, RISK_METRIC_LABELS, type RiskResult, type Tornado, type RiskMetric } from "../src/risk";
import type { RiskWorkerApi } from "../src/risk/risk-worker";
import type { RiskProgress } from "../src/risk/run-risk";
import { workerApi, callback } from "../src/kernel/worker-call";
import { messageOf } from "../src/kernel/errors";
import type { Study } from "../src/study";
import { withoutOnDemandAnalyses } from "../src/study/on-demand";
import type { SchemeId } from "../src/schemes";
import { riskInputsEditor, ensureRiskStyle, onDemandLeftOutText } from "../src/notebook";

const { store, main } = startPage({
  id: "risk",
  demoStudy,
  intro:
    "How sure is the ranking? Say how far each uncertain input may go; the whole pipeline runs many times with seeded random draws and shows each scheme's likely range, how often it is lowest in carbon and in cost, and which inputs move its result most.",
});
ensureRiskStyle();

type Run = { study: Study; result: RiskResult; tornado: Tornado[]; samplingMs: number; totalMs: number; progressMessages: number; mainThreadLongestMs: number };
const run = signal<Run | null>(null);
const status = signal<{ state: "idle" | "running" | "done" | "cancelled" | "failed"; text: string; fraction: number }>({ state: "idle", text: "Not run yet.", fraction: 0 });

const pending = signal<ReadonlyMap<string, string>>(new Map());
staticCell(main, { id: "risk-inputs", title: "Uncertain inputs" }, riskInputsEditor(store, pending));

/** Why Run is refused now: every refused entry in the table and every problem of the study's inputs, by input. */
const blockers = computed(() => [...new Set([...pending.value.values(), ...checkRiskInputs(store.study.value).problems.map((p) => p.message)])]);

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
const blocked = document.createElement("p");
blocked.id = "risk-blocked";
blocked.className = "control-message";
blocked.setAttribute("role", "alert");
effect(() => {
  const why = blockers.value;
  blocked.hidden = why.length === 0;
  blocked.textContent = why.length === 0 ? "" : `Run is refused until ${why.length === 1 ? "this input is" : "these inputs are"} valid: ${why.slice(0, 4).join("; ")}${why.length > 4 ? `; and ${why.length - 4} more` : ""}.`;
  if (!worker) runButton.disabled = why.length > 0;
});
runControls.append(
  controlGroup("Monte Carlo", [
    numberControl(samples as Binding<number>, { id: "risk-samples", label: "Number of draws", unit: "", min: RISK_LIMITS.samples.min, max: RISK_LIMITS.samples.max, step: 100, integer: true, hint: "Every sample runs the whole pipeline (designs are drawn once per design sample)." }),
    numberControl(seed as Binding<number>, { id: "risk-seed", label: "Seed", unit: "", min: 0, max: 2 ** 31 - 1, step: 1, integer: true, hint: "The same study and seed give the same numbers." }),
  ]),
  line,
  blocked,
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
  runButton.disabled = blockers.peek().length > 0;
  cancelButton.disabled = true;
}

runButton.addEventListener("click", () => {
  const study = store.study.value;
  const problems = blockers.peek();
  if (problems.length > 0) {
    status.value = { state: "failed", text: `Not run: ${problems.slice(0, 3).join("; ")}`, fraction: 0 };
    return;
  }
  finish();
  watchLongTasks();
  runButton.disabled = true;
  cancelButton.disabled = false;
  status.value = { state: "running", text: "Starting…", fraction: 0 };
  const started = new Worker(new URL("../src/risk/risk-worker.ts", import.meta.url), { type: "module" });
  worker = started;
  const designShare = 0.4;
  const onProgress = (p: RiskProgress) => {
    if (worker !== started) return;
    const fraction = p.phase === "designs" ? (designShare * p.done) / p.total : designShare + ((1 - designShare) * p.done) / p.total;
    status.value = { state: "running", text: p.phase === "designs" ? `Designing: ${p.done} of ${p.total} designs` : `Sampling: ${p.done} of ${p.total} samples`, fraction };
  };
  started.onerror = (event) => {
    if (worker !== started) return;
    finish();
    status.value = { state: "failed", text: `The risk worker failed: ${event.message}`, fraction: 0 };
  };
  workerApi<RiskWorkerApi>(started)
    // the lattice domes' on-demand 3D analysis (seconds a design) is left out of the draws: it runs where asked, in a scheme's details
    .api.run(withoutOnDemandAnalyses(study), study.risk.samples, study.seed, callback(onProgress))
    .then(
      (reply) => {
        if (worker !== started) return;
        const mainThreadLongestMs = longest;
        finish();
        run.value = { study, result: reply.result, tornado: reply.tornado, samplingMs: reply.samplingMs, totalMs: reply.totalMs, progressMessages: reply.progressMessages, mainThreadLongestMs };
        status.value = { state: "done", text: `Done: ${reply.result.samples} samples in ${fmt.one(reply.samplingMs / 1000)} s (with the one-at-a-time swings: ${fmt.one(reply.totalMs / 1000)} s), ${reply.progressMessages} progress updates; longest main-thread task ${fmt.int(mainThreadLongestMs)} ms.`, fraction: 1 };
      },
      (error: unknown) => {
        if (worker !== started) return;
        finish();
        status.value = { state: "failed", text: `The run failed: ${messageOf(error)}`, fraction: 0 };
      },
    );
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
/** True as soon as any input of the study changes after the run. */
const outOfDate = computed(() => run.value !== null && run.value.study !== store.study.value);
/** A result's name with its unit, the cost's in the run's currency (issue 14: a currency on every cost). */
const metricLabel = (metric: RiskMetric, currency: string) => (metric === "costPerM2Floor" ? `Cost (${currency}/m² usable floor)` : RISK_METRIC_LABELS[metric]);
const pct = (p: number) => `${Math.round(100 * p)} %`;

/** The result in one sentence: which scheme is cheapest and which lowest in carbon, in how many draws, and the runner-up. */
function riskVerdict(res: RiskResult): string {
  const part = (key: "pLowestCost" | "pLowestCarbon", what: string) => {
    const ranked = [...res.schemes].sort((a, b) => b[key] - a[key]);
    const [first, second] = ranked;
    if (!first || first[key] === 0) return null;
    const next = second && second[key] > 0 ? ` (next: the ${second.label.toLowerCase()}, ${pct(second[key])})` : "";
    return `the ${first.label.toLowerCase()} is ${what} in ${pct(first[key])} of draws${next}`;
  };
  const parts = [part("pLowestCost", "cheapest"), part("pLowestCarbon", "lowest in carbon")].filter((p): p is string => p !== null);
  if (parts.length === 0) return `No scheme was feasible in any of the ${fmt.int(res.samples)} draws.`;
  const sentence = `Over ${fmt.int(res.samples)} draws, ${parts.join(", and ")}.`;
  return sentence.charAt(0).toUpperCase() + sentence.slice(1);
}

const resultsCells: HTMLElement[] = [];
effect(() => {
  const stale = outOfDate.value; // read first, so the effect follows it even before the cells exist
  for (const cell of resultsCells) cell.classList.toggle("out-of-date", stale);
});

resultsCells.push(reactiveCell(main, { id: "risk-results", title: "Results" }, () => {
  const r = run.value;
  if (!r) return "Run the analysis to see the ranges.";
  const res = r.result;
  const wrap = document.createElement("div");
  const staleNote = document.createElement("p");
  staleNote.id = "risk-stale";
  staleNote.className = "risk-stale";
  staleNote.setAttribute("role", "status");
  staleNote.hidden = !outOfDate.value;
  staleNote.textContent = "Out of date: an input has changed since this run. Run again to update every result below.";
  const verdict = document.createElement("p");
  verdict.id = "risk-verdict";
  verdict.className = "risk-verdict";
  verdict.textContent = riskVerdict(res);
  const note = document.createElement("p");
  const left = onDemandLeftOutText(r.study, "of the draws (seconds a design)");
  note.textContent = `${res.samples} draws, seed ${res.seed}, ${res.designSamples} design draws (designs made per scheme: ${Object.values(res.designsPerScheme).join(", ")}). Cost in ${res.currency}, estimate class ${res.estimateClass.label}. ${res.coverage}${left ? ` ${left}` : ""}`;
  const rows = res.schemes.flatMap((s) =>
    RISK_METRICS.map((metric) => {
      const m = s.metrics[metric];
      const f = fmt.sig3;
      return [s.label, metricLabel(metric, res.currency), m?.deterministic == null ? "–" : f(m.deterministic), m ? f(m.p10) : "–", m ? f(m.p50) : "–", m ? f(m.p90) : "–", m ? `${f(m.mean)} ± ${fmt.sig3(m.seMean)}` : "–", fmt.pct(s.pFeasible)];
    }),
  );
  const table = tableElement(["scheme", "result", "with the study's values", "1 in 10 below (P10)", "middle (P50)", "9 in 10 below (P90)", "average ± its sampling error", "feasible in"], rows, { caption: "Per scheme: the result with the study's own values beside the likely range over the draws in which the scheme is feasible", numeric: [false, false, true, true, true, true, true, true] });
  table.id = "risk-results-table";
  const lowest = tableElement(
    ["scheme", "lowest carbon in", "cheapest in"],
    res.schemes.map((s) => [s.label, `${pct(s.pLowestCarbon)} ± ${pct(s.seLowestCarbon)}`, `${pct(s.pLowestCost)} ± ${pct(s.seLowestCost)}`]),
    { caption: `Share of draws in which each scheme is lowest among the schemes feasible in that draw (${res.samplesWithFeasible} draws had at least one)`, numeric: [false, true, true] },
  );
  const warnings = document.createElement("ul");
  for (const w of res.warnings.slice(0, 12)) {
    const li = document.createElement("li");
    li.textContent = w;
    warnings.append(li);
  }
  wrap.append(staleNote, verdict, note, table, lowest, warnings);
  return wrap;
}).element);

resultsCells.push(reactiveCell(main, { id: "risk-ranges", title: "Likely range, 1 in 10 to 9 in 10 (P10–P90)" }, () => {
  const r = run.value;
  if (!r) return null;
  const wrap = document.createElement("div");
  for (const metric of RISK_METRICS) {
    wrap.append(chartFigure(riskRangeChart(r.result, metric, { title: `${metricLabel(metric, r.result.currency)}: likely range of ${r.result.samples} draws, the middle and the study's value`, caption: chartCaption(r.study, `risk: ${r.result.samples} draws, seed ${r.result.seed}`) }), `risk-range-${metric}`));
  }
  return wrap;
}).element);

resultsCells.push(reactiveCell(main, { id: "risk-lowest", title: "How often each scheme is lowest" }, () => {
  const r = run.value;
  if (!r) return null;
  return chartFigure(riskLowestChart(r.result, { title: "How often each scheme has the lowest carbon and the lowest cost, among the feasible schemes", caption: chartCaption(r.study, `risk: ${r.result.samples} draws, seed ${r.result.seed}; whiskers: ± one sampling error`) }), "risk-lowest");
}).element);

resultsCells.push(reactiveCell(main, { id: "risk-pairwise", title: "Head to head: how often the row's scheme is lower than the column's" }, () => {
  const r = run.value;
  if (!r) return null;
  const res = r.result;
  const wrap = document.createElement("div");
  for (const metric of ["carbonKgCO2ePerM2Floor", "costPerM2Floor"] as const) {
    const ids = res.schemes.map((s) => s.id);
    const rows = ids.map((a) => [schemeLabel(res, a), ...ids.map((b) => (a === b ? "–" : pct(res.pairwise.find((p) => p.metric === metric && p.a === a && p.b === b)?.pABeatsB ?? Number.NaN)))]);
    wrap.append(tableElement(["", ...ids.map((id) => schemeLabel(res, id))], rows, { caption: `${metricLabel(metric, res.currency)}: share of draws in which the row's scheme is lower than the column's (draws where both are feasible)` }));
  }
  return wrap;
}).element);

const sensitivityScheme = signal<SchemeId | "">("");

function schemePicker(r: Run, ids: readonly SchemeId[], chosen: SchemeId): HTMLElement {
  const label = document.createElement("label");
  label.htmlFor = "risk-scheme";
  label.textContent = "Scheme ";
  const select = document.createElement("select");
  select.id = "risk-scheme";
  for (const id of ids) select.append(new Option(schemeLabel(r.result, id), id));
  select.value = chosen;
  select.addEventListener("change", () => (sensitivityScheme.value = select.value as SchemeId));
  label.append(select);
  return label;
}

resultsCells.push(reactiveCell(main, { id: "risk-sensitivity", title: "Which inputs move the result most" }, () => {
  const r = run.value;
  if (!r) return null;
  const ids = r.result.schemes.map((s) => s.id);
  const chosen = ids.includes(sensitivityScheme.value as SchemeId) ? (sensitivityScheme.value as SchemeId) : ids[0];
  if (!chosen) return "No scheme was evaluated.";
  const wrap = document.createElement("div");
  wrap.append(schemePicker(r, ids, chosen));
  const name = schemeLabel(r.result, chosen);
  const only = new Set(r.result.usedInputs[chosen] ?? []);
  const caption = (extra: string) => chartCaption(r.study, `${extra}; only the ${only.size} inputs the result of the ${name} depends on are listed`);
  for (const metric of ["carbonKgCO2ePerM2Floor", "costPerM2Floor"] as const) {
    const tornado = r.tornado.find((t) => t.scheme === chosen && t.metric === metric);
    if (tornado) wrap.append(chartFigure(riskTornadoChart(tornado, r.result.currency, { only, title: `${name}: ${metricLabel(metric, r.result.currency)} with one input at a time at its least and its most`, caption: caption("the other inputs at the study's values; dashed: the result with the study's values") }), `risk-one-at-a-time-${chosen}-${metric}`));
  }
  for (const metric of RISK_METRICS as readonly RiskMetric[]) {
    wrap.append(chartFigure(riskRankChart(r.result.rankCorrelations, r.study.risk.inputs, chosen, metric, { only, title: `${name}: how closely the result follows each input — ${metricLabel(metric, r.result.currency)} when all vary together`, caption: caption(`rank correlation over ${r.result.samples} draws, seed ${r.result.seed}`) }), `risk-follows-${chosen}-${metric}`));
  }
  return wrap;
}).element);
