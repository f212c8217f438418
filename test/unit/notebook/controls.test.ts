// @vitest-environment happy-dom
// Issue 11 item 5: the controls are components with lifetimes — while mounted a control follows its
// binding; taken off the page (its cell redrawn, its tree unmounted) it follows nothing more.
import { describe, expect, it } from "vitest";
import { signal } from "@preact/signals-core";
import { numberControl, selectControl, toggleControl, unmountWithin } from "../../../src/notebook/controls";
import { reactiveCell } from "../../../src/notebook/cell";

function numberBinding(initial: number) {
  const value = signal(initial);
  let sets = 0;
  return { value, set: (x: number) => ((value.value = x), (sets += 1)), sets: () => sets };
}

describe("controls as components", () => {
  it("follow their binding while mounted and stop once unmounted", () => {
    const b = numberBinding(60);
    const root = document.createElement("div");
    root.append(numberControl(b, { id: "span", label: "Span", unit: "m", min: 40, max: 400, step: 5 }));
    document.body.replaceChildren(root);
    const input = document.getElementById("span") as HTMLInputElement;
    expect(input.value).toBe("60");
    b.value.value = 80;
    expect(input.value).toBe("80");
    unmountWithin(root);
    b.value.value = 120;
    expect(input.value).toBe("80"); // no effect left behind
  });

  it("an unmounted field no longer writes to its binding", () => {
    const b = numberBinding(60);
    const root = document.createElement("div");
    const control = numberControl(b, { id: "rise", label: "Rise", unit: "m", min: 0, max: 100, step: 1 });
    root.append(control);
    document.body.replaceChildren(root);
    const input = document.getElementById("rise") as HTMLInputElement;
    unmountWithin(root);
    input.value = "30";
    input.dispatchEvent(new Event("input"));
    expect(b.sets()).toBe(0);
    expect(b.value.value).toBe(60);
  });

  it("a reactive cell unmounts the controls of its last drawing before it redraws", () => {
    const choice = signal("a");
    const flag = signal(false);
    const redraw = signal(0);
    let built = 0;
    const root = document.createElement("div");
    document.body.replaceChildren(root);
    reactiveCell(root, { id: "t" }, () => {
      void redraw.value;
      built += 1;
      const wrap = document.createElement("div");
      wrap.append(
        selectControl({ value: choice, set: (v) => (choice.value = v) }, { id: `sel-${built}`, label: "Choice", choices: [{ value: "a", label: "A" }, { value: "b", label: "B" }] }),
        toggleControl({ value: flag, set: (v) => (flag.value = v) }, { id: `tog-${built}`, label: "Flag" }),
      );
      return wrap;
    });
    const first = document.getElementById("sel-1") as HTMLSelectElement;
    redraw.value = 1; // the cell redraws: the first select leaves the page
    expect(document.getElementById("sel-1")).toBeNull();
    choice.value = "b";
    expect(first.value).toBe("a"); // the old one is unmounted: it no longer follows
    expect((document.getElementById("sel-2") as HTMLSelectElement).value).toBe("b");
    flag.value = true;
    expect((document.getElementById("tog-2") as HTMLInputElement).checked).toBe(true);
  });

  it("a refused choice is put back and named", () => {
    const choice = signal("a");
    const root = document.createElement("div");
    root.append(selectControl({ value: choice, set: (v) => (choice.value = v), check: (v) => (v === "b" ? "b is not allowed here" : null) }, { id: "pick", label: "Pick", choices: [{ value: "a", label: "A" }, { value: "b", label: "B" }] }));
    document.body.replaceChildren(root);
    const select = document.getElementById("pick") as HTMLSelectElement;
    select.value = "b";
    select.dispatchEvent(new Event("change"));
    expect(select.value).toBe("a");
    expect(choice.value).toBe("a");
    expect(document.getElementById("pick-message")?.textContent).toBe("Pick: b is not allowed here — not applied");
  });
});
