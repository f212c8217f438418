// The uncertain-inputs table of the risk page, on the shared editable table: how far each input
// may go (least / most, as factors on the study's value or amounts added to it), the range that
// gives now around the study's value, how likely values in between are, and which inputs move
// together. Each edit is checked against the whole study (checkRiskInputs) before it is applied;
// an invalid edit shows its message in the row and changes nothing. Inputs are grouped by kind and
// can be filtered.
import { h } from "preact";
import { computed, signal, effect, type ReadonlySignal, type Signal } from "@preact/signals-core";
import type { StudyStore } from "./study-store";
import { setIn } from "../study";
import { checkRiskInputs, defaultRiskSettings, formatPath, resolveInput, DISTRIBUTION_KINDS, RANGE_SCALES, SCALE_RULES, SHAPE_WORDS, type UncertainInput } from "../risk";
import { mountEditableTable, type EditOutcome, type TableColumn } from "./editable-table";
import { writtenNumberProblem } from "./controls";
import { fmt } from "./format";

const STYLE_ID = "risk-editor-style";
const CSS = `
.risk-inputs { overflow-x: auto; max-height: 32rem; overflow-y: auto; }
.risk-inputs table { font-size: 0.82rem; }
.risk-inputs input, .risk-inputs select { font: inherit; font-size: 0.82rem; padding: 0.1rem 0.25rem; width: 6.5rem; }
.risk-inputs select { width: auto; }
.risk-inputs thead th { text-align: left; vertical-align: bottom; }
.risk-inputs td[id^="risk-range-"] { white-space: nowrap; }
.risk-inputs td.invalid input, .risk-inputs td.invalid select { border: 2px solid #a11d1d; }
.risk-inputs .row-message { color: #a11d1d; font-size: 0.78rem; max-width: 18rem; }
.risk-inputs .path { font-family: ui-monospace, monospace; font-size: 0.74rem; color: #5a6270; }
.risk-inputs .kind { font-size: 0.74rem; color: #3f4650; }
.risk-filter { display: flex; gap: 0.75rem; align-items: end; flex-wrap: wrap; margin: 0.5rem 0; }
.risk-filter label { display: flex; flex-direction: column; font-size: 0.85rem; }
.risk-progress { display: flex; gap: 0.75rem; align-items: center; flex-wrap: wrap; margin: 0.5rem 0; }
.risk-progress progress { width: 18rem; height: 1rem; }
.risk-stale { color: #8a5a00; font-weight: 600; }
.risk-verdict { font-size: 1.05rem; font-weight: 600; margin: 0.25rem 0 0.75rem; }
.cell.out-of-date .figure, .cell.out-of-date table, .cell.out-of-date .risk-verdict { opacity: 0.45; }
.cell.out-of-date > h2::after { content: " — out of date"; color: #8a5a00; font-weight: 600; }
`;

export function ensureRiskStyle(): void {
  if (document.getElementById(STYLE_ID)) return;
  const style = document.createElement("style");
  style.id = STYLE_ID;
  style.textContent = CSS;
  document.head.append(style);
}

/** The kinds inputs are grouped by, from where they sit in the study. */
export const INPUT_KINDS = ["Loads and brief", "Scheme proportions and allowances", "Carbon factors and settings", "Rates and on-costs", "Other"] as const;
export type InputKind = (typeof INPUT_KINDS)[number];

/** The kind of an uncertain input, from the first step of its path. */
export function inputKind(input: UncertainInput): InputKind {
  const head = input.path[0];
  if (head === "brief") return "Loads and brief";
  if (head === "schemes") return "Scheme proportions and allowances";
  if (head === "carbon") return "Carbon factors and settings";
  if (head === "cost") return "Rates and on-costs";
  return "Other";
}

export { SHAPE_WORDS };

const show = (x: number) => String(Number(x.toPrecision(4)));

/** Applies a new version of input `index` if the whole study stays valid; else the message naming it. */
function applyInput(store: StudyStore, index: number, next: UncertainInput, applied: unknown): EditOutcome {
  const candidate = setIn(store.study.value, ["risk", "inputs", index], next);
  const problems = checkRiskInputs(candidate).problems.filter((p) => p.inputId === next.id || p.inputId === null);
  if (problems.length > 0) return { ok: false, message: problems.map((p) => p.message).join("; ") };
  store.replace(candidate);
  return { ok: true, value: applied };
}

/** Changing the scale keeps the absolute range of the moment, re-expressed on the new scale. */
function changeScale(store: StudyStore, index: number, stored: UncertainInput, scale: string): EditOutcome {
  const now = resolveInput(store.study.value, stored);
  if ("error" in now) return applyInput(store, index, { ...stored, scale: scale as UncertainInput["scale"] }, scale);
  const factor = scale === "factor";
  if (factor && now.mode === 0) return { ok: false, message: `input "${stored.id}": the study's value is 0, so the range cannot be factors on it (use + study value)` };
  const ends = factor ? [now.low / now.mode, now.high / now.mode] : [now.low - now.mode, now.high - now.mode];
  return applyInput(store, index, { ...stored, scale: factor ? "factor" : "offset", low: Math.min(...ends), high: Math.max(...ends) }, scale);
}

/**
 * Why a typed least or most is not allowed, in the table's own words (the row's name, "least" and
 * "most", "× study value" and "+ study value"), or null; the file's words (low, high, factor,
 * offset) stay in the study file's checks.
 */
function endProblem(stored: UncertainInput, field: "low" | "high", text: string, x: number): string | null {
  const name = `${stored.label}, ${field === "low" ? "least" : "most"}`;
  const rule = SCALE_RULES[stored.scale];
  const factor = stored.scale === "factor";
  const allowed =
    field === "low" ? (factor ? `from ${rule.lowMin} to ${rule.lowMax} (× study value)` : `0 or less (+ study value)`) : `${rule.highMin} or more (${factor ? "×" : "+"} study value)`;
  if (text.trim() === "") return `${name}: a value is required (allowed ${allowed})`;
  const written = writtenNumberProblem(text);
  if (written !== null) return `${name}: ${written}`;
  if (!Number.isFinite(x)) return `${name}: "${text}" is not a number (allowed ${allowed})`;
  const inside = field === "low" ? x >= rule.lowMin && x <= rule.lowMax : x >= rule.highMin;
  return inside ? null : `${name}: ${x} is not allowed (allowed ${allowed})`;
}

function editInput(store: StudyStore, id: string, field: string, text: string): EditOutcome {
  const inputs = store.study.value.risk.inputs;
  const index = inputs.findIndex((i) => i.id === id);
  const stored = inputs[index];
  if (!stored) return { ok: false, message: `input "${id}" is no longer in the study` };
  if (field === "scale") return changeScale(store, index, stored, text);
  if (field === "low" || field === "high") {
    const x = Number(text);
    const problem = endProblem(stored, field, text, x);
    if (problem !== null) return { ok: false, message: problem };
    return applyInput(store, index, { ...stored, [field]: x }, x);
  }
  if (field === "group") {
    const group = text.trim() === "" ? null : text.trim();
    return applyInput(store, index, { ...stored, group }, group);
  }
  return applyInput(store, index, { ...stored, [field]: text }, text);
}

function columns(store: StudyStore): TableColumn<UncertainInput>[] {
  const number = (x: unknown) => (typeof x === "number" ? String(Number(x.toPrecision(6))) : "");
  return [
    { field: "label", label: "input", kind: "computed", content: (i) => [fmt.unit(i.label), h("div", { class: "kind" }, inputKind(i)), h("div", { class: "path" }, formatPath(i.path))] },
    { field: "scale", label: "ends given as", kind: "select", choices: RANGE_SCALES.map((k) => ({ value: k, label: k === "factor" ? "× study value" : "+ study value" })) },
    { field: "low", label: "least", kind: "number", commit: "change", show: (i) => number(i.low), hint: "The lowest plausible value, on the scale at the left" },
    { field: "high", label: "most", kind: "number", commit: "change", show: (i) => number(i.high), hint: "The highest plausible value, on the scale at the left" },
    {
      field: "range",
      label: "range now (least – study value – most)",
      kind: "computed",
      show: (i) => {
        const now = resolveInput(store.study.value, i);
        return "error" in now ? "–" : `${show(now.low)} – ${show(now.mode)} – ${show(now.high)}`;
      },
    },
    { field: "distribution", label: "how likely in between", kind: "select", choices: DISTRIBUTION_KINDS.map((k) => ({ value: k, label: SHAPE_WORDS[k] })) },
    { field: "group", label: "moves with (group)", kind: "text", commit: "change", show: (i) => i.group ?? "" },
  ];
}

/** The filter above the table: a kind and words to find in an input's name or path. */
function filterBar(kind: ReturnType<typeof signal<string>>, words: ReturnType<typeof signal<string>>, count: ReadonlySignal<string>): HTMLElement {
  const bar = document.createElement("div");
  bar.className = "risk-filter";
  const kindLabel = document.createElement("label");
  kindLabel.textContent = "Kind of input";
  const select = document.createElement("select");
  select.id = "risk-filter-kind";
  for (const k of ["all", ...INPUT_KINDS]) select.append(new Option(k === "all" ? "All kinds" : k, k));
  select.addEventListener("change", () => (kind.value = select.value));
  kindLabel.append(select);
  const wordsLabel = document.createElement("label");
  wordsLabel.textContent = "Find";
  const search = document.createElement("input");
  search.type = "search";
  search.id = "risk-filter-words";
  search.placeholder = "snow, steel, rate…";
  search.addEventListener("input", () => (words.value = search.value.trim().toLowerCase()));
  wordsLabel.append(search);
  const shown = document.createElement("span");
  shown.id = "risk-filter-count";
  effect(() => {
    shown.textContent = count.value;
  });
  bar.append(kindLabel, wordsLabel, shown);
  return bar;
}

/** Entries typed in the table and refused (not applied), by input id and field: Run is refused while there is one. */
export type PendingEntries = Signal<ReadonlyMap<string, string>>;


/** The editable inputs table with its filter, reset button and summary line; refused entries are kept in `pending`. */
export function riskInputsEditor(store: StudyStore, pending: PendingEntries = signal(new Map())): HTMLElement {
  ensureRiskStyle();
  const wrap = document.createElement("div");
  const tools = document.createElement("div");
  tools.className = "risk-progress";
  const reset = document.createElement("button");
  reset.type = "button";
  reset.id = "risk-reset-inputs";
  reset.textContent = "Reset inputs to the defaults for this study";
  reset.addEventListener("click", () => {
    const study = store.study.value;
    store.replace(setIn(study, ["risk", "inputs"], defaultRiskSettings(study).inputs));
    pending.value = new Map();
  });
  const summary = document.createElement("span");
  effect(() => {
    const check = checkRiskInputs(store.study.value);
    const inputs = store.study.value.risk.inputs;
    summary.textContent = `${inputs.length} inputs, ${inputs.filter((i) => i.low < i.high).length} with a range; ${check.problems.length === 0 ? "all valid" : `${check.problems.length} problem(s)`}${check.warnings.length ? `; ${check.warnings.length} warning(s): ${check.warnings.slice(0, 2).join("; ")}` : ""}`;
  });
  tools.append(reset, summary);
  const kind = signal("all");
  const words = signal("");
  const rows = computed(() => store.study.value.risk.inputs);
  const visible = computed(() => {
    const k = kind.value;
    const w = words.value;
    return (i: UncertainInput) => (k === "all" || inputKind(i) === k) && (w === "" || `${i.label} ${formatPath(i.path)}`.toLowerCase().includes(w));
  });
  const count = computed(() => `${rows.value.filter(visible.value).length} of ${rows.value.length} inputs shown`);
  const holder = document.createElement("div");
  holder.className = "risk-inputs table-scroll";
  mountEditableTable<UncertainInput>(holder, {
    tableId: "risk-inputs-table",
    caption:
      "Uncertain inputs. Each range is stored around the study's own value, taken as the most likely value: as factors on it (× 0.75 to × 1.5) or as amounts added to it (in the field's unit), so it moves with the study and always holds the study's value; the ends are kept inside the field's allowed range (a rate inside its row's low–high). Table rows are found by material or cost item id, not by position. Inputs with the same group move together (drawn as one); an empty group moves on its own.",
    rows,
    keyOf: (i) => i.id,
    columns: columns(store),
    cellId: (_key, index, field) => `risk-${field}-${index}`,
    cellLabel: (i, c) => `${i.label}: ${c.label}`,
    edit: (key, field, text) => editInput(store, key, field, text),
    messages: { rowMessageId: (_key, index) => `risk-msg-${index}` },
    rowAttributes: (key) => ({ "data-input": key }),
    keyField: "label",
    visible,
    onEntry: (key, field, message) => {
      const next = new Map(pending.peek());
      if (message === null) next.delete(`${key}\u0000${field}`);
      else next.set(`${key}\u0000${field}`, message);
      pending.value = next;
    },
  });
  wrap.append(tools, filterBar(kind, words, count), holder);
  return wrap;
}
