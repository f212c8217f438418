// `node --import tsx test/bench/compare-trace.ts`: the compare page's span slider dragged 40 steps
// (one per frame) under a DevTools trace; prints where the main thread's time went by kind of work
// (script, style, layout, paint, …) with the node counts style and layout touched, and the longest
// tasks. Complements compare-profile.ts, whose JS profile shows native rendering only as "(program)".
// BENCH_DIST as in lead.ts. Nothing asserted.
import { resolve } from "node:path";
import { preview } from "vite";
import { chromium } from "playwright-core";
import { CHROMIUM_ARGS } from "../browser/browser";

const dist = resolve(process.env.BENCH_DIST ?? "dist");

interface TraceEvent { name: string; ph: string; ts: number; dur?: number; tid: number; pid: number; args?: { data?: Record<string, unknown>; elementCount?: number; beginData?: Record<string, unknown>; endData?: Record<string, unknown> } }

const KINDS: Record<string, string> = {
  FunctionCall: "script", EvaluateScript: "script", TimerFire: "script", FireAnimationFrame: "script", EventDispatch: "script", V8Execute: "script",
  UpdateLayoutTree: "style", Layout: "layout", PrePaint: "paint", Paint: "paint", Layerize: "paint", UpdateLayer: "paint", "CompositeLayers": "paint", MajorGC: "gc", MinorGC: "gc",
};

const server = await preview({ build: { outDir: dist }, preview: { host: "127.0.0.1", port: 4194, strictPort: true }, logLevel: "silent" });
const browser = await chromium.launch({ executablePath: "/usr/bin/chromium", args: CHROMIUM_ARGS });
const context = await browser.newContext({ viewport: { width: 1400, height: 900 } });
await context.addInitScript("globalThis.__name = (f) => f");
try {
  const page = await context.newPage();
  await page.goto("http://127.0.0.1:4194/compare.html");
  await page.waitForSelector("#cell-comparison-charts svg", { timeout: 120_000 });
  // EXTRA_CSS tries a style rule without a build (e.g. containment or a layer for the brief column)
  if (process.env.EXTRA_CSS) await page.addStyleTag({ content: process.env.EXTRA_CSS });
  await page.waitForTimeout(2000);
  const cdp = await context.newCDPSession(page);
  const events: TraceEvent[] = [];
  cdp.on("Tracing.dataCollected", (e) => {
    events.push(...(e.value as unknown as TraceEvent[]));
  });
  const finished = new Promise<void>((r) => cdp.once("Tracing.tracingComplete", () => r()));
  await cdp.send("Tracing.start", { categories: "devtools.timeline,disabled-by-default-devtools.timeline", transferMode: "ReportEvents" });
  const steps = Number(process.env.STEPS ?? 40);
  await page.evaluate(
    (n) =>
      new Promise<void>((done) => {
        const slider = document.querySelector<HTMLInputElement>('#cell-brief input[type="range"]');
        if (!slider) throw new Error("no span slider");
        let i = 0;
        const step = () => {
          if (i >= n) return void setTimeout(done, 4000);
          slider.value = String(100 + i++);
          slider.dispatchEvent(new Event("input", { bubbles: true }));
          requestAnimationFrame(step);
        };
        requestAnimationFrame(step);
      }),
    steps,
  );
  await cdp.send("Tracing.end");
  await finished;
  // the renderer's main thread: the thread that ran the animation frames
  const main = events.find((e) => e.name === "FireAnimationFrame");
  if (!main) throw new Error("no animation frames in the trace");
  const mine = events.filter((e) => e.pid === main.pid && e.tid === main.tid && e.ph === "X");
  const byKind = new Map<string, number>();
  const elements = { style: 0, layout: 0 };
  for (const e of mine) {
    const kind = KINDS[e.name];
    if (!kind || !e.dur) continue;
    // count only top-level script (nested FunctionCall inside EventDispatch is already inside)
    byKind.set(kind, (byKind.get(kind) ?? 0) + e.dur / 1000);
    if (e.name === "UpdateLayoutTree") elements.style += Number(e.args?.elementCount ?? 0);
    if (e.name === "Layout") elements.layout += Number((e.args?.beginData as { dirtyObjects?: number } | undefined)?.dirtyObjects ?? 0);
  }
  const byName = new Map<string, { ms: number; n: number }>();
  for (const e of mine) {
    if (!e.dur) continue;
    const entry = byName.get(e.name) ?? { ms: 0, n: 0 };
    entry.ms += e.dur / 1000;
    entry.n += 1;
    byName.set(e.name, entry);
  }
  console.log(`by event: ${[...byName.entries()].sort((a, b) => b[1].ms - a[1].ms).slice(0, 16).map(([k, v]) => `${k} ${v.ms.toFixed(0)}/${v.n}`).join(", ")}`);
  const tasks = mine.filter((e) => e.name === "RunTask" && (e.dur ?? 0) > 50_000).map((e) => (e.dur! / 1000).toFixed(0));
  console.log(`\n## compare page, span slider dragged ${steps} steps under a trace (${dist}; load average ${(await import("node:os")).loadavg()[0]!.toFixed(1)})`);
  console.log(`main thread by kind (ms, nested events may overlap within script): ${[...byKind.entries()].map(([k, ms]) => `${k} ${ms.toFixed(0)}`).join(", ")}`);
  console.log(`elements restyled ${elements.style}, layout dirty objects ${elements.layout}`);
  console.log(`tasks over 50 ms: ${tasks.length} (${tasks.join(", ")})`);
  for (const line of longTaskCauses(mine, 50)) console.log(line);
  const paints = new Map<string, { ms: number; n: number }>();
  for (const e of mine.filter((x) => x.name === "Paint")) {
    const key = String(e.args?.data?.nodeName ?? "?");
    const entry = paints.get(key) ?? { ms: 0, n: 0 };
    entry.ms += (e.dur ?? 0) / 1000;
    entry.n += 1;
    paints.set(key, entry);
  }
  console.log(`painted (ms/times): ${[...paints.entries()].map(([k, v]) => `${k} ${v.ms.toFixed(0)}/${v.n}`).join(", ")}`);
  const layouts = mine.filter((e) => e.name === "Layout" && (e.dur ?? 0) > 3000).slice(0, 8);
  for (const l of layouts) console.log(`layout ${(l.dur! / 1000).toFixed(1)} ms: ${JSON.stringify(l.args?.beginData)}`);
} finally {
  await browser.close();
  server.httpServer.close();
}

/** What one trace event was, in a few words: its name and, for script, the event type or function. */
function describe(e: TraceEvent): string {
  const d = e.args?.data ?? {};
  if (e.name === "EventDispatch") return `EventDispatch(${String(d.type)})`;
  if (e.name === "FunctionCall") return `FunctionCall(${String(d.functionName || "?")})`;
  if (e.name === "TimerFire") return "TimerFire";
  return e.name;
}

/**
 * Each main-thread task longer than `minMs`, with the work directly inside it (one level down,
 * merged by kind): which message, frame callback, style, layout or paint made it long.
 */
function longTaskCauses(mine: readonly TraceEvent[], minMs: number): string[] {
  const tasks = mine.filter((e) => e.name === "RunTask" && (e.dur ?? 0) > minMs * 1000);
  const t0 = Math.min(...mine.map((e) => e.ts));
  return tasks.map((task) => {
    const end = task.ts + task.dur!;
    const inside = mine.filter((e) => e !== task && e.ts >= task.ts && e.ts + (e.dur ?? 0) <= end && e.dur);
    // the events not inside another event of this task: the task's own steps
    const top = inside.filter((e) => !inside.some((o) => o !== e && o.ts <= e.ts && o.ts + o.dur! >= e.ts + e.dur! && o.dur! > e.dur!));
    const by = new Map<string, number>();
    for (const e of top) by.set(describe(e), (by.get(describe(e)) ?? 0) + e.dur! / 1000);
    const parts = [...by.entries()].sort((a, b) => b[1] - a[1]).slice(0, 6).map(([k, ms]) => `${k} ${ms.toFixed(0)}`);
    return `  task at ${((task.ts - t0) / 1000).toFixed(0)} ms, ${(task.dur! / 1000).toFixed(0)} ms: ${parts.join(" | ")}`;
  });
}
