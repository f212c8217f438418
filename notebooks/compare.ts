// Compare page: the brief, the loads and geometry it implies, and the schemes side by side.
import "../src/notebook/style.css";
import demoStudy from "../data/demo-study.json";
import {
  startPage,
  reactiveCell,
  staticCell,
  briefControls,
  keyValues,
  chartFigure,
  outlineFigure,
  computed,
  signal,
  effect,
  fmt,
  type ReadonlySignal,
  workerStudySignals,
  controlGroup,
  toggleControl,
  schemeSummary,
  schemeStatusLine,
  answerParts,
  liveResultsTable,
  memberTable,
  checkTable,
  takeoffTable,
  schemeOptionControls,
  studyDetailsEditor,
  gapNotice,
  settled,
  perFrame,
  chartTurns,
  proportionsSentences,
  onDemandAnalysis,
  onDemandAnalysisOption,
  setAttr,
  patchChildren,
} from "../src/notebook";
import { tableGaps, usesRise } from "../src/pipeline";
import { roofActions, designPressures } from "../src/loads";
import { envelope } from "../src/takeoff";
import {
  drawnRoles,
  sectionChartOptions,
  sectionOutline,
  planChartOptions,
  model3dChartOptions,
  chartCaption,
  massByMaterialChart,
  carbonByModuleChart,
  costPerM2Chart,
  carbonVsCostChart,
  SCHEME_COLOURS,
} from "../src/charts";

const { store, main } = startPage({
  id: "compare",
  demoStudy,
  intro:
    "Set the brief; every scheme is designed for it from published methods and compared on weight, embodied carbon and cost per m² of usable floor. Everything below updates as you type.",
});

// The answer first, full width; below it the brief (sticky beside the results on a wide screen)
// and the results.
const answerSlot = document.createElement("div");
const layout = document.createElement("div");
layout.className = "compare-layout";
const inputs = document.createElement("aside");
inputs.className = "brief-column";
inputs.setAttribute("aria-label", "Brief");
const outputs = document.createElement("div");
outputs.className = "results-column";
layout.append(inputs, outputs);
main.append(answerSlot, layout);

const brief = computed(() => store.study.value.brief);
const actions = computed(() => roofActions(brief.value));
const env = computed(() => envelope(brief.value));
// The caption reads the brief and the factor set's name only; as a computed string it changes
// (and re-renders the charts) only when those do, not on every edit of the study.
const caption = computed(() => chartCaption(store.study.value));

staticCell(inputs, { id: "brief", title: "Brief" }, briefControls(store));

reactiveCell(inputs, { id: "loads", title: "Design loads", patch: true }, () => {
  const a = actions.value;
  const b = brief.value;
  // Unit permanent load of 1 kPa shows the ULS factors at work; schemes add their own self-weight.
  const perKPa = designPressures(b, a, b.servicesKPa + 1);
  return keyValues([
    ["Snow shape μ1 (EN 1991-1-3 Table 5.2)", fmt.two(a.mu1)],
    ["Snow shape μ3, curved roof (§5.3.5)", fmt.two(a.mu3)],
    ["Snow on plan, uniform equivalent", `${fmt.two(a.snowKPa)} kPa (μ = ${fmt.two(a.muUniform)})`],
    ["Leading variable action", `${a.leadingVariable}, ${fmt.two(a.leadingVariableKPa)} kPa`],
    ["Peak velocity pressure q_p at crown (EN 1991-1-4 eq. 4.8)", `${fmt.two(a.peakWindKPa)} kPa at ${fmt.one(a.windHeightM)} m`],
    ["Characteristic net uplift", `${fmt.two(a.upliftKPa)} kPa`],
    ["ULS gravity for G_k = services + 1 kPa", `${fmt.two(perKPa.gravity.valueKPa)} kPa (eq. ${perKPa.gravity.expression})`],
    ["ULS uplift 1.0 G − 1.5 W for the same G_k", `${fmt.two(perKPa.upliftNetKPa)} kPa (negative = net uplift)`],
  ]);
});

reactiveCell(inputs, { id: "geometry", title: "Roof geometry and floor", patch: true }, () => {
  const e = env.value;
  return keyValues([
    ["Span / rise", `${fmt.one(brief.value.spanM / brief.value.riseM)} (rise/span ${fmt.two(brief.value.riseM / brief.value.spanM)})`],
    ["Sphere radius R", `${fmt.one(e.cap.radiusM)} m`],
    ["Edge angle φ0", `${fmt.one((e.cap.edgeAngleRad * 180) / Math.PI)}°`],
    ["Roof surface", `${fmt.int(e.cap.surfaceM2)} m²`],
    ["Covered plan", `${fmt.int(e.planAreaM2)} m²`],
    ["Usable floor (under the roof surface)", `${fmt.int(e.usableFloorM2)} m² (${fmt.pct(e.usableFloorM2 / e.planAreaM2)} of plan)`],
    ["Enclosed volume", `${fmt.int(e.enclosedVolumeM3)} m³`],
    ["Enclosed air (ISA sea level, 1.225 kg/m³)", `${fmt.int(e.enclosedAirKg / 1000)} t`],
  ]);
});

// Drawn at every step of the span slider, so drawn directly from its outline rather than through
// Plot (issue 14: Plot's layout of this small figure was most of each step's script); the same
// roof, walls, usable floor and axes as the schemes' own sections below. Patched in place: the
// figure's save buttons read the figure on the page when clicked, which is the kept one.
reactiveCell(inputs, { id: "section", title: "Roof section", patch: true }, () =>
  outlineFigure(
    sectionOutline({
      brief: brief.value,
      title: "Roof section through the centre: roof surface, walls and usable floor",
      caption: caption.value,
      // drawn at the brief column's own width (about 400 px), so its labels are read at their size,
      // not shrunk to half as a 760 px drawing was; one height while the span changes
      width: 400,
      height: 240,
    }),
    "roof-section",
  ),
);

// ——— the schemes ———
// Designs run in workers (issue 14): the page keeps drawing while they run.
const { schemes, results, resultsSpanM, busy, failure } = workerStudySignals(store);
// The tables, for naming rows they lack; untouched tables keep their identity, so the table re-renders only when they change.
const factorRows = computed(() => store.study.value.carbon.factors);
const rateRows = computed(() => store.study.value.cost.rates);

staticCell(
  inputs,
  { id: "scheme-switches", title: "Schemes to compare" },
  controlGroup(
    "Switch schemes on and off",
    schemes.map((s) => toggleControl(store.bind<boolean>(["schemes", s.model.id, "enabled"]), { id: `enable-${s.model.id}`, label: s.model.label })),
  ),
);

const currency = computed(() => store.study.value.cost.onCosts.currency);

// The results with the span and the chart caption of the brief they were designed for, taken when
// they arrive (every enabled design is then current, so the brief now is theirs). The table, the
// answer and the status lines draw them on the next frame, only the newest if several came meanwhile
// (issue 14: a slider that keeps up); the charts wait for them to be still.
const arrived = signal({ list: results.peek(), spanM: resultsSpanM.peek(), caption: caption.peek() });
effect(() => {
  const list = results.value;
  arrived.value = { list, spanM: resultsSpanM.peek(), caption: caption.peek() };
});
const drawn = perFrame(arrived);

reactiveCell(answerSlot, { id: "verdict", title: "The answer", className: "answer", patch: true }, () => {
  const { list } = drawn.value;
  if (list === null) return "Designing the schemes…";
  if (list.length === 0) return "Switch on at least one scheme to compare.";
  const wrap = document.createElement("div");
  for (const part of answerParts(list, currency.value)) {
    const p = document.createElement("p");
    p.textContent = part.text;
    if (part.winner) {
      p.dataset.winner = part.winner.id;
      p.dataset.metrics = part.winner.metrics.join(" ");
    } else p.className = "excluded";
    wrap.append(p);
  }
  return wrap;
});

// One table for the page, updated in place as results arrive (issue 14: a new table on every slider
// step was laid out and painted anew, and forgot the column the reader sorted by).
const table = liveResultsTable();
const tableWrap = document.createElement("div");
tableWrap.className = "table-scroll";
reactiveCell(outputs, { id: "comparison", title: "Side by side" }, () => {
  const { list, spanM } = drawn.value;
  if (list === null) return "Designing the schemes…";
  if (list.length === 0) return "Switch on at least one scheme to compare.";
  table.update(list, currency.value, spanM);
  const gaps = gapNotice(tableGaps(list, { factors: factorRows.value, rates: rateRows.value }), "comparison-gaps");
  patchChildren(tableWrap, gaps ? [table.element, gaps] : [table.element]);
  return tableWrap;
});

// Schemes outside their method's valid range are drawn apart and off the scale unless brought in.
const includeExcluded = signal(false);
// The option charts wait for the hand to stop (issue 13/14: no task over 50 ms while the span slider
// moves): they follow the results once these have been still for a moment, and the four are drawn
// one per frame into their own slots (the previous drawing stays until its successor is ready).
// Quiet time measured on the study, not on the results: results that follow a single edit are drawn
// at once, those that arrive while the hand still moves wait for it to stop.
const calm = settled(arrived, undefined, store.study);
const charts = chartTurns(4);
const chartCell = reactiveCell(outputs, { id: "comparison-charts", title: "Option charts — every figure per m² of usable floor" }, () => {
  const { list, caption: resultsCaption } = calm.value;
  if (list === null || list.length === 0) return null;
  // the caption of the brief these results are for: the live one moves with every step of a drag
  const common = { caption: resultsCaption, includeExcluded: includeExcluded.value };
  charts.draw([
    () => chartFigure(massByMaterialChart(list, { ...common, title: "Roof mass per m² of usable floor, by material" }), "mass-by-material"),
    () => chartFigure(carbonByModuleChart(list, { ...common, title: "Embodied carbon per m² of usable floor, by life-cycle module" }), "carbon-by-module"),
    () => chartFigure(costPerM2Chart(list, { ...common, title: "Cost per m² of usable floor" }), "cost-per-m2"),
    () => chartFigure(carbonVsCostChart(list, { ...common, title: "Carbon against cost per m² of usable floor" }), "carbon-vs-cost"),
  ], () => chartCell.element);
  return charts.grid;
});
chartCell.element.querySelector("h2")?.after(
  toggleControl({ value: includeExcluded, set: (x: boolean) => { includeExcluded.value = x; } }, { id: "include-excluded", label: "Bring schemes outside their method's valid range into the scales (faded, named so)" }),
);

/** A <details> block whose open state is a signal, so the cells inside compute only while it is open. */
function lazyDetails(parent: HTMLElement, id: string, summaryText: string): { body: HTMLElement; open: ReadonlySignal<boolean> } {
  const details = document.createElement("details");
  details.id = id;
  const summary = document.createElement("summary");
  summary.textContent = summaryText;
  const body = document.createElement("div");
  details.append(summary, body);
  parent.append(details);
  const open = signal(false);
  details.addEventListener("toggle", () => {
    open.value = details.open;
  });
  return { body, open };
}

for (const s of schemes) {
  const id = s.model.id;
  const panel = document.createElement("div");
  panel.className = "scheme-panel";
  panel.id = `scheme-${id}`;
  outputs.append(panel);
  const heading = document.createElement("h2");
  heading.textContent = s.model.label;
  heading.style.borderLeft = `6px solid ${SCHEME_COLOURS[id]}`;
  heading.style.paddingLeft = "0.5rem";
  panel.append(heading);
  // The status line and the proportions drawn on the next frame, the newest result only (like the table).
  const status = perFrame(computed(() => ({ on: s.enabled.value, result: s.result.value })));
  reactiveCell(panel, { id: `${id}-summary`, patch: true }, () => {
    const { on, result } = status.value;
    if (!on) return "Switched off.";
    return result === null ? "Designing…" : schemeStatusLine(result);
  });
  // The proportions the search chose and how much the runner-up differs (issue 12 item 4), under the status line.
  reactiveCell(panel, { id: `${id}-proportions`, className: "proportions", patch: true }, () => {
    const choice = status.value.on ? status.value.result?.proportions : undefined;
    if (!choice) return null;
    const wrap = document.createElement("div");
    for (const sentence of proportionsSentences(s.model, choice)) {
      const p = document.createElement("p");
      p.textContent = sentence;
      wrap.append(p);
    }
    return wrap;
  });
  const detail = lazyDetails(panel, `${id}-details`, "Engineering detail: figures, cautions, drawings, members, checks and take-off");
  const about = document.createElement("p");
  about.className = "intro";
  about.textContent = `${s.model.description} Method valid for spans of ${s.model.validSpanM.min}–${s.model.validSpanM.max} m.`;
  detail.body.append(about);
  reactiveCell(detail.body, { id: `${id}-figures` }, () => {
    const result = s.result.value;
    return s.enabled.value && detail.open.value && result !== null ? schemeSummary(result) : null;
  });
  reactiveCell(detail.body, { id: `${id}-drawing` }, () => {
    const design = s.design.value;
    if (!s.enabled.value || !detail.open.value || design === null) return null;
    const roles = drawnRoles([...design.drawing.section, ...(design.drawing.plan ?? [])]);
    const wrap = document.createElement("div");
    wrap.className = "grid charts";
    wrap.append(
      chartFigure(
        // the roof line at the scheme's own rise (the brief's rise is another roof when each scheme takes its own); left
        // out where the scheme draws its own fabric (a cable dome's springs from its raised ring, a cable net's is a
        // tent) or uses no rise (a flat truss under a domed line misleads)
        sectionChartOptions({ brief: s.result.value?.brief ?? brief.value, lines: design.drawing.section, roles, title: `${s.model.label}: section`, caption: caption.value, width: 620, briefRoof: (s.result.value?.proportions ? usesRise(s.result.value.proportions) : true) && !design.drawing.section.some((l) => l.role === "fabric") }),
        `${id}-section`,
      ),
    );
    if (design.drawing.plan) wrap.append(chartFigure(planChartOptions({ brief: brief.value, lines: design.drawing.plan, roles, title: `${s.model.label}: plan`, caption: caption.value }), `${id}-plan`));
    return wrap;
  });
  // The scheme's 3D analysis model (issue 13, item 7), when its design carries a view.
  const modelSlot = document.createElement("div");
  modelSlot.className = "model-slot";
  modelSlot.id = `${id}-model-slot`;
  detail.body.append(modelSlot);
  // or, where the scheme runs it on demand (the lattice domes) and it has not run, what it gives and a button that runs it
  const onDemand = onDemandAnalysisOption(s.model);
  reactiveCell(modelSlot, { id: `${id}-model` }, () => {
    if (!s.enabled.value || !detail.open.value || s.design.value === null) return null;
    const analysis = s.design.value.analysis;
    const view = analysis?.view;
    if (!view) return onDemand ? onDemandAnalysis(store, s.model, onDemand, s.current.value) : null;
    const wrap = document.createElement("div");
    wrap.className = "grid charts";
    for (const projection of ["plan", "oblique"] as const) {
      wrap.append(chartFigure(model3dChartOptions({ view, projection, title: `${s.model.label}: 3D analysis, ${projection === "plan" ? "plan" : "oblique view"}`, caption: caption.value }), `${id}-model-${projection}`));
    }
    // a lattice's lowest buckling mode, beside its deformed shape
    if (view.modeShape) {
      const factor = analysis.bucklingFactor === undefined ? "" : `, elastic factor ${fmt.two(analysis.bucklingFactor)}`;
      wrap.append(chartFigure(model3dChartOptions({ view, projection: "oblique", mode: true, title: `${s.model.label}: 3D analysis, lowest buckling mode${factor} (oblique view)`, caption: caption.value }), `${id}-model-mode`));
    }
    return wrap;
  });
  reactiveCell(detail.body, { id: `${id}-tables` }, () => {
    const design = s.design.value;
    if (!s.enabled.value || !detail.open.value || design === null) return null;
    const wrap = document.createElement("div");
    wrap.className = "table-scroll";
    wrap.append(memberTable(design), checkTable(design), takeoffTable(design));
    return wrap;
  });
  const options = lazyDetails(panel, `${id}-options-panel`, "Options");
  // the chosen value read only while the Options are open: the pinned boxes' notes then follow each arriving design, and do no work when closed
  staticCell(options.body, { id: `${id}-options` }, schemeOptionControls(store, s.model, (key) => (options.open.value ? s.result.value?.proportions?.proportions[key] : undefined)));
}

// The study's own lines (title, prepared by, date, notes), at the foot of the brief.
staticCell(inputs, { id: "study", title: "Study" }, studyDetailsEditor(store));

// While newer designs are on their way the results say so (aria-busy), and a worker failure is shown.
effect(() => {
  // busy until the newest results are drawn too (the table follows them a frame later)
  const waiting = String(busy.value || drawn.value !== arrived.value);
  for (const id of ["verdict", "comparison", "comparison-charts"]) {
    const cell = document.getElementById(`cell-${id}`);
    if (cell) setAttr(cell, "aria-busy", waiting);
  }
});
effect(() => {
  if (failure.value) store.notice.value = `A design could not be made: ${failure.value}`;
});
