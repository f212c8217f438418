/**
 * The rise chosen on the trend of the objective, not on one sample: a least-squares quadratic
 * (a response surface in one variable) through the objective sampled at a few rises, then the rise
 * nearest the reference whose fitted value is within a band of the fitted least. A lattice dome's
 * objective steps by ±5 % from one rise to the next (each rise gives another mesh frequency and other
 * catalogue sections) while its trend across the rise range is smooth; picking among samples then
 * follows the steps from span to span.
 */

// The rises are sampled at equal steps of rise ÷ span across the range (the same ratios at every
// span); how many, and at which other proportions, each scheme declares (RiseTrend in ../schemes/types.ts).

/** The quadratic a + b·u + c·u² with u = (x − centre) / scale, by least squares; null with fewer than three points. */
export function fitQuadratic(points: readonly { x: number; y: number }[]): ((x: number) => number) | null {
  if (points.length < 3) return null;
  const xs = points.map((p) => p.x);
  const centre = (Math.min(...xs) + Math.max(...xs)) / 2;
  const scale = Math.max(1e-9, (Math.max(...xs) - Math.min(...xs)) / 2);
  // normal equations: sums of u^k (k = 0…4) and of y·u^k (k = 0…2)
  const s = [0, 0, 0, 0, 0];
  const t = [0, 0, 0];
  for (const p of points) {
    const u = (p.x - centre) / scale;
    for (let k = 0; k < 5; k++) s[k]! += u ** k;
    for (let k = 0; k < 3; k++) t[k]! += p.y * u ** k;
  }
  const m = [
    [s[0]!, s[1]!, s[2]!, t[0]!],
    [s[1]!, s[2]!, s[3]!, t[1]!],
    [s[2]!, s[3]!, s[4]!, t[2]!],
  ];
  const coefficients = solve3(m);
  if (!coefficients) return null;
  const [a, b, c] = coefficients;
  return (x: number) => {
    const u = (x - centre) / scale;
    return a + b * u + c * u * u;
  };
}

/** Gaussian elimination with partial pivoting on an augmented 3 × 4 matrix; null when singular. */
function solve3(m: number[][]): [number, number, number] | null {
  for (let col = 0; col < 3; col++) {
    const pivot = [col, col + 1, col + 2].filter((r) => r < 3).reduce((best, r) => (Math.abs(m[r]![col]!) > Math.abs(m[best]![col]!) ? r : best), col);
    if (Math.abs(m[pivot]![col]!) < 1e-12) return null;
    [m[col], m[pivot]] = [m[pivot]!, m[col]!];
    for (let r = 0; r < 3; r++) {
      if (r === col) continue;
      const f = m[r]![col]! / m[col]![col]!;
      for (let k = col; k < 4; k++) m[r]![k]! -= f * m[col]![k]!;
    }
  }
  return [m[0]![3]! / m[0]![0]!, m[1]![3]! / m[1]![1]!, m[2]![3]! / m[2]![2]!];
}

/**
 * The quadratic through the finite samples (fitQuadratic) at each of `values` between the least and
 * the greatest finite sample's index (+∞ outside); null with fewer than three finite samples.
 */
function fittedOverSamples(values: readonly number[], samples: readonly { index: number; value: number }[]): number[] | null {
  const finite = samples.filter((s) => Number.isFinite(s.value));
  const fit = fitQuadratic(finite.map((s) => ({ x: values[s.index]!, y: s.value })));
  if (!fit) return null;
  const from = Math.min(...finite.map((s) => s.index));
  const to = Math.max(...finite.map((s) => s.index));
  return values.map((x, i) => (i >= from && i <= to ? fit(x) : Number.POSITIVE_INFINITY));
}

/**
 * The index of `values` (rises in order) to design at: of the values between the least and the
 * greatest finite sample, those whose fitted objective is within `band` of the fitted least, the
 * nearest `reference` (an index). With fewer than three finite samples, the best sample.
 */
export function trendChoice(values: readonly number[], samples: readonly { index: number; value: number }[], reference: number, band: number): number {
  const best = samples.filter((s) => Number.isFinite(s.value)).sort((a, b) => a.value - b.value)[0];
  const fitted = fittedOverSamples(values, samples);
  if (!fitted || !best) return best?.index ?? reference;
  const limit = Math.min(...fitted) + band * Math.abs(Math.min(...fitted));
  const inBand = fitted.flatMap((v, i) => (v <= limit ? [i] : []));
  return inBand.reduce((a, b) => (Math.abs(b - reference) < Math.abs(a - reference) ? b : a), inBand[0] ?? best.index);
}

/** The index of `values` where the quadratic through the finite samples is least, between the least and the greatest sampled index; null with fewer than three finite samples. */
export function fittedLeast(values: readonly number[], samples: readonly { index: number; value: number }[]): number | null {
  const fitted = fittedOverSamples(values, samples);
  return fitted ? fitted.indexOf(Math.min(...fitted)) : null;
}
