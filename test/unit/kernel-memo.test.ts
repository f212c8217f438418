import { describe, expect, it } from "vitest";
import { memoLast, memoOnObject } from "../../src/kernel/memo";
import { designBasis } from "../../src/loads";
import { DEFAULT_BRIEF } from "../../src/brief";

describe("memoLast", () => {
  it("answers a repeated key from memory and forgets the least recently used beyond its size", () => {
    let calls = 0;
    const square = memoLast((x: number) => {
      calls += 1;
      return { value: x * x };
    }, (x) => String(x), 2);
    const first = square(3);
    expect(square(3)).toBe(first);
    expect(calls).toBe(1);
    square(4);
    square(3); // 3 is now the most recent; 4 goes next
    square(5);
    expect(calls).toBe(3);
    square(3);
    expect(calls).toBe(3);
    square(4);
    expect(calls).toBe(4);
  });

  it("does not remember a call that threw", () => {
    let calls = 0;
    const fails = memoLast((x: number) => {
      calls += 1;
      if (x < 0) throw new RangeError("negative");
      return x;
    }, String);
    expect(() => fails(-1)).toThrow("negative");
    expect(() => fails(-1)).toThrow("negative");
    expect(calls).toBe(2);
  });
});

describe("memoOnObject", () => {
  it("answers once per object", () => {
    let calls = 0;
    const size = memoOnObject((o: { items: number[] }) => {
      calls += 1;
      return o.items.length;
    });
    const a = { items: [1, 2] };
    expect(size(a)).toBe(2);
    expect(size(a)).toBe(2);
    expect(size({ items: [1] })).toBe(1);
    expect(calls).toBe(2);
  });
});

describe("designBasis remembered per brief", () => {
  it("gives the same basis for an equal brief and a new one when any field differs", () => {
    const a = designBasis({ ...DEFAULT_BRIEF });
    expect(designBasis({ ...DEFAULT_BRIEF })).toBe(a);
    const b = designBasis({ ...DEFAULT_BRIEF, riseM: DEFAULT_BRIEF.riseM + 1 });
    expect(b).not.toBe(a);
    expect(b.cap.riseM).not.toBe(a.cap.riseM);
    expect(designBasis({ ...DEFAULT_BRIEF, factors: { ...DEFAULT_BRIEF.factors, gammaQ: 1.6 } })).not.toBe(a);
  });
});
