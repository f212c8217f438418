import { describe, it, expect } from "vitest";
import { timberDome } from "../../../src/schemes/timber-dome";
import { DEFAULT_BRIEF } from "../../../src/brief";
import { defaultCatalogue } from "../../../src/catalogue/default-catalogue";

// Issue 15, on demand: general buckling of the timber net through the analysis layer (frame of the
// actual mesh at E/(1 + k_def)), reported beside the continuum formula's factor.
describe("timber dome: 3D analysis of the net on demand", () => {
  const brief = { ...DEFAULT_BRIEF, spanM: 60, riseM: 9 };
  const plain = timberDome.design(brief, timberDome.defaults, defaultCatalogue());
  const d = timberDome.design(brief, { ...timberDome.defaults, bucklingAnalysis: true }, defaultCatalogue());
  it("does not run unless asked, and asking changes no member", () => {
    expect(plain.analysis).toBeUndefined();
    expect(d.members).toEqual(plain.members);
  });
  it("analyses the heaviest gravity combination, converged, with a displacement", () => {
    expect(d.analysis!.loadCases.length).toBe(1);
    expect(d.analysis!.loadCases[0]!.converged).toBe(true);
    expect(d.analysis!.loadCases[0]!.maxDisplacementM).toBeGreaterThan(0);
  });
  it("reports the buckling factor beside the continuum factor, and its check", () => {
    expect(d.analysis!.bucklingFactor).toBeGreaterThan(0);
    expect(d.analysis!.continuumBucklingFactor).toBeGreaterThan(0);
    const c = d.checks.find((x) => x.name.startsWith("general buckling of the net, 3D buckling factor"))!;
    expect(c.capacity).toBe(d.analysis!.bucklingFactor);
  });
  it("a softer service class (more creep, k_def) gives a lower 3D buckling factor on the same sections", () => {
    const sc3 = timberDome.design(brief, { ...timberDome.defaults, bucklingAnalysis: true, serviceClass: "3" }, defaultCatalogue());
    if (JSON.stringify(sc3.members) === JSON.stringify(d.members)) expect(sc3.analysis!.bucklingFactor).toBeLessThan(d.analysis!.bucklingFactor!);
    else expect(sc3.analysis!.bucklingFactor).toBeGreaterThan(0);
  });
  it("draws the net with a mode shape for the 3D chart, the base ring at the eaves", () => {
    const v = d.analysis!.view!;
    expect(v.nodes.length).toBe(v.modeShape!.length);
    expect(v.members.length).toBeGreaterThan(v.nodes.length);
    expect(Math.min(...v.nodes.map((p) => p[2]))).toBeCloseTo(brief.eavesHeightM, 6);
  });
});
