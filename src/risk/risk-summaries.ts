import type { SchemeId } from "../schemes/types";
import { quantileSorted, sortedFinite } from "./sample-quantile";
import { quantileStandardError } from "./quantile-standard-error";
import { clusteredStandardErrorOfMean } from "./standard-error";
import { pearsonCorrelation, ranks } from "./rank-correlation";
import type { MetricSummary, PairwiseResult } from "./risk-result";

/** Samples sharing a cluster index (a design draw) are correlated; standard errors account for it. */
export type Clusters = { of: Int32Array; count: number };

function clusteredSe(values: Float64Array, clusters: Clusters, fallbackSd: number, n: number): number {
  try {
    return clusteredStandardErrorOfMean(values, clusters.of, clusters.count);
  } catch {
    return n > 0 ? fallbackSd / Math.sqrt(n) : Number.NaN;
  }
}

/**
 * P10, P50, P90 (R-7), mean and their Monte Carlo standard errors of one metric over the samples
 * where it is finite; null with fewer than two such samples. The quantiles' errors use the
 * effective sample size n·(s²/n)/SE²(mean) implied by the clustered standard error of the mean.
 */
export function summariseMetric(values: Float64Array, clusters: Clusters, deterministic: number | null): MetricSummary | null {
  const sorted = sortedFinite(values);
  const n = sorted.length;
  if (n < 2) return null;
  let mean = 0;
  for (const x of sorted) mean += x;
  mean /= n;
  let ss = 0;
  for (const x of sorted) ss += (x - mean) * (x - mean);
  const sd = Math.sqrt(ss / (n - 1));
  const masked = values.map((x) => (Number.isFinite(x) ? x : Number.NaN));
  const seMean = sd === 0 ? 0 : clusteredSe(masked, clusters, sd, n);
  const effectiveN = sd === 0 || seMean === 0 ? n : Math.min(n, Math.max(2, (sd * sd) / (seMean * seMean)));
  return {
    deterministic,
    p10: quantileSorted(sorted, 0.1),
    p50: quantileSorted(sorted, 0.5),
    p90: quantileSorted(sorted, 0.9),
    mean,
    seMean,
    seP10: quantileStandardError(sorted, 0.1, effectiveN),
    seP50: quantileStandardError(sorted, 0.5, effectiveN),
    seP90: quantileStandardError(sorted, 0.9, effectiveN),
    n,
  };
}

/**
 * Per sample, which scheme has the lowest value among those with a finite value (ties share the
 * win equally): each scheme's probability of being lowest over the samples with any finite value
 * (they sum to 1 over the schemes), with clustered standard errors.
 */
export function lowestProbabilities(outputs: readonly Float64Array[], clusters: Clusters): { p: number[]; se: number[]; samplesWithAny: number } {
  const schemes = outputs.length;
  const n = outputs[0]?.length ?? 0;
  const wins = outputs.map(() => new Float64Array(n));
  let any = 0;
  for (let i = 0; i < n; i++) {
    let best = Number.POSITIVE_INFINITY;
    let count = 0;
    for (let s = 0; s < schemes; s++) {
      const y = (outputs[s] as Float64Array)[i] as number;
      if (!Number.isFinite(y)) continue;
      if (y < best) {
        best = y;
        count = 1;
      } else if (y === best) count += 1;
    }
    if (count === 0) {
      for (const w of wins) w[i] = Number.NaN;
      continue;
    }
    any += 1;
    for (let s = 0; s < schemes; s++) {
      const y = (outputs[s] as Float64Array)[i] as number;
      (wins[s] as Float64Array)[i] = y === best ? 1 / count : 0;
    }
  }
  const p = wins.map((w) => (any === 0 ? 0 : w.reduce((sum, x) => (Number.isNaN(x) ? sum : sum + x), 0) / any));
  const se = wins.map((w, s) => {
    const ps = p[s] as number;
    if (any < 2 || ps === 0 || ps === 1) return 0;
    try {
      return clusteredStandardErrorOfMean(w, clusters.of, clusters.count);
    } catch {
      return Math.sqrt((ps * (1 - ps)) / any);
    }
  });
  return { p, se, samplesWithAny: any };
}

/** P(a beats b) for every ordered pair of schemes, over the samples where both have a finite value. */
export function pairwiseProbabilities(ids: readonly SchemeId[], outputs: readonly Float64Array[], metric: PairwiseResult["metric"]): PairwiseResult[] {
  const out: PairwiseResult[] = [];
  ids.forEach((a, s) => {
    ids.forEach((b, t) => {
      if (s === t) return;
      const ya = outputs[s] as Float64Array;
      const yb = outputs[t] as Float64Array;
      let n = 0;
      let wins = 0;
      for (let i = 0; i < ya.length; i++) {
        const x = ya[i] as number;
        const y = yb[i] as number;
        if (!Number.isFinite(x) || !Number.isFinite(y)) continue;
        n += 1;
        wins += x < y ? 1 : x === y ? 0.5 : 0;
      }
      out.push({ metric, a, b, pABeatsB: n === 0 ? Number.NaN : wins / n, n });
    });
  });
  return out;
}

/**
 * Spearman rank correlations of inputs with one output over the samples where the output is
 * finite (the rank-correlation measure of sensitivity, e.g. Saltelli et al., Global Sensitivity
 * Analysis: The Primer, 2008, §1.2.5). `inputRanks` are the inputs' ranks over all samples, reused
 * when the output is finite everywhere.
 */
export function rankCorrelationsWith(output: Float64Array, inputs: readonly Float64Array[], inputRanks: readonly (Float64Array | null)[]): (number | null)[] {
  const keep: number[] = [];
  for (let i = 0; i < output.length; i++) if (Number.isFinite(output[i] as number)) keep.push(i);
  if (keep.length < 3) return inputs.map(() => null);
  const all = keep.length === output.length;
  const y = ranks(all ? output : Float64Array.from(keep, (i) => output[i] as number));
  return inputs.map((x, k) => {
    const shared = inputRanks[k];
    if (shared === null || shared === undefined) return null;
    const rx = all ? shared : ranks(Float64Array.from(keep, (i) => x[i] as number));
    return pearsonCorrelation(rx, y);
  });
}
