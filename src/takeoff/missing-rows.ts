import type { TakeoffRow } from "./takeoff-row";

/** A key a take-off needs that its table lacks, with where it is first needed. */
export type MissingKey = { key: string; where: string };

/**
 * Raised when a take-off needs rows its table lacks: every missing material (factor table) or
 * cost item (rate table) is named, not only the first, so one message says all that must be added.
 */
export class MissingRowsError extends Error {
  constructor(
    readonly table: "factors" | "rates",
    readonly keys: string[],
    message: string,
  ) {
    super(message);
    this.name = "MissingRowsError";
  }
}

function missing(rows: readonly TakeoffRow[], keyOf: (row: TakeoffRow) => string | null, has: (key: string) => boolean): MissingKey[] {
  const out = new Map<string, MissingKey>();
  rows.forEach((row, index) => {
    const key = keyOf(row);
    if (key === null || has(key) || out.has(key)) return;
    out.set(key, { key, where: `row ${index + 1}, element "${row.element}"` });
  });
  return [...out.values()];
}

/** The materials of a take-off that have no factor row, each once, in take-off order. */
export function missingMaterials(rows: readonly TakeoffRow[], factors: readonly { material: string }[]): MissingKey[] {
  const ids = new Set(factors.map((f) => f.material));
  return missing(rows, (row) => row.material, (key) => ids.has(key));
}

/** The cost items of a take-off that have no rate row, each once, in take-off order. */
export function missingItems(rows: readonly TakeoffRow[], rates: readonly { item: string }[]): MissingKey[] {
  const ids = new Set(rates.map((r) => r.item));
  return missing(rows, (row) => row.costItem, (key) => ids.has(key));
}
