// Issue 14, method page: a search over the assumptions record; a switched-off scheme is not called
// infeasible when two studies are compared; the same study file picker as the other pages.
import { describe, it, expect, beforeAll, afterAll, inject } from "vitest";
import type { Browser } from "playwright-core";
import { writeFileSync, mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import demo from "../../data/demo-study.json";
import { launchChromium, openPage } from "./browser";

let browser: Browser;
beforeAll(async () => {
  browser = await launchChromium();
});
afterAll(async () => {
  await browser?.close();
});

describe("method page (issue 14)", () => {
  it("keeps the standards' references and the command-line flags in its methods whole, however narrow the page", async () => {
    for (const width of [1300, 390]) {
      const { page, errors } = await openPage(browser, `${inject("baseUrl")}/method.html`);
      await page.setViewportSize({ width, height: 900 });
      await page.waitForSelector("#cell-methods td");
      const runs = await page.evaluate(() => [...document.querySelectorAll("#cell-methods td .whole")].map((s) => ({ text: s.textContent, lines: s.getClientRects().length })));
      expect(runs.map((r) => r.text)).toContain("--buckling");
      expect(runs.filter((r) => r.lines !== 1)).toEqual([]);
      expect(errors).toEqual([]);
      await page.close();
    }
  });

  it("the search box narrows the record to the rows with every word typed, and says how many match", async () => {
    const { page, errors } = await openPage(browser, `${inject("baseUrl")}/method.html`);
    await page.waitForSelector("#record-rows tbody tr");
    const all = await page.locator("#record-rows tbody tr").count();
    await page.fill("#record-search", "snow");
    await expect.poll(() => page.locator("#record-rows tbody tr").count()).toBeLessThan(all);
    const rows = await page.locator("#record-rows tbody tr").allInnerTexts();
    expect(rows.length).toBeGreaterThan(0);
    for (const row of rows) expect(row.toLowerCase()).toContain("snow");
    expect(await page.locator("#record-count").innerText()).toMatch(new RegExp(`${rows.length} match “snow”`));
    await page.fill("#record-search", "");
    await expect.poll(() => page.locator("#record-rows tbody tr").count()).toBe(all);
    expect(errors).toEqual([]);
    await page.close();
  });

  it("a study with a scheme switched off reads 'switched off', never 'infeasible', and is chosen with the button picker", async () => {
    const other = structuredClone(demo) as { schemes: Record<string, { enabled?: boolean }> };
    other.schemes["truss-roof"] = { ...other.schemes["truss-roof"], enabled: false };
    const path = join(mkdtempSync(join(tmpdir(), "spanbook-method-")), "truss-off.spanbook.json");
    writeFileSync(path, JSON.stringify(other));
    const { page, errors } = await openPage(browser, `${inject("baseUrl")}/method.html`);
    await page.waitForSelector("#record-rows tbody tr");
    expect(await page.getByRole("button", { name: "Choose study file B…" }).count()).toBe(1);
    await page.setInputFiles("#other-study", path);
    await page.waitForSelector("#cell-compare-studies table");
    const text = await page.locator("#cell-compare-studies").innerText();
    expect(text).toMatch(/Steel truss roof[^\n]*→ switched off/);
    expect(text).not.toMatch(/infeasible/i);
    expect(errors).toEqual([]);
    await page.close();
  });
});
