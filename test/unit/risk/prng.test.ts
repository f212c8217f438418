import { describe, it, expect } from "vitest";
import { createPrng, splitMix64, xoshiro128ssFromState } from "../../../src/risk";

/** xoshiro128** 1.1 written from the reference C (prng.di.unimi.it/xoshiro128starstar.c) in BigInt arithmetic mod 2^32, independent of the Math.imul port. */
function referenceXoshiro(state: [bigint, bigint, bigint, bigint], count: number): number[] {
  const M = 0xffffffffn;
  const rotl = (x: bigint, k: bigint) => ((x << k) | (x >> (32n - k))) & M;
  let [s0, s1, s2, s3] = state;
  const out: number[] = [];
  for (let i = 0; i < count; i++) {
    out.push(Number((rotl((s1 * 5n) & M, 7n) * 9n) & M));
    const t = (s1 << 9n) & M;
    s2 ^= s0;
    s3 ^= s1;
    s1 ^= s2;
    s0 ^= s3;
    s2 ^= t;
    s3 = rotl(s3, 11n);
  }
  return out;
}

describe("xoshiro128** (Blackman and Vigna, ACM TOMS 47(4), 2021)", () => {
  it("matches a BigInt transcription of the reference C for 2000 outputs from several states", () => {
    for (const state of [[1, 2, 3, 4], [0xdeadbeef, 0x01234567, 0x89abcdef, 0xffffffff], [0, 0, 0, 1]] as [number, number, number, number][]) {
      const g = xoshiro128ssFromState(state);
      const got = Array.from({ length: 2000 }, () => g.nextUint32());
      expect(got).toEqual(referenceXoshiro(state.map(BigInt) as [bigint, bigint, bigint, bigint], 2000));
    }
  });
  it("refuses the all-zero state", () => expect(() => xoshiro128ssFromState([0, 0, 0, 0])).toThrow(/all zero/));
  it("uniform() is in [0, 1) and its mean over 100,000 draws is 1/2 within 4 standard errors (σ = 1/√12)", () => {
    const g = createPrng(5);
    let sum = 0;
    for (let i = 0; i < 100_000; i++) {
      const u = g.uniform();
      expect(u >= 0 && u < 1).toBe(true);
      sum += u;
    }
    expect(Math.abs(sum / 100_000 - 0.5)).toBeLessThan(4 / Math.sqrt(12 * 100_000));
  });
  it("the same seed repeats; another seed differs", () => {
    const a = createPrng(42);
    const b = createPrng(42);
    const c = createPrng(43);
    const xs = Array.from({ length: 10 }, () => a.nextUint32());
    expect(Array.from({ length: 10 }, () => b.nextUint32())).toEqual(xs);
    expect(Array.from({ length: 10 }, () => c.nextUint32())).not.toEqual(xs);
  });
  it("a bad seed throws naming it", () => {
    expect(() => createPrng(-1)).toThrow(/invalid seed: -1/);
    expect(() => createPrng(1.5)).toThrow(/invalid seed: 1.5/);
  });
});

describe("SplitMix64 (Steele, Lea and Flood, OOPSLA 2014)", () => {
  it("seed 0 gives 0xe220a8397b1dcdaf first (from memory: the value quoted with the reference splitmix64.c)", () => {
    expect(splitMix64(0n, 1)[0]).toBe(0xe220a8397b1dcdafn);
  });
  it("seed 1234567 gives 6457827717110365317, 3203168211198807973 (from memory: Rosetta Code task \"Pseudo-random numbers/Splitmix64\")", () => {
    expect(splitMix64(1234567n, 2)).toEqual([6457827717110365317n, 3203168211198807973n]);
  });
});
