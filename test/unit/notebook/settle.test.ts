// The slider budget's helpers (issues 13/14): a settled signal waits for the hand to stop, and
// jobs in turns run one per frame, a newer run dropping the older one's rest.
import { describe, it, expect, vi, afterEach } from "vitest";
import { signal } from "@preact/signals-core";
import { settled, inTurns } from "../../../src/notebook/settle";

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
});
