// Issue 10 on the carbon and rates pages: an import lacking rows the schemes need is refused with
// their names, a partial update is previewed and merged, the set's name follows the import into
// the captions, a study lacking rows names every gap (carbon and cost apart), and a rebase past
// the allowed range is refused naming the index fields.
import { describe, it, expect, beforeAll, afterAll, inject } from "vitest";
import type { Browser, Page } from "playwright-core";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { launchChromium, openPage } from "./browser";
import { defaultFactorRows, factorRowsToCsv } from "../../src/carbon";
import { defaultRateRows, rateRowsToCsv } from "../../src/cost";
import { defaultStudy, studyToJson } from "../../src/study";

let browser: Browser;
beforeAll(async () => {
  browser = await launchChromium();
});
afterAll(async () => {
  await browser?.close();
});

const plate = () => defaultFactorRows().filter((r) => r.material === "steel-plate");
const statusOf = (page: Page, id: string) => page.locator(`#${id}-import-status`).textContent();

async function openStudy(page: Page, study: ReturnType<typeof defaultStudy>): Promise<void> {
  const path = join(mkdtempSync(join(tmpdir(), "spanbook-")), "gappy.spanbook.json");
  writeFileSync(path, studyToJson(study));
  await page.setInputFiles('input[aria-label="Study file to open"]', path);
}

describe("carbon page: imports and gaps", () => {
  it("refuses a one-row factor CSV naming every missing material and the schemes; a merge is previewed, then applied and named", async () => {
    const { page, errors } = await openPage(browser, `${inject("baseUrl")}/carbon.html`);
    await page.waitForSelector("#cell-carbon-table tbody tr");
    const before = await page.locator("#cell-carbon-table tbody").innerText();
    const csv = factorRowsToCsv(plate().map((r) => ({ ...r, a1a3KgCO2ePerKg: 3 })));
    await page.setInputFiles("#factors-import-file", { name: "plate-epd.csv", mimeType: "text/csv", buffer: Buffer.from(csv) });
    await expect.poll(() => statusOf(page, "factors")).toMatch(/plate-epd\.csv was not imported; nothing changed\. It lacks \d+ materials the schemes need/);
    const status = (await statusOf(page, "factors")) ?? "";
    expect(status).toMatch(/steel-strand \(needed by Cable dome, Mast-supported cable net\)/);
    expect(status).toMatch(/rebar \(needed by/);
    expect(await page.locator("#factors-table tbody tr").count()).toBe(16);
    expect(await page.locator("#cell-carbon-table tbody").innerText()).toBe(before);

    await page.click("#factors-merge-offer");
    await expect.poll(() => page.locator("#factors-merge-changes").innerText()).toMatch(/steel-plate: A1–A3 2\.46 → 3/);
    expect(await page.locator("#cell-carbon-table tbody").innerText()).toBe(before);
    await page.click("#factors-merge-apply");
    await expect.poll(() => page.inputValue("#factors-steel-plate-a1a3KgCO2ePerKg")).toBe("3");
    expect(await page.locator("#factors-table tbody tr").count()).toBe(16);
    await expect.poll(() => page.inputValue("#factorSetName")).toMatch(/^plate-epd\.csv, merged \d{4}-\d{2}-\d{2} into spanbook defaults/);
    await expect.poll(() => page.locator("#cell-chart-module figcaption").first().textContent()).toMatch(/carbon factors: plate-epd\.csv, merged/);
    expect(await page.locator("#cell-carbon-table tbody").innerText()).not.toBe(before);
    expect(errors).toEqual([]);
    await page.close();
  });

  it("a whole table imports and names the set after the file; the name can be edited", async () => {
    const { page, errors } = await openPage(browser, `${inject("baseUrl")}/carbon.html`);
    await page.waitForSelector("#cell-carbon-table tbody tr");
    await page.setInputFiles("#factors-import-file", { name: "epd-set-2026.csv", mimeType: "text/csv", buffer: Buffer.from(factorRowsToCsv(defaultFactorRows())) });
    await expect.poll(() => statusOf(page, "factors")).toMatch(/Imported 16 rows from epd-set-2026\.csv/);
    await expect.poll(() => page.locator("#cell-chart-module figcaption").first().textContent()).toMatch(/carbon factors: epd-set-2026\.csv, imported \d{4}-\d{2}-\d{2}/);
    await page.fill("#factorSetName", "Project EPDs, issue B");
    await expect.poll(() => page.locator("#cell-chart-module figcaption").first().textContent()).toMatch(/carbon factors: Project EPDs, issue B/);
    expect(errors).toEqual([]);
    await page.close();
  });

  it("a study lacking factor rows names every gap and the schemes that need it, instead of a silent –", async () => {
    const { page, errors } = await openPage(browser, `${inject("baseUrl")}/carbon.html`);
    await page.waitForSelector("#cell-carbon-table tbody tr");
    const study = defaultStudy();
    study.carbon.factors = study.carbon.factors.filter((r) => r.material !== "steel-strand");
    await openStudy(page, study);
    await expect.poll(() => page.locator("#carbon-gaps").textContent()).toMatch(/no carbon factor for material "steel-strand" \(needed by Cable dome, Mast-supported cable net\)/);
    expect(await page.locator("#cell-carbon-table tbody tr", { hasText: "Cable dome" }).innerText()).toMatch(/no carbon factor for material "steel-strand"/);
    expect(await page.locator("#cell-carbon-table tbody tr", { hasText: "Steel truss roof" }).innerText()).not.toMatch(/no carbon factor/);
    expect(errors).toEqual([]);
    await page.close();
  });
});

describe("rates page: imports, gaps and rebase", () => {
  it("the rate columns name the study's currency, and follow an edit of it (issue 14: a currency on every cost)", async () => {
    const { page, errors } = await openPage(browser, `${inject("baseUrl")}/rates.html`);
    await page.waitForSelector("#rates-table thead th");
    const heads = async () => (await page.locator("#rates-table thead th").allInnerTexts()).filter((t) => /^(Rate|Low|High) /.test(t));
    expect(await heads()).toEqual(["Rate (EUR per unit)", "Low (EUR per unit)", "High (EUR per unit)"]);
    await page.fill("#currency", "GBP");
    await page.locator("#currency").dispatchEvent("change");
    await expect.poll(heads).toEqual(["Rate (GBP per unit)", "Low (GBP per unit)", "High (GBP per unit)"]);
    expect(errors).toEqual([]);
    await page.close();
  });

  it("refuses a rate CSV without the cable item, naming it; the rates table of a study lacking it names the gap and keeps carbon on compare", async () => {
    const { page, errors } = await openPage(browser, `${inject("baseUrl")}/rates.html`);
    await page.waitForSelector("#cell-cost-table tbody tr");
    const csv = rateRowsToCsv(defaultRateRows().filter((r) => r.item !== "cable"));
    await page.setInputFiles("#rates-import-file", { name: "supplier-rates.csv", mimeType: "text/csv", buffer: Buffer.from(csv) });
    await expect.poll(() => statusOf(page, "rates")).toMatch(/supplier-rates\.csv was not imported; nothing changed\. It lacks 1 item the schemes need:\ncable \(needed by Cable dome, Mast-supported cable net\)/);
    const study = defaultStudy();
    study.cost.rates = study.cost.rates.filter((r) => r.item !== "cable");
    await openStudy(page, study);
    await expect.poll(() => page.locator("#cost-gaps").textContent()).toMatch(/no rate for cost item "cable" \(needed by Cable dome, Mast-supported cable net\)/);
    expect(await page.locator("#cell-cost-table tbody tr", { hasText: "Steel truss roof" }).innerText()).toMatch(/\d/);
    await page.goto(`${inject("baseUrl")}/compare.html`);
    await expect.poll(() => page.locator("#comparison-gaps").textContent()).toMatch(/no rate for cost item "cable"/);
    expect(errors).toEqual([]);
    await page.close();
  });

  it("refuses a rebase whose rates would pass the limit, naming both index fields; nothing changes and a reload keeps the study", async () => {
    const { page, errors } = await openPage(browser, `${inject("baseUrl")}/rates.html`);
    await page.waitForSelector("#cell-cost-table tbody tr");
    const before = await page.locator("#cell-cost-table tbody").innerText();
    await page.fill("#rebase-from", "0.001");
    await page.fill("#rebase-to", "1000000");
    await page.click("#rebase-apply");
    await expect.poll(() => page.locator("#rebase-status").textContent()).toMatch(/Not rebased; nothing changed: .*above the largest rate allowed.*"Index at the rates' price base" and "Index at the new date"/);
    expect(await page.locator("#cell-cost-table tbody").innerText()).toBe(before);
    await page.reload();
    await page.waitForSelector("#cell-cost-table tbody tr");
    expect(await page.locator("#cell-cost-table tbody").innerText()).toBe(before);
    expect(errors).toEqual([]);
    await page.close();
  });
});
