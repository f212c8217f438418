// Issue 10, items 1, 2 and 12: the client view shows the working study (with its title and when
// it was last changed), the study's details are editable and shown everywhere a title belongs,
// and the client page and its export print on A4 with every heading and every scheme row.
import { describe, it, expect, beforeAll, afterAll, inject } from "vitest";
import type { Browser, BrowserContext, Page } from "playwright-core";
import { mkdtempSync, readFileSync, writeFileSync } from "node:fs";
import { execFileSync } from "node:child_process";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { launchChromium } from "./browser";
import { SCHEMES } from "../../src/schemes";
import { COMPARISON_COLUMNS } from "../../src/comparison";

let browser: Browser;
beforeAll(async () => {
  browser = await launchChromium();
});
afterAll(async () => {
  await browser?.close();
});

const base = () => inject("baseUrl");
const tmp = () => mkdtempSync(join(tmpdir(), "spanbook-client-"));

async function openCompare(context: BrowserContext, hash = ""): Promise<Page> {
  const page = await context.newPage();
  await page.goto(`${base()}/compare.html${hash}`);
  await page.waitForSelector("#cell-comparison table");
  return page;
}

async function openClient(context: BrowserContext, hash = ""): Promise<Page> {
  const page = await context.newPage();
  await page.goto(`${base()}/client.html${hash}`);
  await page.waitForSelector("#cell-headline table");
  await page.waitForSelector("#cell-charts svg");
  return page;
}

/** Clicks "Export for the client" and returns the written file's path and text. */
async function exportFile(page: Page): Promise<{ path: string; html: string }> {
  const [download] = await Promise.all([page.waitForEvent("download"), page.click("#export-client")]);
  const path = join(tmp(), "client.html");
  await download.saveAs(path);
  return { path, html: readFileSync(path, "utf8") };
}

/** The scheme labels in the rows of a headline table. */
function rowLabels(page: Page, selector: string): Promise<string[]> {
  return page.locator(`${selector} tbody tr td:first-child`).allInnerTexts();
}

describe("the client view shows the working study (issue 10, item 1)", () => {
  it("after span 90 m and a scheme switched off on compare, the client view and its export show them, its title and when it was last changed", async () => {
    const context = await browser.newContext({ acceptDownloads: true });
    const compare = await openCompare(context);
    await compare.fill("#spanM", "90");
    await compare.waitForFunction(() => document.querySelector("#cell-comparison caption")?.textContent?.includes("90 m"));
    await compare.uncheck("#enable-truss-roof");
    await expect.poll(() => compare.locator("#cell-comparison tbody tr").count()).toBe(SCHEMES.length - 1);

    const client = await openClient(context);
    expect(await client.locator("#cell-headline caption").innerText()).toContain("90 m");
    const labels = await rowLabels(client, "#cell-headline");
    expect(labels).toHaveLength(SCHEMES.length - 1);
    expect(labels).not.toContain("Steel truss roof");
    expect(await client.locator("#cell-charts").innerText()).not.toContain("Steel truss roof");
    const meta = await client.locator("#cell-meta").innerText();
    expect(meta).toContain("Quillbridge Civic Arena — roof options");
    expect(meta).toMatch(/Last changed\s+\d{1,2} \w{3} \d{4}, \d{2}:\d{2} UTC/);
    expect(await client.locator("#client-origin").innerText()).toContain("working study saved in this browser");

    const { path, html } = await exportFile(client);
    expect(html).toContain("Roof options at 90 m clear span");
    expect(html).toMatch(/Last changed<\/dt><dd>\d{1,2} \w{3} \d{4}, \d{2}:\d{2} UTC/);
    const view = await context.newPage();
    await view.goto(`file://${path}`);
    expect(await rowLabels(view, "table")).toEqual(labels);
    expect(await view.locator("caption").first().innerText()).toContain("90 m");
    await context.close();
  });

  it("a link opened on the client view is shown as the link's study, and the working study is left as it was", async () => {
    const other = await browser.newContext();
    const elsewhere = await openCompare(other);
    await elsewhere.fill("#spanM", "120");
    await elsewhere.waitForFunction(() => location.hash.startsWith("#s=") && document.querySelector("#cell-comparison caption")?.textContent?.includes("120 m"));
    const hash = await elsewhere.evaluate(() => location.hash);
    await other.close();

    const context = await browser.newContext();
    const compare = await openCompare(context);
    await compare.fill("#spanM", "90");
    await compare.waitForFunction(() => document.querySelector("#cell-comparison caption")?.textContent?.includes("90 m"));
    const client = await openClient(context, hash);
    expect(await client.locator("#cell-headline caption").innerText()).toContain("120 m");
    expect(await client.locator("#client-origin").innerText()).toContain("link");
    const again = await openClient(context);
    expect(await again.locator("#cell-headline caption").innerText()).toContain("90 m");
    await context.close();
  });
});

describe("the study's details are editable (issue 10, item 2)", () => {
  it("title, prepared-by, date and notes set on compare reach the captions, the saved file, the client view and its export", async () => {
    const context = await browser.newContext({ acceptDownloads: true });
    const compare = await openCompare(context);
    await compare.fill("#meta-title", "Riverside Hall — roof options");
    await compare.fill("#meta-author", "A. Lead, Studio North");
    await compare.fill("#meta-date", "2026-12-01");
    await compare.fill("#meta-notes", "For the board meeting of 14 December.");
    // Not allowed: named, and nothing applied.
    await compare.fill("#meta-date", "2026-13-40");
    expect(await compare.locator("#meta-date-message").innerText()).toMatch(/^Date: .*YYYY-MM-DD/);
    await compare.fill("#meta-title", "");
    expect(await compare.locator("#meta-title-message").innerText()).toMatch(/^Title: .*title/);
    await expect.poll(() => compare.locator("#cell-section figcaption").innerText()).toContain("Riverside Hall — roof options");
    expect(await compare.locator("#meta-changed-at").innerText()).toMatch(/Last changed: \d{1,2} \w{3} \d{4}/);

    const [download] = await Promise.all([compare.waitForEvent("download"), compare.getByRole("button", { name: "Save study file" }).click()]);
    expect(download.suggestedFilename()).toBe("riverside-hall-roof-options.spanbook.json");
    const saved = JSON.parse(readFileSync(await download.path(), "utf8")) as { meta: Record<string, string> };
    expect(saved.meta).toMatchObject({ title: "Riverside Hall — roof options", author: "A. Lead, Studio North", date: "2026-12-01", notes: "For the board meeting of 14 December." });
    expect(Date.parse(saved.meta.changedAt ?? "")).toBeGreaterThan(Date.now() - 10 * 60_000);

    const client = await openClient(context);
    const meta = await client.locator("#cell-meta").innerText();
    for (const text of ["Riverside Hall — roof options", "A. Lead, Studio North", "2026-12-01", "For the board meeting of 14 December."]) expect(meta).toContain(text);
    expect(await client.locator("#cell-charts figcaption").first().innerText()).toContain("Riverside Hall — roof options");
    const { html } = await exportFile(client);
    expect(html).toContain("<title>Riverside Hall — roof options</title>");
    for (const text of ["A. Lead, Studio North", "2026-12-01", "For the board meeting of 14 December."]) expect(html).toContain(text);
    expect(html).not.toContain("Demo study (invented scenario)");
    await context.close();
  });
});

/**
 * Prints the page to an A4 PDF once its document and fonts are loaded (text set in a fallback font
 * breaks lines differently); returns its text (pdftotext -layout), its number of pages and, to name
 * what moved if the count is ever off, the lines printed on each page.
 */
/** The summary's own caution closes page 1: it comes after the glossary there. */
function expectCautionAfterGlossary(firstPage: string): void {
  const glossary = firstPage.indexOf("Usable floor: the floor area");
  expect(glossary).toBeGreaterThanOrEqual(0);
  expect(firstPage.indexOf("Feasibility-stage estimates for comparing schemes", glossary)).toBeGreaterThan(glossary);
}

async function printA4(page: Page): Promise<{ text: string; firstPage: string; pages: number; linesPerPage: string }> {
  await page.waitForFunction(() => document.readyState === "complete");
  await page.evaluate(() => document.fonts.ready.then(() => undefined));
  const path = join(tmp(), "print.pdf");
  writeFileSync(path, await page.pdf({ format: "A4" }));
  const info = execFileSync("pdfinfo", [path], { encoding: "utf8" });
  const pages = Number(/Pages:\s+(\d+)/.exec(info)?.[1]);
  const pageText = (k: number) => execFileSync("pdftotext", ["-layout", "-f", String(k), "-l", String(k), path, "-"], { encoding: "utf8" });
  const lines = Array.from({ length: pages }, (_, k) => pageText(k + 1).split("\n").filter((l) => l.trim() !== "").length);
  return {
    text: execFileSync("pdftotext", ["-layout", path, "-"], { encoding: "utf8" }),
    firstPage: pageText(1),
    pages,
    linesPerPage: `lines printed per page: ${lines.join(", ")}`,
  };
}

/** Every column heading is on paper, and on its line every scheme's value of that column, in order. */
async function expectWholeTableOnPaper(page: Page, table: string, text: string): Promise<void> {
  const rows = await page.locator(`${table} tbody tr`).evaluateAll((trs) => trs.map((tr) => Array.from(tr.children, (td) => (td.textContent ?? "").trim())));
  expect(rows).toHaveLength(SCHEMES.length);
  // the headings as the page writes them (the cost columns carry the rates' currency)
  const headings = await page.locator(`${table} thead th`).allTextContents();
  expect(headings).toHaveLength(COMPARISON_COLUMNS.length);
  const lines = text.split("\n");
  COMPARISON_COLUMNS.forEach((column, i) => {
    const heading = headings[i]!.trim();
    const line = lines.find((l) => l.trimStart().startsWith(heading));
    expect(line, `heading "${heading}" on paper`).toBeDefined();
    if (column.digits === null) return;
    const values = line!.slice(line!.indexOf(heading) + heading.length).trim().split(/\s{2,}/);
    expect(values, `every scheme's ${heading}`).toEqual(rows.map((r) => r[i]));
  });
  for (const model of SCHEMES) for (const word of model.label.split(/[\s-]+/)) expect(text).toContain(word);
}

describe("the client's cautions are in plain words (issue 14)", () => {
  it("each option's cautions are what its scheme declares a client should know, with no method words, and point to the engineers' notes", async () => {
    const context = await browser.newContext();
    const client = await openClient(context);
    await client.waitForSelector(".option-card");
    for (const model of SCHEMES) {
      const items = await client.locator(`.option-card[data-id="${model.id}"] ul.cautions li`).allInnerTexts();
      expect(items.slice(0, model.clientNotes.length)).toEqual([...model.clientNotes]);
      for (const text of items) expect(text, `${model.id}: ${text}`).not.toMatch(/closed form|axisymmetric|first-order|EN \d|§|kN|kPa|utilisation|γ|combination|equivalent/i);
    }
    expect(await client.locator(".option-card ul.cautions li", { hasText: "engineers' notes on this option are in the appendix" }).count()).toBeGreaterThan(0);
    await context.close();
  });
});

describe("the client file fits A4 (issue 10, item 12)", () => {
  it("the client page prints every heading and every scheme row on a few A4 pages, the table on the first", async () => {
    const context = await browser.newContext();
    const client = await openClient(context);
    const printed = await printA4(client);
    await expectWholeTableOnPaper(client, "#cell-headline table", printed.text);
    // Issue 14: the first page is the summary a client reads — the answer, the recommendation, every
    // option side by side, the glossary — whole; the engineering table follows in the appendix.
    expect(printed.firstPage).toContain("At a glance");
    expect(printed.firstPage).toContain("Recommendation of the project lead");
    for (const model of SCHEMES) expect(printed.firstPage).toContain(model.label);
    expect(printed.firstPage).toContain("Usable floor: the floor area");
    // The summary ends with the caution, on the same page (it once spilled alone onto page 2).
    expectCautionAfterGlossary(printed.firstPage);
    expect(printed.firstPage).not.toContain("Headline comparison");
    expect(printed.text).toContain("Warnings");
    expect(printed.pages, printed.linesPerPage).toBeLessThanOrEqual(5);
    await context.close();
  });

  it("the exported client file prints every heading and every scheme row on a few A4 pages, the table on the first", async () => {
    const context = await browser.newContext({ acceptDownloads: true });
    const client = await openClient(context);
    const { path } = await exportFile(client);
    const view = await context.newPage();
    await view.goto(`file://${path}`);
    const printed = await printA4(view);
    await expectWholeTableOnPaper(view, "table", printed.text);
    expect(printed.firstPage).toContain("At a glance");
    expectCautionAfterGlossary(printed.firstPage);
    expect(printed.text).toContain("Warnings");
    expect(printed.pages, printed.linesPerPage).toBeLessThanOrEqual(5);
    await context.close();
  });
});
