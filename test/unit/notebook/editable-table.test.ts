// @vitest-environment happy-dom
// The editable table is a component tree: a row's cells subscribe while the row is shown and stop
// when it goes (issue 11 item 5: the old risk-inputs editor created effects per row inside a table
// an outer effect rebuilt, and never disposed them).
import { describe, it, expect } from "vitest";
import { signal } from "@preact/signals-core";
import { mountEditableTable, unmountEditableTable, type EditOutcome } from "../../../src/notebook/editable-table";

type Row = { id: string; x: number };

function setup() {
  const rows = signal<Row[]>([{ id: "a", x: 1 }, { id: "b", x: 2 }, { id: "c", x: 3 }]);
  const outside = signal(0);
  const calls = new Map<string, number>();
  const parent = document.createElement("div");
  document.body.append(parent);
  const edit = (key: string, _field: string, text: string): EditOutcome => {
    const x = Number(text);
    if (!(x >= 0)) return { ok: false, message: `x ${JSON.stringify(text)} (expected a number ≥ 0)` };
    rows.value = rows.peek().map((r) => (r.id === key ? { ...r, x } : r));
    return { ok: true, value: x };
  };
  mountEditableTable<Row>(parent, {
    tableId: "t",
    rows,
    keyOf: (r) => r.id,
    columns: [
      { field: "id", label: "id", kind: "text", readOnly: true },
      { field: "x", label: "x", kind: "number" },
      {
        field: "twice",
        label: "twice + outside",
        kind: "computed",
        show: (r) => {
          calls.set(r.id, (calls.get(r.id) ?? 0) + 1);
          return String(2 * r.x + outside.value);
        },
      },
    ],
    keyField: "id",
    cellId: (key, _i, field) => `t-${key}-${field}`,
    cellLabel: (r, c) => `${c.label} of ${r.id}`,
    edit,
    messages: "cell",
    rowAttributes: (key) => ({ "data-key": key }),
  });
  return { rows, outside, calls, parent };
}

const flush = () => new Promise((resolve) => setTimeout(resolve, 0));

describe("mountEditableTable", () => {
  it("a removed row's cells stop listening: a later change re-renders only the rows shown", async () => {
    const { rows, outside, calls, parent } = setup();
    rows.value = rows.peek().filter((r) => r.id !== "b");
    await flush();
    calls.clear();
    outside.value = 10;
    await flush();
    expect(calls.get("a")).toBe(1);
    expect(calls.get("c")).toBe(1);
    expect(calls.has("b")).toBe(false);
    expect(parent.querySelector("#t-a-twice")?.textContent).toBe("12");
    unmountEditableTable(parent);
    calls.clear();
    outside.value = 20;
    await flush();
    expect(calls.size).toBe(0);
  });

  it("an invalid entry keeps its text and message and applies nothing; a valid one applies", async () => {
    const { rows, parent } = setup();
    const input = parent.querySelector("#t-b-x") as HTMLInputElement;
    input.value = "-4";
    input.dispatchEvent(new Event("input", { bubbles: true }));
    await flush();
    expect(rows.peek()[1]?.x).toBe(2);
    expect(parent.querySelector("#t-b-x-message")?.textContent).toBe('x: x "-4" (expected a number ≥ 0) — not applied; in force: 2');
    expect((parent.querySelector("#t-b-x") as HTMLInputElement).value).toBe("-4");
    input.value = "5";
    input.dispatchEvent(new Event("input", { bubbles: true }));
    await flush();
    expect(rows.peek()[1]?.x).toBe(5);
    expect(parent.querySelector("#t-b-x-message")?.textContent).toBe("");
    expect(parent.querySelector("#t-b-twice")?.textContent).toBe("10");
  });
});
