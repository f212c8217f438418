// The 3D analysis figures in a scheme's details on the compare page (issue 13 item 7): the plan and
// the oblique projection, the deformed shape at a stated magnification, slack cables and the most
// utilised members marked, and the chart's accessible name and description.
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

/** The model figures of a scheme (plan and oblique view, and a lattice's buckling mode): each chart's accessible name, description, caption and member titles. */
async function modelFigures(page: Page, id: string, count = 2) {
  const charts = page.locator(`#${id}-model-slot svg[role="img"]`);
  await expect.poll(() => charts.count(), { timeout: 90_000 }).toBe(count);
  return Promise.all(
    Array.from({ length: count }, async (_, k) => {
      const svg = charts.nth(k);
      const figure = page.locator(`#${id}-model-slot .figure`).nth(k);
      return {
        name: await svg.getAttribute("aria-label"),
        description: (await svg.locator(":scope > desc").textContent()) ?? "",
        text: await figure.innerText(),
        marks: await svg.locator("title").allTextContents(),
      };
    }),
  );
}

function checkFigures(figures: Awaited<ReturnType<typeof modelFigures>>, label: RegExp): void {
  const [plan, oblique] = figures as [(typeof figures)[number], (typeof figures)[number]];
  expect(plan!.name).toMatch(/3D analysis, plan$/);
  expect(oblique!.name).toMatch(/3D analysis, oblique view$/);
  expect(plan!.description).toMatch(/ nodes in plan; /);
  expect(oblique!.description).toMatch(/ nodes in an oblique view \(azimuth −35°, elevation 25°\); /);
  for (const f of [plan, oblique]) {
    expect(f.description).toMatch(label);
    const magnified = /magnified ([\d.]+)×/.exec(f.description);
    expect(magnified).not.toBeNull();
    expect(Number(magnified![1])).toBeGreaterThan(0);
    // The caption states the same magnification as the description.
    expect(f.text).toContain(`magnified ${magnified![1]}×`);
    expect(f.description).toMatch(/\d+ slack cables dashed; the most utilised members marked\./);
    // Members carry their state and force; some are marked the most utilised, and the legend says so.
    expect(f.marks.some((t) => /^most utilised: −?\d{1,3}(,\d{3})* kN$/.test(t))).toBe(true);
    expect(f.text).toContain("most utilised");
  }
}

describe("3D analysis figures on the compare page", () => {
  it("the cable dome with the 3D analysis: plan and oblique view, deformed shape, marks, accessible name and description", async () => {
    const { page, errors } = await openPage(browser, `${inject("baseUrl")}/compare.html`);
    await page.waitForSelector("#cell-comparison table");
    await page.click("#cable-dome-options-panel summary");
    await page.selectOption("#cable-dome-analysis", "3d");
    await page.click("#cable-dome-details summary");
    checkFigures(await modelFigures(page, "cable-dome"), /deformed shape under .+ magnified/);
    // its section draws its own fabric from its raised ring, on the wall the ring sits on, and not the brief's cap from the eaves
    const section = page.locator("#cell-cable-dome-drawing .figure").first();
    await expect.poll(() => section.textContent(), { timeout: 45_000 }).toContain("perimeter wall");
    expect(await section.textContent()).not.toContain("roof cap");
    expect(errors).toEqual([]);
    await page.close();
  });

  it("the geodesic dome with its buckling analysis: the same figures for the rigid-jointed net", async () => {
    const { page, errors } = await openPage(browser, `${inject("baseUrl")}/compare.html`);
    await page.waitForSelector("#cell-comparison table");
    await page.click("#geodesic-dome-options-panel summary");
    await page.check("#geodesic-dome-bucklingAnalysis");
    await page.click("#geodesic-dome-details summary");
    const figures = await modelFigures(page, "geodesic-dome", 3);
    checkFigures(figures, /deformed shape under .+ magnified/);
    // and its lowest buckling mode, with its elastic factor, drawn at a stated size
    expect(figures[2]!.name).toMatch(/3D analysis, lowest buckling mode, elastic factor [\d.]+ \(oblique view\)$/);
    expect(figures[2]!.description).toMatch(/buckling mode under .+, its largest movement drawn as [\d.]+ m/);
    // its lattice follows the cap, which the section names
    await expect.poll(() => page.locator("#cell-geodesic-dome-drawing .figure").first().textContent(), { timeout: 45_000 }).toMatch(/roof cap, rise [\d.]+ m/);
    expect(errors).toEqual([]);
    await page.close();
  });
  it("the timber dome's details offer the on-demand analysis: the button switches the study's option on and the model with its buckling mode is drawn", async () => {
    const { page, errors } = await openPage(browser, `${inject("baseUrl")}/compare.html`);
    await page.waitForSelector("#cell-comparison table");
    await page.click("#timber-dome-details summary");
    const slot = page.locator("#timber-dome-model-slot");
    await expect.poll(() => slot.innerText(), { timeout: 45_000 }).toMatch(/runs only when asked/);
    expect(await slot.innerText()).toContain("“3D analysis of the net (general buckling)”");
    await page.click("#timber-dome-run-analysis");
    // the option is the study's own: the Options panel's toggle shows it on
    expect(await page.isChecked("#timber-dome-bucklingAnalysis")).toBe(true);
    const figures = await modelFigures(page, "timber-dome", 3);
    expect(await slot.innerText()).not.toMatch(/runs only when asked/);
    expect(figures[2]!.name).toMatch(/lowest buckling mode, elastic factor [\d.]+ \(oblique view\)$/);
    expect(figures[2]!.description).toMatch(/buckling mode/);
    expect(errors).toEqual([]);
    await page.close();
  });
});
