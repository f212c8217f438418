// Issue 14, the consultant's carbon page: a forgiving partial import previewed as a list of changes
// then applied; a group edit of every steel row; the provenance card beside the row; the last
// edit as before → after; benchmark bands kept in the study.
import { describe, it, expect, beforeAll, afterAll, inject } from "vitest";
import type { Browser } from "playwright-core";
import { launchChromium, openPage } from "./browser";

let browser: Browser;
beforeAll(async () => {
  browser = await launchChromium();
});
afterAll(async () => {
  await browser?.close();
});

describe("carbon page for the consultant", () => {
  it("a semicolon CSV with decimal commas and only some columns is previewed as a list of changes, then applied", async () => {
    const { page, errors } = await openPage(browser, `${inject("baseUrl")}/carbon.html`);
    await page.waitForSelector("#cell-carbon-table tbody tr");
    const before = await page.locator("#cell-carbon-table tbody").innerText();
    const csv = "Material ID;A1-A3 (kgCO2e/kg);Wastage (%)\nsteel-plate;2,1;3\nrebar;0,73;5\n";
    await page.setInputFiles("#factors-import-file", { name: "epd-extract.csv", mimeType: "text/csv", buffer: Buffer.from(csv) });
    await expect.poll(() => page.locator("#factors-merge-changes").innerText()).toMatch(/steel-plate: A1–A3 2\.46 → 2\.1/);
    const changes = await page.locator("#factors-merge-changes").innerText();
    expect(changes).toMatch(/steel-plate: Waste rate 5 → 3/);
    expect(changes).toMatch(/rebar: A1–A3 1\.99 → 0\.73/);
    const notes = await page.locator("#factors-import-notes").innerText();
    expect(notes).toMatch(/semicolon-separated file/);
    expect(notes).toMatch(/column "A1-A3 \(kgCO2e\/kg\)" read as a1a3_kgco2e_per_kg/);
    expect(notes).toMatch(/decimal commas read as decimal points/);
    expect(notes).toMatch(/partial update: columns label, density_kg_per_m3/);
    // Nothing is applied until the user applies it.
    expect(await page.inputValue("#factors-steel-plate-a1a3KgCO2ePerKg")).toBe("2.46");
    expect(await page.locator("#cell-carbon-table tbody").innerText()).toBe(before);
    await page.click("#factors-merge-apply");
    await expect.poll(() => page.inputValue("#factors-steel-plate-a1a3KgCO2ePerKg")).toBe("2.1");
    expect(await page.inputValue("#factors-steel-plate-wasteRatePct")).toBe("3");
    expect(await page.inputValue("#factors-steel-plate-label")).toBe("Steel plate (rings and nodes)");
    expect(await page.locator("#factors-table tbody tr").count()).toBe(16);
    await expect.poll(() => page.locator("#last-edit-what").textContent()).toMatch(/^Last edit: Steel plate \(rings and nodes\): A1–A3 \(kgCO2e\/kg\) 2\.46 → 2\.1; Steel plate \(rings and nodes\): waste rate \(%\) 5 → 3;/);
    expect(await page.locator("#last-edit-table tbody tr").count()).toBeGreaterThan(1);
    expect(errors).toEqual([]);
    await page.close();
  });

  it("a bad partial file names every problem by line and column and applies nothing", async () => {
    const { page, errors } = await openPage(browser, `${inject("baseUrl")}/carbon.html`);
    await page.waitForSelector("#cell-carbon-table tbody tr");
    const csv = "material\tA1–A3\twaste\nsteel-plate\tx\t3\nrebar\t1,5\t90\n";
    await page.setInputFiles("#factors-import-file", { name: "bad.tsv", mimeType: "text/csv", buffer: Buffer.from(csv) });
    await expect.poll(() => page.locator("#factors-import-status").textContent()).toMatch(/not imported; nothing changed/);
    const status = (await page.locator("#factors-import-status").textContent()) ?? "";
    expect(status).toMatch(/line 2, column A1–A3: "x" is not a number/);
    expect(status).toMatch(/line 3, column waste: 90 \(expected a number from 0 to 50 %\)/);
    expect(await page.inputValue("#factors-rebar-a1a3KgCO2ePerKg")).toBe("1.99");
    expect(errors).toEqual([]);
    await page.close();
  });

  it("a group edit changes every steel row at once; one refused row refuses all", async () => {
    const { page, errors } = await openPage(browser, `${inject("baseUrl")}/carbon.html`);
    await page.waitForSelector("#cell-carbon-table tbody tr");
    await page.selectOption("#group-kind", "steel");
    await page.selectOption("#group-field", "wasteRatePct");
    await page.selectOption("#group-op", "set");
    await page.fill("#group-value", "60");
    await page.click("#group-apply");
    await expect.poll(() => page.locator("#group-status").textContent()).toMatch(/^Nothing changed: steel-hot-finished-hollow: 60 \(expected a number from 0 to 50 %\)/);
    expect(await page.inputValue("#factors-steel-plate-wasteRatePct")).toBe("5");
    await page.selectOption("#group-field", "a1a3KgCO2ePerKg");
    await page.selectOption("#group-op", "times");
    await page.fill("#group-value", "0.5");
    await page.click("#group-apply");
    await expect.poll(() => page.inputValue("#factors-steel-plate-a1a3KgCO2ePerKg")).toBe("1.23");
    expect(await page.inputValue("#factors-steel-open-section-a1a3KgCO2ePerKg")).toBe("0.775");
    expect(await page.inputValue("#factors-rebar-a1a3KgCO2ePerKg")).toBe("1.99");
    expect(errors).toEqual([]);
    await page.close();
  });

  it("the provenance card follows the row being edited and says plainly when no source supports a value", async () => {
    const { page, errors } = await openPage(browser, `${inject("baseUrl")}/carbon.html`);
    await page.waitForSelector("#factors-table tbody tr");
    await page.focus("#factors-steel-open-section-a1a3KgCO2ePerKg");
    await expect.poll(() => page.locator("#provenance-card").innerText()).toMatch(/is the published value \(ICE V3\.0: 1\.55\)/);
    expect(await page.locator("#provenance-card").innerText()).toMatch(/"Steel, Section"/);
    await page.focus("#factors-fabric-ptfe-glass-a1a3KgCO2ePerKg");
    await expect.poll(() => page.locator("#provenance-card").innerText()).toMatch(/No published source read supports A1–A3 = 9 kgCO2e\/kg/);
    expect(errors).toEqual([]);
    await page.close();
  });

  it("benchmark bands are entered, drawn and kept in the study after a reload", async () => {
    const { page, errors } = await openPage(browser, `${inject("baseUrl")}/carbon.html`);
    await page.waitForSelector("#cell-carbon-table tbody tr");
    await page.click("#band-add");
    await page.fill("#band-1-label", "good practice");
    await page.fill("#band-1-toKgCO2ePerM2", "5000");
    await page.press("#band-1-toKgCO2ePerM2", "Enter");
    await expect.poll(() => page.locator("#cell-carbon-table .warnings").textContent()).toMatch(/in "good practice"/);
    await page.reload();
    await page.waitForSelector("#band-1-label");
    expect(await page.inputValue("#band-1-label")).toBe("good practice");
    expect(await page.inputValue("#band-1-toKgCO2ePerM2")).toBe("5000");
    expect(errors).toEqual([]);
    await page.close();
  });
});
