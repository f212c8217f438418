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

describe("compare page", () => {
  it("changing the span updates the section chart and the derived numbers, with no console errors", async () => {
    const { page, errors } = await openPage(browser, `${inject("baseUrl")}/compare.html`);
    await page.waitForSelector("#cell-section svg");
    const radiusBefore = await page.locator("#cell-geometry dd").first().textContent();
    const chartBefore = await page.locator("#cell-section svg").first().innerHTML();
    const briefRendersBefore = await page.locator("#cell-loads").getAttribute("data-renders");

    await page.fill("#spanM", "120");
    await page.waitForFunction((before) => document.querySelector("#cell-geometry dd")?.textContent !== before, radiusBefore);

    const radiusAfter = await page.locator("#cell-geometry dd").first().textContent();
    const chartAfter = await page.locator("#cell-section svg").first().innerHTML();
    expect(radiusAfter).not.toBe(radiusBefore);
    expect(chartAfter).not.toBe(chartBefore);
    expect(await page.locator("#cell-section figure, #cell-section svg").count()).toBeGreaterThan(0);
    expect(Number(await page.locator("#cell-loads").getAttribute("data-renders"))).toBeGreaterThan(Number(briefRendersBefore));
    expect(errors).toEqual([]);
    await page.close();
  });

  it("a scheme option re-renders exactly the cells that depend on it", async () => {
    const { page, errors } = await openPage(browser, `${inject("baseUrl")}/compare.html`);
    await page.waitForSelector("#cell-comparison table");
    const renders = (id: string) => page.locator(`#cell-${id}`).getAttribute("data-renders").then(Number);
    const ids = ["loads", "geometry", "section", "geodesic-dome-summary", "cable-dome-summary", "truss-roof-summary", "comparison"];
    const before = Object.fromEntries(await Promise.all(ids.map(async (id) => [id, await renders(id)] as const)));
    await page.click("#truss-roof-options-panel summary");
    await page.fill("#truss-roof-spanDepthRatio", "12");
    await expect.poll(() => renders("truss-roof-summary")).toBeGreaterThan(before["truss-roof-summary"] ?? 0);
    expect(await renders("comparison")).toBeGreaterThan(before.comparison ?? 0);
    for (const untouched of ["loads", "geometry", "section", "geodesic-dome-summary", "cable-dome-summary"]) expect(await renders(untouched)).toBe(before[untouched]);
    expect(errors).toEqual([]);
    await page.close();
  });

  it("a searched proportion's field says which value the design shown uses, until it is pinned at that value", async () => {
    const { page, errors } = await openPage(browser, `${inject("baseUrl")}/compare.html`);
    await page.waitForSelector("#cell-geodesic-dome-proportions p");
    await page.click("#geodesic-dome-options-panel summary");
    const note = page.locator("#cell-geodesic-dome-options .free-option", { has: page.locator("#geodesic-dome-targetStrutLengthM") }).locator(".chosen-note");
    await expect.poll(() => note.textContent()).toMatch(/^searched: the design shown uses [\d.]+$/);
    const used = (await note.textContent())!.replace("searched: the design shown uses ", "");
    // the same value the panel's sentence names as chosen
    expect(await page.locator("#cell-geodesic-dome-proportions p").first().textContent()).toContain(`Target strut length ${used} m`);
    await page.check("#geodesic-dome-targetStrutLengthM-pinned");
    await expect.poll(() => note.textContent()).toBe("");
    expect(Number(await page.inputValue("#geodesic-dome-targetStrutLengthM"))).toBe(Number(used));
    expect(errors).toEqual([]);
    await page.close();
  });

  it("an out-of-range value shows an inline message and changes nothing", async () => {
    const { page, errors } = await openPage(browser, `${inject("baseUrl")}/compare.html`);
    await page.waitForSelector("#cell-geometry dd");
    const before = await page.locator("#cell-geometry").innerText();
    await page.fill("#spanM", "900");
    await expect.poll(() => page.locator("#spanM-message").textContent()).toMatch(/out of range/);
    expect(await page.locator("#cell-geometry").innerText()).toBe(before);
    expect(errors).toEqual([]);
    await page.close();
  });

  it("a decimal comma or a stray letter typed into the span is refused naming the field, never read as another number (audit8: '12,5' became 125 m)", async () => {
    const { page, errors } = await openPage(browser, `${inject("baseUrl")}/compare.html`);
    await page.waitForSelector("#cell-geometry dd");
    const before = await page.locator("#cell-geometry").innerText();
    for (const [typed, said] of [["12,5", /Clear span \(plan diameter\): "12,5" is not a number: write the decimal with a point \(12\.5\)/], ["16o", /Clear span \(plan diameter\): "16o" is not a number \(allowed 30 to 500 m\)/]] as const) {
      await page.locator("#spanM").fill("");
      await page.locator("#spanM").pressSequentially(typed);
      await expect.poll(() => page.locator("#spanM-message").textContent()).toMatch(said);
      expect(await page.locator("#spanM-message").textContent()).toMatch(/not applied; in force: 160 m/);
      await page.locator("#spanM").press("Enter");
      expect(await page.inputValue("#spanM")).toBe("160");
    }
    expect(await page.locator("#cell-geometry").innerText()).toBe(before);
    expect(errors).toEqual([]);
    await page.close();
  });

  it("the arrow keys step the span by its step, as a number field's do (it is a text field since audit8)", async () => {
    const { page, errors } = await openPage(browser, `${inject("baseUrl")}/compare.html`);
    await page.waitForSelector("#cell-geometry dd");
    await page.locator("#spanM").press("ArrowUp");
    await page.locator("#spanM").press("ArrowUp");
    expect(await page.inputValue("#spanM")).toBe("162");
    await expect.poll(() => page.locator("#cell-section figcaption").textContent()).toContain("Span 162 m");
    await page.locator("#spanM").press("ArrowDown");
    expect(await page.inputValue("#spanM")).toBe("161");
    expect(errors).toEqual([]);
    await page.close();
  });

  it("a rise above half the span is refused at the field and no cell fails (issue 10: it used to fail every result cell)", async () => {
    const { page, errors } = await openPage(browser, `${inject("baseUrl")}/compare.html`);
    await page.waitForSelector("#cell-geometry dd");
    const before = await page.locator("#cell-geometry").innerText();
    await page.fill("#spanM", "40");
    await expect.poll(() => page.locator("#spanM-message").textContent()).toMatch(/brief\.riseM at \d+ m \(expected 0 < rise ≤ span\/2 = 20 m\)/);
    await page.fill("#riseM", "100");
    await expect.poll(() => page.locator("#riseM-message").textContent()).toMatch(/100 m \(expected 0 < rise ≤ span\/2 = 80 m\)/);
    expect(await page.locator("#cell-geometry").innerText()).toBe(before);
    expect(await page.locator(".cell-error").count()).toBe(0);
    await page.fill("#riseM", "10");
    await expect.poll(() => page.locator("#cell-geometry").innerText()).not.toBe(before);
    expect(errors).toEqual([]);
    await page.close();
  });

  it("the study survives a reload (browser storage) and the link reopens it", async () => {
    const { page } = await openPage(browser, `${inject("baseUrl")}/compare.html`);
    await page.waitForSelector("#cell-geometry dd");
    await page.fill("#spanM", "210");
    await page.waitForFunction(() => location.hash.startsWith("#s="));
    const link = page.url();
    const geometry = await page.locator("#cell-geometry").innerText();
    await page.reload();
    await page.waitForSelector("#cell-geometry dd");
    expect(await page.locator("#cell-geometry").innerText()).toBe(geometry);
    const fresh = await browser.newContext();
    const other = await fresh.newPage();
    await other.goto(link);
    await other.waitForSelector("#cell-geometry dd");
    expect(await other.locator("#cell-geometry").innerText()).toBe(geometry);
    await fresh.close();
    await page.close();
  });
});
