import { describe, expect, it } from "vitest";
import { defaultStudy } from "../../src/study";
import { defaultCatalogue } from "../../src/catalogue/default-catalogue";
import { SCHEMES } from "../../src/schemes";
import type { SchemeId } from "../../src/schemes/types";
import { runSpanStudy, type SpanPoint } from "../../src/comparison";

// Issue 12 item 5: along 40–400 m in 5 m steps no metric of a feasible, in-range scheme changes by
// more than 15 % between neighbouring spans, unless the scheme names a regime change there.
const METRICS = ["selfWeightKgPerM2", "carbonKgCO2ePerM2Floor", "costPerM2Floor", "massToAir"] as const;
const LIMIT = 0.15;

/**
 * Schemes that still jump at the time of writing (issue 12 item 5 open for them): the test runs
 * them and expects the failure, so the day one becomes smooth this test says so and it must be
 * moved back to the list that holds.
 */
// Measured at 05:00 on 3 Dec with the search in the pipeline (default study: each scheme its own
// rise and free proportions, carbon objective): cable dome 7 jumps (largest 24 % mass ÷ air,
// 95→100 m; 18 % self-weight 225→230 m), cable net 14 (20 % self-weight 95→100 m), geodesic dome
// 11 (52 % mass ÷ air 185→190 m), timber dome 14 (41 % self-weight 40→45 m). Truss (5 %) and shell
// (10 %) hold. Most are the search's choice moving between two proportions of nearly equal carbon
// (the objective itself is nearly continuous; the form it picks is not).
const KNOWN_FAILING: readonly SchemeId[] = ["cable-dome", "cable-net", "geodesic-dome", "timber-dome"];

/** Every neighbour-to-neighbour change over the limit, where both ends are feasible and in range and the regime is the same. */
function jumps(points: readonly SpanPoint[]): { from: number; to: number; metric: string; change: number }[] {
  const sorted = [...points].sort((a, b) => a.spanM - b.spanM);
  const out: { from: number; to: number; metric: string; change: number }[] = [];
  sorted.forEach((p, i) => {
    const q = sorted[i - 1];
    if (!q || q.status !== "feasible" || p.status !== "feasible" || q.regime !== p.regime) return;
    for (const m of METRICS) {
      const change = Math.abs(p[m] - q[m]) / Math.abs(q[m]);
      if (Number.isFinite(change) && change > LIMIT) out.push({ from: q.spanM, to: p.spanM, metric: m, change });
    }
  });
  return out;
}

describe("smooth across span (40–400 m, 5 m steps)", () => {
  const study = defaultStudy();
  const catalogue = defaultCatalogue();
  for (const model of SCHEMES) {
    const run = KNOWN_FAILING.includes(model.id) ? it.fails : it;
    run(`${model.id}: no metric jumps more than 15 % between neighbours without a named regime change`, () => {
      const points = runSpanStudy(study, catalogue, { fromM: 40, toM: 400, stepM: 5 }, { schemeIds: [model.id] });
      expect(jumps(points)).toEqual([]);
    }, 400_000); // each scheme: 73 spans, each with its proportion search (about 3–170 s here)
  }
});
