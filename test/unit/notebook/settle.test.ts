// The slider budget's helpers (issues 13/14): a settled signal waits for the hand to stop, and
// jobs in turns run one per frame, a newer run dropping the older one's rest.
import { describe, it, expect, vi, afterEach } from "vitest";
import { signal, effect } from "@preact/signals-core";
import { settled, inTurns, whenQuiet, perFrame } from "../../../src/notebook/settle";

afterEach(() => {
  vi.useRealTimers();
});

describe("settled", () => {
  it("follows its source only after the source stayed unchanged for the quiet time", () => {
    vi.useFakeTimers();
    const source = signal(100);
    const calm = settled(source, 150);
    expect(calm.value).toBe(100);
    for (let span = 101; span <= 110; span++) {
      source.value = span;
      vi.advanceTimersByTime(16);
    }
    // Ten steps one frame apart: still the first value.
    expect(calm.value).toBe(100);
    vi.advanceTimersByTime(150);
    vi.runOnlyPendingTimers();
    expect(calm.value).toBe(110);
    calm.dispose();
    source.value = 120;
    vi.advanceTimersByTime(1000);
    expect(calm.value).toBe(110);
  });
});

describe("settled on the inputs", () => {
  it("takes results that arrive after a single edit in the next frame, without the quiet time", () => {
    vi.useFakeTimers();
    const input = signal(160);
    const results = signal("for 160");
    const calm = settled(results, 150, input);
    input.value = 161;
    vi.advanceTimersByTime(300); // the designs take longer than the quiet time
    results.value = "for 161";
    vi.advanceTimersToNextTimer(); // the next frame
    expect(calm.value).toBe("for 161");
    calm.dispose();
  });

  it("through a drag holds results back until the inputs rest for the quiet time", () => {
    vi.useFakeTimers();
    const input = signal(100);
    const results = signal("for 100");
    const calm = settled(results, 150, input);
    for (let span = 101; span <= 110; span++) {
      input.value = span;
      vi.advanceTimersByTime(16);
      if (span % 3 === 0) results.value = `for ${span - 1}`; // results come in behind the hand
    }
    vi.advanceTimersByTime(100);
    expect(calm.value).toBe("for 100");
    vi.advanceTimersByTime(60);
    vi.runOnlyPendingTimers();
    expect(calm.value).toBe("for 107");
    results.value = "for 110";
    vi.advanceTimersToNextTimer();
    expect(calm.value).toBe("for 110");
    calm.dispose();
  });
});

describe("inTurns", () => {
  it("runs one job per turn, in order, then done", () => {
    vi.useFakeTimers();
    const seen: string[] = [];
    inTurns({ generation: 0 }, ["a", "b", "c"].map((x) => () => seen.push(x)), () => seen.push("done"));
    expect(seen).toEqual([]);
    vi.advanceTimersToNextTimer();
    expect(seen).toEqual(["a"]);
    vi.runAllTimers();
    expect(seen).toEqual(["a", "b", "c", "done"]);
  });

  it("a newer run drops the jobs the older one had not run", () => {
    vi.useFakeTimers();
    const turns = { generation: 0 };
    const seen: string[] = [];
    inTurns(turns, ["old1", "old2", "old3"].map((x) => () => seen.push(x)), () => seen.push("old done"));
    vi.advanceTimersToNextTimer();
    inTurns(turns, ["new1", "new2"].map((x) => () => seen.push(x)), () => seen.push("new done"));
    vi.runAllTimers();
    expect(seen).toEqual(["old1", "new1", "new2", "new done"]);
  });

  it("two sets started together take turns, one job a turn, and a job that throws does not stop the line", () => {
    vi.useFakeTimers();
    const seen: string[] = [];
    inTurns({ generation: 0 }, [() => seen.push("validity")], () => seen.push("validity done"));
    inTurns({ generation: 0 }, [() => seen.push("carbon"), () => { throw new Error("a chart failed"); }, () => seen.push("mass")], () => seen.push("charts done"));
    vi.advanceTimersToNextTimer();
    expect(seen).toEqual(["validity", "validity done"]);
    vi.advanceTimersToNextTimer();
    expect(seen).toEqual(["validity", "validity done", "carbon"]);
    expect(() => vi.advanceTimersToNextTimer()).toThrow("a chart failed");
    vi.runAllTimers();
    expect(seen).toEqual(["validity", "validity done", "carbon", "mass", "charts done"]);
  });
});

describe("whenQuiet", () => {
  it("runs the work once, after the last of many steps and the quiet time", () => {
    vi.useFakeTimers();
    const runs: number[] = [];
    let step = 0;
    const job = whenQuiet(() => runs.push(step), 300);
    for (step = 1; step <= 40; step++) {
      job.schedule();
      vi.advanceTimersByTime(16);
    }
    step = 40;
    expect(runs).toEqual([]);
    expect(job.pending).toBe(true);
    vi.advanceTimersByTime(299 - 16);
    expect(runs).toEqual([]);
    vi.advanceTimersByTime(1);
    expect(runs).toEqual([40]);
    expect(job.pending).toBe(false);
  });

  it("flush runs waiting work at once and only once; with nothing waiting it does nothing", () => {
    vi.useFakeTimers();
    let runs = 0;
    const job = whenQuiet(() => (runs += 1), 300);
    job.flush();
    expect(runs).toBe(0);
    job.schedule();
    job.flush();
    expect(runs).toBe(1);
    job.flush();
    vi.advanceTimersByTime(1000);
    expect(runs).toBe(1);
  });

  it("tells the work whether it runs at once (flush) or after the quiet time", () => {
    vi.useFakeTimers();
    const runs: boolean[] = [];
    const job = whenQuiet((atOnce) => runs.push(atOnce), 300);
    job.schedule();
    vi.advanceTimersByTime(300);
    job.schedule();
    job.flush();
    expect(runs).toEqual([false, true]);
  });

  it("cancel drops the waiting work", () => {
    vi.useFakeTimers();
    let runs = 0;
    const job = whenQuiet(() => (runs += 1), 300);
    job.schedule();
    job.cancel();
    vi.advanceTimersByTime(1000);
    job.flush();
    expect(runs).toBe(0);
  });
});

describe("perFrame", () => {
  it("follows its source at most once a frame, with the newest value", () => {
    vi.useFakeTimers();
    const source = signal(1);
    const drawn = perFrame(source);
    const seen: number[] = [];
    const stop = effect(() => {
      seen.push(drawn.value);
    });
    source.value = 2;
    source.value = 3;
    source.value = 4;
    expect(drawn.value).toBe(1);
    vi.advanceTimersToNextTimer();
    expect(drawn.value).toBe(4);
    source.value = 5;
    vi.runAllTimers();
    expect(seen).toEqual([1, 4, 5]);
    drawn.dispose();
    source.value = 6;
    vi.runAllTimers();
    expect(drawn.value).toBe(5);
    stop();
  });
});
