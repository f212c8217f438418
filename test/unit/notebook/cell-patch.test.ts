// @vitest-environment happy-dom
// Cells that redraw without rebuilding (issue 14, "a slider that keeps up"): a patched cell keeps
// its nodes and writes only the texts and attributes that changed; no cell rewrites its class when
// its state did not change, nor re-inserts content it already shows. Mutation records count what
// was written, as the browser would have to style, lay out and paint it.
import { describe, it, expect } from "vitest";
import { signal } from "@preact/signals-core";
import { reactiveCell } from "../../../src/notebook/cell";
import { keyValues } from "../../../src/notebook/key-values";
import { patchChildren } from "../../../src/notebook/patch";
import { numberControl } from "../../../src/notebook/controls";

/** Records every mutation under `root` until `act` returns; the records, after a microtask. */
async function mutations(root: Node, act: () => void): Promise<MutationRecord[]> {
  const seen: MutationRecord[] = [];
  const observer = new MutationObserver((list) => seen.push(...list));
  observer.observe(root, { subtree: true, childList: true, attributes: true, characterData: true, attributeOldValue: true });
  act();
  await Promise.resolve();
  seen.push(...observer.takeRecords());
  observer.disconnect();
  return seen;
}

describe("patchChildren", () => {
  it("keeps nodes of the same kind and writes only what differs", () => {
    const parent = document.createElement("div");
    parent.append(keyValues([["Span", "100 m"], ["Rise", "10 m"]]));
    const dl = parent.firstChild!;
    const rise = parent.querySelectorAll("dd")[1]!;
    const written = patchChildren(parent, [keyValues([["Span", "120 m"], ["Rise", "10 m"]])]);
    expect(parent.firstChild).toBe(dl);
    expect(parent.querySelectorAll("dd")[1]).toBe(rise);
    expect(parent.textContent).toBe("Span120 mRise10 m");
    expect(written).toBe(1); // the one text that changed
  });

  it("replaces what differs in kind, adds and removes children, and sets and removes attributes", () => {
    const parent = document.createElement("div");
    parent.innerHTML = `<p class="a" title="x">one</p><span>two</span><em>three</em>`;
    const first = parent.firstChild;
    const fresh = document.createElement("div");
    fresh.innerHTML = `<p class="b">one</p><b>two</b>`;
    patchChildren(parent, [...fresh.childNodes]);
    expect(parent.innerHTML).toBe(`<p class="b">one</p><b>two</b>`);
    expect(parent.firstChild).toBe(first);
    const more = document.createElement("div");
    more.innerHTML = `<p class="b">one</p><b>two</b><i>four</i>`;
    patchChildren(parent, [...more.childNodes]);
    expect(parent.innerHTML).toBe(`<p class="b">one</p><b>two</b><i>four</i>`);
  });

  it("patches SVG attributes in place (the brief's section)", () => {
    const ns = "http://www.w3.org/2000/svg";
    const svg = (d: string) => {
      const s = document.createElementNS(ns, "svg");
      const path = document.createElementNS(ns, "path");
      path.setAttribute("d", d);
      s.append(path);
      return s;
    };
    const parent = document.createElement("div");
    parent.append(svg("M0,0L10,10"));
    const path = parent.querySelector("path");
    patchChildren(parent, [svg("M0,0L20,5")]);
    expect(parent.querySelector("path")).toBe(path);
    expect(path?.getAttribute("d")).toBe("M0,0L20,5");
  });
});

describe("reactiveCell writes only what changed", () => {
  it("a patched cell's redraw with one new value changes one text node, no element", async () => {
    const host = document.createElement("div");
    const span = signal(100);
    const cell = reactiveCell(host, { id: "kv", patch: true }, () => keyValues([["Span", `${span.value} m`], ["Rise", "10 m"]]));
    const body = cell.element.querySelector(".cell-body")!;
    const records = await mutations(body, () => {
      span.value = 120;
    });
    expect(records.map((r) => r.type)).toEqual(["characterData"]);
    expect(body.textContent).toBe("Span120 mRise10 m");
    cell.dispose();
  });

  it("a cell without patch still replaces its content (the default is unchanged)", async () => {
    const host = document.createElement("div");
    const span = signal(100);
    const cell = reactiveCell(host, { id: "kv" }, () => keyValues([["Span", `${span.value} m`]]));
    const body = cell.element.querySelector(".cell-body")!;
    const before = body.firstChild;
    span.value = 120;
    expect(body.firstChild).not.toBe(before);
    expect(body.textContent).toBe("Span120 m");
    cell.dispose();
  });

  it("does not rewrite the cell's class when it neither failed nor recovered; does when it does", async () => {
    const host = document.createElement("div");
    const value = signal(1);
    const cell = reactiveCell(host, { id: "c", className: "answer" }, () => {
      if (value.value < 0) throw new Error("negative");
      return String(value.value);
    });
    const classWrites = (records: MutationRecord[]) => records.filter((r) => r.type === "attributes" && r.attributeName === "class" && r.target === cell.element);
    expect(classWrites(await mutations(cell.element, () => { value.value = 2; }))).toEqual([]);
    expect(classWrites(await mutations(cell.element, () => { value.value = -1; }))).toHaveLength(1);
    expect(cell.element.classList.contains("cell-failed")).toBe(true);
    expect(classWrites(await mutations(cell.element, () => { value.value = -2; }))).toEqual([]);
    expect(classWrites(await mutations(cell.element, () => { value.value = 3; }))).toHaveLength(1);
    expect(cell.element.className).toBe("cell answer");
    cell.dispose();
  });

  it("does not take out and put back the element it already shows (a grid of charts drawn in turns)", async () => {
    const host = document.createElement("div");
    const grid = document.createElement("div");
    grid.textContent = "charts";
    const tick = signal(0);
    const cell = reactiveCell(host, { id: "g" }, () => {
      void tick.value;
      return grid;
    });
    const body = cell.element.querySelector(".cell-body")!;
    const records = await mutations(body, () => {
      tick.value = 1;
    });
    expect(records.filter((r) => r.type === "childList")).toEqual([]);
    expect(body.firstChild).toBe(grid);
    expect(cell.element.dataset.renders).toBe("2");
    cell.dispose();
  });
});

describe("a number control's step writes only what changed", () => {
  it("a new value from elsewhere (the slider's twin) writes the field, not its class, message or aria-invalid", async () => {
    const value = signal(100);
    const root = document.createElement("div");
    root.append(numberControl({ value, set: (x: number) => { value.value = x; } }, { id: "span", label: "Span", unit: "m", min: 40, max: 400, step: 1 }));
    document.body.replaceChildren(root);
    const input = document.getElementById("span") as HTMLInputElement;
    const records = await mutations(root, () => {
      value.value = 120;
    });
    expect(input.value).toBe("120");
    expect(records.filter((r) => r.type !== "attributes" || r.attributeName !== "value").map((r) => `${r.type} ${r.attributeName ?? ""}`)).toEqual([]);
  });
});
