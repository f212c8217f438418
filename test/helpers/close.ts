import { expect } from "vitest";

/**
 * Asserts |actual − expected| ≤ rel·|expected| (or ≤ rel when expected is 0). The tolerance is
 * chosen from the precision of the source the expected value comes from.
 */
export function expectRelClose(actual: number, expected: number, rel: number): void {
  const scale = expected === 0 ? 1 : Math.abs(expected);
  const error = Math.abs(actual - expected) / scale;
  if (!(error <= rel)) {
    expect.fail(`expected ${actual} to be within ${rel} (relative) of ${expected}; relative error ${error.toExponential(3)}`);
  }
}

/** Asserts |actual − expected| ≤ abs. */
export function expectAbsClose(actual: number, expected: number, abs: number): void {
  if (!(Math.abs(actual - expected) <= abs)) {
    expect.fail(`expected ${actual} to be within ${abs} of ${expected}; off by ${Math.abs(actual - expected).toExponential(3)}`);
  }
}
