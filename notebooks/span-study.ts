// Span study: every enabled scheme across a range of spans, with the spans where the best one changes.
import "../src/notebook/style.css";
import demoStudy from "../data/demo-study.json";
import { startPage, reactiveCell, staticCell, chartFigure, computed, signal, effect, numberControl, toggleControl, controlGroup, spanStudyRunner, keptRange, keepRange, fmt, chartTurns, onDemandLeftOutText } from "../src/notebook";
import { spanMetricChart, spanValidityChart, chartCaption, type SpanMetric } from "../src/charts";
import { describeCrossovers, valuesBySpan, type SpanRange, type SpanPoint } from "../src/comparison";
import { SCHEME_DECLARATIONS } from "../src/schemes/declarations";
import { withoutOnDemandAnalyses } from "../src/study/on-demand";

const { store, main } = startPage({
  id: "span-study",
  demoStudy,
  intro:
    "Each enabled scheme redesigned at every span of the range at its best proportions, as on the compare page: its own rise within the height limit, or, when the study sets one common rise, that rise kept in proportion to the span. Lines are solid where a scheme is feasible and inside its method's valid span range, dashed outside it (and left out of the scale unless brought in), broken where it is not feasible. Carbon and cost are per m² of usable floor; self-weight per m² of plan.",
});

// The range and the spans computed are kept for the tab's session (a reload, or a visit to another
// page and back, finds them as they were).
const session = (() => {
  try {
    return window.sessionStorage;
  } catch {
    return undefined; // storage off: nothing is kept between loads
  }
})();
const range = signal<SpanRange>(keptRange(session) ?? { fromM: 40, toM: 400, stepM: 10 });
effect(() => keepRange(session, range.value));
const part = (key: keyof SpanRange) => ({
  value: computed(() => range.value[key]),
  set: (x: number) => {
    range.value = { ...range.value, [key]: x };
  },
});
const relative = signal(false);
const includeExcluded = signal(false);
staticCell(
  main,
  { id: "range", title: "Span range" },
  controlGroup("Spans to evaluate and how to draw them", [
    numberControl(part("fromM"), { id: "fromM", label: "From", unit: "m", min: 30, max: 500, step: 10 }),
    numberControl(part("toM"), { id: "toM", label: "To", unit: "m", min: 30, max: 500, step: 10 }),
    numberControl(part("stepM"), { id: "stepM", label: "Step", unit: "m", min: 1, max: 100, step: 1 }),
    toggleControl({ value: relative, set: (x: boolean) => { relative.value = x; } }, { id: "relative", label: "Relative: each scheme against the best at that span" }),
    toggleControl({ value: includeExcluded, set: (x: boolean) => { includeExcluded.value = x; } }, { id: "include-excluded", label: "Bring spans outside a method's valid range into the scale" }),
  ]),
);

const METRICS: { metric: SpanMetric; title: string; y: string; file: string }[] = [
  { metric: "carbonKgCO2ePerM2Floor", title: "Embodied carbon per m² of usable floor against span", y: "Embodied carbon (kgCO2e/m² of usable floor)", file: "span-carbon" },
  { metric: "costPerM2Floor", title: "Cost per m² of usable floor against span", y: "Cost per m² of usable floor", file: "span-cost" },
  { metric: "selfWeightKgPerM2", title: "Self-weight per m² of plan against span", y: "Self-weight (kg/m² of plan)", file: "span-self-weight" },
  { metric: "massToAir", title: "Structure mass ÷ mass of the enclosed air against span", y: "Structure mass ÷ enclosed air mass (–)", file: "span-mass-to-air" },
];

// The charts are drawn one per frame (chartTurns); the study's second pass waits until they are (`drawn`).
const validityTurns = chartTurns(1);
const charts = chartTurns(METRICS.length);
// every span designed without the lattice domes' on-demand 3D analysis (seconds a design): it runs where asked, in a scheme's details
const designed = computed(() => withoutOnDemandAnalyses(store.study.value));
const state = spanStudyRunner(designed, range, { drawn: () => Promise.all([validityTurns.idle(), charts.idle()]).then(() => undefined), ...(session ? { store: session } : {}) });
const points = computed(() => (state.value.status === "failed" ? null : state.value.points));
const labelOf = (id: string) => SCHEME_DECLARATIONS.find((m) => m.id === id)?.label ?? id;
const studySpanM = computed(() => store.study.value.brief.spanM);

/** "the cable net and the cable dome" from their ids. */
const namesOf = (ids: readonly string[]) => new Intl.ListFormat("en", { type: "conjunction" }).format(ids.map((id) => `the ${labelOf(id).toLowerCase()}`));

reactiveCell(main, { id: "status" }, () => {
  const s = state.value;
  if (s.status === "failed") throw new Error(s.error);
  if (s.status === "running") {
    const bar = document.createElement("div");
    const label = document.createElement("label");
    label.htmlFor = "span-progress";
    label.textContent =
      s.pass === "screening"
        ? `Computing the span study… ${s.done} of ${s.total} spans${s.reused > 0 ? ` (${s.reused} kept from the last run)` : ""}`
        : `${s.screeningMs === undefined ? "Designing" : `Every scheme drawn in ${fmt.int(s.screeningMs)} ms; now designing`} ${namesOf(s.again)} by the 3D analysis… ${s.done} of ${s.total} spans, the largest (slowest) first (until this ends, their lines show the closed form, the fast first estimate)`;
    const progress = document.createElement("progress");
    progress.id = "span-progress";
    progress.max = Math.max(1, s.total);
    progress.value = s.done;
    bar.append(label, " ", progress);
    return bar;
  }
  const spans = new Set(s.points.map((p) => p.spanM)).size;
  const workers = `in ${s.workers} background worker${s.workers > 1 ? "s" : ""}`;
  const passes = s.again.length === 0 ? "" : `: every scheme in ${fmt.int(s.screeningMs)} ms with ${namesOf(s.again)} by the closed form, then again by the 3D analysis, as on the compare page`;
  const kept = s.reused === 0 ? "" : ` ${s.reused === spans ? "Every span" : `${s.reused} of the ${spans} spans`} kept from an earlier run of the same study: only new spans are designed.`;
  const left = onDemandLeftOutText(store.study.value, "here (seconds a design, at every span): their points are designed without it");
  return `${spans} spans × ${new Set(s.points.map((p) => p.id)).size} schemes computed in ${fmt.int(s.ms)} ms (${workers}${passes}).${kept}${left ? ` ${left}` : ""}`;
});

const validityCell = reactiveCell(main, { id: "validity", title: "Where each scheme applies" }, () => {
  const list = points.value;
  if (!list) return null;
  const ranges = SCHEME_DECLARATIONS.filter((m) => list.some((p) => p.id === m.id)).map((m) => ({ id: m.id, label: m.label, min: m.validSpanM.min, max: m.validSpanM.max }));
  const options = { title: "Valid span range of each method (shaded) and spans where the scheme is infeasible (×)", caption: chartCaption(store.study.value, "hover a cross for the reason"), studySpanM: studySpanM.value };
  validityTurns.draw([() => chartFigure(spanValidityChart(list, ranges, options), "span-validity")], () => validityCell.element);
  return validityTurns.grid;
});

// The four charts are drawn one per frame into their own slots (the previous drawing stays until
// its successor is ready): drawn together they made one task of ~180 ms when the study finished
// (issue 13: the main thread never blocked over 50 ms). `data-drawn` counts finished sets.
const chartCell = reactiveCell(main, { id: "span-charts", title: "Across the span range" }, () => {
  const list = points.value;
  if (!list) return null;
  const currency = store.study.value.cost.onCosts.currency;
  const common = { caption: chartCaption(store.study.value, store.study.value.brief.riseRule === "own" ? "span varied, proportions chosen afresh at each span" : "span varied, rise/span fixed"), studySpanM: studySpanM.value, relative: relative.value, includeExcluded: includeExcluded.value };
  charts.draw(METRICS.map((m) => () => {
    const y = m.metric === "costPerM2Floor" ? `Cost (${currency}/m² of usable floor)` : m.y;
    const title = common.relative ? `${m.title}, against the best at each span` : m.title;
    return chartFigure(spanMetricChart(list, m.metric, y, { ...common, title }), common.relative ? `${m.file}-relative` : m.file);
  }), () => chartCell.element);
  return charts.grid;
});

reactiveCell(main, { id: "crossovers", title: "Where the best scheme changes" }, () => {
  const list: SpanPoint[] | null = points.value;
  if (!list) return null;
  // Only feasible results inside their method's valid range take part (issue 14).
  const ranked = list.map((p) => (p.feasible && p.inValidRange ? p : { ...p, selfWeightKgPerM2: Number.NaN, carbonKgCO2ePerM2Floor: Number.NaN, costPerM2Floor: Number.NaN }));
  const ul = document.createElement("ul");
  for (const [metric, quality] of [
    ["carbonKgCO2ePerM2Floor", "the lowest-carbon"],
    ["costPerM2Floor", "the cheapest"],
    ["selfWeightKgPerM2", "the lightest"],
  ] as const) {
    const li = document.createElement("li");
    li.textContent = describeCrossovers(valuesBySpan(ranked, metric), quality, (id) => `the ${labelOf(id).toLowerCase()}`);
    ul.append(li);
  }
  const note = document.createElement("p");
  note.className = "intro";
  note.textContent = "Only schemes that are feasible and inside their method's valid range take part; a change of the best that does not hold for two neighbouring spans is not reported as a crossover.";
  const wrap = document.createElement("div");
  wrap.append(ul, note);
  return wrap;
});
