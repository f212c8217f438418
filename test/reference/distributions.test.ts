import { describe, it, expect } from "vitest";
import jStat from "jstat";
import { quantile as d3Quantile } from "d3";
import { expectAbsClose, expectRelClose } from "../helpers/close";
import {
  triangularDistribution,
  pertDistribution,
  pertShapes,
  uniformDistribution,
  logGamma,
  regularizedIncompleteBeta,
  inverseRegularizedIncompleteBeta,
  quantile,
  quantileSorted,
  quantileStandardError,
  createPrng,
  makeDistribution,
  type Distribution,
} from "../../src/risk";

describe("triangular distribution (a, m, b)", () => {
  // Standard results (Johnson, Kotz and Balakrishnan, Continuous Univariate Distributions vol. 2,
  // 2nd ed. 1995, ch. 26 §9): mean (a+m+b)/3, variance (a²+b²+m²−ab−am−bm)/18, and the inverse CDF
  // a + √(u(b−a)(m−a)) below F(m) = (m−a)/(b−a), b − √((1−u)(b−a)(b−m)) above. Expected values written
  // as the formulas, with numbers that can be checked by hand.
  const [a, m, b] = [2, 5, 11];
  const d = triangularDistribution(a, m, b);
  it("mean is (a + m + b)/3", () => expectRelClose(d.mean, (2 + 5 + 11) / 3, 1e-15));
  it("variance is (a² + b² + m² − ab − am − bm)/18", () => expectRelClose(d.variance, (4 + 121 + 25 - 22 - 10 - 55) / 18, 1e-15));
  it("inverse CDF: below the mode a + √(u(b−a)(m−a)), above it b − √((1−u)(b−a)(b−m))", () => {
    expectRelClose(d.quantile(0.1), 2 + Math.sqrt(0.1 * 9 * 3), 1e-15);
    expectRelClose(d.quantile(1 / 3), 5, 1e-15); // F(m) = (m − a)/(b − a) = 3/9
    expectRelClose(d.quantile(0.9), 11 - Math.sqrt(0.1 * 9 * 6), 1e-15);
    expect(d.quantile(0)).toBe(2);
    expect(d.quantile(1)).toBe(11);
  });
  it("agrees with jstat's triangular (cross-check, independent implementation)", () => {
    // jStat.triangular takes (lower, upper, mode).
    for (const u of [0.05, 0.25, 0.5, 0.75, 0.95]) expectRelClose(d.quantile(u), jStat.triangular.inv(u, a, b, m), 1e-12);
    expectRelClose(d.variance, jStat.triangular.variance(a, b, m), 1e-12);
  });
  it("a zero-width range is a point", () => {
    const p = triangularDistribution(3, 3, 3);
    expect([p.quantile(0), p.quantile(0.5), p.quantile(0.999), p.mean, p.variance]).toEqual([3, 3, 3, 3, 0]);
  });
  it("low > mode throws naming the range", () => expect(() => triangularDistribution(4, 3, 5)).toThrow(/low ≤ mode ≤ high/));
});

describe("uniform distribution", () => {
  // Mean (a+b)/2, variance (b−a)²/12, quantile a + u(b−a) (standard results).
  const d = uniformDistribution(10, 12, 20);
  it("mean, variance and quantile", () => {
    expect(d.mean).toBe(15);
    expectRelClose(d.variance, 100 / 12, 1e-15);
    expect(d.quantile(0.25)).toBe(12.5);
  });
});

describe("Beta-PERT distribution (Malcolm, Roseboom, Clark and Fazar, Operations Research 7(5), 1959)", () => {
  const [a, m, b] = [100, 130, 220];
  const d = pertDistribution(a, m, b);
  it("mean is (a + 4m + b)/6", () => expectRelClose(d.mean, (100 + 4 * 130 + 220) / 6, 1e-15));
  it("α = 1 + 4(m − a)/(b − a), β = 1 + 4(b − m)/(b − a)", () => {
    const { alpha, beta } = pertShapes(a, m, b);
    expectRelClose(alpha, 1 + (4 * 30) / 120, 1e-15);
    expectRelClose(beta, 1 + (4 * 90) / 120, 1e-15);
  });
  it("variance is that of beta(α, β) scaled by (b − a)²: αβ/((α+β)²(α+β+1)) (b − a)²", () => {
    const { alpha, beta } = pertShapes(a, m, b);
    expectRelClose(d.variance, ((alpha * beta) / ((alpha + beta) ** 2 * (alpha + beta + 1))) * 120 ** 2, 1e-13);
    expectRelClose(d.variance, jStat.beta.variance(alpha, beta) * 120 ** 2, 1e-12);
  });
  it("quantiles are a + (b − a)·I⁻¹_u(α, β), cross-checked against jstat's beta.inv (to its 3e-7 continued-fraction tolerance)", () => {
    const { alpha, beta } = pertShapes(a, m, b);
    for (const u of [1e-6, 0.001, 0.01, 0.1, 0.25, 0.5, 0.75, 0.9, 0.99, 0.999, 1 - 1e-6]) {
      expectRelClose(d.quantile(u), a + 120 * jStat.beta.inv(u, alpha, beta), 1e-6);
      // And exactly (to rounding) the inverse of the CDF at the quantile found.
      expectAbsClose(regularizedIncompleteBeta((d.quantile(u) - a) / 120, alpha, beta), u, 1e-14);
    }
  });
  it("a symmetric range has its median at the mode", () => expectRelClose(pertDistribution(0, 5, 10).quantile(0.5), 5, 1e-13));
  it("mode at an end: α = 1 (or β = 1), still exact", () => {
    // beta(1, 5): F(x) = 1 − (1 − x)^5, so Q(u) = 1 − (1 − u)^(1/5), by hand.
    const d0 = pertDistribution(0, 0, 1);
    for (const u of [0.1, 0.5, 0.9]) expectRelClose(d0.quantile(u), 1 - (1 - u) ** (1 / 5), 1e-12);
  });
});

describe("special functions", () => {
  it("logGamma: ln Γ(1/2) = ln √π, ln Γ(5) = ln 24, ln Γ(1) = 0, and jstat's gammaln", () => {
    expectRelClose(logGamma(0.5), Math.log(Math.sqrt(Math.PI)), 1e-14);
    expectRelClose(logGamma(5), Math.log(24), 1e-14);
    expectAbsClose(logGamma(1), 0, 1e-14);
    for (const x of [0.1, 1.7, 3.3, 12.5, 100]) expectRelClose(logGamma(x), jStat.gammaln(x), 1e-12);
  });
  it("I_x(a, b): I_x(1, 1) = x, I_x(2, 2) = 3x² − 2x³ (by hand), and jstat's ibeta", () => {
    expectRelClose(regularizedIncompleteBeta(0.3, 1, 1), 0.3, 1e-14);
    expectRelClose(regularizedIncompleteBeta(0.3, 2, 2), 3 * 0.09 - 2 * 0.027, 1e-14);
    // jstat's continued fraction stops at a relative step of 3e-7 (node_modules/jstat betacf), so it is a cross-check to 1e-6 only.
    for (const [x, a, b] of [[0.2, 1.5, 4.5], [0.7, 3.2, 2.8], [0.95, 5, 1]] as const) expectRelClose(regularizedIncompleteBeta(x, a, b), jStat.ibeta(x, a, b), 1e-6);
  });
  it("I_x(a, b) for whole a, b is the binomial tail Σ_{j=a}^{n} C(n, j) x^j (1 − x)^(n−j), n = a + b − 1 (Abramowitz and Stegun 26.5.24)", () => {
    const choose = (n: number, k: number): number => (k === 0 ? 1 : (choose(n, k - 1) * (n - k + 1)) / k);
    for (const [x, a, b] of [[0.7, 3, 4], [0.2, 2, 5], [0.55, 5, 1]] as const) {
      const n = a + b - 1;
      let tail = 0;
      for (let j = a; j <= n; j++) tail += choose(n, j) * x ** j * (1 - x) ** (n - j);
      expectRelClose(regularizedIncompleteBeta(x, a, b), tail, 1e-13);
    }
  });
  it("the inverse inverts: I(I⁻¹(p)) = p", () => {
    for (const p of [0.001, 0.2, 0.5, 0.8, 0.999]) expectAbsClose(regularizedIncompleteBeta(inverseRegularizedIncompleteBeta(p, 2.3, 3.7), 2.3, 3.7), p, 1e-14);
  });
});

describe("sample quantiles: R-7 (Hyndman and Fan, The American Statistician 50(4), 1996, definition 7)", () => {
  it("quantile([1…10], 0.1 / 0.5 / 0.9) = 1.9 / 5.5 / 9.1 (h = 9p, by hand)", () => {
    const x = [1, 2, 3, 4, 5, 6, 7, 8, 9, 10];
    expectRelClose(quantile(x, 0.1), 1.9, 1e-15);
    expectRelClose(quantile(x, 0.5), 5.5, 1e-15);
    expectRelClose(quantile(x, 0.9), 9.1, 1e-15);
  });
  it("agrees with d3-array's quantile (which uses R-7) on unsorted data", () => {
    const rng = createPrng(3);
    const x = Array.from({ length: 37 }, () => rng.uniform() * 100);
    for (const p of [0, 0.1, 0.33, 0.5, 0.9, 1]) expect(quantile(x, p)).toBe(d3Quantile(x, p));
  });
  it("one value, and an empty list throws", () => {
    expect(quantileSorted([4], 0.9)).toBe(4);
    expect(() => quantileSorted([], 0.5)).toThrow(/at least one/);
  });
});

describe("inverse-transform sampling: quantiles of 100,000 draws agree with the exact quantiles within their standard error", () => {
  const cases: [string, Distribution][] = [
    ["pert(100, 130, 220)", makeDistribution("pert", 100, 130, 220)],
    ["triangular(2, 5, 11)", makeDistribution("triangular", 2, 5, 11)],
    ["uniform(0, 1, 4)", makeDistribution("uniform", 0, 1, 4)],
  ];
  for (const [name, d] of cases) {
    it(name, () => {
      const rng = createPrng(20261202);
      const draws = Float64Array.from({ length: 100_000 }, () => d.quantile(rng.uniform())).sort();
      for (const p of [0.1, 0.5, 0.9]) {
        const se = quantileStandardError(draws, p);
        // 4 standard errors: a fixed seed, so this is a check of the sampler, not a coin toss.
        expect(Math.abs(quantileSorted(draws, p) - d.quantile(p))).toBeLessThanOrEqual(4 * se);
      }
      let mean = 0;
      for (const x of draws) mean += x;
      mean /= draws.length;
      expect(Math.abs(mean - d.mean)).toBeLessThanOrEqual(4 * Math.sqrt(d.variance / draws.length));
    });
  }
});
