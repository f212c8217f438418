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

/** The two model figures of a scheme: each chart's accessible name, description, caption and member titles. */
async function modelFigures(page: Page, id: string) {
  const charts = page.locator(`#${id}-model-slot svg[role="img"]`);
  await expect.poll(() => charts.count(), { timeout: 45_000 }).toBe(2);
  return Promise.all(
    [0, 1].map(async (k) => {
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
  const [plan, oblique] = figures;
  expect(plan!.name).toMatch(/3D analysis, plan$/);
  expect(oblique!.name).toMatch(/3D analysis, oblique view$/);
  expect(plan!.description).toMatch(/ nodes in plan; /);
  expect(oblique!.description).toMatch(/ nodes in an oblique view \(azimuth −35°, elevation 25°\); /);
  for (const f of figures) {
    expect(f.description).toMatch(label);
    const magnified = /magnified ([\d.]+)×/.exec(f.description);
    expect(magnified).not.toBeNull();
    expect(Number(magnified![1])).toBeGreaterThan(0);
    // The caption states the same magnification as the description.
    expect(f.text).toContain(`magnified ${magnified![1]}×`);
    expect(f.description).toMatch(/\d+ slack cables dashed; the most utilised members marked\./);
    // Members carry their state and force; some are marked the most utilised, and the legend says so.
    expect(f.marks.some((t) => /^most utilised: -?\d+ kN$/.test(t))).toBe(true);
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
    checkFigures(await modelFigures(page, "geodesic-dome"), /deformed shape under .+ magnified/);
    // its lattice follows the cap, which the section names
    await expect.poll(() => page.locator("#cell-geodesic-dome-drawing .figure").first().textContent(), { timeout: 45_000 }).toMatch(/roof cap, rise [\d.]+ m/);
    expect(errors).toEqual([]);
    await page.close();
  });
});
