// The brief's roof section drawn directly (section-outline.ts, issue 14) must be the drawing the
// Plot section makes with the same brief and size: the same ticks at the same places, the same
// roof, usable floor and label. Plot renders here in happy-dom, as in chart-snapshots.test.ts.
import { describe, it, expect } from "vitest";
import { Window } from "happy-dom";
import * as Plot from "@observablehq/plot";
import { defaultStudy, setIn, type Brief } from "../../../src/study";
import { sectionChartOptions, sectionOutline } from "../../../src/charts";
import { expectAbsClose } from "../../helpers/close";

const window = new Window();
const document = window.document as unknown as Document;

/** Plot's drawing of the section, read back: ticks (label, px), the roof path, the usable rect, the label. */
function plotted(brief: Brief, width: number, height: number) {
  const figure = Plot.plot({ ...sectionChartOptions({ brief, title: "t", caption: "c", width, height }), document }) as unknown as HTMLElement;
  const svg = figure.querySelector("svg:last-of-type") ?? figure;
  const translate = (el: Element) => (el.getAttribute("transform") ?? "").match(/translate\(([^,]+),([^)]+)\)/)!.slice(1).map(Number) as [number, number];
  const ticks = (axis: "x" | "y") => [...svg.querySelectorAll(`g[aria-label="${axis}-axis tick label"] text`)].map((t) => ({ label: t.textContent, at: translate(t)[axis === "x" ? 0 : 1] }));
  const rect = svg.querySelector('g[aria-label="rect"] rect')!;
  return {
    xTicks: ticks("x"),
    yTicks: ticks("y"),
    roof: svg.querySelector('g[aria-label="line"][stroke="#1b1f24"] path')!.getAttribute("d"),
    rect: ["x", "y", "width", "height"].map((k) => Number(rect.getAttribute(k))),
    label: svg.querySelector('g[aria-label="text"] text')!.textContent,
  };
}

const base = defaultStudy().brief;
const briefs: [string, Brief][] = [
  ["the default brief", base],
  ["a 40 m span, 6 m rise", setIn(setIn(base, ["riseM"], 6), ["spanM"], 40)],
  ["a 121 m span (a step of the slider)", setIn(base, ["spanM"], 121)],
  ["a 300 m span, 45 m rise, 20 m clear", setIn(setIn(setIn(base, ["spanM"], 300), ["riseM"], 45), ["minClearHeightM"], 20)],
];

describe("the brief's roof section outline", () => {
  it.each(briefs)("draws what the Plot section draws: %s", (_name, brief) => {
    for (const [width, height] of [[400, 240], [620, 300]] as const) {
      const plot = plotted(brief, width, height);
      const outline = sectionOutline({ brief, title: "t", caption: "c", width, height });
      expect(outline.xTicks.map((t) => t.label)).toEqual(plot.xTicks.map((t) => t.label));
      expect(outline.yTicks.map((t) => t.label)).toEqual(plot.yTicks.map((t) => t.label));
      outline.xTicks.forEach((t, k) => expectAbsClose(t.at, plot.xTicks[k]!.at, 1e-9));
      outline.yTicks.forEach((t, k) => expectAbsClose(t.at, plot.yTicks[k]!.at, 1e-9));
      const roof = outline.marks.find((m) => m.kind === "path" && m.stroke === "#1b1f24");
      expect(roof?.kind === "path" ? roof.d : null).toBe(plot.roof);
      const rect = outline.marks.find((m) => m.kind === "rect");
      if (rect?.kind !== "rect") throw new Error("no usable floor drawn");
      [rect.x, rect.y, rect.width, rect.height].forEach((v, k) => expectAbsClose(v, plot.rect[k]!, 1e-9));
      const label = outline.marks.find((m) => m.kind === "text");
      expect(label?.kind === "text" ? label.text : null).toBe(plot.label);
    }
  });
});

describe("a scheme's section without the brief's roof", () => {
  const brief = defaultStudy().brief;
  const flat = [{ role: "top chord", points: [[-80, 20], [80, 20]] as const }];
  it("leaves out the brief's roof line only when the scheme's own members are drawn", () => {
    const lines = (o: Plot.PlotOptions) => (o.marks ?? []).length;
    const withRoof = sectionChartOptions({ brief, lines: flat, title: "t", caption: "c" });
    const without = sectionChartOptions({ brief, lines: flat, title: "t", caption: "c", briefRoof: false });
    // the roof line and its label
    expect(lines(without)).toBe(lines(withRoof) - 2);
    // with nothing of the scheme's to draw, the brief's roof stays: the drawing is never empty
    expect(lines(sectionChartOptions({ brief, lines: [], title: "t", caption: "c", briefRoof: false }))).toBe(lines(sectionChartOptions({ brief, lines: [], title: "t", caption: "c" })));
  });
});
