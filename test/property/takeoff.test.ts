import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { SCHEMES } from "../../src/schemes";
import { DEFAULT_BRIEF, BRIEF_LIMITS as L, TERRAIN_CATEGORIES } from "../../src/brief";
import { defaultCatalogue } from "../../src/catalogue/default-catalogue";
import { designScheme } from "../../src/pipeline";

// Invariant of every scheme, for any brief within its limits: the take-off has no negative or
// non-finite quantity or mass, the totals are finite, and nothing fails with an internal error
// (designScheme turns a throw into "could not be computed").
const briefArb = fc
  .record({
    spanM: fc.double({ min: L.spanM.min, max: L.spanM.max, noNaN: true }),
    riseRatio: fc.double({ min: 0.03, max: 0.5, noNaN: true }),
    eavesHeightM: fc.double({ min: 0, max: 40, noNaN: true }),
    minClearHeightM: fc.double({ min: 0, max: 30, noNaN: true }),
    snowGroundKPa: fc.double({ min: 0, max: 5, noNaN: true }),
    windBasicMPerS: fc.double({ min: 10, max: 50, noNaN: true }),
    terrain: fc.constantFrom(...TERRAIN_CATEGORIES),
  })
  .map(({ riseRatio, ...b }) => ({ ...DEFAULT_BRIEF, ...b, riseM: Math.min(250, Math.max(0.5, b.spanM * riseRatio)) }));

/** Runs per property; the cable dome's 3D analysis (up to seconds a design at the largest spans) runs fewer, its closed form the full count. */
const RUNS = 120;
const RUNS_3D = Number(process.env.TAKEOFF_RUNS_3D ?? 16);

function assertTakeoff(model: (typeof SCHEMES)[number], options: Record<string, string> | undefined, numRuns: number): void {
  const catalogue = defaultCatalogue();
  fc.assert(
    fc.property(briefArb, (brief) => {
      const design = designScheme(model, brief, options, catalogue);
      expect(design.reason).not.toMatch(/^could not be computed/);
      for (const row of design.takeoff) {
        expect(Number.isFinite(row.massKg) && row.massKg >= 0, `${row.element} mass ${row.massKg}`).toBe(true);
        expect(Number.isFinite(row.quantity) && row.quantity >= 0, `${row.element} quantity ${row.quantity}`).toBe(true);
      }
      expect(Number.isFinite(design.selfWeightKgPerM2)).toBe(true);
      expect(Number.isFinite(design.usableFloorM2) && design.usableFloorM2 >= 0 && design.usableFloorM2 <= design.planAreaM2 * (1 + 1e-9)).toBe(true);
    }),
    { numRuns },
  );
}

describe("every scheme's take-off (fast-check over briefs)", () => {
  for (const model of SCHEMES) {
    const hasAnalysis = model.options.some((o) => o.key === "analysis");
    // the cable net's 3D analysis takes seconds to minutes a design at the largest spans: its own unit tests run it, not this property
    const runs3d = hasAnalysis && model.id !== "cable-net";
    it(`${model.id}: quantities and masses are finite and ≥ 0, and no internal error${hasAnalysis ? " (closed form)" : ""}`, () => {
      assertTakeoff(model, hasAnalysis ? { analysis: "closed-form" } : undefined, RUNS);
    });
    if (runs3d) {
      it(`${model.id}: the same with the 3D analysis (${RUNS_3D} briefs)`, () => assertTakeoff(model, { analysis: "3d" }, RUNS_3D), 300_000);
    }
  }
});
