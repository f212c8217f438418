// Screenshots of pages of the built site, for looking at what users see:
//   node scripts/screenshot.mjs compare span-study …   (serves dist/ itself; writes /tmp/spanbook-<page>.png)
import { preview } from "vite";
import { chromium } from "playwright-core";

const pages = process.argv.slice(2);
const server = await preview({ preview: { host: "127.0.0.1", port: 4199, strictPort: true }, logLevel: "silent" });
const browser = await chromium.launch({
  executablePath: "/usr/bin/chromium",
  args: ["--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync", "--disable-dev-shm-usage"],
});
try {
  for (const name of pages.length ? pages : ["compare"]) {
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    page.on("console", (m) => m.type() === "error" && console.error(`[${name}] console: ${m.text()}`));
    page.on("pageerror", (e) => console.error(`[${name}] page error: ${e.message}`));
    await page.goto(`http://127.0.0.1:4199/${name}.html`);
    await page.waitForTimeout(Number(process.env.WAIT ?? 800));
    await page.screenshot({ path: `/tmp/spanbook-${name}.png`, fullPage: true });
    console.log(`/tmp/spanbook-${name}.png`);
    // SHOT_CELLS=comparison,comparison-charts also writes one picture per cell, easier to read.
    for (const cell of (process.env.SHOT_CELLS ?? "").split(",").filter(Boolean)) {
      const target = page.locator(`#cell-${cell}, #${cell}`).first();
      if ((await target.count()) === 0) continue;
      await target.screenshot({ path: `/tmp/spanbook-${name}-${cell}.png` });
      console.log(`/tmp/spanbook-${name}-${cell}.png`);
    }
    await page.close();
  }
} finally {
  await browser.close();
  server.httpServer.close();
}
