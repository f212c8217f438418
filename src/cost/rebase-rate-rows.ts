import type { RateRow } from "./rate-table";
import { rebaseRate } from "./rebase-rate";

/**
 * Every rate of a table (rate, low and high) moved from one price date to another with a price
 * index: each × toIndex / fromIndex (index-number rebasing, common practice, no source).
 * @throws Error naming the index when it is not positive
 * @example rebaseRateRows(rows, 250, 275) // every rate 10 % higher
 */
export function rebaseRateRows(rows: readonly RateRow[], fromIndex: number, toIndex: number): RateRow[] {
  return rows.map((row) => ({
    ...row,
    rate: rebaseRate(row.rate, fromIndex, toIndex),
    low: rebaseRate(row.low, fromIndex, toIndex),
    high: rebaseRate(row.high, fromIndex, toIndex),
  }));
}
