// The compare page's side-by-side table: the three ranked measures first (each with its
// difference to the best), then the quantities behind them; sortable by any column.
import type { SchemeResult } from "../pipeline";
import { metricValue, statusOf } from "../comparison/verdict";
import { materialInfo, type MaterialKind } from "../materials";
import { liveSortableTable, type SortColumn, type SortableOptions } from "./sortable-table";
import { fmt } from "./format";

const STATUS_WORDS = { feasible: "feasible", "out-of-range": "outside valid span range", infeasible: "not feasible" } as const;

function tonnesOf(result: SchemeResult, kind: MaterialKind): number {
  return result.design.takeoff.filter((r) => r.material !== null && materialInfo(r.material)?.kind === kind).reduce((s, r) => s + r.massKg, 0) / 1000;
}

/** The columns, with one tonnage column per material kind that some scheme uses. */
export function resultColumns(results: readonly SchemeResult[], currency: string): SortColumn<SchemeResult>[] {
  const kinds = [...new Set(results.flatMap((r) => r.design.takeoff.flatMap((row) => (row.material === null ? [] : [materialInfo(row.material)?.kind]))))].filter((k): k is MaterialKind => k !== undefined);
  const num = (key: string, heading: string, value: (r: SchemeResult) => number | null, lowerIsBetter = false): SortColumn<SchemeResult> => ({ key, heading, value, numeric: true, lowerIsBetter });
  return [
    { key: "scheme", heading: "Scheme", value: (r) => r.label },
    { key: "status", heading: "Status", value: (r) => STATUS_WORDS[statusOf(r.design)] },
    num("carbon", "Carbon (kgCO2e/m²)", (r) => metricValue(r, "carbon"), true),
    num("cost", `Cost (${currency}/m²)`, (r) => metricValue(r, "cost"), true),
    num("weight", "Roof mass (kg/m²)", (r) => metricValue(r, "weight"), true),
    num("floor", "Usable floor (m²)", (r) => (r.design.usableFloorM2 > 0 ? r.design.usableFloorM2 : null)),
    num("carbon-total", "Carbon, total (tCO2e)", (r) => (r.carbon ? r.carbon.totals.counted / 1000 : null)),
    num("cost-total", `Cost, total (million ${currency})`, (r) => (r.cost ? r.cost.totals.total / 1e6 : null)),
    num("self-weight", "Self-weight (kg/m² of plan)", (r) => (r.design.roofMassKg > 0 ? r.design.selfWeightKgPerM2 : null)),
    ...kinds.map((kind) => num(`t-${kind}`, `${kind.charAt(0).toUpperCase()}${kind.slice(1)} (t)`, (r) => tonnesOf(r, kind) || null)),
    { key: "governing", heading: "Governing check", value: (r) => (r.design.governing ? r.design.maxUtilisation : null), text: (r) => (r.design.governing ? `${fmt.plain(r.design.governing)} (${fmt.two(r.design.maxUtilisation)})` : "–") },
  ];
}

/** The options of the results table for results at `spanM`: ranked rows are the feasible, in-range ones. */
function resultsOptions(spanM: number): SortableOptions<SchemeResult> {
  return {
    caption: `The schemes at ${spanM} m span — carbon, cost and roof mass per m² of usable floor; under each, the difference to the best feasible scheme in range`,
    ranked: (r) => statusOf(r.design) === "feasible",
    rowId: (r) => r.id,
    sortKey: "carbon",
  };
}

/**
 * The results table kept on the page while the results change (a drag of the span slider): each
 * update writes only what changed, and the column the reader sorted by stays chosen (issue 14).
 */
export function liveResultsTable(): { element: HTMLTableElement; update(results: readonly SchemeResult[], currency: string, spanM: number): void } {
  const live = liveSortableTable<SchemeResult>();
  live.element.classList.add("results");
  return {
    element: live.element,
    update: (results, currency, spanM) => live.update(results, resultColumns(results, currency), resultsOptions(spanM)),
  };
}

/** The sortable results table; ranked rows are the feasible, in-range ones. */
export function resultsTable(results: readonly SchemeResult[], currency: string, spanM: number): HTMLTableElement {
  const live = liveResultsTable();
  live.update(results, currency, spanM);
  return live.element;
}
