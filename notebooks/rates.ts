// Rates page: the unit-rate table and the on-costs, edited in place, and the cost of every scheme
// per element and per m² of usable floor.
import "../src/notebook/style.css";
import demoStudy from "../data/demo-study.json";
import * as v from "valibot";
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
  toggleControl,
  textControl,
  controlGroup,
  tableEditor,
  gapNotice,
  missingRateRows,
  workerStudySignals,
  designStateMarks,
  resultsStudy,
  type Binding,
  type EditorColumn,
} from "../src/notebook";
import { setIn } from "../src/study";
import { tableGaps } from "../src/pipeline";
import { rebaseRateRows, RebaseRangeError, MAX_RATE, defaultRateRows, parseRateCsv, rateRowsToCsv, RateRowSchema, OnCostsSchema, CONCEPT_SCREENING, DEFAULT_RATE_SET_NAME, type CostAssessment, type OnCosts, type RateRow } from "../src/cost";
import { costChartOptions, chartCaption, type SchemeCost } from "../src/charts";

const { store, main } = startPage({
  id: "rates",
  demoStudy,
  intro: `Edit the unit rates (with their low and high ends) and the on-costs — preliminaries, overheads and profit, design fees, risk, inflation, location factor — and see every scheme's cost per element and per m² of usable floor. Every cost is a ${CONCEPT_SCREENING.label} estimate.`,
});

const rates = computed(() => store.study.value.cost.rates);
const onCosts = computed(() => store.study.value.cost.onCosts);
// Designs run in workers (issue 11: this page carries no design code); the results move together,
// all designed and assessed with the same tables, which `assessedCost` names.
const designed = workerStudySignals(store);
const results = computed(() => designed.results.value ?? []);
/** The study as the shown results were designed (its brief and tables), for captions. */
const shown = resultsStudy(store, designed);
const assessedCost = computed(() => designed.resultsTables.value.cost);
const DESIGNING = "Designing the schemes…";
/** The enabled schemes' designs (for the gap notices and the import check), from the shared per-scheme signals. */
const designs = computed(() => results.value.map(({ id, label, design }) => ({ id, label, design })));

type SchemeCostResult = { id: string; label: string; cost: CostAssessment | null; error: string };
/** Each scheme's cost as the shared per-scheme signals assessed it: a rate edit re-prices, never re-designs, and the page runs no assessment of its own. */
const costBySchemes = computed<SchemeCostResult[]>(() =>
  results.value.map(({ id, label, design, cost, error }) => ({ id, label, cost, error: cost ? "" : error || (design.feasible ? "no take-off" : design.reason) })),
);

// ── On-costs ────────────────────────────────────────────────────────────────────────────────
const path = ["cost", "onCosts"] as const;
const pct = (field: keyof OnCosts, label: string, max: number, hint: string, min = 0) =>
  numberControl(store.bind<number>([...path, field]), { label, unit: "%", min, max, step: 0.5, id: field, hint });

/** A text field checked by one field of the on-costs schema; an invalid value is not applied. */
function textField(field: "priceBase" | "currency" | "rateSetName", label: string, hint: string, size?: number): HTMLElement {
  return textControl(store.bind<string>([...path, field]), {
    id: field,
    label,
    hint,
    ...(size ? { size } : {}),
    check: (raw) => {
      if (field === "rateSetName" && raw === "") return "empty (expected a name for the rate set)";
      const result = v.safeParse(OnCostsSchema.entries[field], raw);
      return result.success ? null : (result.issues[0]?.message ?? "invalid");
    },
  });
}

staticCell(
  main,
  { id: "on-costs", title: "On-costs" },
  (() => {
    const grid = document.createElement("div");
    grid.className = "grid";
    grid.append(
      controlGroup("Added in this order, each on the subtotal before it", [
        pct("preliminariesPct", "1. Main contractor's preliminaries", 50, "% of works (15 %: common practice, no source)"),
        pct("overheadsProfitPct", "2. Overheads and profit", 50, "% of works + preliminaries (6 %: common practice, no source)"),
        pct("designFeesPct", "3. Project and design team fees", 50, "% of the subtotal (10 %: common practice, no source)"),
        pct("riskPct", "4. Risk allowance", 100, "% of the subtotal (15 %: common practice, no source)"),
        pct("inflationPct", "5. Inflation to the construction mid-point", 100, "% of the subtotal; set it for the programme", -20),
      ]),
      controlGroup("Location and price base", [
        numberControl(store.bind<number>([...path, "locationFactor"]), { label: "Location factor", unit: "×", min: 0.2, max: 5, step: 0.01, id: "locationFactor", hint: "Multiplies every rate (1 = the rate table's location)." }),
        textField("priceBase", "Price base (YYYY-MM)", "The date the rates are priced at."),
        textField("currency", "Currency (ISO 4217 code)", "Labels every cost; rates are not converted."),
      ]),
      controlGroup("Provenance", [textField("rateSetName", "Rate set name (shown in captions and records)", "An import names the set after its file and the date; edit it to say where the rates come from.", 40)]),
    );
    return grid;
  })(),
);

// ── Rate table ──────────────────────────────────────────────────────────────────────────────
const columns: EditorColumn<RateRow>[] = [
  { field: "item", label: "Item", kind: "text", readOnly: true },
  { field: "label", label: "Label", kind: "text", wide: true },
  { field: "unit", label: "Unit", kind: "text", readOnly: true, show: (r) => fmt.unit(r.unit) },
  // the study's currency in the heading, read as the table draws (a signal), so it follows an edit of the currency
  { field: "rate", label: "Rate", kind: "number", get unit() { return `${onCosts.value.currency} per unit`; } },
  { field: "low", label: "Low", kind: "number", get unit() { return `${onCosts.value.currency} per unit`; } },
  { field: "high", label: "High", kind: "number", get unit() { return `${onCosts.value.currency} per unit`; } },
  { field: "basis", label: "Includes", kind: "text", wide: true },
  { field: "source", label: "Source", kind: "text", wide: true },
  { field: "notes", label: "Notes", kind: "text", wide: true },
];

staticCell(
  main,
  { id: "rates", title: "Unit rates" },
  (() => {
    const wrap = document.createElement("div");
    const note = document.createElement("p");
    note.className = "control-hint";
    note.textContent = "The bundled rates are plausible invented figures for demonstration, not market data: replace them with current local rates. Items and their units are fixed by the take-off.";
    wrap.append(
      note,
      tableEditor<RateRow>({
        id: "rates",
        rowNoun: "item",
        rows: rates,
        setRows(next) {
          store.study.value = setIn(store.study.value, ["cost", "rates"], next);
        },
        defaults: defaultRateRows,
        keyField: "item",
        columns,
        schema: RateRowSchema,
        parseCsv: parseRateCsv,
        toCsv: rateRowsToCsv,
        csvFilename: "cost-rates.csv",
        missingFor: missingRateRows(() => designs.peek()),
        setName: {
          current: () => onCosts.peek().rateSetName ?? DEFAULT_RATE_SET_NAME,
          defaultName: DEFAULT_RATE_SET_NAME,
          apply(rows, name) {
            store.study.value = setIn(setIn(store.study.value, ["cost", "rates"], rows), [...path, "rateSetName"], name);
          },
        },
      }),
    );
    return wrap;
  })(),
);

// ── Rebase to another price date ──────────────────────────────────────────────────────────
staticCell(
  main,
  { id: "rebase", title: "Move every rate to another price date" },
  (() => {
    const from = signal(100);
    const to = signal(100);
    const month = signal(onCosts.peek().priceBase);
    const wrap = document.createElement("div");
    const result = document.createElement("div");
    result.id = "rebase-status";
    result.setAttribute("aria-live", "polite");
    const apply = document.createElement("button");
    apply.type = "button";
    apply.id = "rebase-apply";
    apply.textContent = "Rebase every rate";
    apply.addEventListener("click", () => {
      const checked = v.safeParse(OnCostsSchema.entries.priceBase, month.peek());
      if (!checked.success) {
        result.className = "control-message";
        result.textContent = `new price base: ${checked.issues[0]?.message ?? "invalid"}`;
        return;
      }
      let rebased: RateRow[];
      try {
        rebased = rebaseRateRows(rates.peek(), from.peek(), to.peek());
      } catch (error) {
        result.className = "control-message";
        result.setAttribute("role", "alert");
        const why = error instanceof RebaseRangeError ? `× ${fmt.two(error.ratio)} would put ${error.item}'s high rate at ${fmt.int(error.rebased)} per unit, above the largest rate allowed (${fmt.int(MAX_RATE)}); the ratio may be at most ${fmt.two(error.maxRatio)}` : error instanceof Error ? error.message : String(error);
        result.textContent = `Not rebased; nothing changed: ${why}. Check "Index at the rates' price base" and "Index at the new date".`;
        return;
      }
      result.removeAttribute("role");
      let next = setIn(store.study.value, ["cost", "rates"], rebased);
      next = setIn(next, [...path, "priceBase"], checked.output);
      store.study.value = next;
      result.className = "control-hint";
      result.textContent = `Every rate × ${fmt.two(to.peek() / from.peek())}; price base now ${checked.output}.`;
    });
    const monthInput = document.createElement("input");
    monthInput.type = "text";
    monthInput.id = "rebase-month";
    monthInput.size = 8;
    monthInput.value = month.peek();
    monthInput.addEventListener("input", () => (month.value = monthInput.value.trim()));
    const monthLabel = document.createElement("label");
    monthLabel.htmlFor = monthInput.id;
    monthLabel.textContent = "New price base (YYYY-MM)";
    const monthWrap = document.createElement("div");
    monthWrap.className = "control";
    monthWrap.append(monthLabel, monthInput);
    wrap.append(
      controlGroup("Price index (any published construction price index, same series at both dates)", [
        numberControl({ value: from, set: (x) => (from.value = x) }, { label: "Index at the rates' price base", unit: "", min: 0.001, max: 1e6, step: 0.1, id: "rebase-from" }),
        numberControl({ value: to, set: (x) => (to.value = x) }, { label: "Index at the new date", unit: "", min: 0.001, max: 1e6, step: 0.1, id: "rebase-to" }),
        monthWrap,
      ]),
      apply,
      result,
    );
    return wrap;
  })(),
);

// ── Results ─────────────────────────────────────────────────────────────────────────────────
const money = (x: number) => fmt.int(x);

reactiveCell(main, { id: "cost-table", title: "Cost per scheme" }, () => {
  if (designed.results.value === null) return DESIGNING;
  const results = costBySchemes.value;
  if (results.length === 0) return "No scheme is registered or enabled yet, so there is no take-off to price.";
  const o = assessedCost.value.onCosts;
  const table = tableElement(
    ["Scheme", `Works (${o.currency})`, "Prelims", "OH&P", "Fees", "Risk", "Inflation", `Total (${o.currency})`, `Low–high (${o.currency})`, `${o.currency}/m² usable floor`, `${o.currency}/m² plan`],
    results.map((r) => {
      if (!r.cost) return [r.label, r.error, "", "", "", "", "", "", "", "", ""];
      const c = r.cost;
      return [
        r.label,
        money(c.totals.works),
        ...c.onCostLines.map((l) => money(l.amount)),
        money(c.totals.total),
        `${money(c.totals.totalLow)} – ${money(c.totals.totalHigh)}`,
        c.perM2UsableFloor ? money(c.perM2UsableFloor.total) : "–",
        c.perM2Plan ? money(c.perM2Plan.total) : "–",
      ];
    }),
    {
      caption: `${CONCEPT_SCREENING.label} (${CONCEPT_SCREENING.source}). Rates: ${o.rateSetName ?? DEFAULT_RATE_SET_NAME}. Price base ${o.priceBase}, location factor ${o.locationFactor}. Low–high uses the low and high rates with the same on-costs; it is not the estimate class's range.`,
      numeric: [false, true, true, true, true, true, true, true, true, true, true],
    },
  );
  const gaps = gapNotice(tableGaps(designs.value, { rates: assessedCost.value.rates }), "cost-gaps");
  if (!gaps) return table;
  const wrap = document.createElement("div");
  wrap.append(gaps, table);
  return wrap;
});

reactiveCell(main, { id: "cost-elements", title: "Cost per element" }, () => {
  const results = costBySchemes.value.filter((r) => r.cost);
  if (results.length === 0) return null;
  const wrap = document.createElement("div");
  wrap.className = "grid";
  for (const r of results) {
    const c = r.cost as CostAssessment;
    wrap.append(
      tableElement(
        ["Element", `Cost (${c.currency})`, `${c.currency}/m² usable floor`],
        c.byElement.map((g) => [g.key, money(g.cost), c.areas.usableFloorM2 > 0 ? money(g.cost / c.areas.usableFloorM2) : "–"]),
        { caption: `${r.label}: works by element (location factor applied, before on-costs)`, numeric: [false, true, true] },
      ),
    );
  }
  return wrap;
});

const perM2 = signal(true);
const perM2Binding: Binding<boolean> = { value: perM2, set: (next) => (perM2.value = next) };
staticCell(main, { id: "cost-chart-controls", title: "Chart" }, toggleControl(perM2Binding, { label: "Per m² of usable floor (off: whole roof)", id: "costPerM2" }));

reactiveCell(main, { id: "cost-chart" }, () => {
  const schemes: SchemeCost[] = costBySchemes.value.flatMap((r) => (r.cost ? [{ id: r.id, label: r.label, cost: r.cost }] : []));
  if (designed.results.value === null) return DESIGNING;
  if (schemes.length === 0) return "No scheme has a cost to chart.";
  const o = assessedCost.value.onCosts;
  return chartFigure(
    costChartOptions({
      schemes,
      perM2Floor: perM2.value,
      title: perM2.value ? "Cost of each scheme per m² of usable floor, by element" : "Cost of each scheme, by element",
      caption: chartCaption(shown.value, `${CONCEPT_SCREENING.label}; price base ${o.priceBase}, ${o.currency}, location factor ${o.locationFactor}; whiskers: low and high rates`),
    }),
    perM2.value ? "cost-per-m2" : "cost-total",
  );
});

// While newer designs are on their way the results say so (after the cells exist).
designStateMarks(store, designed, ["cost-table", "cost-elements", "cost-chart"]);

staticCell(
  main,
  { id: "method", title: "Method" },
  "Elemental order-of-cost estimate: each take-off row costs quantity × unit rate × location factor, its unit checked against the rate's; the on-costs then compound in the order works → preliminaries → overheads and profit → design fees → risk → inflation, each a percentage of the subtotal before it (the order of RICS NRM 1, from memory). Rates can be moved between price dates with a price index (rate × new index / old index). Foundations beyond the listed anchors, services, fit-out and VAT are not included.",
);
