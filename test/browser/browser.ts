// Headless Debian Chromium through playwright-core (never a downloaded browser).
import { chromium, type Browser, type Page } from "playwright-core";

export const CHROMIUM_ARGS = [
  "--headless",
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
  "--disable-dev-shm-usage",
];

export function launchChromium(): Promise<Browser> {
  return chromium.launch({ executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium", args: CHROMIUM_ARGS });
}

/** A new page that records console errors and uncaught exceptions. */
export async function openPage(browser: Browser, url: string): Promise<{ page: Page; errors: string[] }> {
  const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
  const errors: string[] = [];
  page.on("console", (message) => {
    if (message.type() === "error") errors.push(message.text());
  });
  page.on("pageerror", (error) => errors.push(error.message));
  await page.goto(url);
  return { page, errors };
}

/**
 * Waits until a page's results have all arrived: no cell busy (the design workers' results) and,
 * on the span study, both passes done (the tension roofs' 3D pass ends some seconds after the charts
 * first appear, and redraws them).
 */
export async function resultsSettled(page: Page, timeoutMs = 180_000): Promise<void> {
  await page.waitForFunction(() => document.querySelectorAll("[aria-busy=true]").length === 0 && !document.querySelector("#span-progress"), undefined, { timeout: timeoutMs, polling: 200 });
}
