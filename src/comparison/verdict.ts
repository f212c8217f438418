// The answer first (issue 14): which feasible, in-range scheme is lowest in carbon, cost and
// weight, by how much against the next, why, and which schemes are left out and why. Pure: the
// compare page, the client page and tests read the same sentences and the same figures.
import type { SchemeResult } from "../pipeline";
import type { Design, DesignStatus } from "../schemes/types";
import { materialInfo } from "../materials";

export type { DesignStatus } from "../schemes/types";

/** A design's status (the scheme kit sets it: infeasible with a reason, else out-of-range outside the valid span range, else feasible). */
export function statusOf(design: Design): DesignStatus {
  return design.status;
}

/** The figures the answer ranks on: lower is better for each; all per m² of usable floor. */
export const VERDICT_METRICS = [
  { key: "carbon", quality: "lowest in embodied carbon", noun: "carbon", unit: "kgCO2e/m²" },
  { key: "cost", quality: "cheapest", noun: "cost", unit: "" },
  { key: "weight", quality: "lightest", noun: "weight", unit: "kg/m²" },
] as const;
export type VerdictMetric = (typeof VERDICT_METRICS)[number]["key"];

/** A metric's value per m² of usable floor, or null where it is not known (no assessment, no floor). */
export function metricValue(result: SchemeResult, metric: VerdictMetric): number | null {
  const d = result.design;
  if (d.usableFloorM2 <= 0) return null;
  if (metric === "weight") return d.roofMassKg > 0 ? d.roofMassKg / d.usableFloorM2 : null;
  if (metric === "carbon") return result.carbon?.perM2UsableFloor.perM2?.counted ?? null;
  return result.cost?.perM2UsableFloor?.total ?? null;
}

/** One metric's ranking among the feasible, in-range schemes with a value, lowest first. */
export interface MetricRanking {
  metric: VerdictMetric;
  ranked: { id: string; label: string; value: number }[];
}

export function rankMetric(results: readonly SchemeResult[], metric: VerdictMetric): MetricRanking {
  const ranked = results
    .filter((r) => statusOf(r.design) === "feasible")
    .flatMap((r) => {
      const value = metricValue(r, metric);
      return value === null || !Number.isFinite(value) ? [] : [{ id: r.id, label: r.label, value }];
    })
    .sort((a, b) => a.value - b.value);
  return { metric, ranked };
}

/** Why a scheme is left out of the ranking, in words, or null when it is ranked. */
export function exclusionReason(result: SchemeResult): string | null {
  const d = result.design;
  const status = statusOf(d);
  if (status === "infeasible") return `not feasible: ${d.reason}`;
  if (status === "out-of-range") return "the span is outside its method's valid range";
  if (d.usableFloorM2 <= 0) return "no usable floor at the minimum clear height";
  if (result.carbon === null && result.cost === null) return "no carbon or cost: a table lacks rows it needs";
  return null;
}

/** The material kind that carries the largest share of a result's counted carbon, with that share. */
export function carbonDriver(result: SchemeResult): { kind: string; share: number } | null {
  const carbon = result.carbon;
  if (!carbon || carbon.totals.counted <= 0) return null;
  const byKind = new Map<string, number>();
  for (const row of carbon.rows) {
    const kind = row.material === null ? "other" : (materialInfo(row.material)?.kind ?? "other");
    byKind.set(kind, (byKind.get(kind) ?? 0) + row.countedKgCO2e);
  }
  const [kind, value] = [...byKind.entries()].sort((a, b) => b[1] - a[1])[0] ?? ["other", 0];
  return { kind, share: value / carbon.totals.counted };
}

/** The answer as data: the winner of each metric, the runner-up and the margin; the exclusions. */
export interface Verdict {
  winners: { metric: VerdictMetric; id: string; label: string; value: number; next: { label: string; value: number } | null }[];
  excluded: { id: string; label: string; reason: string }[];
}

export function verdict(results: readonly SchemeResult[]): Verdict {
  const winners = VERDICT_METRICS.flatMap(({ key }) => {
    const [first, second] = rankMetric(results, key).ranked;
    return first ? [{ metric: key, id: first.id, label: first.label, value: first.value, next: second ? { label: second.label, value: second.value } : null }] : [];
  });
  const excluded = results.flatMap((r) => {
    const reason = exclusionReason(r);
    return reason === null ? [] : [{ id: r.id, label: r.label, reason }];
  });
  return { winners, excluded };
}
