import { describe, it, expect } from "vitest";
import { geodesicCap, threeWayGridStiffness, continuumShellPressurePa } from "../../src/mechanics";
import { latticeBuckling, radialPressureLoads } from "../../src/analysis/lattice";
import { timberNetFrame } from "../../src/schemes/timber-dome/analysis";
import { rectangularSection } from "../../src/schemes/timber-dome/sections";

// The timber net through the analysis layer against the equivalent continuum, as the geodesic's
// check (analysis-benchmarks.md §6): p_cr = 4√(D·B)/R² with B = 2EA/(√3 L), D = (3√3/4)EI/L (three-way
// grid, src/mechanics/three-way-grid.ts; Wright 1965 and Kollár & Dulácska, from memory), EI about the
// axis the members bend on out of the surface. The benchmark file's computed lattices sit at 0.83–0.84
// of their continuum estimate: expect ±20 %. (On this shallow cap the section's orientation moves the
// wide section's ratio only from 1.02 to 1.20: these cases do not prove the orientation.)
describe("timber net against the equivalent continuum (analysis-benchmarks.md §6)", () => {
  const R = 40;
  const cap = geodesicCap(24, R, (35 * Math.PI) / 180);
  // E_0,mean of GL28h 12.6 GPa (data/glulam.csv, from memory) over 1 + k_def with k_def 0.8 (service class 2)
  const E = 12.6e9 / 1.8;
  const meanL = cap.edgeLengthsM.reduce((s, l) => s + l, 0) / cap.edgeLengthsM.length;
  for (const [b, h] of [[0.2, 0.8], [0.8, 0.2], [0.4, 0.4]] as const) {
    it(`a ${b * 1000}×${h * 1000} mm net (depth normal to the surface), base ring pinned: within ±20 % of 4√(D·B)/R²`, () => {
      const section = rectangularSection(b, h);
      const r = latticeBuckling(timberNetFrame(cap, [section], cap.edges.map(() => 0), E), radialPressureLoads(cap, 1000), 1);
      expect(r.buckling.converged, r.buckling.reason).toBe(true);
      const grid = threeWayGridStiffness(E * section.areaM2, E * section.secondMomentYM4, meanL);
      const ratio = (r.buckling.factors[0]! * 1000) / continuumShellPressurePa(grid.bendingNm, grid.membraneNPerM, R);
      expect(ratio).toBeGreaterThan(0.8);
      expect(ratio).toBeLessThan(1.2);
    });
  }
});
