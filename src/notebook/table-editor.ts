// An editable table bound to a list of rows in the study: edit a cell (checked against the row
// schema, with an inline message; an invalid value is not applied), reset a row to its default,
// add or remove rows the defaults do not have, import CSV (every bad line and column listed,
// nothing applied unless the whole file is valid) and export CSV. Shared by the carbon and rates pages.
import type * as v from "valibot";
import { h } from "preact";
import { computed, type ReadonlySignal, type Signal } from "@preact/signals-core";
import { downloadText } from "./download";
import { checkRowEdit, type ForgivingRead } from "../carbon";
import { tableImport, type RowGap } from "./table-import";
import { mountEditableTable, type TableColumn, type EditOutcome } from "./editable-table";

/** A column of the editor: a row field (number or text), or a computed column (`show`). */
export type EditorColumn<R> = TableColumn<R>;

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
  /** A forgiving reader for imports (delimiter, decimal comma, header variants, partial columns). */
  read?: (text: string, fileLabel: string, current: readonly R[]) => ForgivingRead<R>;
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
  /** The key of the row focus is in (a page shows that row's card beside the table). */
  selected?: Signal<string | null>;
  /** Tools shown above the table after the import tools (a group edit). */
  extraTools?: HTMLElement;
  /** A caption for the table. */
  caption?: string;
};

const STYLE_ID = "table-editor-style";
const CSS = `
.table-editor .table-scroll { overflow-x: auto; }
.table-editor tr.column-groups th { text-align: center; font-size: 0.78rem; color: #3f4650; border-bottom: 2px solid #c6ccd4; }
.table-editor tr.column-groups th.group { background: #f1f4f8; }
.table-editor tr.selected > * { background: #eef4fb; }
.table-editor td.computed { color: #3f4650; white-space: nowrap; }
.factor-layout { display: grid; grid-template-columns: minmax(0, 1fr) 19rem; gap: 1rem; align-items: start; }
@media (max-width: 60rem) { .factor-layout { grid-template-columns: minmax(0, 1fr); } }
.provenance-aside { position: sticky; top: 0.5rem; }
.provenance-card { border: 1px solid #c6ccd4; border-left: 5px solid #2f7d32; padding: 0.25rem 0.75rem 0.5rem; background: #fbfcfd; font-size: 0.84rem; }
.provenance-card.differs { border-left-color: #9a5b00; }
.provenance-card.unsupported { border-left-color: #a11d1d; }
.provenance-card h3 { font-size: 0.95rem; margin: 0.4rem 0; }
.provenance-card .verdict { font-weight: 600; }
.provenance-card dl { display: grid; grid-template-columns: 7rem minmax(0, 1fr); gap: 0.2rem 0.5rem; margin: 0.4rem 0; }
.provenance-card dt { font-weight: 600; color: #3f4650; }
.provenance-card dd { margin: 0; overflow-wrap: anywhere; }
.provenance-card .row-source { color: #3f4650; font-size: 0.8rem; }
.provenance-badge { font-size: 0.74rem; padding: 0.05rem 0.35rem; border-radius: 3px; white-space: nowrap; }
.provenance-badge.cited { background: #e3f1e4; color: #1f5e22; }
.provenance-badge.differs { background: #fbefd9; color: #6e4100; }
.provenance-badge.unsupported { background: #f8e1e1; color: #8a1c1c; }
.group-edit { display: flex; flex-wrap: wrap; gap: 0.5rem 0.75rem; align-items: end; border: 1px solid #d8dde3; margin: 0.5rem 0; padding: 0.25rem 0.75rem 0.5rem; }
.group-edit label { display: flex; flex-direction: column; font-size: 0.85rem; }
.group-edit #group-status { flex-basis: 100%; }
.element-tables { display: grid; grid-template-columns: repeat(auto-fit, minmax(min(100%, 32rem), 1fr)); gap: 0.5rem 2rem; }
.element-tables table { font-size: 0.84rem; }
.table-editor table { font-size: 0.84rem; }
.table-editor input { font: inherit; font-size: 0.84rem; width: 5.5rem; padding: 0.1rem 0.25rem; }
.table-editor input.wide { width: 16rem; }
.table-editor td:nth-child(2) input:not(.wide) { width: 10rem; }
.table-editor tbody th { min-width: 7rem; position: sticky; left: 0; background: #fff; z-index: 1; }
.table-editor tr.selected > th { background: #eef4fb; }
@media (max-width: 48rem) { .table-editor td:nth-child(2) input:not(.wide) { width: 7rem; } .table-editor tbody th { min-width: 5.5rem; font-size: 0.78rem; } }
#cell-factors input#factorSetName { max-width: 100%; box-sizing: border-box; }
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
.merge-preview ul.import-notes { color: #3f4650; }
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

/** The table itself: one component per row and cell, each row with its state, reset and remove. */
function mountRows<R extends Record<string, unknown>>(options: TableEditorOptions<R>, defaultsByKey: ReadonlySignal<Map<string, R>>, holder: HTMLElement): void {
  const keyOf = (r: R) => String(r[options.keyField]);
  const replaceRow = (key: string, row: R) => {
    const i = options.rows.peek().findIndex((r) => keyOf(r) === key);
    if (i < 0) return;
    const next = options.rows.peek().slice();
    next[i] = row;
    options.setRows(next);
  };
  const edit = (key: string, field: string, text: string): EditOutcome => {
    const current = options.rows.peek().find((r) => keyOf(r) === key);
    const column = options.columns.find((c) => c.field === field);
    if (!current || !column || (column.kind !== "number" && column.kind !== "text")) return { ok: false, message: "not editable" };
    const result = checkRowEdit(options.schema, current, field as keyof R & string, text, column.kind);
    if (!result.ok) return result;
    replaceRow(key, result.row);
    return { ok: true, value: result.row[field] };
  };
  const isChanged = (key: string, row: R) => {
    const base = defaultsByKey.value.get(key);
    return base !== undefined && options.columns.some((c) => c.kind !== "computed" && !sameValue(row[c.field], base[c.field]));
  };
  const rowState = ({ key, row, refresh }: { key: string; row: R; refresh(): void }) => {
    const base = defaultsByKey.value.get(key);
    const changed = isChanged(key, row);
    const reset = () => {
      const original = defaultsByKey.peek().get(key);
      if (original) replaceRow(key, { ...original });
      refresh();
    };
    const remove = () => options.setRows(options.rows.peek().filter((r) => keyOf(r) !== key));
    return h(
      "td",
      null,
      h("span", { class: "row-state" }, base === undefined ? "added " : changed ? "changed " : "default"),
      h("button", { type: "button", hidden: !changed, "aria-label": `Reset ${key} to its default`, onClick: reset }, "Reset"),
      h("button", { type: "button", hidden: base !== undefined, "aria-label": `Remove ${key}`, onClick: remove }, "Remove"),
    );
  };
  mountEditableTable<R>(holder, {
    tableId: `${options.id}-table`,
    ...(options.caption ? { caption: options.caption } : {}),
    rows: options.rows,
    keyOf,
    columns: options.columns,
    keyField: options.keyField,
    cellId: (key, _index, field) => `${options.id}-${key}-${field}`,
    cellLabel: (row, column) => `${column.label} of ${keyOf(row)}`,
    edit,
    defaults: defaultsByKey,
    messages: "cell",
    rowAttributes: (key, row) => ({ "data-key": key, class: defaultsByKey.value.get(key) === undefined ? "row-added" : isChanged(key, row) ? "row-changed" : "" }),
    rowTools: rowState,
    toolsHeading: "State",
    ...(options.selected ? { selected: options.selected, onRowFocus: (key: string) => ((options.selected as Signal<string | null>).value = key) } : {}),
  });
}

/** The new-row id field and its Add button (none when the table takes no new rows). */
function addRowTools<R extends Record<string, unknown>>(options: TableEditorOptions<R>, status: HTMLElement): HTMLElement[] {
  if (!options.newRow) return [];
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
  return [newKey, add];
}

/** The hidden file input and the Import and Merge buttons that open it. */
function importButtons(id: string, importText: (text: string, name: string, mode: "replace" | "merge") => void): HTMLElement[] {
  let mode: "replace" | "merge" = "replace";
  const file = document.createElement("input");
  file.type = "file";
  file.accept = ".csv,text/csv";
  file.hidden = true;
  file.id = `${id}-import-file`;
  file.setAttribute("aria-label", "CSV file to import");
  file.addEventListener("change", async () => {
    const chosen = file.files?.[0];
    if (!chosen) return;
    importText(await chosen.text(), chosen.name, mode);
    file.value = "";
    mode = "replace";
  });
  const open = (next: "replace" | "merge") => () => {
    mode = next;
    file.click();
  };
  return [button("Import CSV…", open("replace"), `${id}-import`), button("Merge CSV (partial update)…", open("merge"), `${id}-merge`), file];
}

/** Builds the editor: the table is a component tree (one component per row and cell), so a removed row takes its subscriptions with it. */
export function tableEditor<R extends Record<string, unknown>>(options: TableEditorOptions<R>): HTMLElement {
  ensureStyle();
  const wrap = document.createElement("div");
  wrap.className = "table-editor";
  const status = document.createElement("div");
  status.id = `${options.id}-import-status`;
  status.setAttribute("aria-live", "polite");
  const defaultsByKey = computed(() => new Map(options.defaults().map((r) => [String(r[options.keyField]), r])));
  const tableHolder = document.createElement("div");
  tableHolder.className = "table-scroll";
  mountRows(options, defaultsByKey, tableHolder);

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
      ...(options.read ? { read: options.read } : {}),
      apply: applyNamed,
      ...(options.missingFor ? { missingFor: options.missingFor } : {}),
      ...(options.setName ? { currentName: options.setName.current } : {}),
    },
    status,
  );
  const exportButton = button("Export CSV", () => downloadText(options.csvFilename, options.toCsv(options.rows.peek()), "text/csv"), `${options.id}-export`);
  const tools = document.createElement("div");
  tools.className = "editor-tools";
  tools.append(...addRowTools(options, status), resetAll, ...importButtons(options.id, importText), exportButton);
  // Tests (and drag-and-drop, later) can import text directly.
  wrap.addEventListener("import-csv", (event) => {
    const detail = (event as CustomEvent<{ text: string; name: string; merge?: boolean }>).detail;
    importText(detail.text, detail.name, detail.merge ? "merge" : "replace");
  });
  wrap.append(tools, ...(options.extraTools ? [options.extraTools] : []), status, preview, tableHolder);
  return wrap;
}
