/**
 * The p-quantile of sorted numbers by the R-7 method (Hyndman and Fan, "Sample quantiles in
 * statistical packages", The American Statistician 50(4), 1996, definition 7; the default of R
 * and of d3-array's quantileSorted): h = (n − 1)p, Q = x[⌊h⌋] + (h − ⌊h⌋)(x[⌊h⌋ + 1] − x[⌊h⌋]).
 * @param sorted ascending, no NaN
 * @throws Error for an empty list or p outside [0, 1]
 * @example quantileSorted([1, 2, 3, 4, 5, 6, 7, 8, 9, 10], 0.1) // 1.9
 */
export function quantileSorted(sorted: ArrayLike<number>, p: number): number {
  const n = sorted.length;
  if (n === 0) throw new Error("quantile requires at least one value");
  if (!(p >= 0 && p <= 1)) throw new Error(`invalid probability for a quantile: ${p} (expected 0 ≤ p ≤ 1)`);
  const h = (n - 1) * p;
  const lo = Math.floor(h);
  const x0 = sorted[lo] as number;
  if (lo + 1 >= n) return x0;
  const x1 = sorted[lo + 1] as number;
  return x0 + (h - lo) * (x1 - x0);
}

/** Sorted copy of finite numbers (NaN and infinities dropped), as a Float64Array. */
export function sortedFinite(values: ArrayLike<number>): Float64Array {
  const out: number[] = [];
  for (let i = 0; i < values.length; i++) {
    const x = values[i] as number;
    if (Number.isFinite(x)) out.push(x);
  }
  return Float64Array.from(out).sort();
}

/**
 * The p-quantile of numbers by the R-7 method (sorts a copy; NaN ignored).
 * @throws Error when no finite value is left, or p outside [0, 1]
 * @example quantile([3, 1, 2], 0.5) // 2
 */
export function quantile(values: ArrayLike<number>, p: number): number {
  return quantileSorted(sortedFinite(values), p);
}
