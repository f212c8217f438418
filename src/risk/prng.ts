/**
 * A seeded pseudo-random generator: xoshiro128** 1.1 (D. Blackman and S. Vigna, "Scrambled linear
 * pseudorandom number generators", ACM Trans. Math. Softw. 47(4), 2021; reference C code at
 * prng.di.unimi.it), 32-bit state words in unsigned 32-bit arithmetic, so a seed gives the same
 * sequence in every browser and in Node. The state is filled from the seed with SplitMix64
 * (G. Steele, D. Lea and C. Flood, "Fast splittable pseudorandom number generators", OOPSLA
 * 2014), as the xoshiro authors recommend. Period 2^128 − 1. Not for cryptography.
 */
export type Prng = {
  /** The next 32-bit output, an integer in [0, 2^32). */
  nextUint32(): number;
  /** A uniform number in [0, 1) with 32 random bits: nextUint32() / 2^32. */
  uniform(): number;
};

const MASK64 = (1n << 64n) - 1n;

/**
 * SplitMix64 outputs from a 64-bit seed (Steele, Lea and Flood 2014), as unsigned BigInts.
 * @example splitMix64(0n, 1) // [0xe220a8397b1dcdafn]
 */
export function splitMix64(seed: bigint, count: number): bigint[] {
  let x = seed & MASK64;
  const out: bigint[] = [];
  for (let i = 0; i < count; i++) {
    x = (x + 0x9e3779b97f4a7c15n) & MASK64;
    let z = x;
    z = ((z ^ (z >> 30n)) * 0xbf58476d1ce4e5b9n) & MASK64;
    z = ((z ^ (z >> 27n)) * 0x94d049bb133111ebn) & MASK64;
    out.push(z ^ (z >> 31n));
  }
  return out;
}

function rotl(x: number, k: number): number {
  return ((x << k) | (x >>> (32 - k))) >>> 0;
}

/**
 * A xoshiro128** generator from its four 32-bit state words (not all zero).
 * @throws Error when every word is zero (the one state the generator cannot leave)
 */
export function xoshiro128ssFromState(state: readonly [number, number, number, number]): Prng {
  let [s0, s1, s2, s3] = state.map((w) => w >>> 0) as [number, number, number, number];
  if ((s0 | s1 | s2 | s3) === 0) throw new Error("invalid xoshiro128** state: all zero (expected at least one non-zero word)");
  const nextUint32 = (): number => {
    const result = Math.imul(rotl(Math.imul(s1, 5) >>> 0, 7), 9) >>> 0;
    const t = (s1 << 9) >>> 0;
    s2 = (s2 ^ s0) >>> 0;
    s3 = (s3 ^ s1) >>> 0;
    s1 = (s1 ^ s2) >>> 0;
    s0 = (s0 ^ s3) >>> 0;
    s2 = (s2 ^ t) >>> 0;
    s3 = rotl(s3, 11);
    return result;
  };
  return { nextUint32, uniform: () => nextUint32() / 4294967296 };
}

/**
 * A xoshiro128** generator seeded from a whole number: the state is the four 32-bit halves of two
 * SplitMix64 outputs from the seed.
 * @param seed a whole number from 0 to 2^53 − 1
 * @throws Error for a seed that is not a whole number in range
 * @example createPrng(42).uniform() // the same number on every run
 */
export function createPrng(seed: number): Prng {
  if (!(Number.isSafeInteger(seed) && seed >= 0)) throw new Error(`invalid seed: ${seed} (expected a whole number from 0 to ${Number.MAX_SAFE_INTEGER})`);
  const [a = 0n, b = 0n] = splitMix64(BigInt(seed), 2);
  const word = (x: bigint, shift: bigint) => Number((x >> shift) & 0xffffffffn);
  return xoshiro128ssFromState([word(a, 0n), word(a, 32n), word(b, 0n), word(b, 32n)]);
}
