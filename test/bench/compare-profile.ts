// `node --import tsx test/bench/compare-profile.ts`: where the compare page's main thread goes while
// the span slider is dragged (issue 13, "never blocked > 50 ms"). Drags 40 steps one per frame under
// the DevTools profiler and prints the long tasks and the functions that took the most time,
// each with the chain of callers that led to it. Build with names for readable output:
//   npx vite build --outDir /tmp/dist-names --sourcemap --minify false
//   BENCH_DIST=/tmp/dist-names node --import tsx test/bench/compare-profile.ts
// Nothing asserted.
import { resolve } from "node:path";
import { preview } from "vite";
import { chromium } from "playwright-core";
import { CHROMIUM_ARGS } from "../browser/browser";

const dist = resolve(process.env.BENCH_DIST ?? "dist");

/** The parts of a DevTools CPU profile read here. */
interface CpuProfile {
  nodes: { id: number; callFrame: { functionName: string; url: string; lineNumber: number }; children?: number[] }[];
  samples?: number[];
  timeDeltas?: number[];
}

/** Inclusive time per function (by name and place), with its most expensive chain of callers. */
function heaviest(profile: CpuProfile, count: number): string[] {
  const byId = new Map(profile.nodes.map((n) => [n.id, n]));
  const parent = new Map<number, number>();
  for (const n of profile.nodes) for (const c of n.children ?? []) parent.set(c, n.id);
  const self = new Map<number, number>();
  (profile.samples ?? []).forEach((s, i) => self.set(s, (self.get(s) ?? 0) + (profile.timeDeltas?.[i] ?? 0)));
  const name = (id: number) => {
    const f = byId.get(id)!.callFrame;
    return `${f.functionName || "(anonymous)"} ${f.url.split("/").pop() ?? ""}:${f.lineNumber + 1}`;
  };
  const total = new Map<string, { us: number; chain: string; chainUs: number }>();
  for (const [id, us] of self) {
    const seen = new Set<string>();
    for (let at: number | undefined = id; at !== undefined; at = parent.get(at)) {
      const key = name(at);
      if (seen.has(key) || key.startsWith("(")) continue;
      seen.add(key);
      const entry = total.get(key) ?? { us: 0, chain: "", chainUs: 0 };
      entry.us += us;
      if (us > entry.chainUs) {
        const callers: string[] = [];
        for (let c = parent.get(at), k = 0; c !== undefined && k < 6; c = parent.get(c), k++) callers.push(name(c));
        entry.chain = callers.join(" ← ");
        entry.chainUs = us;
      }
      total.set(key, entry);
    }
  }
  return [...total.entries()]
    .sort((a, b) => b[1].us - a[1].us)
    .slice(0, count)
    .map(([key, e]) => `${(e.us / 1000).toFixed(0).padStart(6)} ms  ${key}\n          ← ${e.chain}`);
}

/**
 * The busy stretches of the profile (samples in a row that are not idle) longer than `minMs`, each
 * with the functions that took most of it: which work makes the long tasks.
 */
function busyStretches(profile: CpuProfile, minMs: number): string[] {
  const byId = new Map(profile.nodes.map((n) => [n.id, n]));
  const parent = new Map<number, number>();
  for (const n of profile.nodes) for (const c of n.children ?? []) parent.set(c, n.id);
  const label = (id: number) => {
    const f = byId.get(id)!.callFrame;
    return `${f.functionName || "(anonymous)"} ${f.url.split("/").pop() ?? ""}:${f.lineNumber + 1}`;
  };
  const out: string[] = [];
  let at = 0;
  let stretch: { startUs: number; us: number; by: Map<string, number> } | null = null;
  const close = () => {
    if (stretch && stretch.us / 1000 >= minMs) {
      const top = [...stretch.by.entries()].sort((a, b) => b[1] - a[1]).slice(0, 6).map(([k, us]) => `${(us / 1000).toFixed(0)} ${k}`);
      out.push(`${(stretch.startUs / 1000).toFixed(0).padStart(6)} ms +${(stretch.us / 1000).toFixed(0)}: ${top.join(" | ")}`);
    }
    stretch = null;
  };
  (profile.samples ?? []).forEach((s, i) => {
    const dt = profile.timeDeltas?.[i] ?? 0;
    at += dt;
    const name = byId.get(s)!.callFrame.functionName;
    if (name === "(idle)") return close();
    stretch ??= { startUs: at, us: 0, by: new Map() };
    stretch.us += dt;
    const seen = new Set<string>();
    for (let n: number | undefined = s; n !== undefined; n = parent.get(n)) {
      const key = label(n);
      if (seen.has(key) || key.startsWith("(root)") || key.startsWith("dispatchEvent") || key.startsWith("(anonymous) :")) continue;
      seen.add(key);
      stretch.by.set(key, (stretch.by.get(key) ?? 0) + dt);
    }
  });
  close();
  return out;
}

const server = await preview({ build: { outDir: dist }, preview: { host: "127.0.0.1", port: 4193, strictPort: true }, logLevel: "silent" });
const browser = await chromium.launch({ executablePath: "/usr/bin/chromium", args: CHROMIUM_ARGS });
const context = await browser.newContext({ viewport: { width: 1400, height: 900 } });
// tsx keeps function names with a __name helper the page does not have.
await context.addInitScript("globalThis.__name = (f) => f");
try {
  const page = await context.newPage();
  await page.goto("http://127.0.0.1:4193/compare.html");
  await page.waitForSelector("#cell-comparison-charts svg", { timeout: 120_000 });
  await page.waitForTimeout(2000);
  const cdp = await context.newCDPSession(page);
  await cdp.send("Profiler.enable");
  await cdp.send("Profiler.setSamplingInterval", { interval: 200 });
  await page.evaluate(() => {
    const w = window as unknown as { __long: { start: number; ms: number }[] };
    w.__long = [];
    new PerformanceObserver((list) => list.getEntries().forEach((e) => w.__long.push({ start: e.startTime, ms: e.duration }))).observe({ type: "longtask" });
  });
  const t0 = await page.evaluate(() => performance.now());
  await cdp.send("Profiler.start");
  await page.evaluate(
    () =>
      new Promise<void>((done) => {
        const slider = document.querySelector<HTMLInputElement>('#cell-brief input[type="range"]');
        if (!slider) throw new Error("no span slider");
        let i = 0;
        const step = () => {
          if (i >= 40) return void setTimeout(done, 6000); // the results of the last step arrive and are drawn
          slider.value = String(100 + i++);
          slider.dispatchEvent(new Event("input", { bubbles: true }));
          requestAnimationFrame(step);
        };
        requestAnimationFrame(step);
      }),
  );
  const { profile } = await cdp.send("Profiler.stop");
  const long = await page.evaluate(() => (window as unknown as { __long: { start: number; ms: number }[] }).__long);
  const load = (await import("node:os")).loadavg()[0]!;
  console.log(`\n## compare page, span slider dragged 40 steps (${dist}; load average ${load.toFixed(1)})`);
  console.log(`long tasks (> 50 ms): ${long.length}, longest ${Math.max(0, ...long.map((l) => l.ms)).toFixed(0)} ms; at ms from the drag's start: ${long.map((l) => `${(l.start - t0).toFixed(0)}+${l.ms.toFixed(0)}`).join(" ")}`);
  console.log("main-thread functions by inclusive time (whole drag and the 6 s after):");
  heaviest(profile as CpuProfile, Number(process.env.TOP ?? 25)).forEach((l) => console.log(l));
  console.log("busy stretches over 40 ms (ms from the profile's start), with what took most of each:");
  busyStretches(profile as CpuProfile, 40).forEach((l) => console.log(l));
} finally {
  await browser.close();
  server.httpServer.close();
}
