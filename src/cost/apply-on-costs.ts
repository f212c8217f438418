import { validateWith } from "../kernel/validate";
import { OnCostsSchema, type OnCosts } from "./on-costs";

/** One on-cost line: a percentage of the running subtotal before it. */
export type OnCostLine = {
  key: "preliminaries" | "overheadsProfit" | "designFees" | "risk" | "inflation";
  label: string;
  pct: number;
  /** The subtotal the percentage is applied to, currency. */
  base: number;
  /** pct/100 × base, currency. */
  amount: number;
  /** base + amount, currency. */
  subtotal: number;
};

/** The on-costs in the order they compound. */
export const ON_COST_ORDER = [
  { key: "preliminaries", field: "preliminariesPct", label: "Main contractor's preliminaries" },
  { key: "overheadsProfit", field: "overheadsProfitPct", label: "Main contractor's overheads and profit" },
  { key: "designFees", field: "designFeesPct", label: "Project and design team fees" },
  { key: "risk", field: "riskPct", label: "Risk allowance" },
  { key: "inflation", field: "inflationPct", label: "Inflation to the construction mid-point" },
] as const;

/**
 * Adds the on-costs to a works cost, compounding in the documented order works → preliminaries →
 * overheads and profit → design fees → risk → inflation, each line a percentage of the subtotal
 * before it (elemental order-of-cost estimate, RICS NRM 1, from memory).
 * @param worksCost works cost (location factor already applied), currency, ≥ 0
 * @throws Error naming the field for invalid on-costs or a negative works cost
 * @example applyOnCosts(100, { ...DEFAULT_ON_COSTS, preliminariesPct: 10, overheadsProfitPct: 0, designFeesPct: 0, riskPct: 0 }).total // 110
 */
export function applyOnCosts(worksCost: number, onCosts: OnCosts): { lines: OnCostLine[]; total: number } {
  const checked = validateWith(OnCostsSchema, onCosts);
  if (!checked.ok) throw new Error(`invalid on-costs: ${checked.problems.map((p) => `${p.path}: ${p.message}`).join("; ")}`);
  if (!(worksCost >= 0 && Number.isFinite(worksCost))) throw new Error(`invalid works cost: ${worksCost} (expected a finite cost ≥ 0)`);
  let running = worksCost;
  const lines = ON_COST_ORDER.map(({ key, field, label }): OnCostLine => {
    const pct = onCosts[field];
    const amount = (running * pct) / 100;
    const line = { key, label, pct, base: running, amount, subtotal: running + amount };
    running = line.subtotal;
    return line;
  });
  return { lines, total: running };
}
