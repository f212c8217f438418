// The notice a page shows when a table lacks rows the schemes' take-offs need: every gap named
// with the schemes that need it, so a blank ("–") result is never silent.
import { describeGap, tableGaps, type NamedDesign, type TableGap } from "../pipeline";
import type { FactorRow } from "../carbon";
import type { RateRow } from "../cost";
import type { RowGap } from "./table-import";

/** A warning box naming every gap (null when there is none). */
export function gapNotice(gaps: readonly TableGap[], id: string): HTMLElement | null {
  if (gaps.length === 0) return null;
  const box = document.createElement("div");
  box.className = "warnings table-gaps";
  box.id = id;
  box.setAttribute("role", "status");
  const head = document.createElement("strong");
  const factors = gaps.some((g) => g.table === "factors");
  const rates = gaps.some((g) => g.table === "rates");
  const blank = [factors ? "carbon" : "", rates ? "cost" : ""].filter(Boolean).join(" and ");
  head.textContent = `Missing table rows: the ${blank} of the schemes below that need them is left blank (–). Add the rows (or reset the table) to fill it in.`;
  const list = document.createElement("ul");
  for (const gap of gaps) {
    const li = document.createElement("li");
    li.textContent = describeGap(gap);
    list.append(li);
  }
  box.append(head, list);
  return box;
}

/** The rows of a candidate factor table that these designs need and it lacks, for an import check. */
export function missingFactorRows(designs: () => readonly NamedDesign[]): (rows: readonly FactorRow[]) => RowGap[] {
  return (rows) => tableGaps(designs(), { factors: rows }).map((g) => ({ key: g.key, neededBy: g.schemes }));
}

/** The rows of a candidate rate table that these designs need and it lacks, for an import check. */
export function missingRateRows(designs: () => readonly NamedDesign[]): (rows: readonly RateRow[]) => RowGap[] {
  return (rows) => tableGaps(designs(), { rates: rows }).map((g) => ({ key: g.key, neededBy: g.schemes }));
}
