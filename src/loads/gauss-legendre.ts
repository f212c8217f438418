/**
 * Nodes and weights of n-point Gauss–Legendre quadrature on [−1, 1], found by Newton's method on
 * the Legendre polynomial P_n with P_n′(x) = n (x P_n − P_{n−1}) / (x² − 1) (Press et al.,
 * Numerical Recipes, 3rd ed., §4.6). Exact for polynomials of degree ≤ 2n − 1.
 * @throws when n is not an integer from 1 to 64
 * @example gaussLegendre(2).nodes // [−0.5773…, 0.5773…] (±1/√3)
 */
export function gaussLegendre(n: number): { nodes: number[]; weights: number[] } {
  if (!(Number.isInteger(n) && n >= 1 && n <= 64)) throw new RangeError(`invalid quadrature order: ${n} (expected an integer from 1 to 64)`);
  const nodes = new Array<number>(n);
  const weights = new Array<number>(n);
  for (let i = 0; i < Math.ceil(n / 2); i++) {
    let x = Math.cos((Math.PI * (i + 0.75)) / (n + 0.5));
    let derivative = 1;
    for (let iteration = 0; iteration < 100; iteration++) {
      let previous = 1;
      let current = x;
      for (let k = 2; k <= n; k++) [previous, current] = [current, ((2 * k - 1) * x * current - (k - 1) * previous) / k];
      derivative = (n * (x * current - previous)) / (x * x - 1);
      const step = current / derivative;
      x -= step;
      if (Math.abs(step) < 1e-15) break;
    }
    nodes[i] = -x;
    nodes[n - 1 - i] = x;
    weights[i] = weights[n - 1 - i] = 2 / ((1 - x * x) * derivative * derivative);
  }
  return { nodes, weights };
}

/** The 12-point rule the load integrals use panel by panel. */
const RULE = gaussLegendre(12);

/**
 * ∫ f(t) dt over [from, to] by composite Gauss–Legendre (12 points a panel): `panels` equal
 * panels, each also split at every one of `breaks` that falls inside, so a step or a kink of the
 * integrand at a break is integrated exactly as a smooth piece.
 * @example integrate1d((t) => t * t, 0, 3, 1) // 9
 */
export function integrate1d(f: (t: number) => number, from: number, to: number, panels = 1, breaks: readonly number[] = []): number {
  if (!(Number.isInteger(panels) && panels >= 1)) throw new RangeError(`invalid panel count: ${panels} (expected an integer ≥ 1)`);
  const lo = Math.min(from, to);
  const hi = Math.max(from, to);
  const edges = [lo, hi, ...breaks.filter((b) => b > lo && b < hi)];
  for (let k = 1; k < panels; k++) edges.push(lo + ((hi - lo) * k) / panels);
  edges.sort((p, q) => p - q);
  let total = 0;
  for (let e = 1; e < edges.length; e++) {
    const half = (edges[e]! - edges[e - 1]!) / 2;
    if (half === 0) continue;
    const mid = (edges[e]! + edges[e - 1]!) / 2;
    let panel = 0;
    RULE.nodes.forEach((node, i) => (panel += RULE.weights[i]! * f(mid + half * node)));
    total += panel * half;
  }
  return from <= to ? total : -total;
}
