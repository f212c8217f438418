// `npm run bench -- lead`: the project lead's interactions on the built site (issue 14):
//   - dragging the span slider on the compare page: frames per step and the longest main-thread task;
//   - a compare edit (a scheme option) → the option charts redrawn;
//   - the span study (37 spans, every scheme) from a range change to its charts.
// BENCH_DIST=other/dist serves another build (to time "before" against "after"). Nothing asserted.
import { resolve } from "node:path";
import { preview } from "vite";
import { chromium, type Page } from "playwright-core";
import { CHROMIUM_ARGS } from "../browser/browser";

// absolute: vite preview resolved the relative "dist" to a directory that answered every page with an error
const dist = resolve(process.env.BENCH_DIST ?? "dist");

function median(samples: readonly number[]): number {
  const sorted = [...samples].sort((a, b) => a - b);
  return sorted[Math.floor((sorted.length - 1) / 2)] ?? Number.NaN;
}
function p95(samples: readonly number[]): number {
  const sorted = [...samples].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.ceil(0.95 * sorted.length) - 1)] ?? Number.NaN;
}

/** Records long tasks (> 50 ms) from now on into window.__long. */
async function watchLongTasks(page: Page): Promise<void> {
  await page.evaluate(() => {
    const w = window as unknown as { __long: number[] };
    w.__long = [];
    new PerformanceObserver((list) => list.getEntries().forEach((e) => w.__long.push(e.duration))).observe({ type: "longtask", buffered: false });
  });
}
const longest = (page: Page) => page.evaluate(() => Math.max(0, ...(window as unknown as { __long: number[] }).__long));
const longCount = (page: Page) => page.evaluate(() => (window as unknown as { __long: number[] }).__long.length);

/**
 * Drags the span slider one step per animation frame, as a hand does, and counts the frames each
 * step took to come round (1 = the page kept up) and how long until the comparison showed the last value.
 */
async function sliderDrag(page: Page, steps: number): Promise<{ framesPerStep: number[]; settleMs: number }> {
  return page.evaluate(
    (n) =>
      new Promise<{ framesPerStep: number[]; settleMs: number }>((resolve) => {
        const slider = document.querySelector<HTMLInputElement>('#cell-brief input[type="range"]');
        if (!slider) throw new Error("no span slider");
        const framesPerStep: number[] = [];
        let i = 0;
        let last = performance.now();
        const frame = 1000 / 60;
        const step = () => {
          const now = performance.now();
          if (i > 0) framesPerStep.push(Math.max(1, Math.round((now - last) / frame)));
          last = now;
          if (i >= n) {
            const target = slider.value;
            const t0 = performance.now();
            const settled = () => {
              const caption = document.querySelector("#cell-comparison caption")?.textContent ?? "";
              if (caption.includes(`${target} m`) && !document.querySelector("#cell-comparison[aria-busy='true']")) resolve({ framesPerStep, settleMs: performance.now() - t0 });
              else requestAnimationFrame(settled);
            };
            settled();
            return;
          }
          slider.value = String(100 + i);
          slider.dispatchEvent(new Event("input", { bubbles: true }));
          i += 1;
          requestAnimationFrame(step);
        };
        requestAnimationFrame(step);
      }),
    steps,
  );
}

async function optionEdit(page: Page, value: string): Promise<number> {
  // The charts are drawn in turns after the results settle: `data-drawn` counts finished drawings.
  const before = Number((await page.locator("#cell-comparison-charts").getAttribute("data-drawn")) ?? 0);
  const t0 = await page.evaluate(() => performance.now());
  await page.evaluate((v) => {
    const input = document.querySelector<HTMLInputElement>("#truss-roof-spanDepthRatio");
    if (!input) throw new Error("no truss option");
    input.value = v;
    input.dispatchEvent(new Event("input", { bubbles: true }));
  }, value);
  await page.waitForFunction((n) => Number(document.querySelector("#cell-comparison-charts")?.getAttribute("data-drawn") ?? 0) > n, before, { polling: "raf" });
  return (await page.evaluate(() => performance.now())) - t0;
}

const server = await preview({ build: { outDir: dist }, preview: { host: "127.0.0.1", port: 4192, strictPort: true }, logLevel: "silent" });
const browser = await chromium.launch({ executablePath: "/usr/bin/chromium", args: CHROMIUM_ARGS });
// tsx keeps function names with a __name helper the page does not have.
const context = await browser.newContext({ viewport: { width: 1400, height: 900 } });
await context.addInitScript("globalThis.__name = (f) => f");
try {
  console.log(`\n## the lead's interactions (${dist}, headless Chromium, 1400×900; load average ${(await import("node:os")).loadavg()[0]!.toFixed(1)})`);
  const page = await context.newPage();
  await page.goto("http://127.0.0.1:4192/compare.html");
  await page.waitForSelector("#cell-comparison table", { timeout: 60_000 });
  await page.waitForSelector("#cell-comparison-charts svg", { timeout: 60_000 });
  await watchLongTasks(page);
  const drawnBefore = Number((await page.locator("#cell-comparison-charts").getAttribute("data-drawn")) ?? 0);
  const drag = await sliderDrag(page, 40);
  const t0 = await page.evaluate(() => performance.now());
  await page.waitForFunction((n) => Number(document.querySelector("#cell-comparison-charts")?.getAttribute("data-drawn") ?? 0) > n, drawnBefore, { polling: "raf", timeout: 60_000 });
  const chartsMs = (await page.evaluate(() => performance.now())) - t0;
  console.log(`span slider drag, 40 steps one per frame: frames per step median ${median(drag.framesPerStep)}, p95 ${p95(drag.framesPerStep)}, max ${Math.max(...drag.framesPerStep)}; table shows the last span ${drag.settleMs.toFixed(0)} ms after the drag, the charts ${chartsMs.toFixed(0)} ms after that; longest main-thread task ${(await longest(page)).toFixed(0)} ms; tasks over 50 ms: ${await longCount(page)}`);

  await page.click("#truss-roof-options-panel summary");
  await watchLongTasks(page);
  const edits: number[] = [];
  for (let i = 0; i < 12; i++) edits.push(await optionEdit(page, String(10 + (i % 6))));
  console.log(`compare edit (truss span/depth) → option charts redrawn: median ${median(edits).toFixed(0)} ms, p95 ${p95(edits).toFixed(0)} ms; longest main-thread task ${(await longest(page)).toFixed(0)} ms`);

  // SPAN_STUDY=0 leaves the span study out (a minute under load) when only the compare page is timed
  if (process.env.SPAN_STUDY !== "0") {
    const span = await context.newPage();
    await span.goto("http://127.0.0.1:4192/span-study.html");
    await span.waitForSelector("#cell-span-charts svg", { timeout: 120_000 });
    await watchLongTasks(span);
    const runs: number[] = [];
    // The charts are drawn in turns once the study is done (`data-drawn` counts finished sets); a build
    // from before that drew them with the cell (`data-renders`), which BENCH_DIST may still time.
    await span.waitForTimeout(1000); // the first set's last charts
    const counter = (await span.locator("#cell-span-charts").getAttribute("data-drawn")) === null ? "data-renders" : "data-drawn";
    for (let i = 0; i < 3; i++) {
      const count = Number(await span.locator("#cell-span-charts").getAttribute(counter));
      const t0 = Date.now();
      // 41, 42, 43 m on, every 10 m: spans no earlier range had (the page keeps the points of spans it has computed)
      await span.fill("#fromM", String(41 + i));
      await span.waitForFunction(([n, attr]) => Number(document.querySelector("#cell-span-charts")?.getAttribute(attr)) > n && /computed in/.test(document.querySelector("#cell-status")?.textContent ?? ""), [count, counter] as const, { timeout: 120_000 });
      runs.push(Date.now() - t0);
    }
    console.log(`span study 36 new spans × every scheme, range change → charts: median ${median(runs)} ms; longest main-thread task ${(await longest(span)).toFixed(0)} ms`);
  }
} finally {
  await browser.close();
  server.httpServer.close();
}
