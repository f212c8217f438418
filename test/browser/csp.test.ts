// Issue 10, hardening: the pages had no Content-Security-Policy. Every page now carries one as a
// meta tag (the built files) and as a header (vite preview, which `npm start` and these tests use);
// every page loads with no violation and the workers (span study, risk) still run under it.
import { describe, it, expect, beforeAll, afterAll, inject } from "vitest";
import type { Browser, Page } from "playwright-core";
import { launchChromium } from "./browser";
import { PAGES } from "../../src/notebook/pages";

let browser: Browser;
beforeAll(async () => {
  browser = await launchChromium();
});
afterAll(async () => {
  await browser?.close();
});

type Watched = { page: Page; errors: string[]; violations: () => Promise<string[]>; header: string | null; close: () => Promise<void> };

/** Opens a page recording console errors and every securitypolicyviolation event from the start. */
async function watch(file: string): Promise<Watched> {
  const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
  await context.addInitScript(() => {
    const list: string[] = [];
    (window as unknown as { cspViolations: string[] }).cspViolations = list;
    document.addEventListener("securitypolicyviolation", (e) => list.push(`${e.effectiveDirective} blocked ${e.blockedURI || "(inline)"} at ${e.sourceFile}:${e.lineNumber}`));
  });
  const page = await context.newPage();
  const errors: string[] = [];
  page.on("console", (m) => {
    if (m.type() === "error") errors.push(m.text());
  });
  page.on("pageerror", (e) => errors.push(e.message));
  const response = await page.goto(`${inject("baseUrl")}/${file}`);
  return {
    page,
    errors,
    header: response?.headers()["content-security-policy"] ?? null,
    violations: () => page.evaluate(() => (window as unknown as { cspViolations: string[] }).cspViolations),
    close: () => context.close(),
  };
}

describe("Content-Security-Policy", () => {
  for (const { file } of [{ file: "index.html" }, ...PAGES]) {
    it(`${file} carries the policy (meta and header) and loads with no violation`, async () => {
      const w = await watch(file);
      await w.page.waitForLoadState("networkidle");
      await w.page.waitForTimeout(300);
      const meta = await w.page.locator('meta[http-equiv="Content-Security-Policy"]').getAttribute("content");
      expect(meta).toMatch(/script-src 'self'(;|$)/);
      expect(meta).not.toMatch(/unsafe-eval/);
      expect(w.header).toMatch(/script-src 'self';/);
      expect(w.header).toMatch(/frame-ancestors 'none'/);
      expect(await w.page.locator(".cell-error").count()).toBe(0);
      expect(await w.violations()).toEqual([]);
      expect(w.errors).toEqual([]);
      await w.close();
    });
  }

  it("blocks an inline script (the policy is in force)", async () => {
    const w = await watch("compare.html");
    await w.page.waitForLoadState("networkidle");
    const ran = await w.page.evaluate(() => {
      const s = document.createElement("script");
      s.textContent = "window.inlineRan = true";
      document.body.append(s);
      return (window as unknown as { inlineRan?: boolean }).inlineRan === true;
    });
    expect(ran).toBe(false);
    // Reported once per policy in force (the meta tag and the header) and per check Chromium makes.
    await expect.poll(async () => (await w.violations()).length).toBeGreaterThan(0);
    for (const v of await w.violations()) expect(v).toMatch(/^script-src(-elem)? blocked (inline)/);
    await w.close();
  });

  it("the span-study workers and the risk worker run under it", async () => {
    const span = await watch("span-study.html");
    await span.page.waitForSelector("#cell-span-charts svg", { timeout: 60_000 });
    expect(await span.page.locator("#cell-status").innerText()).toMatch(/37 spans/);
    expect(await span.violations()).toEqual([]);
    expect(span.errors).toEqual([]);
    await span.close();

    const risk = await watch("risk.html");
    await risk.page.waitForSelector("#risk-inputs-table tbody tr");
    await risk.page.fill("#risk-samples", "60");
    await risk.page.click("#risk-run");
    await risk.page.waitForSelector("#risk-results-table", { timeout: 60_000 });
    expect(await risk.page.locator("#risk-status").textContent()).toMatch(/Done: 60 samples/);
    expect(await risk.violations()).toEqual([]);
    expect(risk.errors).toEqual([]);
    await risk.close();
  });
});
