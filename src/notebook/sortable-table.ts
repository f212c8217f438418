// A table sortable by any column (issue 14): a button in each heading sorts by that column
// (again: the other way), aria-sort tells assistive technology, and a column marked `lowerIsBetter`
// shows each ranked row's difference to the best. Rows not ranked stay at the bottom.
import { fmt } from "./format";
import { patchChildren, setText } from "./patch";

export interface SortColumn<R> {
  key: string;
  heading: string;
  /** The value sorted on (null: unknown, sorted last). */
  value: (row: R) => number | string | null;
  /** The cell text (default: the value, three significant figures). */
  text?: (row: R) => string;
  numeric?: boolean;
  /** Show the difference to the best (lowest) ranked value under each ranked value. */
  lowerIsBetter?: boolean;
}

export interface SortableOptions<R> {
  caption: string;
  /** Rows that take part in "best" and are kept above the others. */
  ranked: (row: R) => boolean;
  rowId: (row: R) => string;
  /** The column sorted first. */
  sortKey?: string;
}

function cellText<R>(column: SortColumn<R>, row: R): string {
  if (column.text) return column.text(row);
  const v = column.value(row);
  return v === null ? "–" : typeof v === "number" ? fmt.sig3(v) : v;
}

function compare(a: number | string | null, b: number | string | null): number {
  if (a === null || b === null) return a === b ? 0 : a === null ? 1 : -1;
  return typeof a === "number" && typeof b === "number" ? a - b : String(a).localeCompare(String(b));
}

/** A sortable table that stays on the page while its rows change (see liveSortableTable). */
export interface LiveSortableTable<R> {
  element: HTMLTableElement;
  /** Shows these rows and columns, in the order the reader last chose (else `sortKey`). */
  update(rows: readonly R[], columns: readonly SortColumn<R>[], options: SortableOptions<R>): void;
}

/** The best (lowest) ranked value of each `lowerIsBetter` column. */
function bestValues<R>(rows: readonly R[], columns: readonly SortColumn<R>[], options: SortableOptions<R>): Map<string, number> {
  const best = new Map<string, number>();
  for (const c of columns) {
    if (!c.lowerIsBetter) continue;
    const values = rows.filter(options.ranked).map(c.value).filter((v): v is number => typeof v === "number" && Number.isFinite(v));
    if (values.length > 0) best.set(c.key, Math.min(...values));
  }
  return best;
}

/**
 * A sortable table kept on the page across updates (issue 14, "a slider that keeps up"): each
 * update writes only the cells, texts and marks that changed (patchChildren), so a slider step's
 * new results are not styled, laid out and painted as a new table, and the column the reader
 * sorted by stays chosen. The headings' buttons hold no data: one listener on the table reads the
 * clicked column's key and sorts the rows shown now.
 */
export function liveSortableTable<R>(): LiveSortableTable<R> {
  const table = document.createElement("table");
  table.className = "sortable";
  const caption = document.createElement("caption");
  const thead = document.createElement("thead");
  const headRow = document.createElement("tr");
  const tbody = document.createElement("tbody");
  thead.append(headRow);
  table.append(caption, thead, tbody);
  let shown: { rows: readonly R[]; columns: readonly SortColumn<R>[]; options: SortableOptions<R> } | null = null;
  let sort: { key: string; ascending: boolean } | null = null;
  const render = () => {
    if (!shown) return;
    const { rows, columns, options } = shown;
    const current = sort ?? { key: options.sortKey ?? columns[0]?.key ?? "", ascending: true };
    const column = columns.find((c) => c.key === current.key) ?? columns[0];
    const sorted = [...rows].sort((a, b) => {
      const rank = Number(options.ranked(b)) - Number(options.ranked(a));
      if (rank !== 0 || !column) return rank;
      const order = compare(column.value(a), column.value(b));
      return current.ascending ? order : -order;
    });
    const best = bestValues(rows, columns, options);
    setText(caption, options.caption);
    patchChildren(headRow, columns.map((c) => heading(c, c.key === column?.key ? (current.ascending ? "ascending" : "descending") : null)));
    patchChildren(tbody, sorted.map((row) => bodyRow(row, columns, options, best)));
  };
  table.addEventListener("click", (event) => {
    const key = (event.target as Element | null)?.closest?.("th button.sort")?.closest("th")?.dataset.key;
    if (!key || !shown) return;
    const now = sort ?? { key: shown.options.sortKey ?? shown.columns[0]?.key ?? "", ascending: true };
    sort = { key, ascending: key === now.key ? !now.ascending : true };
    render();
  });
  return {
    element: table,
    update(rows, columns, options) {
      shown = { rows, columns, options };
      // a chosen column that is gone (a material no scheme uses any more) gives way to the default
      if (sort && !columns.some((c) => c.key === sort?.key)) sort = null;
      render();
    },
  };
}

/** The table, sorted by `sortKey` ascending at first; re-sorts in place when a heading is clicked. */
export function sortableTable<R>(rows: readonly R[], columns: readonly SortColumn<R>[], options: SortableOptions<R>): HTMLTableElement {
  const live = liveSortableTable<R>();
  live.update(rows, columns, options);
  return live.element;
}

function heading<R>(column: SortColumn<R>, direction: "ascending" | "descending" | null): HTMLTableCellElement {
  const th = document.createElement("th");
  th.scope = "col";
  th.dataset.key = column.key;
  if (column.numeric) th.className = "num";
  if (direction) th.setAttribute("aria-sort", direction);
  const button = document.createElement("button");
  button.type = "button";
  button.className = "sort";
  button.textContent = column.heading;
  const mark = document.createElement("span");
  mark.setAttribute("aria-hidden", "true");
  mark.textContent = direction === "ascending" ? " ▲" : direction === "descending" ? " ▼" : "";
  button.append(mark);
  button.title = `Sort by ${column.heading}`;
  th.append(button);
  return th;
}

function bodyRow<R>(row: R, columns: readonly SortColumn<R>[], options: SortableOptions<R>, best: ReadonlyMap<string, number>): HTMLTableRowElement {
  const tr = document.createElement("tr");
  tr.dataset.id = options.rowId(row);
  const ranked = options.ranked(row);
  if (!ranked) tr.className = "not-ranked";
  for (const c of columns) {
    const td = document.createElement("td");
    if (c.numeric) td.className = "num";
    td.textContent = cellText(c, row);
    const b = best.get(c.key);
    const v = c.value(row);
    if (ranked && b !== undefined && typeof v === "number") {
      const diff = document.createElement("span");
      diff.className = "vs-best";
      const text = fmt.versusBest(v, b);
      diff.textContent = text;
      if (text === "best") td.dataset.best = "true";
      td.append(diff);
    }
    tr.append(td);
  }
  return tr;
}
