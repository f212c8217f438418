import { describe, it, expect } from "vitest";
import { standardErrorOfMean, standardErrorOfProportion, clusteredStandardErrorOfMean, ranks, spearmanCorrelation, quantileStandardError, createPrng } from "../../../src/risk";
import { expectRelClose } from "../../helpers/close";

describe("standard errors", () => {
  it("standardErrorOfMean([1, 2, 3, 4]) = s/√n = √(5/3)/2 (by hand)", () => expectRelClose(standardErrorOfMean([1, 2, 3, 4]), Math.sqrt(5 / 3) / 2, 1e-15));
  it("standardErrorOfProportion(0.5, 100) = 0.05", () => expectRelClose(standardErrorOfProportion(0.5, 100), 0.05, 1e-15));
  it("clusters of one sample give the ordinary s/√n", () => {
    const x = [3, 1, 4, 1, 5, 9, 2, 6];
    expectRelClose(clusteredStandardErrorOfMean(x, x.map((_, i) => i), x.length), standardErrorOfMean(x), 1e-14);
  });
  it("equal clusters give the standard error of the cluster means (Cochran §6.3, by hand)", () => {
    // Clusters {1, 3} and {5, 11}: cluster means 2 and 8; SE = s(means)/√2 = √18/√2 = 3.
    expectRelClose(clusteredStandardErrorOfMean([1, 3, 5, 11], [0, 0, 1, 1], 2), 3, 1e-14);
  });
  it("NaN samples are left out", () => expectRelClose(clusteredStandardErrorOfMean([1, Number.NaN, 3], [0, 1, 2], 3), standardErrorOfMean([1, 3]), 1e-14));
  it("a quantile's standard error is about √(p(1−p)/n)/f(x_p) for a large uniform sample (f = 1)", () => {
    const rng = createPrng(1);
    const x = Float64Array.from({ length: 40_000 }, () => rng.uniform()).sort();
    expectRelClose(quantileStandardError(x, 0.5), Math.sqrt(0.25 / 40_000), 0.05);
  });
});

describe("ranks and Spearman's ρ", () => {
  it("ties take the mean rank", () => expect([...ranks([10, 30, 20, 20])]).toEqual([1, 4, 2.5, 2.5]));
  it("a monotone relation has ρ = 1, a reversed one −1, a constant none", () => {
    expect(spearmanCorrelation([1, 2, 3, 4], [1, 8, 27, 64])).toBe(1);
    expect(spearmanCorrelation([1, 2, 3, 4], [4, 3, 2, 1])).toBe(-1);
    expect(spearmanCorrelation([1, 2, 3], [5, 5, 5])).toBeNull();
  });
  it("ρ = 1 − 6Σd²/(n(n²−1)) without ties (Spearman 1904, by hand: d = 0, 1, −1, 0 → 1 − 12/60 = 0.8)", () => {
    expectRelClose(spearmanCorrelation([1, 2, 3, 4], [1, 3, 2, 4]) as number, 0.8, 1e-14);
  });
});
