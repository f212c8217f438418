// Carbon page: the factor table edited in place, the carbon settings, and what each edit does to
// every scheme's embodied carbon, by module and by material.
import "../src/notebook/style.css";
import demoStudy from "../data/demo-study.json";
import {
  startPage,
  reactiveCell,
  staticCell,
  chartFigure,
  computed,
  signal,
  fmt,
  tableElement,
  numberControl,
  selectControl,
  toggleControl,
  controlGroup,
  tableEditor,
  textControl,
  factorColumns,
  provenanceCard,
  groupEditTools,
  benchmarkEditor,
  trackCarbonEdits,
  gapNotice,
  missingFactorRows,
  workerStudySignals,
  designStateMarks,
  resultsStudy,
  type Binding,
} from "../src/notebook";
import { setIn } from "../src/study";
import { tableGaps } from "../src/pipeline";
import {
  defaultFactorRows,
  factorRowsToCsv,
  parseFactorCsv,
  readFactorFile,
  FactorRowSchema,
  MaterialIdSchema,
  DEFAULT_CARBON_SETTINGS,
  DEFAULT_FACTOR_SET_NAME,
  CarbonSettingsSchema,
  type CarbonAssessment,
  type CarbonSettings,
  type FactorRow,
  type TransportMode,
} from "../src/carbon";
import { carbonChartOptions, carbonApartChartOptions, carbonByElementChartOptions, chartCaption, CARBON_METRICS, type CarbonMetric, type SchemeCarbon } from "../src/charts";
import * as v from "valibot";

const { store, main } = startPage({
  id: "carbon",
  demoStudy,
  intro:
    "Edit the embodied-carbon factor of any material — A1–A3 per kg, transport distances, site waste rate, end of life — or import a whole table as CSV; every scheme's carbon below follows each edit at once. Module D and biogenic carbon are reported apart and never netted.",
});

const factors = computed(() => store.study.value.carbon.factors);
const settings = computed(() => store.study.value.carbon.settings);
// Designs run in workers (issue 11: this page carries no design code); the results move together,
// all designed and assessed with the same tables, which `assessedCarbon` names.
const designed = workerStudySignals(store);
const results = computed(() => designed.results.value ?? []);
/** The study as the shown results were designed (its brief and tables), for captions. */
const shown = resultsStudy(store, designed);
const assessedCarbon = computed(() => designed.resultsTables.value.carbon);
const DESIGNING = "Designing the schemes…";
/** The enabled schemes' designs (for the gap notices and the import check), from the shared per-scheme signals. */
const designs = computed(() => results.value.map(({ id, label, design }) => ({ id, label, design })));

type SchemeCarbonResult = { id: string; label: string; feasible: boolean; reason: string; carbon: CarbonAssessment | null; error: string };
/** Each scheme's carbon as the shared per-scheme signals assessed it: a factor edit re-assesses, never re-designs, and the page runs no assessment of its own. */
const carbonBySchemes = computed<SchemeCarbonResult[]>(() =>
  results.value.map(({ id, label, design, carbon, error }) => ({ id, label, feasible: design.feasible, reason: design.reason, carbon, error: carbon ? "" : error || (design.feasible ? "no take-off" : design.reason) })),
);

// ── Settings ────────────────────────────────────────────────────────────────────────────────
const path = ["carbon", "settings"] as const;
const modeBinding = (mode: TransportMode["mode"]): Binding<number> => ({
  value: computed(() => settings.value.transportModes.find((m) => m.mode === mode)?.kgCO2ePerTonneKm ?? 0),
  set(next) {
    const modes = settings.peek().transportModes.map((m) => (m.mode === mode ? { ...m, kgCO2ePerTonneKm: next } : m));
    store.study.value = setIn(store.study.value, [...path, "transportModes"], modes);
  },
});

staticCell(
  main,
  { id: "settings", title: "What is counted" },
  (() => {
    const grid = document.createElement("div");
    grid.className = "grid";
    grid.append(
      controlGroup("Life-cycle modules (A1–A3 always counted)", [
        toggleControl(store.bind<boolean>([...path, "countA4"]), { label: "A4 transport to site", id: "countA4" }),
        toggleControl(store.bind<boolean>([...path, "countA5"]), { label: "A5 site wastage", id: "countA5" }),
        toggleControl(store.bind<boolean>([...path, "countC"]), { label: "C1–C4 end of life", id: "countC" }),
      ]),
      controlGroup("Quantities and area", [
        numberControl(store.bind<number>([...path, "quantityAllowancePct"]), {
          label: "Design-stage quantity allowance",
          unit: "%",
          min: 0,
          max: 50,
          step: 1,
          id: "quantityAllowancePct",
          hint: "Added to every mass, never to a factor (10 %: common practice, no source).",
        }),
        selectControl(store.bind<string>([...path, "areaBasis"]), {
          label: "Per-m² basis of the results",
          id: "areaBasis",
          choices: [
            { value: "usable-floor", label: "Usable floor" },
            { value: "covered-plan", label: "Covered plan" },
            { value: "roof-surface", label: "Roof surface" },
          ],
        }),
      ]),
      controlGroup("Transport (A4) mode factors", [
        numberControl(modeBinding("road"), { label: "Road, HGV average laden", unit: "kgCO2e/t·km", min: 0, max: 5, step: 0.001, id: "modeRoad", hint: DEFAULT_CARBON_SETTINGS.transportModes[0]?.source ?? "" }),
        numberControl(modeBinding("sea"), { label: "Sea, cargo ship average", unit: "kgCO2e/t·km", min: 0, max: 5, step: 0.001, id: "modeSea", hint: DEFAULT_CARBON_SETTINGS.transportModes[1]?.source ?? "" }),
      ]),
    );
    return grid;
  })(),
);

// ── Benchmarks ──────────────────────────────────────────────────────────────────────────────
const bands = computed(() => settings.value.benchmarks ?? []);
staticCell(
  main,
  { id: "benchmarks", title: "Benchmark bands" },
  benchmarkEditor(bands, (next) => {
    store.study.value = setIn(store.study.value, [...path, "benchmarks"], next);
  }),
);

// ── Factor table ────────────────────────────────────────────────────────────────────────────
const columns = factorColumns(settings);
const selectedFactor = signal<string | null>(null);
const setFactors = (next: FactorRow[]) => {
  store.study.value = setIn(store.study.value, ["carbon", "factors"], next);
};

/** The factor set's name, shown in every caption and record; an import or merge renames it, and it can be edited. */
const setNameControl = textControl(store.bind<string>([...path, "factorSetName"]), {
  id: "factorSetName",
  label: "Factor set name (shown in captions and records)",
  size: 48,
  hint: "An import names the set after its file and the date; edit it to say what the factors are.",
  check: (raw) => {
    if (raw === "") return "empty (expected a name for the factor set)";
    const result = v.safeParse(CarbonSettingsSchema.entries.factorSetName, raw);
    return result.success ? null : (result.issues[0]?.message ?? "invalid");
  },
});

const factorEditor = tableEditor<FactorRow>({
  id: "factors",
  rowNoun: "material",
  rows: factors,
  setRows: setFactors,
  defaults: defaultFactorRows,
  keyField: "material",
  columns,
  schema: FactorRowSchema,
  parseCsv: parseFactorCsv,
  read: (text, name, current) => readFactorFile(text, current, name),
  toCsv: factorRowsToCsv,
  selected: selectedFactor,
  extraTools: groupEditTools(factors, setFactors),
  caption: "Factors per kg of material as delivered, by life-cycle stage",
  csvFilename: "carbon-factors.csv",
  missingFor: missingFactorRows(() => designs.peek()),
  setName: {
    current: () => settings.peek().factorSetName,
    defaultName: DEFAULT_FACTOR_SET_NAME,
    apply(rows, name) {
      store.study.value = setIn(setIn(store.study.value, ["carbon", "factors"], rows), [...path, "factorSetName"], name);
    },
  },
  newRow(id, rows) {
    const checked = v.safeParse(MaterialIdSchema, id);
    if (!checked.success) return `material id: ${checked.issues[0]?.message ?? "invalid"}`;
    if (rows.some((r) => r.material === id)) return `material id: ${JSON.stringify(id)} is already in the table (expected a new id)`;
    return {
      material: id,
      label: id,
      a1a3KgCO2ePerKg: 0,
      densityKgPerM3: 1000,
      transportKmRoad: 0,
      transportKmSea: 0,
      wasteRatePct: 0,
      endOfLifeKgCO2ePerKg: 0,
      moduleDKgCO2ePerKg: 0,
      biogenicKgCO2ePerKg: 0,
      source: "added on the carbon page: name the inventory or EPD and its year",
      notes: "take-off rows use it once a scheme names this material id",
    };
  },
});

staticCell(
  main,
  { id: "factors", title: "Factor table", className: "wide-cell" },
  (() => {
    const wrap = document.createElement("div");
    const side = document.createElement("div");
    side.className = "factor-layout";
    side.append(factorEditor, provenanceCard(selectedFactor, factors));
    const hint = document.createElement("p");
    hint.className = "control-hint";
    hint.textContent = "Focus a row to see where its factor comes from. Import reads comma-, semicolon- or tab-separated files, decimal commas and common header names; a file with only some columns updates the rows it names, after a preview of every change.";
    wrap.append(setNameControl, hint, side);
    return wrap;
  })(),
);

// ── Results ─────────────────────────────────────────────────────────────────────────────────
const t = (kg: number) => fmt.one(kg / 1000);
const perM2 = (x: number | undefined) => (x === undefined ? "–" : fmt.int(x));

/** Where each scheme's counted carbon per m² stands against the bands of the settings' basis. */
function bandLines(results: readonly SchemeCarbonResult[], s: CarbonSettings): string[] {
  const list = (s.benchmarks ?? []).filter((b) => b.basis === s.areaBasis);
  if (list.length === 0) return [];
  return results.flatMap((r) => {
    const value = r.carbon?.perM2.perM2?.counted;
    if (value === undefined) return [];
    const inside = list.filter((b) => value >= b.fromKgCO2ePerM2 && value < b.toKgCO2ePerM2).map((b) => `"${b.label}"`);
    return [`${r.label}: ${fmt.int(value)} kgCO2e/m² of ${s.areaBasis.replace("-", " ")} — ${inside.length > 0 ? `in ${inside.join(" and ")}` : "outside every band"}.`];
  });
}

reactiveCell(main, { id: "carbon-table", title: "Embodied carbon per scheme" }, () => {
  if (designed.results.value === null) return DESIGNING;
  const results = carbonBySchemes.value;
  if (results.length === 0) return "No scheme is registered or enabled yet, so there is no take-off to assess.";
  const s = assessedCarbon.value.settings;
  const table = tableElement(
    ["Scheme", "Mass (t)", "A1–A3 (tCO2e)", "A4", "A5", "C1–C4", `Counted (tCO2e)`, "kgCO2e/m² usable floor", "kgCO2e/m² plan", "Module D (tCO2e, apart)", "Biogenic stored (tCO2, apart)"],
    results.map((r) => {
      if (!r.carbon) return [r.label, r.error || r.reason, "", "", "", "", "", "", "", "", ""];
      const c = r.carbon;
      const mass = c.rows.reduce((sum, row) => sum + row.massKg, 0);
      return [r.label, t(mass), t(c.totals.a1a3), s.countA4 ? t(c.totals.a4) : "not counted", s.countA5 ? t(c.totals.a5) : "not counted", s.countC ? t(c.totals.c) : "not counted", t(c.totals.counted), perM2(c.perM2UsableFloor.perM2?.counted), perM2(c.perM2Plan.perM2?.counted), t(c.totals.moduleD), t(c.totals.biogenic)];
    }),
    {
      caption: `Counted = ${results.find((r) => r.carbon)?.carbon?.modulesCounted.join(" + ") ?? "A1–A3"}; masses include the ${s.quantityAllowancePct} % quantity allowance. Module D and biogenic storage are shown apart, never netted.`,
      numeric: [false, true, true, true, true, true, true, true, true, true, true],
    },
  );
  const gaps = gapNotice(tableGaps(designs.value, { factors: assessedCarbon.value.factors }), "carbon-gaps");
  const notes = document.createElement("div");
  notes.className = "warnings";
  const lines: string[] = bandLines(results, s);
  for (const r of results) {
    for (const w of r.carbon?.warnings ?? []) lines.push(`${r.label}: ${w}`);
  }
  notes.textContent = lines.join("\n");
  notes.style.whiteSpace = "pre-wrap";
  const wrap = document.createElement("div");
  if (gaps) wrap.append(gaps);
  wrap.append(table, notes);
  return wrap;
});

// ── The last edit, before → after ────────────────────────────────────────────────────────────
const lastEdit = trackCarbonEdits(computed(() => (designed.results.value === null ? null : { carbon: assessedCarbon.value, schemes: carbonBySchemes.value.map((r) => ({ id: r.id, label: r.label, carbon: r.carbon })) })));
reactiveCell(main, { id: "last-edit", title: "What the last edit did" }, () => {
  const edit = lastEdit.value;
  if (!edit) return "Edit a factor or a setting: each scheme's carbon before and after the edit is shown here.";
  const wrap = document.createElement("div");
  const what = document.createElement("p");
  what.id = "last-edit-what";
  what.textContent = `Last edit: ${edit.what}.`;
  const table = tableElement(
    ["Scheme", "Before (kgCO2e/m² usable floor)", "After", "Change", "Before (tCO2e)", "After (tCO2e)"],
    edit.schemes.map((e) => [e.label, perM2(e.beforePerM2 ?? undefined), perM2(e.afterPerM2 ?? undefined), e.beforePerM2 && e.afterPerM2 !== null ? `${e.afterPerM2 >= e.beforePerM2 ? "+" : "−"}${fmt.one(Math.abs((100 * (e.afterPerM2 - e.beforePerM2)) / e.beforePerM2))} %` : "–", e.beforeT === null ? "–" : fmt.sig3(e.beforeT), e.afterT === null ? "–" : fmt.sig3(e.afterT)]),
    { caption: "Counted embodied carbon of every scheme just before and just after the last edit on this page", numeric: [false, true, true, true, true, true] },
  );
  table.id = "last-edit-table";
  wrap.append(what, table);
  return wrap;
});

const metric = signal<CarbonMetric>("per-m2-floor");
const metricBinding: Binding<string> = { value: metric, set: (next) => (metric.value = next as CarbonMetric) };

// ── Per structural element ───────────────────────────────────────────────────────────────────
reactiveCell(main, { id: "carbon-elements", title: "Carbon per structural element" }, () => {
  const results = carbonBySchemes.value.filter((r) => r.carbon);
  if (results.length === 0) return null;
  const wrap = document.createElement("div");
  wrap.className = "element-tables";
  for (const r of results) {
    const c = r.carbon as CarbonAssessment;
    const floor = c.perM2UsableFloor.areaM2;
    wrap.append(
      tableElement(
        ["Element", "Mass (t)", "Counted (tCO2e)", "kgCO2e/m² usable floor", "Share"],
        [...c.byElement].sort((a, b) => b.totals.counted - a.totals.counted).map((g) => [g.key, t(g.massKg), t(g.totals.counted), floor > 0 ? fmt.int(g.totals.counted / floor) : "–", c.totals.counted > 0 ? fmt.pct(g.totals.counted / c.totals.counted) : "–"]),
        { caption: `${r.label}: counted carbon by element, largest first`, numeric: [false, true, true, true, true] },
      ),
    );
  }
  return wrap;
});

staticCell(main, { id: "chart-controls", title: "Charts" }, selectControl(metricBinding, { label: "Show", id: "carbonMetric", choices: CARBON_METRICS.map((m) => ({ value: m.value, label: m.label })) }));

function chartInput(by: "module" | "material") {
  const schemes: SchemeCarbon[] = carbonBySchemes.value.flatMap((r) => (r.carbon ? [{ id: r.id, label: r.label, carbon: r.carbon }] : []));
  const s = assessedCarbon.value.settings;
  const bandNote = (s.benchmarks ?? []).length > 0 ? " · shaded: benchmark bands of this basis" : "";
  return {
    schemes,
    by,
    metric: metric.value,
    bands: s.benchmarks ?? [],
    title: by === "module" ? "Embodied carbon of each scheme by life-cycle module" : "Embodied carbon of each scheme by material",
    caption: chartCaption(shown.value, `counted ${schemes[0]?.carbon.modulesCounted.join(" + ") ?? "A1–A3"}, ${s.quantityAllowancePct} % quantity allowance${bandNote}`),
  };
}

reactiveCell(main, { id: "chart-module" }, () => {
  if (designed.results.value === null) return DESIGNING;
  const input = chartInput("module");
  if (input.schemes.length === 0) return "No scheme has a carbon result to chart.";
  return chartFigure(carbonChartOptions(input), "carbon-by-module");
});
reactiveCell(main, { id: "chart-material" }, () => {
  const input = chartInput("material");
  if (input.schemes.length === 0) return null;
  return chartFigure(carbonChartOptions(input), "carbon-by-material");
});
reactiveCell(main, { id: "chart-element" }, () => {
  const input = chartInput("material");
  if (input.schemes.length === 0) return null;
  return chartFigure(carbonByElementChartOptions({ ...input, title: "Embodied carbon of each scheme by structural element", caption: input.caption }), "carbon-by-element");
});
reactiveCell(main, { id: "chart-apart" }, () => {
  const input = chartInput("module");
  if (input.schemes.length === 0) return null;
  return chartFigure(
    carbonApartChartOptions({ ...input, title: "Reported apart, never netted: module D and biogenic CO2 stored", caption: chartCaption(shown.value, "module D (kgCO2e) below 0 is a benefit beyond the life cycle (recycling, reuse); biogenic CO2 (kg CO2, EN 16449) is held in the timber while it lasts") }),
    "carbon-apart",
  );
});

// While newer designs are on their way the results say so (after the cells exist).
designStateMarks(store, designed, ["carbon-table", "last-edit", "carbon-elements", "chart-module", "chart-material", "chart-element", "chart-apart"]);

staticCell(
  main,
  { id: "method", title: "Method" },
  "Embodied carbon by EN 15978 module as set out in IStructE, How to calculate embodied carbon, 2nd ed. (2022), followed from memory: A1–A3 = mass × factor; A4 = mass × Σ(distance × mode factor per t·km); A5 wastage = mass × WF × (A1–A3 + A4 + C factors) with WF = 1/(1 − WR) − 1, the wasted mass counted once, in A5; C1–C4 = mass × end-of-life factor; module D and biogenic CO2 stored (EN 16449: (44/12) · 0.5 · ρV / (1 + ω/100)) reported apart. A5 site activities (plant and energy) are not included. The bundled factors are a small set of cited defaults, most recalled from memory: replace them with the EPDs of the products you will buy.",
);
