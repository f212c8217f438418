// The brief's roof section drawn from its pixel outline (src/charts/section-outline.ts) as the
// same figure a Plot chart makes (title, SVG, caption, save buttons), without Plot's layout work
// on every step of the span slider (issue 14).
import type { SectionOutline, OutlineMark } from "../charts/section-outline";
import { withSaveTools } from "./chart";

const SVG_NS = "http://www.w3.org/2000/svg";

function el<K extends keyof SVGElementTagNameMap>(tag: K, attrs: Record<string, string | number>, text?: string): SVGElementTagNameMap[K] {
  const node = document.createElementNS(SVG_NS, tag);
  for (const [k, v] of Object.entries(attrs)) node.setAttribute(k, String(v));
  if (text !== undefined) node.textContent = text;
  return node;
}

function markElement(mark: OutlineMark): SVGElement {
  switch (mark.kind) {
    case "rect":
      return el("rect", { x: mark.x, y: mark.y, width: mark.width, height: mark.height, fill: mark.fill, "fill-opacity": mark.opacity });
    case "path":
      // lines on the half pixel, as Plot draws them, so a 1 px line is sharp
      return el("path", { d: mark.d, fill: "none", stroke: mark.stroke, "stroke-width": mark.width, "stroke-linejoin": "round", "stroke-linecap": "round", transform: "translate(0.5,0.5)", ...(mark.dash ? { "stroke-dasharray": mark.dash } : {}) });
    case "text":
      return el("text", { x: mark.x + 0.5, y: mark.y + 0.5, dy: "0.32em", fill: mark.fill }, mark.text);
  }
}

/** The axes: tick marks, tick labels, axis labels and the floor line, placed as Plot places them. */
function axes(o: SectionOutline): SVGElement[] {
  const { left, right, top, bottom } = o.frame;
  const tickMarks = [...o.yTicks.map((t) => `M${left},${t.at + 0.5}h-6`), ...o.xTicks.map((t) => `M${t.at + 0.5},${bottom}v6`)].join("");
  const yLabels = el("g", { "text-anchor": "end", "font-variant": "tabular-nums", "aria-label": "y-axis tick label" });
  yLabels.append(...o.yTicks.map((t) => el("text", { x: left - 8.5, y: t.at + 0.5, dy: "0.32em" }, t.label)));
  const xLabels = el("g", { "font-variant": "tabular-nums", "aria-label": "x-axis tick label" });
  xLabels.append(...o.xTicks.map((t) => el("text", { x: t.at + 0.5, y: bottom + 9.5, dy: "0.71em" }, t.label)));
  return [
    el("path", { d: tickMarks, fill: "none", stroke: "currentColor", "aria-hidden": "true" }),
    yLabels,
    el("text", { x: left - 46.5, y: top - 16.5, dy: "0.71em", "text-anchor": "start", "aria-label": "y-axis label" }, o.yLabel),
    xLabels,
    el("text", { x: right + 17.5, y: bottom + 27.5, "text-anchor": "end", "aria-label": "x-axis label" }, o.xLabel),
    el("path", { d: `M${left},${bottom + 0.5}H${right}`, stroke: "currentColor", "aria-label": "rule" }),
  ];
}

/** The outline as a figure like chartFigure's: h2 title, the SVG, the caption, and the save buttons. */
export function outlineFigure(o: SectionOutline, filename: string): HTMLElement {
  const svg = el("svg", { width: o.width, height: o.height, viewBox: `0 0 ${o.width} ${o.height}`, fill: "currentColor", "font-family": "system-ui, sans-serif", "font-size": 10, "text-anchor": "middle", style: "display: block; height: auto; max-width: 100%;" });
  svg.append(...axes(o), ...o.marks.map(markElement));
  const figure = document.createElement("figure");
  const title = document.createElement("h2");
  title.textContent = o.title;
  const caption = document.createElement("figcaption");
  caption.textContent = o.caption;
  figure.append(title, svg, caption);
  return withSaveTools(figure, o.title, o.caption, filename);
}
