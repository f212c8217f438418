// The span study's memory of computed spans: a span's points depend only on the study and the span,
// so they are reused for the same study and forgotten on any change to it; points that arrive for a
// study no longer kept (a call the user's edit overtook) are not recorded.
import { describe, it, expect } from "vitest";
import { SpanMemory } from "../../../src/notebook/span-study-runner";
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
});
