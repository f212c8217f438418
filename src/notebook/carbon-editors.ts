// The carbon page's editors beyond the plain cell: the factor table's columns grouped by
// life-cycle stage (transport as named legs, wastage with the factor it implies, provenance at the
// end), the provenance card that follows the row being edited, a group edit (every steel row at
// once) and the benchmark bands. Each edit goes through the same row schema as a cell edit.
import { h, render, type ComponentChild } from "preact";
import { computed, effect, signal, type ReadonlySignal, type Signal } from "@preact/signals-core";
import type { Study } from "../study";
import { FACTOR_LIMITS, FactorRowSchema, BenchmarkBandSchema, MAX_BENCHMARK_BANDS, groupEditRows, provenanceOf, wasteFactor, transportFactorKgCO2ePerKg, type BenchmarkBand, type CarbonAssessment, type CarbonSettings, type FactorRow } from "../carbon";
import { MATERIALS, materialInfo, type MaterialKind } from "../materials";
import { mountEditableTable, type EditOutcome } from "./editable-table";
import type { EditorColumn } from "./table-editor";
import { AREA_BASES } from "../carbon";
import * as v from "valibot";

const L = FACTOR_LIMITS;
const sig = (x: number) => String(Number(x.toPrecision(3)));

/** The factor table's columns, grouped by life-cycle stage. */
export function factorColumns(settings: ReadonlySignal<CarbonSettings>): EditorColumn<FactorRow>[] {
  const modeFactor = (mode: "road" | "sea") => settings.value.transportModes.find((m) => m.mode === mode)?.kgCO2ePerTonneKm ?? 0;
  return [
    { field: "material", label: "Material", kind: "text", readOnly: true, group: "Material" },
    { field: "label", label: "Label", kind: "text", group: "Material" },
    { field: "a1a3KgCO2ePerKg", label: "A1–A3", kind: "number", unit: L.a1a3KgCO2ePerKg.unit, group: "Product (A1–A3)" },
    { field: "densityKgPerM3", label: "Density", kind: "number", unit: L.densityKgPerM3.unit, group: "Product (A1–A3)" },
    { field: "transportKmRoad", label: "Road leg", kind: "number", unit: "km", group: "Transport to site (A4), by leg", hint: "Distance by road from the factory gate to site" },
    { field: "transportKmSea", label: "Sea leg", kind: "number", unit: "km", group: "Transport to site (A4), by leg", hint: "Distance by sea" },
    {
      field: "a4PerKg",
      label: "A4 it gives",
      unit: "kgCO2e/kg",
      kind: "computed",
      group: "Transport to site (A4), by leg",
      show: (r) => sig(transportFactorKgCO2ePerKg([{ mode: "road", distanceKm: r.transportKmRoad }, { mode: "sea", distanceKm: r.transportKmSea }], settings.value.transportModes)),
      hint: `Road km × ${modeFactor("road")} + sea km × ${modeFactor("sea")} kgCO2e/t·km, ÷ 1000`,
    },
    { field: "wasteRatePct", label: "Waste rate", kind: "number", unit: "%", group: "Site wastage (A5)", hint: "Share of the material delivered that is wasted on site" },
    { field: "wasteFactor", label: "Extra bought", kind: "computed", group: "Site wastage (A5)", show: (r) => `× ${sig(wasteFactor(r.wasteRatePct))} (${sig(100 * wasteFactor(r.wasteRatePct))} %)`, hint: "Wastage factor w ÷ (1 − w): extra material bought per kg built in" },
    { field: "endOfLifeKgCO2ePerKg", label: "C1–C4", kind: "number", unit: L.endOfLifeKgCO2ePerKg.unit, group: "End of life (C1–C4)" },
    { field: "moduleDKgCO2ePerKg", label: "Module D", kind: "number", unit: L.moduleDKgCO2ePerKg.unit, group: "Reported apart" },
    { field: "biogenicKgCO2ePerKg", label: "Biogenic stored", kind: "number", unit: L.biogenicKgCO2ePerKg.unit, group: "Reported apart" },
    {
      field: "provenance",
      label: "Backed by",
      kind: "computed",
      group: "Provenance",
      content: (r) => {
        const verdict = provenanceOf(r);
        const words = { cited: "cited source", differs: "differs from source", unsupported: "no source" }[verdict.status];
        return h("span", { class: `provenance-badge ${verdict.status}` }, words);
      },
    },
    { field: "source", label: "Source", kind: "text", wide: true, group: "Provenance" },
    { field: "notes", label: "Notes", kind: "text", wide: true, group: "Provenance" },
  ];
}

function CardLine(props: { term: string; text: string }): ComponentChild {
  return [h("dt", null, props.term), h("dd", null, props.text)];
}

function ProvenanceCard(props: { selected: Signal<string | null>; factors: ReadonlySignal<readonly FactorRow[]> }): ComponentChild {
  const key = props.selected.value;
  const row = props.factors.value.find((r) => r.material === key) ?? props.factors.value[0];
  if (!row) return h("p", null, "No factor rows.");
  const verdict = provenanceOf(row);
  const p = verdict.provenance;
  return h(
    "div",
    { class: `provenance-card ${verdict.status}`, id: "provenance-card", "aria-live": "polite" },
    h("h3", null, `Where ${row.label}'s factor comes from`),
    h("p", { class: "verdict" }, verdict.text),
    p
      ? h(
          "dl",
          null,
          h(CardLine, { term: "Source", text: p.source }),
          h(CardLine, { term: "Dataset and version", text: p.dataset }),
          h(CardLine, { term: "Table or row", text: p.row }),
          h(CardLine, { term: "Declared unit", text: p.declaredUnit }),
          h(CardLine, { term: "Valid for", text: p.validity }),
          h(CardLine, { term: "Geography", text: p.geography }),
          ...(p.citedModuleDKgCO2ePerKg !== null ? [h(CardLine, { term: "Module D cited", text: `${p.citedModuleDKgCO2ePerKg} kgCO2e/kg (table: ${row.moduleDKgCO2ePerKg})` })] : []),
          ...(p.spread ? [h(CardLine, { term: "Spread", text: p.spread })] : []),
        )
      : null,
    h("p", { class: "row-source" }, `The row's own source: ${row.source}`),
  );
}

/** The provenance card of the selected row (the first row until one is focused). */
export function provenanceCard(selected: Signal<string | null>, factors: ReadonlySignal<readonly FactorRow[]>): HTMLElement {
  const holder = document.createElement("aside");
  holder.className = "provenance-aside";
  holder.setAttribute("aria-label", "Provenance of the selected factor");
  render(h(ProvenanceCard as (p: unknown) => ComponentChild, { selected, factors }), holder);
  return holder;
}

const KIND_WORDS: Record<MaterialKind, string> = { steel: "steel", cable: "cable", fabric: "fabric and foil", cladding: "cladding", concrete: "concrete", rebar: "reinforcement", timber: "timber" };
const GROUP_FIELDS = ["a1a3KgCO2ePerKg", "transportKmRoad", "transportKmSea", "wasteRatePct", "endOfLifeKgCO2ePerKg", "moduleDKgCO2ePerKg"] as const;
const FIELD_WORDS: Record<(typeof GROUP_FIELDS)[number], string> = { a1a3KgCO2ePerKg: "A1–A3", transportKmRoad: "road leg (km)", transportKmSea: "sea leg (km)", wasteRatePct: "waste rate (%)", endOfLifeKgCO2ePerKg: "C1–C4", moduleDKgCO2ePerKg: "module D" };

function labelled(text: string, control: HTMLElement): HTMLLabelElement {
  const label = document.createElement("label");
  label.append(text, control);
  return label;
}

function select(id: string, choices: readonly [string, string][]): HTMLSelectElement {
  const el = document.createElement("select");
  el.id = id;
  for (const [value, text] of choices) el.append(new Option(text, value));
  return el;
}

/** Rows of a kind (by the bundled materials' kinds), or every row. */
function keysOf(rows: readonly FactorRow[], kind: string): string[] {
  return rows.filter((r) => kind === "all" || materialInfo(r.material)?.kind === kind).map((r) => r.material);
}

/** "Change every steel row at once": a kind, a field, × a factor or = a value; checked row by row, all or nothing. */
export function groupEditTools(rows: ReadonlySignal<readonly FactorRow[]>, setRows: (next: FactorRow[]) => void): HTMLElement {
  const box = document.createElement("fieldset");
  box.className = "group-edit";
  const legend = document.createElement("legend");
  legend.textContent = "Change many rows at once";
  const kinds = [...new Set(MATERIALS.map((m) => m.kind))];
  const kind = select("group-kind", [...kinds.map((k): [string, string] => [k, `every ${KIND_WORDS[k]} row`]), ["all", "every row"]]);
  const field = select("group-field", GROUP_FIELDS.map((f): [string, string] => [f, FIELD_WORDS[f]]));
  const op = select("group-op", [["times", "× (multiply by)"], ["set", "= (set to)"]]);
  const value = document.createElement("input");
  value.type = "text";
  value.id = "group-value";
  value.inputMode = "decimal";
  value.size = 8;
  value.value = "1";
  const apply = document.createElement("button");
  apply.type = "button";
  apply.id = "group-apply";
  apply.textContent = "Apply to those rows";
  const status = document.createElement("div");
  status.id = "group-status";
  status.setAttribute("aria-live", "polite");
  apply.addEventListener("click", () => {
    const keys = keysOf(rows.peek(), kind.value);
    const number = Number(value.value.trim().replace(",", "."));
    const result = groupEditRows(rows.peek(), "material", FactorRowSchema as v.GenericSchema<unknown, FactorRow>, { keys, field: field.value, op: op.value as "times" | "set", value: value.value.trim() === "" ? Number.NaN : number });
    if (!result.ok) {
      status.className = "import-problems";
      status.textContent = `Nothing changed: ${result.problems.join("; ")}`;
      return;
    }
    setRows(result.rows);
    status.className = "import-ok";
    status.textContent = result.changes.length === 0 ? "Nothing to change: those rows already hold that." : `${FIELD_WORDS[field.value as (typeof GROUP_FIELDS)[number]]}: ${result.changes.map((c) => `${c.key} ${c.from} → ${c.to}`).join(", ")}.`;
  });
  box.append(legend, labelled("Rows ", kind), labelled("Field ", field), labelled("", op), labelled("Value ", value), apply, status);
  return box;
}

type BandRow = BenchmarkBand & { key: string };

/** The benchmark bands as an editable table: each edit checked by the band schema; add and remove. */
export function benchmarkEditor(bands: ReadonlySignal<readonly BenchmarkBand[]>, setBands: (next: BenchmarkBand[]) => void): HTMLElement {
  const wrap = document.createElement("div");
  wrap.className = "table-editor benchmark-editor";
  const rows = computed<BandRow[]>(() => bands.value.map((b, i) => ({ ...b, key: String(i + 1) })));
  const edit = (key: string, field: string, text: string): EditOutcome => {
    const index = Number(key) - 1;
    const current = bands.peek()[index];
    if (!current) return { ok: false, message: "this band is gone" };
    const raw = field === "label" || field === "basis" ? text : text.trim() === "" ? Number.NaN : Number(text.trim().replace(",", "."));
    const result = v.safeParse(BenchmarkBandSchema, { ...current, [field]: raw });
    if (!result.success) return { ok: false, message: result.issues[0]?.message ?? "invalid" };
    setBands(bands.peek().map((b, i) => (i === index ? result.output : b)));
    return { ok: true, value: result.output[field as keyof BenchmarkBand] };
  };
  const holder = document.createElement("div");
  mountEditableTable<BandRow>(holder, {
    tableId: "benchmarks-table",
    caption: "Benchmark bands, drawn on the per-m² charts of their own area basis. A band names a range the consultant or client uses (e.g. a rating's band).",
    rows,
    keyOf: (r) => r.key,
    columns: [
      { field: "label", label: "Band", kind: "text" },
      { field: "fromKgCO2ePerM2", label: "From", unit: "kgCO2e/m²", kind: "number", commit: "change" },
      { field: "toKgCO2ePerM2", label: "To", unit: "kgCO2e/m²", kind: "number", commit: "change" },
      { field: "basis", label: "Per m² of", kind: "select", choices: AREA_BASES.map((b) => ({ value: b, label: b.replace("-", " ") })) },
    ],
    cellId: (key, _i, field) => `band-${key}-${field}`,
    cellLabel: (r, c) => `${c.label} of band ${r.key}`,
    edit,
    messages: "cell",
    rowAttributes: (key) => ({ "data-key": key }),
    rowTools: ({ key }) => h("td", null, h("button", { type: "button", "aria-label": `Remove band ${key}`, onClick: () => setBands(bands.peek().filter((_, i) => i !== Number(key) - 1)) }, "Remove")),
  });
  const add = document.createElement("button");
  add.type = "button";
  add.id = "band-add";
  add.textContent = "Add a band";
  add.addEventListener("click", () => {
    const list = bands.peek();
    if (list.length >= MAX_BENCHMARK_BANDS) return;
    const top = list.reduce((m, b) => Math.max(m, b.toKgCO2ePerM2), 0);
    setBands([...list, { label: `band ${list.length + 1}`, fromKgCO2ePerM2: top, toKgCO2ePerM2: top + 100, basis: "usable-floor" }]);
  });
  wrap.append(holder, add);
  return wrap;
}

/** One scheme's counted carbon just before and just after the last edit. */
export type EditEffect = { id: string; label: string; beforePerM2: number | null; afterPerM2: number | null; beforeT: number | null; afterT: number | null };
export type LastEdit = { what: string; schemes: EditEffect[] };
type CarbonOfScheme = { id: string; label: string; carbon: CarbonAssessment | null };

const show = (x: unknown) => (typeof x === "string" ? JSON.stringify(x.length > 40 ? `${x.slice(0, 39)}…` : x) : Array.isArray(x) ? `${x.length} item${x.length === 1 ? "" : "s"}` : String(x));

/** A factor row's fields and the settings in the page's words, with their units (audit8: the last edit read "steel-plate a1a3KgCO2ePerKg"). */
const EDIT_WORDS: Record<string, string> = {
  label: "label",
  a1a3KgCO2ePerKg: `A1–A3 (${L.a1a3KgCO2ePerKg.unit})`,
  densityKgPerM3: `density (${L.densityKgPerM3.unit})`,
  transportKmRoad: "road leg (km)",
  transportKmSea: "sea leg (km)",
  wasteRatePct: "waste rate (%)",
  endOfLifeKgCO2ePerKg: `C1–C4 (${L.endOfLifeKgCO2ePerKg.unit})`,
  moduleDKgCO2ePerKg: `module D (${L.moduleDKgCO2ePerKg.unit})`,
  biogenicKgCO2ePerKg: `biogenic stored (${L.biogenicKgCO2ePerKg.unit})`,
  source: "source",
  notes: "notes",
  countA4: "count A4 (transport to site)",
  countA5: "count A5 (site wastage)",
  countC: "count C1–C4 (end of life)",
  areaBasis: "per-m² basis of the results",
  quantityAllowancePct: "quantity allowance (%)",
  transportModes: "transport modes",
  factorSetName: "factor set name",
  benchmarks: "benchmark bands",
};
const words = (field: string) => EDIT_WORDS[field] ?? field;

/** The last edit of the carbon tables in words: which rows and fields changed, old → new (at most three, then a count). */
export function describeCarbonEdit(before: Study["carbon"], after: Study["carbon"]): string {
  const lines: string[] = [];
  const old = new Map(before.factors.map((r) => [r.material, r]));
  for (const row of after.factors) {
    const was = old.get(row.material);
    if (!was) lines.push(`${row.label} added`);
    else for (const [field, value] of Object.entries(row)) if (!Object.is(value, (was as Record<string, unknown>)[field])) lines.push(`${was.label}: ${words(field)} ${show((was as Record<string, unknown>)[field])} → ${show(value)}`);
  }
  for (const [key, row] of old) if (!after.factors.some((r) => r.material === key)) lines.push(`${row.label} removed`);
  for (const [field, value] of Object.entries(after.settings)) {
    const was = (before.settings as Record<string, unknown>)[field];
    if (JSON.stringify(was) !== JSON.stringify(value)) lines.push(`${words(field)} ${show(was)} → ${show(value)}`);
  }
  if (lines.length === 0) return "no change";
  return lines.length > 3 ? `${lines.slice(0, 3).join("; ")}; and ${lines.length - 3} more` : lines.join("; ");
}

/**
 * Follows the carbon tables the shown results were assessed with: when results arrive for another
 * table, keeps what each scheme's counted carbon was just before and is just after (kgCO2e/m² of
 * usable floor and tCO2e). Results for the same tables (a brief change) only move the baseline; null
 * (results being designed) is skipped, so an edit is compared with the results it produced.
 */
export function trackCarbonEdits(assessed: ReadonlySignal<{ carbon: Study["carbon"]; schemes: readonly CarbonOfScheme[] } | null>): ReadonlySignal<LastEdit | null> {
  const last = signal<LastEdit | null>(null);
  let previous: { carbon: Study["carbon"]; schemes: readonly CarbonOfScheme[] } | null = null;
  effect(() => {
    const now = assessed.value;
    if (now === null) return;
    if (previous && previous.carbon !== now.carbon) {
      const before = new Map(previous.schemes.map((s) => [s.id, s.carbon]));
      last.value = {
        what: describeCarbonEdit(previous.carbon, now.carbon),
        schemes: now.schemes.map((s) => {
          const b = before.get(s.id) ?? null;
          return { id: s.id, label: s.label, beforePerM2: b?.perM2UsableFloor.perM2?.counted ?? null, afterPerM2: s.carbon?.perM2UsableFloor.perM2?.counted ?? null, beforeT: b ? b.totals.counted / 1000 : null, afterT: s.carbon ? s.carbon.totals.counted / 1000 : null };
        }),
      };
    }
    previous = now;
  });
  return last;
}
