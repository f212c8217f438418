/**
 * Ranks of numbers, 1-based, ties given the mean of the ranks they span (fractional ranking).
 * NaN is not allowed (filter first).
 * @example ranks([10, 30, 20, 20]) // [1, 4, 2.5, 2.5]
 */
export function ranks(values: ArrayLike<number>): Float64Array {
  const n = values.length;
  // Native typed-array sort, then each value's rank from the first and last place it sorts to.
  const sorted = Float64Array.from(values).sort();
  const out = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const v = values[i] as number;
    let lo = 0;
    let hi = n;
    while (lo < hi) {
      const mid = (lo + hi) >>> 1;
      if ((sorted[mid] as number) < v) lo = mid + 1;
      else hi = mid;
    }
    const first = lo;
    hi = n;
    while (lo < hi) {
      const mid = (lo + hi) >>> 1;
      if ((sorted[mid] as number) <= v) lo = mid + 1;
      else hi = mid;
    }
    out[i] = (first + lo - 1) / 2 + 1;
  }
  return out;
}

/**
 * Pearson correlation of two equal-length lists; null when either has no spread.
 * @throws Error for lists of different lengths or fewer than two values
 */
export function pearsonCorrelation(x: ArrayLike<number>, y: ArrayLike<number>): number | null {
  const n = x.length;
  if (y.length !== n) throw new Error(`correlation needs lists of the same length (got ${n} and ${y.length})`);
  if (n < 2) throw new Error(`correlation requires at least two values (got ${n})`);
  let mx = 0;
  let my = 0;
  for (let i = 0; i < n; i++) {
    mx += x[i] as number;
    my += y[i] as number;
  }
  mx /= n;
  my /= n;
  let sxy = 0;
  let sxx = 0;
  let syy = 0;
  for (let i = 0; i < n; i++) {
    const dx = (x[i] as number) - mx;
    const dy = (y[i] as number) - my;
    sxy += dx * dy;
    sxx += dx * dx;
    syy += dy * dy;
  }
  if (sxx === 0 || syy === 0) return null;
  return Math.max(-1, Math.min(1, sxy / Math.sqrt(sxx * syy)));
}

/**
 * Spearman's rank correlation coefficient: the Pearson correlation of the fractional ranks
 * (C. Spearman, "The proof and measurement of association between two things", Am. J. Psychol.
 * 15, 1904; ties by mean ranks, as in simple-statistics' sampleRankCorrelation). Null when either
 * list is constant.
 * @throws Error for lists of different lengths or fewer than two values
 * @example spearmanCorrelation([1, 2, 3], [10, 40, 90]) // 1
 */
export function spearmanCorrelation(x: ArrayLike<number>, y: ArrayLike<number>): number | null {
  return pearsonCorrelation(ranks(x), ranks(y));
}
