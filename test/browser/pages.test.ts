import { describe, it, expect, beforeAll, afterAll, inject } from "vitest";
import type { Browser } from "playwright-core";
import { mkdtempSync, readFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { launchChromium, openPage, resultsSettled } from "./browser";
import { PAGES } from "../../src/notebook/pages";
import { SCHEMES } from "../../src/schemes";
import { defaultStudy, encodeStudyLink, setIn } from "../../src/study";
import { ON_DEMAND_ANALYSIS_OPTION } from "../../src/schemes/declarations";

let browser: Browser;
beforeAll(async () => {
  browser = await launchChromium();
});
afterAll(async () => {
  await browser?.close();
});

describe("every page", () => {
  for (const page of [{ file: "index.html", id: "index" }, ...PAGES]) {
    it(`${page.file} loads with no console errors and carries the caution`, async () => {
      const { page: p, errors } = await openPage(browser, `${inject("baseUrl")}/${page.file}`);
      await p.waitForLoadState("networkidle");
      await p.waitForTimeout(300);
      expect(await p.locator(".caution").count()).toBeGreaterThan(0);
      expect(await p.locator(".cell-error").count()).toBe(0);
      expect(errors).toEqual([]);
      await p.close();
    });
  }
});

describe("units as a reader writes them", () => {
  // audit8: the rates table's unit column, the risk inputs "Rate: … (EUR/m2)" and the method record showed m2
  for (const [file, ready] of [["rates.html", "#cell-rates tbody tr"], ["risk.html", "#risk-inputs-table tbody tr"], ["method.html", "#cell-record tbody tr"]] as const) {
    it(`${file} writes m² and m³, never m2 or m3`, async () => {
      const { page: p, errors } = await openPage(browser, `${inject("baseUrl")}/${file}`);
      await p.waitForSelector(ready);
      await expect.poll(() => p.locator("[aria-busy=true]").count()).toBe(0);
      const text = await p.locator("main").innerText();
      expect(text).toMatch(/m²/);
      expect(text.match(/.{0,40}\bm[23]\b.{0,20}/g) ?? []).toEqual([]);
      expect(errors).toEqual([]);
      await p.close();
    });
  }
});

describe("every page on a phone (390 × 844)", () => {
  for (const page of [{ file: "index.html", id: "index" }, ...PAGES]) {
    it(`${page.file} does not scroll sideways: wide tables and figures scroll inside their cell`, async () => {
      const { page: p } = await openPage(browser, `${inject("baseUrl")}/${page.file}`);
      await p.setViewportSize({ width: 390, height: 844 });
      await p.waitForLoadState("networkidle");
      // the results arrive from the design workers: wait for the cells that show them
      await expect.poll(() => p.locator("[aria-busy=true]").count()).toBe(0);
      await p.waitForTimeout(300);
      const { scrollWidth, clientWidth } = await p.evaluate(() => ({ scrollWidth: document.documentElement.scrollWidth, clientWidth: document.documentElement.clientWidth }));
      expect(scrollWidth).toBeLessThanOrEqual(clientWidth);
      await p.close();
    });
  }
});

describe("span study", () => {
  it("draws a line for every scheme that is feasible somewhere in the range", async () => {
    const { page, errors } = await openPage(browser, `${inject("baseUrl")}/span-study.html`);
    await page.waitForSelector("#cell-span-charts svg", { timeout: 60_000 });
    // the first pass draws every scheme, the tension roofs by their closed form; the second designs those again by the 3D analysis
    expect(await page.locator("#cell-status").innerText()).toMatch(/Every scheme drawn in [\d,]+ ms; now designing the cable dome and the mast-supported cable net by the 3D analysis… \d+ of 37 spans/);
    // the second pass is waited for on a short range (the whole range's 3D pass takes a minute on this machine, past the 5 s budget of issue 13, still open):
    // a range change mid-pass starts both passes again on the new range, and their end is what is checked
    await page.fill("#toM", "100");
    await page.locator("#toM").press("Enter");
    await page.waitForFunction(() => /^7 spans .* computed in/.test(document.querySelector("#cell-status")?.textContent ?? ""), undefined, { timeout: 120_000 });
    await resultsSettled(page);
    const status = await page.locator("#cell-status").innerText();
    expect(status).toMatch(/^7 spans × \d schemes computed in [\d,]+ ms \(in \d background workers?: every scheme in [\d,]+ ms with the cable dome and the mast-supported cable net by the closed form, then again by the 3D analysis, as on the compare page\)/);
    // a span's points depend only on the study and the span: a range over the same spans designs nothing again, a wider one only its new spans
    await page.fill("#toM", "90");
    await page.locator("#toM").press("Enter");
    await page.waitForFunction(() => /^6 spans .* computed in/.test(document.querySelector("#cell-status")?.textContent ?? ""), undefined, { timeout: 60_000 });
    expect(await page.locator("#cell-status").innerText()).toMatch(/Every span kept from an earlier run of the same study: only new spans are designed\.$/);
    await page.fill("#toM", "110");
    await page.locator("#toM").press("Enter");
    await page.waitForFunction(() => /^8 spans .* computed in/.test(document.querySelector("#cell-status")?.textContent ?? ""), undefined, { timeout: 120_000 });
    expect(await page.locator("#cell-status").innerText()).toMatch(/ 7 of the 8 spans kept from an earlier run/);
    // the range and the spans computed are kept for the tab's session: a reload shows them again without designing
    await page.reload();
    await page.waitForFunction(() => /^8 spans .* computed in/.test(document.querySelector("#cell-status")?.textContent ?? ""), undefined, { timeout: 60_000 });
    expect(await page.inputValue("#toM")).toBe("110");
    expect(await page.locator("#cell-status").innerText()).toMatch(/Every span kept from an earlier run of the same study: only new spans are designed\.$/);
    await page.waitForSelector("#cell-span-charts svg");
    const legend = await page.locator("#cell-span-charts").first().innerText();
    for (const model of SCHEMES) expect(legend).toContain(model.label);
    // Each scheme has at least one drawn (non-empty) line path in the self-weight chart.
    const paths = await page.locator("#cell-span-charts figure").first().locator("path[d*='L']").count();
    expect(paths).toBeGreaterThanOrEqual(1);
    expect(await page.locator("#cell-crossovers li").count()).toBe(3);
    expect(errors).toEqual([]);
    await page.close();
  }, 240_000);
});

describe("span study with the lattice domes' on-demand analysis switched on", () => {
  it("designs every span without it, and says so", async () => {
    // the study as the compare page's "Run the 3D analysis" leaves it: the option on for both lattice domes
    let study = defaultStudy();
    for (const id of ["geodesic-dome", "timber-dome"] as const) study = setIn(study, ["schemes", id, "options", ON_DEMAND_ANALYSIS_OPTION], true);
    const { page, errors } = await openPage(browser, `${inject("baseUrl")}/span-study.html#s=${encodeStudyLink(study, defaultStudy())}`);
    await page.fill("#fromM", "150");
    await page.locator("#fromM").press("Enter");
    await page.fill("#toM", "160");
    await page.locator("#toM").press("Enter");
    await page.waitForFunction(() => /^2 spans .* computed in/.test(document.querySelector("#cell-status")?.textContent ?? ""), undefined, { timeout: 120_000 });
    expect(await page.locator("#cell-status").innerText()).toMatch(/The on-demand 3D analysis of the geodesic steel dome and the glulam timber dome, switched on in this study, is left out here \(seconds a design, at every span\): their points are designed without it\.$/);
    expect(errors).toEqual([]);
    await page.close();
  }, 180_000);
});

describe("client export", () => {
  it("writes one HTML file that opens from disk with no network and holds the charts and the table", async () => {
    const context = await browser.newContext({ acceptDownloads: true });
    const page = await context.newPage();
    await page.goto(`${inject("baseUrl")}/client.html`);
    await page.waitForSelector("#cell-charts svg");
    const [download] = await Promise.all([page.waitForEvent("download"), page.click("#export-client")]);
    const path = join(mkdtempSync(join(tmpdir(), "spanbook-")), "client.html");
    await download.saveAs(path);
    const html = readFileSync(path, "utf8");
    expect(html).not.toMatch(/<script/i);

    const offline = await browser.newContext({ offline: true });
    const view = await offline.newPage();
    const requests: string[] = [];
    view.on("request", (r) => {
      if (!r.url().startsWith("file:")) requests.push(r.url());
    });
    await view.goto(`file://${path}`);
    expect(await view.locator("table tbody tr").count()).toBe(SCHEMES.length);
    expect(await view.locator("svg").count()).toBeGreaterThanOrEqual(4);
    expect(await view.locator(".caution").first().innerText()).toMatch(/licensed engineers/);
    expect(requests).toEqual([]);
    await offline.close();
    await context.close();
  });
});

describe("study files", () => {
  it("saving a study, reloading the page and reopening the file gives the same numbers", async () => {
    const context = await browser.newContext({ acceptDownloads: true });
    const page = await context.newPage();
    await page.goto(`${inject("baseUrl")}/compare.html`);
    await page.waitForSelector("#cell-comparison table");
    await page.fill("#spanM", "140");
    await page.waitForFunction(() => document.querySelector("#cell-comparison caption")?.textContent?.includes("140 m"));
    const before = await page.locator("#cell-comparison table").innerText();
    const [download] = await Promise.all([page.waitForEvent("download"), page.getByRole("button", { name: "Save study file" }).click()]);
    const path = join(mkdtempSync(join(tmpdir(), "spanbook-")), "study.json");
    await download.saveAs(path);
    // A fresh page (nothing in storage) opens the demo study; opening the file brings the numbers back.
    const fresh = await browser.newContext();
    const other = await fresh.newPage();
    await other.goto(`${inject("baseUrl")}/compare.html`);
    await other.waitForSelector("#cell-comparison table");
    expect(await other.locator("#cell-comparison table").innerText()).not.toBe(before);
    await other.setInputFiles("input[type=file]", path);
    await other.waitForFunction(() => document.querySelector("#cell-comparison caption")?.textContent?.includes("140 m"));
    expect(await other.locator("#cell-comparison table").innerText()).toBe(before);
    await other.reload();
    await other.waitForSelector("#cell-comparison table");
    expect(await other.locator("#cell-comparison table").innerText()).toBe(before);
    await fresh.close();
    await context.close();
  });
});
