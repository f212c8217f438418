import * as Plot from "@observablehq/plot";
import { downloadBlob, downloadText } from "./download";
import { figureSvg } from "./figure-svg";

/** The SVG of a rendered chart as standalone text (with the xmlns a file needs). */
export function svgText(svg: SVGSVGElement): string {
  const copy = svg.cloneNode(true) as SVGSVGElement;
  copy.setAttribute("xmlns", "http://www.w3.org/2000/svg");
  copy.setAttribute("xmlns:xlink", "http://www.w3.org/1999/xlink");
  return new XMLSerializer().serializeToString(copy);
}

/** Renders an SVG to PNG at `scale` times its size (browser only). */
export async function svgToPng(svg: SVGSVGElement, scale = 2): Promise<Blob> {
  const width = Number(svg.getAttribute("width")) || svg.clientWidth || 640;
  const height = Number(svg.getAttribute("height")) || svg.clientHeight || 400;
  const image = new Image();
  const url = URL.createObjectURL(new Blob([svgText(svg)], { type: "image/svg+xml" }));
  try {
    await new Promise<void>((resolve, reject) => {
      image.onload = () => resolve();
      image.onerror = () => reject(new Error("the chart could not be rendered to PNG"));
      image.src = url;
    });
    const canvas = document.createElement("canvas");
    canvas.width = width * scale;
    canvas.height = height * scale;
    const context = canvas.getContext("2d");
    if (!context) throw new Error("no 2D canvas in this browser");
    context.fillStyle = "#fff";
    context.fillRect(0, 0, canvas.width, canvas.height);
    context.drawImage(image, 0, 0, canvas.width, canvas.height);
    return await new Promise<Blob>((resolve, reject) => canvas.toBlob((b) => (b ? resolve(b) : reject(new Error("PNG encoding failed"))), "image/png"));
  } finally {
    URL.revokeObjectURL(url);
  }
}

/** Gives the chart's own SVG (the last one in the figure; the first are legend swatches) a <title> and a <desc>. */
function nameChart(rendered: Element, name: string, description: string): void {
  const svgs = rendered instanceof SVGSVGElement ? [rendered] : [...rendered.querySelectorAll(":scope > svg")];
  const svg = svgs[svgs.length - 1];
  if (!svg) return;
  const ns = "http://www.w3.org/2000/svg";
  const title = document.createElementNS(ns, "title");
  title.textContent = name;
  const desc = document.createElementNS(ns, "desc");
  desc.textContent = description;
  svg.prepend(title, desc);
  svg.setAttribute("role", "img");
  svg.setAttribute("aria-label", name);
}

function saveButton(kind: "svg" | "png", name: string, onClick: () => void): HTMLButtonElement {
  const button = document.createElement("button");
  button.type = "button";
  button.textContent = `Save ${kind.toUpperCase()}`;
  button.className = `save-${kind}`;
  // The button says which chart it saves (issue 14).
  button.setAttribute("aria-label", `Save the chart “${name}” as ${kind.toUpperCase()}`);
  button.title = `Save “${name}” as ${kind.toUpperCase()}`;
  button.addEventListener("click", onClick);
  return button;
}

/**
 * Renders Plot options (with title and caption) as a figure with "SVG" and "PNG" save buttons
 * that name the chart; the chart carries an accessible name and description (<title>, <desc>)
 * from `ariaLabel` / `ariaDescription` (or the title and caption).
 * @param filename base name of the saved files, without extension
 */
export function chartFigure(options: Plot.PlotOptions, filename: string): HTMLElement {
  const rendered = Plot.plot(options);
  const name = options.ariaLabel ?? (typeof options.title === "string" ? options.title : filename);
  return withSaveTools(rendered, name, options.ariaDescription ?? (typeof options.caption === "string" ? options.caption : name), filename);
}

/**
 * A rendered chart (Plot's figure or SVG, or a figure built the same way: h2, svg, figcaption)
 * named for assistive technology and wrapped with its "SVG" and "PNG" save buttons.
 */
export function withSaveTools(rendered: HTMLElement | SVGSVGElement, name: string, description: string, filename: string): HTMLElement {
  nameChart(rendered, name, description);
  const wrap = document.createElement("div");
  wrap.className = "figure";
  wrap.append(rendered);
  // Saved files hold the whole figure (title, legends, plot, caption, caution) as one SVG, made at
  // the moment of saving; the first <svg> inside a figure is a legend swatch, not the chart.
  if (rendered.querySelector("svg") || rendered instanceof SVGSVGElement) {
    const tools = document.createElement("div");
    tools.className = "chart-tools";
    tools.append(
      saveButton("svg", name, () => downloadText(`${filename}.svg`, svgText(figureSvg(rendered)), "image/svg+xml")),
      saveButton("png", name, () => void svgToPng(figureSvg(rendered)).then((png) => downloadBlob(`${filename}.png`, png))),
    );
    wrap.append(tools);
  }
  return wrap;
}
