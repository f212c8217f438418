// One standalone SVG of a whole Plot figure: title, subtitle, legends, the plot, caption and the
// caution, laid out top to bottom at the plot's own width. Plot puts a titled or legended chart in
// an HTML <figure> (h2, h3, legend divs or ramp SVGs, the plot SVG, figcaption); a file must hold
// all of it, so the HTML parts are redrawn as SVG text and swatches here (browser only).
import { CAUTION } from "./pages";

const SVG_NS = "http://www.w3.org/2000/svg";
const PAD = 12;
const FONT_FAMILY = "system-ui, -apple-system, 'Segoe UI', sans-serif";

/** Width of a text in px at a font (CSS shorthand); a canvas measures it, else an estimate. */
export type TextMeasure = (text: string, font: string, sizePx: number) => number;

type TextStyle = { sizePx: number; weight: number; fill: string };

let canvasContext: CanvasRenderingContext2D | null | undefined;

/** Measures with a 2D canvas; where there is none, 0.55 em per character (an over-estimate for most faces). */
export const measureText: TextMeasure = (text, font, sizePx) => {
  if (canvasContext === undefined) {
    try {
      canvasContext = typeof document === "undefined" ? null : document.createElement("canvas").getContext("2d");
    } catch {
      canvasContext = null;
    }
  }
  if (!canvasContext) return text.length * sizePx * 0.55;
  canvasContext.font = font;
  return canvasContext.measureText(text).width;
};

/** Breaks text into lines no wider than `width` (a word longer than the width gets a line to itself). */
export function wrapText(text: string, width: number, style: TextStyle, measure: TextMeasure = measureText): string[] {
  const font = `${style.weight} ${style.sizePx}px ${FONT_FAMILY}`;
  const lines: string[] = [];
  let line = "";
  for (const word of text.split(/\s+/).filter((w) => w !== "")) {
    const candidate = line === "" ? word : `${line} ${word}`;
    if (line !== "" && measure(candidate, font, style.sizePx) > width) {
      lines.push(line);
      line = word;
    } else {
      line = candidate;
    }
  }
  if (line !== "") lines.push(line);
  return lines;
}

function svgEl<K extends keyof SVGElementTagNameMap>(doc: Document, tag: K, attrs: Record<string, string | number>): SVGElementTagNameMap[K] {
  const el = doc.createElementNS(SVG_NS, tag);
  for (const [k, v] of Object.entries(attrs)) el.setAttribute(k, String(v));
  return el;
}

/** Appends wrapped text at y (top of the block); returns the height used. */
function textBlock(out: SVGSVGElement, text: string, y: number, width: number, style: TextStyle, measure: TextMeasure): number {
  const lineHeight = Math.round(style.sizePx * 1.3);
  const lines = wrapText(text, width, style, measure);
  const doc = out.ownerDocument;
  lines.forEach((line, k) => {
    const t = svgEl(doc, "text", { x: PAD, y: y + lineHeight * k + style.sizePx, "font-family": FONT_FAMILY, "font-size": style.sizePx, "font-weight": style.weight, fill: style.fill });
    t.textContent = line;
    out.append(t);
  });
  return lines.length * lineHeight;
}

/** A copy of an SVG placed at (x, y) inside the output, with its own width and height. */
function placeSvg(out: SVGSVGElement, svg: SVGSVGElement, x: number, y: number): { width: number; height: number } {
  const copy = svg.cloneNode(true) as SVGSVGElement;
  const width = Number(svg.getAttribute("width")) || svg.clientWidth || 640;
  const height = Number(svg.getAttribute("height")) || svg.clientHeight || 400;
  copy.setAttribute("x", String(x));
  copy.setAttribute("y", String(y));
  copy.setAttribute("width", String(width));
  copy.setAttribute("height", String(height));
  copy.removeAttribute("style");
  out.append(copy);
  return { width, height };
}

/** Swatch legend (a div of swatch items, each a small SVG and a label), flowed in rows; returns the height used. */
function swatchLegend(out: SVGSVGElement, legend: Element, y: number, width: number, measure: TextMeasure): number {
  const sizePx = 10;
  const font = `400 ${sizePx}px ${FONT_FAMILY}`;
  const items = [...legend.children].filter((c) => c.querySelector(":scope > svg"));
  let x = PAD;
  let row = 0;
  const rowHeight = 18;
  for (const item of items) {
    const swatch = item.querySelector(":scope > svg") as SVGSVGElement;
    const label = (item.textContent ?? "").trim();
    const swatchWidth = Number(swatch.getAttribute("width")) || 15;
    const itemWidth = swatchWidth + 5 + measure(label, font, sizePx) + 10;
    if (x > PAD && x + itemWidth > width + PAD) {
      x = PAD;
      row += 1;
    }
    const top = y + row * rowHeight;
    const placed = placeSvg(out, swatch, x, top + (rowHeight - (Number(swatch.getAttribute("height")) || 15)) / 2);
    const t = svgEl(out.ownerDocument, "text", { x: x + placed.width + 5, y: top + rowHeight / 2 + sizePx * 0.35, "font-family": FONT_FAMILY, "font-size": sizePx, fill: "#1b1f24" });
    t.textContent = label;
    out.append(t);
    x += itemWidth;
  }
  return items.length > 0 ? (row + 1) * rowHeight + 6 : 0;
}

/**
 * The whole figure as one SVG element: title (h2), subtitle (h3), legends, the plot, the caption
 * (figcaption) and the page's caution, each at the plot's width. A bare plot SVG (no figure) gets
 * the caution too.
 */
export function figureSvg(figure: Element, measure: TextMeasure = measureText): SVGSVGElement {
  const doc = figure.ownerDocument;
  const children = figure instanceof SVGSVGElement || figure.tagName.toLowerCase() === "svg" ? [figure] : [...figure.children];
  const plots = children.filter((c) => c.tagName.toLowerCase() === "svg");
  const main = plots[plots.length - 1] as SVGSVGElement | undefined;
  const width = (main && Number(main.getAttribute("width"))) || 640;
  const out = svgEl(doc, "svg", {});
  out.append(svgEl(doc, "rect", { x: 0, y: 0, width: "100%", height: "100%", fill: "#fff" }));
  let y = PAD;
  for (const child of children) {
    const tag = child.tagName.toLowerCase();
    const text = (child.textContent ?? "").trim();
    if (tag === "h2" && text) y += textBlock(out, text, y, width, { sizePx: 15, weight: 600, fill: "#1b1f24" }, measure) + 6;
    else if (tag === "h3" && text) y += textBlock(out, text, y, width, { sizePx: 12, weight: 400, fill: "#1b1f24" }, measure) + 6;
    else if (tag === "svg") y += placeSvg(out, child as SVGSVGElement, PAD, y).height + 6;
    else if (tag === "figcaption" && text) y += textBlock(out, text, y, width, { sizePx: 11, weight: 400, fill: "#3d4450" }, measure) + 4;
    else if (tag === "div") y += swatchLegend(out, child, y, width, measure);
  }
  y += textBlock(out, CAUTION, y + 2, width, { sizePx: 10, weight: 400, fill: "#8a5a00" }, measure) + 2 + PAD;
  out.setAttribute("width", String(width + 2 * PAD));
  out.setAttribute("height", String(Math.ceil(y)));
  out.setAttribute("viewBox", `0 0 ${width + 2 * PAD} ${Math.ceil(y)}`);
  out.setAttribute("font-family", FONT_FAMILY);
  return out;
}
