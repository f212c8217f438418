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

/**
 * Renders Plot options (with title and caption) as a figure with "SVG" and "PNG" save buttons.
 * @param filename base name of the saved files, without extension
 */
export function chartFigure(options: Plot.PlotOptions, filename: string): HTMLElement {
  const rendered = Plot.plot(options);
  const wrap = document.createElement("div");
  wrap.className = "figure";
  wrap.append(rendered);
  // Saved files hold the whole figure (title, legends, plot, caption, caution) as one SVG, made at
  // the moment of saving; the first <svg> inside a figure is a legend swatch, not the chart.
  if (rendered.querySelector("svg") || rendered instanceof SVGSVGElement) {
    const tools = document.createElement("div");
    tools.className = "chart-tools";
    const saveSvg = document.createElement("button");
    saveSvg.type = "button";
    saveSvg.textContent = "Save SVG";
    saveSvg.className = "save-svg";
    saveSvg.addEventListener("click", () => downloadText(`${filename}.svg`, svgText(figureSvg(rendered)), "image/svg+xml"));
    const savePng = document.createElement("button");
    savePng.type = "button";
    savePng.textContent = "Save PNG";
    savePng.className = "save-png";
    savePng.addEventListener("click", async () => downloadBlob(`${filename}.png`, await svgToPng(figureSvg(rendered))));
    tools.append(saveSvg, savePng);
    wrap.append(tools);
  }
  return wrap;
}
