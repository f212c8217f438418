import type { Design } from "../schemes/types";
import type { FactorRow } from "../carbon";
import { missingMaterials, missingItems } from "../takeoff/missing-rows";
import type { RateRow } from "../cost";

/** A row that the schemes' take-offs need and a table lacks, with the schemes that need it. */
export interface TableGap {
  table: "factors" | "rates";
  /** Material id (factors) or cost item id (rates). */
  key: string;
  /** Labels (or ids) of the schemes whose take-off needs the row. */
  schemes: string[];
}

/** One scheme's take-off, named for the messages. */
export type NamedDesign = { label: string; design: Pick<Design, "takeoff"> };

/**
 * Every material without a factor row and every cost item without a rate row that the given
 * designs need, each once with the schemes that need it (factors first, then rates, in take-off order).
 * Pass only the table to check to check one.
 */
export function tableGaps(designs: readonly NamedDesign[], tables: { factors?: readonly FactorRow[]; rates?: readonly RateRow[] }): TableGap[] {
  const gaps = new Map<string, TableGap>();
  const note = (table: TableGap["table"], key: string, scheme: string) => {
    const id = `${table}:${key}`;
    const gap = gaps.get(id) ?? { table, key, schemes: [] };
    if (!gap.schemes.includes(scheme)) gap.schemes.push(scheme);
    gaps.set(id, gap);
  };
  const { factors, rates } = tables;
  if (factors) for (const d of designs) for (const m of missingMaterials(d.design.takeoff, factors)) note("factors", m.key, d.label);
  if (rates) for (const d of designs) for (const m of missingItems(d.design.takeoff, rates)) note("rates", m.key, d.label);
  return [...gaps.values()];
}

/** `no carbon factor for material "steel-plate" (needed by Cable dome, Truss roof)`. */
export function describeGap(gap: TableGap): string {
  const what = gap.table === "factors" ? `no carbon factor for material "${gap.key}"` : `no rate for cost item "${gap.key}"`;
  return `${what} (needed by ${gap.schemes.join(", ")})`;
}

/** The gaps as one text, at most `max` listed and then "… and N more". */
export function describeGaps(gaps: readonly TableGap[], max = 12, separator = "; "): string {
  const lines = gaps.slice(0, max).map(describeGap);
  if (gaps.length > max) lines.push(`… and ${gaps.length - max} more`);
  return lines.join(separator);
}
