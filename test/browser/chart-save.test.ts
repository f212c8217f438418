// Issue 10, item 11: "Save SVG" and "Save PNG" saved the first legend swatch (a 30 × 30 square) for
// every chart with a legend. Every chart on every page is saved here through a real download, and
// each file is checked: it is one SVG (or PNG) of the whole figure — title, legend labels, every
// mark group of the plot, the caption and the caution — with the size that holds them.
import { describe, it, expect, beforeAll, afterAll, inject } from "vitest";
import type { Browser, Page } from "playwright-core";
import { readFileSync } from "node:fs";
import { launchChromium, resultsSettled } from "./browser";

let browser: Browser;
beforeAll(async () => {
  browser = await launchChromium();
});
afterAll(async () => {
  await browser?.close();
});

/** What the page shows of one figure, read before saving. */
type Shown = { title: string; caption: string; legend: string[]; marks: number; plotWidth: number; plotHeight: number };

async function shownFigures(page: Page): Promise<Shown[]> {
  return page.$$eval(".figure", (wraps) =>
    wraps.map((wrap) => {
      const figure = wrap.firstElementChild as Element;
      const kids = figure.tagName.toLowerCase() === "svg" ? [figure] : [...figure.children];
      const plots = kids.filter((k) => k.tagName.toLowerCase() === "svg");
      const main = plots[plots.length - 1] as SVGSVGElement;
      const legend = kids.filter((k) => k.tagName.toLowerCase() === "div").flatMap((d) => [...d.children].filter((c) => c.querySelector(":scope > svg")).map((c) => (c.textContent ?? "").trim()).filter((t) => t !== ""));
      return {
        title: kids.find((k) => k.tagName.toLowerCase() === "h2")?.textContent?.trim() ?? "",
        caption: kids.find((k) => k.tagName.toLowerCase() === "figcaption")?.textContent?.trim() ?? "",
        legend,
        marks: main.querySelectorAll("[aria-label]").length,
        plotWidth: Number(main.getAttribute("width")),
        plotHeight: Number(main.getAttribute("height")),
      };
    }),
  );
}

async function save(page: Page, figureIndex: number, kind: "svg" | "png"): Promise<{ name: string; bytes: Buffer }> {
  const button = page.locator(".figure").nth(figureIndex).locator(`.save-${kind}`);
  const [download] = await Promise.all([page.waitForEvent("download"), button.click()]);
  const path = await download.path();
  return { name: download.suggestedFilename(), bytes: readFileSync(path) };
}

/** Parses a saved SVG in the page: its size, its text, the nested plot and its mark groups. */
async function readSvg(page: Page, text: string) {
  return page.evaluate((source) => {
    const doc = new DOMParser().parseFromString(source, "image/svg+xml");
    const root = doc.documentElement;
    const nested = [...root.querySelectorAll(":scope > svg")];
    const main = nested[nested.length - 1];
    return {
      error: doc.querySelector("parsererror")?.textContent ?? null,
      tag: root.tagName,
      width: Number(root.getAttribute("width")),
      height: Number(root.getAttribute("height")),
      text: [...root.querySelectorAll(":scope > text")].map((t) => t.textContent).join(" "),
      marks: main?.querySelectorAll("[aria-label]").length ?? 0,
      plotWidth: Number(main?.getAttribute("width")),
      plotHeight: Number(main?.getAttribute("height")),
      plotTop: Number(main?.getAttribute("y")),
    };
  }, text);
}

/** Decodes a saved PNG in the page: its size, and how much is drawn in the title band and in the plot band. */
async function readPng(page: Page, bytes: Buffer, plotTop: number, plotHeight: number) {
  return page.evaluate(
    async ({ base64, top, height }) => {
      const data = Uint8Array.from(atob(base64), (c) => c.charCodeAt(0));
      const bitmap = await createImageBitmap(new Blob([data], { type: "image/png" }));
      const canvas = new OffscreenCanvas(bitmap.width, bitmap.height);
      const context = canvas.getContext("2d") as OffscreenCanvasRenderingContext2D;
      context.drawImage(bitmap, 0, 0);
      const inked = (y0: number, y1: number) => {
        const rows = context.getImageData(0, y0, bitmap.width, Math.max(1, y1 - y0)).data;
        let n = 0;
        for (let i = 0; i < rows.length; i += 4) if ((rows[i] as number) + (rows[i + 1] as number) + (rows[i + 2] as number) < 600) n += 1;
        return n / (rows.length / 4);
      };
      const scale = 2;
      return { width: bitmap.width, height: bitmap.height, titleInk: inked(0, 12 * scale + 20 * scale), plotInk: inked(top * scale, (top + height) * scale) };
    },
    { base64: bytes.toString("base64"), top: plotTop, height: plotHeight },
  );
}

async function checkEveryFigure(page: Page, atLeast: number): Promise<number> {
  const shown = await shownFigures(page);
  expect(shown.length).toBeGreaterThanOrEqual(atLeast);
  for (const [k, figure] of shown.entries()) {
    const svgFile = await save(page, k, "svg");
    expect(svgFile.name).toMatch(/\.svg$/);
    const svg = await readSvg(page, svgFile.bytes.toString("utf8"));
    expect(svg.error, svgFile.name).toBeNull();
    expect(svg.tag).toBe("svg");
    // The whole figure: the plot at its size, with room above and below for the title and caption.
    expect(svg.plotWidth, svgFile.name).toBe(figure.plotWidth);
    expect(svg.plotHeight, svgFile.name).toBe(figure.plotHeight);
    expect(svg.width, svgFile.name).toBeGreaterThanOrEqual(figure.plotWidth);
    expect(svg.height, svgFile.name).toBeGreaterThan(figure.plotHeight + 40);
    expect(svg.marks, svgFile.name).toBe(figure.marks);
    expect(figure.marks, svgFile.name).toBeGreaterThan(0);
    const words = (s: string) => s.replace(/\s+/g, " ");
    if (figure.title) expect(words(svg.text), svgFile.name).toContain(words(figure.title));
    if (figure.caption) expect(words(svg.text), svgFile.name).toContain(words(figure.caption));
    for (const label of figure.legend) expect(words(svg.text), svgFile.name).toContain(words(label));
    expect(svg.text, svgFile.name).toMatch(/licensed engineers/);

    const pngFile = await save(page, k, "png");
    expect(pngFile.name).toMatch(/\.png$/);
    expect([...pngFile.bytes.subarray(1, 4)].map((b) => String.fromCharCode(b)).join("")).toBe("PNG");
    const png = await readPng(page, pngFile.bytes, svg.plotTop, svg.plotHeight);
    expect(png.width, pngFile.name).toBe(2 * svg.width);
    expect(png.height, pngFile.name).toBe(2 * svg.height);
    if (figure.title) expect(png.titleInk, pngFile.name).toBeGreaterThan(0.005);
    expect(png.plotInk, pngFile.name).toBeGreaterThan(0.005);
  }
  return shown.length;
}

async function open(url: string): Promise<{ page: Page; errors: string[]; close: () => Promise<void> }> {
  const context = await browser.newContext({ acceptDownloads: true, viewport: { width: 1280, height: 900 } });
  const page = await context.newPage();
  const errors: string[] = [];
  page.on("console", (m) => {
    if (m.type() === "error") errors.push(m.text());
  });
  page.on("pageerror", (e) => errors.push(e.message));
  await page.goto(url);
  return { page, errors, close: () => context.close() };
}

// Up to 15 charts a page, each saved twice through a real download: minutes on a loaded machine
// (no wall time is asserted; the limit only stops a hung page).
const PAGE_TIMEOUT_MS = 300_000;

describe("every chart saves as the whole figure", () => {
  const total: Record<string, number> = {};
  afterAll(() => {
    console.log(`charts saved (SVG and PNG) per page: ${JSON.stringify(total)}`);
  });

  for (const file of ["compare.html", "carbon.html", "rates.html", "client.html"]) {
    it(file, async () => {
      const { page, errors, close } = await open(`${inject("baseUrl")}/${file}`);
      await page.waitForSelector(".figure svg", { timeout: 60_000 });
      await resultsSettled(page);
      // Open every lazily drawn section (the compare page's drawings) so its charts are saved too.
      for (const summary of await page.locator("details > summary").all()) await summary.click();
      await page.waitForTimeout(500);
      total[file] = await checkEveryFigure(page, 1);
      expect(errors).toEqual([]);
      await close();
    }, PAGE_TIMEOUT_MS);
  }

  it("span-study.html", async () => {
    const { page, errors, close } = await open(`${inject("baseUrl")}/span-study.html`);
    // a short range at once: the saved figures are checked here, not the study (the whole range's 3D pass takes a minute; pages.test.ts runs it)
    await page.fill("#toM", "100");
    await page.locator("#toM").press("Enter");
    await page.waitForFunction(() => /^7 spans .* computed in/.test(document.querySelector("#cell-status")?.textContent ?? ""), undefined, { timeout: 120_000 });
    await resultsSettled(page);
    await page.waitForTimeout(500);
    total["span-study.html"] = await checkEveryFigure(page, 2);
    expect(errors).toEqual([]);
    await close();
  }, PAGE_TIMEOUT_MS);

  it("risk.html", async () => {
    const { page, errors, close } = await open(`${inject("baseUrl")}/risk.html`);
    await page.waitForSelector("#risk-inputs-table tbody tr");
    await page.fill("#risk-samples", "60");
    await page.click("#risk-run");
    await page.waitForSelector("#cell-risk-sensitivity svg", { timeout: 60_000 });
    total["risk.html"] = await checkEveryFigure(page, 9);
    expect(errors).toEqual([]);
    await close();
  }, PAGE_TIMEOUT_MS);
});
