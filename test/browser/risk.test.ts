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

describe("risk page", () => {
  it("a small run in the worker shows progress, results, charts and no console errors", async () => {
    const { page, errors } = await openPage(browser, `${inject("baseUrl")}/risk.html`);
    await page.waitForSelector("#risk-inputs-table tbody tr");
    expect(await page.locator("#risk-inputs-table tbody tr").count()).toBeGreaterThan(10);
    await page.fill("#risk-samples", "60");
    await page.click("#risk-run");
    await page.waitForSelector("#risk-results-table", { timeout: 60_000 });
    expect(await page.locator("#risk-status").textContent()).toMatch(/Done: 60 samples/);
    expect(await page.locator("#risk-results-table tbody tr").count()).toBeGreaterThan(0);
    expect(await page.locator("#cell-risk-ranges svg").count()).toBeGreaterThanOrEqual(3);
    expect(await page.locator("#cell-risk-lowest svg").count()).toBeGreaterThan(0);
    expect(await page.locator("#cell-risk-sensitivity svg").count()).toBeGreaterThan(0);
    expect(await page.locator("#cell-risk-run").innerText()).toMatch(/Cancel/);
    expect(await page.locator(".caution").textContent()).toMatch(/licensed engineers/);
    expect(errors).toEqual([]);
    await page.close();
  });

  it("an invalid range shows an inline message naming the input and is not applied", async () => {
    const { page, errors } = await openPage(browser, `${inject("baseUrl")}/risk.html`);
    await page.waitForSelector("#risk-inputs-table tbody tr");
    const before = await page.inputValue("#risk-low-0");
    await page.fill("#risk-low-0", "999");
    await page.press("#risk-low-0", "Enter");
    // In the table's own words: the row's name and "least", not the file's id and "low" (audit8)
    await expect.poll(() => page.locator("#risk-msg-0").textContent()).toBe(`Ground snow load s_k (kPa), least: 999 is not allowed (allowed from 0 to 1 (× study value)) — not applied; in force: ${before}`);
    for (const [typed, said] of [["12,5", 'Ground snow load s_k (kPa), least: "12,5" is not a number: write the decimal with a point (12.5)'], ["", "Ground snow load s_k (kPa), least: a value is required (allowed from 0 to 1 (× study value))"]] as const) {
      await page.fill("#risk-low-0", typed);
      await page.press("#risk-low-0", "Enter");
      await expect.poll(() => page.locator("#risk-msg-0").textContent()).toBe(`${said} — not applied; in force: ${before}`);
    }
    await page.reload();
    await page.waitForSelector("#risk-inputs-table tbody tr");
    expect(await page.inputValue("#risk-low-0")).toBe(before);
    expect(errors).toEqual([]);
    await page.close();
  });

  it("the ranges follow the study: after snow is set to 1.5 kPa on the compare page, the risk page samples around 1.5 kPa", async () => {
    // Issue 10, item 10: the page used to keep 0.525 / 0.7 / 1.05 kPa whatever the study's snow load.
    const context = await browser.newContext();
    const page = await context.newPage();
    await page.goto(`${inject("baseUrl")}/compare.html`);
    await page.waitForSelector("#snowGroundKPa");
    await page.fill("#snowGroundKPa", "1.5");
    await page.press("#snowGroundKPa", "Enter");
    await page.waitForTimeout(300);
    await page.goto(`${inject("baseUrl")}/risk.html`);
    await page.waitForSelector("#risk-inputs-table tbody tr");
    expect(await page.locator('#risk-inputs-table tr[data-input="snow"] td[id^="risk-range-"]').textContent()).toBe("1.125 – 1.5 – 2.25");
    expect(await page.locator("#risk-inputs-table caption").textContent()).toMatch(/stored around the study's own value, taken as the most likely value/);
    await context.close();
  });

  it("cancel stops a long run and leaves the page responsive", async () => {
    const { page, errors } = await openPage(browser, `${inject("baseUrl")}/risk.html`);
    await page.waitForSelector("#risk-inputs-table tbody tr");
    await page.fill("#risk-samples", "50000");
    await page.click("#risk-run");
    await expect.poll(() => page.locator("#risk-status").textContent(), { timeout: 20_000 }).toMatch(/Designing|Sampling/);
    await page.click("#risk-cancel");
    await expect.poll(() => page.locator("#risk-status").textContent()).toMatch(/Cancelled/);
    expect(await page.locator("#risk-run").isEnabled()).toBe(true);
    expect(errors).toEqual([]);
    await page.close();
  });
});

describe("risk page in our own words (issue 14)", () => {
  it("an invalid input refuses Run and says which; fixing it lets Run go", async () => {
    const { page, errors } = await openPage(browser, `${inject("baseUrl")}/risk.html`);
    await page.waitForSelector("#risk-inputs-table tbody tr");
    expect(await page.locator("#risk-run").isEnabled()).toBe(true);
    const before = await page.inputValue("#risk-low-0");
    await page.fill("#risk-low-0", "999");
    await page.press("#risk-low-0", "Enter");
    await expect.poll(() => page.locator("#risk-blocked").textContent()).toMatch(/^Run is refused until this input is valid: Ground snow load s_k \(kPa\), least: 999 is not allowed/);
    expect(await page.locator("#risk-run").isDisabled()).toBe(true);
    await page.fill("#risk-low-0", before);
    await page.press("#risk-low-0", "Enter");
    await expect.poll(() => page.locator("#risk-run").isEnabled()).toBe(true);
    expect(await page.locator("#risk-blocked").isHidden()).toBe(true);
    expect(errors).toEqual([]);
    await page.close();
  });

  it("one sentence states the result; a change to any input marks the results out of date; the sensitivity lists only inputs the scheme uses", async () => {
    const { page, errors } = await openPage(browser, `${inject("baseUrl")}/risk.html`);
    await page.waitForSelector("#risk-inputs-table tbody tr");
    await page.fill("#risk-samples", "60");
    await page.click("#risk-run");
    await page.waitForSelector("#risk-verdict", { timeout: 60_000 });
    const verdict = (await page.locator("#risk-verdict").textContent()) ?? "";
    expect(verdict).toMatch(/^Over 60 draws, the .+ is cheapest in \d+ % of draws/);
    // The sentence's scheme and share are the table's largest "cheapest in".
    const rows = await page.locator("#cell-risk-results table").nth(1).locator("tbody tr").evaluateAll((trs) => trs.map((tr) => [...tr.children].map((c) => c.textContent ?? "")));
    const best = rows.map((r) => ({ label: r[0] ?? "", p: Number((r[2] ?? "").split(" %")[0]) })).sort((a, b) => b.p - a.p)[0];
    expect(verdict.toLowerCase()).toContain(`the ${best?.label.toLowerCase()} is cheapest in ${best?.p} % of draws`);
    expect(await page.locator("#risk-stale").isHidden()).toBe(true);
    // audit8: the cost rows read "Cost (per m² usable floor)" with no currency, at four figures (1,269)
    const perScheme = await page.locator("#cell-risk-results table").first().locator("tbody tr").evaluateAll((trs) => trs.map((tr) => [...tr.children].map((c) => c.textContent ?? "")));
    const costRows = perScheme.filter((r) => (r[1] ?? "").startsWith("Cost"));
    expect(costRows.length).toBeGreaterThan(0);
    for (const r of costRows) {
      expect(r[1]).toBe("Cost (EUR/m² usable floor)");
      for (const cell of r.slice(2, 6)) {
        const x = Number(cell.replace(/,/g, ""));
        expect(Number(x.toPrecision(3)), `${r[0]}: ${cell}`).toBe(x);
      }
    }
    // The chosen scheme's charts list none of another scheme's options.
    const scheme = await page.inputValue("#risk-scheme");
    const others = await page.locator("#risk-inputs-table tbody tr").evaluateAll((trs, id) => trs.filter((tr) => { const path = tr.querySelector(".path")?.textContent ?? ""; return path.startsWith("schemes.") && !path.startsWith(`schemes.${id}.`); }).map((tr) => tr.querySelector("th")?.firstChild?.textContent ?? ""), scheme);
    expect(others.length).toBeGreaterThan(0);
    const labels = await page.locator("#cell-risk-sensitivity figure").first().locator("[aria-label='y-axis tick label'] text").allTextContents();
    expect(labels.length).toBeGreaterThan(0);
    for (const label of labels) expect(others).not.toContain(label);
    await page.fill("#risk-samples", "80");
    await page.press("#risk-samples", "Enter");
    await expect.poll(() => page.locator("#risk-stale").isVisible()).toBe(true);
    expect(await page.locator("#cell-risk-ranges").getAttribute("class")).toMatch(/out-of-date/);
    expect(await page.locator("#cell-risk-inputs").innerText()).toMatch(/least/);
    expect(await page.locator("#cell-risk-inputs").innerText()).not.toMatch(/Beta-PERT|tornado/i);
    expect(errors).toEqual([]);
    await page.close();
  });

  it("inputs can be filtered by kind and by words", async () => {
    const { page, errors } = await openPage(browser, `${inject("baseUrl")}/risk.html`);
    await page.waitForSelector("#risk-inputs-table tbody tr");
    const all = await page.locator("#risk-inputs-table tbody tr").count();
    await page.selectOption("#risk-filter-kind", "Carbon factors and settings");
    await expect.poll(() => page.locator("#risk-inputs-table tbody tr").count()).toBeLessThan(all);
    for (const text of await page.locator("#risk-inputs-table tbody tr .kind").allTextContents()) expect(text).toBe("Carbon factors and settings");
    await page.selectOption("#risk-filter-kind", "all");
    await page.fill("#risk-filter-words", "snow");
    await expect.poll(() => page.locator("#risk-inputs-table tbody tr").count()).toBeGreaterThan(0);
    for (const text of await page.locator("#risk-inputs-table tbody tr th").allTextContents()) expect(text.toLowerCase()).toContain("snow");
    expect(await page.locator("#risk-filter-count").textContent()).toMatch(new RegExp(`of ${all} inputs shown`));
    expect(errors).toEqual([]);
    await page.close();
  });
});
