// The uncertain-inputs table of the risk page: scale / low / high / distribution / group per input,
// with the range it gives now around the study's value; each edit checked against the whole study
// (checkRiskInputs) before it is applied; an invalid edit shows its message in the row and changes
// nothing.
import { computed, effect } from "@preact/signals-core";
import type { StudyStore } from "./study-store";
import { setIn, getIn } from "../study";
import { checkRiskInputs, defaultRiskSettings, formatPath, resolveInput, DISTRIBUTION_KINDS, RANGE_SCALES, type UncertainInput } from "../risk";

const STYLE_ID = "risk-editor-style";
const CSS = `
.risk-inputs { overflow-x: auto; max-height: 32rem; overflow-y: auto; }
.risk-inputs table { font-size: 0.82rem; }
.risk-inputs input, .risk-inputs select { font: inherit; font-size: 0.82rem; padding: 0.1rem 0.25rem; }
.risk-inputs input[type="number"] { width: 6.5rem; }
.risk-inputs input.group { width: 8rem; }
.risk-inputs td.invalid input, .risk-inputs td.invalid select { border: 2px solid #a11d1d; }
.risk-inputs .row-message { color: #a11d1d; font-size: 0.78rem; max-width: 18rem; }
.risk-inputs .path { font-family: ui-monospace, monospace; font-size: 0.74rem; color: #5a6270; }
.risk-progress { display: flex; gap: 0.75rem; align-items: center; flex-wrap: wrap; margin: 0.5rem 0; }
.risk-progress progress { width: 18rem; height: 1rem; }
.risk-stale { color: #8a5a00; }
`;

export function ensureRiskStyle(): void {
  if (document.getElementById(STYLE_ID)) return;
  const style = document.createElement("style");
  style.id = STYLE_ID;
  style.textContent = CSS;
  document.head.append(style);
}

type Field = "scale" | "low" | "high" | "distribution" | "group";

/** The editable inputs table; rebuilt only when the list of inputs changes (ids), values kept in step by effects. */
export function riskInputsEditor(store: StudyStore): HTMLElement {
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
  });
  const summary = document.createElement("span");
  effect(() => {
    const check = checkRiskInputs(store.study.value);
    const inputs = store.study.value.risk.inputs;
    summary.textContent = `${inputs.length} inputs, ${inputs.filter((i) => i.low < i.high).length} with a range; ${check.problems.length === 0 ? "all valid" : `${check.problems.length} problem(s)`}${check.warnings.length ? `; ${check.warnings.length} warning(s): ${check.warnings.slice(0, 2).join("; ")}` : ""}`;
  });
  tools.append(reset, summary);
  const holder = document.createElement("div");
  holder.className = "risk-inputs";
  wrap.append(tools, holder);

  const ids = computed(() => store.study.value.risk.inputs.map((i) => i.id).join("\n"));
  effect(() => {
    if (ids.value === undefined) return; // read to rebuild when inputs are added, removed or replaced
    holder.replaceChildren(buildTable(store));
  });
  return wrap;
}

function buildTable(store: StudyStore): HTMLTableElement {
  const table = document.createElement("table");
  table.id = "risk-inputs-table";
  const caption = document.createElement("caption");
  caption.textContent =
    "Uncertain inputs. Each range is stored around the study's own value, which is the mode: as factors on it (× 0.75 to × 1.5) or as amounts added to it (in the field's unit), so it moves with the study and always holds the study's value; the ends are kept inside the field's allowed range (a rate inside its row's low–high). Table rows are found by material or cost item id, not by position. Inputs with the same group are drawn together (one quantile per sample); an empty group is independent.";
  const thead = document.createElement("thead");
  const head = document.createElement("tr");
  for (const h of ["input", "scale", "low", "high", "range now (low – study value – high)", "distribution", "group", ""]) {
    const th = document.createElement("th");
    th.scope = "col";
    th.textContent = h;
    head.append(th);
  }
  thead.append(head);
  const tbody = document.createElement("tbody");
  store.study.peek().risk.inputs.forEach((input, index) => tbody.append(row(store, input, index)));
  table.append(caption, thead, tbody);
  return table;
}

/** What every cell of one input's row needs: the store, the input, its message cell and how to apply an edit. */
type RowContext = {
  store: StudyStore;
  input: UncertainInput;
  index: number;
  message: HTMLTableCellElement;
  /** Applies a new version of the input if the whole study stays valid; else shows why in the row. */
  applyInput: (next: UncertainInput, cell: HTMLTableCellElement) => void;
  apply: (field: Field, value: unknown, cell: HTMLTableCellElement) => void;
};

function row(store: StudyStore, input: UncertainInput, index: number): HTMLTableRowElement {
  const tr = document.createElement("tr");
  tr.dataset.input = input.id;
  const name = document.createElement("th");
  name.scope = "row";
  name.textContent = input.label;
  const path = document.createElement("div");
  path.className = "path";
  path.textContent = formatPath(input.path);
  name.append(path);
  const message = document.createElement("td");
  message.className = "row-message";
  message.id = `risk-msg-${index}`;
  message.setAttribute("aria-live", "polite");
  const cells: HTMLTableCellElement[] = [];
  const current = () => store.study.value.risk.inputs[index] as UncertainInput;
  const applyInput = (next: UncertainInput, cell: HTMLTableCellElement) => {
    const candidate = setIn(store.study.value, ["risk", "inputs", index], next);
    const problems = checkRiskInputs(candidate).problems.filter((p) => p.inputId === input.id || p.inputId === null);
    if (problems.length > 0) {
      message.textContent = problems.map((p) => p.message).join("; ");
      cell.classList.add("invalid");
      return;
    }
    for (const c of cells) c.classList.remove("invalid");
    message.textContent = "";
    store.replace(candidate);
  };
  const ctx: RowContext = { store, input, index, message, applyInput, apply: (field, value, cell) => applyInput({ ...current(), [field]: value }, cell) };
  const [scale, low, high, distribution, group] = [scaleCell(ctx), numberCell(ctx, "low"), numberCell(ctx, "high"), distributionCell(ctx), groupCell(ctx)];
  cells.push(scale, low, high, distribution, group);
  tr.append(name, scale, low, high, rangeCell(ctx), distribution, group, message);
  return tr;
}

/** The scale select: changing it keeps the absolute range of the moment, re-expressed on the new scale. */
function scaleCell(ctx: RowContext): HTMLTableCellElement {
  const { store, input, index, message } = ctx;
  const td = document.createElement("td");
  const scale = document.createElement("select");
  scale.id = `risk-scale-${index}`;
  scale.setAttribute("aria-label", `${input.label}: scale`);
  for (const kind of RANGE_SCALES) {
    const option = document.createElement("option");
    option.value = kind;
    option.textContent = kind === "factor" ? "× study value" : "+ study value";
    scale.append(option);
  }
  scale.addEventListener("change", () => {
    const stored = store.study.value.risk.inputs[index] as UncertainInput;
    const now = resolveInput(store.study.value, stored);
    if ("error" in now) return ctx.apply("scale", scale.value, td);
    const factor = scale.value === "factor";
    if (factor && now.mode === 0) {
      message.textContent = `input "${input.id}": the study's value is 0, so the range cannot be factors on it (use + study value)`;
      td.classList.add("invalid");
      return;
    }
    const ends = factor ? [now.low / now.mode, now.high / now.mode] : [now.low - now.mode, now.high - now.mode];
    ctx.applyInput({ ...stored, scale: factor ? "factor" : "offset", low: Math.min(...ends), high: Math.max(...ends) }, td);
  });
  effect(() => {
    const value = getIn(store.study.value, ["risk", "inputs", index, "scale"]);
    if (typeof value === "string") scale.value = value;
  });
  td.append(scale);
  return td;
}

function numberCell(ctx: RowContext, field: "low" | "high"): HTMLTableCellElement {
  const { store, input, index, message } = ctx;
  const td = document.createElement("td");
  const el = document.createElement("input");
  el.type = "number";
  el.step = "any";
  el.id = `risk-${field}-${index}`;
  el.setAttribute("aria-label", `${input.label}: ${field}`);
  el.setAttribute("aria-describedby", message.id);
  el.addEventListener("change", () => {
    const x = Number(el.value);
    if (el.value.trim() === "" || !Number.isFinite(x)) {
      message.textContent = `input "${input.id}": ${field} "${el.value}" is not a number`;
      td.classList.add("invalid");
      return;
    }
    ctx.apply(field, x, td);
  });
  effect(() => {
    const value = getIn(store.study.value, ["risk", "inputs", index, field]);
    if (document.activeElement !== el && typeof value === "number") el.value = String(Number(value.toPrecision(6)));
  });
  td.append(el);
  return td;
}

/** The range the input gives now: low – the study's value (the mode) – high, in the field's unit. */
function rangeCell(ctx: RowContext): HTMLTableCellElement {
  const { store, index } = ctx;
  const td = document.createElement("td");
  td.className = "num";
  td.id = `risk-range-${index}`;
  effect(() => {
    const stored = store.study.value.risk.inputs[index];
    const now = stored ? resolveInput(store.study.value, stored) : null;
    const show = (x: number) => String(Number(x.toPrecision(4)));
    td.textContent = !now || "error" in now ? "–" : `${show(now.low)} – ${show(now.mode)} – ${show(now.high)}`;
  });
  return td;
}

function distributionCell(ctx: RowContext): HTMLTableCellElement {
  const { store, input, index } = ctx;
  const td = document.createElement("td");
  const select = document.createElement("select");
  select.id = `risk-distribution-${index}`;
  select.setAttribute("aria-label", `${input.label}: distribution`);
  for (const kind of DISTRIBUTION_KINDS) {
    const option = document.createElement("option");
    option.value = kind;
    option.textContent = kind === "pert" ? "Beta-PERT" : kind;
    select.append(option);
  }
  select.addEventListener("change", () => ctx.apply("distribution", select.value, td));
  effect(() => {
    const value = getIn(store.study.value, ["risk", "inputs", index, "distribution"]);
    if (typeof value === "string") select.value = value;
  });
  td.append(select);
  return td;
}

function groupCell(ctx: RowContext): HTMLTableCellElement {
  const { store, input, index } = ctx;
  const td = document.createElement("td");
  const group = document.createElement("input");
  group.type = "text";
  group.className = "group";
  group.id = `risk-group-${index}`;
  group.setAttribute("aria-label", `${input.label}: group`);
  group.addEventListener("change", () => ctx.apply("group", group.value.trim() === "" ? null : group.value.trim(), td));
  effect(() => {
    const value = getIn(store.study.value, ["risk", "inputs", index, "group"]);
    if (document.activeElement !== group) group.value = typeof value === "string" ? value : "";
  });
  td.append(group);
  return td;
}
