// An editable table bound to a list of rows in the study: edit a cell (checked against the row
// schema, with an inline message; an invalid value is not applied), reset a row to its default,
// add or remove rows the defaults do not have, import CSV (every bad line and column listed,
// nothing applied unless the whole file is valid) and export CSV. Shared by the carbon and rates pages.
import type * as v from "valibot";
import { effect, computed, type ReadonlySignal } from "@preact/signals-core";
import { downloadText } from "./download";
import { checkRowEdit } from "../carbon";
import { tableImport, type RowGap } from "./table-import";

export type EditorColumn<R> = {
  field: keyof R & string;
  label: string;
  kind: "number" | "text";
  unit?: string;
  /** Shown but not editable (the row's key, a fixed unit). */
  readOnly?: boolean;
  /** Wide text cells (sources, notes). */
  wide?: boolean;
};

export type TableEditorOptions<R extends Record<string, unknown>> = {
  /** Prefix for element ids, e.g. "factors". */
  id: string;
  /** What one row is called in messages, e.g. "material". */
  rowNoun: string;
  rows: ReadonlySignal<R[]>;
  setRows(next: R[]): void;
  defaults: () => R[];
  keyField: keyof R & string;
  columns: readonly EditorColumn<R>[];
  schema: v.GenericSchema<unknown, R>;
  parseCsv(text: string, fileLabel: string): R[];
  toCsv(rows: readonly R[]): string;
  csvFilename: string;
  /** A new row for a key the user typed; a string is a message (the key is refused). */
  newRow?: (key: string, rows: readonly R[]) => R | string;
  /** Rows the schemes need that candidate rows lack: an import lacking them is refused with their names (a merge is offered). */
  missingFor?: (rows: readonly R[]) => RowGap[];
  /**
   * The table set's name (provenance in captions and records): an import, a merge or "reset all"
   * sets rows and name together through `apply`, in one study update.
   */
  setName?: { current: () => string; defaultName: string; apply(rows: R[], name: string): void };
};

const STYLE_ID = "table-editor-style";
const CSS = `
.table-editor { overflow-x: auto; }
.table-editor table { font-size: 0.84rem; }
.table-editor input { font: inherit; font-size: 0.84rem; width: 5.5rem; padding: 0.1rem 0.25rem; }
.table-editor input.wide { width: 16rem; }
.table-editor td.changed input { background: #fff7d6; }
.table-editor tr.row-changed th { border-left: 4px solid #c98a00; }
.table-editor tr.row-added th { border-left: 4px solid #1d4e89; }
.table-editor td.invalid input { border: 2px solid #a11d1d; }
.table-editor .cell-message { color: #a11d1d; font-size: 0.78rem; max-width: 14rem; }
.table-editor .row-state { font-size: 0.78rem; color: #5a6270; }
.editor-tools { display: flex; flex-wrap: wrap; gap: 0.5rem; align-items: center; margin: 0.5rem 0; }
.editor-tools input[type="text"] { font: inherit; width: 12rem; }
.import-problems { color: #a11d1d; font-size: 0.85rem; white-space: pre-wrap; }
.import-ok { color: #3a7d32; font-size: 0.85rem; }
.merge-preview { border-left: 4px solid #c98a00; background: #fffbea; padding: 0.25rem 0.75rem 0.6rem; margin: 0.5rem 0 0.75rem; font-size: 0.88rem; }
.merge-preview ul { margin: 0.25rem 0 0.5rem; }
`;

function ensureStyle(): void {
  if (document.getElementById(STYLE_ID)) return;
  const style = document.createElement("style");
  style.id = STYLE_ID;
  style.textContent = CSS;
  document.head.append(style);
}

function button(label: string, onClick: () => void, id?: string): HTMLButtonElement {
  const b = document.createElement("button");
  b.type = "button";
  b.textContent = label;
  if (id) b.id = id;
  b.addEventListener("click", onClick);
  return b;
}

function sameValue(a: unknown, b: unknown): boolean {
  return Object.is(a, b);
}

/** Builds the editor; the table is rebuilt only when rows are added or removed, so typing keeps focus. */
export function tableEditor<R extends Record<string, unknown>>(options: TableEditorOptions<R>): HTMLElement {
  ensureStyle();
  const wrap = document.createElement("div");
  wrap.className = "table-editor";
  const status = document.createElement("div");
  status.id = `${options.id}-import-status`;
  status.setAttribute("aria-live", "polite");

  const defaultsByKey = computed(() => new Map(options.defaults().map((r) => [String(r[options.keyField]), r])));
  const keys = computed(() => options.rows.value.map((r) => String(r[options.keyField])).join("\n"));
  const tableHolder = document.createElement("div");
  let disposers: (() => void)[] = [];

  const indexOf = (key: string) => options.rows.peek().findIndex((r) => String(r[options.keyField]) === key);
  const replaceRow = (key: string, row: R) => {
    const i = indexOf(key);
    if (i < 0) return;
    const next = options.rows.peek().slice();
    next[i] = row;
    options.setRows(next);
  };

  effect(() => {
    const keyList = keys.value === "" ? [] : keys.value.split("\n");
    for (const dispose of disposers) dispose();
    disposers = [];
    const table = document.createElement("table");
    table.id = `${options.id}-table`;
    const thead = document.createElement("thead");
    const head = document.createElement("tr");
    for (const c of options.columns) {
      const th = document.createElement("th");
      th.scope = "col";
      th.textContent = c.unit ? `${c.label} (${c.unit})` : c.label;
      head.append(th);
    }
    const actions = document.createElement("th");
    actions.scope = "col";
    actions.textContent = "State";
    head.append(actions);
    thead.append(head);
    const tbody = document.createElement("tbody");
    for (const key of keyList) tbody.append(rowElement(key));
    table.append(thead, tbody);
    tableHolder.replaceChildren(table);
  });

  function rowElement(key: string): HTMLTableRowElement {
    const tr = document.createElement("tr");
    tr.dataset.key = key;
    const row = computed(() => options.rows.value.find((r) => String(r[options.keyField]) === key));
    const base = computed(() => defaultsByKey.value.get(key));
    for (const c of options.columns) {
      const cell = document.createElement(c.field === options.keyField ? "th" : "td");
      if (c.field === options.keyField) (cell as HTMLTableCellElement).scope = "row";
      if (c.readOnly) {
        disposers.push(effect(() => {
          cell.textContent = String(row.value?.[c.field] ?? "");
        }));
        tr.append(cell);
        continue;
      }
      const input = document.createElement("input");
      input.type = "text";
      input.id = `${options.id}-${key}-${c.field}`;
      input.setAttribute("aria-label", `${c.label} of ${key}`);
      if (c.kind === "number") input.inputMode = "decimal";
      if (c.wide) input.className = "wide";
      const message = document.createElement("div");
      message.className = "cell-message";
      message.id = `${input.id}-message`;
      input.setAttribute("aria-describedby", message.id);
      input.addEventListener("input", () => {
        const current = row.peek();
        if (!current) return;
        const result = checkRowEdit(options.schema, current, c.field, input.value, c.kind);
        cell.classList.toggle("invalid", !result.ok);
        input.setAttribute("aria-invalid", result.ok ? "false" : "true");
        message.textContent = result.ok ? "" : `${c.label}: ${result.message}`;
        if (result.ok) replaceRow(key, result.row);
      });
      // Only this cell's own value re-runs its effect, so an invalid entry elsewhere in the row stays on screen.
      const cellValue = computed(() => row.value?.[c.field]);
      disposers.push(effect(() => {
        const value = cellValue.value;
        const original = base.value?.[c.field];
        cell.classList.toggle("changed", base.value !== undefined && !sameValue(value, original));
        // Keep what the user is typing while it is invalid; otherwise show the study's value.
        if (cell.classList.contains("invalid") && document.activeElement === input) return;
        const shown = value === undefined ? "" : String(value);
        if (input.value !== shown && !(c.kind === "number" && Number(input.value) === value && input.value.trim() !== "")) input.value = shown;
        cell.classList.remove("invalid");
        message.textContent = "";
      }));
      // A row reset shows the study's value again even where an invalid entry was left.
      input.addEventListener("refresh", () => {
        const value = cellValue.peek();
        input.value = value === undefined ? "" : String(value);
        cell.classList.remove("invalid");
        input.setAttribute("aria-invalid", "false");
        message.textContent = "";
      });
      cell.append(input, message);
      tr.append(cell);
    }
    const state = document.createElement("td");
    const label = document.createElement("span");
    label.className = "row-state";
    const reset = button("Reset", () => {
      const original = base.peek();
      if (original) replaceRow(key, { ...original });
      for (const input of tr.querySelectorAll("input")) input.dispatchEvent(new Event("refresh"));
    });
    reset.setAttribute("aria-label", `Reset ${key} to its default`);
    const remove = button("Remove", () => {
      options.setRows(options.rows.peek().filter((r) => String(r[options.keyField]) !== key));
    });
    remove.setAttribute("aria-label", `Remove ${key}`);
    disposers.push(effect(() => {
      const r = row.value;
      const b = base.value;
      const changed = b !== undefined && r !== undefined && options.columns.some((c) => !sameValue(r[c.field], b[c.field]));
      tr.classList.toggle("row-changed", changed);
      tr.classList.toggle("row-added", b === undefined);
      label.textContent = b === undefined ? "added " : changed ? "changed " : "default";
      reset.hidden = !changed;
      remove.hidden = b !== undefined;
    }));
    state.append(label, reset, remove);
    tr.append(state);
    return tr;
  }

  // Tools: add a row, reset all, import, export.
  const tools = document.createElement("div");
  tools.className = "editor-tools";
  if (options.newRow) {
    const newKey = document.createElement("input");
    newKey.type = "text";
    newKey.id = `${options.id}-new-key`;
    newKey.placeholder = `new ${options.rowNoun} id`;
    newKey.setAttribute("aria-label", `Id of a new ${options.rowNoun}`);
    const add = button(`Add ${options.rowNoun}`, () => {
      const made = options.newRow?.(newKey.value.trim(), options.rows.peek());
      if (made === undefined) return;
      if (typeof made === "string") {
        status.className = "import-problems";
        status.textContent = made;
        return;
      }
      options.setRows([...options.rows.peek(), made]);
      status.className = "import-ok";
      status.textContent = `Added ${String(made[options.keyField])}: fill in its factors and source.`;
      newKey.value = "";
    }, `${options.id}-add`);
    tools.append(newKey, add);
  }
  const applyNamed = (rows: R[], name: string | null) => {
    if (options.setName && name !== null) options.setName.apply(rows, name);
    else options.setRows(rows);
  };
  const resetAll = button("Reset all to defaults", () => {
    applyNamed(options.defaults(), options.setName?.defaultName ?? null);
    status.className = "import-ok";
    status.textContent = "Every row reset to the bundled defaults.";
  }, `${options.id}-reset-all`);
  const { importText, preview } = tableImport(
    {
      id: options.id,
      rowNoun: options.rowNoun,
      keyField: options.keyField,
      columns: options.columns,
      current: () => options.rows.peek(),
      parseCsv: options.parseCsv,
      apply: applyNamed,
      ...(options.missingFor ? { missingFor: options.missingFor } : {}),
      ...(options.setName ? { currentName: options.setName.current } : {}),
    },
    status,
  );
  let mode: "replace" | "merge" = "replace";
  const file = document.createElement("input");
  file.type = "file";
  file.accept = ".csv,text/csv";
  file.hidden = true;
  file.id = `${options.id}-import-file`;
  file.setAttribute("aria-label", "CSV file to import");
  file.addEventListener("change", async () => {
    const chosen = file.files?.[0];
    if (!chosen) return;
    importText(await chosen.text(), chosen.name, mode);
    file.value = "";
    mode = "replace";
  });
  const importButton = button("Import CSV…", () => {
    mode = "replace";
    file.click();
  }, `${options.id}-import`);
  const mergeButton = button("Merge CSV (partial update)…", () => {
    mode = "merge";
    file.click();
  }, `${options.id}-merge`);
  const exportButton = button("Export CSV", () => downloadText(options.csvFilename, options.toCsv(options.rows.peek()), "text/csv"), `${options.id}-export`);
  tools.append(resetAll, importButton, mergeButton, exportButton, file);

  // Tests (and drag-and-drop, later) can import text directly.
  wrap.addEventListener("import-csv", (event) => {
    const detail = (event as CustomEvent<{ text: string; name: string; merge?: boolean }>).detail;
    importText(detail.text, detail.name, detail.merge ? "merge" : "replace");
  });

  wrap.append(tools, status, preview, tableHolder);
  return wrap;
}
