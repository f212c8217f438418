import * as v from "valibot";
import { numberIn, textUpTo } from "../kernel/validate";
import { DEFAULT_RATE_SET_NAME } from "./rate-table";

/**
 * Elemental order-of-cost on-costs, each a percentage applied in this order, compounding:
 * works → preliminaries → overheads and profit → design fees → risk → inflation
 * (the order of an elemental order-of-cost estimate in the RICS New Rules of Measurement, NRM 1,
 * from memory). The location factor multiplies the works rates.
 */
export type OnCosts = {
  /** Main contractor's preliminaries, % of works. */
  preliminariesPct: number;
  /** Main contractor's overheads and profit, % of works + preliminaries. */
  overheadsProfitPct: number;
  /** Project and design team fees, % of the subtotal so far. */
  designFeesPct: number;
  /** Risk allowance, % of the subtotal so far. */
  riskPct: number;
  /** Inflation from the price base to the mid-point of construction, % of the subtotal so far. */
  inflationPct: number;
  /** Multiplies every rate for the location (1 = the rate table's location). */
  locationFactor: number;
  /** Price base of the rates, YYYY-MM. */
  priceBase: string;
  /** ISO 4217 currency code, e.g. EUR. */
  currency: string;
  /** Name of the rate set, for captions and records (an import names it after its file and date); a file without it takes DEFAULT_RATE_SET_NAME. */
  rateSetName?: string;
};

export const OnCostsSchema = v.object({
  preliminariesPct: numberIn(0, 50, "%"),
  overheadsProfitPct: numberIn(0, 50, "%"),
  designFeesPct: numberIn(0, 50, "%"),
  riskPct: numberIn(0, 100, "%"),
  inflationPct: numberIn(-20, 100, "%"),
  locationFactor: numberIn(0.2, 5),
  priceBase: v.pipe(
    textUpTo(7),
    v.regex(/^\d{4}-(0[1-9]|1[0-2])$/, (issue) => `${JSON.stringify(issue.input)} (expected a month as YYYY-MM, e.g. 2026-01)`),
  ),
  currency: v.pipe(
    textUpTo(3),
    v.regex(/^[A-Z]{3}$/, (issue) => `${JSON.stringify(issue.input)} (expected a three-letter currency code, e.g. EUR)`),
  ),
  rateSetName: v.optional(textUpTo(120), DEFAULT_RATE_SET_NAME),
});

/**
 * Defaults for a concept estimate, all common practice with no source: preliminaries 15 %,
 * overheads and profit 6 %, design fees 10 %, risk 15 %, inflation 0 % (set it for the
 * programme). The currency and price base label the demonstration rates of data/cost-rates.csv.
 */
export const DEFAULT_ON_COSTS: OnCosts = {
  preliminariesPct: 15,
  overheadsProfitPct: 6,
  designFeesPct: 10,
  riskPct: 15,
  inflationPct: 0,
  locationFactor: 1,
  priceBase: "2026-01",
  currency: "EUR",
  rateSetName: DEFAULT_RATE_SET_NAME,
};
