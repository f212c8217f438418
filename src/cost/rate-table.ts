import * as v from "valibot";
import { dataFileText } from "#data-files";
import { COST_ITEMS } from "../takeoff/takeoff-row";
import { numberIn, oneOf, textUpTo, requiredText } from "../kernel/validate";
import { parseSchemaCsv, rowsToCsv, type CsvColumn } from "../kernel/schema-csv";

/** One unit rate of the rate table: cost per `unit` of a COST_ITEMS item at the price base, before on-costs. */
export type RateRow = {
  /** A COST_ITEMS id. */
  item: string;
  label: string;
  /** The unit the rate is per; must be the COST_ITEMS unit of `item`. */
  unit: string;
  /** Most likely rate, currency per unit. */
  rate: number;
  /** Low end of the plausible range, currency per unit (≤ rate). */
  low: number;
  /** High end of the plausible range, currency per unit (≥ rate). */
  high: number;
  /** What the rate includes (supply, fabricate, erect…). */
  basis: string;
  source: string;
  notes: string;
};

const ITEM_IDS = COST_ITEMS.map((c) => c.id) as unknown as readonly [string, ...string[]];
const UNIT_OF = new Map<string, string>(COST_ITEMS.map((c) => [c.id, c.unit]));

/** The unit COST_ITEMS gives for an item, or undefined. */
export function costItemUnit(item: string): string | undefined {
  return UNIT_OF.get(item);
}

/** Largest rate accepted, currency per unit (guards against a misplaced decimal point). */
export const MAX_RATE = 1e7;

/** Checks one rate row: a known item, its COST_ITEMS unit, and low ≤ rate ≤ high. */
export const RateRowSchema = v.pipe(
  v.object({
    item: oneOf(ITEM_IDS),
    label: requiredText(120),
    unit: oneOf(["t", "m", "m2", "m3", "nr"]),
    rate: numberIn(0, MAX_RATE, "per unit"),
    low: numberIn(0, MAX_RATE, "per unit"),
    high: numberIn(0, MAX_RATE, "per unit"),
    basis: textUpTo(300),
    source: requiredText(300),
    notes: textUpTo(500),
  }),
  v.forward(
    v.partialCheck(
      [["item"], ["unit"]],
      (row) => UNIT_OF.get(row.item) === row.unit,
      (issue) => {
        const row = issue.input as { item: string; unit: string };
        return `${JSON.stringify(row.unit)} (expected ${JSON.stringify(UNIT_OF.get(row.item))}, the unit of ${row.item})`;
      },
    ),
    ["unit"],
  ),
  v.forward(
    v.partialCheck(
      [["low"], ["rate"]],
      (row) => row.low <= row.rate,
      (issue) => `low ${(issue.input as { low: number }).low} is above the rate ${(issue.input as { rate: number }).rate} (expected low ≤ rate ≤ high)`,
    ),
    ["low"],
  ),
  v.forward(
    v.partialCheck(
      [["rate"], ["high"]],
      (row) => row.high >= row.rate,
      (issue) => `high ${(issue.input as { high: number }).high} is below the rate ${(issue.input as { rate: number }).rate} (expected low ≤ rate ≤ high)`,
    ),
    ["high"],
  ),
);

/** The rate table: rows with unique items. */
export const RateTableSchema = v.pipe(
  v.array(RateRowSchema, () => `expected a list of rate rows`),
  v.check((rows) => new Set(rows.map((r) => r.item)).size === rows.length, () => `an item is listed twice (expected each item once)`),
);

export const RATE_COLUMNS: readonly CsvColumn[] = [
  { column: "item", field: "item", kind: "text" },
  { column: "label", field: "label", kind: "text" },
  { column: "unit", field: "unit", kind: "text" },
  { column: "rate", field: "rate", kind: "number" },
  { column: "low", field: "low", kind: "number" },
  { column: "high", field: "high", kind: "number" },
  { column: "basis", field: "basis", kind: "text" },
  { column: "source", field: "source", kind: "text" },
  { column: "notes", field: "notes", kind: "text" },
];

/**
 * Parses a rate table from CSV (columns item,label,unit,rate,low,high,basis,source,notes).
 * @throws CsvError with every bad cell and duplicate item; nothing is returned unless the whole file is valid
 */
export function parseRateCsv(text: string, fileLabel = "cost rates CSV"): RateRow[] {
  return parseSchemaCsv(text, RATE_COLUMNS, RateRowSchema, fileLabel, "item");
}

/** Writes a rate table as CSV that parseRateCsv reads back unchanged. */
export function rateRowsToCsv(rows: readonly RateRow[]): string {
  return rowsToCsv(rows, RATE_COLUMNS);
}

let cached: RateRow[] | undefined;

/** The default (demonstration) rate table from data/cost-rates.csv, a fresh copy each call. */
export function defaultRateRows(): RateRow[] {
  cached ??= parseRateCsv(dataFileText("cost-rates.csv"), "data/cost-rates.csv");
  return cached.map((row) => ({ ...row }));
}

/** The name of the bundled rate set, for captions and records. */
export const DEFAULT_RATE_SET_NAME = "spanbook demonstration rates (data/cost-rates.csv)";
