// Issue 14, "the answer first": the verdict sentences agree with the table, and the table sorts by any column.
import { describe, it, expect, beforeAll, afterAll, inject } from "vitest";
import type { Browser, Page } from "playwright-core";
import { launchChromium, openPage } from "./browser";

let browser: Browser;
beforeAll(async () => {
  browser = await launchChromium();
});
afterAll(async () => {
  await browser?.close();
});

/** The scheme ids of the table's rows in their order, and the row id marked best in a column. */
async function tableState(page: Page, column: string): Promise<{ order: string[]; best: string | null; values: string[] }> {
  return page.evaluate((key) => {
    const table = document.querySelector("#cell-comparison table")!;
    const index = Array.from(table.querySelectorAll("thead th")).findIndex((th) => (th as HTMLElement).dataset.key === key);
    const rows = Array.from(table.querySelectorAll<HTMLTableRowElement>("tbody tr"));
    const best = rows.find((tr) => tr.children[index]?.hasAttribute("data-best"));
    return { order: rows.map((tr) => tr.dataset.id ?? ""), best: best?.dataset.id ?? null, values: rows.map((tr) => tr.children[index]?.childNodes[0]?.textContent ?? "") };
  }, column);
}

describe("compare page: the answer first (issue 14)", () => {
  it("each winner the verdict names is the row the table marks best in that column, with the same figure", async () => {
    const { page, errors } = await openPage(browser, `${inject("baseUrl")}/compare.html`);
    await page.waitForSelector("#cell-verdict p[data-winner]");
    await page.waitForSelector("#cell-comparison table");
    const winners = await page.locator("#cell-verdict p[data-winner]").evaluateAll((ps) => ps.map((p) => ({ id: (p as HTMLElement).dataset.winner ?? "", metrics: ((p as HTMLElement).dataset.metrics ?? "").split(" "), text: p.textContent ?? "" })));
    const named = new Set(winners.flatMap((w) => w.metrics));
    expect([...named].sort()).toEqual(["carbon", "cost", "weight"]);
    for (const w of winners) {
      for (const metric of w.metrics) {
        const state = await tableState(page, metric);
        expect(state.best, `${metric}: the table's best`).toBe(w.id);
        const figure = state.values[state.order.indexOf(w.id)] ?? "?";
        expect(w.text, `${metric}: the sentence carries the table's figure`).toContain(figure);
      }
    }
    expect(await page.locator("#cell-verdict").innerText()).not.toMatch(/could not be computed|from memory/);
    expect(errors).toEqual([]);
    await page.close();
  });

  it("a scheme out of its valid range is left out of the verdict with its reason, and drawn apart in the table", async () => {
    const { page, errors } = await openPage(browser, `${inject("baseUrl")}/compare.html`);
    await page.waitForSelector("#cell-comparison table");
    await page.fill("#spanM", "300");
    await page.waitForFunction(() => document.querySelector("#cell-comparison caption")?.textContent?.includes("300 m"));
    const excluded = await page.locator("#cell-verdict p.excluded").innerText();
    expect(excluded).toMatch(/Left out of the ranking: .*(outside its method's valid range|not feasible)/);
    const notRanked = await page.locator("#cell-comparison tr.not-ranked").count();
    expect(notRanked).toBeGreaterThan(0);
    // Rows left out never carry a "best" mark.
    expect(await page.locator("#cell-comparison tr.not-ranked td[data-best]").count()).toBe(0);
    expect(errors).toEqual([]);
    await page.close();
  });

  it("clicking a heading sorts the ranked rows by that column, again the other way", async () => {
    const { page, errors } = await openPage(browser, `${inject("baseUrl")}/compare.html`);
    await page.waitForSelector("#cell-comparison table");
    const numbers = (values: string[]) => values.map((v) => Number(v.replace(/,/g, "").replace("−", "-")));
    const rankedCount = await page.locator("#cell-comparison tbody tr:not(.not-ranked)").count();
    for (const key of ["cost", "weight", "floor"]) {
      await page.click(`#cell-comparison th[data-key="${key}"] button`);
      expect(await page.locator(`#cell-comparison th[data-key="${key}"]`).getAttribute("aria-sort")).toBe("ascending");
      const up = numbers((await tableState(page, key)).values.slice(0, rankedCount));
      expect(up).toEqual([...up].sort((a, b) => a - b));
      await page.click(`#cell-comparison th[data-key="${key}"] button`);
      expect(await page.locator(`#cell-comparison th[data-key="${key}"]`).getAttribute("aria-sort")).toBe("descending");
      const down = numbers((await tableState(page, key)).values.slice(0, rankedCount));
      expect(down).toEqual([...down].sort((a, b) => b - a));
    }
    await page.click('#cell-comparison th[data-key="scheme"] button');
    const labels = await page.locator("#cell-comparison tbody tr:not(.not-ranked) td:first-child").allInnerTexts();
    expect(labels).toEqual([...labels].sort((a, b) => a.localeCompare(b)));
    expect(errors).toEqual([]);
    await page.close();
  });

  it("the table's caption wraps within its scroll box and stays in view while the table scrolls sideways", async () => {
    const { page, errors } = await openPage(browser, `${inject("baseUrl")}/compare.html`);
    await page.waitForSelector("#cell-comparison table caption");
    const box = () =>
      page.evaluate(() => {
        const wrap = document.querySelector<HTMLElement>("#cell-comparison .table-scroll")!;
        const caption = document.querySelector("#cell-comparison caption")!.getBoundingClientRect();
        const view = wrap.getBoundingClientRect();
        return { wider: wrap.scrollWidth > wrap.clientWidth, left: caption.left - view.left, right: view.right - caption.right };
      });
    const before = await box();
    // the table is wider than its column at 1280 px (else this test would not test the caption's wrap)
    expect(before.wider).toBe(true);
    expect(before.left).toBeGreaterThanOrEqual(-0.5);
    expect(before.right).toBeGreaterThanOrEqual(-0.5);
    await page.evaluate(() => document.querySelector("#cell-comparison .table-scroll")!.scrollBy(200, 0));
    const scrolled = await box();
    expect(scrolled.left).toBeGreaterThanOrEqual(-0.5);
    expect(scrolled.right).toBeGreaterThanOrEqual(-0.5);
    expect(errors).toEqual([]);
    await page.close();
  });
});

describe("short links (issue 14)", () => {
  it("after one snow change the address holds a compressed link under 1,000 characters that reopens the study in a fresh browser", async () => {
    const { page, errors } = await openPage(browser, `${inject("baseUrl")}/compare.html`);
    await page.waitForSelector("#cell-comparison table");
    await page.fill("#snowGroundKPa", "1.3");
    await page.waitForFunction(() => location.hash.startsWith("#s=z"));
    const url = page.url();
    expect(url.length).toBeLessThan(1100);
    const fresh = await browser.newContext();
    const other = await fresh.newPage();
    await other.goto(url);
    await other.waitForSelector("#cell-comparison table");
    expect(await other.inputValue("#snowGroundKPa")).toBe("1.3");
    await fresh.close();
    expect(errors).toEqual([]);
    await page.close();
  });
});
