// Client view: one page a non-engineer reads (issue 14) — the answer, the project lead's
// recommendation, the options side by side with a small drawing each and their cautions in
// plain words, a one-line glossary and the caution; the engineering figures follow in an
// appendix. Read-only view of the working study (the one every other page opens); exports one HTML file.
import "../src/notebook/style.css";
import css from "../src/notebook/style.css?inline";
import demoStudy from "../data/demo-study.json";
import { startPage, reactiveCell, staticCell, chartFigure, workerStudySignals, designStateMarks, resultsStudy, tableElement, keyValues, downloadText, clientExportHtml, studyDetailItems, answerParts, optionCards, recommendationBlock, glossary, CAUTION, fmt, computed, effect } from "../src/notebook";
import { chartCaption, massByMaterialChart, carbonByModuleChart, costPerM2Chart, carbonVsCostChart } from "../src/charts";
import { comparisonTable, comparisonRows } from "../src/comparison";
import { assumptionsRecord, readStoredStudy, STORAGE_KEY, type Study } from "../src/study";
import type { SchemeResult } from "../src/pipeline";

const { store, main } = startPage({
  id: "client",
  demoStudy,
  readOnly: true,
  intro: "The roof options of the working study — the one the other pages show — for the client: the answer, the project lead's recommendation and the options side by side on the first page; the engineering figures in the appendix. Opening a study file or a link shows that study here instead, without changing the working study.",
});
// Designs run in workers (issue 11: this page carries no design code).
const designed = workerStudySignals(store);
const results = computed(() => designed.results.value ?? []);
/** The study as the shown options were designed (its brief and tables), for every figure, caption and the export. */
const shown = resultsStudy(store, designed);
const DESIGNING = "Designing the options…";

/** Where the shown study came from, in words for the reader. */
function originText(origin: string): string {
  if (origin === "storage") return "the working study saved in this browser (the one every page opens)";
  if (origin === "link") return "the study in this page's link (the working study saved in this browser is unchanged)";
  if (origin.startsWith("file ")) return `the file ${origin.slice(5)} (the working study saved in this browser is unchanged)`;
  if (origin === "defaults") return "spanbook's defaults: the study saved in this browser could not be read (see the message above)";
  return "the demo study: no study is saved in this browser yet";
}

// Follow the working study when another tab changes it (not when a file or link is shown).
window.addEventListener("storage", (event) => {
  if (event.key !== STORAGE_KEY || !(store.origin.value === "storage" || store.origin.value === "demo")) return;
  const stored = readStoredStudy(localStorage, () => store.study.value);
  if (stored && !stored.message && store.replace(stored.study) === null) store.origin.value = "storage";
});

function headlineTable(list: readonly SchemeResult[], study: Study) {
  const { header, rows } = comparisonRows(comparisonTable(list));
  return { caption: `The schemes at ${study.brief.spanM} m span (per m² figures on usable floor)`, header, rows };
}

function figures(list: readonly SchemeResult[], study: Study): HTMLElement[] {
  const caption = chartCaption(study);
  return [
    chartFigure(massByMaterialChart(list, { title: "Roof mass per m² of usable floor, by material", caption }), "client-mass"),
    chartFigure(carbonByModuleChart(list, { title: "Embodied carbon per m² of usable floor, by life-cycle module", caption }), "client-carbon"),
    chartFigure(costPerM2Chart(list, { title: "Cost per m² of usable floor", caption }), "client-cost"),
    chartFigure(carbonVsCostChart(list, { title: "Carbon against cost per m² of usable floor", caption }), "client-carbon-vs-cost"),
  ];
}

function assumptionSections(study: Study): { heading: string; items: [string, string][] }[] {
  const b = study.brief;
  const changed = assumptionsRecord(study).filter((a) => a.changed && a.group !== "brief");
  return [
    {
      heading: "Brief",
      items: [
        ["Clear span, rise", `${b.spanM} m, ${b.riseM} m (span/rise ${fmt.one(b.spanM / b.riseM)})`],
        ["Eaves, minimum clear height", `${b.eavesHeightM} m, ${b.minClearHeightM} m`],
        ["Ground snow, basic wind, terrain", `${b.snowGroundKPa} kPa, ${b.windBasicMPerS} m/s, category ${b.terrain}`],
        ["Imposed roof load, services", `${b.imposedRoofKPa} kPa, ${b.servicesKPa} kPa`],
        ["Carbon factors", `${study.carbon.settings.factorSetName}; modules A1–A3${study.carbon.settings.countA4 ? ", A4" : ""}${study.carbon.settings.countA5 ? ", A5" : ""}${study.carbon.settings.countC ? ", C1–C4" : ""}; module D reported apart`],
        ["Costs", `${study.cost.onCosts.currency} at price base ${study.cost.onCosts.priceBase}, location factor ${study.cost.onCosts.locationFactor}`],
      ],
    },
    {
      heading: `Inputs changed from spanbook's defaults (${changed.length})`,
      items: changed.slice(0, 60).map((a) => [a.label, `${a.value}${a.unit ? ` ${fmt.unit(a.unit)}` : ""} (default ${a.default || "none"})`]),
    },
  ];
}

/** The answer sentences as paragraphs. */
function answer(list: readonly SchemeResult[], study: Study): HTMLElement {
  const wrap = document.createElement("div");
  wrap.className = "answer-text";
  for (const part of answerParts(list, study.cost.onCosts.currency)) {
    const p = document.createElement("p");
    p.textContent = part.text;
    wrap.append(p);
  }
  return wrap;
}

/** The one-page summary: answer, recommendation, options, glossary, caution. */
function summary(list: readonly SchemeResult[], study: Study): HTMLElement {
  const wrap = document.createElement("div");
  const gloss = document.createElement("p");
  gloss.className = "glossary";
  gloss.textContent = glossary(study);
  const caution = document.createElement("p");
  caution.className = "caution summary-caution";
  caution.textContent = CAUTION;
  wrap.append(answer(list, study), recommendationBlock(study), optionCards(list, study), gloss, caution);
  return wrap;
}

reactiveCell(main, { id: "meta", title: "Study", className: "summary-part" }, () => {
  const s = store.study.value;
  const title = document.createElement("p");
  title.className = "study-heading";
  title.textContent = s.meta.title;
  const origin = document.createElement("p");
  origin.id = "client-origin";
  origin.className = "intro";
  origin.textContent = `Shown here: ${originText(store.origin.value)}.`;
  const wrap = document.createElement("div");
  wrap.append(title, keyValues(studyDetailItems(s)), origin);
  return wrap;
});

reactiveCell(main, { id: "summary", title: "At a glance", className: "summary-part" }, () => {
  if (designed.results.value === null) return DESIGNING;
  const list = results.value;
  if (list.length === 0) return "No scheme is switched on in this study.";
  return summary(list, shown.value);
});

const appendix = document.createElement("section");
appendix.className = "appendix";
appendix.id = "appendix";
const appendixTitle = document.createElement("h2");
appendixTitle.className = "appendix-title";
appendixTitle.textContent = "Appendix: the engineering figures";
appendix.append(appendixTitle);
main.append(appendix);

reactiveCell(appendix, { id: "headline", title: "Headline comparison" }, () => {
  if (designed.results.value === null) return DESIGNING;
  const list = results.value;
  if (list.length === 0) return "No scheme is switched on in this study.";
  const t = headlineTable(list, shown.value);
  const table = tableElement(t.header, t.rows, { caption: t.caption, numeric: t.header.map((_, i) => i > 0 && i < t.header.length - 3) });
  headlineShape(table, t.header.length, t.rows.length);
  const wrap = document.createElement("div");
  wrap.className = "table-scroll";
  wrap.append(table);
  return wrap;
});

/** Marks the headline table for the print (and narrow-screen) layout, which turns it on its side. */
function headlineShape(table: HTMLTableElement, fields: number, schemes: number): void {
  table.classList.add("headline");
  table.style.setProperty("--fields", String(fields));
  table.style.setProperty("--schemes", String(schemes));
}

reactiveCell(appendix, { id: "charts", title: "Option charts" }, () => {
  const list = results.value;
  if (list.length === 0) return null;
  const grid = document.createElement("div");
  grid.className = "grid charts";
  grid.append(...figures(list, shown.value));
  return grid;
});

reactiveCell(appendix, { id: "assumptions", title: "Assumptions" }, () => {
  const wrap = document.createElement("div");
  for (const section of assumptionSections(shown.value)) {
    const h = document.createElement("h3");
    h.textContent = section.heading;
    wrap.append(h, keyValues(section.items));
  }
  return wrap;
});

function exportForClient(): void {
  const study = shown.value;
  const list = results.value;
  const html = clientExportHtml({
    title: study.meta.title,
    subtitle: `Roof options at ${study.brief.spanM} m clear span — ${study.meta.author || "spanbook study"}, ${study.meta.date}.`,
    details: studyDetailItems(study),
    caution: CAUTION,
    css,
    summaryHtml: list.length === 0 ? "" : summary(list, study).outerHTML,
    table: headlineTable(list, study),
    chartsHtml: list.length === 0 ? [] : figures(list, study).map((f) => f.querySelector("figure, svg")?.outerHTML ?? ""),
    assumptions: assumptionSections(study),
    generated: `Exported from spanbook on ${new Date().toISOString().slice(0, 10)} from ${originText(store.origin.value)}. Every figure is a feasibility-stage estimate.`,
  });
  const slug = study.meta.title.toLowerCase().replace(/[^a-z0-9]+/g, "-").replace(/^-|-$/g, "") || "study";
  downloadText(`${slug}-client.html`, html, "text/html");
}

const exportButton = document.createElement("button");
exportButton.type = "button";
exportButton.id = "export-client";
exportButton.textContent = "Export for the client (one HTML file)";
exportButton.addEventListener("click", exportForClient);
const printButton = document.createElement("button");
printButton.type = "button";
printButton.textContent = "Print (A4: the summary on page 1, the appendix after)";
printButton.addEventListener("click", () => window.print());
const tools = document.createElement("div");
tools.className = "study-tools";
tools.append(exportButton, printButton);
// Nothing is exported or printed half designed: both wait for the options of the study shown.
effect(() => {
  const waiting = designed.busy.value || designed.results.value === null;
  exportButton.disabled = waiting;
  printButton.disabled = waiting;
  exportButton.title = printButton.title = waiting ? "Waiting for the options to be designed" : "";
});
staticCell(main, { id: "export", title: "Take it away" }, tools);
designStateMarks(store, designed, ["summary", "headline", "charts"]);
