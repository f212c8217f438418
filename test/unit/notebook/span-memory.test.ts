// The span study's memory of computed spans: a span's points depend only on the study and the span,
// so they are reused for the same study and forgotten on any change to it; points that arrive for a
// study no longer kept (a call the user's edit overtook) are not recorded.
import { describe, it, expect } from "vitest";
import { SpanMemory, restoredMemory, storeSpans, keptRange, keepRange } from "../../../src/notebook/span-study-runner";
import { canonicalJson } from "../../../src/kernel/memo";
import type { SpanPoint } from "../../../src/comparison/span-study";

const point = (spanM: number, id: string) => ({ spanM, id }) as unknown as SpanPoint;

describe("SpanMemory", () => {
  it("gives back each span's points for the study they were computed for, by pass", () => {
    const memory = new SpanMemory();
    memory.keep("study A");
    memory.put("study A", "screening", [40, 50], [point(40, "x"), point(50, "x"), point(40, "y")]);
    expect(memory.get("screening", 40)).toEqual([point(40, "x"), point(40, "y")]);
    expect(memory.get("screening", 50)).toEqual([point(50, "x")]);
    expect(memory.get("again", 40)).toBeUndefined();
    expect(memory.get("screening", 60)).toBeUndefined();
    // a span the call ran whose schemes gave no point is known (empty), not missing
    memory.put("study A", "again", [40], []);
    expect(memory.get("again", 40)).toEqual([]);
    memory.keep("study A");
    expect(memory.get("screening", 40)).toHaveLength(2);
  });

  it("forgets every span when the study changes, and ignores points computed for another study", () => {
    const memory = new SpanMemory();
    memory.keep("study A");
    memory.put("study A", "screening", [40], [point(40, "x")]);
    memory.keep("study B");
    expect(memory.get("screening", 40)).toBeUndefined();
    memory.put("study A", "screening", [40], [point(40, "x")]);
    expect(memory.get("screening", 40)).toBeUndefined();
    memory.put("study B", "screening", [40], [point(40, "z")]);
    expect(memory.get("screening", 40)).toEqual([point(40, "z")]);
  });

  it("is kept in a store span by span and read back for the same build; a new study or build clears what was kept", () => {
    const store = memoryStore();
    const memory = new SpanMemory();
    memory.keep("study A");
    memory.put("study A", "screening", [40, 50], [point(40, "x"), point(50, "x")]);
    storeSpans(store, "build 1", memory, "screening", [40, 50]);
    memory.put("study A", "again", [40], [point(40, "x")]);
    storeSpans(store, "build 1", memory, "again", [40]);
    const back = restoredMemory(store, "build 1");
    back.keep("study A"); // the same study: nothing forgotten
    expect(back.get("screening", 50)).toEqual([point(50, "x")]);
    expect(back.get("again", 40)).toEqual([point(40, "x")]);
    expect(back.get("again", 50)).toBeUndefined();
    // another build's code may design differently: nothing is read back
    expect(restoredMemory(store, "build 2").get("screening", 40)).toBeUndefined();
    // a new study clears the spans kept for the old one
    memory.keep("study B");
    memory.put("study B", "screening", [60], [point(60, "z")]);
    storeSpans(store, "build 1", memory, "screening", [60]);
    const other = restoredMemory(store, "build 1");
    other.keep("study B");
    expect(other.get("screening", 40)).toBeUndefined();
    expect(other.get("screening", 60)).toEqual([point(60, "z")]);
    expect(store.length).toBe(2); // the study's head and its one span
  });

  it("leaves out a kept span that is not a list of points, and clears a store that refuses a write", () => {
    const store = memoryStore();
    const memory = new SpanMemory();
    memory.keep("study A");
    memory.put("study A", "screening", [40], [point(40, "x")]);
    storeSpans(store, "build 1", memory, "screening", [40]);
    for (const text of ["not json", '{"a": 1}']) {
      store.setItem("spanbook.span-memory/screening/50", text);
      const back = restoredMemory(store, "build 1");
      back.keep("study A");
      expect(back.get("screening", 40)).toEqual([point(40, "x")]);
      expect(back.get("screening", 50)).toBeUndefined();
    }
    const full = { ...memoryStore(), setItem: () => { throw new Error("QuotaExceededError"); } };
    full.removeItem = store.removeItem; // the refusing store's removals act on the filled one
    full.key = store.key;
    Object.defineProperty(full, "length", { get: () => store.length });
    memory.put("study A", "screening", [60], [point(60, "x")]);
    storeSpans(full, "build 1", memory, "screening", [60]);
    expect(store.length).toBe(0);
  });
});

/** A Storage of a Map (the tab's session storage in the page). */
function memoryStore() {
  const map = new Map<string, string>();
  return {
    getItem: (k: string) => map.get(k) ?? null,
    setItem: (k: string, v: string) => void map.set(k, v),
    removeItem: (k: string) => void map.delete(k),
    key: (i: number) => [...map.keys()][i] ?? null,
    get length() {
      return map.size;
    },
  };
}

describe("the span range kept for the session", () => {
  it("gives back a kept range, and none for a missing, unreadable or invalid one", () => {
    const store = memoryStore();
    expect(keptRange(store)).toBeNull();
    keepRange(store, { fromM: 40, toM: 110, stepM: 10 });
    expect(keptRange(store)).toEqual({ fromM: 40, toM: 110, stepM: 10 });
    for (const text of ["not json", '{"fromM": 40, "toM": 110}', '{"fromM": 200, "toM": 100, "stepM": 10}', '{"fromM": 40, "toM": 400, "stepM": 0}', '{"fromM": "40", "toM": 400, "stepM": 10}']) {
      store.setItem("spanbook.span-range", text);
      expect(keptRange(store)).toBeNull();
    }
    expect(keptRange(undefined)).toBeNull();
  });
});

describe("canonicalJson", () => {
  it("writes the same text for the same content in any key order, at every depth, arrays in their order", () => {
    expect(canonicalJson({ b: 1, a: { d: [3, { f: 1, e: 2 }], c: null } })).toBe(canonicalJson({ a: { c: null, d: [3, { e: 2, f: 1 }] }, b: 1 }));
    expect(canonicalJson({ b: 1, a: 2 })).toBe('{"a":2,"b":1}');
    expect(canonicalJson([2, 1])).not.toBe(canonicalJson([1, 2]));
  });
});
