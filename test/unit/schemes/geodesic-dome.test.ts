import { describe, it, expect } from "vitest";
import { geodesicDome } from "../../../src/schemes/geodesic-dome";
import { DEFAULT_BRIEF } from "../../../src/brief";
import { defaultCatalogue } from "../../../src/catalogue/default-catalogue";
import { expectRelClose } from "../../helpers/close";

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
