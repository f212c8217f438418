import { MAX_RATE, type RateRow } from "./rate-table";
import { rebaseRate } from "./rebase-rate";

/** Raised when a rebase would leave the allowed range of rates; names the index fields. */
export class RebaseRangeError extends Error {
  constructor(
    /** The item whose rebased rate leaves the range first (the largest one). */
    readonly item: string,
    readonly rebased: number,
    /** The largest toIndex / fromIndex this table allows. */
    readonly maxRatio: number,
    readonly ratio: number,
  ) {
    const p = (x: number) => Number(x.toPrecision(4));
    super(
      `rebasing × ${p(ratio)} would put the high rate of ${item} at ${p(rebased)} per unit, above the largest rate allowed (${MAX_RATE} per unit): ` +
        `check fromIndex (the index at the rates' price base) and toIndex (the index at the new date); toIndex / fromIndex may be at most ${p(maxRatio)} for this table`,
    );
    this.name = "RebaseRangeError";
  }
}

/**
 * Every rate of a table (rate, low and high) moved from one price date to another with a price
 * index: each × toIndex / fromIndex (index-number rebasing, common practice, no source). All or
 * nothing: a rebase that would take any rate past MAX_RATE is refused, so a rebased table always
 * passes the rate table's schema.
 * @throws Error naming the index when it is not positive; RebaseRangeError naming both indices when a rebased rate would exceed MAX_RATE
 * @example rebaseRateRows(rows, 250, 275) // every rate 10 % higher
 */
export function rebaseRateRows(rows: readonly RateRow[], fromIndex: number, toIndex: number): RateRow[] {
  const out = rows.map((row) => ({
    ...row,
    rate: rebaseRate(row.rate, fromIndex, toIndex),
    low: rebaseRate(row.low, fromIndex, toIndex),
    high: rebaseRate(row.high, fromIndex, toIndex),
  }));
  const worst = out.reduce<RateRow | undefined>((a, r) => (a === undefined || r.high > a.high ? r : a), undefined);
  if (worst && !(worst.high <= MAX_RATE)) {
    const before = rows.find((r) => r.item === worst.item)?.high ?? 1;
    throw new RebaseRangeError(worst.item, worst.high, MAX_RATE / before, toIndex / fromIndex);
  }
  return out;
}
