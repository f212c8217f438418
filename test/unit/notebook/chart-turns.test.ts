// @vitest-environment happy-dom
// Charts drawn one per turn into their own slots (issues 13/14): a chart that fails shows its error
// in its own slot, a newer set drops the older set's undrawn charts, and `data-drawn` counts only
// finished sets.
import { describe, it, expect, vi, afterEach } from "vitest";
import { chartTurns } from "../../../src/notebook/chart-turns";

afterEach(() => {
  vi.useRealTimers();
});

const figure = (text: string) => () => {
  const p = document.createElement("p");
  p.textContent = text;
  return p;
};
const slots = (grid: HTMLElement) => [...grid.children].map((slot) => slot.textContent);

describe("chartTurns", () => {
  it("draws one chart per turn into its slot, an error in its own slot, then counts the set", () => {
    vi.useFakeTimers();
    const cell = document.createElement("section");
    const charts = chartTurns(3);
    charts.draw([figure("a"), () => { throw new Error("no data for b"); }, figure("c")], () => cell);
    expect(slots(charts.grid)).toEqual(["", "", ""]);
    vi.advanceTimersByTime(20); // one frame (16 ms) and the task after it: one turn
    expect(slots(charts.grid)).toEqual(["a", "", ""]);
    vi.runAllTimers();
    expect(slots(charts.grid)[0]).toBe("a");
    expect(slots(charts.grid)[1]).toMatch(/no data for b/);
    expect(slots(charts.grid)[2]).toBe("c");
    expect(cell.dataset.drawn).toBe("1");
  });

  it("a newer set drops what the older had not drawn; the older drawings stay until replaced", () => {
    vi.useFakeTimers();
    const cell = document.createElement("section");
    const charts = chartTurns(2);
    charts.draw([figure("old a"), figure("old b")], () => cell);
    vi.advanceTimersByTime(20); // one frame (16 ms) and the task after it: one turn
    charts.draw([figure("new a"), figure("new b")], () => cell);
    expect(slots(charts.grid)).toEqual(["old a", ""]);
    vi.runAllTimers();
    expect(slots(charts.grid)).toEqual(["new a", "new b"]);
    expect(cell.dataset.drawn).toBe("1");
  });
});
