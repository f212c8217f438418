// Fixed, hand-made inputs for rendering tests (not check values of any method): two schemes with
// small take-offs, assessed with the default tables, so chart snapshots do not move when a
// scheme's design method changes.
import type { Design } from "../../src/schemes/types";
import type { SchemeResult } from "../../src/pipeline";
import { schemeResult } from "../../src/pipeline";
import { defaultStudy } from "../../src/study";
import type { SpanPoint } from "../../src/comparison";

function design(id: Design["schemeId"], rows: Design["takeoff"], feasible = true): Design {
  const planAreaM2 = 10_000;
  const totalMassKg = rows.reduce((s, r) => s + r.massKg, 0);
  return {
    schemeId: id,
    feasible,
    status: feasible ? "feasible" : "infeasible",
    governingLoadCase: "",
    reason: feasible ? "" : "fails a check",
    outsideValidRange: false,
    summary: [],
    members: [],
    takeoff: rows,
    massByGroupKg: { structure: totalMassKg, perimeter: 0, substructure: 0, envelope: 0 },
    checks: [],
    warnings: [],
    iterations: 3,
    totalMassKg,
    roofMassKg: totalMassKg,
    selfWeightKgPerM2: totalMassKg / planAreaM2,
    usableFloorM2: 8_000,
    planAreaM2,
    roofSurfaceM2: 11_000,
    enclosedAirKg: 1_000_000,
    governing: "a check",
    maxUtilisation: 0.9,
    drawing: { section: [] },
  };
}

export function fixtureResults(): SchemeResult[] {
  const study = defaultStudy();
  const designs: [Design, string][] = [
    [
      design("cable-dome", [
        { element: "cables", material: "steel-strand", costItem: "cable", quantity: 100, unit: "t", massKg: 100_000 },
        { element: "fabric", material: "fabric-ptfe-glass", costItem: "fabric-ptfe-glass", quantity: 11_000, unit: "m2", massKg: 12_650 },
        { element: "ring", material: "steel-plate", costItem: "steel-ring", quantity: 200, unit: "t", massKg: 200_000 },
      ]),
      "Cable dome",
    ],
    [
      design("geodesic-dome", [
        { element: "struts", material: "steel-hot-finished-hollow", costItem: "steel-lattice", quantity: 500, unit: "t", massKg: 500_000 },
        { element: "cladding", material: "etfe-foil", costItem: "etfe-cushion", quantity: 11_000, unit: "m2", massKg: 38_500 },
      ]),
      "Geodesic steel dome",
    ],
  ];
  return designs.map(([d, label]) => schemeResult(d.schemeId, label, d, study));
}

export function fixtureSpanPoints(): SpanPoint[] {
  const points: SpanPoint[] = [];
  for (const spanM of [60, 90, 120]) {
    points.push({ spanM, id: "cable-dome", label: "Cable dome", feasible: spanM < 120, inValidRange: true, reason: spanM < 120 ? "" : "fails a check", status: spanM < 120 ? "feasible" : "infeasible", riseM: spanM / 7, regime: "", selfWeightKgPerM2: spanM < 120 ? spanM / 3 : Number.NaN, carbonKgCO2ePerM2Floor: spanM, costPerM2Floor: 10 * spanM, massToAir: spanM / 100 });
    points.push({ spanM, id: "truss-roof", label: "Steel truss roof", feasible: true, inValidRange: spanM <= 90, reason: "", status: spanM <= 90 ? "feasible" : "out-of-range", riseM: spanM / 7, regime: "", selfWeightKgPerM2: spanM, carbonKgCO2ePerM2Floor: 2 * spanM, costPerM2Floor: 5 * spanM, massToAir: spanM / 50 });
  }
  return points;
}
