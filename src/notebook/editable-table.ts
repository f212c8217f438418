// An editable table as a preact component: one component per row and per cell, so each cell's
// subscriptions live and die with its row (no effect outlives a removed or rebuilt row). Shared by
// the factor and rate editors (table-editor.ts) and the risk inputs (risk-inputs-editor.ts).
// A cell edit goes through `edit`, which applies it or returns the message to show; while a cell
// holds an invalid entry, the text typed stays on screen with the message beside it.
import { h, render, type ComponentChild, type ComponentChildren, type VNode } from "preact";
import { useSignal, type ReadonlySignal, type Signal } from "@preact/signals";

export type TableColumn<R> = {
  /** The row field shown (or a name for a computed column). */
  field: string;
  label: string;
  unit?: string;
  /**
   * number / text: a typed entry; select: one of `choices`; computed: `show(row)`, not editable.
   */
  kind: "number" | "text" | "select" | "computed";
  /** Shown but not editable (the row's key, a fixed unit). */
  readOnly?: boolean;
  /** Wide text cells (sources, notes). */
  wide?: boolean;
  choices?: readonly { value: string; label: string }[];
  /** Text of a computed or formatted cell. */
  show?: (row: R) => string;
  /** Content of a computed or read-only cell, when more than text. */
  content?: (row: R) => ComponentChildren;
  /** A heading above a run of columns (a life-cycle stage); consecutive columns with the same group share it. */
  group?: string;
  /** Apply on every keystroke ("input", the default) or when the entry is left or Enter is pressed ("change"). */
  commit?: "input" | "change";
  /** A tooltip on the column heading. */
  hint?: string;
};

export type EditableTableProps<R> = {
  tableId: string;
  caption?: string;
  rows: ReadonlySignal<readonly R[]>;
  keyOf(row: R): string;
  columns: readonly TableColumn<R>[];
  /** The id of a cell's entry element. */
  cellId(key: string, index: number, field: string): string;
  /** The accessible name of a cell's entry element. */
  cellLabel(row: R, column: TableColumn<R>): string;
  /** Applies an edit and says the value now stored, or returns the message to show (nothing applied). */
  edit(key: string, field: string, text: string): EditOutcome;
  /** The default of each row by key (to mark changed cells); none: no marks. */
  defaults?: ReadonlySignal<ReadonlyMap<string, R>>;
  /** "cell": a message under the cell; "row": one message cell at the end of the row, with this id. */
  messages: "cell" | { rowMessageId(key: string, index: number): string };
  /** Attributes of each row (data-key…). */
  rowAttributes(key: string, row: R): Record<string, string>;
  /** The key field is a row heading. */
  keyField?: string;
  /** Extra cells after the columns (row state and actions); `refresh` clears the row's pending entries. */
  rowTools?: (props: { key: string; row: R; index: number; refresh(): void }) => VNode | null;
  /** Heading of the tools column. */
  toolsHeading?: string;
  /** Rows to show (a filter); all when absent. */
  visible?: ReadonlySignal<(row: R) => boolean>;
  /** Called when focus enters a row (the provenance card follows it). */
  onRowFocus?: (key: string) => void;
  /** Told after every entry: the message of a refused entry, or null once the cell's entry is applied. */
  onEntry?: (key: string, field: string, message: string | null) => void;
  /** The key of the row to mark as selected. */
  selected?: ReadonlySignal<string | null>;
};

/** What an edit did: the value now stored in the field, or why nothing was applied. */
export type EditOutcome = { ok: true; value: unknown } | { ok: false; message: string };

/** A pending entry of a cell: what was typed, against which value and row epoch, and its message. */
type Draft = { text: string; against: unknown; epoch: number; message: string };

function shownValue<R>(column: TableColumn<R>, row: R): string {
  if (column.show) return column.show(row);
  const value = (row as Record<string, unknown>)[column.field];
  return value === undefined || value === null ? "" : String(value);
}

function Cell<R>(props: { table: EditableTableProps<R>; column: TableColumn<R>; row: R; rowKey: string; index: number; epoch: Signal<number>; messageSink: Signal<string> }): ComponentChild {
  const { table, column, row, rowKey, index } = props;
  const draft = useSignal<Draft | null>(null);
  const value = (row as Record<string, unknown>)[column.field];
  const isKey = table.keyField === column.field;
  const base = table.defaults?.value.get(rowKey);
  const changed = base !== undefined && column.kind !== "computed" && !Object.is(value, (base as Record<string, unknown>)[column.field]);
  const tag = isKey ? "th" : "td";
  if (column.kind === "computed" || column.readOnly) {
    return h(tag, { scope: isKey ? "row" : undefined, class: column.kind === "computed" && !column.content ? "num computed" : undefined, id: column.kind === "computed" ? table.cellId(rowKey, index, column.field) : undefined }, column.content ? column.content(row) : shownValue(column, row));
  }
  const current = draft.value && draft.value.epoch === props.epoch.value && Object.is(draft.value.against, value) ? draft.value : null;
  const invalid = current !== null && current.message !== "";
  const id = table.cellId(rowKey, index, column.field);
  const messageId = table.messages === "cell" ? `${id}-message` : table.messages.rowMessageId(rowKey, index);
  const apply = (text: string) => {
    const outcome = table.edit(rowKey, column.field, text);
    // The typed text stays while the field holds what it gave (so "2." is not rewritten to "2"
    // mid-typing) or, when refused, while the field keeps the value it was typed against.
    // a refusal names the value still in force, as the page's own fields do (controls.ts editField)
    const shown = shownValue(column, row);
    const message = outcome.ok ? "" : `${outcome.message} — not applied; in force: ${column.kind === "number" ? shown || "none" : `"${shown}"`}`;
    draft.value = outcome.ok ? { text, against: outcome.value, epoch: props.epoch.peek(), message: "" } : { text, against: value, epoch: props.epoch.peek(), message };
    if (table.messages !== "cell") props.messageSink.value = message;
    table.onEntry?.(rowKey, column.field, outcome.ok ? null : message);
  };
  const common = {
    id,
    "aria-label": table.cellLabel(row, column),
    "aria-describedby": messageId,
    "aria-invalid": invalid ? "true" : "false",
  };
  let entry: ComponentChild;
  if (column.kind === "select") {
    entry = h(
      "select",
      { ...common, value: String(value ?? ""), onChange: (e: Event) => apply((e.currentTarget as HTMLSelectElement).value) },
      (column.choices ?? []).map((c) => h("option", { value: c.value, key: c.value }, c.label)),
    );
  } else {
    const text = current ? current.text : shownValue(column, row);
    const handler = (e: Event) => apply((e.currentTarget as HTMLInputElement).value);
    entry = h("input", {
      ...common,
      type: "text",
      inputMode: column.kind === "number" ? "decimal" : undefined,
      class: column.wide ? "wide" : undefined,
      value: text,
      ...(column.commit === "change" ? { onChange: handler, onKeyDown: (e: KeyboardEvent) => e.key === "Enter" && handler(e) } : { onInput: handler }),
    });
  }
  const classes = [changed ? "changed" : "", invalid ? "invalid" : ""].filter(Boolean).join(" ");
  return h(tag, { class: classes || undefined }, entry, table.messages === "cell" ? h("div", { class: "cell-message", id: messageId }, invalid ? `${column.label}: ${current?.message}` : "") : null);
}

function Row<R>(props: { table: EditableTableProps<R>; row: R; rowKey: string; index: number }): ComponentChild {
  const { table, row, rowKey, index } = props;
  const epoch = useSignal(0);
  const message = useSignal("");
  const refresh = () => {
    epoch.value += 1;
    message.value = "";
  };
  const cells: ComponentChildren[] = table.columns.map((column) => h(Cell as (p: unknown) => VNode, { key: column.field, table, column, row, rowKey, index, epoch, messageSink: message }));
  const tools = table.rowTools?.({ key: rowKey, row, index, refresh }) ?? null;
  const rowMessage = table.messages === "cell" ? null : h("td", { class: "row-message", id: table.messages.rowMessageId(rowKey, index), "aria-live": "polite" }, message.value);
  const selected = table.selected?.value === rowKey;
  return h(
    "tr",
    { ...table.rowAttributes(rowKey, row), class: [table.rowAttributes(rowKey, row).class ?? "", selected ? "selected" : ""].filter(Boolean).join(" ") || undefined, onFocusIn: () => table.onRowFocus?.(rowKey) },
    cells,
    tools,
    rowMessage,
  );
}

function headerRows<R>(table: EditableTableProps<R>): ComponentChild[] {
  const extra = (table.rowTools ? 1 : 0) + (table.messages === "cell" ? 0 : 1);
  const label = (c: TableColumn<R>) => (c.unit ? `${c.label} (${c.unit})` : c.label);
  const leaf = h("tr", null, [
    ...table.columns.map((c) => h("th", { scope: "col", key: c.field, title: c.hint, class: c.kind === "computed" ? "num" : undefined }, label(c))),
    ...(table.rowTools ? [h("th", { scope: "col", key: "_tools" }, table.toolsHeading ?? "")] : []),
    ...(table.messages === "cell" ? [] : [h("th", { scope: "col", key: "_message" }, "")]),
  ]);
  if (!table.columns.some((c) => c.group)) return [leaf];
  const runs: { group: string; span: number }[] = [];
  for (const c of table.columns) {
    const last = runs[runs.length - 1];
    if (last && last.group === (c.group ?? "")) last.span += 1;
    else runs.push({ group: c.group ?? "", span: 1 });
  }
  const top = h("tr", { class: "column-groups" }, [
    ...runs.map((r, i) => h("th", { scope: "colgroup", colSpan: r.span, key: i, class: r.group ? "group" : undefined }, r.group)),
    ...(extra > 0 ? [h("th", { colSpan: extra, key: "_extra" })] : []),
  ]);
  return [top, leaf];
}

function EditableTable<R>(props: { table: EditableTableProps<R> }): ComponentChild {
  const { table } = props;
  const rows = table.rows.value;
  const visible = table.visible?.value;
  return h(
    "table",
    { id: table.tableId },
    table.caption ? h("caption", null, table.caption) : null,
    h("thead", null, headerRows(table)),
    h(
      "tbody",
      null,
      rows.flatMap((row, index) => {
        if (visible && !visible(row)) return [];
        const key = table.keyOf(row);
        return [h(Row as (p: unknown) => VNode, { key, table, row, rowKey: key, index })];
      }),
    ),
  );
}

/** Renders the table into `parent` (a component tree whose lifetime is the element's). */
export function mountEditableTable<R>(parent: HTMLElement, table: EditableTableProps<R>): void {
  render(h(EditableTable as (p: unknown) => VNode, { table }), parent);
}

/** Unmounts what mountEditableTable put in `parent`, ending every subscription of its cells. */
export function unmountEditableTable(parent: HTMLElement): void {
  render(null, parent);
}
