// @vitest-environment happy-dom
// The results table kept on the page while results change (issue 14): an update writes only what
// changed, keeps the column the reader sorted by, and the headings sort the rows shown now.
import { describe, it, expect } from "vitest";
import { liveSortableTable, type SortColumn, type SortableOptions } from "../../../src/notebook/sortable-table";

type Row = { id: string; a: number; b: number };
const columns: SortColumn<Row>[] = [
  { key: "id", heading: "Id", value: (r) => r.id },
  { key: "a", heading: "A", value: (r) => r.a, numeric: true, lowerIsBetter: true },
  { key: "b", heading: "B", value: (r) => r.b, numeric: true },
];
const options = (caption: string): SortableOptions<Row> => ({ caption, ranked: () => true, rowId: (r) => r.id, sortKey: "a" });
const ids = (table: HTMLTableElement) => [...table.querySelectorAll("tbody tr")].map((tr) => tr.getAttribute("data-id"));
const click = (table: HTMLTableElement, key: string) => table.querySelector<HTMLButtonElement>(`th[data-key="${key}"] button`)!.click();

describe("liveSortableTable", () => {
  it("updates in place: same rows and cells, new texts", () => {
    const live = liveSortableTable<Row>();
    live.update([{ id: "x", a: 1, b: 9 }, { id: "y", a: 2, b: 8 }], columns, options("at 100 m"));
    const firstRow = live.element.querySelector("tbody tr");
    const button = live.element.querySelector("th button");
    live.update([{ id: "x", a: 1.5, b: 9 }, { id: "y", a: 2, b: 8 }], columns, options("at 101 m"));
    expect(live.element.querySelector("tbody tr")).toBe(firstRow);
    expect(live.element.querySelector("th button")).toBe(button);
    expect(live.element.querySelector("caption")?.textContent).toBe("at 101 m");
    expect(firstRow?.children[1]?.firstChild?.textContent).toBe("1.5");
  });

  it("keeps the reader's sort across updates and sorts the rows shown now", () => {
    document.body.replaceChildren();
    const live = liveSortableTable<Row>();
    document.body.append(live.element);
    live.update([{ id: "x", a: 1, b: 9 }, { id: "y", a: 2, b: 8 }], columns, options("one"));
    expect(ids(live.element)).toEqual(["x", "y"]);
    click(live.element, "b");
    expect(ids(live.element)).toEqual(["y", "x"]);
    expect(live.element.querySelector('th[data-key="b"]')?.getAttribute("aria-sort")).toBe("ascending");
    // new values: still sorted by b, on the new values
    live.update([{ id: "x", a: 1, b: 1 }, { id: "y", a: 2, b: 8 }, { id: "z", a: 0, b: 5 }], columns, options("two"));
    expect(ids(live.element)).toEqual(["x", "z", "y"]);
    click(live.element, "b");
    expect(ids(live.element)).toEqual(["y", "z", "x"]);
    expect(live.element.querySelector('th[data-key="b"]')?.getAttribute("aria-sort")).toBe("descending");
    expect(live.element.querySelector('th[data-key="a"]')?.hasAttribute("aria-sort")).toBe(false);
  });

  it("falls back to its first sort when the chosen column is gone", () => {
    const live = liveSortableTable<Row>();
    live.update([{ id: "x", a: 2, b: 1 }, { id: "y", a: 1, b: 2 }], columns, options("one"));
    click(live.element, "b");
    expect(ids(live.element)).toEqual(["x", "y"]);
    live.update([{ id: "x", a: 2, b: 1 }, { id: "y", a: 1, b: 2 }], columns.slice(0, 2), options("two"));
    expect(ids(live.element)).toEqual(["y", "x"]);
    expect(live.element.querySelectorAll("thead th")).toHaveLength(2);
  });
});
