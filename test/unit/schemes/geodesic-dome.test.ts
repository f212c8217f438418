import { describe, it, expect } from "vitest";
import { geodesicDome } from "../../../src/schemes/geodesic-dome";
import { DEFAULT_BRIEF } from "../../../src/brief";
import { defaultCatalogue } from "../../../src/catalogue/default-catalogue";
import { expectRelClose } from "../../helpers/close";
import { sphericalCap } from "../../../src/mechanics/spherical-cap";
import { geodesicCap, geodesicFrequencyFor, strutLengths } from "../../../src/mechanics/geodesic";
import { latticeBands } from "../../../src/mechanics/lattice-bands";

const catalogue = defaultCatalogue();

describe("geodesicDome.design", () => {
  const d = geodesicDome.design(DEFAULT_BRIEF, geodesicDome.defaults, catalogue);
  it("is feasible at 160 m with the default brief", () => {
    expect(d.reason).toBe("");
    expect(d.feasible).toBe(true);
  });
  it("take-off masses sum to totalMassKg", () => expectRelClose(d.takeoff.reduce((s, r) => s + r.massKg, 0), d.totalMassKg, 1e-12));
  it("warns that a single layer at 160 m is beyond its usual span range", () => {
    expect(d.warnings.some((w) => w.startsWith("single-layer lattice beyond its usual span range"))).toBe(true);
  });
  it("does not warn about the single layer when the double layer is chosen", () => {
    const dd = geodesicDome.design(DEFAULT_BRIEF, { ...geodesicDome.defaults, layers: "double" }, catalogue);
    expect(dd.feasible).toBe(true);
    expect(dd.warnings.some((w) => w.startsWith("single-layer lattice"))).toBe(false);
  });
  it("reports nodes, struts and strut lengths from the generated mesh", () => {
    const value = (key: string) => d.summary.find((s) => s.key === key)?.value ?? Number.NaN;
    expect(value("nodes")).toBeGreaterThan(100);
    expect(value("struts")).toBeGreaterThan(value("nodes"));
    expect(value("strutMinM")).toBeLessThanOrEqual(value("strutMeanM"));
    expect(value("strutMeanM")).toBeLessThanOrEqual(value("strutMaxM"));
    // mean strut near the 5 m target (frequency from 1.2 R/v)
    expect(Math.abs(value("strutMeanM") - 5) / 5).toBeLessThan(0.15);
  });
  it("draws every strut in plan inside the plan circle", () => {
    const plan = d.drawing.plan ?? [];
    expect(plan.length).toBeGreaterThan(100);
    for (const line of plan) for (const [x, y] of line.points) expect(Math.hypot(x, y)).toBeLessThanOrEqual(DEFAULT_BRIEF.spanM / 2 + 1e-6);
  });
  it("steel per m² of plan lies in the 40–90 kg/m² usually quoted for single-layer lattice domes near 160 m (from memory)", () => {
    const steelKg = d.takeoff.filter((r) => r.material !== null && r.material.startsWith("steel")).reduce((s, r) => s + r.massKg, 0);
    const perM2 = steelKg / d.planAreaM2;
    expect(perM2).toBeGreaterThan(40);
    expect(perM2).toBeLessThan(90);
  });
  it("every check passes when feasible", () => expect(d.checks.every((c) => c.passed)).toBe(true));
  it("is infeasible, not an exception, when buckling cannot be met (knock-down 0.05 at 250 m, single layer)", () => {
    const big = geodesicDome.design({ ...DEFAULT_BRIEF, spanM: 250, riseM: 20 }, { ...geodesicDome.defaults, knockDown: 0.05, targetStrutLengthM: 15 }, catalogue);
    expect(big.feasible).toBe(false);
    expect(big.reason).toMatch(/double-layer|catalogue/);
  });
  it("rejects an out-of-range option, naming it", () => {
    expect(() => geodesicDome.design(DEFAULT_BRIEF, { ...geodesicDome.defaults, knockDown: 2 }, catalogue)).toThrow(/invalid knockDown: 2/);
  });
});

// The design sizes on the bands cut from the remembered sphere (geodesicCapCut) and builds the mesh
// only for the drawing and the 3D analysis: its summary, bands and web members must be those of the
// mesh built (geodesicCap) to the last digits.
describe("geodesicDome.design without building the mesh: the mesh's own figures", () => {
  const CASES = [
    { spanM: 40, riseM: 6, targetStrutLengthM: 3, layers: "single" },
    { spanM: 100, riseM: 25, targetStrutLengthM: 5, layers: "single" },
    { spanM: 160, riseM: 24, targetStrutLengthM: 5, layers: "single" },
    { spanM: 160, riseM: 40, targetStrutLengthM: 8, layers: "double" },
    { spanM: 250, riseM: 50, targetStrutLengthM: 10, layers: "double" },
  ] as const;
  for (const c of CASES) {
    it(`${c.spanM} m span, ${c.riseM} m rise, ${c.targetStrutLengthM} m struts, ${c.layers} layer`, () => {
      const opts = { ...geodesicDome.defaults, targetStrutLengthM: c.targetStrutLengthM, layers: c.layers };
      const d = geodesicDome.design({ ...DEFAULT_BRIEF, spanM: c.spanM, riseM: c.riseM }, opts, catalogue);
      const cap = sphericalCap(c.spanM, c.riseM);
      const frequency = geodesicFrequencyFor(cap.radiusM, c.targetStrutLengthM);
      const mesh = geodesicCap(frequency, cap.radiusM, cap.edgeAngleRad);
      const layers = c.layers === "double" ? 2 : 1;
      const value = (key: string) => d.summary.find((s) => s.key === key)?.value ?? Number.NaN;
      const inner = strutLengths(mesh.edgeLengthsM, (e) => !mesh.edgeOnRing[e]);
      expect([value("frequency"), value("nodes"), value("struts"), value("faces")]).toEqual([frequency, mesh.nodes.length * layers, inner.count * layers, mesh.faces.length]);
      expectRelClose(value("strutMinM"), inner.minM, 1e-12);
      expectRelClose(value("strutMeanM"), inner.meanM, 1e-12);
      expectRelClose(value("strutMaxM"), inner.maxM, 1e-12);
      expectRelClose(value("strutTotalM"), inner.totalM, 1e-12);
      const bands = latticeBands(mesh, Math.min(opts.bands, Math.max(1, Math.floor(frequency / 2))));
      const bars = d.members.filter((m) => m.element.startsWith("lattice "));
      expect(bars.map((m) => m.count)).toEqual(bands.map((b) => b.count * layers));
      bars.forEach((m, i) => expectRelClose(m.lengthM, bands[i]!.meanLengthM, 1e-12));
      const web = d.members.find((m) => m.element === "web members");
      if (layers === 1) expect(web).toBeUndefined();
      else {
        expect(web?.count).toBe(3 * mesh.nodes.length);
        expectRelClose(web?.lengthM ?? 0, Math.hypot((opts.doubleLayerDepthPct / 100) * c.spanM, strutLengths(mesh.edgeLengthsM).meanM / Math.sqrt(3)), 1e-12);
      }
    });
  }
});
