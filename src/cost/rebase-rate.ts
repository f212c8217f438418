/**
 * Moves a rate from one price date to another with a price index: rate × toIndex / fromIndex
 * (index-number rebasing, common practice, no source). Rebasing there and back returns the rate.
 * @param rate rate at the price date of `fromIndex`, currency per unit (finite, ≥ 0)
 * @param fromIndex index value at the rate's price base (> 0)
 * @param toIndex index value at the target date (> 0)
 * @throws Error naming the argument when an index is not positive or the rate is negative
 * @example rebaseRate(100, 250, 275) // 110
 */
export function rebaseRate(rate: number, fromIndex: number, toIndex: number): number {
  if (!(rate >= 0 && Number.isFinite(rate))) throw new Error(`invalid rate: ${rate} (expected a finite rate ≥ 0)`);
  if (!(fromIndex > 0 && Number.isFinite(fromIndex))) throw new Error(`invalid fromIndex: ${fromIndex} (expected a price index > 0)`);
  if (!(toIndex > 0 && Number.isFinite(toIndex))) throw new Error(`invalid toIndex: ${toIndex} (expected a price index > 0)`);
  return (rate * toIndex) / fromIndex;
}
