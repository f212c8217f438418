import { describe, it, expect } from "vitest";
import { geodesicDome } from "../../../src/schemes/geodesic-dome";
import { DEFAULT_BRIEF } from "../../../src/brief";
import { defaultCatalogue } from "../../../src/catalogue/default-catalogue";

// Issue 13 item 6, on demand: the frame analysis of the actual net under the uniform and drifted
// snow combinations, and the lowest buckling factor (× knock-down) beside the continuum formula's.
describe("geodesic dome: 3D analysis of the net on demand", () => {
  const brief = { ...DEFAULT_BRIEF, spanM: 60, riseM: 9 };
  const plain = geodesicDome.design(brief, geodesicDome.defaults, defaultCatalogue());
  const d = geodesicDome.design(brief, { ...geodesicDome.defaults, bucklingAnalysis: true }, defaultCatalogue());
  it("does not run unless asked", () => expect(plain.analysis).toBeUndefined());
  it("analyses the uniform and the drifted snow combinations, both converged, with a displacement", () => {
    expect(d.analysis!.loadCases.map((c) => c.name).some((n) => n.includes("drifted snow"))).toBe(true);
    expect(d.analysis!.loadCases.map((c) => c.name).some((n) => n.includes("uniform snow"))).toBe(true);
    for (const c of d.analysis!.loadCases) {
      expect(c.converged).toBe(true);
      expect(c.maxDisplacementM).toBeGreaterThan(0);
    }
  });
  it("reports the buckling factor beside the continuum factor, and its check", () => {
    expect(d.analysis!.bucklingFactor).toBeGreaterThan(0);
    expect(d.analysis!.continuumBucklingFactor).toBeGreaterThan(0);
    const c = d.checks.find((x) => x.name.startsWith("general buckling, 3D buckling factor"))!;
    expect(c.capacity).toBe(d.analysis!.bucklingFactor);
  });
  it("draws the net with a mode shape for the 3D chart", () => {
    const v = d.analysis!.view!;
    expect(v.nodes.length).toBe(v.modeShape!.length);
    expect(v.members.length).toBeGreaterThan(v.nodes.length);
    // the base ring stands at the eaves
    expect(Math.min(...v.nodes.map((p) => p[2]))).toBeCloseTo(brief.eavesHeightM, 6);
  });
  it("declines a net larger than it can analyse in reasonable time, and says so (320 m at 1.5 m struts)", () => {
    const big = geodesicDome.design({ ...brief, spanM: 320, riseM: 48 }, { ...geodesicDome.defaults, targetStrutLengthM: 1.5, bucklingAnalysis: true }, defaultCatalogue());
    expect(big.analysis).toBeUndefined();
    expect(big.warnings.some((w) => /more than the 2,000 the on-demand 3D analysis takes/.test(w))).toBe(true);
  });
});
