// Risk benchmark (prints figures, asserts nothing):
//   node --import tsx test/bench/risk.ts [N]          node only
//   BROWSER=1 node --import tsx test/bench/risk.ts     also the built page (needs dist/)
// Node: runRisk on the demo study, N samples (default 10,000) × the registered schemes, split into
// designs and sampling. Browser: the risk page runs N samples in its worker; wall time from the Run
// click to the results, the longest main-thread task (PerformanceObserver "longtask") and the
// progress updates per second seen by the page.
import { readFileSync } from "node:fs";
import { preview } from "vite";
import { chromium } from "playwright-core";
import { studyFromJson } from "../../src/study";
import { defaultCatalogue } from "../../src/catalogue/default-catalogue";
import { SCHEMES } from "../../src/schemes";
import { runRisk, riskTornado } from "../../src/risk";
import { CHROMIUM_ARGS } from "../browser/browser";

const samples = Number(process.argv[2] ?? 10_000);
const loaded = studyFromJson(readFileSync("data/demo-study.json", "utf8"));
if (!loaded.ok) throw new Error("demo study invalid");
const study = loaded.study;
const catalogue = defaultCatalogue();

console.log(`## risk, node: ${samples} samples × ${SCHEMES.length} schemes (${SCHEMES.map((s) => s.id).join(", ")}), ${study.risk.inputs.length} inputs, ${study.risk.designSamples} design draws`);
runRisk(study, catalogue, { samples: 200, seed: 1 }); // warm up the JIT
let designsDoneAt = 0;
let progress = 0;
const t0 = performance.now();
const result = runRisk(study, catalogue, {
  samples,
  seed: 1,
  onProgress: (p) => {
    progress += 1;
    if (p.phase === "samples" && designsDoneAt === 0) designsDoneAt = performance.now();
  },
});
const t1 = performance.now();
riskTornado(study, catalogue);
const t2 = performance.now();
console.log(`runRisk ${((t1 - t0) / 1000).toFixed(2)} s (designs ${((designsDoneAt - t0) / 1000).toFixed(2)} s, sampling and statistics ${((t1 - designsDoneAt) / 1000).toFixed(2)} s), ${progress} progress calls; tornado ${((t2 - t1) / 1000).toFixed(2)} s`);
console.log(`designs per scheme: ${JSON.stringify(result.designsPerScheme)}`);

if (process.env.BROWSER) {
  const server = await preview({ preview: { host: "127.0.0.1", port: 0 }, logLevel: "silent" });
  const address = server.httpServer.address();
  const port = typeof address === "object" && address ? address.port : 0;
  const browser = await chromium.launch({ executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium", args: CHROMIUM_ARGS });
  try {
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await page.goto(`http://127.0.0.1:${port}/risk.html`);
    await page.waitForSelector("#risk-inputs-table tbody tr");
    await page.fill("#risk-samples", String(samples));
    await page.evaluate(() => {
      const w = window as unknown as { __updates: number[]; __longest: number };
      w.__updates = [];
      w.__longest = 0;
      new MutationObserver(() => w.__updates.push(performance.now())).observe(document.querySelector("#risk-status") as Node, { childList: true, characterData: true, subtree: true });
      new PerformanceObserver((list) => {
        for (const e of list.getEntries()) w.__longest = Math.max(w.__longest, e.duration);
      }).observe({ type: "longtask" });
    });
    const start = Date.now();
    await page.click("#risk-run");
    await page.waitForSelector("#risk-results-table", { timeout: 300_000 });
    const wall = (Date.now() - start) / 1000;
    const figures = await page.evaluate(() => {
      const w = window as unknown as { __updates: number[]; __longest: number };
      const u = w.__updates;
      const span = u.length > 1 ? ((u[u.length - 1] as number) - (u[0] as number)) / 1000 : Number.NaN;
      return { updates: u.length, perSecond: u.length / span, longestMs: w.__longest, status: document.querySelector("#risk-status")?.textContent ?? "" };
    });
    console.log(`## risk, browser worker: ${samples} samples, click to results ${wall.toFixed(2)} s; ${figures.updates} status updates (${figures.perSecond.toFixed(0)} per second); longest main-thread task ${figures.longestMs.toFixed(0)} ms (includes drawing the result charts)`);
    console.log(`page says: ${figures.status}`);
  } finally {
    await browser.close();
    await new Promise<void>((resolve) => server.httpServer.close(() => resolve()));
  }
}
