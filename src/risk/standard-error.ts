/**
 * The Monte Carlo standard error of a sample mean, s/√n, with s the sample standard deviation
 * (Bessel's correction, n − 1) (e.g. Robert and Casella, Monte Carlo Statistical Methods, 2nd ed.
 * 2004, §3.2). For correlated samples pass batch or cluster means instead of the raw samples.
 * @throws Error for fewer than two values
 * @example standardErrorOfMean([1, 2, 3, 4]) // √(5/3)/2 ≈ 0.6455
 */
export function standardErrorOfMean(values: ArrayLike<number>): number {
  const n = values.length;
  if (n < 2) throw new Error(`standard error of the mean requires at least two values (got ${n})`);
  let mean = 0;
  for (let i = 0; i < n; i++) mean += values[i] as number;
  mean /= n;
  let sumSquares = 0;
  for (let i = 0; i < n; i++) {
    const d = (values[i] as number) - mean;
    sumSquares += d * d;
  }
  return Math.sqrt(sumSquares / (n - 1) / n);
}

/**
 * The Monte Carlo standard error of an estimated proportion p̂ from n independent samples,
 * √(p̂(1 − p̂)/n) (the binomial standard error).
 * @throws Error for p outside [0, 1] or n < 1
 * @example standardErrorOfProportion(0.5, 100) // 0.05
 */
export function standardErrorOfProportion(p: number, n: number): number {
  if (!(p >= 0 && p <= 1)) throw new Error(`invalid proportion: ${p} (expected 0 ≤ p ≤ 1)`);
  if (!(Number.isInteger(n) && n >= 1)) throw new Error(`invalid sample count: ${n} (expected a whole number ≥ 1)`);
  return Math.sqrt((p * (1 - p)) / n);
}

/**
 * The standard error of a mean from samples that come in clusters (samples sharing one design
 * draw are correlated): the ratio estimator's linearization variance
 * SE² = C/(C − 1) · Σ_c (Y_c − ȳ·m_c)² / (Σ_c m_c)², with Y_c the sum and m_c the count of cluster
 * c (e.g. Cochran, Sampling Techniques, 3rd ed. 1977, §6.3 and §11.8). With clusters of one sample
 * it is the ordinary s/√n.
 * @param values one value per sample (NaN: sample left out)
 * @param clusterOf the cluster index of each sample, 0 ≤ index < clusterCount
 * @throws Error for lists of different lengths or fewer than two clusters with values
 */
export function clusteredStandardErrorOfMean(values: ArrayLike<number>, clusterOf: ArrayLike<number>, clusterCount: number): number {
  if (values.length !== clusterOf.length) throw new Error(`clustered standard error needs one cluster per value (got ${values.length} values, ${clusterOf.length} clusters)`);
  const sums = new Float64Array(clusterCount);
  const counts = new Float64Array(clusterCount);
  let total = 0;
  let n = 0;
  for (let i = 0; i < values.length; i++) {
    const y = values[i] as number;
    if (Number.isNaN(y)) continue;
    const c = clusterOf[i] as number;
    sums[c] = (sums[c] as number) + y;
    counts[c] = (counts[c] as number) + 1;
    total += y;
    n += 1;
  }
  let used = 0;
  for (let c = 0; c < clusterCount; c++) if ((counts[c] as number) > 0) used += 1;
  if (used < 2) throw new Error(`clustered standard error requires at least two clusters with values (got ${used})`);
  const mean = total / n;
  let sum = 0;
  for (let c = 0; c < clusterCount; c++) {
    const d = (sums[c] as number) - mean * (counts[c] as number);
    sum += d * d;
  }
  return Math.sqrt(((used / (used - 1)) * sum) / (n * n));
}
